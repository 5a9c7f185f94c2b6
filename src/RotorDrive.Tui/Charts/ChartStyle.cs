namespace RotorDrive.Tui.Charts;

/// <summary>How charts are drawn: Unicode braille dots (2 x 4 per character cell) and box lines, or plain characters;
/// in colour or not.</summary>
/// <param name="Unicode">True for braille curves and box-drawing axes; false for one plain character per cell.</param>
/// <param name="Colour">True to draw each series in its own colour.</param>
public sealed record ChartStyle(bool Unicode, bool Colour)
{
    /// <summary>Braille curves in colour.</summary>
    public static ChartStyle Rich { get; } = new(true, true);

    /// <summary>Plain characters, no colour (<c>--ascii</c>).</summary>
    public static ChartStyle Plain { get; } = new(false, false);

    /// <summary>The style the environment asks for: plain characters when <c>ROTORDRIVE_ASCII=1</c> (set by
    /// <c>rotordrive ui --ascii</c>), no colour when <c>NO_COLOR</c> is set to anything (no-color.org), else rich.</summary>
    public static ChartStyle FromEnvironment()
    {
        bool ascii = Environment.GetEnvironmentVariable("ROTORDRIVE_ASCII") == "1";
        bool noColour = !string.IsNullOrEmpty(Environment.GetEnvironmentVariable("NO_COLOR"));
        return new ChartStyle(!ascii, !ascii && !noColour);
    }
}

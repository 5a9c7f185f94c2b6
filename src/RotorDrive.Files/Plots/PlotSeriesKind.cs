namespace RotorDrive.Files.Plots;

/// <summary>How a series is drawn.</summary>
public enum PlotSeriesKind
{
    /// <summary>A curve through the points.</summary>
    Line,

    /// <summary>Marks at the points, not joined.</summary>
    Marks,

    /// <summary>A horizontal line across the panel at the first Y (a limit or a target); X is not used.</summary>
    Level,

    /// <summary>A vertical line across the panel at the first X (a limit on the abscissa); Y is not used.</summary>
    Threshold,

    /// <summary>Histogram bars: X holds the bin centres, Y the counts; bars are as wide as the bin spacing.</summary>
    Bars,
}

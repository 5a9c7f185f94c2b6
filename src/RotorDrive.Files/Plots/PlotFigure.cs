namespace RotorDrive.Files.Plots;

/// <summary>A whole plot file: one or more panels stacked top to bottom, with the rig's name and the date in a corner.</summary>
/// <param name="Title">What the figure shows; the first panel's title starts with it.</param>
/// <param name="RigName">The rig the figure belongs to (stamped in the lower-right corner).</param>
/// <param name="Date">The date stamped beside the rig name (passed in, so files are reproducible).</param>
/// <param name="Panels">The panels, top to bottom.</param>
public sealed record PlotFigure(string Title, string RigName, DateOnly Date, IReadOnlyList<PlotPanel> Panels)
{
    /// <summary>The corner stamp: rig name and date.</summary>
    public string Stamp => $"rig: {RigName} | {Date:yyyy-MM-dd} | RotorDrive";
}

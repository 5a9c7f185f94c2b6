namespace RotorDrive.Files.Plots;

/// <summary>One chart of a plot figure: its title, axis names with units and its series.</summary>
/// <param name="Title">The panel's title.</param>
/// <param name="XLabel">The horizontal axis with its unit ("speed, rpm").</param>
/// <param name="YLabel">The vertical axis with its unit ("torque, N m").</param>
/// <param name="Series">The series, drawn in order (later on top).</param>
/// <param name="YFromZero">True to start the vertical axis at zero (forces, speeds, counts); false to fit it to the data.</param>
public sealed record PlotPanel(string Title, string XLabel, string YLabel, IReadOnlyList<PlotSeries> Series, bool YFromZero = true);

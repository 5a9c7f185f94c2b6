namespace RotorDrive.Tui.Charts;

/// <summary>A named curve or set of marks on a chart, drawn with its own character so it is not told apart by colour alone.</summary>
/// <param name="Name">Shown in the legend.</param>
/// <param name="Glyph">The character the curve or marks are drawn with.</param>
/// <param name="Points">The points (x, y) in the chart's units; non-finite points are left out.</param>
/// <param name="Joined">True to join the points with a line; false for marks only.</param>
public sealed record ChartLine(string Name, char Glyph, IReadOnlyList<(double X, double Y)> Points, bool Joined = true);

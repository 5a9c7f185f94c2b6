namespace RotorDrive.Tui.Charts;

/// <summary>What a chart shows: axis names with units and its curves and marks.</summary>
/// <param name="XLabel">The horizontal axis, with unit ("speed, rpm").</param>
/// <param name="YLabel">The vertical axis, with unit ("torque, N m").</param>
/// <param name="Lines">Curves and marks, drawn in order (later ones on top).</param>
/// <param name="YFromZero">True (default) to start the vertical axis at zero (forces, torques, speeds); false to fit it to
/// the data (voltages, temperatures, where the change matters more than the distance from zero).</param>
public sealed record ChartData(string XLabel, string YLabel, IReadOnlyList<ChartLine> Lines, bool YFromZero = true);

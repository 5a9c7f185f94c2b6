using System.Globalization;
using RotorDrive.Core;
using RotorDrive.Core.Drive;

namespace RotorDrive.Files.Plots;

/// <summary>The <c>operate</c> figure: the motor's torque lines over the rotor's load curve, every equilibrium marked
/// stable (filled) or unstable (open).</summary>
public static class OperatePlot
{
    /// <summary>Builds the figure.</summary>
    /// <param name="map">Load curve and motor torque lines (Core's <see cref="TorqueSpeedMap"/> over the command's duties).</param>
    /// <param name="equilibria">The command's operating points (only crossings are marked).</param>
    /// <param name="what">What was asked ("station 0 at duty 0.95"), for the title.</param>
    /// <param name="rigName">The rig's name, for the stamp.</param>
    /// <param name="date">The date for the stamp.</param>
    public static PlotFigure Build(TorqueSpeedMap map, IReadOnlyList<OperatingPoint> equilibria, string what, string rigName, DateOnly date)
    {
        ArgumentNullException.ThrowIfNull(map);
        ArgumentNullException.ThrowIfNull(equilibria);
        var rpm = map.SpeedsRadPerS.Select(Units.RadPerSToRpm).ToArray();
        var series = new List<PlotSeries> { PlotSeries.Line("rotor load (total torque)", rpm, map.LoadTorqueNm) };
        foreach (var curve in map.Curves)
        {
            series.Add(PlotSeries.Line(string.Create(CultureInfo.InvariantCulture, $"motor at duty {curve.Duty:0.###}"), rpm, curve.TorqueNm));
        }
        var crossings = equilibria.Where(e => e.Kind == EquilibriumKind.Crossing).ToList();
        var stable = crossings.Where(e => e.Stable).ToList();
        var unstable = crossings.Where(e => !e.Stable).ToList();
        series.Add(PlotSeries.Marks("stable equilibrium", stable.Select(e => e.SpeedRpm).ToArray(), stable.Select(e => e.Load.TotalTorqueNm).ToArray()));
        series.Add(PlotSeries.Marks("unstable equilibrium", unstable.Select(e => e.SpeedRpm).ToArray(), unstable.Select(e => e.Load.TotalTorqueNm).ToArray(), hollow: true));
        return new PlotFigure("Operating points, " + what, rigName, date,
            [new PlotPanel("torque against speed", "speed, rpm", "torque, N m", series)]);
    }
}

using RotorDrive.Core;
using RotorDrive.Core.Simulation;

namespace RotorDrive.Files.Plots;

/// <summary>The <c>spinup</c> figure: rotor speed, motor current, gap and pack voltage against time, one curve per
/// station, with the current limit, the design gap and the pack cutoff.</summary>
public static class SpinupPlot
{
    /// <summary>Builds the figure; null when the run kept no trace.</summary>
    /// <param name="spin">The spin-up run.</param>
    /// <param name="designGapM">The rig's design gap, m.</param>
    /// <param name="rigName">The rig's name, for the stamp.</param>
    /// <param name="date">The date for the stamp.</param>
    public static PlotFigure? Build(SpinupResult spin, double designGapM, string rigName, DateOnly date)
    {
        ArgumentNullException.ThrowIfNull(spin);
        if (spin.Trace is not { } t || t.TimeS.Count == 0)
        {
            return null;
        }
        var time = t.TimeS;
        var speeds = PerStation(time, t.SpeedRadPerS, Units.RadPerSToRpm);
        var currents = PerStation(time, t.MotorCurrentA, v => v);
        if (spin.Stations.Count > 0)
        {
            currents.Add(PlotSeries.Level("controller current limit", spin.Stations.Min(s => s.CurrentLimitA)));
        }
        return new PlotFigure("Spin-up from rest", rigName, date,
        [
            new PlotPanel("rotor speed", "time, s", "speed, rpm", speeds),
            new PlotPanel("motor current", "time, s", "current, A", currents),
            new PlotPanel("air gap", "time, s", "gap, mm",
            [
                PlotSeries.Line("gap", time, t.GapM.Select(g => g * 1000).ToArray()),
                PlotSeries.Level("design gap", designGapM * 1000),
            ], YFromZero: false),
            new PlotPanel("pack (bus) voltage", "time, s", "voltage, V",
            [
                PlotSeries.Line("bus", time, t.BusVoltageV),
                PlotSeries.Level("pack cutoff", spin.CutoffVoltageV),
            ], YFromZero: false),
        ]);
    }

    /// <summary>One line per station, named "station J" (counted from 1, as every output counts stations).</summary>
    internal static List<PlotSeries> PerStation(IReadOnlyList<double> time, IReadOnlyList<IReadOnlyList<double>> values, Func<double, double> scale)
        => values.Select((v, j) => PlotSeries.Line($"station {j + 1}", time, v.Select(scale).ToArray())).ToList();
}

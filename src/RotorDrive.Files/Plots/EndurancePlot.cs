using RotorDrive.Core.Craft;
using RotorDrive.Core.Simulation;

namespace RotorDrive.Files.Plots;

/// <summary>The <c>endurance</c> figure: state of charge, pack voltage, and the temperatures (windings, the plate peak)
/// against time, with their limits.</summary>
public static class EndurancePlot
{
    /// <summary>Builds the figure; null when the run kept no trace (no hover to hold).</summary>
    /// <param name="result">The endurance run.</param>
    /// <param name="limits">The rig's limits (plate temperature, cell cutoff).</param>
    /// <param name="cellsSeries">Cells in series of the pack, for the cutoff line.</param>
    /// <param name="maxWindingTempC">The lowest winding temperature rating of the motors, C, or null when none is rated.</param>
    /// <param name="rigName">The rig's name, for the stamp.</param>
    /// <param name="date">The date for the stamp.</param>
    public static PlotFigure? Build(EnduranceResult result, RigLimits limits, int cellsSeries, double? maxWindingTempC, string rigName, DateOnly date)
    {
        ArgumentNullException.ThrowIfNull(result);
        ArgumentNullException.ThrowIfNull(limits);
        if (result.Trace is not { } t || t.TimeS.Count == 0)
        {
            return null;
        }
        var minutes = t.TimeS.Select(s => s / 60).ToArray();
        var temperatures = new List<PlotSeries>();
        for (int j = 0; j < t.WindingTempC.Count; j++)
        {
            temperatures.Add(PlotSeries.Line($"winding, station {j + 1}", minutes, t.WindingTempC[j]));
        }
        if (t.PlateTempC.Count > 0)
        {
            var platePeak = Enumerable.Range(0, t.TimeS.Count).Select(i => t.PlateTempC.Max(p => p[i])).ToArray();
            temperatures.Add(PlotSeries.Line("plate peak (hottest patch)", minutes, platePeak));
        }
        temperatures.Add(PlotSeries.Level("plate limit", limits.PlateTempC));
        if (maxWindingTempC is { } winding)
        {
            temperatures.Add(PlotSeries.Level("winding limit", winding));
        }
        return new PlotFigure($"Endurance (ended by {result.FirstLimit.Words()} after {result.RuntimeS / 60:0.0} min)", rigName, date,
        [
            new PlotPanel("state of charge", "time, min", "state of charge, %", [PlotSeries.Line("charge", minutes, t.SocFraction.Select(s => s * 100).ToArray())]),
            new PlotPanel("pack voltage", "time, min", "voltage, V",
            [
                PlotSeries.Line("bus", minutes, t.BusVoltageV),
                PlotSeries.Level("pack cutoff", limits.CellCutoffV * cellsSeries),
            ], YFromZero: false),
            new PlotPanel("temperatures", "time, min", "temperature, C", temperatures, YFromZero: false),
        ]);
    }
}

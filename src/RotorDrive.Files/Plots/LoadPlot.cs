using System.Globalization;
using RotorDrive.Core.Loads;

namespace RotorDrive.Files.Plots;

/// <summary>The <c>load</c> figure: shaft torque (eddy, windage, bearing, total) and lift against speed, the drag peak
/// marked.</summary>
public static class LoadPlot
{
    /// <summary>Builds the figure from the load sweep the command computed.</summary>
    /// <param name="result">The sweep.</param>
    /// <param name="rigName">The rig's name, for the stamp.</param>
    /// <param name="date">The date for the stamp.</param>
    public static PlotFigure Build(LoadSweepResult result, string rigName, DateOnly date)
    {
        ArgumentNullException.ThrowIfNull(result);
        var rows = result.Rows;
        var rpm = rows.Select(r => r.SpeedRpm).ToArray();
        var torque = new List<PlotSeries>
        {
            PlotSeries.Line("eddy drag", rpm, rows.Select(r => r.EddyTorqueNm).ToArray()),
            PlotSeries.Line("windage", rpm, rows.Select(r => r.WindageTorqueNm).ToArray()),
            PlotSeries.Line("bearing", rpm, rows.Select(r => r.BearingTorqueNm).ToArray()),
            PlotSeries.Line("total", rpm, rows.Select(r => r.TotalTorqueNm).ToArray()),
        };
        if (result.DragPeak.Status is DragPeakStatus.Converged or DragPeakStatus.ScanOnly)
        {
            string label = string.Create(CultureInfo.InvariantCulture,
                $"drag peak {result.DragPeak.TorqueNm:F3} N m at {result.DragPeak.SpeedRpm:F0} rpm");
            torque.Add(PlotSeries.Marks(label, [result.DragPeak.SpeedRpm], [result.DragPeak.TorqueNm]));
        }
        string title = string.Create(CultureInfo.InvariantCulture,
            $"Rotor load {result.RotorId}, gap {result.GapM * 1000:F1} mm, plate {result.PlateTempC:F0} C");
        return new PlotFigure(title, rigName, date,
        [
            new PlotPanel("shaft torque", "speed, rpm", "torque, N m", torque),
            new PlotPanel("lift", "speed, rpm", "lift, N", [PlotSeries.Line("lift", rpm, rows.Select(r => r.LiftN).ToArray())]),
        ]);
    }
}

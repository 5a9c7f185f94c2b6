using System.Globalization;
using System.Text;
using RotorDrive.Core.Studies.Stress;

namespace RotorDrive.Files.Exports;

/// <summary>CSV exports of a stress study: one row per sample, or one sample's spin-up trace.</summary>
/// <remarks>Comma-separated, header row, invariant culture, "\n" line ends; SI values except where the column name
/// says otherwise; an empty field is a value that does not exist (no trim, no lift-off, not assessed).</remarks>
public static class StressCsv
{
    /// <summary>One row per evaluated sample: index, pass flag, each criterion's margin, the figures and every varied input.</summary>
    /// <param name="result">The study's result.</param>
    public static string Samples(StressResult result)
    {
        ArgumentNullException.ThrowIfNull(result);
        var sb = new StringBuilder();
        var header = new List<string> { "sample", "passed" };
        header.AddRange(StressCriteria.All.Select(c => "margin_" + c.Key()));
        header.AddRange(["liftoff_time_s", "peak_motor_current_a", "peak_pack_current_a", "min_pack_voltage_v", "hover_speed_rpm",
            "hover_current_a", "hover_pack_voltage_v", "yaw_residual_nm", "yaw_authority_nm"]);
        header.AddRange(result.Inputs.Select(i => i.Name + "_" + Unit(i.Quantity)));
        sb.Append(string.Join(',', header)).Append('\n');
        foreach (var s in result.SampleResults)
        {
            var o = s.Outcome;
            var cells = new List<string> { s.Index.ToString(CultureInfo.InvariantCulture), o.PassedAll ? "true" : "false" };
            cells.AddRange(o.Margins.Select(F));
            cells.AddRange([F(o.LiftoffTimeS), F(o.PeakMotorCurrentA), F(o.PeakPackCurrentA), F(o.MinPackVoltageV), F(o.HoverSpeedRpm),
                F(o.HoverCurrentA), F(o.HoverPackVoltageV), F(o.YawResidualNm), F(o.YawAuthorityNm)]);
            cells.AddRange(result.Inputs.Select(i => F(i.ValueIn(s.Parts))));
            sb.Append(string.Join(',', cells)).Append('\n');
        }
        return sb.ToString();
    }

    /// <summary>One sample's spin-up trace: time, duty, per-station speed (rpm) and current, bus voltage, pack current, lift.</summary>
    /// <param name="trace">The trace (<see cref="StressOutcome.Trace"/>).</param>
    public static string Trace(IReadOnlyList<StressTracePoint> trace)
    {
        ArgumentNullException.ThrowIfNull(trace);
        int n = trace.Count > 0 ? trace[0].SpeedRadPerS.Count : 0;
        var sb = new StringBuilder();
        var header = new List<string> { "time_s", "duty" };
        header.AddRange(Enumerable.Range(0, n).Select(i => $"speed_rpm_{i + 1}"));
        header.AddRange(Enumerable.Range(0, n).Select(i => $"current_a_{i + 1}"));
        header.AddRange(["pack_voltage_v", "pack_current_a", "lift_n"]);
        sb.Append(string.Join(',', header)).Append('\n');
        foreach (var p in trace)
        {
            var cells = new List<string> { F(p.TimeS), F(p.Duty) };
            cells.AddRange(p.SpeedRadPerS.Select(w => F(w * 30.0 / Math.PI)));
            cells.AddRange(p.MotorCurrentA.Select(a => F(a)));
            cells.AddRange([F(p.BusVoltageV), F(p.PackCurrentA), F(p.LiftN)]);
            sb.Append(string.Join(',', cells)).Append('\n');
        }
        return sb.ToString();
    }

    private static string Unit(StressQuantity q) => q.SiUnit() switch
    {
        "rad/s/V" => "rad_per_s_per_v",
        "S/m" => "s_per_m",
        "1" => "fraction",
        var u => u.ToLowerInvariant(),
    };

    private static string F(double? value) => CsvNumber.Format(value);
}

using System.Globalization;
using System.Text;
using RotorDrive.Core;
using RotorDrive.Core.Simulation;

namespace RotorDrive.Cli.Output;

/// <summary>Formats time traces as CSV: time_s, per-station speed_rpm_J and current_a_J, gap_mm, pack_voltage_v,
/// pack_current_a, soc_pct, per-station winding_temp_c_J and plate_temp_c_J, yaw_torque_nm, yaw_rate_deg_per_s,
/// yaw_angle_deg (J = station number, counted from 1 as every output counts stations).</summary>
public static class TraceCsv
{
    /// <summary>The CSV text of a trace (header row, then one row per sample; invariant culture, '.' decimals).</summary>
    /// <param name="trace">The trace.</param>
    public static string Format(SpinupTrace trace)
    {
        ArgumentNullException.ThrowIfNull(trace);
        int n = trace.SpeedRadPerS.Count;
        var sb = new StringBuilder();
        var header = new List<string> { "time_s" };
        for (int j = 0; j < n; j++)
        {
            header.Add($"speed_rpm_{j + 1}");
            header.Add($"current_a_{j + 1}");
        }
        header.AddRange(["gap_mm", "pack_voltage_v", "pack_current_a", "soc_pct"]);
        for (int j = 0; j < n; j++)
        {
            header.Add($"winding_temp_c_{j + 1}");
            header.Add($"plate_temp_c_{j + 1}");
        }
        header.AddRange(["yaw_torque_nm", "yaw_rate_deg_per_s", "yaw_angle_deg"]);
        sb.Append(string.Join(',', header)).Append('\n');
        for (int i = 0; i < trace.TimeS.Count; i++)
        {
            var row = new List<string> { F(trace.TimeS[i]) };
            for (int j = 0; j < n; j++)
            {
                row.Add(F(Units.RadPerSToRpm(trace.SpeedRadPerS[j][i])));
                row.Add(F(trace.MotorCurrentA[j][i]));
            }
            row.Add(F(trace.GapM[i] * 1000));
            row.Add(F(trace.BusVoltageV[i]));
            row.Add(F(trace.PackCurrentA[i]));
            row.Add(F(trace.SocFraction[i] * 100));
            for (int j = 0; j < n; j++)
            {
                row.Add(F(trace.WindingTempC[j][i]));
                row.Add(F(trace.PlateTempC[j][i]));
            }
            row.Add(F(trace.YawTorqueNm[i]));
            row.Add(F(trace.YawRateRadPerS[i] * 180 / Math.PI));
            row.Add(F(trace.YawAngleRad[i] * 180 / Math.PI));
            sb.Append(string.Join(',', row)).Append('\n');
        }
        return sb.ToString();
    }

    private static string F(double v) => Files.Exports.CsvNumber.Format(v);
}

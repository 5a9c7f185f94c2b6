using System.Globalization;
using RotorDrive.Core;
using RotorDrive.Core.Safety;

namespace RotorDrive.Tui.Text;

/// <summary>One wording of a rotor's burst check for every sheet (Stations, Hover &amp; yaw, Spin-up): the verdict is
/// Core's <see cref="RotorSafetyResult.Passes"/>, never decided here.</summary>
public static class BurstText
{
    /// <summary>The check in one line: verdict first, then rotor, speed, ring stress against its allowable, margin and rim
    /// speed ("passes burst check, rotor r1 at 9000 rpm (rated): ring 120 MPa, allowed 300 MPa, margin 150 %, rim 85 m/s").</summary>
    /// <param name="result">Core's check.</param>
    /// <param name="where">What the speed is ("rated", "hover").</param>
    public static string Line(RotorSafetyResult result, string where)
    {
        ArgumentNullException.ThrowIfNull(result);
        string verdict = result.Passes switch
        {
            true => "passes",
            false => "! FAILS",
            null => "! not assessed:",
        };
        string at = $"burst check, rotor {result.RotorId} at {F(Units.RadPerSToRpm(result.SpeedRadPerS))} rpm ({where})";
        string rim = $"rim {F(result.RimSpeedMPerS)} m/s";
        string over = result.AboveRatedSpeed ? $", above its rated {F(Units.RadPerSToRpm(result.RatedSpeedRadPerS))} rpm" : "";
        return result.Assessment switch
        {
            RetainerAssessment.Assessed => $"{verdict} {at}: ring {Mpa(result.HoopStressPa)} MPa, allowed {Mpa(result.AllowablePa)} MPa, "
                + $"margin {Percent(result.MarginFraction!.Value)}, {rim}{over}",
            RetainerAssessment.NoAllowableStress => $"{verdict} {at}: ring {Mpa(result.HoopStressPa)} MPa, no allowable stress in the rotor row, {rim}{over}",
            _ => $"{verdict} {at}: ring stress not assessed (the rotor row gives no retainer thickness), {rim}{over}",
        };
    }

    /// <summary>A margin as a whole per cent ("150 %", "-12 %").</summary>
    public static string Percent(double fraction) => (fraction * 100).ToString("F0", CultureInfo.InvariantCulture) + " %";

    private static string Mpa(double? pa) => pa is { } v ? (v / 1e6).ToString("F0", CultureInfo.InvariantCulture) : "n/a";

    private static string F(double v) => v.ToString("F0", CultureInfo.InvariantCulture);
}

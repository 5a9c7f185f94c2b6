using System.Globalization;

namespace RotorDrive.Core.Safety;

/// <summary>The one wording of a rotor's burst check that the command line and every workbench sheet print: the verdict
/// is <see cref="RotorSafetyResult.Passes"/>, never decided by the caller, and the figures are in rpm, MPa, % and m/s.</summary>
public static class RotorSafetyText
{
    /// <summary>The check in one line (two at 80 columns): verdict first, then rotor, speed, ring stress of its allowable,
    /// margin and rim speed ("passes burst check: rotor r1 at 9000 rpm (rated), ring 120 of 300 MPa, margin 150 %, rim
    /// 85 m/s"), and, when it passes with a margin under the burst caution's threshold, that it does ("caution: under
    /// 50 %").</summary>
    /// <param name="result">Core's check.</param>
    /// <param name="where">What the speed is ("rated", "hover").</param>
    /// <param name="thresholds">The caution thresholds; <see cref="CautionThresholds.Default"/> when null.</param>
    /// <returns>The line.</returns>
    /// <exception cref="ArgumentNullException">A null result or place.</exception>
    public static string Line(RotorSafetyResult result, string where, CautionThresholds? thresholds = null)
    {
        ArgumentNullException.ThrowIfNull(result);
        ArgumentNullException.ThrowIfNull(where);
        double asked = (thresholds ?? CautionThresholds.Default).BurstMargin;
        string verdict = result.Passes switch
        {
            true => "passes burst check",
            false => "! FAILS burst check",
            null => "! burst check not assessed",
        };
        string at = $"rotor {result.RotorId} at {Rpm(result.SpeedRadPerS)} rpm ({where})";
        string rim = $"rim {F0(result.RimSpeedMPerS)} m/s";
        string over = result.AboveRatedSpeed ? $", above its rated {Rpm(result.RatedSpeedRadPerS)} rpm" : "";
        string thin = result.Passes == true && result.MarginFraction < asked ? $" (caution: under {Percent(asked)})" : "";
        return result.Assessment switch
        {
            RetainerAssessment.Assessed => $"{verdict}: {at}, ring {Mpa(result.HoopStressPa)} of {Mpa(result.AllowablePa)} MPa, "
                + $"margin {Percent(result.MarginFraction!.Value)}{thin}, {rim}{over}",
            RetainerAssessment.NoAllowableStress => $"{verdict}: {at}, ring {Mpa(result.HoopStressPa)} MPa, no allowable stress in the rotor row, {rim}{over}",
            _ => $"{verdict}: {at}, ring stress not assessed (the rotor row gives no retainer thickness), {rim}{over}",
        };
    }

    /// <summary>A margin as a whole per cent ("150 %", "-12 %").</summary>
    /// <param name="fraction">The margin as a fraction.</param>
    /// <returns>The text.</returns>
    public static string Percent(double fraction) => (fraction * 100).ToString("F0", CultureInfo.InvariantCulture) + " %";

    private static string Rpm(double radPerS) => F0(Units.RadPerSToRpm(radPerS));

    private static string Mpa(double? pa) => pa is { } v ? (v / 1e6).ToString("F0", CultureInfo.InvariantCulture) : "n/a";

    private static string F0(double v) => v.ToString("F0", CultureInfo.InvariantCulture);
}

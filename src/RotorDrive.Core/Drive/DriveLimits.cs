namespace RotorDrive.Core.Drive;

/// <summary>Names and units of <see cref="DriveLimit"/> values for tables and JSON.</summary>
public static class DriveLimits
{
    /// <summary>A stable snake_case key, e.g. "controller_continuous_current".</summary>
    /// <param name="limit">The limit.</param>
    public static string Key(this DriveLimit limit) => limit switch
    {
        DriveLimit.MotorCurrent => "motor_current",
        DriveLimit.MotorPower => "motor_power",
        DriveLimit.ControllerContinuousCurrent => "controller_continuous_current",
        DriveLimit.ControllerBurstCurrent => "controller_burst_current",
        DriveLimit.ControllerErpm => "controller_erpm",
        DriveLimit.PackContinuousCurrent => "pack_continuous_current",
        DriveLimit.PackBurstCurrent => "pack_burst_current",
        DriveLimit.RotorMaxSpeed => "rotor_max_speed",
        DriveLimit.PackCutoffVoltage => "pack_cutoff_voltage",
        DriveLimit.DutyHeadroom => "duty_headroom",
        _ => throw new ArgumentOutOfRangeException(nameof(limit), limit, "Unknown limit."),
    };

    /// <summary>Words for people, e.g. "controller continuous current".</summary>
    /// <param name="limit">The limit.</param>
    public static string Describe(this DriveLimit limit) => limit.Key().Replace('_', ' ');

    /// <summary>The unit people read this limit in: rpm for the rotor speed, % for the duty, otherwise
    /// <see cref="Unit"/>.</summary>
    /// <param name="limit">The limit.</param>
    public static string UserUnit(this DriveLimit limit) => limit switch
    {
        DriveLimit.RotorMaxSpeed => "rpm",
        DriveLimit.DutyHeadroom => "%",
        _ => limit.Unit(),
    };

    /// <summary>A value of this limit (in <see cref="Unit"/>) converted to <see cref="UserUnit"/>.</summary>
    /// <param name="limit">The limit.</param>
    /// <param name="valueSi">The value in <see cref="Unit"/>.</param>
    public static double ToUserUnit(this DriveLimit limit, double valueSi) => limit switch
    {
        DriveLimit.RotorMaxSpeed => Units.RadPerSToRpm(valueSi),
        DriveLimit.DutyHeadroom => valueSi * 100,
        _ => valueSi,
    };

    /// <summary>A margin in words and user units: "rotor max speed 5210 rpm exceeds the allowed 5000 rpm" (upper limits)
    /// or "pack cutoff voltage 38.2 V is below the allowed 39.6 V" (lower limits).</summary>
    /// <param name="margin">The margin.</param>
    public static string Sentence(this LimitMargin margin)
    {
        var limit = margin.Limit;
        string unit = limit.UserUnit();
        string value = limit.ToUserUnit(margin.ValueSi).ToString("0.###", System.Globalization.CultureInfo.InvariantCulture);
        string allowed = limit.ToUserUnit(margin.AllowedSi).ToString("0.###", System.Globalization.CultureInfo.InvariantCulture);
        string verb = margin.IsLowerBound ? "is below" : "exceeds";
        return $"{limit.Describe()} {value} {unit} {verb} the allowed {allowed} {unit}";
    }

    /// <summary>The unit of <see cref="LimitMargin.ValueSi"/> and <see cref="LimitMargin.AllowedSi"/> for this limit.</summary>
    /// <param name="limit">The limit.</param>
    public static string Unit(this DriveLimit limit) => limit switch
    {
        DriveLimit.MotorCurrent or DriveLimit.ControllerContinuousCurrent or DriveLimit.ControllerBurstCurrent
            or DriveLimit.PackContinuousCurrent or DriveLimit.PackBurstCurrent => "A",
        DriveLimit.MotorPower => "W",
        DriveLimit.ControllerErpm => "erpm",
        DriveLimit.RotorMaxSpeed => "rad/s",
        DriveLimit.PackCutoffVoltage => "V",
        DriveLimit.DutyHeadroom => "1",
        _ => throw new ArgumentOutOfRangeException(nameof(limit), limit, "Unknown limit."),
    };
}

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

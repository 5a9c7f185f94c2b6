namespace RotorDrive.Core.Drive;

/// <summary>A steady throttle for one rotor: an open-loop duty or a speed to hold.</summary>
/// <param name="Kind">Duty or speed hold.</param>
/// <param name="Value">The duty (0..1) or the speed to hold (rad/s, greater than 0).</param>
public readonly record struct ThrottleCommand(ThrottleKind Kind, double Value)
{
    /// <summary>An open-loop duty.</summary>
    /// <param name="duty">Duty, 0..1.</param>
    /// <exception cref="ArgumentOutOfRangeException">The duty is outside [0, 1].</exception>
    public static ThrottleCommand Duty(double duty) => new(ThrottleKind.Duty, Preconditions.InRange(duty, 0, 1, nameof(duty)));

    /// <summary>A speed to hold, rad/s.</summary>
    /// <param name="speedRadPerS">Shaft speed, rad/s, greater than 0.</param>
    /// <exception cref="ArgumentOutOfRangeException">The speed is not finite and positive.</exception>
    public static ThrottleCommand HoldSpeed(double speedRadPerS) => new(ThrottleKind.HoldSpeed, Preconditions.Positive(speedRadPerS, nameof(speedRadPerS)));

    /// <summary>A speed to hold, given in rpm.</summary>
    /// <param name="rpm">Shaft speed, rpm, greater than 0.</param>
    /// <exception cref="ArgumentOutOfRangeException">The speed is not finite and positive.</exception>
    public static ThrottleCommand HoldRpm(double rpm) => HoldSpeed(Units.RpmToRadPerS(Preconditions.Positive(rpm, nameof(rpm))));
}

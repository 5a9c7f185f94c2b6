namespace RotorDrive.Core.Drive;

/// <summary>The command given to one speed controller at one instant: a duty or a motor current.</summary>
/// <param name="Kind">What is commanded.</param>
/// <param name="Value">The duty (0..1) or the motor current (A; negative asks for braking, honoured only with braking on).</param>
public readonly record struct DriveCommand(DriveCommandKind Kind, double Value)
{
    /// <summary>An open-loop duty command.</summary>
    /// <param name="duty">Duty, 0..1 (values above the drivetrain's max duty are held at it).</param>
    /// <exception cref="ArgumentOutOfRangeException">The duty is outside [0, 1].</exception>
    public static DriveCommand Duty(double duty) => new(DriveCommandKind.Duty, Preconditions.InRange(duty, 0, 1, nameof(duty)));

    /// <summary>A motor-current command.</summary>
    /// <param name="currentA">Motor current, A; the controller's current limit caps its magnitude.</param>
    /// <exception cref="ArgumentOutOfRangeException">The current is not finite.</exception>
    public static DriveCommand MotorCurrent(double currentA) => new(DriveCommandKind.MotorCurrent, Preconditions.Finite(currentA, nameof(currentA)));
}

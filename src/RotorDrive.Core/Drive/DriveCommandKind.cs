namespace RotorDrive.Core.Drive;

/// <summary>What a controller is told to regulate at one instant.</summary>
public enum DriveCommandKind
{
    /// <summary>Open-loop duty: the modulator runs at the commanded duty unless the current limit lowers it.</summary>
    Duty,

    /// <summary>Motor current: the controller sets the duty that gives this current, saturating at zero or max duty.
    /// A speed-holding controller settles at the current its load needs; torque modes and regulators use it directly.</summary>
    MotorCurrent,
}

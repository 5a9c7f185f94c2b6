namespace RotorDrive.Core.Drive;

/// <summary>A limit of motor, controller, pack or rotor that an operating point is checked against.</summary>
public enum DriveLimit
{
    /// <summary>Motor's maximum continuous current, A.</summary>
    MotorCurrent,

    /// <summary>Motor's maximum electrical input power, W.</summary>
    MotorPower,

    /// <summary>Controller's continuous phase current, A (may be exceeded for the burst time only).</summary>
    ControllerContinuousCurrent,

    /// <summary>Controller's burst phase current, A.</summary>
    ControllerBurstCurrent,

    /// <summary>Controller's largest electrical rpm.</summary>
    ControllerErpm,

    /// <summary>Pack bank's continuous discharge current (continuous C-rate x capacity), A.</summary>
    PackContinuousCurrent,

    /// <summary>Pack bank's burst discharge current (burst C-rate x capacity), A.</summary>
    PackBurstCurrent,

    /// <summary>Rotor's maximum rated speed, rad/s.</summary>
    RotorMaxSpeed,

    /// <summary>Loaded pack voltage against the cell cutoff voltage x series cells, V (a lower bound).</summary>
    PackCutoffVoltage,

    /// <summary>Duty against the team's duty headroom limit (control margin), dimensionless.</summary>
    DutyHeadroom,
}

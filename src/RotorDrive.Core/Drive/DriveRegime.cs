namespace RotorDrive.Core.Drive;

/// <summary>Which rule set a controller's motor current at the solved bus voltage.</summary>
public enum DriveRegime
{
    /// <summary>The command is met: the commanded duty is applied, or the commanded current is delivered.</summary>
    Regulating,

    /// <summary>The phase-current limit lowered the duty (or capped the commanded current) at +limit.</summary>
    CurrentLimit,

    /// <summary>Braking current held at -limit by raising the duty (braking on).</summary>
    BrakeCurrentLimit,

    /// <summary>The current command needs more duty than the controller has; it runs at max duty, or a duty command
    /// above max duty was held at it.</summary>
    MaxDuty,

    /// <summary>A braking current command beyond what shorting the motor gives; duty is 0 (braking on).</summary>
    ZeroDuty,

    /// <summary>Braking off and the command would need negative current: no current flows, the motor freewheels.</summary>
    Freewheel,

    /// <summary>The back-EMF exceeds what full duty can oppose: current flows back to the bus through the bridge
    /// (uncontrolled regeneration), duty is effectively 1.</summary>
    Rectifying,
}

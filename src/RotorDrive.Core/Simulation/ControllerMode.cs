namespace RotorDrive.Core.Simulation;

/// <summary>How the speed controllers follow the throttle during a transient.</summary>
public enum ControllerMode
{
    /// <summary>Open loop: the throttle is the PWM duty, 0..1; the controller lowers it only at its current limit.</summary>
    Duty,

    /// <summary>Speed hold: the throttle is a commanded shaft speed, rad/s; the controller sets the motor current to
    /// follow it (see <see cref="SpinupOptions.HoldBandwidthRadPerS"/>), up to its current limit.</summary>
    SpeedHold,
}

namespace RotorDrive.Core.Studies.Calibration;

/// <summary>Which kind of bench data a calibration was fitted to.</summary>
public enum CalibrationKind
{
    /// <summary>Steady points: torque (and optionally lift) at set speeds and gaps.</summary>
    SteadyPoints,

    /// <summary>A spin-down: speed against time after the power was cut.</summary>
    SpinDown,
}

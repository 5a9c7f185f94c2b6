namespace RotorDrive.Core.Studies.Stress;

/// <summary>A pass/fail criterion every stress sample is checked against.</summary>
public enum StressCriterion
{
    /// <summary>The craft lifts off within limits.liftoff_time_s.</summary>
    Liftoff,

    /// <summary>No rotor is left below its drag peak at its current limit when the spin-up ends (no rotor stalls).</summary>
    Stall,

    /// <summary>Peak currents within the motor and controller burst allowances and the pack's burst C-rate.</summary>
    Currents,

    /// <summary>The pack's loaded voltage stays above the cutoff (cells x limits.cell_cutoff_v).</summary>
    PackVoltage,

    /// <summary>A trimmed hover exists at the design gap within every limit.</summary>
    Trim,

    /// <summary>The yaw residual with equal duties is within limits.yaw_torque_nm and the trim can command that torque both
    /// ways within every limit (the yaw command's pass rule).</summary>
    Yaw,

    /// <summary>The magnet retaining ring's hoop stress at the hover speed is within its allowable.</summary>
    Retainer,
}

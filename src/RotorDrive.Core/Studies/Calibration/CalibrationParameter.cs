namespace RotorDrive.Core.Studies.Calibration;

/// <summary>The quantities a calibration fits, in the order results list them.</summary>
public enum CalibrationParameter
{
    /// <summary>Multiplier of the plate conductivity seen by the rotor (moves the drag peak in speed); dimensionless.</summary>
    ConductivityFactor,

    /// <summary>Multiplier of the source field (forces scale with its square); dimensionless.</summary>
    FieldFactor,

    /// <summary>Constant bearing drag torque, N m.</summary>
    BearingDrag,

    /// <summary>Viscous bearing drag, N m per rad/s.</summary>
    BearingDamping,
}

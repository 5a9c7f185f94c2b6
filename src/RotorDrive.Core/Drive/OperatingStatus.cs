namespace RotorDrive.Core.Drive;

/// <summary>How an operating-point search ended.</summary>
public enum OperatingStatus
{
    /// <summary>At least one equilibrium was found; all found are listed.</summary>
    Found,

    /// <summary>The motor's torque exceeds the load's over the whole range searched: the rotor runs away (a load model
    /// with no drag and a motor with no no-load loss); no equilibrium to report.</summary>
    NoEquilibrium,
}

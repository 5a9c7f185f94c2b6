namespace RotorDrive.Core.Studies.Calibration;

/// <summary>Why a calibration was refused (the model cannot be trusted with the data as given).</summary>
public enum CalibrationRefusal
{
    /// <summary>Not refused: the fit is usable.</summary>
    None,

    /// <summary>Too few points for the parameters fitted.</summary>
    TooFewPoints,

    /// <summary>The minimiser did not converge.</summary>
    NotConverged,

    /// <summary>The torque column is very likely in another unit (N cm, N mm, kgf cm).</summary>
    TorqueUnits,

    /// <summary>The lift column is very likely in another unit (kgf, gram-force).</summary>
    LiftUnits,

    /// <summary>The rotor's moment of inertia in the catalog is very likely wrong (or in another unit).</summary>
    Inertia,

    /// <summary>The fitted forces are far from what the rotor row can give: a wrong rotor row, plate or gap.</summary>
    ImplausibleFactor,

    /// <summary>The model's shape does not follow the data: the residuals are systematic, not noise.</summary>
    SystematicMisfit,

    /// <summary>A bearing term came out clearly negative, which no bearing does.</summary>
    NegativeBearing,
}

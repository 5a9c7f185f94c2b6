namespace RotorDrive.Core.Drive;

/// <summary>What a compatibility check found wrong with a motor, controller, pack and rotor combination.</summary>
public enum DriveFindingKind
{
    /// <summary>The pack's series cell count is outside the controller's rated range.</summary>
    CellsOutOfControllerRange,

    /// <summary>The station must turn its rotor both ways but the controller is not reversible.</summary>
    ControllerNotReversible,

    /// <summary>The controller cannot commutate this motor at the rotor's maximum rated speed (eRPM limit).</summary>
    ErpmBelowRotorMaxSpeed,

    /// <summary>With its load gone (rotor lifted off the plate) full duty would spin the rotor past its rated speed.</summary>
    FreeSpeedAboveRotorMax,
}

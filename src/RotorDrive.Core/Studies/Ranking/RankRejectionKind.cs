namespace RotorDrive.Core.Studies.Ranking;

/// <summary>Why a combination cannot fly the rig (or, for <see cref="ControllerNotReversible"/>, a caution).</summary>
public enum RankRejectionKind
{
    /// <summary>The pack's series cell count is outside the controller's rated range.</summary>
    CellsOutOfControllerRange,

    /// <summary>The controller is not reversible (rejects only when reversing is required by the options).</summary>
    ControllerNotReversible,

    /// <summary>No trim at the design gap within the rotors' rated speed: the rotors cannot lift this mass.</summary>
    RotorSpeed,

    /// <summary>At a trimmed hover speed a rotor's retaining ring is over its allowable hoop stress (the check the hover
    /// review fails with <c>retainer_stress</c>, <see cref="RotorDrive.Core.Safety.RotorSafety.Assess"/>).</summary>
    RetainerStress,

    /// <summary>The controller cannot commutate this motor at the hover speed (max eRPM / pole pairs below it).</summary>
    ControllerErpm,

    /// <summary>On a full pack the hover needs more duty than the team's limit, or the pack cannot deliver the hover
    /// power at all (its voltage would collapse): the motors cannot reach the hover speeds.</summary>
    DutyHeadroom,

    /// <summary>The loaded pack is below the cell cutoff voltage already on a full charge.</summary>
    PackCutoff,

    /// <summary>Hover motor current above the motor's continuous rating.</summary>
    MotorCurrent,

    /// <summary>Hover motor input power above the motor's rating.</summary>
    MotorPower,

    /// <summary>Hover phase current above the controller's continuous rating.</summary>
    ControllerCurrent,

    /// <summary>Pack current above the packs' continuous C-rate rating during the hover.</summary>
    PackCurrent,

    /// <summary>On the landing gear, the current-limited motor cannot push its rotor through the drag peak.</summary>
    DragPeak,

    /// <summary>Shortlisted, it fails the spin-up study or the hover review that the <c>spinup</c> and <c>hover</c> commands
    /// give (a stall, a late or missing lift-off, a controller or pack over its burst allowance, the pack below its cutoff,
    /// a hover limit or retaining ring); only the shortlist is checked (see <see cref="RankStudy.Run"/>).</summary>
    SpinupSimulation,
}

namespace RotorDrive.Core.Studies.Ranking;

/// <summary>Stable keys and short words for <see cref="RankRejectionKind"/> values.</summary>
public static class RankRejectionKinds
{
    /// <summary>Every kind, in the order reports list them.</summary>
    public static IReadOnlyList<RankRejectionKind> All { get; } = Enum.GetValues<RankRejectionKind>();

    /// <summary>A stable snake_case key, e.g. "drag_peak".</summary>
    /// <param name="kind">The kind.</param>
    /// <exception cref="ArgumentOutOfRangeException">Unknown kind.</exception>
    public static string Key(this RankRejectionKind kind) => kind switch
    {
        RankRejectionKind.CellsOutOfControllerRange => "cells_out_of_controller_range",
        RankRejectionKind.ControllerNotReversible => "controller_not_reversible",
        RankRejectionKind.RotorSpeed => "rotor_speed",
        RankRejectionKind.RetainerStress => Craft.HoverReview.RetainerStressKey,
        RankRejectionKind.ControllerErpm => "controller_erpm",
        RankRejectionKind.DutyHeadroom => "duty_headroom",
        RankRejectionKind.PackCutoff => "pack_cutoff",
        RankRejectionKind.MotorCurrent => "motor_current",
        RankRejectionKind.MotorPower => "motor_power",
        RankRejectionKind.ControllerCurrent => "controller_current",
        RankRejectionKind.PackCurrent => "pack_current",
        RankRejectionKind.DragPeak => "drag_peak",
        RankRejectionKind.SpinupSimulation => "spinup_simulation",
        _ => throw new ArgumentOutOfRangeException(nameof(kind), kind, "Unknown rejection kind."),
    };

    /// <summary>A short phrase for people, e.g. "cannot pass the drag peak on the landing gear".</summary>
    /// <param name="kind">The kind.</param>
    /// <exception cref="ArgumentOutOfRangeException">Unknown kind.</exception>
    public static string Describe(this RankRejectionKind kind) => kind switch
    {
        RankRejectionKind.CellsOutOfControllerRange => "pack cell count outside the controller's range",
        RankRejectionKind.ControllerNotReversible => "controller not reversible",
        RankRejectionKind.RotorSpeed => "rotors cannot lift the craft below their rated speed",
        RankRejectionKind.RetainerStress => "a retaining ring is over its allowable hoop stress at the hover speed",
        RankRejectionKind.ControllerErpm => "controller cannot commutate the hover speed (eRPM)",
        RankRejectionKind.DutyHeadroom => "cannot reach hover speed within the duty limit (Kv too low for the pack, or the pack sags)",
        RankRejectionKind.PackCutoff => "loaded pack below cutoff voltage on a full charge",
        RankRejectionKind.MotorCurrent => "hover current above the motor's rating",
        RankRejectionKind.MotorPower => "hover power above the motor's rating",
        RankRejectionKind.ControllerCurrent => "hover current above the controller's continuous rating",
        RankRejectionKind.PackCurrent => "pack current above its continuous C-rate rating",
        RankRejectionKind.DragPeak => "cannot pass the drag peak on the landing gear",
        RankRejectionKind.SpinupSimulation => "shortlisted, but fails the spin-up study or the hover review (as the spinup and hover commands give them)",
        _ => throw new ArgumentOutOfRangeException(nameof(kind), kind, "Unknown rejection kind."),
    };
}

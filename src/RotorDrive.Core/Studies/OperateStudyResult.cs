using RotorDrive.Core.Craft;
using RotorDrive.Core.Drive;
using RotorDrive.Core.Safety;

namespace RotorDrive.Core.Studies;

/// <summary>The outcome of an operating-point study (<see cref="OperateStudy.Run"/>).</summary>
/// <param name="Request">What was run.</param>
/// <param name="Station">The rig station (position, spin, rotor).</param>
/// <param name="Drive">The station's drive as analysed: drivetrain capped at the rig's max duty, pack bank, the load table
/// sized to every speed and gap the search visits, and the rig's station limits.</param>
/// <param name="Conditions">Gap, temperatures (windings and magnets at ambient, plate at the rig's plate temperature) and
/// state of charge.</param>
/// <param name="Point">Every equilibrium at the throttle asked for; with a sweep, at the rig's max duty.</param>
/// <param name="Sweep">With a sweep: one result per duty from 0 to the max duty; null otherwise.</param>
/// <param name="Map">The torque-speed map at the requested duties, or null when none were asked for.</param>
/// <param name="FailedCriteria">Every failed criterion as a key (<c>incompatible_parts</c>, <c>hold_not_met</c>,
/// <c>no_stable_point</c>, <c>stays_at_rest</c>, or a limit key such as <c>motor_current</c> exceeded at the point
/// reached from rest); empty when the point passes. A sweep fails only on <c>incompatible_parts</c>.</param>
/// <param name="LimitingConstraint">The limit closest to binding at the point reached from rest (its smallest margin),
/// the rule that stops a speed hold, or null when no point is reached.</param>
/// <param name="Cautions">The cautions for a spinning magnet rotor on a pack.</param>
public sealed record OperateStudyResult(
    OperateStudyRequest Request,
    Station Station,
    StationDrive Drive,
    OperatingConditions Conditions,
    OperatingPointResult Point,
    IReadOnlyList<OperatingPointResult>? Sweep,
    TorqueSpeedMap? Map,
    IReadOnlyList<string> FailedCriteria,
    string? LimitingConstraint,
    IReadOnlyList<Caution> Cautions)
{
    /// <summary>True when no criterion failed.</summary>
    public bool Passes => FailedCriteria.Count == 0;

    /// <summary>The gap analysed, m.</summary>
    public double GapM => Conditions.GapM;

    /// <summary>The torque-speed map at other duties (for a plot), over the same drive and conditions.</summary>
    /// <param name="duties">Duties, 0..1.</param>
    public TorqueSpeedMap MapAt(IReadOnlyList<double> duties) => TorqueSpeedMap.Compute(Drive, Conditions, duties);
}

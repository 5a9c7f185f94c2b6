namespace RotorDrive.Core.Drive;

/// <summary>Every equilibrium of one rotor at one throttle, with the compatibility findings and the search's bookkeeping.</summary>
/// <param name="Status">Whether equilibria were found.</param>
/// <param name="Throttle">The throttle searched.</param>
/// <param name="Equilibria">All equilibria, slowest first.</param>
/// <param name="Findings">Compatibility findings for the parts (errors first); empty when they fit.</param>
/// <param name="HoldMet">For a speed hold: true when the commanded speed is held within the controller's limits;
/// null for a duty throttle.</param>
/// <param name="HoldStoppedBy">For a speed hold that is not met: the rule that stops it (<see cref="DriveRegime.CurrentLimit"/>
/// or <see cref="DriveRegime.MaxDuty"/>); null otherwise.</param>
/// <param name="OpenCircuitVoltageV">Pack open-circuit voltage at the state of charge, V.</param>
/// <param name="SearchTopRadPerS">Highest speed searched, rad/s (above it the motor cannot drive the rotor).</param>
/// <param name="Evaluations">Torque-balance evaluations made (each one bus solve and one load evaluation).</param>
public sealed record OperatingPointResult(
    OperatingStatus Status,
    ThrottleCommand Throttle,
    IReadOnlyList<OperatingPoint> Equilibria,
    IReadOnlyList<DriveFinding> Findings,
    bool? HoldMet,
    DriveRegime? HoldStoppedBy,
    double OpenCircuitVoltageV,
    double SearchTopRadPerS,
    int Evaluations)
{
    /// <summary>True when no compatibility finding is an error.</summary>
    public bool Compatible => Findings.All(f => f.Severity != FindingSeverity.Error);

    /// <summary>The point a rotor reaches when started from rest at this throttle: the slowest stable equilibrium
    /// (the net torque is positive below it), or null when there is none.</summary>
    public OperatingPoint? ReachedFromRest => Equilibria.FirstOrDefault(e => e.Stable);
}

using System.Collections.Immutable;

namespace RotorDrive.Core.Numerics;

/// <summary>The outcome of one integration: where it stopped, why, and what it cost.</summary>
/// <param name="Status">Why the integration stopped.</param>
/// <param name="TimeS">The time reached, s: the end time, the located event time, or the last accepted time.</param>
/// <param name="State">A copy of the state at <paramref name="TimeS"/> (also written back into the caller's span).</param>
/// <param name="EventIndex">Index of the event function that fired when <paramref name="Status"/> is
/// <see cref="OdeStatus.EventHit"/>; otherwise null.</param>
/// <param name="StepsAccepted">Accepted steps.</param>
/// <param name="StepsRejected">Steps rejected by the error control (or for non-finite derivatives).</param>
/// <param name="Evaluations">Right-hand-side evaluations.</param>
/// <param name="NextStepS">The step size the controller would try next, s: a good
/// <see cref="DormandPrince45Options.InitialStepS"/> for a restart after an event.</param>
public sealed record OdeResult(
    OdeStatus Status,
    double TimeS,
    ImmutableArray<double> State,
    int? EventIndex,
    int StepsAccepted,
    int StepsRejected,
    int Evaluations,
    double NextStepS);

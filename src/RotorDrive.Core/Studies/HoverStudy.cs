using RotorDrive.Core.Craft;

namespace RotorDrive.Core.Studies;

/// <summary>The hover study, shared by the <c>hover</c> and <c>yaw</c> commands and the workbench's hover sheet: the
/// trimmed hover (or the gap at one common duty; for a guided rig the common duty that carries the weight at the gap,
/// with the loads its rails carry) reviewed against every limit with its rotor safety and cautions, and
/// optionally the payload capacity and the yaw balance.</summary>
/// <remarks>Trim: <see cref="HoverTrim"/> at the gap with zero net yaw torque; common duty: <see cref="CommonDutyHover"/>;
/// guided rig (<see cref="MountKind.Guided"/>): with a duty set on every station and no gap asked,
/// <see cref="CommonDutyHover.SolveDuties"/> (the gap is found), otherwise <see cref="CommonDutyHover.SolveAtGap"/> at the
/// gap; and <see cref="RailLoads"/>, no payload search and no yaw balance;
/// review: <see cref="HoverReview"/>; capacity: <see cref="HoverReview.PayloadCapacityKg"/>; yaw:
/// <see cref="YawBalance.Analyse"/>. The trim alone takes well under a millisecond; the capacity search and the yaw
/// balance take tens of trims, so the study reports progress and can be cancelled between its parts. Thread-safe.</remarks>
public static class HoverStudy
{
    /// <summary>Runs the study.</summary>
    /// <param name="model">The rig model.</param>
    /// <param name="request">What to run, or null for the trim at the design gap alone.</param>
    /// <param name="cancel">Cancels between the parts.</param>
    /// <param name="progress">Progress 0..1, or null.</param>
    /// <exception cref="ArgumentNullException"><paramref name="model"/> is null.</exception>
    /// <exception cref="ArgumentOutOfRangeException">A request value is out of range.</exception>
    /// <exception cref="OperationCanceledException">Cancelled.</exception>
    public static HoverStudyResult Run(RigModel model, HoverStudyRequest? request = null, CancellationToken cancel = default, IProgress<double>? progress = null)
    {
        Preconditions.NotNull(model, nameof(model));
        request ??= new HoverStudyRequest();
        if (request.PayloadKg is { } payload)
        {
            model = model.WithPayload(payload);
        }
        double gapM = Preconditions.Positive(request.GapM ?? model.DesignGapM, nameof(request.GapM));
        bool guided = model.Rig.Mount == MountKind.Guided;
        if (guided)
        {
            // The rails carry pitch, roll and yaw: no trim, so neither the trim's payload search nor the yaw balance.
            request = request with { PayloadCapacity = false, Yaw = false };
        }
        var review = request.CommonDuty is { } duty
            ? HoverReview.Of(model, CommonDutyHover.Solve(model, Preconditions.InRange(duty, double.Epsilon, 1, nameof(request.CommonDuty)), request.Options), request.Options)
            : guided
                ? HoverReview.Of(model, SteadyState.SetDuties(model.Rig) is { } set && request.GapM is null
                    ? CommonDutyHover.SolveDuties(model, set, request.Options)
                    : CommonDutyHover.SolveAtGap(model, gapM, request.Options), request.Options)
                : HoverReview.Trimmed(model, gapM, request.Options);
        var rails = guided ? RailLoads.Of(model, review.Hover) : null;
        progress?.Report(0.35);
        cancel.ThrowIfCancellationRequested();
        double? capacity = request.PayloadCapacity ? HoverReview.PayloadCapacityKg(model, gapM, request.Options) : null;
        progress?.Report(0.55);
        cancel.ThrowIfCancellationRequested();
        var yaw = request.Yaw ? YawBalance.Analyse(model, request.Options) : null;
        progress?.Report(1.0);
        return new HoverStudyResult(request, model, review, capacity, yaw, rails);
    }
}

using RotorDrive.Core.Craft;

namespace RotorDrive.Core.Studies;

/// <summary>The hover study, shared by the <c>hover</c> and <c>yaw</c> commands and the workbench's hover sheet: the
/// trimmed hover (or the gap at one common duty) reviewed against every limit with its rotor safety and cautions, and
/// optionally the payload capacity and the yaw balance.</summary>
/// <remarks>Trim: <see cref="HoverTrim"/> at the gap with zero net yaw torque; common duty: <see cref="CommonDutyHover"/>;
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
        var review = request.CommonDuty is { } duty
            ? HoverReview.Of(model, CommonDutyHover.Solve(model, Preconditions.InRange(duty, double.Epsilon, 1, nameof(request.CommonDuty)), request.Options), request.Options)
            : HoverReview.Trimmed(model, gapM, request.Options);
        progress?.Report(0.35);
        cancel.ThrowIfCancellationRequested();
        double? capacity = request.PayloadCapacity ? HoverReview.PayloadCapacityKg(model, gapM, request.Options) : null;
        progress?.Report(0.55);
        cancel.ThrowIfCancellationRequested();
        var yaw = request.Yaw ? YawBalance.Analyse(model, request.Options) : null;
        progress?.Report(1.0);
        return new HoverStudyResult(request, model, review, capacity, yaw);
    }
}

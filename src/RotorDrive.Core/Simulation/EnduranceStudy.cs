using RotorDrive.Core.Safety;

namespace RotorDrive.Core.Simulation;

/// <summary>The endurance study of a rig, shared by the <c>endurance</c> and <c>report</c> commands and the workbench's
/// endurance sheet: the rig's steady state (<see cref="Craft.SteadyState"/>: trimmed hover, guided hover or a bench's
/// stations) held (in place or on the rig's route) while the pack drains and sags and the
/// windings and the plate field heat, until the first limit, with the verdict and cautions.</summary>
/// <remarks>The simulation is <see cref="EnduranceSimulator.Run"/>; it takes from a fraction of a second to seconds, so
/// the study reports progress and is cancellable once per step. Passes when the pack ends the hover
/// (<see cref="EnduranceLimits.Passes(EnduranceLimit)"/>). Thread-safe.</remarks>
public static class EnduranceStudy
{
    /// <summary>Runs the study.</summary>
    /// <param name="rig">The prepared rig.</param>
    /// <param name="request">What to run, or null for <see cref="EnduranceStudyRequest.Default"/>.</param>
    /// <param name="cancel">Cancels the run (checked once per step).</param>
    /// <param name="progress">Progress 0..1, or null.</param>
    /// <exception cref="ArgumentNullException">The rig is null.</exception>
    /// <exception cref="ArgumentOutOfRangeException">A request value is out of range.</exception>
    /// <exception cref="OperationCanceledException">Cancelled.</exception>
    public static EnduranceStudyResult Run(SimulationRig rig, EnduranceStudyRequest? request = null, CancellationToken cancel = default, IProgress<double>? progress = null)
    {
        Preconditions.NotNull(rig, nameof(rig));
        request ??= EnduranceStudyRequest.Default;
        var run = EnduranceSimulator.Run(rig, request.SocFraction, request.Options, cancel, progress);
        progress?.Report(1.0);
        double? maxWinding = rig.Drivetrains.Select(d => d.Motor.MaxWindingTempC).Where(m => m is not null).Min();
        var cautions = Cautions.For(new CautionFindings(true, [], run.PeakPlateTempC, run.PeakWindingTempC, Craft.PlateAttraction.AtStandstill(rig.Model)));
        return new EnduranceStudyResult(request, run, rig.Rig.Limits.PlateTempC, rig.Rig.Limits.CellCutoffV * rig.Packs.CellsSeries, maxWinding, cautions, WindingText.Hottest(rig, run.PeakWindingTempC));
    }

    /// <summary>An ending as a snake_case key (<c>plate_temperature</c>, <c>usable_capacity</c>, ...).</summary>
    /// <param name="limit">The limit.</param>
    public static string Key(EnduranceLimit limit)
        => string.Concat(limit.ToString().Select((c, i) => char.IsUpper(c) && i > 0 ? "_" + char.ToLowerInvariant(c) : char.ToLowerInvariant(c).ToString()));
}

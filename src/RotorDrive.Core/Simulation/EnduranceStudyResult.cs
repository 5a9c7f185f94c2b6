using RotorDrive.Core.Safety;

namespace RotorDrive.Core.Simulation;

/// <summary>The outcome of an endurance study (<see cref="EnduranceStudy.Run"/>).</summary>
/// <param name="Request">What was run.</param>
/// <param name="Run">The run: runtime, the limit that ended it, traces, the plate field and its hot spot.</param>
/// <param name="PlateLimitC">The rig's plate temperature limit, C.</param>
/// <param name="PackCutoffV">The pack's cutoff voltage: cells in series x the rig's cell cutoff, V.</param>
/// <param name="MaxWindingTempC">The lowest winding temperature rating over the rig's motors, C, or null when no motor
/// gives one.</param>
/// <param name="HottestWindingText">The hottest winding in words (<see cref="WindingText.Hottest"/>): its temperature, or that
/// the windings are not modelled.</param>
/// <param name="Cautions">The cautions for hot plates and windings, packs, magnets and estimates.</param>
public sealed record EnduranceStudyResult(
    EnduranceStudyRequest Request,
    EnduranceResult Run,
    double PlateLimitC,
    double PackCutoffV,
    double? MaxWindingTempC,
    IReadOnlyList<Caution> Cautions,
    string HottestWindingText)
{
    /// <summary>Whether the run passes: it hovered and the pack ended it (<see cref="EnduranceLimits.Passes(EnduranceResult)"/>).</summary>
    public bool Passes => Run.Passes();

    /// <summary>The limit that ended the run, as a key (<c>usable_capacity</c>, <c>plate_temperature</c>, ...): the
    /// limiting constraint.</summary>
    public string LimitingConstraint => EnduranceStudy.Key(Run.FirstLimit);

    /// <summary>Every failed criterion as a key: the limit that ended the run when it is not the pack's, and
    /// <c>no_hover</c> when the craft never hovered; empty when the run passes.</summary>
    public IReadOnlyList<string> FailedCriteria => Passes ? [] : Run.RuntimeS > 0 ? [LimitingConstraint] : ["no_hover", LimitingConstraint];
}

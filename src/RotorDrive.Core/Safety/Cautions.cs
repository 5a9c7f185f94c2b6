using System.Globalization;

namespace RotorDrive.Core.Safety;

/// <summary>The safety cautions and the rule that picks and emphasises them for a set of results.</summary>
/// <remarks>Every report shows the strong-magnet, rotor-burst, hot-surface and estimates cautions, and the lithium
/// caution when the rig carries a pack. A caution becomes a <see cref="CautionLevel.Warning"/> when the results put
/// its hazard in play: a retainer margin below <see cref="CautionThresholds.BurstMargin"/>, a rotor whose retainer
/// could not be assessed, or a speed above a rotor's rating (burst); a plate or winding temperature above
/// <see cref="CautionThresholds.HotSurfaceC"/> (hot surfaces). A plate on steel always adds the steel-under-plate warning
/// with its standstill pull (<see cref="SteelUnderPlate"/>). Warnings come first; the estimates caution is always
/// last.</remarks>
public static class Cautions
{
    private static readonly Caution Magnets = new(CautionTopic.StrongMagnets, CautionLevel.Notice, "Strong magnets",
        "Rotor magnets pull steel tools and each other together with crushing force. Handle one rotor at a time, keep "
        + "fingers out of closing gaps, and store rotors with spacers. Keep anyone with a pacemaker or another implanted "
        + "medical device well away, and keep cards, magnetic media and instruments at a distance.", null);

    private static readonly Caution Burst = new(CautionTopic.RotorBurst, CautionLevel.Notice, "Rotor burst",
        "A rotor that fails at speed throws magnet and ring fragments outward with great energy. Keep everyone out of "
        + "the plane of the rotors while they turn, fit guards or containment sized for the rim speed, and never run a "
        + "rotor above its rated speed. Sintered magnets are brittle and weak in tension: the retaining ring must carry "
        + "their load.", null);

    private static readonly Caution Packs = new(CautionTopic.LithiumPacks, CautionLevel.Notice, "Lithium packs",
        "Lithium packs can burn violently when damaged, short-circuited, over-charged or over-discharged. Charge them "
        + "under supervision on a non-flammable surface with a charger set for their chemistry and cell count, store "
        + "them partly charged in a fire-resistant container, and retire packs that swell or are damaged.", null);

    private static readonly Caution Hot = new(CautionTopic.HotSurfaces, CautionLevel.Notice, "Hot surfaces",
        "Eddy currents heat the plate under the rotors and load heats the motor windings; both can burn skin. Let them "
        + "cool before touching, and keep flammable material off the plate.", null);

    private static readonly Caution Steel = new(CautionTopic.SteelUnderPlate, CautionLevel.Warning, "Steel under the plate",
        "The plate lies on steel: with the rotors stopped or slow, the magnets' attraction to the steel pulls the craft down "
        + "onto the plate (the eddy currents screen it only as the rotors speed up). Never land the rig with the rotors "
        + "stopped over a steel-backed floor without a mechanical stop that holds the gap, and keep fingers and feet out "
        + "from under the craft.", null);

    private static readonly Caution Estimates = new(CautionTopic.EstimatesOnly, CautionLevel.Notice, "Estimates only",
        "RotorDrive's figures are engineering estimates from simplified models. They do not replace local codes and "
        + "regulations, the ratings of your parts' manufacturers, or review by qualified, licensed practitioners; where "
        + "they differ, those take precedence.", null);

    /// <summary>Every caution at notice level, in topic order (the steel-under-plate one as the general advice, without figures).</summary>
    public static IReadOnlyList<Caution> All { get; } = [Magnets, Burst, Packs, Hot, Steel with { Level = CautionLevel.Notice }, Estimates];

    /// <summary>The cautions that apply to a set of results, raised to warnings where the results call for it.</summary>
    /// <param name="findings">The analysis figures.</param>
    /// <param name="thresholds">When to raise a warning; null for <see cref="CautionThresholds.Default"/>.</param>
    /// <returns>Warnings first, then notices, each in topic order, the estimates caution last.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="findings"/> is null.</exception>
    public static IReadOnlyList<Caution> For(CautionFindings findings, CautionThresholds? thresholds = null)
    {
        Preconditions.NotNull(findings, nameof(findings));
        var limits = thresholds ?? CautionThresholds.Default;
        var chosen = new List<Caution> { Magnets, Raise(Burst, BurstReason(findings.Rotors, limits)) };
        if (findings.HasPack)
        {
            chosen.Add(Packs);
        }
        chosen.Add(Raise(Hot, HotReason(findings, limits)));
        if (findings.SteelUnderPlate is { } steel)
        {
            chosen.Add(SteelUnderPlate(steel));
        }
        return
        [
            .. chosen.Where(c => c.Level == CautionLevel.Warning),
            .. chosen.Where(c => c.Level == CautionLevel.Notice),
            Estimates,
        ];
    }

    /// <summary>The steel-under-plate warning with the standstill pull as its reason.</summary>
    /// <param name="attraction">The pull (for a rig, <see cref="Craft.PlateAttraction.AtStandstill"/>).</param>
    /// <exception cref="ArgumentNullException"><paramref name="attraction"/> is null.</exception>
    public static Caution SteelUnderPlate(SteelAttraction attraction)
    {
        Preconditions.NotNull(attraction, nameof(attraction));
        string gap = (attraction.GapM * 1000.0).ToString("0.#", CultureInfo.InvariantCulture);
        string pull = attraction.PullDownN.ToString("0", CultureInfo.InvariantCulture);
        string reason = attraction.WeightN is { } weight && weight > 0
            ? $"at standstill the rotors pull the craft down with {pull} N at the landed gap of {gap} mm ({(attraction.PullDownN / weight).ToString("0.00", CultureInfo.InvariantCulture)} times its weight)"
            : $"at standstill the rotor is pulled down with {pull} N at a {gap} mm gap";
        return Steel with { Reason = reason };
    }

    private static Caution Raise(Caution caution, string? reason)
        => reason is null ? caution : caution with { Level = CautionLevel.Warning, Reason = reason };

    private static string? BurstReason(IReadOnlyList<RotorSafetyResult> rotors, CautionThresholds limits)
    {
        var reasons = new List<string>();
        foreach (var r in Preconditions.NotNull(rotors, nameof(rotors)))
        {
            string rpm = F0(Units.RadPerSToRpm(r.SpeedRadPerS));
            if (r.AboveRatedSpeed)
            {
                reasons.Add($"rotor {r.RotorId} runs at {rpm} rpm, above its rated {F0(Units.RadPerSToRpm(r.RatedSpeedRadPerS))} rpm");
            }
            switch (r.Assessment)
            {
                case RetainerAssessment.NoRetainerThickness:
                    reasons.Add($"rotor {r.RotorId}: retainer not assessed (no retainer thickness in its catalog row)");
                    break;
                case RetainerAssessment.NoAllowableStress:
                    reasons.Add($"rotor {r.RotorId}: retainer margin not assessed (no allowable stress in its catalog row)");
                    break;
                default:
                    if (r.MarginFraction is { } margin && margin < limits.BurstMargin)
                    {
                        reasons.Add($"rotor {r.RotorId}: retaining-ring margin {RotorSafetyText.Percent(margin)} at {rpm} rpm "
                            + $"is under the {RotorSafetyText.Percent(limits.BurstMargin)} asked for");
                    }
                    break;
            }
        }
        return reasons.Count == 0 ? null : string.Join("; ", reasons);
    }

    private static string? HotReason(CautionFindings findings, CautionThresholds limits)
    {
        var reasons = new List<string>();
        if (findings.MaxPlateTempC is { } plate && plate > limits.HotSurfaceC)
        {
            reasons.Add($"plate reaches {F0(plate)} C, above {F0(limits.HotSurfaceC)} C");
        }
        if (findings.MaxWindingTempC is { } winding && winding > limits.HotSurfaceC)
        {
            reasons.Add($"motor windings reach {F0(winding)} C, above {F0(limits.HotSurfaceC)} C");
        }
        return reasons.Count == 0 ? null : string.Join("; ", reasons);
    }

    private static string F0(double value) => value.ToString("0", CultureInfo.InvariantCulture);
}

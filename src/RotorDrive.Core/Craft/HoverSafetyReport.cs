using RotorDrive.Core.Safety;

namespace RotorDrive.Core.Craft;

/// <summary>Rotor safety for a hover state and the cautions to show with it.</summary>
/// <param name="AtHover">Each station's rotor at its hover speed (rim speed, retainer hoop stress, margin).</param>
/// <param name="AtMaxRpm">Each distinct rotor design at its rated max_rpm.</param>
/// <param name="MagnetNote">The note on sintered NdFeB's low tensile strength.</param>
/// <param name="Cautions">The cautions, warnings first.</param>
public sealed record HoverSafetyReport(
    IReadOnlyList<RotorSafetyResult> AtHover,
    IReadOnlyList<RotorSafetyResult> AtMaxRpm,
    string MagnetNote,
    IReadOnlyList<Caution> Cautions)
{
    /// <summary>The largest retainer hoop stress at hover, Pa, or null when no rotor could be assessed.</summary>
    public double? MaxHoverStressPa => AtHover.Max(r => r.HoopStressPa);

    /// <summary>The smallest retainer margin (allowable / stress - 1) at hover, or null when none was assessed.</summary>
    public double? MinHoverMargin => AtHover.Min(r => r.MarginFraction);

    /// <summary>The smallest retainer margin at rated speed, or null when none was assessed.</summary>
    public double? MinMaxRpmMargin => AtMaxRpm.Min(r => r.MarginFraction);

    /// <summary>The highest rim speed at hover, m/s, or null when no station turns.</summary>
    public double? MaxHoverRimSpeedMPerS => AtHover.Count > 0 ? AtHover.Max(r => r.RimSpeedMPerS) : null;

    /// <summary>The highest rim speed of a rotor design at its rated speed, m/s, or null when there is none.</summary>
    public double? MaxRatedRimSpeedMPerS => AtMaxRpm.Count > 0 ? AtMaxRpm.Max(r => r.RimSpeedMPerS) : null;

    /// <summary>The rotor closest to failing at hover (<see cref="Worst"/>), or null when no station turns.</summary>
    public RotorSafetyResult? WorstAtHover => Worst(AtHover);

    /// <summary>The rotor design closest to failing at its rated speed (<see cref="Worst"/>), or null when there is none.</summary>
    public RotorSafetyResult? WorstAtMaxRpm => Worst(AtMaxRpm);

    /// <summary>The one rule for the retaining ring to show: a failed check first, then the smallest margin, then one
    /// whose margin could not be assessed (the highest stress among those first).</summary>
    /// <param name="rotors">The checks.</param>
    /// <returns>The worst check, or null when there is none.</returns>
    public static RotorSafetyResult? Worst(IEnumerable<RotorSafetyResult> rotors)
        => Preconditions.NotNull(rotors, nameof(rotors))
            .OrderBy(x => x.Passes == false ? 0 : x.MarginFraction is null ? 2 : 1)
            .ThenBy(x => x.MarginFraction ?? double.MaxValue)
            .ThenByDescending(x => x.HoopStressPa ?? double.MinValue)
            .FirstOrDefault();

    /// <summary>Whether a retainer is over its allowable stress at hover speed or a rotor runs above its rated speed.</summary>
    public bool Fails => AtHover.Any(r => r.Passes == false);
}

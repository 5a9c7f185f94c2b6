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

    /// <summary>Whether a retainer is over its allowable stress at hover speed or a rotor runs above its rated speed.</summary>
    public bool Fails => AtHover.Any(r => r.Passes == false);
}

namespace RotorDrive.Core.Safety;

/// <summary>The figures from an analysis that decide which cautions apply and how strongly.</summary>
/// <param name="HasPack">Whether the rig carries a lithium pack (adds the pack caution).</param>
/// <param name="Rotors">Burst checks of the rotors at the speeds the analysis reached (may be empty).</param>
/// <param name="MaxPlateTempC">Highest plate temperature reached, C, or null when not computed.</param>
/// <param name="MaxWindingTempC">Highest motor winding temperature reached, C, or null when not computed.</param>
/// <param name="SteelUnderPlate">The standstill pull of a steel-backed plate (<see cref="Craft.PlateAttraction"/>), or null
/// when the plate has no steel under it.</param>
public sealed record CautionFindings(
    bool HasPack,
    IReadOnlyList<RotorSafetyResult> Rotors,
    double? MaxPlateTempC = null,
    double? MaxWindingTempC = null,
    SteelAttraction? SteelUnderPlate = null);

using RotorDrive.Core.Drive;
using RotorDrive.Core.Magnetics;

namespace RotorDrive.Core.Craft;

/// <summary>Every part a shop stocks, as read and validated from its catalog files.</summary>
/// <param name="Motors">Brushless motors.</param>
/// <param name="Controllers">Speed controllers (ESCs).</param>
/// <param name="Packs">Battery packs.</param>
/// <param name="CellCurves">Open-circuit voltage curves, one per chemistry.</param>
/// <param name="Rotors">Magnet rotor designs.</param>
/// <param name="Plates">Plate materials.</param>
public sealed record PartsCatalog(
    IReadOnlyList<Motor> Motors,
    IReadOnlyList<SpeedController> Controllers,
    IReadOnlyList<BatteryPack> Packs,
    IReadOnlyList<CellCurve> CellCurves,
    IReadOnlyList<RotorDesign> Rotors,
    IReadOnlyList<PlateMaterial> Plates)
{
    /// <summary>The open-circuit voltage curve for a chemistry, or null when the catalog has none.</summary>
    public CellCurve? CurveFor(string chemistry)
        => CellCurves.FirstOrDefault(c => string.Equals(c.Chemistry, chemistry, StringComparison.OrdinalIgnoreCase));
}

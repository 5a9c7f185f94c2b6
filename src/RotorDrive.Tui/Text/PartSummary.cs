using System.Globalization;
using RotorDrive.Core;
using RotorDrive.Core.Craft;

namespace RotorDrive.Tui.Text;

/// <summary>A one-line summary of a catalog part for the pickers, in the units of the catalogs ("Kv 90, 45 A, 1050 W,
/// 1050 g"), so a part can be chosen without opening the Parts sheet.</summary>
public static class PartSummary
{
    /// <summary>The summary of the part with this id (motor, controller, pack, rotor or plate material, in that order of
    /// lookup), or "" when no part has it.</summary>
    /// <param name="catalog">The catalogs.</param>
    /// <param name="id">The part's id.</param>
    public static string Of(PartsCatalog catalog, string id)
    {
        ArgumentNullException.ThrowIfNull(catalog);
        if (catalog.Motors.FirstOrDefault(m => m.Id == id) is { } m)
        {
            return $"Kv {F(Units.RadPerSToRpm(m.KvRadPerSPerV), 0)}, {F(m.MaxCurrentA, 0)} A, {F(m.MaxPowerW, 0)} W, {F(m.MassKg * 1000, 0)} g";
        }
        if (catalog.Controllers.FirstOrDefault(c => c.Id == id) is { } c)
        {
            return $"{F(c.ContinuousCurrentA, 0)} A ({F(c.BurstCurrentA, 0)} A for {F(c.BurstDurationS, 0)} s), {c.MinCells}-{c.MaxCells} S, {F(c.MassKg * 1000, 0)} g";
        }
        if (catalog.Packs.FirstOrDefault(p => p.Id == id) is { } p)
        {
            return $"{p.CellsSeries}S{p.CellsParallel}P {p.Chemistry}, {F(p.CellCapacityAh * p.CellsParallel, 1)} Ah, {F(p.ContinuousC, 0)} C, {F(p.MassKg, 2)} kg";
        }
        if (catalog.Rotors.FirstOrDefault(r => r.Id == id) is { } r)
        {
            return $"{F(r.OuterRadiusM * 1000, 0)} mm outer radius, {r.Segments} segments, {F(Units.RadPerSToRpm(r.MaxSpeedRadPerS), 0)} rpm max, {F(r.RotorMassKg, 2)} kg";
        }
        if (catalog.Plates.FirstOrDefault(x => x.Id == id) is { } plate)
        {
            return $"{F(plate.ConductivitySPerM / 1e6, 1)} MS/m at 20 C";
        }
        return "";
    }

    private static string F(double v, int decimals) => v.ToString("F" + decimals.ToString(CultureInfo.InvariantCulture), CultureInfo.InvariantCulture);
}

using RotorDrive.Core.Studies.Stress;
using RotorDrive.Files.Rigs;

namespace RotorDrive.Tui.Session;

/// <summary>The editable spreads of the rig file's "tolerances" section: one field per key of
/// <see cref="RigToleranceKeys"/>, holding the spread as <see cref="ToleranceText"/>.</summary>
public static class ToleranceFields
{
    /// <summary>Every tolerance field, in the rig file's key order.</summary>
    public static IReadOnlyList<FieldSpec> All { get; } = RigToleranceKeys.All.Select(k => Field(k.Key, k.Quantity)).ToArray();

    /// <summary>The quantity of each field of <see cref="All"/>, same order.</summary>
    public static IReadOnlyList<StressQuantity> Quantities { get; } = RigToleranceKeys.All.Select(k => k.Quantity).ToArray();

    private static FieldSpec Field(string key, StressQuantity quantity)
    {
        var (label, unit) = Words(quantity);
        return new FieldSpec(label, unit, "$.tolerances." + key,
            d => ToleranceText.Format(d.Tolerances?.Entries.GetValueOrDefault(key)),
            (d, text) =>
            {
                if (!ToleranceText.TryParse(text, out var entry, out string? why))
                {
                    return why;
                }
                var section = d.Tolerances ??= new RigTolerancesSection();
                if (entry is null)
                {
                    section.Entries.Remove(key);
                }
                else
                {
                    section.Entries[key] = entry;
                }
                return null;
            });
    }

    // Labels of at most 16 characters; units are those of the key's absolute spreads.
    private static (string Label, string Unit) Words(StressQuantity quantity) => quantity switch
    {
        StressQuantity.MotorKv => ("motor Kv", "rpm/V"),
        StressQuantity.MotorResistance => ("motor resistance", "ohm"),
        StressQuantity.MotorNoLoadCurrent => ("no-load current", "A"),
        StressQuantity.ControllerCurrentLimit => ("controller limit", "A"),
        StressQuantity.MagnetRemanence => ("magnet remanence", "T"),
        StressQuantity.GapOffset => ("gap offset", "mm"),
        StressQuantity.PlateThickness => ("plate thickness", "mm"),
        StressQuantity.PlateConductivity => ("plate conduct.", "MS/m"),
        StressQuantity.AmbientTemperature => ("ambient", "C"),
        StressQuantity.PlateTemperature => ("plate temp", "C"),
        StressQuantity.PackStateOfCharge => ("pack charge", "% pt"),
        StressQuantity.PackResistance => ("pack resistance", "mOhm"),
        StressQuantity.Payload => ("payload", "kg"),
        StressQuantity.CgOffsetX => ("CG x offset", "mm"),
        StressQuantity.CgOffsetY => ("CG y offset", "mm"),
        _ => (quantity.ToString(), ""),
    };
}

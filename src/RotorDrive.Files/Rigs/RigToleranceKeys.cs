using RotorDrive.Core.Studies.Stress;

namespace RotorDrive.Files.Rigs;

/// <summary>The keys of the rig file's "tolerances" section: one per <see cref="StressQuantity"/>, named with the unit
/// of its absolute spreads ("normal_sd", "uniform"), and the factor that converts that unit to SI.</summary>
public static class RigToleranceKeys
{
    /// <summary>Every key in writing order, with its quantity and its file-unit-to-SI factor.</summary>
    public static IReadOnlyList<(string Key, StressQuantity Quantity, double ToSi)> All { get; } =
    [
        ("motor_kv_rpm_per_v", StressQuantity.MotorKv, Math.PI / 30.0),
        ("motor_resistance_ohm", StressQuantity.MotorResistance, 1.0),
        ("motor_no_load_current_a", StressQuantity.MotorNoLoadCurrent, 1.0),
        ("controller_current_limit_a", StressQuantity.ControllerCurrentLimit, 1.0),
        ("magnet_remanence_t", StressQuantity.MagnetRemanence, 1.0),
        ("gap_offset_mm", StressQuantity.GapOffset, 1e-3),
        ("plate_thickness_mm", StressQuantity.PlateThickness, 1e-3),
        ("plate_conductivity_ms_per_m", StressQuantity.PlateConductivity, 1e6),
        ("ambient_c", StressQuantity.AmbientTemperature, 1.0),
        ("plate_temperature_c", StressQuantity.PlateTemperature, 1.0),
        ("pack_soc_pct", StressQuantity.PackStateOfCharge, 0.01),
        ("pack_resistance_mohm", StressQuantity.PackResistance, 1e-3),
        ("payload_kg", StressQuantity.Payload, 1.0),
        ("cg_x_mm", StressQuantity.CgOffsetX, 1e-3),
        ("cg_y_mm", StressQuantity.CgOffsetY, 1e-3),
    ];

    /// <summary>The keys in writing order.</summary>
    public static IReadOnlyList<string> Keys { get; } = All.Select(k => k.Key).ToArray();

    /// <summary>The keys of one entry.</summary>
    public static IReadOnlyList<string> EntryKeys { get; } = ["normal_sd_pct", "normal_sd", "uniform_pct", "uniform"];

    /// <summary>The unit a key's absolute spreads and its messages are in, read from the key's suffix ("mm", "rpm/V").</summary>
    /// <param name="key">A key of <see cref="Keys"/>.</param>
    public static string UnitOf(string key) => key switch
    {
        _ when key.EndsWith("_rpm_per_v", StringComparison.Ordinal) => "rpm/V",
        _ when key.EndsWith("_mohm", StringComparison.Ordinal) => "mOhm",
        _ when key.EndsWith("_ohm", StringComparison.Ordinal) => "ohm",
        _ when key.EndsWith("_ms_per_m", StringComparison.Ordinal) => "MS/m",
        _ when key.EndsWith("_mm", StringComparison.Ordinal) => "mm",
        _ when key.EndsWith("_pct", StringComparison.Ordinal) => "%",
        _ when key.EndsWith("_kg", StringComparison.Ordinal) => "kg",
        _ when key.EndsWith("_a", StringComparison.Ordinal) => "A",
        _ when key.EndsWith("_t", StringComparison.Ordinal) => "T",
        _ when key.EndsWith("_c", StringComparison.Ordinal) => "C",
        _ => "",
    };

    /// <summary>The file key of a quantity.</summary>
    public static string KeyOf(StressQuantity quantity) => All.First(k => k.Quantity == quantity).Key;
}

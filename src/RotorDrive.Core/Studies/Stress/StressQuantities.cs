namespace RotorDrive.Core.Studies.Stress;

/// <summary>Facts about each <see cref="StressQuantity"/>: whether it is drawn per station, its stable key and its unit.</summary>
public static class StressQuantities
{
    /// <summary>Every quantity in draw order.</summary>
    public static IReadOnlyList<StressQuantity> All { get; } = Enum.GetValues<StressQuantity>();

    /// <summary>The per-station quantities in draw order.</summary>
    public static IReadOnlyList<StressQuantity> PerStation { get; } = All.Where(IsPerStation).ToArray();

    /// <summary>The rig-wide quantities in draw order.</summary>
    public static IReadOnlyList<StressQuantity> RigWide { get; } = All.Where(q => !IsPerStation(q)).ToArray();

    /// <summary>True when every station draws its own value of the quantity.</summary>
    /// <param name="quantity">The quantity.</param>
    public static bool IsPerStation(this StressQuantity quantity) => quantity <= StressQuantity.GapOffset;

    /// <summary>True when the nominal value is zero or on an interval scale (offsets, temperatures, state of charge), so
    /// that a spread in percent of nominal means nothing and only absolute spreads are accepted.</summary>
    /// <param name="quantity">The quantity.</param>
    public static bool IsAbsoluteOnly(this StressQuantity quantity) => quantity is StressQuantity.GapOffset
        or StressQuantity.AmbientTemperature or StressQuantity.PlateTemperature or StressQuantity.PackStateOfCharge
        or StressQuantity.CgOffsetX or StressQuantity.CgOffsetY;

    /// <summary>True for a physically positive quantity: drawn values are kept above zero (see <see cref="Tolerance"/>).</summary>
    /// <param name="quantity">The quantity.</param>
    public static bool IsPositive(this StressQuantity quantity) => quantity is StressQuantity.MotorKv or StressQuantity.MotorResistance
        or StressQuantity.ControllerCurrentLimit or StressQuantity.MagnetRemanence or StressQuantity.PlateThickness
        or StressQuantity.PlateConductivity or StressQuantity.PackResistance;

    /// <summary>A stable snake_case key for tables, JSON and CSV, e.g. "motor_kv".</summary>
    /// <param name="quantity">The quantity.</param>
    public static string Key(this StressQuantity quantity) => quantity switch
    {
        StressQuantity.MotorKv => "motor_kv",
        StressQuantity.MotorResistance => "motor_resistance",
        StressQuantity.MotorNoLoadCurrent => "motor_no_load_current",
        StressQuantity.ControllerCurrentLimit => "controller_current_limit",
        StressQuantity.MagnetRemanence => "magnet_remanence",
        StressQuantity.GapOffset => "gap_offset",
        StressQuantity.PlateThickness => "plate_thickness",
        StressQuantity.PlateConductivity => "plate_conductivity",
        StressQuantity.AmbientTemperature => "ambient",
        StressQuantity.PlateTemperature => "plate_temperature",
        StressQuantity.PackStateOfCharge => "pack_soc",
        StressQuantity.PackResistance => "pack_resistance",
        StressQuantity.Payload => "payload",
        StressQuantity.CgOffsetX => "cg_x",
        StressQuantity.CgOffsetY => "cg_y",
        _ => throw new ArgumentOutOfRangeException(nameof(quantity), quantity, "Unknown quantity."),
    };

    /// <summary>Words for people, e.g. "motor Kv", "pack state of charge".</summary>
    /// <param name="quantity">The quantity.</param>
    public static string Words(this StressQuantity quantity) => quantity switch
    {
        StressQuantity.MotorKv => "motor Kv",
        StressQuantity.PackStateOfCharge => "pack state of charge",
        StressQuantity.AmbientTemperature => "ambient temperature",
        StressQuantity.CgOffsetX => "CG forward x",
        StressQuantity.CgOffsetY => "CG left y",
        _ => quantity.Key().Replace('_', ' '),
    };

    /// <summary>The SI unit drawn values are in (Core works in SI), e.g. "rad/s/V".</summary>
    /// <param name="quantity">The quantity.</param>
    public static string SiUnit(this StressQuantity quantity) => quantity switch
    {
        StressQuantity.MotorKv => "rad/s/V",
        StressQuantity.MotorResistance or StressQuantity.PackResistance => "ohm",
        StressQuantity.MotorNoLoadCurrent or StressQuantity.ControllerCurrentLimit => "A",
        StressQuantity.MagnetRemanence => "T",
        StressQuantity.GapOffset or StressQuantity.PlateThickness or StressQuantity.CgOffsetX or StressQuantity.CgOffsetY => "m",
        StressQuantity.PlateConductivity => "S/m",
        StressQuantity.AmbientTemperature or StressQuantity.PlateTemperature => "C",
        StressQuantity.PackStateOfCharge => "1",
        StressQuantity.Payload => "kg",
        _ => throw new ArgumentOutOfRangeException(nameof(quantity), quantity, "Unknown quantity."),
    };
}

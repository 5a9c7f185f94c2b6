namespace RotorDrive.Files.Catalogs;

/// <summary>The catalog file formats (immutable, shared).</summary>
public static class CatalogFormats
{
    /// <summary>motors.csv.</summary>
    public static MotorFormat Motors { get; } = new();

    /// <summary>controllers.csv.</summary>
    public static ControllerFormat Controllers { get; } = new();

    /// <summary>packs.csv.</summary>
    public static PackFormat Packs { get; } = new();

    /// <summary>cell_curves.csv.</summary>
    public static CellCurveFormat CellCurves { get; } = new();

    /// <summary>rotors.csv.</summary>
    public static RotorFormat Rotors { get; } = new();

    /// <summary>plates.csv.</summary>
    public static PlateFormat Plates { get; } = new();
}

namespace RotorDrive.Files.Catalogs;

/// <summary>Where the six catalog files are (paths as they should appear in problems).</summary>
public sealed record CatalogPaths(string Motors, string Controllers, string Packs, string CellCurves, string Rotors, string Plates)
{
    /// <summary>The six files with their usual names in one folder.</summary>
    public static CatalogPaths InFolder(string folder) => new(
        Path.Combine(folder, CatalogFormats.Motors.FileName),
        Path.Combine(folder, CatalogFormats.Controllers.FileName),
        Path.Combine(folder, CatalogFormats.Packs.FileName),
        Path.Combine(folder, CatalogFormats.CellCurves.FileName),
        Path.Combine(folder, CatalogFormats.Rotors.FileName),
        Path.Combine(folder, CatalogFormats.Plates.FileName));

    /// <summary>The path of one kind's file.</summary>
    public string For(PartKind kind) => kind switch
    {
        PartKind.Motor => Motors,
        PartKind.Controller => Controllers,
        PartKind.Pack => Packs,
        PartKind.CellCurve => CellCurves,
        PartKind.Rotor => Rotors,
        _ => Plates,
    };
}

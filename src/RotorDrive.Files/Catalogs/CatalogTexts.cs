namespace RotorDrive.Files.Catalogs;

/// <summary>The text of the six catalog files, already read (for in-memory use and tests).</summary>
public sealed record CatalogTexts(string Motors, string Controllers, string Packs, string CellCurves, string Rotors, string Plates);

namespace RotorDrive.Files.Catalogs;

/// <summary>One row of cell_curves.csv: a point of a chemistry's open-circuit voltage curve, in the file's units.</summary>
/// <param name="Chemistry">Chemistry name, as used by packs.csv.</param>
/// <param name="SocPct">State of charge, percent (0..100).</param>
/// <param name="OcvV">Open-circuit voltage of one cell, V.</param>
public sealed record CellCurvePoint(string Chemistry, double SocPct, double OcvV);

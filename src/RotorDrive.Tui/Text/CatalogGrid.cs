namespace RotorDrive.Tui.Text;

/// <summary>A catalog's valid rows as text cells under its column names, for showing as a table.</summary>
/// <param name="Headers">The column names.</param>
/// <param name="Rows">The data rows, one cell per column.</param>
public sealed record CatalogGrid(IReadOnlyList<string> Headers, IReadOnlyList<IReadOnlyList<string>> Rows);

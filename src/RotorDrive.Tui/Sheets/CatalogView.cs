using System.Globalization;
using RotorDrive.Files;
using RotorDrive.Files.Catalogs;
using RotorDrive.Tui.Text;

namespace RotorDrive.Tui.Sheets;

/// <summary>One catalog file read for display: its valid rows in the file's own columns and units, filtered and sorted.</summary>
internal static class CatalogView
{
    /// <summary>The catalogs in the order the parts sheet lists them, with each one's reader.</summary>
    public static IReadOnlyList<(string Name, PartKind Kind)> Kinds { get; } =
    [
        ("motors", PartKind.Motor),
        ("controllers", PartKind.Controller),
        ("packs", PartKind.Pack),
        ("rotors", PartKind.Rotor),
        ("plates", PartKind.Plate),
        ("cell curves", PartKind.CellCurve),
    ];

    /// <summary>Reads a catalog file's valid rows as text cells (the file's columns, formatted by its catalog format).</summary>
    public static CatalogGrid Read(PartKind kind, string text, string path, out int problemCount)
    {
        switch (kind)
        {
            case PartKind.Motor:
                return Grid(CatalogFormats.Motors, text, path, out problemCount);
            case PartKind.Controller:
                return Grid(CatalogFormats.Controllers, text, path, out problemCount);
            case PartKind.Pack:
                return Grid(CatalogFormats.Packs, text, path, out problemCount);
            case PartKind.Rotor:
                return Grid(CatalogFormats.Rotors, text, path, out problemCount);
            case PartKind.Plate:
                return Grid(CatalogFormats.Plates, text, path, out problemCount);
            default:
                return Grid(CatalogFormats.CellCurves, text, path, out problemCount);
        }
    }

    /// <summary>Rows whose any cell contains the filter text (case-insensitive), sorted by a column (numbers as numbers).</summary>
    public static IReadOnlyList<IReadOnlyList<string>> FilterAndSort(CatalogGrid grid, string filter, int sortColumn, bool descending)
    {
        IEnumerable<IReadOnlyList<string>> rows = grid.Rows;
        string f = filter.Trim();
        if (f.Length > 0)
        {
            rows = rows.Where(r => r.Any(c => c.Contains(f, StringComparison.OrdinalIgnoreCase)));
        }
        if (sortColumn >= 0 && sortColumn < grid.Headers.Count)
        {
            string Cell(IReadOnlyList<string> r) => sortColumn < r.Count ? r[sortColumn] : "";
            bool numeric = grid.Rows.All(r => Cell(r).Length == 0 || double.TryParse(Cell(r), NumberStyles.Float, CultureInfo.InvariantCulture, out _));
            rows = numeric
                ? rows.OrderBy(r => double.TryParse(Cell(r), NumberStyles.Float, CultureInfo.InvariantCulture, out double v) ? v : double.MaxValue)
                : rows.OrderBy(Cell, NaturalOrder.Instance);
            if (descending)
            {
                rows = rows.Reverse();
            }
        }
        return rows.ToList();
    }

    private static CatalogGrid Grid<T>(CatalogFormat<T> format, string text, string path, out int problemCount) where T : notnull
    {
        var read = format.Read(text, path);
        problemCount = read.Problems.Count;
        var rows = format.Cells(read.Rows).Select(r => (IReadOnlyList<string>)r.Select(c => c ?? "").ToList()).ToList();
        return new CatalogGrid(format.Columns.Select(c => c.Name).ToList(), rows);
    }
}

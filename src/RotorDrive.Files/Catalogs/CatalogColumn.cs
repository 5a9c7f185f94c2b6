namespace RotorDrive.Files.Catalogs;

/// <summary>One column of a catalog file: its header name (with unit), kind, whether it is required and its range.</summary>
/// <param name="Name">Header name, lower case with the unit as suffix (e.g. "kv_rpm_per_v").</param>
/// <param name="Kind">What the column holds.</param>
/// <param name="Required">False for optional columns, which may be absent or left empty.</param>
/// <param name="Rule">The range each value must lie in (numeric columns).</param>
public sealed record CatalogColumn(string Name, ColumnKind Kind, bool Required, ValueRule Rule)
{
    /// <summary>A required text column.</summary>
    public static CatalogColumn Text(string name) => new(name, ColumnKind.Text, true, ValueRule.Any);

    /// <summary>An optional text column.</summary>
    public static CatalogColumn OptionalText(string name) => new(name, ColumnKind.Text, false, ValueRule.Any);

    /// <summary>A required real-number column.</summary>
    public static CatalogColumn Real(string name, ValueRule rule) => new(name, ColumnKind.Real, true, rule);

    /// <summary>An optional real-number column.</summary>
    public static CatalogColumn OptionalReal(string name, ValueRule rule) => new(name, ColumnKind.Real, false, rule);

    /// <summary>A required whole-number column.</summary>
    public static CatalogColumn Integer(string name, ValueRule rule) => new(name, ColumnKind.Integer, true, rule);

    /// <summary>A required true/false column.</summary>
    public static CatalogColumn Boolean(string name) => new(name, ColumnKind.Boolean, true, ValueRule.Any);
}

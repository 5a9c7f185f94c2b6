namespace RotorDrive.Files.Catalogs;

/// <summary>The kind of value a catalog column holds.</summary>
public enum ColumnKind
{
    /// <summary>Free text (ids, chemistry names).</summary>
    Text,

    /// <summary>A finite real number with invariant formatting (dot as decimal separator).</summary>
    Real,

    /// <summary>A whole number.</summary>
    Integer,

    /// <summary>true/false (also yes/no, 1/0).</summary>
    Boolean,
}

using RotorDrive.Core;
using RotorDrive.Core.Craft;

namespace RotorDrive.Files.Catalogs;

/// <summary>The parts read from a set of catalog files (valid rows only) and every problem found in them.</summary>
/// <param name="Catalog">The valid parts, in SI units.</param>
/// <param name="Paths">Where the files are (as named in problems).</param>
/// <param name="Problems">Every problem, file by file.</param>
/// <param name="Rejected">Ids of rows left out because of a problem, per kind (chemistries for cell curves).</param>
public sealed record CatalogLoadResult(
    PartsCatalog Catalog,
    CatalogPaths Paths,
    IReadOnlyList<InputProblem> Problems,
    IReadOnlyDictionary<PartKind, IReadOnlySet<string>> Rejected)
{
    /// <summary>True when every file was read without problems.</summary>
    public bool IsClean => Problems.Count == 0;

    /// <summary>Kinds whose file could not be read at all (already reported as a problem).</summary>
    public IReadOnlySet<PartKind> Unreadable { get; init; } = new HashSet<PartKind>();

    /// <summary>True when a row with this id was left out because of a problem, or its whole file could not be read:
    /// either way the problem is already reported, so a reference to the id is not reported again.</summary>
    public bool IsRejected(PartKind kind, string id)
        => Unreadable.Contains(kind) || (Rejected.TryGetValue(kind, out var ids) && ids.Contains(id));
}

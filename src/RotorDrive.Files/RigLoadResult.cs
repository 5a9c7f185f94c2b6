using RotorDrive.Core;
using RotorDrive.Core.Craft;
using RotorDrive.Core.Studies.Stress;
using RotorDrive.Files.Catalogs;
using RotorDrive.Files.Rigs;

namespace RotorDrive.Files;

/// <summary>Everything read for one rig file: the rig, its catalogs, the editable document and every problem.</summary>
/// <param name="RigPath">The rig file's path as given.</param>
/// <param name="Rig">The rig in SI units; null whenever <paramref name="Problems"/> is not empty.</param>
/// <param name="Catalog">The valid catalog rows (even when some rows or the rig have problems); null when the catalogs
/// could not be located.</param>
/// <param name="Document">The rig file's content as editable data; null when the file is missing or not a JSON object.</param>
/// <param name="Locations">Where each key of the rig file is.</param>
/// <param name="CatalogPaths">The catalog files the rig names, resolved against its folder; null when not located.</param>
/// <param name="Problems">Every problem in the rig file and its catalogs, in file order.</param>
public sealed record RigLoadResult(
    string RigPath,
    Rig? Rig,
    PartsCatalog? Catalog,
    RigDocument? Document,
    RigSourceMap Locations,
    CatalogPaths? CatalogPaths,
    IReadOnlyList<InputProblem> Problems)
{
    /// <summary>The part spreads of the rig file's "tolerances" section in SI units; <see cref="StressTolerances.None"/>
    /// when the section is absent or the file has problems.</summary>
    public StressTolerances Tolerances { get; init; } = StressTolerances.None;

    /// <summary>True when the rig loaded with no problem.</summary>
    public bool IsClean => Problems.Count == 0 && Rig is not null;
}

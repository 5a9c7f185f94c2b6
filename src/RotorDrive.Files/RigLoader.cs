using RotorDrive.Files.Catalogs;
using RotorDrive.Files.Rigs;

namespace RotorDrive.Files;

/// <summary>Loads a rig file with the catalogs it names, checking everything and collecting every problem.</summary>
public static class RigLoader
{
    /// <summary>Reads the rig file, its six catalogs, and resolves the rig. Never throws on bad input: missing files,
    /// syntax errors, unknown keys and bad values are all returned as problems.</summary>
    /// <param name="rigPath">Path of the rig JSON file; catalog paths inside it are relative to its folder.</param>
    public static RigLoadResult Load(string rigPath)
    {
        ArgumentNullException.ThrowIfNull(rigPath);
        var read = RigDocumentReader.ReadFile(rigPath);
        if (read.Document is null)
        {
            return new RigLoadResult(rigPath, null, null, null, read.Locations, null, read.Problems);
        }
        return Resolve(read.Document, rigPath, read.Locations, read.Problems);
    }

    /// <summary>Resolves an (edited) document as if it were saved at <paramref name="rigPath"/>: reads the catalogs it
    /// names and checks everything. Used by the terminal UI after edits.</summary>
    public static RigLoadResult Resolve(RigDocument document, string rigPath)
        => Resolve(document, rigPath, RigSourceMap.Empty, []);

    private static RigLoadResult Resolve(RigDocument document, string rigPath, RigSourceMap locations, IReadOnlyList<InputProblem> readProblems)
    {
        var problems = new List<InputProblem>(readProblems);
        var pathProblems = new List<InputProblem>();
        var paths = RigResolver.CatalogPathsOf(document, rigPath, locations, pathProblems);
        CatalogLoadResult? catalogs = paths is null ? null : CatalogLoader.Load(paths);
        var resolved = RigResolver.Resolve(document, catalogs, rigPath, locations);

        // A key the reader already rejected (wrong type, not finite) is absent from the document; the resolver would
        // call it missing, so only the reader's message is kept.
        var readFields = problems.Select(p => p.Field).ToHashSet(StringComparer.Ordinal);
        var resolvedProblems = resolved.Problems.Where(p => !readFields.Contains(p.Field));

        // Rig-file problems first in file order (syntax/type, missing catalog keys, values), then catalog problems.
        var rigProblems = problems.Concat(pathProblems.Where(p => !readFields.Contains(p.Field))).Concat(resolvedProblems)
            .Distinct()
            .OrderBy(p => p.Line).ThenBy(p => p.Column)
            .ToList();
        var all = rigProblems.Concat(catalogs?.Problems ?? []).ToList();
        var rig = all.Count == 0 ? resolved.Rig : null;
        return new RigLoadResult(rigPath, rig, catalogs?.Catalog, document, locations, paths, all)
        {
            Tolerances = rig is null ? Core.Studies.Stress.StressTolerances.None : resolved.Tolerances,
        };
    }
}

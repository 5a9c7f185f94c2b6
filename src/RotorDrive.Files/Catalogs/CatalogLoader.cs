using RotorDrive.Core;
using RotorDrive.Core.Craft;

namespace RotorDrive.Files.Catalogs;

/// <summary>Reads the six catalog files into a <see cref="PartsCatalog"/>, collecting every problem of every file.</summary>
public static class CatalogLoader
{
    /// <summary>Reads the files at the given paths; never throws on bad input (missing files are problems).</summary>
    public static CatalogLoadResult Load(CatalogPaths paths)
    {
        ArgumentNullException.ThrowIfNull(paths);
        var problems = new List<InputProblem>();
        string? Read(string path) => TextFiles.TryRead(path, problems);
        var texts = new CatalogTexts(
            Read(paths.Motors) ?? "", Read(paths.Controllers) ?? "", Read(paths.Packs) ?? "",
            Read(paths.CellCurves) ?? "", Read(paths.Rotors) ?? "", Read(paths.Plates) ?? "");
        var unreadable = problems.Select(p => p.File).ToHashSet(StringComparer.Ordinal);
        var result = FromTexts(texts, paths, skip: unreadable);
        var kinds = Enum.GetValues<PartKind>().Where(k => unreadable.Contains(paths.For(k))).ToHashSet();
        kinds.UnionWith(result.Unreadable);
        return result with { Problems = problems.Concat(result.Problems).ToList(), Unreadable = kinds };
    }

    /// <summary>Reads catalog texts already in memory; <paramref name="paths"/> name the files in problems.</summary>
    public static CatalogLoadResult FromTexts(CatalogTexts texts, CatalogPaths paths) => FromTexts(texts, paths, new HashSet<string>());

    private static CatalogLoadResult FromTexts(CatalogTexts texts, CatalogPaths paths, IReadOnlySet<string> skip)
    {
        ArgumentNullException.ThrowIfNull(texts);
        ArgumentNullException.ThrowIfNull(paths);
        var problems = new List<InputProblem>();
        var rejected = new Dictionary<PartKind, IReadOnlySet<string>>();
        var unusable = new HashSet<PartKind>();

        CatalogReadResult<T> Read<T>(CatalogFormat<T> format, string text, string path, PartKind kind) where T : notnull
        {
            var r = skip.Contains(path)
                ? new CatalogReadResult<T>([], [], [], new HashSet<string>(), new Dictionary<string, int>())
                : format.Read(text, path);
            problems.AddRange(r.Problems);
            rejected[kind] = r.RejectedIds;
            // A file with problems and no usable row (a wrong separator, a broken header) is reported once; the rig's
            // references into it are not reported again.
            if (r.Rows.Count == 0 && r.Problems.Count > 0)
            {
                unusable.Add(kind);
            }
            return r;
        }

        var motors = Read(CatalogFormats.Motors, texts.Motors, paths.Motors, PartKind.Motor);
        var controllers = Read(CatalogFormats.Controllers, texts.Controllers, paths.Controllers, PartKind.Controller);
        var packs = Read(CatalogFormats.Packs, texts.Packs, paths.Packs, PartKind.Pack);
        var curves = Read(CatalogFormats.CellCurves, texts.CellCurves, paths.CellCurves, PartKind.CellCurve);
        var rotors = Read(CatalogFormats.Rotors, texts.Rotors, paths.Rotors, PartKind.Rotor);
        var plates = Read(CatalogFormats.Plates, texts.Plates, paths.Plates, PartKind.Plate);

        var curveList = CellCurveFormat.ToCurves(curves.Rows);
        var chemistries = curveList.Select(c => c.Chemistry).ToHashSet(StringComparer.OrdinalIgnoreCase);
        var packRows = new List<PackRow>();
        var packRejected = new HashSet<string>(packs.RejectedIds, StringComparer.OrdinalIgnoreCase);
        bool curvesReadable = !skip.Contains(paths.CellCurves);
        for (int i = 0; i < packs.Rows.Count; i++)
        {
            var pack = packs.Rows[i];
            if (!chemistries.Contains(pack.Chemistry))
            {
                // A chemistry whose curve rows were rejected, or an unreadable curve file, is already reported.
                if (curvesReadable && !curves.RejectedIds.Contains(pack.Chemistry))
                {
                    problems.Add(new InputProblem(paths.Packs, packs.Lines[i], packs.ColumnNumber("chemistry"), "chemistry",
                        Messages.NoCurveForChemistry(pack.Chemistry, paths.CellCurves)));
                }
                packRejected.Add(pack.Id);
                continue;
            }
            packRows.Add(pack);
        }
        rejected[PartKind.Pack] = packRejected;

        var catalog = new PartsCatalog(
            motors.Rows.Select(r => r.ToMotor()).ToList(),
            controllers.Rows.Select(r => r.ToController()).ToList(),
            packRows.Select(r => r.ToPack()).ToList(),
            curveList,
            rotors.Rows.Select(r => r.ToRotor()).ToList(),
            plates.Rows.Select(r => r.ToMaterial()).ToList());
        return new CatalogLoadResult(catalog, paths, problems, rejected) { Unreadable = unusable };
    }
}

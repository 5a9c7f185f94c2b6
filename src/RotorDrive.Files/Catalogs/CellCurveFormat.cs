using RotorDrive.Core.Drive;

namespace RotorDrive.Files.Catalogs;

/// <summary>cell_curves.csv: open-circuit voltage versus state of charge, one block of rows per chemistry.</summary>
/// <remarks>Within a chemistry, soc_pct must strictly increase and ocv_v must not fall; each curve needs at least two
/// points.</remarks>
public sealed class CellCurveFormat : CatalogFormat<CellCurvePoint>
{
    /// <summary>Creates the format.</summary>
    public CellCurveFormat()
        : base(
        [
            CatalogColumn.Text("chemistry"),
            CatalogColumn.Real("soc_pct", ValueRule.Between(0, 100)),
            CatalogColumn.Real("ocv_v", ValueRule.Between(0.5, 5)),
        ])
    {
    }

    /// <inheritdoc/>
    public override string FileName => "cell_curves.csv";

    private protected override string? IdColumn => "chemistry";

    private protected override CellCurvePoint? ReadRow(CsvRowCursor row)
    {
        var chemistry = row.Text("chemistry");
        var soc = row.Real("soc_pct");
        var ocv = row.Real("ocv_v");
        return chemistry is null || soc is null || ocv is null ? null : new CellCurvePoint(chemistry, soc.Value, ocv.Value);
    }

    private protected override string?[] FormatRow(CellCurvePoint p) => [p.Chemistry, F(p.SocPct), F(p.OcvV)];

    private protected override List<(CellCurvePoint Row, int Line)> CheckTable(List<(CellCurvePoint Row, int Line)> rows,
        string file, Func<string, int> columnNumber, List<InputProblem> problems, HashSet<string> rejectedIds)
    {
        var kept = new List<(CellCurvePoint Row, int Line)>();
        var blocks = new List<List<(CellCurvePoint Row, int Line)>>();
        foreach (var row in rows)
        {
            if (blocks.Count > 0 && string.Equals(blocks[^1][0].Row.Chemistry, row.Row.Chemistry, StringComparison.OrdinalIgnoreCase))
            {
                blocks[^1].Add(row);
            }
            else
            {
                blocks.Add([row]);
            }
        }

        // A chemistry split over several blocks is reported once per extra block and left out as a whole.
        var split = new HashSet<string>(StringComparer.OrdinalIgnoreCase);
        var seen = new HashSet<string>(StringComparer.OrdinalIgnoreCase);
        foreach (var block in blocks)
        {
            string chemistry = block[0].Row.Chemistry;
            if (!seen.Add(chemistry))
            {
                problems.Add(new InputProblem(file, block[0].Line, columnNumber("chemistry"), "chemistry", Messages.CurveNotContiguous(chemistry)));
                split.Add(chemistry);
            }
        }

        foreach (var block in blocks)
        {
            string chemistry = block[0].Row.Chemistry;
            if (split.Contains(chemistry))
            {
                rejectedIds.Add(chemistry);
                continue;
            }
            bool ok = true;
            for (int j = 1; j < block.Count && ok; j++)
            {
                var (previous, current) = (block[j - 1].Row, block[j].Row);
                if (!(current.SocPct > previous.SocPct))
                {
                    problems.Add(new InputProblem(file, block[j].Line, columnNumber("soc_pct"), "soc_pct",
                        Messages.SocNotIncreasing(chemistry, previous.SocPct, current.SocPct)));
                    ok = false;
                }
                else if (current.OcvV < previous.OcvV)
                {
                    problems.Add(new InputProblem(file, block[j].Line, columnNumber("ocv_v"), "ocv_v",
                        Messages.OcvDecreasing(chemistry, previous.OcvV, current.OcvV)));
                    ok = false;
                }
            }
            // A curve that lost rows to other problems is incomplete; those problems are already reported.
            if (ok && rejectedIds.Contains(chemistry))
            {
                ok = false;
            }
            else if (ok && block.Count < 2)
            {
                problems.Add(new InputProblem(file, block[0].Line, columnNumber("chemistry"), "chemistry", Messages.CurveTooShort(chemistry, block.Count)));
                ok = false;
            }
            if (ok)
            {
                kept.AddRange(block);
            }
            else
            {
                rejectedIds.Add(chemistry);
            }
        }
        return kept;
    }

    /// <summary>Groups curve points into one <see cref="CellCurve"/> per chemistry (percent to fraction).</summary>
    public static IReadOnlyList<CellCurve> ToCurves(IEnumerable<CellCurvePoint> points)
        => points
            .GroupBy(p => p.Chemistry, StringComparer.OrdinalIgnoreCase)
            .Select(g => new CellCurve(g.Key, g.Select(p => p.SocPct / 100.0).ToList(), g.Select(p => p.OcvV).ToList()))
            .ToList();
}

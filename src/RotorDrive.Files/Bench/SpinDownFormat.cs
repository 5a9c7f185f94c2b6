using RotorDrive.Files.Catalogs;

namespace RotorDrive.Files.Bench;

/// <summary>Bench data as a spin-down trace: time_s, speed_rpm, optional gap_mm; times must increase row by row.</summary>
public sealed class SpinDownFormat : CatalogFormat<SpinDownRow>
{
    /// <summary>Creates the format.</summary>
    public SpinDownFormat()
        : base(
        [
            CatalogColumn.Real("time_s", ValueRule.Any),
            CatalogColumn.Real("speed_rpm", ValueRule.NonNegative),
            CatalogColumn.OptionalReal("gap_mm", ValueRule.Between(0, 200)),
        ])
    {
    }

    /// <inheritdoc/>
    public override string FileName => "spin-down.csv";

    private protected override string? IdColumn => null;

    private protected override SpinDownRow? ReadRow(CsvRowCursor row)
    {
        var time = row.Real("time_s");
        var speed = row.Real("speed_rpm");
        var gap = row.Real("gap_mm");
        return time is null || speed is null ? null : new SpinDownRow(time.Value, speed.Value, gap);
    }

    private protected override List<(SpinDownRow Row, int Line)> CheckTable(List<(SpinDownRow Row, int Line)> rows, string file,
        Func<string, int> columnNumber, List<InputProblem> problems, HashSet<string> rejectedIds)
    {
        for (int i = 1; i < rows.Count; i++)
        {
            if (!(rows[i].Row.TimeS > rows[i - 1].Row.TimeS))
            {
                problems.Add(new InputProblem(file, rows[i].Line, columnNumber("time_s"), "time_s", Messages.TimeNotIncreasing(rows[i - 1].Row.TimeS, rows[i].Row.TimeS)));
            }
        }
        return rows;
    }

    private protected override string?[] FormatRow(SpinDownRow r) => [F(r.TimeS), F(r.SpeedRpm), F(r.GapMm)];
}

using RotorDrive.Files.Catalogs;

namespace RotorDrive.Files.Bench;

/// <summary>Bench data as steady points: speed_rpm, gap_mm, torque_nm, optional lift_n and plate_temp_c.</summary>
public sealed class SteadyBenchFormat : CatalogFormat<SteadyBenchRow>
{
    /// <summary>Creates the format.</summary>
    public SteadyBenchFormat()
        : base(
        [
            CatalogColumn.Real("speed_rpm", ValueRule.NonNegative),
            CatalogColumn.Real("gap_mm", ValueRule.Between(0, 200)),
            CatalogColumn.Real("torque_nm", ValueRule.Any),
            CatalogColumn.OptionalReal("lift_n", ValueRule.Any),
            CatalogColumn.OptionalReal("plate_temp_c", ValueRule.Between(-40, 400)),
        ])
    {
    }

    /// <inheritdoc/>
    public override string FileName => "bench-points.csv";

    private protected override string? IdColumn => null;

    private protected override SteadyBenchRow? ReadRow(CsvRowCursor row)
    {
        var speed = row.Real("speed_rpm");
        var gap = row.Real("gap_mm");
        var torque = row.Real("torque_nm");
        var lift = row.Real("lift_n");
        var temp = row.Real("plate_temp_c");
        return speed is null || gap is null || torque is null ? null : new SteadyBenchRow(speed.Value, gap.Value, torque.Value, lift, temp);
    }

    private protected override string?[] FormatRow(SteadyBenchRow r) => [F(r.SpeedRpm), F(r.GapMm), F(r.TorqueNm), F(r.LiftN), F(r.PlateTempC)];
}

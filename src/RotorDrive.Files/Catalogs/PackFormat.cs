namespace RotorDrive.Files.Catalogs;

/// <summary>packs.csv: battery packs of identical cells.</summary>
public sealed class PackFormat : CatalogFormat<PackRow>
{
    /// <summary>Creates the format.</summary>
    public PackFormat()
        : base(
        [
            CatalogColumn.Text("id"),
            CatalogColumn.Text("chemistry"),
            CatalogColumn.Integer("cells_series", ValueRule.AtLeast(1, 200)),
            CatalogColumn.Integer("cells_parallel", ValueRule.AtLeast(1, 1000)),
            CatalogColumn.Real("cell_capacity_mah", ValueRule.PositiveAtMost(1e6)),
            CatalogColumn.Real("continuous_c", ValueRule.PositiveAtMost(1000)),
            CatalogColumn.Real("burst_c", ValueRule.PositiveAtMost(1000)),
            CatalogColumn.Real("cell_resistance_mohm", ValueRule.PositiveAtMost(10000)),
            CatalogColumn.Real("mass_g", ValueRule.PositiveAtMost(1e7)),
        ])
    {
    }

    /// <inheritdoc/>
    public override string FileName => "packs.csv";

    private protected override string? IdOf(PackRow row) => row.Id;

    private protected override PackRow? ReadRow(CsvRowCursor row)
    {
        var id = row.Text("id");
        var chemistry = row.Text("chemistry");
        var s = row.Integer("cells_series");
        var p = row.Integer("cells_parallel");
        var capacity = row.Real("cell_capacity_mah");
        var cont = row.Real("continuous_c");
        var burst = row.Real("burst_c");
        var resistance = row.Real("cell_resistance_mohm");
        var mass = row.Real("mass_g");
        if (burst is { } b && cont is { } c && b < c)
        {
            row.Report("burst_c", Messages.BurstBelowContinuous("continuous_c", b, c));
            return null;
        }
        if (id is null || chemistry is null || s is null || p is null || capacity is null || cont is null || burst is null
            || resistance is null || mass is null)
        {
            return null;
        }
        return new PackRow(id, chemistry, s.Value, p.Value, capacity.Value, cont.Value, burst.Value, resistance.Value, mass.Value);
    }

    private protected override string?[] FormatRow(PackRow p) =>
    [
        p.Id, p.Chemistry, F(p.CellsSeries), F(p.CellsParallel), F(p.CellCapacityMah), F(p.ContinuousC), F(p.BurstC),
        F(p.CellResistanceMohm), F(p.MassG),
    ];
}

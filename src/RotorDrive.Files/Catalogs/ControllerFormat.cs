namespace RotorDrive.Files.Catalogs;

/// <summary>controllers.csv: speed controllers (ESCs).</summary>
public sealed class ControllerFormat : CatalogFormat<ControllerRow>
{
    /// <summary>Creates the format.</summary>
    public ControllerFormat()
        : base(
        [
            CatalogColumn.Text("id"),
            CatalogColumn.Real("continuous_current_a", ValueRule.PositiveAtMost(10000)),
            CatalogColumn.Real("burst_current_a", ValueRule.PositiveAtMost(10000)),
            CatalogColumn.Real("burst_duration_s", ValueRule.NonNegativeAtMost(3600)),
            CatalogColumn.Integer("min_cells", ValueRule.AtLeast(1, 200)),
            CatalogColumn.Integer("max_cells", ValueRule.AtLeast(1, 200)),
            CatalogColumn.Real("on_resistance_mohm", ValueRule.NonNegativeAtMost(10000)),
            CatalogColumn.Real("idle_current_a", ValueRule.NonNegativeAtMost(100)),
            CatalogColumn.Real("max_erpm", ValueRule.PositiveAtMost(1e7)),
            CatalogColumn.Real("mass_g", ValueRule.PositiveAtMost(1e6)),
            CatalogColumn.Boolean("reversible"),
        ])
    {
    }

    /// <inheritdoc/>
    public override string FileName => "controllers.csv";

    private protected override string? IdOf(ControllerRow row) => row.Id;

    private protected override ControllerRow? ReadRow(CsvRowCursor row)
    {
        var id = row.Text("id");
        var cont = row.Real("continuous_current_a");
        var burst = row.Real("burst_current_a");
        var duration = row.Real("burst_duration_s");
        var minCells = row.Integer("min_cells");
        var maxCells = row.Integer("max_cells");
        var ron = row.Real("on_resistance_mohm");
        var idle = row.Real("idle_current_a");
        var erpm = row.Real("max_erpm");
        var mass = row.Real("mass_g");
        var reversible = row.Boolean("reversible");
        if (burst is { } b && cont is { } c && b < c)
        {
            row.Report("burst_current_a", Messages.BurstBelowContinuous("continuous_current_a", b, c));
            return null;
        }
        if (maxCells is { } hi && minCells is { } lo && hi < lo)
        {
            row.Report("max_cells", Messages.MaxCellsBelowMin(hi, lo));
            return null;
        }
        if (id is null || cont is null || burst is null || duration is null || minCells is null || maxCells is null
            || ron is null || idle is null || erpm is null || mass is null || reversible is null)
        {
            return null;
        }
        return new ControllerRow(id, cont.Value, burst.Value, duration.Value, minCells.Value, maxCells.Value, ron.Value,
            idle.Value, erpm.Value, mass.Value, reversible.Value);
    }

    private protected override string?[] FormatRow(ControllerRow c) =>
    [
        c.Id, F(c.ContinuousCurrentA), F(c.BurstCurrentA), F(c.BurstDurationS), F(c.MinCells), F(c.MaxCells),
        F(c.OnResistanceMohm), F(c.IdleCurrentA), F(c.MaxErpm), F(c.MassG), c.Reversible ? "true" : "false",
    ];
}

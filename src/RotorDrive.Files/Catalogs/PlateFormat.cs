namespace RotorDrive.Files.Catalogs;

/// <summary>plates.csv: non-magnetic conducting plate materials.</summary>
public sealed class PlateFormat : CatalogFormat<PlateRow>
{
    /// <summary>Creates the format.</summary>
    public PlateFormat()
        : base(
        [
            CatalogColumn.Text("id"),
            CatalogColumn.Real("conductivity_ms_per_m", ValueRule.Between(0.1, 70)),
            CatalogColumn.Real("temp_coeff_per_k", ValueRule.Between(-0.01, 0.01)),
            CatalogColumn.Real("density_kg_m3", ValueRule.PositiveAtMost(30000)),
            CatalogColumn.Real("specific_heat_j_per_kg_k", ValueRule.PositiveAtMost(10000)),
            CatalogColumn.OptionalReal("thermal_conductivity_w_per_m_k", ValueRule.Between(1, 1000)),
        ])
    {
    }

    /// <inheritdoc/>
    public override string FileName => "plates.csv";

    private protected override string? IdOf(PlateRow row) => row.Id;

    private protected override PlateRow? ReadRow(CsvRowCursor row)
    {
        var id = row.Text("id");
        var sigma = row.Real("conductivity_ms_per_m");
        var alpha = row.Real("temp_coeff_per_k");
        var density = row.Real("density_kg_m3");
        var heat = row.Real("specific_heat_j_per_kg_k");
        var thermal = row.Real("thermal_conductivity_w_per_m_k");
        if (id is null || sigma is null || alpha is null || density is null || heat is null)
        {
            return null;
        }
        return new PlateRow(id, sigma.Value, alpha.Value, density.Value, heat.Value) { ThermalConductivityWPerMK = thermal };
    }

    private protected override string?[] FormatRow(PlateRow p) =>
        [p.Id, F(p.ConductivityMsPerM), F(p.TempCoeffPerK), F(p.DensityKgM3), F(p.SpecificHeatJPerKgK), F(p.ThermalConductivityWPerMK)];
}

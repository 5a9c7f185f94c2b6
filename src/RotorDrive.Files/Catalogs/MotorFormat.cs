namespace RotorDrive.Files.Catalogs;

/// <summary>motors.csv: brushless motors with first-order model constants.</summary>
public sealed class MotorFormat : CatalogFormat<MotorRow>
{
    /// <summary>Creates the format.</summary>
    public MotorFormat()
        : base(
        [
            CatalogColumn.Text("id"),
            CatalogColumn.Real("kv_rpm_per_v", ValueRule.PositiveAtMost(10000)),
            CatalogColumn.Real("resistance_ohm", ValueRule.PositiveAtMost(1000)),
            CatalogColumn.Real("no_load_current_a", ValueRule.NonNegativeAtMost(1000)),
            CatalogColumn.Real("no_load_voltage_v", ValueRule.PositiveAtMost(1000)),
            CatalogColumn.Real("max_current_a", ValueRule.PositiveAtMost(10000)),
            CatalogColumn.Real("max_power_w", ValueRule.PositiveAtMost(1e6)),
            CatalogColumn.Integer("poles", ValueRule.AtLeast(2, 200)),
            CatalogColumn.Real("mass_g", ValueRule.PositiveAtMost(1e6)),
            CatalogColumn.OptionalReal("thermal_resistance_k_per_w", ValueRule.PositiveAtMost(100)),
            CatalogColumn.OptionalReal("thermal_time_constant_s", ValueRule.PositiveAtMost(1e5)),
            CatalogColumn.OptionalReal("max_winding_temp_c", ValueRule.Between(40, 250)),
        ])
    {
    }

    /// <inheritdoc/>
    public override string FileName => "motors.csv";

    private protected override string? IdOf(MotorRow row) => row.Id;

    private protected override MotorRow? ReadRow(CsvRowCursor row)
    {
        var id = row.Text("id");
        var kv = row.Real("kv_rpm_per_v");
        var r = row.Real("resistance_ohm");
        var i0 = row.Real("no_load_current_a");
        var v0 = row.Real("no_load_voltage_v");
        var imax = row.Real("max_current_a");
        var pmax = row.Real("max_power_w");
        var poles = row.Integer("poles");
        var mass = row.Real("mass_g");
        var rth = row.Real("thermal_resistance_k_per_w");
        var tau = row.Real("thermal_time_constant_s");
        var tmax = row.Real("max_winding_temp_c");
        if (poles is { } p && p % 2 != 0)
        {
            row.Report("poles", Messages.PolesMustBeEven(p));
            return null;
        }
        if (id is null || kv is null || r is null || i0 is null || v0 is null || imax is null || pmax is null || poles is null || mass is null)
        {
            return null;
        }
        return new MotorRow(id, kv.Value, r.Value, i0.Value, v0.Value, imax.Value, pmax.Value, poles.Value, mass.Value, rth, tau, tmax);
    }

    private protected override string?[] FormatRow(MotorRow m) =>
    [
        m.Id, F(m.KvRpmPerV), F(m.ResistanceOhm), F(m.NoLoadCurrentA), F(m.NoLoadVoltageV), F(m.MaxCurrentA), F(m.MaxPowerW),
        F(m.Poles), F(m.MassG), F(m.ThermalResistanceKPerW), F(m.ThermalTimeConstantS), F(m.MaxWindingTempC),
    ];
}

namespace RotorDrive.Files.Catalogs;

/// <summary>rotors.csv: magnet rotor designs (Halbach arrays, or alternating poles on a steel disc).</summary>
public sealed class RotorFormat : CatalogFormat<RotorRow>
{
    /// <summary>Creates the format.</summary>
    public RotorFormat()
        : base(
        [
            CatalogColumn.Text("id"),
            CatalogColumn.Integer("segments", ValueRule.AtLeast(2, 1000)),
            CatalogColumn.Integer("segments_per_wavelength", ValueRule.AtLeast(2, 64)),
            CatalogColumn.Real("inner_radius_mm", ValueRule.NonNegativeAtMost(2000)),
            CatalogColumn.Real("outer_radius_mm", ValueRule.PositiveAtMost(2000)),
            CatalogColumn.Real("magnet_thickness_mm", ValueRule.PositiveAtMost(200)),
            CatalogColumn.Real("remanence_t", ValueRule.Between(0.05, 1.6)),
            CatalogColumn.Real("remanence_temp_coeff_pct_per_k", ValueRule.Between(-1, 1)),
            CatalogColumn.OptionalReal("magnet_density_kg_m3", ValueRule.PositiveAtMost(20000)),
            CatalogColumn.Real("rotor_mass_g", ValueRule.PositiveAtMost(1e6)),
            CatalogColumn.Real("inertia_kg_m2", ValueRule.PositiveAtMost(1000)),
            CatalogColumn.Real("max_rpm", ValueRule.PositiveAtMost(200000)),
            CatalogColumn.OptionalReal("bearing_drag_nm", ValueRule.NonNegativeAtMost(1000)),
            CatalogColumn.OptionalReal("bearing_damping_nm_per_krpm", ValueRule.NonNegativeAtMost(1000)),
            CatalogColumn.OptionalReal("retainer_thickness_mm", ValueRule.PositiveAtMost(200)),
            CatalogColumn.OptionalReal("retainer_allowable_mpa", ValueRule.PositiveAtMost(10000)),
            CatalogColumn.OptionalText("array"),
            CatalogColumn.OptionalReal("magnet_arc_fraction", ValueRule.Between(0.3, 1)),
            CatalogColumn.OptionalReal("back_iron_mm", ValueRule.NonNegativeAtMost(200)),
        ])
    {
    }

    /// <inheritdoc/>
    public override string FileName => "rotors.csv";

    private protected override string? IdOf(RotorRow row) => row.Id;

    private protected override RotorRow? ReadRow(CsvRowCursor row)
    {
        var id = row.Text("id");
        var n = row.Integer("segments");
        var m = row.Integer("segments_per_wavelength");
        var ri = row.Real("inner_radius_mm");
        var ro = row.Real("outer_radius_mm");
        var h = row.Real("magnet_thickness_mm");
        var br = row.Real("remanence_t");
        var beta = row.Real("remanence_temp_coeff_pct_per_k");
        var density = row.Real("magnet_density_kg_m3");
        var mass = row.Real("rotor_mass_g");
        var inertia = row.Real("inertia_kg_m2");
        var maxRpm = row.Real("max_rpm");
        var bearing = row.Real("bearing_drag_nm");
        var damping = row.Real("bearing_damping_nm_per_krpm");
        var retainer = row.Real("retainer_thickness_mm");
        var allowable = row.Real("retainer_allowable_mpa");
        var array = row.Text("array")?.Trim();
        var arc = row.Real("magnet_arc_fraction");
        var backIron = row.Real("back_iron_mm");
        bool ok = true;
        bool alternating = string.Equals(array, "alternating", StringComparison.OrdinalIgnoreCase);
        if (array is not null && !alternating && !string.Equals(array, "halbach", StringComparison.OrdinalIgnoreCase))
        {
            row.Report("array", Messages.BadArray(array));
            ok = false;
        }
        if (alternating && m is { } perWavelength && perWavelength != 2)
        {
            row.Report("segments_per_wavelength", Messages.AlternatingNeedsTwoPerWavelength(perWavelength));
            ok = false;
        }
        if (!alternating && arc is { } fraction && fraction != 1.0)
        {
            row.Report("magnet_arc_fraction", Messages.ArcFractionOnlyForAlternating());
            ok = false;
        }
        if (n is { } segments && m is { } perWave && segments % perWave != 0)
        {
            row.Report("segments", Messages.SegmentsNotMultiple(segments, perWave));
            ok = false;
        }
        if (ri is { } inner && ro is { } outer && inner >= outer)
        {
            row.Report("inner_radius_mm", Messages.InnerRadiusNotBelowOuter(inner, outer));
            ok = false;
        }
        if (retainer is not null && allowable is null && !row.HasProblems)
        {
            row.Report("retainer_allowable_mpa", Messages.RetainerPairIncomplete("retainer_allowable_mpa"));
            ok = false;
        }
        if (allowable is not null && retainer is null && !row.HasProblems)
        {
            row.Report("retainer_thickness_mm", Messages.RetainerPairIncomplete("retainer_thickness_mm"));
            ok = false;
        }
        if (!ok || id is null || n is null || m is null || ri is null || ro is null || h is null || br is null || beta is null
            || mass is null || inertia is null || maxRpm is null)
        {
            return null;
        }
        return new RotorRow(id, n.Value, m.Value, ri.Value, ro.Value, h.Value, br.Value, beta.Value, density, mass.Value,
            inertia.Value, maxRpm.Value, bearing, damping, retainer, allowable)
        {
            Array = array is null ? null : array.ToLowerInvariant(),
            MagnetArcFraction = arc,
            BackIronMm = backIron,
        };
    }

    private protected override string?[] FormatRow(RotorRow r) =>
    [
        r.Id, F(r.Segments), F(r.SegmentsPerWavelength), F(r.InnerRadiusMm), F(r.OuterRadiusMm), F(r.MagnetThicknessMm),
        F(r.RemanenceT), F(r.RemanenceTempCoeffPctPerK), F(r.MagnetDensityKgM3), F(r.RotorMassG), F(r.InertiaKgM2),
        F(r.MaxRpm), F(r.BearingDragNm), F(r.BearingDampingNmPerKrpm), F(r.RetainerThicknessMm), F(r.RetainerAllowableMpa),
        r.Array, F(r.MagnetArcFraction), F(r.BackIronMm),
    ];
}

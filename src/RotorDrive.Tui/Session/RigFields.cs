using RotorDrive.Files.Rigs;

namespace RotorDrive.Tui.Session;

/// <summary>The editable values of the rig sheet, in groups, with the rig file's keys.</summary>
public static class RigFields
{
    /// <summary>The groups shown on the rig sheet: a heading and its fields.</summary>
    public static IReadOnlyList<(string Heading, IReadOnlyList<FieldSpec> Fields)> Groups { get; } =
    [
        ("Plate",
        [
            FieldSpec.Id("material", "$.plate.material", d => d.Plate?.Material, (d, v) => Plate(d).Material = v,
                c => c.Plates.Select(p => p.Id).ToList()),
            FieldSpec.Number("thickness", "mm", "$.plate.thickness_mm", d => d.Plate?.ThicknessMm, (d, v) => Plate(d).ThicknessMm = v),
            FieldSpec.Number("temperature", "C", "$.plate.temperature_c", d => d.Plate?.TemperatureC, (d, v) => Plate(d).TemperatureC = v),
        ]),
        ("Air gap and air",
        [
            FieldSpec.Number("design gap", "mm", "$.gap.design_mm", d => d.Gap?.DesignMm, (d, v) => Gap(d).DesignMm = v),
            FieldSpec.Number("landed gap", "mm", "$.gap.landed_mm", d => d.Gap?.LandedMm, (d, v) => Gap(d).LandedMm = v),
            FieldSpec.Number("ambient", "C", "$.ambient_c", d => d.AmbientC, (d, v) => d.AmbientC = v),
        ]),
        ("Craft",
        [
            FieldSpec.Number("empty mass", "kg", "$.craft.empty_mass_kg", d => d.Craft?.EmptyMassKg, (d, v) => Craft(d).EmptyMassKg = v),
            FieldSpec.Number("payload", "kg", "$.craft.payload_kg", d => d.Craft?.PayloadKg, (d, v) => Craft(d).PayloadKg = v),
            FieldSpec.Number("CG forward x", "mm", "$.craft.cg_x_mm", d => d.Craft?.CgXMm, (d, v) => Craft(d).CgXMm = v),
            FieldSpec.Number("CG left y", "mm", "$.craft.cg_y_mm", d => d.Craft?.CgYMm, (d, v) => Craft(d).CgYMm = v),
            FieldSpec.Number("yaw inertia", "kg m2", "$.craft.yaw_inertia_kg_m2", d => d.Craft?.YawInertiaKgM2, (d, v) => Craft(d).YawInertiaKgM2 = v),
        ]),
        ("Packs on the bus",
        [
            FieldSpec.Id("pack", "$.pack.id", d => d.Pack?.Id, (d, v) => Pack(d).Id = v, c => c.Packs.Select(p => p.Id).ToList()),
            FieldSpec.Whole("in parallel", "", "$.pack.count", d => d.Pack?.Count, (d, v) => Pack(d).Count = v),
        ]),
        ("Limits",
        [
            FieldSpec.Number("yaw torque", "N m", "$.limits.yaw_torque_nm", d => d.Limits?.YawTorqueNm, (d, v) => Limits(d).YawTorqueNm = v),
            FieldSpec.Number("plate temp", "C", "$.limits.plate_temp_c", d => d.Limits?.PlateTempC, (d, v) => Limits(d).PlateTempC = v),
            FieldSpec.Number("cell cutoff", "V", "$.limits.cell_cutoff_v", d => d.Limits?.CellCutoffV, (d, v) => Limits(d).CellCutoffV = v) with { Default = RigDefaults.CellCutoffV },
            FieldSpec.Number("usable capacity", "%", "$.limits.usable_capacity_pct", d => d.Limits?.UsableCapacityPct, (d, v) => Limits(d).UsableCapacityPct = v) with { Default = RigDefaults.UsableCapacityPct },
            FieldSpec.Number("max duty", "0..1", "$.limits.max_duty", d => d.Limits?.MaxDuty, (d, v) => Limits(d).MaxDuty = v) with { Default = RigDefaults.MaxDuty },
            FieldSpec.Number("lift-off time", "s", "$.limits.liftoff_time_s", d => d.Limits?.LiftoffTimeS, (d, v) => Limits(d).LiftoffTimeS = v) with { Default = RigDefaults.LiftoffTimeS },
        ]),
    ];

    /// <summary>The editable values of one station.</summary>
    public static IReadOnlyList<FieldSpec> Station(int index)
    {
        string p = $"$.stations[{index}]";
        RigStationSection? Get(RigDocument d) => d.Stations is { } list && index < list.Count ? list[index] : null;
        // Edits go to a throw-away section when the station no longer exists (the document is unchanged).
        RigStationSection Set(RigDocument d) => Get(d) ?? new RigStationSection();
        return
        [
            FieldSpec.Id("spin", p + ".spin", d => Get(d)?.Spin, (d, v) => Set(d).Spin = v, _ => ["cw", "ccw"]),
            FieldSpec.Number("x forward", "mm", p + ".x_mm", d => Get(d)?.XMm, (d, v) => Set(d).XMm = v),
            FieldSpec.Number("y left", "mm", p + ".y_mm", d => Get(d)?.YMm, (d, v) => Set(d).YMm = v),
            FieldSpec.Id("rotor", p + ".rotor", d => Get(d)?.Rotor, (d, v) => Set(d).Rotor = v, c => c.Rotors.Select(r => r.Id).ToList()),
            FieldSpec.Id("motor", p + ".motor", d => Get(d)?.Motor, (d, v) => Set(d).Motor = v, c => c.Motors.Select(m => m.Id).ToList()),
            FieldSpec.Id("controller", p + ".controller", d => Get(d)?.Controller, (d, v) => Set(d).Controller = v,
                c => c.Controllers.Select(x => x.Id).ToList()),
        ];
    }

    private static RigPlateSection Plate(RigDocument d) => d.Plate ??= new RigPlateSection();

    private static RigGapSection Gap(RigDocument d) => d.Gap ??= new RigGapSection();

    private static RigCraftSection Craft(RigDocument d) => d.Craft ??= new RigCraftSection();

    private static RigPackSection Pack(RigDocument d) => d.Pack ??= new RigPackSection();

    private static RigLimitsSection Limits(RigDocument d) => d.Limits ??= new RigLimitsSection();
}

using RotorDrive.Files.Rigs;

namespace RotorDrive.Tui.Session;

/// <summary>The editable values of the rig sheet, in groups: each a key of the rig file's schema (<see cref="RigSchema"/>),
/// which gives its label, unit, range and default.</summary>
public static class RigFields
{
    /// <summary>The groups shown on the rig sheet: a heading and its fields.</summary>
    public static IReadOnlyList<(string Heading, IReadOnlyList<FieldSpec> Fields)> Groups { get; } =
    [
        ("Plate",
        [
            FieldSpec.Of(RigSchema.PlateMaterial, c => c.Plates.Select(p => p.Id).ToList()),
            FieldSpec.Of(RigSchema.PlateThicknessMm),
            FieldSpec.Of(RigSchema.PlateTemperatureC),
        ]),
        ("Air gap and air",
        [
            FieldSpec.Of(RigSchema.GapDesignMm),
            FieldSpec.Of(RigSchema.GapLandedMm),
            FieldSpec.Of(RigSchema.AmbientC),
        ]),
        ("Craft",
        [
            FieldSpec.Of(RigSchema.CraftEmptyMassKg),
            FieldSpec.Of(RigSchema.CraftPayloadKg),
            FieldSpec.Of(RigSchema.CraftCgXMm),
            FieldSpec.Of(RigSchema.CraftCgYMm),
            FieldSpec.Of(RigSchema.CraftYawInertia),
        ]),
        ("Packs on the bus",
        [
            FieldSpec.Of(RigSchema.PackId, c => c.Packs.Select(p => p.Id).ToList()),
            FieldSpec.Of(RigSchema.PackCount),
        ]),
        ("Limits",
        [
            FieldSpec.Of(RigSchema.LimitYawTorqueNm),
            FieldSpec.Of(RigSchema.LimitPlateTempC),
            FieldSpec.Of(RigSchema.LimitCellCutoffV),
            FieldSpec.Of(RigSchema.LimitUsableCapacityPct),
            FieldSpec.Of(RigSchema.LimitMaxDuty),
            FieldSpec.Of(RigSchema.LimitLiftoffTimeS),
        ]),
    ];

    /// <summary>The editable values of one station (0-based index into the rig file's list). Edits to a station that no
    /// longer exists leave the document unchanged.</summary>
    public static IReadOnlyList<FieldSpec> Station(int index) =>
    [
        FieldSpec.Of(RigSchema.StationSpin, _ => RigSchema.StationSpin.Choices, index),
        FieldSpec.Of(RigSchema.StationXMm, null, index),
        FieldSpec.Of(RigSchema.StationYMm, null, index),
        FieldSpec.Of(RigSchema.StationRotor, c => c.Rotors.Select(r => r.Id).ToList(), index),
        FieldSpec.Of(RigSchema.StationMotor, c => c.Motors.Select(m => m.Id).ToList(), index),
        FieldSpec.Of(RigSchema.StationController, c => c.Controllers.Select(x => x.Id).ToList(), index),
    ];
}

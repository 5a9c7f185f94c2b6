namespace RotorDrive.Files.Rigs;

/// <summary>The content of a rig file as plain, editable data, with the file's own keys and units (listed in <see cref="RigSchema"/>).</summary>
/// <remarks>Every value is nullable: null means the key is absent (optional keys then take their default from
/// <see cref="RigDefaults"/>; required ones are reported by <see cref="RigResolver"/>). <see cref="RigDocumentWriter"/>
/// writes it back with the same keys, leaving absent ones out (comments in the original file are not kept).</remarks>
public sealed class RigDocument
{
    /// <summary>"$schema": the JSON Schema an editor checks the file against; kept, never used.</summary>
    public string? Schema { get; set; }

    /// <summary>"name": the rig's name.</summary>
    public string? Name { get; set; }

    /// <summary>"catalogs": the six catalog files, relative to the rig file.</summary>
    public RigCatalogsSection? Catalogs { get; set; }

    /// <summary>"plate": the plate the rig hovers over.</summary>
    public RigPlateSection? Plate { get; set; }

    /// <summary>"craft": structure and payload.</summary>
    public RigCraftSection? Craft { get; set; }

    /// <summary>"gap": the design and landed air gaps.</summary>
    public RigGapSection? Gap { get; set; }

    /// <summary>"ambient_c": ambient air temperature, C.</summary>
    public double? AmbientC { get; set; }

    /// <summary>"gear_yaw_friction_nm": yaw torque the landing gear holds before lift-off, N m.</summary>
    public double? GearYawFrictionNm { get; set; }

    /// <summary>"load_model": "3d" (default) for the three-dimensional eddy-current model or "2d" for the first-generation
    /// strip model with the width factor.</summary>
    public string? LoadModel { get; set; }

    /// <summary>"mount": "free" (default), "guided" or "bench".</summary>
    public string? Mount { get; set; }

    /// <summary>"stations": the rotor stations.</summary>
    public List<RigStationSection>? Stations { get; set; }

    /// <summary>"pack": the packs on the bus.</summary>
    public RigPackSection? Pack { get; set; }

    /// <summary>"limits": the team's limits.</summary>
    public RigLimitsSection? Limits { get; set; }

    /// <summary>"tolerances": part spreads for the stress test (optional; absent means no spread).</summary>
    public RigTolerancesSection? Tolerances { get; set; }

    /// <summary>"route": the legs the craft follows during an endurance run, or null to hover in place.</summary>
    public List<RigRouteLegSection>? Route { get; set; }

    /// <summary>"calibrations": bench calibration file per rotor id, relative to the rig file (optional).</summary>
    public Dictionary<string, string>? Calibrations { get; set; }

    /// <summary>A deep copy, for editing without touching the original.</summary>
    public RigDocument Clone() => RigDocumentReader.Read(RigDocumentWriter.Write(this), "(copy)").Document!;
}

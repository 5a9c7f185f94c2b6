using RotorDrive.Files.Catalogs;

namespace RotorDrive.Files.Rigs;

/// <summary>The rig file's schema, written once: every key with its place, unit, valid range, default and help text.
/// The reader, the writer, the resolver's range checks, the workbench's rig fields, the command-line options that
/// mirror a rig key, the generated JSON Schema (<see cref="RigJsonSchema"/>) and the README's key table all read it.</summary>
/// <remarks>Defaults are common practice, no source, unless the help says otherwise (see <see cref="RigDefaults"/>).
/// Ranges are physical bounds that keep every analysis finite, not preferences.</remarks>
public static class RigSchema
{
    /// <summary>"$schema": the JSON Schema an editor checks the file against (ignored by RotorDrive).</summary>
    public static readonly RigKey SchemaRef = Text<RigDocument>("$schema", false, "schema",
        "the JSON Schema an editor uses to complete and check keys (\"rig.schema.json\" beside the demo rigs); RotorDrive ignores it",
        d => d.Schema, (d, v) => d.Schema = v);

    /// <summary>"name".</summary>
    public static readonly RigKey Name = Text<RigDocument>("name", true, "name", "the rig's name", d => d.Name, (d, v) => d.Name = v);

    /// <summary>"catalogs".</summary>
    public static readonly RigKey Catalogs = Section<RigCatalogsSection>("catalogs", true,
        "the six catalog files, relative to the rig file's folder", d => d.Catalogs, (d, v) => d.Catalogs = v);

    /// <summary>"catalogs.motors".</summary>
    public static readonly RigKey CatalogMotors = FilePath("motors", c => c.Motors, (c, v) => c.Motors = v);

    /// <summary>"catalogs.controllers".</summary>
    public static readonly RigKey CatalogControllers = FilePath("controllers", c => c.Controllers, (c, v) => c.Controllers = v);

    /// <summary>"catalogs.packs".</summary>
    public static readonly RigKey CatalogPacks = FilePath("packs", c => c.Packs, (c, v) => c.Packs = v);

    /// <summary>"catalogs.cell_curves".</summary>
    public static readonly RigKey CatalogCellCurves = FilePath("cell_curves", c => c.CellCurves, (c, v) => c.CellCurves = v);

    /// <summary>"catalogs.rotors".</summary>
    public static readonly RigKey CatalogRotors = FilePath("rotors", c => c.Rotors, (c, v) => c.Rotors = v);

    /// <summary>"catalogs.plates".</summary>
    public static readonly RigKey CatalogPlates = FilePath("plates", c => c.Plates, (c, v) => c.Plates = v);

    /// <summary>"plate".</summary>
    public static readonly RigKey Plate = Section<RigPlateSection>("plate", true, "the conducting plate the rig hovers over",
        d => d.Plate, (d, v) => d.Plate = v);

    /// <summary>"plate.material".</summary>
    public static readonly RigKey PlateMaterial = Id<RigPlateSection>("plate.material", true, "material", "plates.csv", "plate material",
        p => p.Material, (p, v) => p.Material = v);

    /// <summary>"plate.thickness_mm".</summary>
    public static readonly RigKey PlateThicknessMm = Num<RigPlateSection>("plate.thickness_mm", "mm", ValueRule.Between(0.01, 200), null,
        "thickness", "plate thickness", p => p.ThicknessMm, (p, v) => p.ThicknessMm = v);

    /// <summary>"plate.temperature_c".</summary>
    public static readonly RigKey PlateTemperatureC = Num<RigPlateSection>("plate.temperature_c", "C", ValueRule.Between(-40, 400), null,
        "temperature", "plate temperature at the start", p => p.TemperatureC, (p, v) => p.TemperatureC = v);

    /// <summary>"plate.convection_w_per_m2k".</summary>
    public static readonly RigKey PlateConvection = Num<RigPlateSection>("plate.convection_w_per_m2k", "W/(m^2 K)", ValueRule.Between(0.1, 1000),
        RigDefaults.ConvectionWPerM2K, "convection",
        "plate-to-air heat transfer coefficient (both faces); the default is a still-air estimate, common practice, no source",
        p => p.ConvectionWPerM2K, (p, v) => p.ConvectionWPerM2K = v);

    /// <summary>"plate.spreading_factor".</summary>
    public static readonly RigKey PlateSpreadingFactor = Num<RigPlateSection>("plate.spreading_factor", "1", ValueRule.Between(1, 100),
        RigDefaults.PlateSpreadingFactor, "spreading",
        "area of plate that takes a rotor's eddy heat / the magnet annulus area, for the spin-up's lumped plate patch (the endurance run "
        + "models the whole plate as a sheet and ignores it); 1 keeps the heat under the annulus (the hottest assumption); larger values "
        + "count heat conducted sideways into the plate",
        p => p.SpreadingFactor, (p, v) => p.SpreadingFactor = v);

    /// <summary>"plate.convection_top_w_per_m2k".</summary>
    public static readonly RigKey PlateConvectionTop = Num<RigPlateSection>("plate.convection_top_w_per_m2k", "W/(m^2 K)", ValueRule.Between(0, 1000),
        null, "convection top",
        "heat transfer coefficient of the plate's top face (under the rotors) for the endurance run's plate field",
        p => p.ConvectionTopWPerM2K, (p, v) => p.ConvectionTopWPerM2K = v, optional: true, defaultNote: "plate.convection_w_per_m2k");

    /// <summary>"plate.convection_bottom_w_per_m2k".</summary>
    public static readonly RigKey PlateConvectionBottom = Num<RigPlateSection>("plate.convection_bottom_w_per_m2k", "W/(m^2 K)",
        ValueRule.Between(0, 100_000), null, "convection bottom",
        "heat transfer (or contact) coefficient of the plate's bottom face; a plate bonded to a concrete floor sheds far more heat than one on an air gap",
        p => p.ConvectionBottomWPerM2K, (p, v) => p.ConvectionBottomWPerM2K = v, optional: true, defaultNote: "plate.convection_w_per_m2k");

    /// <summary>"plate.emissivity".</summary>
    public static readonly RigKey PlateEmissivity = Num<RigPlateSection>("plate.emissivity", "1", ValueRule.Between(0, 1), RigDefaults.PlateEmissivity,
        "emissivity",
        "emissivity of the top face for radiation to surroundings at ambient (linearised half-way between ambient and the plate limit); bare "
        + "rolled aluminium or copper is about 0.04 to 0.1 (Incropera, Table A.11, from memory), painted or anodised about 0.8",
        p => p.Emissivity, (p, v) => p.Emissivity = v);

    /// <summary>"plate.back_iron_mm".</summary>
    public static readonly RigKey PlateBackIronMm = Num<RigPlateSection>("plate.back_iron_mm", "mm", ValueRule.Between(0, 200), 0.0, "back iron",
        "a steel layer directly under the conducting plate (treated as infinitely permeable: only its presence matters); it attracts the "
        + "magnets at standstill and low speed",
        p => p.BackIronMm, (p, v) => p.BackIronMm = v);

    /// <summary>"craft".</summary>
    public static readonly RigKey Craft = Section<RigCraftSection>("craft", true, "structure and payload, without the drivetrain",
        d => d.Craft, (d, v) => d.Craft = v);

    /// <summary>"craft.empty_mass_kg".</summary>
    public static readonly RigKey CraftEmptyMassKg = Num<RigCraftSection>("craft.empty_mass_kg", "kg", ValueRule.PositiveAtMost(10_000), null,
        "empty mass", "structure without rotors, drivetrain, packs and payload", k => k.EmptyMassKg, (k, v) => k.EmptyMassKg = v);

    /// <summary>"craft.payload_kg".</summary>
    public static readonly RigKey CraftPayloadKg = Num<RigCraftSection>("craft.payload_kg", "kg", ValueRule.NonNegativeAtMost(10_000), null,
        "payload", "payload", k => k.PayloadKg, (k, v) => k.PayloadKg = v);

    /// <summary>"craft.cg_x_mm".</summary>
    public static readonly RigKey CraftCgXMm = Num<RigCraftSection>("craft.cg_x_mm", "mm", ValueRule.Between(-10_000, 10_000), null,
        "CG forward x", "centre of gravity of structure and payload, x (forward)", k => k.CgXMm, (k, v) => k.CgXMm = v);

    /// <summary>"craft.cg_y_mm".</summary>
    public static readonly RigKey CraftCgYMm = Num<RigCraftSection>("craft.cg_y_mm", "mm", ValueRule.Between(-10_000, 10_000), null,
        "CG left y", "centre of gravity of structure and payload, y (left)", k => k.CgYMm, (k, v) => k.CgYMm = v);

    /// <summary>"craft.yaw_inertia_kg_m2".</summary>
    public static readonly RigKey CraftYawInertia = Num<RigCraftSection>("craft.yaw_inertia_kg_m2", "kg m^2", ValueRule.PositiveAtMost(100_000), null,
        "yaw inertia", "yaw moment of inertia of the whole craft", k => k.YawInertiaKgM2, (k, v) => k.YawInertiaKgM2 = v);

    /// <summary>"craft.heave_damping_ratio".</summary>
    public static readonly RigKey CraftHeaveDamping = Num<RigCraftSection>("craft.heave_damping_ratio", "1", ValueRule.Between(0, 2),
        RigDefaults.HeaveDampingRatio, "heave damping", "heave damping from added dampers (common practice, no source)",
        k => k.HeaveDampingRatio, (k, v) => k.HeaveDampingRatio = v);

    /// <summary>"gap".</summary>
    public static readonly RigKey Gap = Section<RigGapSection>("gap", true, "the design and landed air gaps, magnet face to plate",
        d => d.Gap, (d, v) => d.Gap = v);

    /// <summary>"gap.design_mm".</summary>
    public static readonly RigKey GapDesignMm = Num<RigGapSection>("gap.design_mm", "mm", ValueRule.Between(0.1, 200), null, "design gap",
        "hover air gap, magnet face to plate", g => g.DesignMm, (g, v) => g.DesignMm = v);

    /// <summary>"gap.landed_mm".</summary>
    public static readonly RigKey GapLandedMm = Num<RigGapSection>("gap.landed_mm", "mm", ValueRule.Between(0.1, 200), null, "landed gap",
        "air gap resting on the landing gear", g => g.LandedMm, (g, v) => g.LandedMm = v, rangeNote: "at most gap.design_mm");

    /// <summary>"ambient_c".</summary>
    public static readonly RigKey AmbientC = Num<RigDocument>("ambient_c", "C", ValueRule.Between(-40, 60), null, "ambient",
        "ambient air temperature (also the starting magnet and winding temperature)", d => d.AmbientC, (d, v) => d.AmbientC = v);

    /// <summary>"gear_yaw_friction_nm".</summary>
    public static readonly RigKey GearYawFrictionNm = Num<RigDocument>("gear_yaw_friction_nm", "N m", ValueRule.NonNegativeAtMost(10_000),
        RigDefaults.GearYawFrictionNm, "gear yaw friction", "yaw torque the landing gear holds before lift-off (common practice, no source)",
        d => d.GearYawFrictionNm, (d, v) => d.GearYawFrictionNm = v);

    /// <summary>"load_model".</summary>
    public static readonly RigKey LoadModel = Choice<RigDocument>("load_model", ["3d", "2d"], "3d", "load model",
        "eddy-current load model of every analysis: the three-dimensional model, or the first-generation 2-D strip model with the "
        + "Russell-Norsworthy width factor (to compare)",
        d => d.LoadModel, (d, v) => d.LoadModel = v);

    /// <summary>"mount".</summary>
    public static readonly RigKey Mount = Choice<RigDocument>("mount", ["free", "guided", "bench"], "free", "mount",
        "how the rig is held: \"free\" (a craft that trims force, pitch, roll and yaw itself, four or more stations), \"guided\" (a sled "
        + "on rails that carry pitch, roll and yaw) or \"bench\" (each rotor on a stand at a fixed gap); the whole-craft analyses "
        + "are for a free craft; a guided sled gets hover (at one common duty or the stations' set duties; the rails carry pitch, roll "
        + "and yaw), spin-up and endurance; a bench rig spin-up and endurance per station; the others refuse them (exit 2); see "
        + "the README's mount table",
        d => d.Mount, (d, v) => d.Mount = v);

    /// <summary>"stations".</summary>
    public static readonly RigKey Stations = List<RigStationSection>("stations", true, 1, "the rotor stations; rotors must not overlap",
        d => d.Stations, (d, v) => d.Stations = v);

    /// <summary>"stations[].name".</summary>
    public static readonly RigKey StationName = Text<RigStationSection>("stations[].name", false, "name",
        "what people call the station (\"front left\"); every output shows it beside the station's number, and `--station` accepts it",
        s => s.Name, (s, v) => s.Name = v, rangeNote: "unique, not a number");

    /// <summary>"stations[].x_mm".</summary>
    public static readonly RigKey StationXMm = Num<RigStationSection>("stations[].x_mm", "mm", ValueRule.Between(-100_000, 100_000), null,
        "x forward", "rotor axis position, x (forward)", s => s.XMm, (s, v) => s.XMm = v);

    /// <summary>"stations[].y_mm".</summary>
    public static readonly RigKey StationYMm = Num<RigStationSection>("stations[].y_mm", "mm", ValueRule.Between(-100_000, 100_000), null,
        "y left", "rotor axis position, y (left)", s => s.YMm, (s, v) => s.YMm = v);

    /// <summary>"stations[].spin".</summary>
    public static readonly RigKey StationSpin = Choice<RigStationSection>("stations[].spin", ["cw", "ccw"], null, "spin",
        "spin direction seen from above", s => s.Spin, (s, v) => s.Spin = v);

    /// <summary>"stations[].rotor".</summary>
    public static readonly RigKey StationRotor = Id<RigStationSection>("stations[].rotor", true, "rotor", "rotors.csv", "rotor design",
        s => s.Rotor, (s, v) => s.Rotor = v);

    /// <summary>"stations[].motor".</summary>
    public static readonly RigKey StationMotor = Id<RigStationSection>("stations[].motor", false, "motor", "motors.csv",
        "assigned motor (leave out to let the ranking choose)", s => s.Motor, (s, v) => s.Motor = v);

    /// <summary>"stations[].controller".</summary>
    public static readonly RigKey StationController = Id<RigStationSection>("stations[].controller", false, "controller", "controllers.csv",
        "assigned speed controller", s => s.Controller, (s, v) => s.Controller = v);

    /// <summary>"stations[].duty".</summary>
    public static readonly RigKey StationDuty = Num<RigStationSection>("stations[].duty", "1", ValueRule.Between(0, 1), null, "duty",
        "controller duty the user sets (guided or bench rig only): a guided sled with a duty on every station hovers at the gap "
        + "where these duties lift its weight (all stations or none); a bench station runs at it (default limits.max_duty); a free "
        + "craft's trim sets its own duties",
        s => s.Duty, (s, v) => s.Duty = v, optional: true, rangeNote: "0 to limits.max_duty");

    /// <summary>"pack".</summary>
    public static readonly RigKey Pack = Section<RigPackSection>("pack", false,
        "identical packs in parallel on the bus (leave out to let the ranking choose)", d => d.Pack, (d, v) => d.Pack = v);

    /// <summary>"pack.id".</summary>
    public static readonly RigKey PackId = Id<RigPackSection>("pack.id", true, "pack", "packs.csv", "pack type on the bus",
        p => p.Id, (p, v) => p.Id = v);

    /// <summary>"pack.count".</summary>
    public static readonly RigKey PackCount = new("pack.count", RigValueKind.Integer, "", true, "in parallel", "identical packs in parallel",
        s => ((RigPackSection)s).Count, (s, v) => ((RigPackSection)s).Count = (int?)v)
    {
        Rule = ValueRule.AtLeast(1, 1000),
    };

    /// <summary>"limits".</summary>
    public static readonly RigKey Limits = Section<RigLimitsSection>("limits", true, "the limits the team sets",
        d => d.Limits, (d, v) => d.Limits = v);

    /// <summary>"limits.yaw_torque_nm".</summary>
    public static readonly RigKey LimitYawTorqueNm = Num<RigLimitsSection>("limits.yaw_torque_nm", "N m", ValueRule.PositiveAtMost(10_000), null,
        "yaw torque", "largest residual yaw torque tolerated with equal throttles", l => l.YawTorqueNm, (l, v) => l.YawTorqueNm = v);

    /// <summary>"limits.plate_temp_c".</summary>
    public static readonly RigKey LimitPlateTempC = Num<RigLimitsSection>("limits.plate_temp_c", "C", ValueRule.Between(-40, 400), null,
        "plate temp", "largest plate temperature", l => l.PlateTempC, (l, v) => l.PlateTempC = v);

    /// <summary>"limits.cell_cutoff_v".</summary>
    public static readonly RigKey LimitCellCutoffV = Num<RigLimitsSection>("limits.cell_cutoff_v", "V", ValueRule.Between(1.5, 4.5),
        RigDefaults.CellCutoffV, "cell cutoff",
        "loaded cell voltage at which the pack counts as empty (common practice, no source; about 2.8 V suits LiFePO4)",
        l => l.CellCutoffV, (l, v) => l.CellCutoffV = v);

    /// <summary>"limits.usable_capacity_pct".</summary>
    public static readonly RigKey LimitUsableCapacityPct = Num<RigLimitsSection>("limits.usable_capacity_pct", "%", ValueRule.Between(1, 100),
        RigDefaults.UsableCapacityPct, "usable capacity", "share of pack capacity the team allows itself (common practice, no source)",
        l => l.UsableCapacityPct, (l, v) => l.UsableCapacityPct = v);

    /// <summary>"limits.max_duty".</summary>
    public static readonly RigKey LimitMaxDuty = Num<RigLimitsSection>("limits.max_duty", "1", ValueRule.Between(0.05, 1), RigDefaults.MaxDuty,
        "max duty", "largest controller duty a trim may use, leaving control headroom (common practice, no source)",
        l => l.MaxDuty, (l, v) => l.MaxDuty = v);

    /// <summary>"limits.liftoff_time_s".</summary>
    public static readonly RigKey LimitLiftoffTimeS = Num<RigLimitsSection>("limits.liftoff_time_s", "s", ValueRule.PositiveAtMost(3600),
        RigDefaults.LiftoffTimeS, "lift-off time", "longest acceptable time from start to lift-off (common practice, no source)",
        l => l.LiftoffTimeS, (l, v) => l.LiftoffTimeS = v);

    /// <summary>"tolerances".</summary>
    public static readonly RigKey Tolerances = new("tolerances", RigValueKind.Tolerances, false,
        "part spreads for `rotordrive stress` (see Tolerances); absent means no spread",
        s => ((RigDocument)s).Tolerances, (s, v) => ((RigDocument)s).Tolerances = (RigTolerancesSection?)v, () => new RigTolerancesSection());

    /// <summary>"route".</summary>
    public static readonly RigKey Route = List<RigRouteLegSection>("route", false, 0,
        "legs the craft origin follows during `endurance`, repeated until the run ends, starting at (0, 0): a move (x_mm, y_mm, "
        + "speed_m_per_s) or a dwell (dwell_s), never a mix; without it the craft hovers in place",
        d => d.Route, (d, v) => d.Route = v);

    /// <summary>"route[].x_mm".</summary>
    public static readonly RigKey RouteXMm = Num<RigRouteLegSection>("route[].x_mm", "mm", ValueRule.Between(-100_000, 100_000), null, "x",
        "target x of a move", r => r.XMm, (r, v) => r.XMm = v, optional: true, rangeNote: "with y_mm and speed_m_per_s");

    /// <summary>"route[].y_mm".</summary>
    public static readonly RigKey RouteYMm = Num<RigRouteLegSection>("route[].y_mm", "mm", ValueRule.Between(-100_000, 100_000), null, "y",
        "target y of a move", r => r.YMm, (r, v) => r.YMm = v, optional: true, rangeNote: "with x_mm and speed_m_per_s");

    /// <summary>"route[].speed_m_per_s".</summary>
    public static readonly RigKey RouteSpeed = Num<RigRouteLegSection>("route[].speed_m_per_s", "m/s", ValueRule.Between(0.001, 20), null, "speed",
        "speed of a move", r => r.SpeedMPerS, (r, v) => r.SpeedMPerS = v, optional: true, rangeNote: "with x_mm and y_mm");

    /// <summary>"route[].dwell_s".</summary>
    public static readonly RigKey RouteDwellS = Num<RigRouteLegSection>("route[].dwell_s", "s", ValueRule.Positive, null, "dwell",
        "duration of a dwell", r => r.DwellS, (r, v) => r.DwellS = v, optional: true, rangeNote: "alone in its leg");

    /// <summary>"calibrations".</summary>
    public static readonly RigKey Calibrations = new("calibrations", RigValueKind.FileMap, false,
        "bench calibration file per rotor design ({rotor id: path}), relative to the rig file (`rotordrive calibrate --out`); every analysis "
        + "uses the calibrated load; only rotors the stations use",
        s => ((RigDocument)s).Calibrations, (s, v) => ((RigDocument)s).Calibrations = (Dictionary<string, string>?)v, null);

    /// <summary>Every key in the order the writer uses, each section followed by its keys.</summary>
    public static IReadOnlyList<RigKey> All { get; } =
    [
        SchemaRef, Name,
        Catalogs, CatalogMotors, CatalogControllers, CatalogPacks, CatalogCellCurves, CatalogRotors, CatalogPlates,
        Plate, PlateMaterial, PlateThicknessMm, PlateTemperatureC, PlateConvection, PlateSpreadingFactor, PlateConvectionTop, PlateConvectionBottom,
        PlateEmissivity, PlateBackIronMm,
        Craft, CraftEmptyMassKg, CraftPayloadKg, CraftCgXMm, CraftCgYMm, CraftYawInertia, CraftHeaveDamping,
        Gap, GapDesignMm, GapLandedMm,
        AmbientC, GearYawFrictionNm, LoadModel, Mount,
        Stations, StationName, StationXMm, StationYMm, StationSpin, StationRotor, StationMotor, StationController, StationDuty,
        Pack, PackId, PackCount,
        Limits, LimitYawTorqueNm, LimitPlateTempC, LimitCellCutoffV, LimitUsableCapacityPct, LimitMaxDuty, LimitLiftoffTimeS,
        Tolerances,
        Route, RouteXMm, RouteYMm, RouteSpeed, RouteDwellS,
        Calibrations,
    ];

    /// <summary>The keys directly inside one section ("" for the top level, "plate", "stations[]"), in writing order.</summary>
    /// <param name="section">The section path.</param>
    public static IReadOnlyList<RigKey> In(string section) => All.Where(k => k.Section == section).ToArray();

    /// <summary>The key with this name ("plate.thickness_mm", "stations[].x_mm").</summary>
    /// <exception cref="KeyNotFoundException">No key has that name.</exception>
    public static RigKey Find(string name)
        => All.FirstOrDefault(k => k.Name == name) ?? throw new KeyNotFoundException($"no rig key '{name}'");

    /// <summary>The path inside a section list's elements ("stations[]" for "stations").</summary>
    internal static string ItemsOf(RigKey list) => list.Name + "[]";

    private static RigKey Num<T>(string path, string unit, ValueRule rule, double? defaultValue, string label, string help,
        Func<T, double?> get, Action<T, double?> set, bool optional = false, string? defaultNote = null, string? rangeNote = null)
        => new(path, RigValueKind.Number, unit, required: defaultValue is null && !optional, label, help, s => get((T)s), (s, v) => set((T)s, (double?)v))
        {
            Rule = rule,
            Default = defaultValue,
            DefaultNote = defaultNote,
            RangeNote = rangeNote,
        };

    private static RigKey Text<T>(string path, bool required, string label, string help, Func<T, string?> get, Action<T, string?> set,
        string? rangeNote = null)
        => new(path, RigValueKind.Text, "", required, label, help, s => get((T)s), (s, v) => set((T)s, (string?)v)) { RangeNote = rangeNote };

    private static RigKey FilePath(string key, Func<RigCatalogsSection, string?> get, Action<RigCatalogsSection, string?> set)
        => new("catalogs." + key, RigValueKind.FilePath, "", true, key, $"the {key.Replace('_', ' ')} catalog file",
            s => get((RigCatalogsSection)s), (s, v) => set((RigCatalogsSection)s, (string?)v));

    private static RigKey Id<T>(string path, bool required, string label, string catalogFile, string help, Func<T, string?> get, Action<T, string?> set)
        => new(path, RigValueKind.CatalogId, "", required, label, help, s => get((T)s), (s, v) => set((T)s, (string?)v)) { CatalogFile = catalogFile };

    private static RigKey Choice<T>(string path, IReadOnlyList<string> choices, string? defaultWord, string label, string help,
        Func<T, string?> get, Action<T, string?> set)
        => new(path, RigValueKind.Choice, "", defaultWord is null, label, help, s => get((T)s), (s, v) => set((T)s, (string?)v))
        {
            Choices = choices,
            DefaultNote = defaultWord,
        };

    private static RigKey Section<T>(string path, bool required, string help, Func<RigDocument, T?> get, Action<RigDocument, T?> set)
        where T : class, new()
        => new(path, RigValueKind.Section, required, help, s => get((RigDocument)s), (s, v) => set((RigDocument)s, (T?)v), () => new T());

    private static RigKey List<T>(string path, bool required, int minItems, string help, Func<RigDocument, List<T>?> get,
        Action<RigDocument, List<T>?> set)
        where T : class, new()
        => new(path, RigValueKind.SectionList, required, help, s => get((RigDocument)s), (s, v) => set((RigDocument)s, (List<T>?)v),
            () => new List<T>(), () => new T())
        {
            MinItems = minItems,
        };
}

using RotorDrive.Core;
using RotorDrive.Core.Craft;
using RotorDrive.Core.Drive;
using RotorDrive.Core.Loads;
using RotorDrive.Core.Magnetics;
using RotorDrive.Core.Studies;
using RotorDrive.Core.Studies.Stress;
using RotorDrive.Core.Thermal;
using RotorDrive.Files.Catalogs;

namespace RotorDrive.Files.Rigs;

/// <summary>Checks a <see cref="RigDocument"/> (required keys, ranges, ids in the catalogs) and builds the Core
/// <see cref="Rig"/> in SI units. Problems name the JSON path and, when the document came from a file, its line.</summary>
public static class RigResolver
{
    /// <summary>Ambient temperatures the rig file accepts (ambient_c, and the reach of its tolerance), C.</summary>
    public static readonly (double Min, double Max) AmbientRangeC = (-40, 60);

    /// <summary>Plate temperatures the rig file accepts (plate.temperature_c, and the reach of its tolerance), C.</summary>
    public static readonly (double Min, double Max) PlateTempRangeC = (-40, 400);

    /// <summary>The catalog paths the document names, resolved against the rig file's folder; null (after reporting
    /// the missing keys) when the "catalogs" section is incomplete.</summary>
    public static CatalogPaths? CatalogPathsOf(RigDocument document, string rigPath, RigSourceMap? locations, List<InputProblem> problems)
    {
        ArgumentNullException.ThrowIfNull(document);
        ArgumentNullException.ThrowIfNull(rigPath);
        ArgumentNullException.ThrowIfNull(problems);
        var ctx = new Context(rigPath, locations ?? RigSourceMap.Empty, problems);
        var c = document.Catalogs;
        if (c is null)
        {
            ctx.Missing("$.catalogs");
            return null;
        }
        string folder = Path.GetDirectoryName(rigPath) ?? "";
        string? Resolve(string? value, string key)
        {
            if (string.IsNullOrWhiteSpace(value))
            {
                ctx.Missing("$.catalogs." + key);
                return null;
            }
            return Path.IsPathRooted(value) ? value : Path.Combine(folder, value);
        }
        var motors = Resolve(c.Motors, "motors");
        var controllers = Resolve(c.Controllers, "controllers");
        var packs = Resolve(c.Packs, "packs");
        var curves = Resolve(c.CellCurves, "cell_curves");
        var rotors = Resolve(c.Rotors, "rotors");
        var plates = Resolve(c.Plates, "plates");
        if (motors is null || controllers is null || packs is null || curves is null || rotors is null || plates is null)
        {
            return null;
        }
        return new CatalogPaths(motors, controllers, packs, curves, rotors, plates);
    }

    /// <summary>Resolves a document against a catalog held in memory (catalog file names in messages are generic).</summary>
    public static RigResolveResult Resolve(RigDocument document, PartsCatalog catalog, string rigFile, RigSourceMap? locations = null)
    {
        ArgumentNullException.ThrowIfNull(catalog);
        var paths = new CatalogPaths("motors.csv", "controllers.csv", "packs.csv", "cell_curves.csv", "rotors.csv", "plates.csv");
        return Resolve(document, new CatalogLoadResult(catalog, paths, [], new Dictionary<PartKind, IReadOnlySet<string>>()), rigFile, locations);
    }

    /// <summary>Resolves a document against loaded catalogs. With <paramref name="catalogs"/> null (catalogs could not
    /// be located) every check that needs no catalog still runs, and the rig is null.</summary>
    /// <param name="document">The rig document.</param>
    /// <param name="catalogs">The loaded catalogs; ids rejected there are not reported again.</param>
    /// <param name="rigFile">The rig file's name, for problems.</param>
    /// <param name="locations">Positions of the document's keys in the file, or null.</param>
    /// <param name="readText">Reads a calibration or bench file named by "calibrations" (a problem and null when it cannot);
    /// null reads from disk. The terminal UI passes its own file service.</param>
    public static RigResolveResult Resolve(RigDocument document, CatalogLoadResult? catalogs, string rigFile, RigSourceMap? locations = null,
        Func<string, List<InputProblem>, string?>? readText = null)
    {
        ArgumentNullException.ThrowIfNull(document);
        ArgumentNullException.ThrowIfNull(rigFile);
        var problems = new List<InputProblem>();
        var ctx = new Context(rigFile, locations ?? RigSourceMap.Empty, problems);
        bool partsOk = catalogs is not null;

        string? name = document.Name;
        if (string.IsNullOrWhiteSpace(name))
        {
            ctx.Missing("$.name");
        }

        // Plate.
        PlateMaterial? material = null;
        double? thickness = null, plateTemp = null, convection = null, spreading = null, top = null, bottom = null, emissivity = null, backIron = null;
        if (document.Plate is not { } plate)
        {
            ctx.Missing("$.plate");
        }
        else
        {
            material = ctx.Lookup(plate.Material, "$.plate.material", PartKind.Plate, "plate material", catalogs, c => c.Plates, m => m.Id);
            thickness = ctx.Required(plate.ThicknessMm, "$.plate.thickness_mm", ValueRule.Between(0.01, 200));
            plateTemp = ctx.Required(plate.TemperatureC, "$.plate.temperature_c", ValueRule.Between(PlateTempRangeC.Min, PlateTempRangeC.Max));
            convection = ctx.Optional(plate.ConvectionWPerM2K, "$.plate.convection_w_per_m2k", ValueRule.Between(0.1, 1000), RigDefaults.ConvectionWPerM2K);
            spreading = ctx.Optional(plate.SpreadingFactor, "$.plate.spreading_factor", ValueRule.Between(1, 100), RigDefaults.PlateSpreadingFactor);
            if (convection is { } both)
            {
                top = ctx.Optional(plate.ConvectionTopWPerM2K, "$.plate.convection_top_w_per_m2k", ValueRule.Between(0, 1000), both);
                bottom = ctx.Optional(plate.ConvectionBottomWPerM2K, "$.plate.convection_bottom_w_per_m2k", ValueRule.Between(0, 100_000), both);
            }
            emissivity = ctx.Optional(plate.Emissivity, "$.plate.emissivity", ValueRule.Between(0, 1), RigDefaults.PlateEmissivity);
            backIron = ctx.Optional(plate.BackIronMm, "$.plate.back_iron_mm", ValueRule.Between(0, 200), 0.0);
        }

        // Craft.
        CraftBody? body = null;
        if (document.Craft is not { } craft)
        {
            ctx.Missing("$.craft");
        }
        else
        {
            var empty = ctx.Required(craft.EmptyMassKg, "$.craft.empty_mass_kg", ValueRule.PositiveAtMost(10000));
            var payload = ctx.Required(craft.PayloadKg, "$.craft.payload_kg", ValueRule.NonNegativeAtMost(10000));
            var cgx = ctx.Required(craft.CgXMm, "$.craft.cg_x_mm", ValueRule.Between(-10000, 10000));
            var cgy = ctx.Required(craft.CgYMm, "$.craft.cg_y_mm", ValueRule.Between(-10000, 10000));
            var inertia = ctx.Required(craft.YawInertiaKgM2, "$.craft.yaw_inertia_kg_m2", ValueRule.PositiveAtMost(100000));
            var damping = ctx.Optional(craft.HeaveDampingRatio, "$.craft.heave_damping_ratio", ValueRule.Between(0, 2), RigDefaults.HeaveDampingRatio);
            if (empty is not null && payload is not null && cgx is not null && cgy is not null && inertia is not null && damping is not null)
            {
                body = new CraftBody(empty.Value, payload.Value, cgx.Value / 1000.0, cgy.Value / 1000.0, inertia.Value, damping.Value);
            }
        }

        // Gaps and environment.
        double? design = null, landed = null;
        if (document.Gap is not { } gap)
        {
            ctx.Missing("$.gap");
        }
        else
        {
            design = ctx.Required(gap.DesignMm, "$.gap.design_mm", ValueRule.Between(0.1, 200));
            landed = ctx.Required(gap.LandedMm, "$.gap.landed_mm", ValueRule.Between(0.1, 200));
            if (design is { } d && landed is { } l && l > d)
            {
                ctx.Report("$.gap.landed_mm", Messages.LandedAboveDesign(l, d));
                landed = null;
            }
        }
        var ambient = ctx.Required(document.AmbientC, "$.ambient_c", ValueRule.Between(AmbientRangeC.Min, AmbientRangeC.Max));
        LoadModelKind? loadModel = LoadModelKind.ThreeDimensional;
        if (document.LoadModel is { } modelText)
        {
            loadModel = modelText.Trim().ToLowerInvariant() switch
            {
                "3d" => LoadModelKind.ThreeDimensional,
                "2d" => LoadModelKind.TwoDimensional,
                _ => null,
            };
            if (loadModel is null)
            {
                ctx.Report("$.load_model", Messages.BadLoadModel(modelText));
            }
        }
        var gearFriction = ctx.Optional(document.GearYawFrictionNm, "$.gear_yaw_friction_nm", ValueRule.NonNegativeAtMost(10000), RigDefaults.GearYawFrictionNm);

        // Stations.
        var stations = new List<Station>();
        bool stationsOk = true;
        if (document.Stations is not { } stationDocs)
        {
            ctx.Missing("$.stations");
            stationsOk = false;
        }
        else if (stationDocs.Count == 0)
        {
            ctx.Report("$.stations", Messages.NoStations());
            stationsOk = false;
        }
        else
        {
            for (int i = 0; i < stationDocs.Count; i++)
            {
                var s = stationDocs[i];
                string path = $"$.stations[{i}]";
                var x = ctx.Required(s.XMm, path + ".x_mm", ValueRule.Between(-100_000, 100_000));
                var y = ctx.Required(s.YMm, path + ".y_mm", ValueRule.Between(-100_000, 100_000));
                SpinDirection? spin = null;
                if (s.Spin is null)
                {
                    ctx.Missing(path + ".spin");
                }
                else if (string.Equals(s.Spin.Trim(), "cw", StringComparison.OrdinalIgnoreCase))
                {
                    spin = SpinDirection.Clockwise;
                }
                else if (string.Equals(s.Spin.Trim(), "ccw", StringComparison.OrdinalIgnoreCase))
                {
                    spin = SpinDirection.CounterClockwise;
                }
                else
                {
                    ctx.Report(path + ".spin", Messages.BadSpin(s.Spin));
                }
                var rotor = ctx.Lookup(s.Rotor, path + ".rotor", PartKind.Rotor, "rotor", catalogs, c => c.Rotors, r => r.Id);
                Motor? motor = s.Motor is null ? null
                    : ctx.Lookup(s.Motor, path + ".motor", PartKind.Motor, "motor", catalogs, c => c.Motors, m => m.Id);
                SpeedController? controller = s.Controller is null ? null
                    : ctx.Lookup(s.Controller, path + ".controller", PartKind.Controller, "controller", catalogs, c => c.Controllers, c => c.Id);
                bool motorOk = s.Motor is null || motor is not null;
                bool controllerOk = s.Controller is null || controller is not null;
                if (x is null || y is null || spin is null || rotor is null || !motorOk || !controllerOk)
                {
                    stationsOk = false;
                    continue;
                }
                stations.Add(new Station(x.Value / 1000.0, y.Value / 1000.0, spin.Value, rotor, motor, controller));
            }
            if (stationsOk)
            {
                for (int i = 0; i < stations.Count; i++)
                {
                    for (int j = 0; j < i; j++)
                    {
                        double distance = Math.Sqrt(Math.Pow(stations[i].XM - stations[j].XM, 2) + Math.Pow(stations[i].YM - stations[j].YM, 2));
                        double needed = stations[i].Rotor.OuterRadiusM + stations[j].Rotor.OuterRadiusM;
                        if (distance < needed)
                        {
                            ctx.Report($"$.stations[{i}]", Messages.StationsOverlap(j, distance * 1000.0, needed * 1000.0));
                            stationsOk = false;
                        }
                    }
                }
            }
        }

        // Pack.
        PackBank? bank = null;
        bool packOk = true;
        if (document.Pack is { } packDoc)
        {
            var pack = ctx.Lookup(packDoc.Id, "$.pack.id", PartKind.Pack, "pack", catalogs, c => c.Packs, p => p.Id);
            int? count = null;
            if (packDoc.Count is null)
            {
                ctx.Missing("$.pack.count");
            }
            else if (packDoc.Count < 1)
            {
                ctx.Report("$.pack.count", Messages.MustBeAtLeast(1, packDoc.Count.Value));
            }
            else if (packDoc.Count > 1000)
            {
                ctx.Report("$.pack.count", Messages.MustBeAtMost(1000, packDoc.Count.Value));
            }
            else
            {
                count = packDoc.Count;
            }
            CellCurve? curve = null;
            if (pack is not null && catalogs is not null)
            {
                curve = catalogs.Catalog.CurveFor(pack.Chemistry);
                if (curve is null)
                {
                    ctx.Report("$.pack.id", Messages.NoCurveForChemistry(pack.Chemistry, catalogs.Paths.CellCurves));
                }
            }
            if (pack is not null && count is not null && curve is not null)
            {
                bank = new PackBank(pack, count.Value, curve);
            }
            else
            {
                packOk = false;
            }
        }

        // Limits.
        RigLimits? limits = null;
        if (document.Limits is not { } lim)
        {
            ctx.Missing("$.limits");
        }
        else
        {
            var yaw = ctx.Required(lim.YawTorqueNm, "$.limits.yaw_torque_nm", ValueRule.PositiveAtMost(10000));
            var plateMax = ctx.Required(lim.PlateTempC, "$.limits.plate_temp_c", ValueRule.Between(-40, 400));
            var cutoff = ctx.Optional(lim.CellCutoffV, "$.limits.cell_cutoff_v", ValueRule.Between(1.5, 4.5), RigDefaults.CellCutoffV);
            var usable = ctx.Optional(lim.UsableCapacityPct, "$.limits.usable_capacity_pct", ValueRule.Between(1, 100), RigDefaults.UsableCapacityPct);
            var duty = ctx.Optional(lim.MaxDuty, "$.limits.max_duty", ValueRule.Between(0.05, 1), RigDefaults.MaxDuty);
            var liftoff = ctx.Optional(lim.LiftoffTimeS, "$.limits.liftoff_time_s", ValueRule.PositiveAtMost(3600), RigDefaults.LiftoffTimeS);
            if (yaw is not null && plateMax is not null && cutoff is not null && usable is not null && duty is not null && liftoff is not null)
            {
                limits = new RigLimits(yaw.Value, plateMax.Value, cutoff.Value, usable.Value / 100.0, duty.Value, liftoff.Value);
            }
        }

        var (route, routeOk) = ResolveRoute(document, ctx);
        var tolerances = ResolveTolerances(document, ctx);
        if (tolerances is not null && limits is not null && body is not null && material is not null && thickness is not null
            && plateTemp is not null && ambient is not null && design is not null && landed is not null && partsOk && stationsOk)
        {
            var nominal = new Rig("tolerance check", new Plate(material, thickness.Value / 1000.0), plateTemp.Value, ambient.Value, body,
                design.Value / 1000.0, landed.Value / 1000.0, stations, bank, limits, 0, 1);
            CheckSpreads(nominal, tolerances, ctx);
        }

        var calibrations = ResolveCalibrations(document, rigFile, stations, stationsOk, ctx, readText ?? TextFiles.TryRead);

        var ordered = problems.OrderBy(p => p.Line).ThenBy(p => p.Column).ToList();
        if (ordered.Count > 0 || !partsOk || !stationsOk || !packOk || name is null || material is null || thickness is null
            || plateTemp is null || convection is null || spreading is null || body is null || design is null || landed is null || ambient is null
            || gearFriction is null || limits is null || top is null || bottom is null || emissivity is null || !routeOk || loadModel is null || backIron is null)
        {
            return new RigResolveResult(null, ordered);
        }
        var rig = new Rig(
            name.Trim(),
            new Plate(material, thickness.Value / 1000.0) { BackIronM = backIron.Value / 1000.0 },
            plateTemp.Value,
            ambient.Value,
            body,
            design.Value / 1000.0,
            landed.Value / 1000.0,
            stations,
            bank,
            limits,
            gearFriction.Value,
            convection.Value)
        {
            PlateSpreadingFactor = spreading.Value,
            PlateCooling = new PlateCooling(top.Value, bottom.Value, emissivity.Value),
            Route = route,
            Calibrations = calibrations,
            LoadModel = loadModel.Value,
        };
        return new RigResolveResult(rig, ordered) { Tolerances = tolerances ?? StressTolerances.None };
    }

    // "route": each leg a dwell (dwell_s > 0) or a move (x_mm, y_mm, speed_m_per_s > 0), never a mix.
    private static (CraftRoute? Route, bool Ok) ResolveRoute(RigDocument document, Context ctx)
    {
        if (document.Route is not { } legs)
        {
            return (null, true);
        }
        if (legs.Count == 0)
        {
            ctx.Report("$.route", Messages.RouteEmpty());
            return (null, false);
        }
        var result = new List<RouteLeg>();
        bool ok = true;
        for (int i = 0; i < legs.Count; i++)
        {
            var leg = legs[i];
            string path = $"$.route[{i}]";
            bool move = leg.XMm is not null || leg.YMm is not null || leg.SpeedMPerS is not null;
            if (leg.DwellS is not null && !move)
            {
                if (ctx.Required(leg.DwellS, path + ".dwell_s", ValueRule.Positive) is { } dwell)
                {
                    result.Add(RouteLeg.Dwell(dwell));
                    continue;
                }
            }
            else if (leg.DwellS is null && move)
            {
                var x = ctx.Required(leg.XMm, path + ".x_mm", ValueRule.Between(-100_000, 100_000));
                var y = ctx.Required(leg.YMm, path + ".y_mm", ValueRule.Between(-100_000, 100_000));
                var speed = ctx.Required(leg.SpeedMPerS, path + ".speed_m_per_s", ValueRule.Between(0.001, 20));
                if (x is not null && y is not null && speed is not null)
                {
                    result.Add(RouteLeg.Move(x.Value / 1000.0, y.Value / 1000.0, speed.Value));
                    continue;
                }
            }
            else
            {
                ctx.Report(path, Messages.RouteLegShape());
            }
            ok = false;
        }
        return ok ? (new CraftRoute(result), true) : (null, false);
    }

    // "calibrations": {rotor id: file}, each file relative to the rig file, made for that rotor and its present catalog row.
    private static Dictionary<string, RotorCalibration> ResolveCalibrations(RigDocument document, string rigFile, List<Station> stations, bool stationsOk, Context ctx,
        Func<string, List<InputProblem>, string?> readText)
    {
        var result = new Dictionary<string, RotorCalibration>(StringComparer.Ordinal);
        if (document.Calibrations is not { } entries)
        {
            return result;
        }
        string folder = Path.GetDirectoryName(rigFile) ?? "";
        foreach (var (rotorId, fileName) in entries)
        {
            string path = "$.calibrations." + rotorId;
            var rotor = stations.Select(s => s.Rotor).FirstOrDefault(r => string.Equals(r.Id, rotorId, StringComparison.Ordinal));
            if (rotor is null)
            {
                if (stationsOk)
                {
                    ctx.Report(path, Messages.CalibrationUnusedRotor(rotorId));
                }
                continue;
            }
            string full = Path.IsPathRooted(fileName) ? fileName : Path.Combine(folder, fileName);
            var fileProblems = new List<InputProblem>();
            string? text = readText(full, fileProblems);
            var read = text is null ? null : Bench.CalibrationFile.Read(text, full, fileProblems);
            foreach (var p in fileProblems)
            {
                ctx.Problems.Add(p);
            }
            if (read is not { } r)
            {
                continue;
            }
            if (!string.Equals(r.Calibration.RotorId, rotorId, StringComparison.Ordinal))
            {
                ctx.Problems.Add(new InputProblem(full, 0, 0, "rotor", Messages.CalibrationRotorMismatch(r.Calibration.RotorId, rotorId)));
                continue;
            }
            if (!string.Equals(r.RotorRowSha256, Bench.CalibrationFile.RotorRowHash(rotor), StringComparison.OrdinalIgnoreCase))
            {
                ctx.Problems.Add(new InputProblem(full, 0, 0, "rotor_row_sha256", Messages.CalibrationRotorChanged(rotorId)));
                continue;
            }
            result[rotorId] = r.Calibration with { Source = fileName, BenchPoints = BenchPointsBeside(full, r.DataFile, r.DataSha256, readText) };
        }
        return result;
    }

    // The steady points a calibration was fitted to, when its data file lies beside it unchanged (same SHA-256); otherwise
    // none: they are only shown over the fitted curve, never used for a result.
    private static IReadOnlyList<Core.Loads.BenchPoint> BenchPointsBeside(string calibrationPath, string? dataFile, string? dataSha256,
        Func<string, List<InputProblem>, string?> readText)
    {
        if (dataFile is null || dataSha256 is null)
        {
            return [];
        }
        string path = Path.Combine(Path.GetDirectoryName(calibrationPath) ?? "", dataFile);
        var ignored = new List<InputProblem>();
        string? text = readText(path, ignored);
        if (text is null || !string.Equals(Hashes.Sha256(text), dataSha256, StringComparison.OrdinalIgnoreCase))
        {
            return [];
        }
        var data = Bench.BenchData.Read(text, path, 0);
        return data.IsClean && data.Points is { } points ? points : [];
    }

    /// <summary>Checks the "tolerances" section of a document and converts it to SI; problems are added to
    /// <paramref name="problems"/>.</summary>
    /// <param name="document">The rig document.</param>
    /// <param name="rigFile">The rig file's name, for problems.</param>
    /// <param name="locations">Positions of the document's keys in the file, or null.</param>
    /// <param name="problems">Receives every problem found.</param>
    /// <returns>The tolerances (<see cref="StressTolerances.None"/> when the section is absent), or null when it has problems.</returns>
    public static StressTolerances? ResolveTolerances(RigDocument document, string rigFile, RigSourceMap? locations, List<InputProblem> problems)
    {
        ArgumentNullException.ThrowIfNull(document);
        ArgumentNullException.ThrowIfNull(rigFile);
        ArgumentNullException.ThrowIfNull(problems);
        return ResolveTolerances(document, new Context(rigFile, locations ?? RigSourceMap.Empty, problems));
    }

    private static StressTolerances? ResolveTolerances(RigDocument document, Context ctx)
    {
        if (document.Tolerances is not { } section)
        {
            return StressTolerances.None;
        }
        var map = new Dictionary<StressQuantity, Tolerance>();
        bool ok = true;
        foreach (var (key, entry) in section.Entries)
        {
            string path = "$.tolerances." + key;
            var known = RigToleranceKeys.All.FirstOrDefault(k => k.Key == key);
            if (known.Key is null)
            {
                ctx.Report(path, Messages.UnknownKey(key, Suggestions.Closest(key, RigToleranceKeys.Keys)));
                ok = false;
                continue;
            }
            var tolerance = ResolveEntry(entry, path, known.Key, known.Quantity, known.ToSi, ctx);
            if (tolerance is null)
            {
                ok = false;
                continue;
            }
            map[known.Quantity] = tolerance;
        }
        return ok ? new StressTolerances(map) : null;
    }

    // Read-time rule (StressSpreadRule): no spread may carry a positive quantity to zero or below, and temperature spreads
    // stay within the range the file accepts for the temperature itself; otherwise a study would fail mid-run.
    private static void CheckSpreads(Rig rig, StressTolerances tolerances, Context ctx)
    {
        foreach (var v in StressSpreadRule.Check(rig, tolerances))
        {
            var (key, _, toSi) = RigToleranceKeys.All.First(k => k.Quantity == v.Quantity);
            var t = tolerances.Of(v.Quantity);
            // A gap offset is checked on the landed gap it is added to, which the file gives in mm like the offset.
            double factor = v.Quantity == StressQuantity.GapOffset ? 1e-3 : toSi;
            ctx.Report(SpreadPath(key, t), Messages.ToleranceReachesZero(v.Checked, v.Station, v.NominalSi / factor, v.LowestSi / factor,
                RigToleranceKeys.UnitOf(key), v.ZeroAllowed, t.Shape == ToleranceShape.Normal));
        }
        CheckTemperature(StressQuantity.AmbientTemperature, "ambient temperature", rig.AmbientC, AmbientRangeC);
        CheckTemperature(StressQuantity.PlateTemperature, "plate temperature", rig.PlateTemperatureC, PlateTempRangeC);

        void CheckTemperature(StressQuantity quantity, string what, double nominal, (double Min, double Max) range)
        {
            var t = tolerances.Of(quantity);
            double reach = StressSpreadRule.NormalReachSd * t.StandardDeviation;
            var (low, high) = t.Shape switch
            {
                ToleranceShape.Normal => (nominal - reach, nominal + reach),
                ToleranceShape.Uniform => (nominal + t.Lower, nominal + t.Upper),
                _ => (nominal, nominal),
            };
            if (low < range.Min || high > range.Max)
            {
                ctx.Report(SpreadPath(RigToleranceKeys.KeyOf(quantity), t), Messages.ToleranceTemperatureRange(what, low, high, range.Min, range.Max));
            }
        }
    }

    private static string SpreadPath(string key, Tolerance t) => $"$.tolerances.{key}." + (t.Shape, t.Scale) switch
    {
        (ToleranceShape.Normal, ToleranceScale.Percent) => "normal_sd_pct",
        (ToleranceShape.Normal, _) => "normal_sd",
        (_, ToleranceScale.Percent) => "uniform_pct",
        _ => "uniform",
    };

    private static Tolerance? ResolveEntry(RigToleranceEntry entry, string path, string key, StressQuantity quantity, double toSi, Context ctx)
    {
        int found = (entry.NormalSdPct is null ? 0 : 1) + (entry.NormalSd is null ? 0 : 1) + (entry.UniformPct is null ? 0 : 1) + (entry.Uniform is null ? 0 : 1);
        if (found != 1)
        {
            ctx.Report(path, Messages.ToleranceNeedsOneSpread(found));
            return null;
        }
        bool positive = quantity.IsPositive();
        if (entry.NormalSdPct is not null || entry.UniformPct is not null)
        {
            if (quantity.IsAbsoluteOnly())
            {
                ctx.Report(path + (entry.NormalSdPct is not null ? ".normal_sd_pct" : ".uniform_pct"), Messages.ToleranceAbsoluteOnly(key));
                return null;
            }
        }
        if (entry.NormalSdPct is { } sdPct)
        {
            // A normal spread wider than half of nominal is no part tolerance; it would also make the truncation at zero
            // of positive quantities matter (see Tolerance).
            return ctx.Required(sdPct, path + ".normal_sd_pct", ValueRule.Between(0, 50)) is { } v
                ? Tolerance.Normal(v, ToleranceScale.Percent, positive) : null;
        }
        if (entry.NormalSd is { } sd)
        {
            return ctx.Required(sd, path + ".normal_sd", ValueRule.NonNegative) is { } v
                ? Tolerance.Normal(v * toSi, ToleranceScale.Absolute, positive) : null;
        }
        bool percent = entry.UniformPct is not null;
        double[] bounds = entry.UniformPct ?? entry.Uniform!;
        string boundsPath = path + (percent ? ".uniform_pct" : ".uniform");
        if (bounds.Length != 2)
        {
            ctx.Report(boundsPath, Messages.WrongType("an array of two finite numbers [low, high]", $"{bounds.Length} numbers"));
            return null;
        }
        // Percent bounds of a positive quantity stay above -100 % so some of the interval is above zero.
        var rule = percent ? ValueRule.Between(-99, 1000) : ValueRule.Any;
        double? low = ctx.Required(bounds[0], boundsPath, rule);
        double? high = ctx.Required(bounds[1], boundsPath, rule);
        if (low is null || high is null)
        {
            return null;
        }
        if (low > high)
        {
            ctx.Report(boundsPath, Messages.ToleranceBoundsOrder(low.Value, high.Value));
            return null;
        }
        return percent
            ? Tolerance.Uniform(low.Value, high.Value, ToleranceScale.Percent, positive)
            : Tolerance.Uniform(low.Value * toSi, high.Value * toSi, ToleranceScale.Absolute, positive);
    }

    /// <summary>Collects problems for one resolve, placing each at its JSON path's position.</summary>
    private sealed class Context(string file, RigSourceMap map, List<InputProblem> problems)
    {
        public List<InputProblem> Problems => problems;

        public void Report(string path, string message)
        {
            var (line, column) = map.Find(path);
            problems.Add(new InputProblem(file, line, column, path, message));
        }

        public void Missing(string path) => Report(path, Messages.MissingKey(path[(path.LastIndexOf('.') + 1)..]));

        public double? Required(double? value, string path, ValueRule rule)
        {
            if (value is null)
            {
                Missing(path);
                return null;
            }
            return Check(value.Value, path, rule);
        }

        public double? Optional(double? value, string path, ValueRule rule, double defaultValue)
            => value is null ? defaultValue : Check(value.Value, path, rule);

        private double? Check(double value, string path, ValueRule rule)
        {
            if (!double.IsFinite(value))
            {
                Report(path, Messages.NotFinite(value.ToString(System.Globalization.CultureInfo.InvariantCulture)));
                return null;
            }
            if (rule.Check(value) is { } message)
            {
                Report(path, message);
                return null;
            }
            return value;
        }

        public T? Lookup<T>(string? id, string path, PartKind kind, string kindName, CatalogLoadResult? catalogs,
            Func<PartsCatalog, IReadOnlyList<T>> list, Func<T, string> idOf) where T : class
        {
            if (string.IsNullOrWhiteSpace(id))
            {
                Missing(path);
                return null;
            }
            if (catalogs is null)
            {
                return null;
            }
            var found = list(catalogs.Catalog).FirstOrDefault(x => string.Equals(idOf(x), id.Trim(), StringComparison.OrdinalIgnoreCase));
            if (found is null && !catalogs.IsRejected(kind, id.Trim()))
            {
                Report(path, Messages.UnknownId(kindName, id, catalogs.Paths.For(kind)));
            }
            return found;
        }
    }
}

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
    public static (double Min, double Max) AmbientRangeC => (RigSchema.AmbientC.Rule!.Min, RigSchema.AmbientC.Rule!.Max);

    /// <summary>Plate temperatures the rig file accepts (plate.temperature_c, and the reach of its tolerance), C.</summary>
    public static (double Min, double Max) PlateTempRangeC => (RigSchema.PlateTemperatureC.Rule!.Min, RigSchema.PlateTemperatureC.Rule!.Max);

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
        string? name = document.Name;
        if (string.IsNullOrWhiteSpace(name))
        {
            ctx.Missing(RigSchema.Name.JsonPath());
        }
        var plate = ResolvePlate(document, catalogs, ctx);
        var body = ResolveCraft(document, ctx);
        var gaps = ResolveGaps(document, ctx);
        var ambient = ctx.Value(RigSchema.AmbientC, document);
        var loadModel = ResolveLoadModel(document, ctx);
        var mount = ctx.Choice(RigSchema.Mount, document, 0, Messages.BadMount) switch
        {
            null => (MountKind?)null,
            "guided" => MountKind.Guided,
            "bench" => MountKind.Bench,
            _ => MountKind.Free,
        };
        var gearFriction = ctx.Value(RigSchema.GearYawFrictionNm, document);
        var (stations, stationsOk) = ResolveStations(document, catalogs, ctx);
        var (bank, packOk) = ResolvePack(document, catalogs, ctx);
        var limits = ResolveLimits(document, ctx);
        var (route, routeOk) = ResolveRoute(document, ctx);
        var tolerances = ResolveTolerances(document, ctx);
        bool partsOk = catalogs is not null;
        if (tolerances is not null && limits is not null && body is not null && plate is not null && ambient is not null && gaps is not null
            && partsOk && stationsOk)
        {
            var nominal = new Rig("tolerance check", new Plate(plate.Material, plate.ThicknessMm / 1000.0), plate.TemperatureC, ambient.Value, body,
                gaps.Value.DesignMm / 1000.0, gaps.Value.LandedMm / 1000.0, stations, bank, limits, 0, 1);
            CheckSpreads(nominal, tolerances, ctx);
        }
        var calibrations = ResolveCalibrations(document, rigFile, stations, stationsOk, ctx, readText ?? TextFiles.TryRead);
        if (stationsOk && mount is not null && limits is not null)
        {
            CheckDuties(stations, mount.Value, limits.MaxDuty, ctx);
        }

        var ordered = problems.OrderBy(p => p.Line).ThenBy(p => p.Column).ToList();
        if (ordered.Count > 0 || !partsOk || !stationsOk || !packOk || !routeOk || name is null || plate is null || body is null || gaps is null
            || ambient is null || gearFriction is null || limits is null || loadModel is null || mount is null)
        {
            return new RigResolveResult(null, ordered);
        }
        var rig = new Rig(name.Trim(), new Plate(plate.Material, plate.ThicknessMm / 1000.0) { BackIronM = plate.BackIronMm / 1000.0 },
            plate.TemperatureC, ambient.Value, body, gaps.Value.DesignMm / 1000.0, gaps.Value.LandedMm / 1000.0, stations, bank, limits,
            gearFriction.Value, plate.ConvectionWPerM2K)
        {
            PlateSpreadingFactor = plate.SpreadingFactor,
            PlateCooling = plate.Cooling,
            Route = route,
            Calibrations = calibrations,
            LoadModel = loadModel.Value,
            Mount = mount.Value,
        };
        return new RigResolveResult(rig, ordered) { Tolerances = tolerances ?? StressTolerances.None };
    }

    // "plate": the material from the catalog and the plate's values, or null (after reporting) when any is missing or bad.
    private static PlateValues? ResolvePlate(RigDocument document, CatalogLoadResult? catalogs, Context ctx)
    {
        if (document.Plate is not { } plate)
        {
            ctx.Missing(RigSchema.Plate.JsonPath());
            return null;
        }
        var material = ctx.Lookup(plate.Material, RigSchema.PlateMaterial.JsonPath(), PartKind.Plate, "plate material", catalogs, c => c.Plates, m => m.Id);
        var thickness = ctx.Value(RigSchema.PlateThicknessMm, plate);
        var temperature = ctx.Value(RigSchema.PlateTemperatureC, plate);
        var convection = ctx.Value(RigSchema.PlateConvection, plate);
        var spreading = ctx.Value(RigSchema.PlateSpreadingFactor, plate);
        // Each face defaults to the convection coefficient of both faces.
        double? top = null, bottom = null;
        if (convection is { } both)
        {
            top = ctx.Value(RigSchema.PlateConvectionTop, plate, fallback: both);
            bottom = ctx.Value(RigSchema.PlateConvectionBottom, plate, fallback: both);
        }
        var emissivity = ctx.Value(RigSchema.PlateEmissivity, plate);
        var backIron = ctx.Value(RigSchema.PlateBackIronMm, plate);
        if (material is null || thickness is null || temperature is null || convection is null || spreading is null || top is null || bottom is null
            || emissivity is null || backIron is null)
        {
            return null;
        }
        return new PlateValues(material, thickness.Value, temperature.Value, convection.Value, spreading.Value,
            new PlateCooling(top.Value, bottom.Value, emissivity.Value), backIron.Value);
    }

    // "craft": the body in SI units, or null.
    private static CraftBody? ResolveCraft(RigDocument document, Context ctx)
    {
        if (document.Craft is not { } craft)
        {
            ctx.Missing(RigSchema.Craft.JsonPath());
            return null;
        }
        var empty = ctx.Value(RigSchema.CraftEmptyMassKg, craft);
        var payload = ctx.Value(RigSchema.CraftPayloadKg, craft);
        var cgx = ctx.Value(RigSchema.CraftCgXMm, craft);
        var cgy = ctx.Value(RigSchema.CraftCgYMm, craft);
        var inertia = ctx.Value(RigSchema.CraftYawInertia, craft);
        var damping = ctx.Value(RigSchema.CraftHeaveDamping, craft);
        if (empty is null || payload is null || cgx is null || cgy is null || inertia is null || damping is null)
        {
            return null;
        }
        return new CraftBody(empty.Value, payload.Value, cgx.Value / 1000.0, cgy.Value / 1000.0, inertia.Value, damping.Value);
    }

    // "gap": design and landed gap in mm, the landed one no larger than the design one.
    private static (double DesignMm, double LandedMm)? ResolveGaps(RigDocument document, Context ctx)
    {
        if (document.Gap is not { } gap)
        {
            ctx.Missing(RigSchema.Gap.JsonPath());
            return null;
        }
        var design = ctx.Value(RigSchema.GapDesignMm, gap);
        var landed = ctx.Value(RigSchema.GapLandedMm, gap);
        if (design is not { } d || landed is not { } l)
        {
            return null;
        }
        if (l > d)
        {
            ctx.Report(RigSchema.GapLandedMm.JsonPath(), Messages.LandedAboveDesign(l, d));
            return null;
        }
        return (d, l);
    }

    private static LoadModelKind? ResolveLoadModel(RigDocument document, Context ctx)
        => ctx.Choice(RigSchema.LoadModel, document, 0, Messages.BadLoadModel) switch
        {
            null => null,
            "2d" => LoadModelKind.TwoDimensional,
            _ => LoadModelKind.ThreeDimensional,
        };

    // "stations": every station with its parts from the catalogs; not ok when any has a problem or two rotors overlap.
    private static (List<Station> Stations, bool Ok) ResolveStations(RigDocument document, CatalogLoadResult? catalogs, Context ctx)
    {
        var stations = new List<Station>();
        if (document.Stations is not { } stationDocs)
        {
            ctx.Missing(RigSchema.Stations.JsonPath());
            return (stations, false);
        }
        if (stationDocs.Count == 0)
        {
            ctx.Report(RigSchema.Stations.JsonPath(), Messages.NoStations());
            return (stations, false);
        }
        bool ok = true;
        for (int i = 0; i < stationDocs.Count; i++)
        {
            if (ResolveStation(stationDocs[i], i, catalogs, ctx) is { } station)
            {
                stations.Add(station);
            }
            else
            {
                ok = false;
            }
        }
        return (stations, ok && NoOverlap(stations, ctx) && UniqueNames(stationDocs, ctx));
    }

    // "name" (optional): not empty and not a number, so `--station` can take either without doubt.
    private static string? StationName(RigStationSection s, int i, Context ctx)
    {
        if (s.Name is null)
        {
            return null;
        }
        string name = s.Name.Trim();
        if (name.Length == 0 || double.TryParse(name, System.Globalization.NumberStyles.Float, System.Globalization.CultureInfo.InvariantCulture, out _))
        {
            ctx.Report(RigSchema.StationName.JsonPath(i), Messages.BadStationName(s.Name));
        }
        return name;
    }

    private static bool UniqueNames(List<RigStationSection> stations, Context ctx)
    {
        bool ok = true;
        for (int i = 0; i < stations.Count; i++)
        {
            if (stations[i].Name?.Trim() is not { Length: > 0 } name)
            {
                continue;
            }
            int first = stations.FindIndex(s => string.Equals(s.Name?.Trim(), name, StringComparison.OrdinalIgnoreCase));
            if (first < i)
            {
                ctx.Report(RigSchema.StationName.JsonPath(i), Messages.DuplicateStationName(name, first + 1));
                ok = false;
            }
        }
        return ok;
    }

    private static Station? ResolveStation(RigStationSection s, int i, CatalogLoadResult? catalogs, Context ctx)
    {
        var x = ctx.Value(RigSchema.StationXMm, s, i);
        var y = ctx.Value(RigSchema.StationYMm, s, i);
        var spin = ctx.Choice(RigSchema.StationSpin, s, i, Messages.BadSpin) switch
        {
            null => (SpinDirection?)null,
            "cw" => SpinDirection.Clockwise,
            _ => SpinDirection.CounterClockwise,
        };
        var rotor = ctx.Lookup(s.Rotor, RigSchema.StationRotor.JsonPath(i), PartKind.Rotor, "rotor", catalogs, c => c.Rotors, r => r.Id);
        Motor? motor = s.Motor is null ? null
            : ctx.Lookup(s.Motor, RigSchema.StationMotor.JsonPath(i), PartKind.Motor, "motor", catalogs, c => c.Motors, m => m.Id);
        SpeedController? controller = s.Controller is null ? null
            : ctx.Lookup(s.Controller, RigSchema.StationController.JsonPath(i), PartKind.Controller, "controller", catalogs, c => c.Controllers, c => c.Id);
        bool motorOk = s.Motor is null || motor is not null;
        bool controllerOk = s.Controller is null || controller is not null;
        if (x is null || y is null || spin is null || rotor is null || !motorOk || !controllerOk)
        {
            return null;
        }
        return new Station(x.Value / 1000.0, y.Value / 1000.0, spin.Value, rotor, motor, controller)
        {
            Name = StationName(s, i, ctx),
            Duty = ctx.Value(RigSchema.StationDuty, s, i),
        };
    }

    // "stations[].duty": at most the rig's max duty; none on a free craft (its trim sets them); on a guided rig on every
    // station or on none (set duties replace the common duty as a whole).
    private static void CheckDuties(List<Station> stations, MountKind mount, double maxDuty, Context ctx)
    {
        int first = stations.FindIndex(s => s.Duty is not null);
        if (first < 0)
        {
            return;
        }
        for (int i = 0; i < stations.Count; i++)
        {
            string path = RigSchema.StationDuty.JsonPath(i);
            if (stations[i].Duty is { } duty)
            {
                if (mount == MountKind.Free)
                {
                    ctx.Report(path, Messages.DutyOnFreeCraft());
                }
                else if (duty > maxDuty)
                {
                    ctx.Report(path, Messages.DutyAboveMax(duty, maxDuty));
                }
            }
            else if (mount == MountKind.Guided)
            {
                ctx.Report(RigSchema.Stations.JsonPath() + $"[{i}]", Messages.GuidedDutiesPartial(first + 1));
            }
        }
    }

    // Rotors must not overlap: axes at least the two outer radii apart.
    private static bool NoOverlap(List<Station> stations, Context ctx)
    {
        bool ok = true;
        for (int i = 0; i < stations.Count; i++)
        {
            for (int j = 0; j < i; j++)
            {
                double distance = Math.Sqrt(Math.Pow(stations[i].XM - stations[j].XM, 2) + Math.Pow(stations[i].YM - stations[j].YM, 2));
                double needed = stations[i].Rotor.OuterRadiusM + stations[j].Rotor.OuterRadiusM;
                if (distance < needed)
                {
                    ctx.Report($"$.stations[{i}]", Messages.StationsOverlap(stations[j].Label(j), distance * 1000.0, needed * 1000.0));
                    ok = false;
                }
            }
        }
        return ok;
    }

    // "pack" (optional): the bank with its chemistry's cell curve; not ok when the section is there but has a problem.
    private static (PackBank? Bank, bool Ok) ResolvePack(RigDocument document, CatalogLoadResult? catalogs, Context ctx)
    {
        if (document.Pack is not { } packDoc)
        {
            return (null, true);
        }
        var pack = ctx.Lookup(packDoc.Id, RigSchema.PackId.JsonPath(), PartKind.Pack, "pack", catalogs, c => c.Packs, p => p.Id);
        var count = ctx.Value(RigSchema.PackCount, packDoc);
        CellCurve? curve = null;
        if (pack is not null && catalogs is not null)
        {
            curve = catalogs.Catalog.CurveFor(pack.Chemistry);
            if (curve is null)
            {
                ctx.Report(RigSchema.PackId.JsonPath(), Messages.NoCurveForChemistry(pack.Chemistry, catalogs.Paths.CellCurves));
            }
        }
        return pack is not null && count is not null && curve is not null ? (new PackBank(pack, (int)count.Value, curve), true) : (null, false);
    }

    private static RigLimits? ResolveLimits(RigDocument document, Context ctx)
    {
        if (document.Limits is not { } lim)
        {
            ctx.Missing(RigSchema.Limits.JsonPath());
            return null;
        }
        var yaw = ctx.Value(RigSchema.LimitYawTorqueNm, lim);
        var plateMax = ctx.Value(RigSchema.LimitPlateTempC, lim);
        var cutoff = ctx.Value(RigSchema.LimitCellCutoffV, lim);
        var usable = ctx.Value(RigSchema.LimitUsableCapacityPct, lim);
        var duty = ctx.Value(RigSchema.LimitMaxDuty, lim);
        var liftoff = ctx.Value(RigSchema.LimitLiftoffTimeS, lim);
        if (yaw is null || plateMax is null || cutoff is null || usable is null || duty is null || liftoff is null)
        {
            return null;
        }
        return new RigLimits(yaw.Value, plateMax.Value, cutoff.Value, usable.Value / 100.0, duty.Value, liftoff.Value);
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
                if (ctx.Value(RigSchema.RouteDwellS, leg, i) is { } dwell)
                {
                    result.Add(RouteLeg.Dwell(dwell));
                    continue;
                }
            }
            else if (leg.DwellS is null && move)
            {
                var x = ctx.Value(RigSchema.RouteXMm, leg, i, needed: true);
                var y = ctx.Value(RigSchema.RouteYMm, leg, i, needed: true);
                var speed = ctx.Value(RigSchema.RouteSpeed, leg, i, needed: true);
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

    private sealed record PlateValues(PlateMaterial Material, double ThicknessMm, double TemperatureC, double ConvectionWPerM2K,
        double SpreadingFactor, PlateCooling Cooling, double BackIronMm);

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

        /// <summary>A number or whole number of the schema, checked against its range; a missing key is reported when the
        /// schema (or <paramref name="needed"/>) requires it, and otherwise takes its default or <paramref name="fallback"/>.</summary>
        public double? Value(RigKey key, object section, int index = 0, double? fallback = null, bool needed = false)
        {
            double? value = key.Get(section) switch
            {
                double d => d,
                int n => n,
                _ => null,
            };
            string path = key.JsonPath(index);
            if (value is null)
            {
                if (key.Required || needed)
                {
                    Missing(path);
                    return null;
                }
                return key.Default ?? fallback;
            }
            return Check(value.Value, path, key.Rule ?? ValueRule.Any);
        }

        /// <summary>One of the schema's words for a choice key (lower case), its default when absent and optional, or null
        /// after reporting a missing key or a word not in the list.</summary>
        public string? Choice(RigKey key, object section, int index, Func<string, string> message)
        {
            string path = key.JsonPath(index);
            if (key.Get(section) is not string text)
            {
                if (key.Required)
                {
                    Missing(path);
                }
                return key.DefaultNote;
            }
            string word = text.Trim().ToLowerInvariant();
            if (key.Choices.Contains(word))
            {
                return word;
            }
            Report(path, message(text));
            return null;
        }

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

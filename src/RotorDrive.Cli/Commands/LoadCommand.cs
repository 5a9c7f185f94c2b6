using System.CommandLine;
using System.CommandLine.Parsing;
using System.Globalization;
using RotorDrive.Cli.Output;
using RotorDrive.Core;
using RotorDrive.Core.Craft;
using RotorDrive.Core.Loads;
using RotorDrive.Core.Magnetics;
using RotorDrive.Core.Safety;
using RotorDrive.Core.Studies;
using RotorDrive.Files;
using RotorDrive.Files.Rigs;
using RotorDrive.Files.Plots;

namespace RotorDrive.Cli.Commands;

/// <summary><c>rotordrive load RIG.json [--station N | --rotor ID] [--gap-mm G] [--rpm FROM:TO:STEP] [--plate-temp-c T]
/// [--no-end-correction] [--model 3d|2d] [--json]</c>: one rotor's lift, torques and plate loss over a range of speeds, and its drag peak.</summary>
/// <remarks>Defaults: station 0, the rig's design gap, 0 to the rotor's max_rpm in 25 steps, the rig's plate temperature;
/// magnets at the rig's ambient temperature. Values come from the precomputed load table analyses use
/// (<see cref="RotorLoadTable"/>), built over the rig's range extended to cover what was asked.</remarks>
public static class LoadCommand
{
    /// <summary>Steps of the default speed sweep (0 to max_rpm).</summary>
    public const int DefaultSteps = 25;

    /// <summary>Builds the subcommand.</summary>
    /// <param name="clock">The clock for the date on plots; the system clock when null.</param>
    public static Command Create(TimeProvider? clock = null)
    {
        var rig = CommonOptions.RigArgument();
        var station = StationOption.Create("Station whose rotor to use");
        var rotor = new Option<string?>("--rotor")
        {
            Description = "Rotor design id from the rotors catalog (instead of a station's rotor).",
            HelpName = "ID",
        };
        var gap = RigKeyOption.Create("--gap-mm", RigSchema.GapDesignMm, "Air gap between magnet face and plate", "G");
        var rpm = new Option<RpmRange?>("--rpm")
        {
            Description = "Speeds FROM:TO:STEP in rpm (both ends included); default 0 to the rotor's max_rpm in 25 steps.",
            HelpName = "FROM:TO:STEP",
            CustomParser = ParseRpm,
        };
        var plateTemp = RigKeyOption.Create("--plate-temp-c", RigSchema.PlateTemperatureC, "Plate temperature", "T");
        var noEnd = new Option<bool>("--no-end-correction")
        {
            Description = "With the 2-D model: leave out the Russell-Norsworthy finite-width correction (implies --model 2d).",
        };
        var model = new Option<string?>("--model")
        {
            Description = "Load model: 3d (three-dimensional, the default unless the rig's load_model says otherwise) or 2d (strip model with width factor), e.g. to compare.",
            HelpName = "3d|2d",
        };
        model.AcceptOnlyFromAmong("3d", "2d");
        var json = CommonOptions.Json();
        var plot = CommonOptions.Plot("torque and lift against speed with the drag peak");
        var force = CommonOptions.Force();

        var command = new Command("load", "One rotor's lift, eddy/windage/bearing torque and plate loss versus speed, and its drag peak.");
        command.Arguments.Add(rig);
        command.Options.Add(station);
        command.Options.Add(rotor);
        command.Options.Add(gap);
        command.Options.Add(rpm);
        command.Options.Add(plateTemp);
        command.Options.Add(noEnd);
        command.Options.Add(model);
        command.Options.Add(json);
        command.Options.Add(plot);
        command.Options.Add(force);
        command.Validators.Add(r =>
        {
            if (r.GetResult(station) is { Implicit: false } && r.GetResult(rotor) is { Implicit: false })
            {
                r.AddError("--station and --rotor cannot be used together: give one.");
            }
        });
        command.SetAction(parse => Run(
            new LoadRequest(
                parse.GetValue(rig)!,
                parse.GetValue(station),
                parse.GetValue(rotor),
                parse.GetValue(gap),
                parse.GetValue(rpm),
                parse.GetValue(plateTemp),
                !parse.GetValue(noEnd),
                parse.GetValue(model),
                parse.GetValue(json),
                parse.GetValue(plot),
                parse.GetValue(force),
                CommonOptions.Today(clock)),
            parse.InvocationConfiguration.Output,
            parse.InvocationConfiguration.Error));
        return command;
    }

    // Runs the command; returns ExitCodes.Ok, or ExitCodes.BadInput when the rig, the station or the rotor cannot be used.
    private static int Run(LoadRequest request, TextWriter output, TextWriter error)
    {
        ArgumentNullException.ThrowIfNull(request);
        if (CommonOptions.RefusesPlot("load", request.PlotPath, request.Force, error))
        {
            return ExitCodes.BadInput;
        }
        var loaded = RigInput.LoadOrReport(request.RigPath, error);
        if (loaded is null)
        {
            return ExitCodes.BadInput;
        }
        Rig rig = loaded.Rig!;

        if (!TryResolveRotor(request, loaded, error, out var design, out int? stationIndex))
        {
            return ExitCodes.BadInput;
        }

        LoadModelKind? kind = request.Model switch
        {
            "3d" => LoadModelKind.ThreeDimensional,
            "2d" => LoadModelKind.TwoDimensional,
            _ => request.EndCorrection ? null : LoadModelKind.TwoDimensional,
        };
        if ((kind ?? rig.LoadModel) == LoadModelKind.ThreeDimensional && !request.EndCorrection)
        {
            error.WriteLine("rotordrive load: error: --no-end-correction applies to the 2-D model only (the 3-D model needs no width factor); use --model 2d.");
            return ExitCodes.BadInput;
        }
        var studyRequest = new LoadStudyRequest(
            design,
            request.GapMm is { } gapMm ? gapMm / 1000.0 : null,
            request.PlateTempC,
            request.Rpm is { } range ? SpeedGrid.Range(range.FromRpm, range.ToRpm, range.StepRpm).Select(Units.RpmToRadPerS).ToArray() : null,
            DefaultSteps,
            kind,
            request.EndCorrection);
        if (LoadStudy.Refusal(rig, studyRequest) is { } refusal)
        {
            error.WriteLine($"rotordrive load: error: --plate-temp-c: {refusal}.");
            return ExitCodes.BadInput;
        }
        var study = LoadStudy.Run(rig, studyRequest);
        var result = study.Sweep;

        var report = ToReport(result, stationIndex, stationIndex is { } n ? rig.Stations[n - 1].Name : null, study.Model == LoadModelKind.ThreeDimensional ? "3d" : "2d", study.StandstillPullN);
        if (request.Json)
        {
            JsonOutput.Write(output, report);
        }
        else
        {
            WriteText(report, rig, design, output);
        }
        if (request.PlotPath is { } plotPath && !CommonOptions.WritePlot("load", LoadPlot.Build(result, rig.Name, request.Today), plotPath, request.Force, error))
        {
            return ExitCodes.BadInput;
        }
        if (study.AboveRatedSpeed)
        {
            error.WriteLine($"Caution: speeds above rotor '{design.Id}''s rated {Numbers.Format(Units.RadPerSToRpm(design.MaxSpeedRadPerS), 0)} rpm were asked for; a rotor run past its rating can burst.");
        }
        return ExitCodes.Ok;
    }

    // The rotor asked for: a catalog rotor by --rotor, else the rotor of --station (default 1).
    private static bool TryResolveRotor(LoadRequest request, RigLoadResult loaded, TextWriter error, out RotorDesign design, out int? stationIndex)
    {
        design = null!;
        stationIndex = null;
        Rig rig = loaded.Rig!;
        if (request.RotorId is { } id)
        {
            RotorDesign? found = loaded.Catalog!.Rotors.FirstOrDefault(r => string.Equals(r.Id, id, StringComparison.Ordinal));
            if (found is null)
            {
                error.WriteLine($"rotordrive load: error: --rotor: no rotor '{id}' in {loaded.CatalogPaths!.Rotors}; known ids: {string.Join(", ", loaded.Catalog.Rotors.Select(r => r.Id))}.");
                return false;
            }
            design = found;
        }
        else
        {
            if (StationOption.Find(rig, request.Station, "load", error) is not { } number)
            {
                return false;
            }
            stationIndex = number;
            design = rig.Stations[number - 1].Rotor;
        }
        return true;
    }

    private static LoadReport ToReport(LoadSweepResult result, int? station, string? stationName, string model, double? standstillPullN) => new(
        result.RotorId,
        station,
        stationName,
        model,
        standstillPullN is not null,
        standstillPullN,
        result.GapM * 1000.0,
        result.PlateTempC,
        result.MagnetTempC,
        result.EndEffectCorrection,
        result.Rows.Select(r => new PointEntry(r.SpeedRpm, r.LiftN, r.EddyTorqueNm, r.WindageTorqueNm, r.BearingTorqueNm, r.TotalTorqueNm, r.EddyPowerW)).ToList(),
        new PeakEntry(result.DragPeak.SpeedRpm, result.DragPeak.TorqueNm, result.DragPeak.Status));

    private static void WriteText(LoadReport report, Rig rig, RotorDesign design, TextWriter o)
    {
        string where = report.Station is { } s ? $" (station {s}{(report.StationName is { } name ? $", {name}" : "")})" : "";
        o.WriteLine($"Rotor load: {report.Rotor}{where}, {design.Segments} segments, M = {design.SegmentsPerWavelength}, "
            + $"radii {Numbers.Format(design.InnerRadiusM * 1000, 1)}-{Numbers.Format(design.OuterRadiusM * 1000, 1)} mm");
        o.WriteLine($"  plate {rig.Plate.Material.Id}, {Numbers.Format(rig.Plate.ThicknessM * 1000, 1)} mm at {Numbers.Format(report.PlateTempC, 1)} C; "
            + $"air gap {Numbers.Format(report.GapMm, 2)} mm; magnets at {Numbers.Format(report.MagnetTempC, 1)} C; "
            + (report.Model == "3d" ? "3-D load model" : $"2-D load model, end correction {(report.EndCorrection ? "on" : "off")}"));
        o.WriteLine();
        var table = new TextTable(
            new TableColumn("speed_rpm", Alignment.Right), new TableColumn("lift_n", Alignment.Right),
            new TableColumn("eddy_torque_nm", Alignment.Right), new TableColumn("windage_torque_nm", Alignment.Right),
            new TableColumn("bearing_torque_nm", Alignment.Right), new TableColumn("total_torque_nm", Alignment.Right),
            new TableColumn("eddy_power_w", Alignment.Right));
        foreach (var p in report.Points)
        {
            table.AddRow(Numbers.Format(p.SpeedRpm, 0), Numbers.Format(p.LiftN, 2), Numbers.Format(p.EddyTorqueNm, 3),
                Numbers.Format(p.WindageTorqueNm, 4), Numbers.Format(p.BearingTorqueNm, 4), Numbers.Format(p.TotalTorqueNm, 3),
                Numbers.Format(p.EddyPowerW, 1));
        }
        table.Write(o, 2);
        o.WriteLine();
        o.WriteLine(report.DragPeak.Status switch
        {
            DragPeakStatus.Converged or DragPeakStatus.ScanOnly =>
                $"Drag peak: {Numbers.Format(report.DragPeak.TorqueNm, 3)} N m of eddy torque at {Numbers.Format(report.DragPeak.SpeedRpm, 0)} rpm; the motor must pass it during spin-up.",
            DragPeakStatus.AboveSearchRange =>
                $"Drag peak: above {Numbers.Format(report.DragPeak.SpeedRpm, 0)} rpm (eddy torque still rising there: {Numbers.Format(report.DragPeak.TorqueNm, 3)} N m).",
            _ => "Drag peak: none (no eddy torque).",
        });
        o.WriteLine();
        if (report.Model == "3d")
        {
            o.WriteLine("Model: 3-D ring model (the array's field as cylindrical harmonics over the plate, with its harmonics): "
                + "the pitch's growth with radius, fringing at the magnets' edges and current closure in the plate come out of the solution. Plate assumed much wider than the rotor; calibrate against bench data.");
        }
        else
        {
            o.WriteLine("Model: 2-D strip layer model per radius" + (report.EndCorrection ? " with the Russell-Norsworthy finite-width correction" : " without width correction")
                + ". It over-predicts lift at low speed and can under-predict drag above the drag peak; calibrate against bench data.");
        }
        if (report.StandstillPullN is { } pull)
        {
            var steel = Cautions.SteelUnderPlate(new SteelAttraction(pull, report.GapMm / 1000.0, null));
            o.WriteLine($"Warning, {steel.Title.ToLowerInvariant()}: {steel.Reason}. {steel.Text}");
        }
        o.WriteLine("Caution: the plate takes the eddy power as heat; magnet rotors crush fingers, upset pacemakers and can burst at speed. Estimates only: defer to manufacturers' ratings.");
    }

    private static RpmRange? ParseRpm(ArgumentResult result)
    {
        string text = result.Tokens.Count == 1 ? result.Tokens[0].Value : string.Join(' ', result.Tokens.Select(t => t.Value));
        string[] parts = text.Split(':');
        var values = new double[parts.Length];
        bool numbers = parts.Length == 3 && parts.Select((p, i) =>
            double.TryParse(p, NumberStyles.Float, CultureInfo.InvariantCulture, out values[i]) && double.IsFinite(values[i])).All(ok => ok);
        if (!numbers)
        {
            result.AddError($"--rpm expects FROM:TO:STEP in rpm (for example 0:6000:250); got '{text}'.");
            return null;
        }
        (double from, double to, double step) = (values[0], values[1], values[2]);
        if (from < 0 || to < from || step <= 0)
        {
            result.AddError($"--rpm {text}: FROM must be 0 or more, TO at least FROM and STEP more than 0.");
            return null;
        }
        if ((to - from) / step > SpeedGrid.MaxPoints - 1)
        {
            result.AddError($"--rpm {text}: more than {SpeedGrid.MaxPoints} speeds; use a larger STEP.");
            return null;
        }
        return new RpmRange(from, to, step);
    }

    // A parsed --rpm FROM:TO:STEP.
    private sealed record RpmRange(double FromRpm, double ToRpm, double StepRpm);

    // Everything the load command was asked for.
    private sealed record LoadRequest(
        string RigPath,
        string? Station,
        string? RotorId,
        double? GapMm,
        RpmRange? Rpm,
        double? PlateTempC,
        bool EndCorrection,
        string? Model,
        bool Json,
        string? PlotPath,
        bool Force,
        DateOnly Today);

    private sealed record LoadReport(
        string Rotor,
        int? Station,
        string? StationName,
        string Model,
        bool SteelUnderPlate,
        double? StandstillPullN,
        double GapMm,
        double PlateTempC,
        double MagnetTempC,
        bool EndCorrection,
        IReadOnlyList<PointEntry> Points,
        PeakEntry DragPeak);

    private sealed record PointEntry(
        double SpeedRpm,
        double LiftN,
        double EddyTorqueNm,
        double WindageTorqueNm,
        double BearingTorqueNm,
        double TotalTorqueNm,
        double EddyPowerW);

    private sealed record PeakEntry(double SpeedRpm, double TorqueNm, DragPeakStatus Status);
}

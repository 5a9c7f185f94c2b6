using System.CommandLine;
using System.Globalization;
using RotorDrive.Cli.Output;
using RotorDrive.Core;
using RotorDrive.Core.Craft;
using RotorDrive.Core.Simulation;
using RotorDrive.Core.Thermal;
using RotorDrive.Files;
using RotorDrive.Files.Exports;
using RotorDrive.Files.Plots;
using RotorDrive.Files.Rigs;

namespace RotorDrive.Cli.Commands;

/// <summary><c>rotordrive endurance RIG.json [--csv FILE] [--plate-map FILE] [--plate-sweep] [--force] [--json]</c>: how
/// long the rig hovers from a full pack, in place or along its route, before the first limit (pack cutoff or usable
/// capacity, trim, winding temperature, currents, the plate's hottest point); or, with <c>--plate-sweep</c>, the same for
/// every plate material in the catalog and thicknesses from 3 to 25 mm.</summary>
/// <remarks>Exit 1 when a limit other than the pack's usable capacity or cutoff ends the run (running out of charge is the
/// expected end of a hover; overheating or overcurrent is a finding), or when no hover exists at the start.</remarks>
public static class EnduranceCommand
{
    /// <summary>Builds the subcommand.</summary>
    /// <param name="clock">The clock for the date on plots; the system clock when null.</param>
    public static Command Create(TimeProvider? clock = null)
    {
        var rig = CommonOptions.RigArgument();
        var csv = CommonOptions.Csv("the endurance time traces");
        var force = CommonOptions.Force();
        var plot = CommonOptions.Plot("charge, pack voltage and temperatures (the plate peak) against time");
        var json = CommonOptions.Json();
        var plateMap = new Option<string?>("--plate-map")
        {
            Description = "Write the plate's temperature field at the end of the run to this CSV file (x_mm, y_mm, temperature_c).",
            HelpName = "FILE",
        };
        var sweep = new Option<bool>("--plate-sweep")
        {
            Description = "Hover in place over every plate material of the catalog at thicknesses from 3 to 25 mm: time to the plate limit, hover power and the hover time with the plate limit set aside, per floor.",
        };
        var gap = RigKeyOption.Create("--gap-mm", RigSchema.GapDesignMm, "Bench rig only: the stands' air gap", "G");
        var duty = RigKeyOption.Create("--duty", RigSchema.StationDuty, "Bench rig only: every station's duty", "D");
        var command = new Command("endurance", "Hover time from a full pack until the first limit, with traces of charge, voltage, currents and temperatures.");
        command.Arguments.Add(rig);
        command.Options.Add(csv);
        command.Options.Add(force);
        command.Options.Add(json);
        command.Options.Add(plateMap);
        command.Options.Add(sweep);
        command.Options.Add(gap);
        command.Options.Add(duty);
        command.Options.Add(plot);
        command.SetAction(parse => parse.GetValue(sweep)
            ? Sweep(parse.GetValue(rig)!, parse.GetValue(gap), parse.GetValue(duty), parse.GetValue(json), parse.InvocationConfiguration.Output, parse.InvocationConfiguration.Error)
            : Run(
            parse.GetValue(rig)!,
            parse.GetValue(gap),
            parse.GetValue(duty),
            parse.GetValue(csv),
            parse.GetValue(plateMap),
            parse.GetValue(force),
            parse.GetValue(json),
            new PlotRequest(parse.GetValue(plot), CommonOptions.Today(clock)),
            parse.InvocationConfiguration.Output,
            parse.InvocationConfiguration.Error));
        return command;
    }

    private static int Run(string rigPath, double? gapMm, double? duty, string? csvPath, string? mapPath, bool force, bool json, PlotRequest plot, TextWriter output, TextWriter error)
    {
        if (CommonOptions.RefusesExistingCsv("endurance", csvPath, force, error) || CommonOptions.RefusesExistingCsv("endurance", mapPath, force, error)
            || CommonOptions.RefusesPlot("endurance", plot.Path, force, error))
        {
            return ExitCodes.BadInput;
        }
        var model = CraftInput.ModelOrReport("endurance", rigPath, error, gapMm, duty);
        if (model is null)
        {
            return ExitCodes.BadInput;
        }
        Rig rig = model.Rig;
        var sim = SimulationRig.FromModel(model);
        var study = EnduranceStudy.Run(sim);
        var result = study.Run;
        if (!WriteExports(result, csvPath, mapPath, force, error))
        {
            return ExitCodes.BadInput;
        }
        bool pass = study.Passes;
        var start = result.StartHover;
        var report = new EnduranceReport(
            rig.Name,
            JsonNames.Of(rig.Mount),
            start.Balanced ? start.GapM * 1000 : null,
            start.Stations.Select(h => h.Duty).ToArray(),
            result.RuntimeS,
            result.RuntimeS / 60.0,
            result.FirstLimit,
            result.FirstLimitText,
            result.LimitStation + 1,
            result.StartHover.Stations.Select(h => h.SpeedRpm).ToArray(),
            result.StartPackCurrentA,
            result.FinalSocFraction * 100,
            result.FinalBusVoltageV,
            result.FinalPackCurrentA,
            result.PeakWindingTempC,
            result.PeakPlateTempC,
            study.PlateLimitC,
            sim.PlateSpreadingFactor,
            PlateModel(result.PlateSetup, sim.PlateSpreadingFactor),
            result.Steps,
            pass)
        {
            PlateLimitTimeS = result.PlateLimitTimeS,
            PlateHotspot = result.PlateHotspot is { } hot ? new HotspotReport(hot.XM * 1000, hot.YM * 1000, hot.TemperatureC) : null,
            PlateConductivityWPerMK = result.PlateSetup?.ConductivityWPerMK,
            PlateLossWPerM2K = result.PlateSetup?.LossWPerM2K,
            Trace = result.Trace is { } tr ? TraceEntries(tr, result) : null,
            FailedCriteria = study.FailedCriteria,
            LimitingConstraint = study.LimitingConstraint,
        };
        if (json)
        {
            JsonOutput.Write(output, report);
        }
        else
        {
            WriteText(report, rig, pass, study.HottestWindingText, output);
        }
        if (plot.Path is { } plotPath)
        {
            var figure = EndurancePlot.Build(result, rig.Limits, sim.Packs.CellsSeries, study.MaxWindingTempC, rig.Name, plot.Today);
            if (!CommonOptions.WritePlot("endurance", figure, plotPath, force, error))
            {
                return ExitCodes.BadInput;
            }
        }
        return pass ? ExitCodes.Ok : ExitCodes.LimitFindings;
    }

    private static void WriteText(EnduranceReport report, Rig rig, bool pass, string windingLine, TextWriter output)
    {
        string gap = Numbers.Format(report.StartGapMm ?? rig.DesignGapM * 1000, 1);
        string held = report.Mount switch
        {
            "bench" => $"each station at its duty on its stand at {gap} mm",
            "guided" when rig.Stations.All(s => s.Duty is not null) => $"guided hover at the stations' set duties (gap {gap} mm at the start; the rails carry pitch, roll and yaw)",
            "guided" => $"guided hover at one common duty at the {gap} mm design gap (the rails carry pitch, roll and yaw)",
            _ => $"trimmed hover at the {gap} mm design gap",
        };
        output.WriteLine($"Endurance: {report.Rig}, {held} from a full pack");
        output.WriteLine($"  runtime: {Numbers.Format(report.RuntimeS, 0)} s ({Numbers.Format(report.RuntimeMin, 1)} min)");
        output.WriteLine($"  ended by: {report.FirstLimit}");
        output.WriteLine(report.StartSpeedsRpm.Count == 0
            ? $"  at the start: no {(report.Mount == "free" ? "trimmed hover" : report.Mount == "guided" ? "guided hover" : "steady state of the stations")} exists"
            : $"  at the start: {string.Join(" / ", report.StartSpeedsRpm.Select(r => Numbers.Format(r, 0)))} rpm at duty {string.Join(" / ", report.StartDuties.Select(d => Numbers.Format(d, 3)))} (stations 1..{report.StartSpeedsRpm.Count}), pack current {Numbers.Format(report.StartPackCurrentA, 1)} A");
        if (report.StartSpeedsRpm.Count > 0)
        {
            // Without a starting state nothing ran: no end state to show (a 0 V bus would be a state that never existed).
            output.WriteLine($"  at the end: state of charge {Numbers.Format(report.FinalSocPct, 1)} %, bus {Numbers.Format(report.FinalBusVoltageV, 1)} V, pack current {Numbers.Format(report.FinalPackCurrentA, 1)} A");
        }
        output.WriteLine($"  {windingLine}, hottest point of the plate {Numbers.Format(report.PeakPlateTempC, 1)} C (limit {Numbers.Format(report.PlateLimitC, 0)} C)");
        if (report.StartSpeedsRpm.Count > 0 && report.PlateHotspot is { } h)
        {
            output.WriteLine($"  plate hot spot at the end: x {Numbers.Format(h.XMm, 0)} mm, y {Numbers.Format(h.YMm, 0)} mm, {Numbers.Format(h.TemperatureC, 1)} C"
                + (report.PlateLimitTimeS is { } tl ? $"; the plate limit is reached at {Numbers.Format(tl, 0)} s" : string.Empty));
        }
        output.WriteLine($"  plate model: {report.PlatePatch}");
        output.WriteLine();
        string what = report.Mount == "bench" ? "run" : "hover";
        output.WriteLine(pass ? $"Result: the pack ends the {what} (no thermal or current limit first)." : $"Result: FAILS: a limit other than the pack ends the {what}.");
        output.WriteLine("Caution: plates and windings get hot enough to burn; lithium packs can burn when over-discharged. Estimates only: defer to manufacturers' ratings.");
    }

    private static bool WriteExports(EnduranceResult result, string? csvPath, string? mapPath, bool force, TextWriter error)
    {
        if (csvPath is not null && result.Trace is { } trace && AtomicFile.WriteAllText(csvPath, TraceCsv.Format(trace), force) is { } traceProblem)
        {
            ProblemReport.Print([traceProblem], error);
            return false;
        }
        if (mapPath is not null && result.PlateMap is { } map && AtomicFile.WriteAllText(mapPath, PlateMapCsv(map), force) is { } mapProblem)
        {
            ProblemReport.Print([mapProblem], error);
            return false;
        }
        return true;
    }

    private sealed record EnduranceReport(
        string Rig,
        string Mount,
        double? StartGapMm,
        IReadOnlyList<double> StartDuties,
        double RuntimeS,
        double RuntimeMin,
        string FirstLimit,
        EnduranceLimit FirstLimitKind,
        int? LimitStation,
        IReadOnlyList<double> StartSpeedsRpm,
        double StartPackCurrentA,
        double FinalSocPct,
        double FinalBusVoltageV,
        double FinalPackCurrentA,
        double PeakWindingTempC,
        double PeakPlateTempC,
        double PlateLimitC,
        double PlateSpreadingFactor,
        string PlatePatch,
        int Steps,
        bool Pass)
    {
        public double? PlateLimitTimeS { get; init; }

        public HotspotReport? PlateHotspot { get; init; }

        public double? PlateConductivityWPerMK { get; init; }

        public double? PlateLossWPerM2K { get; init; }

        public IReadOnlyList<string> FailedCriteria { get; init; } = [];

        public string? LimitingConstraint { get; init; }

        public IReadOnlyList<TraceEntry>? Trace { get; init; }

        public EnduranceReport(string rig, string mount, double? startGapMm, IReadOnlyList<double> startDuties, double runtimeS, double runtimeMin, EnduranceLimit kind, string text, int? station, IReadOnlyList<double> rpm, double current,
            double soc, double voltage, double finalCurrent, double winding, double plate, double plateLimit, double spreading, string patch, int steps, bool pass)
            : this(rig, mount, startGapMm, startDuties, runtimeS, runtimeMin, text, kind, station, rpm, current, soc, voltage, finalCurrent, winding, plate, plateLimit, spreading, patch, steps, pass)
        {
        }
    }

    // The plate model in words: a sheet with lateral conduction and face loss, and what it was built from.
    private static string PlateModel(PlateFieldSetup? setup, double spreading)
    {
        if (setup is null)
        {
            return "not modelled";
        }
        string k = setup.ConductivityEstimated ? "estimated by the Wiedemann-Franz law" : "from the catalog";
        string spin = spreading > 1 ? $"; plate.spreading_factor {Numbers.Format(spreading, 2)} applies to the spin-up's lumped patch only" : string.Empty;
        return $"2-D sheet with lateral conduction (k {Numbers.Format(setup.ConductivityWPerMK, 0)} W/(m K), {k}) and face loss {Numbers.Format(setup.LossWPerM2K, 1)} W/(m^2 K); "
            + $"eddy heat spread over each magnet annulus as the 3-D strip model gives it; grid {setup.GridCount} x {setup.GridCount} at {Numbers.Format(setup.GridSpacingM * 1000, 1)} mm over {Numbers.Format(setup.DomainM, 2)} m{spin}";
    }

    private static List<TraceEntry> TraceEntries(SpinupTrace trace, EnduranceResult result)
    {
        int n = trace.SpeedRadPerS.Count;
        var list = new List<TraceEntry>(trace.TimeS.Count);
        for (int i = 0; i < trace.TimeS.Count; i++)
        {
            var position = result.CraftPositionTraceM?[i] ?? (0, 0);
            list.Add(new TraceEntry(
                trace.TimeS[i],
                Enumerable.Range(0, n).Select(j => Units.RadPerSToRpm(trace.SpeedRadPerS[j][i])).ToArray(),
                Enumerable.Range(0, n).Select(j => trace.MotorCurrentA[j][i]).ToArray(),
                trace.GapM[i] * 1000,
                trace.BusVoltageV[i],
                trace.PackCurrentA[i],
                trace.SocFraction[i] * 100,
                Enumerable.Range(0, n).Select(j => trace.WindingTempC[j][i]).ToArray(),
                Enumerable.Range(0, n).Select(j => trace.PlateTempC[j][i]).ToArray(),
                result.PlatePeakTraceC?[i] ?? double.NaN,
                position.XM * 1000,
                position.YM * 1000,
                trace.YawTorqueNm[i]));
        }
        return list;
    }

    // x_mm, y_mm, temperature_c per grid point, row by row (invariant culture).
    private static string PlateMapCsv(PlateTemperatureMap map)
    {
        var sb = new System.Text.StringBuilder("x_mm,y_mm,temperature_c\n");
        for (int row = 0; row < map.Count; row++)
        {
            for (int column = 0; column < map.Count; column++)
            {
                sb.Append(CsvNumber.Format(map.XM(column) * 1000)).Append(',')
                    .Append(CsvNumber.Format(map.YM(row) * 1000)).Append(',')
                    .Append(CsvNumber.Format(map.At(column, row))).Append('\n');
            }
        }
        return sb.ToString();
    }

    private static int Sweep(string rigPath, double? gapMm, double? duty, bool json, TextWriter output, TextWriter error)
    {
        var loaded = RigInput.LoadOrReport(rigPath, error);
        var model = loaded is null ? null : CraftInput.ModelOrReport("endurance", rigPath, error, gapMm, duty);
        if (loaded is null || model is null)
        {
            return ExitCodes.BadInput;
        }
        var materials = loaded.Catalog!.Plates;
        // Progress only on an interactive terminal: a carriage-return counter would pile up in a redirected log.
        bool showProgress = !json && ReferenceEquals(error, Console.Error) && !Console.IsErrorRedirected;
        var progress = new Progress<int>(done => error.Write($"\rplate sweep: {done} / {materials.Count * PlateSweepStudy.DefaultThicknessesM.Count} floors"));
        var rows = PlateSweepStudy.Run(model, materials, null, null, showProgress ? progress : null);
        if (showProgress)
        {
            error.Write("\r" + new string(' ', 40) + "\r");
        }
        var report = new SweepReport(model.Rig.Name, model.Rig.Limits.PlateTempC, rows.Select(r => new SweepRow(
            r.MaterialId, r.ThicknessM * 1000, r.HoverExists, r.HoverPowerW, r.PlatePowerW, r.PlateLimitTimeS, r.RuntimeS, JsonNames.Of(r.EndedBy), r.HoverTimeS, r.PlateCutsHover, r.Passes)).ToArray());
        if (json)
        {
            JsonOutput.Write(output, report);
            return ExitCodes.Ok;
        }
        output.WriteLine($"Plate sweep: {report.Rig}, hovering in place from a full pack, plate limit {Numbers.Format(report.PlateLimitC, 0)} C");
        var table = new TextTable(
            new TableColumn("plate"),
            new TableColumn("mm", Alignment.Right),
            new TableColumn("hover W", Alignment.Right),
            new TableColumn("to plate limit s", Alignment.Right),
            new TableColumn("no plate limit s", Alignment.Right),
            new TableColumn("hover s", Alignment.Right),
            new TableColumn("verdict"));
        foreach (var (r, floor) in report.Floors.Zip(rows))
        {
            table.AddRow(
                r.Material,
                Numbers.Format(r.ThicknessMm, 0),
                r.HoverExists ? Numbers.Format(r.HoverPowerW, 0) : "no hover",
                r.PlateLimitTimeS is { } t ? Numbers.Format(t, 0) : "never",
                r.HoverExists ? Numbers.Format(r.RuntimeS, 0) : "-",
                Numbers.Format(r.HoverTimeS, 0),
                !r.HoverExists ? "no trimmed hover" : r.PlateCutsHover ? "plate cuts the hover short" : r.PackEndsHover ? "ok: the pack ends the hover" : $"{floor.EndedBy.Words()} ends the hover first");
        }
        table.Write(output);
        output.WriteLine("Caution: plates get hot enough to burn. Estimates only: defer to manufacturers' ratings and local codes.");
        return ExitCodes.Ok;
    }

    private sealed record HotspotReport(double XMm, double YMm, double TemperatureC);

    private sealed record TraceEntry(
        double TimeS,
        IReadOnlyList<double> SpeedRpm,
        IReadOnlyList<double> CurrentA,
        double GapMm,
        double PackVoltageV,
        double PackCurrentA,
        double SocPct,
        IReadOnlyList<double> WindingTempC,
        IReadOnlyList<double> PlateUnderStationC,
        double PlatePeakC,
        double CraftXMm,
        double CraftYMm,
        double YawTorqueNm);

    private sealed record SweepRow(
        string Material,
        double ThicknessMm,
        bool HoverExists,
        double HoverPowerW,
        double PlatePowerW,
        double? PlateLimitTimeS,
        double RuntimeS,
        string EndedBy,
        double HoverTimeS,
        bool PlateCutsHover,
        bool PackEndsHover);

    private sealed record SweepReport(string Rig, double PlateLimitC, IReadOnlyList<SweepRow> Floors);
}

using System.CommandLine;
using System.Globalization;
using System.Text;
using System.Text.Json;
using RotorDrive.Cli.Output;
using RotorDrive.Core;
using RotorDrive.Core.Craft;
using RotorDrive.Core.Simulation;
using RotorDrive.Core.Studies.Ranking;
using RotorDrive.Files;
using RotorDrive.Files.Exports;
using RotorDrive.Files.Plots;

namespace RotorDrive.Cli.Commands;

/// <summary><c>rotordrive rank RIG.json [--by runtime|mass|margin|score] [--top N] [--why-not MOTOR_ID] [--csv FILE]
/// [--force] [--json]</c>: every motor x controller x pack (x pack count up to the rig's <c>pack.count</c>) of the rig's
/// catalogs, the same drivetrain at every station, ranked; rejections counted by reason.</summary>
/// <remarks>Exit 0 when at least one combination is accepted, 1 when none is, 2 on bad input. Progress goes to stderr
/// (not with --json).</remarks>
public static class RankCommand
{
    /// <summary>Builds the subcommand.</summary>
    /// <param name="clock">The clock for the date on plots; the system clock when null.</param>
    public static Command Create(TimeProvider? clock = null)
    {
        var rig = CommonOptions.RigArgument();
        var by = WordOption.Create("--by",
            "What to rank by: runtime (longest hover), mass (lightest craft), margin (largest worst-case current margin) or score (weighted).",
            RankObjective.Runtime);
        var top = new Option<int>("--top")
        {
            Description = "How many of the best combinations to show (1 to 1000).",
            HelpName = "N",
            DefaultValueFactory = _ => 10,
        };
        top.Validators.Add(r =>
        {
            int n = r.GetValueOrDefault<int>();
            if (n < 1 || n > 1000)
            {
                r.AddError($"--top must lie in 1..1000; got {n.ToString(CultureInfo.InvariantCulture)}.");
            }
        });
        var whyNot = new Option<string?>("--why-not")
        {
            Description = "Show why a motor (catalog id) was rejected with every controller and pack.",
            HelpName = "MOTOR_ID",
        };
        var csv = CommonOptions.Csv("every accepted combination in rank order");
        var force = CommonOptions.Force();
        var json = CommonOptions.Json();
        var plot = CommonOptions.Plot("pack runtime against mass for the Pareto set, with the rig's own choice");
        var command = new Command("rank", "Rank every motor x controller x pack from the catalogs for the rig, explaining every rejection.");
        command.Arguments.Add(rig);
        command.Options.Add(by);
        command.Options.Add(top);
        command.Options.Add(whyNot);
        command.Options.Add(csv);
        command.Options.Add(force);
        command.Options.Add(json);
        command.Options.Add(plot);
        command.SetAction(parse => Run(
            new RankRequest(parse.GetValue(rig)!, WordOption.Parse<RankObjective>(parse.GetValue(by)!), parse.GetValue(top), parse.GetValue(whyNot), parse.GetValue(csv), parse.GetValue(force), parse.GetValue(json),
                new PlotRequest(parse.GetValue(plot), CommonOptions.Today(clock))),
            parse.InvocationConfiguration.Output,
            parse.InvocationConfiguration.Error));
        return command;
    }

    private static int Run(RankRequest request, TextWriter output, TextWriter error)
    {
        var loaded = RigInput.LoadOrReport(request.RigPath, error);
        if (loaded is null || CraftInput.RefusesMount("rank", loaded, error))
        {
            return ExitCodes.BadInput;
        }
        Rig rig = loaded.Rig!;
        var catalog = loaded.Catalog!;
        int? whyNotIndex = null;
        if (request.WhyNot is { } id)
        {
            int index = -1;
            for (int i = 0; i < catalog.Motors.Count; i++)
            {
                if (string.Equals(catalog.Motors[i].Id, id, StringComparison.OrdinalIgnoreCase))
                {
                    index = i;
                    break;
                }
            }
            if (index < 0)
            {
                error.WriteLine($"rotordrive rank: error: --why-not: no motor '{id}' in {loaded.CatalogPaths!.Motors}; ids are listed in that file.");
                return ExitCodes.BadInput;
            }
            whyNotIndex = index;
        }
        if (CommonOptions.RefusesExistingCsv("rank", request.CsvPath, request.Force, error) || CommonOptions.RefusesPlot("rank", request.Plot.Path, request.Force, error))
        {
            return ExitCodes.BadInput;
        }
        if (catalog.Motors.Count == 0 || catalog.Controllers.Count == 0 || catalog.Packs.Count == 0)
        {
            error.WriteLine("rotordrive rank: error: the catalogs need at least one motor, one controller and one pack to rank.");
            return ExitCodes.BadInput;
        }
        if (rig.Stations.Count < 4)
        {
            error.WriteLine($"rotordrive rank: error: {request.RigPath}: $.stations: a trimmed hover needs at least four stations to balance force, pitch, roll and yaw; the rig has {rig.Stations.Count}.");
            return ExitCodes.BadInput;
        }

        var study = RankStudy.Create(rig, catalog, new RankOptions(Objective: request.By, Top: request.Top));
        var progress = request.Json ? null : new ProgressPrinter(error, study.CombinationCount);
        var result = study.Run(progress is null ? null : progress.Report);
        progress?.Finish();
        // A combination the shortlist's simulation rejected carries that reason (the quick evaluation alone passes it).
        var simulationRejected = result.SimulationRejections.ToDictionary(e => e.Candidate);
        var explained = whyNotIndex is { } motorIndex
            ? study.ExplainMotor(motorIndex).Select(e => simulationRejected.GetValueOrDefault(e.Candidate) ?? e).ToList()
            : null;
        var pareto = new HashSet<int>(result.ParetoRanks);

        if (request.CsvPath is { } path)
        {
            var problem = AtomicFile.WriteAllText(path, Csv(study, result, pareto), request.Force);
            if (problem is not null)
            {
                ProblemReport.Print([problem], error);
                return ExitCodes.BadInput;
            }
        }

        if (request.Json)
        {
            JsonOutput.Write(output, ToReport(rig, study, result, explained));
        }
        else
        {
            WriteText(output, rig, study, result, pareto, explained, request);
        }
        if (request.Plot.Path is { } plotPath
            && !CommonOptions.WritePlot("rank", RankPlot.Build(result, study.Evaluate, rig.Name, request.Plot.Today), plotPath, request.Force, error))
        {
            return ExitCodes.BadInput;
        }
        return result.AcceptedCount > 0 ? ExitCodes.Ok : ExitCodes.LimitFindings;
    }

    private static void WriteText(TextWriter o, Rig rig, RankStudy study, RankResult result, HashSet<int> pareto,
        IReadOnlyList<RankEvaluation>? explained, RankRequest request)
    {
        var catalog = study.Catalog;
        o.WriteLine($"Ranking for {rig.Name}: {catalog.Motors.Count} motors x {catalog.Controllers.Count} controllers x {catalog.Packs.Count} packs"
            + $" x 1..{study.MaxPackCount} pack(s) in parallel = {result.TotalCombinations.ToString("N0", CultureInfo.InvariantCulture)} combinations, the same drivetrain at all {rig.Stations.Count} stations");
        o.WriteLine($"  accepted {result.AcceptedCount.ToString("N0", CultureInfo.InvariantCulture)}, rejected {result.RejectedCount.ToString("N0", CultureInfo.InvariantCulture)};"
            + $" ranked by {Key(result.Objective)}; score weights: runtime {Numbers.Format(result.Weights.Runtime, 2)}, mass {Numbers.Format(result.Weights.Mass, 2)}, margin {Numbers.Format(result.Weights.Margin, 2)}");
        o.WriteLine($"  hover at the {Numbers.Format(rig.DesignGapM * 1000, 1)} mm design gap, plate at {Numbers.Format(rig.PlateTemperatureC, 0)} C, motors at {Numbers.Format(rig.AmbientC, 0)} C;"
            + $" drag peak checked on the landing gear ({Numbers.Format(rig.LandedGapM * 1000, 1)} mm) on a full pack");
        o.WriteLine();
        WriteTop(o, result);
        if (result.SimulationRejections.Count > 0)
        {
            o.WriteLine("Shortlisted but rejected by the spin-up or hover checks (the next ones moved up):");
            foreach (var e in result.SimulationRejections)
            {
                o.WriteLine($"  - {e.Label}: {e.Rejections[^1].Message}");
            }
            o.WriteLine();
        }
        o.WriteLine($"Pareto set: {result.ParetoRanks.Count} combination(s); ranks {string.Join(", ", result.ParetoRanks.Take(30))}{(result.ParetoRanks.Count > 30 ? ", ..." : "")}");
        o.WriteLine();
        o.WriteLine("Rejections by reason (a combination with several reasons counts under each):");
        var reasons = new TextTable(new TableColumn("combinations", Alignment.Right), new TableColumn("reason"));
        foreach (var count in result.RejectionCounts.Where(c => c.Count > 0))
        {
            reasons.AddRow(count.Count.ToString("N0", CultureInfo.InvariantCulture), count.Kind.Describe());
        }
        reasons.Write(o, 2);
        o.WriteLine();
        WriteAssigned(o, result);
        if (explained is not null)
        {
            WriteWhyNot(o, explained, result);
        }
        o.WriteLine();
        o.WriteLine("Method: trimmed hover at the design gap with the drivetrain's and packs' mass included (lift = weight, level, zero yaw; the");
        o.WriteLine("same trim as 'hover'); first-order motor model (Drela 2007) on the shared pack bus; runtime on the usable capacity without");
        o.WriteLine("thermal drift; the shortlist simulated in full (spin-up as 'spinup', endurance as 'endurance'); see README.");
        o.WriteLine("Caution: one-way controllers are fine for a fixed spin direction (wire the motor for it) but cannot reverse-brake a rotor.");
        o.WriteLine("Estimates only: follow the manufacturers' ratings; lithium packs, strong magnets and spinning rotors are dangerous (see README, Safety).");
    }

    // The best entries with their figures, the cautions that do not reject (each once, with its ranks) and, when one limit
    // other than the pack ends every shortlisted endurance run, a note saying so.
    private static void WriteTop(TextWriter o, RankResult result)
    {
        if (result.Top.Count > 0)
        {
            o.WriteLine($"Best {result.Top.Count} (P = in the Pareto set over runtime, mass and current margin):");
            var table = new TextTable(
                new TableColumn("rank", Alignment.Right), new TableColumn("P"), new TableColumn("motor"), new TableColumn("controller"),
                new TableColumn("packs"), new TableColumn("speed_rpm", Alignment.Right), new TableColumn("current_a", Alignment.Right),
                new TableColumn("duty", Alignment.Right), new TableColumn("pack_a", Alignment.Right), new TableColumn("runtime_min", Alignment.Right),
                new TableColumn("mass_kg", Alignment.Right), new TableColumn("margin_%", Alignment.Right), new TableColumn("peak_margin_%", Alignment.Right),
                new TableColumn("liftoff_s", Alignment.Right), new TableColumn("endur_min", Alignment.Right), new TableColumn("ends_by"),
                new TableColumn("score", Alignment.Right));
            foreach (var entry in result.Top)
            {
                var e = entry.Evaluation;
                var f = e.Figures!;
                table.AddRow(entry.Rank.ToString(CultureInfo.InvariantCulture), entry.InParetoSet ? "P" : "", e.MotorId, e.ControllerId,
                    $"{e.Candidate.PackCount} x {e.PackId}", Numbers.Format(f.MaxSpeedRpm, 0), Numbers.Format(f.MaxMotorCurrentA, 1),
                    Numbers.Format(f.MaxDuty, 3), Numbers.Format(f.PackCurrentA, 1), Numbers.Format(f.RuntimeS / 60, 1), Numbers.Format(f.TotalMassKg, 2),
                    Numbers.Format(f.CurrentMarginFraction * 100, 1), Numbers.Format(f.DragPeakTorqueMarginFraction * 100, 0), Numbers.Format(entry.LiftoffTimeS, 2),
                    Numbers.Format(e.Simulation?.EnduranceRuntimeS / 60, 1), e.Simulation is { } sim ? sim.EnduranceLimit.Words() : "",
                    Numbers.Format(entry.Score, 3));
            }
            table.Write(o, 2);
            o.WriteLine("  speed and current: fastest station / largest motor current at hover; duty: largest, full pack; pack_a: pack current, full pack;");
            o.WriteLine("  margin_%: worst of motor, controller and pack currents against their continuous ratings over the run; peak_margin_%: motor");
            o.WriteLine("  torque over load torque at the landed drag peak, minus 1 (the quick spin-up check every combination gets). The shortlist");
            o.WriteLine("  shown is simulated in full: liftoff_s from the spin-up simulation (duty ramped to the hover duty, current limits, pack sag),");
            o.WriteLine("  endur_min and ends_by from the endurance simulation (pack, windings and plate evolving) and the limit that ends it.");
            // Cautions that do not reject (the spin-up study's and the hover review's, and the quick checks'), each once with
            // the ranks it applies to.
            foreach (var caution in result.Top.SelectMany(t => t.Evaluation.Cautions.Select(c => (c.Message, t.Rank))).GroupBy(x => x.Message))
            {
                var ranks = caution.Select(x => x.Rank).Distinct().ToList();
                string which = ranks.Count == result.Top.Count && ranks.Count > 1 ? "every rank" : "rank " + string.Join(", ", ranks);
                o.WriteLine($"  Caution ({which}): {caution.Key}");
            }
            if (NotThePack(result.Top) is { } notPack)
            {
                string lo = Numbers.Format(notPack.MinS / 60, 1), hi = Numbers.Format(notPack.MaxS / 60, 1);
                o.WriteLine($"  Note: every shortlisted combination's endurance ends on {notPack.Text} after {(lo == hi ? lo : lo + "-" + hi)} min, "
                    + "well before its pack runs down: that limit, not the drivetrain, sets the hover time;");
                o.WriteLine("  runtime_min ranks the drivetrains by their pack runtime once it is lifted.");
            }
            o.WriteLine();
        }
        else
        {
            o.WriteLine("No combination can fly this rig; see the rejections below.");
            o.WriteLine();
        }
    }

    // Where the rig's own drivetrain ranks, or why it is rejected.
    private static void WriteAssigned(TextWriter o, RankResult result)
    {
        if (result.Assigned is { } assigned)
        {
            string where = result.AssignedRank is { } r ? $"rank {r.ToString("N0", CultureInfo.InvariantCulture)} of {result.AcceptedCount.ToString("N0", CultureInfo.InvariantCulture)}" : "rejected";
            o.WriteLine($"The rig's own drivetrain, {assigned.Label}: {where}.");
            foreach (var reason in assigned.Rejections)
            {
                o.WriteLine($"  - {reason.Message}");
            }
            if (assigned.Figures is { } f && assigned.Accepted)
            {
                o.WriteLine($"  runtime {Numbers.Format(f.RuntimeS / 60, 1)} min ({f.RuntimeLimit}), mass {Numbers.Format(f.TotalMassKg, 2)} kg, current margin {Numbers.Format(f.CurrentMarginFraction * 100, 1)} %");
            }
        }
        else
        {
            o.WriteLine("The rig names no single drivetrain (same motor and controller at every station, and a pack) to place in the ranking.");
        }
    }

    // Every controller and pack tried with one motor, and what rejected each.
    private static void WriteWhyNot(TextWriter o, IReadOnlyList<RankEvaluation> explained, RankResult result)
    {
        o.WriteLine();
        o.WriteLine($"Why not {explained[0].MotorId}: every controller and pack with this motor");
        int acceptedHere = explained.Count(e => e.Accepted);
        var byReason = explained.SelectMany(e => e.Rejections.Select(r => r.Kind).Distinct()).GroupBy(k => k).OrderByDescending(g => g.Count()).ThenBy(g => g.Key);
        o.WriteLine($"  {acceptedHere} of {explained.Count} accepted; rejected for: "
            + string.Join(", ", byReason.Select(g => $"{g.Key.Describe()} ({g.Count()})")));
        var table = new TextTable(new TableColumn("controller"), new TableColumn("packs"), new TableColumn("verdict"));
        foreach (var e in explained)
        {
            string verdict = e.Accepted
                ? $"accepted, rank {result.RankOf(e.Candidate)?.ToString("N0", CultureInfo.InvariantCulture)}"
                : string.Join("; ", e.Rejections.Select(r => r.Message));
            table.AddRow(e.ControllerId, $"{e.Candidate.PackCount} x {e.PackId}", verdict);
        }
        table.Write(o, 2);
    }

    private static string Key(RankObjective objective) => objective.ToString().ToLowerInvariant();

    // The limit that ends every shortlisted endurance run when it is one and the same and not one that passes (the pack's
    // capacity or cutoff, the time limit: EnduranceLimits.Passes), e.g. the plate temperature, which depends on the
    // trimmed speeds and so on the craft's mass, hardly on the drivetrain; with the shortest and longest runtime, or null.
    private static (string Text, double MinS, double MaxS)? NotThePack(IReadOnlyList<RankedEntry> top)
    {
        var sims = top.Select(t => t.Evaluation.Simulation).ToList();
        if (sims.Count == 0 || sims.Any(s => s is null))
        {
            return null;
        }
        var limit = sims[0]!.EnduranceLimit;
        if (limit.Passes() || sims.Any(s => s!.EnduranceLimit != limit))
        {
            return null;
        }
        return (LimitKey(limit).Replace('_', ' '), sims.Min(s => s!.EnduranceRuntimeS), sims.Max(s => s!.EnduranceRuntimeS));
    }

    private static string LimitKey(EnduranceLimit limit) => JsonNames.Of(limit);

    private static string Csv(RankStudy study, RankResult result, HashSet<int> pareto)
    {
        var ci = CultureInfo.InvariantCulture;
        var sb = new StringBuilder();
        sb.AppendLine("rank,pareto,motor,controller,pack,pack_count,score,total_mass_kg,hover_speed_rpm,max_motor_current_a,max_duty,pack_current_a,runtime_s,runtime_limit,current_margin_pct,drag_peak_torque_margin_pct,liftoff_time_s,endurance_runtime_s,endurance_limit");
        var shortlist = result.Top.ToDictionary(t => t.Rank, t => t.Evaluation.Simulation);
        for (int i = 0; i < result.Ordered.Count; i++)
        {
            var e = study.Evaluate(result.Ordered[i]);
            var f = e.Figures!;
            sb.Append(string.Join(",",
                (i + 1).ToString(ci), pareto.Contains(i + 1) ? "yes" : "no", CsvText(e.MotorId), CsvText(e.ControllerId), CsvText(e.PackId),
                e.Candidate.PackCount.ToString(ci), CsvNumber.Format(result.Scores[i]), CsvNumber.Format(f.TotalMassKg),
                CsvNumber.Format(f.MaxSpeedRpm), CsvNumber.Format(f.MaxMotorCurrentA), CsvNumber.Format(f.MaxDuty),
                CsvNumber.Format(f.PackCurrentA), CsvNumber.Format(f.RuntimeS), CsvText(JsonNames.Of(f.RuntimeLimit)),
                CsvNumber.Format(f.CurrentMarginFraction * 100),
                CsvNumber.Format(f.DragPeakTorqueMarginFraction * 100),
                CsvNumber.Format(shortlist.GetValueOrDefault(i + 1)?.LiftoffTimeS),
                CsvNumber.Format(shortlist.GetValueOrDefault(i + 1)?.EnduranceRuntimeS),
                shortlist.GetValueOrDefault(i + 1) is { } sim2 ? LimitKey(sim2.EnduranceLimit) : ""));
            sb.Append('\n');
        }
        return sb.ToString();
    }

    private static string CsvText(string text) => text.Contains(',') || text.Contains('"') ? "\"" + text.Replace("\"", "\"\"") + "\"" : text;

    private static RankReport ToReport(Rig rig, RankStudy study, RankResult result, IReadOnlyList<RankEvaluation>? explained)
    {
        var pareto = new HashSet<int>(result.ParetoRanks);
        var top = result.Top.Select(t => Entry(t.Evaluation, t.Rank, t.InParetoSet, t.Score, t.LiftoffTimeS)).ToList();
        EntryReport? assigned = result.Assigned is { } a
            ? Entry(a, result.AssignedRank, result.AssignedRank is { } r && pareto.Contains(r), result.AssignedRank is { } r2 ? result.Scores[r2 - 1] : null, null)
            : null;
        WhyNotReport? whyNot = explained is null ? null : new WhyNotReport(
            explained[0].MotorId,
            explained.Select(e => new WhyNotEntry(e.ControllerId, e.PackId, e.Candidate.PackCount, e.Accepted,
                e.Accepted ? result.RankOf(e.Candidate) : null,
                e.Rejections.Select(x => new ReasonReport(x.Kind.Key(), x.Message)).ToList())).ToList());
        return new RankReport(
            rig.Name,
            Key(result.Objective),
            new WeightsReport(result.Weights.Runtime, result.Weights.Mass, result.Weights.Margin),
            result.TotalCombinations,
            result.AcceptedCount,
            result.RejectedCount,
            study.MaxPackCount,
            result.RejectionCounts.Select(c => new RejectionCountReport(c.Kind.Key(), c.Kind.Describe(), c.Count)).ToList(),
            top,
            result.ParetoRanks,
            assigned,
            result.SimulationRejections.Select(e => Entry(e, null, false, null, e.Simulation?.LiftoffTimeS)).ToList(),
            whyNot);
    }

    private static EntryReport Entry(RankEvaluation e, int? rank, bool pareto, double? score, double? liftoff)
    {
        var f = e.Figures;
        return new EntryReport(
            rank, e.MotorId, e.ControllerId, e.PackId, e.Candidate.PackCount, e.Accepted, pareto, score,
            f?.TotalMassKg, f?.MaxSpeedRpm, f?.MaxMotorCurrentA, f is { StationDuties.Count: > 0 } ? f.MaxDuty : null,
            f?.PackCurrentA, f?.BusVoltageV, f?.ElectricalPowerW, f?.LiftSpecificPowerWPerN, f?.EddyPowerW, f?.RuntimeS, f?.RuntimeLimit is { } why ? JsonNames.Of(why) : null,
            f?.CurrentMarginFraction * 100, f?.DragPeakTorqueMarginFraction * 100, liftoff,
            e.Simulation is { } sim ? new SimulationReport(sim.LiftoffTimeS, sim.StalledStations.Select(i => i + 1).ToList(), sim.SpinupFindings, sim.HoverFindings, sim.MinBusVoltageV, sim.PeakPackCurrentA,
                sim.EnduranceRuntimeS, sim.EnduranceLimit, sim.EnduranceLimitText, sim.PeakWindingTempC, sim.PeakPlateTempC) : null,
            f is null ? [] : f.StationSpeedsRadPerS.Select((w, i) => new StationReport(i + 1, Units.RadPerSToRpm(w), f.StationMotorCurrentsA[i],
                i < f.StationDuties.Count ? f.StationDuties[i] : null)).ToList(),
            e.Rejections.Select(x => new ReasonReport(x.Kind.Key(), x.Message)).ToList(),
            e.Cautions.Select(x => x.Message).ToList());
    }

    // Prints "ranking: 45 %" lines to stderr about every tenth of the sweep; thread-safe.
    private sealed class ProgressPrinter(TextWriter error, long total)
    {
        private readonly Lock _gate = new();
        private int _lastTenth = -1;

        public void Report(RankProgress progress)
        {
            lock (_gate)
            {
                int tenth = (int)(progress.Fraction * 10);
                if (tenth > _lastTenth)
                {
                    _lastTenth = tenth;
                    error.WriteLine($"ranking: {progress.Done.ToString("N0", CultureInfo.InvariantCulture)} of {total.ToString("N0", CultureInfo.InvariantCulture)} combinations ({tenth * 10} %)");
                }
            }
        }

        public void Finish()
        {
        }
    }

    private sealed record RankRequest(string RigPath, RankObjective By, int Top, string? WhyNot, string? CsvPath, bool Force, bool Json, PlotRequest Plot);

    private sealed record RankReport(
        string Rig,
        string Objective,
        WeightsReport Weights,
        long Combinations,
        long Accepted,
        long Rejected,
        int MaxPackCount,
        IReadOnlyList<RejectionCountReport> Rejections,
        IReadOnlyList<EntryReport> Top,
        IReadOnlyList<int> ParetoRanks,
        EntryReport? Assigned,
        IReadOnlyList<EntryReport> SimulationRejections,
        WhyNotReport? WhyNot);

    private sealed record WeightsReport(double Runtime, double Mass, double Margin);

    private sealed record RejectionCountReport(string Reason, string Description, long Count);

    private sealed record ReasonReport(string Reason, string Message);

    private sealed record EntryReport(
        int? Rank,
        string Motor,
        string Controller,
        string Pack,
        int PackCount,
        bool Accepted,
        bool Pareto,
        double? Score,
        double? TotalMassKg,
        double? HoverSpeedRpm,
        double? MaxMotorCurrentA,
        double? MaxDuty,
        double? PackCurrentA,
        double? BusVoltageV,
        double? ElectricalPowerW,
        double? LiftSpecificPowerWPerN,
        double? EddyPowerW,
        double? RuntimeS,
        string? RuntimeLimit,
        double? CurrentMarginPct,
        double? DragPeakTorqueMarginPct,
        double? LiftoffTimeS,
        SimulationReport? Simulation,
        IReadOnlyList<StationReport> Stations,
        IReadOnlyList<ReasonReport> Rejections,
        IReadOnlyList<string> Cautions);

    private sealed record SimulationReport(
        double? LiftoffTimeS, IReadOnlyList<int> StalledStations, IReadOnlyList<string> SpinupFindings, IReadOnlyList<string> HoverFindings,
        double MinBusVoltageV, double PeakPackCurrentA,
        double EnduranceRuntimeS, EnduranceLimit EnduranceLimit, string EnduranceLimitText, double PeakWindingTempC, double PeakPlateTempC);

    private sealed record StationReport(int Station, double SpeedRpm, double MotorCurrentA, double? Duty);

    private sealed record WhyNotReport(string Motor, IReadOnlyList<WhyNotEntry> Combinations);

    private sealed record WhyNotEntry(string Controller, string Pack, int PackCount, bool Accepted, int? Rank, IReadOnlyList<ReasonReport> Rejections);
}

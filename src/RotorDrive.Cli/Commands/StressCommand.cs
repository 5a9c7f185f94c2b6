using System.CommandLine;
using System.Globalization;
using RotorDrive.Cli.Output;
using RotorDrive.Core;
using RotorDrive.Core.Studies;
using RotorDrive.Core.Studies.Stress;
using RotorDrive.Files.Exports;
using RotorDrive.Files.Plots;

namespace RotorDrive.Cli.Commands;

/// <summary><c>rotordrive stress RIG.json [--samples N] [--seed S] [--sample K] [--threads T] [--accept-pct P] [--csv FILE]
/// [--force] [--json]</c>: Monte Carlo over the rig file's tolerances (spin-up and trimmed hover per sample).</summary>
/// <remarks>Exit code 1 unless the study shows, at 95 % confidence, that the overall failure rate is below
/// --accept-pct (the upper end of its Wilson interval is below it); with --sample K, 1 when that sample fails a criterion.
/// A cancelled (Ctrl+C) run reports the samples finished so far, marked partial.</remarks>
public static class StressCommand
{
    /// <summary>Default number of samples.</summary>
    public const int DefaultSamples = 2000;

    /// <summary>Default accepted overall failure rate, % (<see cref="StressResult.DefaultAcceptedFailurePct"/>).</summary>
    public const double DefaultAcceptPct = StressResult.DefaultAcceptedFailurePct;

    /// <summary>Drivers listed in the text report.</summary>
    public const int TextDrivers = 10;

    /// <summary>Builds the subcommand.</summary>
    /// <param name="clock">The clock for the date on plots; the system clock when null.</param>
    public static Command Create(TimeProvider? clock = null)
    {
        var rig = CommonOptions.RigArgument();
        var samples = new Option<int>("--samples") { Description = "Number of samples.", HelpName = "N", DefaultValueFactory = _ => DefaultSamples };
        samples.Validators.Add(r =>
        {
            if (r.GetValueOrDefault<int>() is < 1 or > 10_000_000)
            {
                r.AddError("--samples must lie in 1..10000000.");
            }
        });
        var seed = new Option<int>("--seed") { Description = "The study's seed: the same seed gives the same samples.", HelpName = "S", DefaultValueFactory = _ => 1 };
        var sample = new Option<int?>("--sample") { Description = "Reproduce one sample K in full: its parts, margins and spin-up trace.", HelpName = "K" };
        sample.Validators.Add(r =>
        {
            if (r.GetValueOrDefault<int?>() is < 0)
            {
                r.AddError("--sample must be 0 or more.");
            }
        });
        var threads = new Option<int?>("--threads") { Description = "Worker threads; default one per processor. Results do not depend on it.", HelpName = "T" };
        threads.Validators.Add(r =>
        {
            if (r.GetValueOrDefault<int?>() is < 1 or > 1024)
            {
                r.AddError("--threads must lie in 1..1024.");
            }
        });
        var accept = new Option<double>("--accept-pct")
        {
            Description = "Accepted overall failure rate, %; exit 1 unless the 95 % interval's upper end is below it.",
            HelpName = "P",
            DefaultValueFactory = _ => DefaultAcceptPct,
        };
        accept.Validators.Add(r =>
        {
            if (!(r.GetValueOrDefault<double>() is > 0 and <= 100))
            {
                r.AddError("--accept-pct must lie in (0, 100].");
            }
        });
        var csv = CommonOptions.Csv("one row per sample (with --sample: the spin-up trace)");
        var force = CommonOptions.Force();
        var json = CommonOptions.Json();
        var plot = CommonOptions.Plot("a histogram of every margin with its limit");

        var command = new Command("stress", "Tolerance stress test: Monte Carlo over part spreads, spin-up and trimmed hover per sample.");
        command.Arguments.Add(rig);
        command.Options.Add(samples);
        command.Options.Add(seed);
        command.Options.Add(sample);
        command.Options.Add(threads);
        command.Options.Add(accept);
        command.Options.Add(csv);
        command.Options.Add(force);
        command.Options.Add(json);
        command.Options.Add(plot);
        command.Validators.Add(r =>
        {
            if (r.GetResult(plot) is { Implicit: false } && r.GetResult(sample) is { Implicit: false })
            {
                r.AddError("--plot draws the margins of a whole run; it cannot be combined with --sample.");
            }
        });
        command.SetAction((parse, cancellationToken) => RunAsync(
            new StressRequest(parse.GetValue(rig)!, parse.GetValue(samples), parse.GetValue(seed), parse.GetValue(sample), parse.GetValue(threads),
                parse.GetValue(accept), parse.GetValue(csv), parse.GetValue(force), parse.GetValue(json),
                new PlotRequest(parse.GetValue(plot), CommonOptions.Today(clock))),
            parse.InvocationConfiguration.Output,
            parse.InvocationConfiguration.Error,
            cancellationToken));
        return command;
    }

    private sealed record StressRequest(string RigPath, int Samples, int Seed, int? Sample, int? Threads, double AcceptPct, string? Csv, bool Force, bool Json, PlotRequest Plot);

    private static async Task<int> RunAsync(StressRequest request, TextWriter output, TextWriter error, CancellationToken cancellationToken)
    {
        var loaded = RigInput.LoadOrReport(request.RigPath, error);
        if (loaded is null || CraftInput.RefusesMount("stress", loaded, error))
        {
            return ExitCodes.BadInput;
        }
        var rig = loaded.Rig!;
        if (rig.Packs is null || rig.Stations.Any(s => s.Motor is null || s.Controller is null))
        {
            error.WriteLine($"rotordrive stress: error: {request.RigPath}: the stress test needs a motor and a controller on every station and a pack; "
                + "assign them in the rig file (stations[].motor, stations[].controller, pack).");
            return ExitCodes.BadInput;
        }
        if (CommonOptions.RefusesExistingCsv("stress", request.Csv, request.Force, error) || CommonOptions.RefusesPlot("stress", request.Plot.Path, request.Force, error))
        {
            return ExitCodes.BadInput;
        }
        var tolerances = loaded.Tolerances;
        var model = new RigStressModel(rig, tolerances);

        if (request.Sample is { } k)
        {
            var one = StressStudy.RunSample(model, tolerances, request.Seed, k);
            if (request.Csv is { } tracePath && !WriteCsv(tracePath, StressCsv.Trace(one.Outcome.Trace!), request.Force, error))
            {
                return ExitCodes.BadInput;
            }
            var sampleReport = SampleReport(one, request.Seed, rig.Stations.Count);
            if (request.Json)
            {
                JsonOutput.Write(output, sampleReport);
            }
            else
            {
                WriteSampleText(sampleReport, output);
            }
            return one.Outcome.PassedAll ? ExitCodes.Ok : ExitCodes.LimitFindings;
        }

        var progress = new ProgressLine(error, request.Samples);
        var options = new StressStudyOptions(request.Samples, request.Seed, request.Threads);
        var result = await Task.Run(() => StressStudy.Run(model, tolerances, options, progress, cancellationToken), CancellationToken.None);
        progress.Finish(result.Samples, result.Partial);

        if (request.Csv is { } path && !WriteCsv(path, StressCsv.Samples(result), request.Force, error))
        {
            return ExitCodes.BadInput;
        }
        var report = Report(result, rig.Name, request.AcceptPct);
        if (request.Json)
        {
            JsonOutput.Write(output, report);
        }
        else
        {
            WriteText(report, tolerances.Varied.Count, output);
        }
        if (request.Plot.Path is { } plotPath
            && !CommonOptions.WritePlot("stress", StressPlot.Build(result, rig.Name, request.Plot.Today), plotPath, request.Force, error))
        {
            return ExitCodes.BadInput;
        }
        return report.Verdict == "pass" ? ExitCodes.Ok : ExitCodes.LimitFindings;
    }

    private static bool WriteCsv(string path, string text, bool force, TextWriter error)
    {
        if (Files.AtomicFile.WriteAllText(path, text, force) is { } problem)
        {
            error.WriteLine($"rotordrive stress: error: {path}: {problem.Message}");
            return false;
        }
        return true;
    }

    // Progress on stderr, one line per tenth of the run (never on stdout).
    private sealed class ProgressLine(TextWriter error, int total) : IProgress<int>
    {
        private readonly Lock _gate = new();
        private int _lastTenth;

        public void Report(int value)
        {
            int tenth = (int)(10L * value / total);
            if (tenth <= _lastTenth)
            {
                return;
            }
            lock (_gate)
            {
                if (tenth > _lastTenth)
                {
                    _lastTenth = tenth;
                    error.WriteLine($"stress: {N(value)} of {N(total)} samples");
                }
            }
        }

        public void Finish(int done, bool partial)
        {
            if (partial)
            {
                lock (_gate)
                {
                    error.WriteLine($"stress: stopped after {N(done)} of {N(total)} samples; the report covers those (partial).");
                }
            }
        }
    }

    // ---- reports ----

    private sealed record RateEntry(int Failures, double Rate, double CiLow, double CiHigh);

    private sealed record CriterionEntry(string Key, string Description, int Failures, double Rate, double CiLow, double CiHigh);

    private sealed record FigureEntry(string Figure, int Count, int LeftOut, double? Min, double? P5, double? P50, double? P95, double? Max, double? Mean);

    private sealed record DriverEntry(string Input, string Margin, double Rho);

    private sealed record StationEntry(int Station, double KvRpmPerV, double ResistanceOhm, double NoLoadCurrentA, double CurrentLimitA, double RemanenceT, double GapOffsetMm);

    private sealed record PartsEntry(
        IReadOnlyList<StationEntry> Stations,
        double PlateThicknessMm,
        double PlateConductivityMsPerM,
        double AmbientC,
        double PlateTempC,
        double SocPct,
        double PackResistanceMohm,
        double PayloadKg,
        double CgOffsetXMm,
        double CgOffsetYMm);

    private sealed record WorstEntry(int Index, double MinimumMargin, IReadOnlyList<string> Failed, PartsEntry Parts);

    private sealed record StressReport(
        string Rig,
        int Samples,
        int RequestedSamples,
        int Seed,
        bool Partial,
        double AcceptFailurePct,
        string Verdict,
        RateEntry? FailureRate,
        IReadOnlyList<CriterionEntry> Criteria,
        IReadOnlyList<FigureEntry> Percentiles,
        IReadOnlyList<DriverEntry> Drivers,
        WorstEntry? WorstSample,
        IReadOnlyList<string> Cautions);

    private sealed record TraceEntry(double TimeS, double Duty, IReadOnlyList<double> SpeedRpm, IReadOnlyList<double> CurrentA, double PackVoltageV, double PackCurrentA, double LiftN);

    private sealed record SampleEntry(
        int Sample,
        int Seed,
        bool Passed,
        IReadOnlyList<string> Failed,
        IReadOnlyDictionary<string, double?> Margins,
        double? LiftoffTimeS,
        IReadOnlyList<int> StalledStations,
        double PeakMotorCurrentA,
        double PeakPackCurrentA,
        double MinPackVoltageV,
        double? HoverSpeedRpm,
        double? HoverCurrentA,
        double? HoverPackVoltageV,
        double? YawResidualNm,
        double? YawAuthorityNm,
        string? TrimLimit,
        PartsEntry Parts,
        IReadOnlyList<TraceEntry> Trace);

    private static readonly string[] Cautions =
    [
        "Estimates only: part spreads are what the rig file says; defer to manufacturers' ratings, local codes and licensed practice.",
        "Strong magnets crush fingers and upset pacemakers; a spinning rotor can burst: keep clear of its plane.",
        "Lithium packs can burn when over-discharged, over-loaded or damaged; charge and store them as their maker says.",
    ];

    private static StressReport Report(StressResult r, string rigName, double acceptPct)
    {
        var rate = r.FailureRate is { } f ? new RateEntry(f.Count, f.EstimateFraction, f.LowerFraction, f.UpperFraction) : null;
        string verdict = r.PassesAt(acceptPct) ? "pass" : "fail";
        var sample = r.WorstSample is { } w ? r.SampleResults.First(s => s.Index == w) : null;
        return new StressReport(
            rigName,
            r.Samples,
            r.RequestedSamples,
            r.Seed,
            r.Partial,
            acceptPct,
            verdict,
            rate,
            r.Criteria.Select(c => new CriterionEntry(c.Key, c.Description, c.Rate.Count, c.Rate.EstimateFraction, c.Rate.LowerFraction, c.Rate.UpperFraction)).ToList(),
            r.Percentiles.Select(p => new FigureEntry(p.Key, p.Summary?.Count ?? 0, p.LeftOut, p.Summary?.MinSi, p.Summary?.P5Si, p.Summary?.P50Si, p.Summary?.P95Si, p.Summary?.MaxSi, p.Summary?.MeanSi)).ToList(),
            r.Drivers.Select(d => new DriverEntry(d.Input, d.Margin, d.Rho)).ToList(),
            sample is null ? null : new WorstEntry(sample.Index, sample.Outcome.MinimumMarginFraction, Failed(sample.Outcome), Parts(sample.Parts)),
            Cautions);
    }

    private static IReadOnlyList<string> Failed(StressOutcome o) => o.FailedCriteria;

    private static PartsEntry Parts(StressParts p) => new(
        p.Stations.Select((s, i) => new StationEntry(i + 1, Units.RadPerSToRpm(s.KvRadPerSPerV), s.ResistanceOhm, s.NoLoadCurrentA, s.CurrentLimitA, s.RemanenceT, s.GapOffsetM * 1000)).ToList(),
        p.PlateThicknessM * 1000,
        p.PlateConductivitySPerM / 1e6,
        p.AmbientC,
        p.PlateTempC,
        p.SocFraction * 100,
        p.PackResistanceOhm * 1000,
        p.PayloadKg,
        p.CgOffsetXM * 1000,
        p.CgOffsetYM * 1000);

    private static SampleEntry SampleReport(StressSample s, int seed, int stations)
    {
        var o = s.Outcome;
        var margins = StressCriteria.All.ToDictionary(c => c.Key(), c => o.Margins[(int)c]);
        var trace = (o.Trace ?? []).Select(t => new TraceEntry(t.TimeS, t.Duty, t.SpeedRadPerS.Select(Units.RadPerSToRpm).ToList(), t.MotorCurrentA, t.BusVoltageV, t.PackCurrentA, t.LiftN)).ToList();
        return new SampleEntry(s.Index, seed, o.PassedAll, Failed(o), margins, o.LiftoffTimeS, o.StalledStations.Select(i => i + 1).ToList(), o.PeakMotorCurrentA, o.PeakPackCurrentA,
            o.MinPackVoltageV, o.HoverSpeedRpm, o.HoverCurrentA, o.HoverPackVoltageV, o.YawResidualNm, o.YawAuthorityNm, o.TrimLimit, Parts(s.Parts), trace);
    }

    private static string N(long n) => n.ToString("N0", CultureInfo.InvariantCulture);

    private static string Pct(double fraction) => Numbers.Format(fraction * 100, 2) + " %";

    private static void WriteText(StressReport r, int varied, TextWriter o)
    {
        o.WriteLine($"Stress test: {r.Rig}; {N(r.Samples)} of {N(r.RequestedSamples)} samples, seed {r.Seed}, {varied} quantities varied"
            + (r.Partial ? " (PARTIAL: stopped early)" : ""));
        if (r.FailureRate is { } f)
        {
            o.WriteLine($"  failure rate {Pct(f.Rate)} ({N(f.Failures)} samples), 95 % interval {Pct(f.CiLow)} to {Pct(f.CiHigh)}; accepted below {Numbers.Format(r.AcceptFailurePct, 2)} %: {r.Verdict.ToUpperInvariant()}");
        }
        o.WriteLine();
        var criteria = new TextTable(new TableColumn("criterion"), new TableColumn("failures", Alignment.Right), new TableColumn("rate", Alignment.Right),
            new TableColumn("95 % interval", Alignment.Right), new TableColumn("failing means"));
        foreach (var c in r.Criteria)
        {
            criteria.AddRow(c.Key, c.Failures.ToString(CultureInfo.InvariantCulture), Pct(c.Rate), $"{Pct(c.CiLow)} - {Pct(c.CiHigh)}", c.Description);
        }
        criteria.Write(o, 2);
        o.WriteLine();
        var figures = new TextTable(new TableColumn("figure"), new TableColumn("samples", Alignment.Right), new TableColumn("left_out", Alignment.Right),
            new TableColumn("P5", Alignment.Right), new TableColumn("P50", Alignment.Right), new TableColumn("P95", Alignment.Right));
        foreach (var p in r.Percentiles)
        {
            figures.AddRow(p.Figure, p.Count.ToString(CultureInfo.InvariantCulture), p.LeftOut.ToString(CultureInfo.InvariantCulture),
                Numbers.Format(p.P5, 2), Numbers.Format(p.P50, 2), Numbers.Format(p.P95, 2));
        }
        figures.Write(o, 2);
        if (r.Percentiles.FirstOrDefault(p => p.Figure == "hover_speed_rpm") is { LeftOut: > 0 } hover)
        {
            o.WriteLine($"  The hover figures leave out {hover.LeftOut} sample(s) without a trimmed hover; they count as trim failures.");
        }
        o.WriteLine();
        o.WriteLine("  Drivers (Spearman rank correlation of a drawn value with a margin; + means larger is safer):");
        var drivers = new TextTable(new TableColumn("input"), new TableColumn("margin"), new TableColumn("rho", Alignment.Right));
        foreach (var d in r.Drivers.Take(TextDrivers))
        {
            drivers.AddRow(d.Input, d.Margin, Numbers.Format(d.Rho, 3));
        }
        drivers.Write(o, 2);
        if (r.WorstSample is { } w)
        {
            o.WriteLine();
            o.WriteLine($"  Worst sample: {w.Index} (smallest margin {Numbers.Format(w.MinimumMargin, 3)}; failed: {(w.Failed.Count == 0 ? "none" : string.Join(", ", w.Failed))}); "
                + $"reproduce with --sample {w.Index} --seed {r.Seed}");
        }
        o.WriteLine();
        foreach (var c in r.Cautions)
        {
            o.WriteLine("Caution: " + c);
        }
    }

    private static string YawAuthorityText(double? authority) => authority switch
    {
        null => "yaw authority not checked (no trim)",
        0 => "the trim cannot command the yaw tolerance both ways within limits",
        { } a => $"the trim commands {Numbers.Format(a, 3)} N m of yaw both ways within limits",
    };

    private static void WriteSampleText(SampleEntry s, TextWriter o)
    {
        o.WriteLine($"Stress sample {s.Sample} (seed {s.Seed}): {(s.Passed ? "passes every criterion" : "FAILS " + string.Join(", ", s.Failed))}");
        var margins = new TextTable(new TableColumn("criterion"), new TableColumn("margin", Alignment.Right));
        foreach (var (key, value) in s.Margins)
        {
            margins.AddRow(key, Numbers.Format(value, 3));
        }
        margins.Write(o, 2);
        o.WriteLine($"  lift-off {Numbers.Format(s.LiftoffTimeS, 2)} s; stalled stations: {(s.StalledStations.Count == 0 ? "none" : string.Join(", ", s.StalledStations))}; "
            + $"peak motor current {Numbers.Format(s.PeakMotorCurrentA, 1)} A, peak pack current {Numbers.Format(s.PeakPackCurrentA, 1)} A, min pack voltage {Numbers.Format(s.MinPackVoltageV, 2)} V");
        o.WriteLine($"  hover: speed {Numbers.Format(s.HoverSpeedRpm, 0)} rpm, current {Numbers.Format(s.HoverCurrentA, 1)} A, pack {Numbers.Format(s.HoverPackVoltageV, 2)} V; "
            + $"yaw residual {Numbers.Format(s.YawResidualNm, 3)} N m at equal duty; " + YawAuthorityText(s.YawAuthorityNm) + (s.TrimLimit is { } l ? $"; trim stopped by {l}" : ""));
        var parts = new TextTable(new TableColumn("station", Alignment.Right), new TableColumn("kv_rpm_per_v", Alignment.Right), new TableColumn("resistance_ohm", Alignment.Right),
            new TableColumn("no_load_a", Alignment.Right), new TableColumn("current_limit_a", Alignment.Right), new TableColumn("remanence_t", Alignment.Right),
            new TableColumn("gap_offset_mm", Alignment.Right));
        foreach (var st in s.Parts.Stations)
        {
            parts.AddRow(st.Station.ToString(CultureInfo.InvariantCulture), Numbers.Format(st.KvRpmPerV, 2), Numbers.Format(st.ResistanceOhm, 5), Numbers.Format(st.NoLoadCurrentA, 3),
                Numbers.Format(st.CurrentLimitA, 1), Numbers.Format(st.RemanenceT, 4), Numbers.Format(st.GapOffsetMm, 3));
        }
        parts.Write(o, 2);
        var p = s.Parts;
        o.WriteLine($"  plate {Numbers.Format(p.PlateThicknessMm, 3)} mm, {Numbers.Format(p.PlateConductivityMsPerM, 3)} MS/m at {Numbers.Format(p.PlateTempC, 1)} C; ambient {Numbers.Format(p.AmbientC, 1)} C; "
            + $"pack {Numbers.Format(p.SocPct, 1)} % charged, {Numbers.Format(p.PackResistanceMohm, 2)} mOhm; payload {Numbers.Format(p.PayloadKg, 2)} kg; "
            + $"centre of gravity offset ({Numbers.Format(p.CgOffsetXMm, 1)}, {Numbers.Format(p.CgOffsetYMm, 1)}) mm");
        o.WriteLine($"  spin-up trace: {s.Trace.Count} points (use --csv FILE or --json to get them)");
    }
}

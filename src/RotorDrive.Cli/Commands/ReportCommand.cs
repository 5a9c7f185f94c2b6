using System.CommandLine;
using System.Globalization;
using System.Reflection;
using RotorDrive.Core.Craft;
using RotorDrive.Core.Simulation;
using RotorDrive.Core.Studies;
using RotorDrive.Core.Studies.Ranking;
using RotorDrive.Core.Studies.Stress;
using RotorDrive.Files;
using RotorDrive.Files.Reports;

namespace RotorDrive.Cli.Commands;

/// <summary><c>rotordrive report RIG.json -o FILE.html [--stress N] [--force]</c>: one self-contained HTML page for a
/// design review — the rig and its parts, the load model, hover, yaw, spin-up, endurance, the top of the ranking, the
/// stress test when asked, every failed limit first, the cautions, and the tool version, command line and input hashes.</summary>
/// <remarks>Runs the same Core studies with the same defaults as <c>hover</c>, <c>yaw</c>, <c>spinup</c>,
/// <c>endurance</c>, <c>rank</c> and <c>stress</c>. Exit 0 when every limit holds, 1 when one fails, 2 on bad input.</remarks>
public static class ReportCommand
{
    /// <summary>Builds the subcommand.</summary>
    /// <param name="clock">The clock for the report's date; the system clock when null.</param>
    public static Command Create(TimeProvider? clock = null)
    {
        var rig = CommonOptions.RigArgument();
        var output = new Option<string>("--output", "-o")
        {
            Description = "The HTML file to write (atomically; refuses to replace an existing file without --force).",
            HelpName = "FILE",
            Required = true,
        };
        var stress = new Option<int?>("--stress")
        {
            Description = "Also run the tolerance stress test with N samples (seed 1) and summarise it.",
            HelpName = "N",
        };
        stress.Validators.Add(r =>
        {
            if (r.GetValueOrDefault<int?>() is { } n && (n < 10 || n > 1_000_000))
            {
                r.AddError($"--stress must lie in 10..1000000 samples; got {n.ToString(CultureInfo.InvariantCulture)}.");
            }
        });
        var force = CommonOptions.Force();
        var command = new Command("report", "Write one self-contained HTML design-review report of the rig: every analysis, its plots, failed limits first, cautions and input hashes.");
        command.Arguments.Add(rig);
        command.Options.Add(output);
        command.Options.Add(stress);
        command.Options.Add(force);
        command.SetAction((parse, cancellationToken) => RunAsync(
            parse.GetValue(rig)!,
            parse.GetValue(output)!,
            parse.GetValue(stress),
            parse.GetValue(force),
            "rotordrive " + string.Join(' ', parse.Tokens.Select(t => Quote(t.Value))),
            CommonOptions.Today(clock),
            parse.InvocationConfiguration.Error,
            cancellationToken));
        return command;
    }

    /// <summary>RotorDrive's version (the assembly's informational version without the source hash).</summary>
    public static string ToolVersion()
    {
        string? informational = typeof(ReportCommand).Assembly.GetCustomAttribute<AssemblyInformationalVersionAttribute>()?.InformationalVersion;
        return informational is null ? "unknown" : informational.Split('+')[0];
    }

    private static async Task<int> RunAsync(string rigPath, string outputPath, int? stressSamples, bool force, string commandLine, DateOnly today,
        TextWriter error, CancellationToken cancellationToken)
    {
        if (CommonOptions.RefusesExistingCsv("report", outputPath, force, error))
        {
            return ExitCodes.BadInput;
        }
        var loaded = RigInput.LoadOrReport(rigPath, error);
        if (loaded is null)
        {
            return ExitCodes.BadInput;
        }
        var model = CraftInput.ModelOrReport("report", loaded, error);
        if (model is null)
        {
            return ExitCodes.BadInput;
        }
        var rig = model.Rig;
        var catalog = loaded.Catalog!;

        error.WriteLine("report: hover, yaw, spin-up, endurance...");
        var hoverStudy = HoverStudy.Run(model, new HoverStudyRequest(Yaw: true));
        var hover = hoverStudy.Review;
        var yaw = hoverStudy.Yaw!;
        var sim = SimulationRig.FromModel(model);
        var spinup = SpinupStudy.Run(sim, new SpinupStudyRequest(ControllerMode.Duty, 2.0, 1.0));
        var endurance = EnduranceStudy.Run(sim);

        RankResult? rank = null;
        Func<RankCandidate, RankEvaluation>? evaluate = null;
        string? rankNote = null;
        if (catalog.Motors.Count == 0 || catalog.Controllers.Count == 0 || catalog.Packs.Count == 0)
        {
            rankNote = "Not ranked: the catalogs need at least one motor, one controller and one pack.";
        }
        else if (rig.Stations.Count < 4)
        {
            rankNote = $"Not ranked: a trimmed hover needs at least four stations; the rig has {rig.Stations.Count}.";
        }
        else
        {
            error.WriteLine("report: ranking the catalogs...");
            var study = RankStudy.Create(rig, catalog, new RankOptions());
            rank = study.Run();
            evaluate = study.Evaluate;
        }

        StressResult? stress = null;
        if (stressSamples is { } n)
        {
            error.WriteLine($"report: stress test, {n} samples...");
            var stressModel = new RigStressModel(rig, loaded.Tolerances);
            stress = await Task.Run(() => StressStudy.Run(stressModel, loaded.Tolerances, new StressStudyOptions(n), null, cancellationToken), CancellationToken.None);
        }

        var paths = loaded.CatalogPaths!;
        var inputs = new[] { rigPath, paths.Motors, paths.Controllers, paths.Packs, paths.CellCurves, paths.Rotors, paths.Plates }
            .Select(ReportInput.Of)
            .ToList();
        var report = new RigReport(model, hover, yaw, sim, spinup, endurance, rank, evaluate, rankNote, stress, StressCommand.DefaultAcceptPct,
            today, ToolVersion(), commandLine, inputs);
        var problem = AtomicFile.WriteAllText(outputPath, RigReportHtml.Compose(report), force);
        if (problem is not null)
        {
            Output.ProblemReport.Print([problem], error);
            return ExitCodes.BadInput;
        }
        var failed = RigReportHtml.FailedLimits(report);
        error.WriteLine($"Report written to {outputPath}: {(failed.Count == 0 ? "every limit holds" : $"{failed.Count} failed limit(s)")}.");
        return failed.Count == 0 ? ExitCodes.Ok : ExitCodes.LimitFindings;
    }

    private static string Quote(string token) => token.Length > 0 && token.All(c => !char.IsWhiteSpace(c) && c != '\'' && c != '"') ? token : $"'{token.Replace("'", "'\\''")}'";
}

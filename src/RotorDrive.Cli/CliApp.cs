using System.CommandLine;
using System.Text.Json;
using RotorDrive.Cli.Commands;
using RotorDrive.Cli.Output;
using RotorDrive.Files;

namespace RotorDrive.Cli;

/// <summary>Builds the rotordrive command tree and runs it with the shared error handling and exit codes.</summary>
/// <remarks>Each subcommand lives in Commands/ with a static <c>Create()</c>; add one line to <see cref="BuildRoot"/>
/// to register it. Commands write through <c>parse.InvocationConfiguration.Output</c>/<c>.Error</c> so tests can
/// capture them.</remarks>
public static class CliApp
{
    /// <summary>Builds the root command with every subcommand.</summary>
    /// <param name="clock">The clock for the date stamped on plots and reports; the system clock when null.</param>
    public static RootCommand BuildRoot(TimeProvider? clock = null)
    {
        var root = new RootCommand("RotorDrive: drivetrain choice and analysis for eddy-current levitation rigs.");
        root.Subcommands.Add(CheckCommand.Create());
        root.Subcommands.Add(LoadCommand.Create(clock));
        root.Subcommands.Add(OperateCommand.Create(clock));
        root.Subcommands.Add(UiCommand.Create());
        root.Subcommands.Add(SpinupCommand.Create(clock));
        root.Subcommands.Add(EnduranceCommand.Create(clock));
        root.Subcommands.Add(HoverCommand.Create());
        root.Subcommands.Add(YawCommand.Create());
        root.Subcommands.Add(RankCommand.Create(clock));
        root.Subcommands.Add(StressCommand.Create(clock));
        root.Subcommands.Add(CalibrateCommand.Create());
        root.Subcommands.Add(ReportCommand.Create(clock));
        root.Subcommands.Add(DemoCommand.Create());
        root.Subcommands.Add(SchemaCommand.Create());
        NumericOptions.Apply(root);
        return root;
    }

    /// <summary>Parses and runs the command line; returns the process exit code (see <see cref="ExitCodes"/>).</summary>
    /// <param name="args">The arguments.</param>
    /// <param name="output">Where results go (stdout by default).</param>
    /// <param name="error">Where problems and progress go (stderr by default).</param>
    /// <param name="clock">The clock for the date stamped on plots and reports; the system clock when null.</param>
    public static async Task<int> RunAsync(string[] args, TextWriter? output = null, TextWriter? error = null, TimeProvider? clock = null)
    {
        ArgumentNullException.ThrowIfNull(args);
        output ??= Console.Out;
        error ??= Console.Error;
        if (!args.Contains("--json", StringComparer.Ordinal))
        {
            return await RunCoreAsync(args, output, error, clock);
        }
        // With --json, bad input still gives a JSON document on stdout (unless the command wrote its own).
        var probe = new OutputProbe(output);
        var collector = new ProblemCollector(error);
        int code = await RunCoreAsync(args, probe, collector, clock);
        if (code == ExitCodes.BadInput && !probe.Written)
        {
            string command = args.FirstOrDefault(a => !a.StartsWith('-')) is { } first && BuildRoot(clock).Subcommands.Any(c => c.Name == first)
                ? first : "rotordrive";
            var problems = collector.Problems.Select(p => new ProblemEntry(p.File, p.Line, p.Column, p.Field, p.Message)).ToList();
            JsonOutput.Write(output, new FailureReport(command, false, code, problems));
        }
        return code;
    }

    private static async Task<int> RunCoreAsync(string[] args, TextWriter output, TextWriter error, TimeProvider? clock)
    {
        try
        {
            var parse = BuildRoot(clock).Parse(args);
            if (parse.Errors.Count > 0)
            {
                foreach (var e in parse.Errors)
                {
                    if (error is ProblemCollector collector)
                    {
                        collector.Record([ProblemCollector.OfMessage(e.Message)]);
                    }
                    error.WriteLine($"rotordrive: {e.Message}");
                }
                error.WriteLine("Run 'rotordrive --help' (or 'rotordrive COMMAND --help') for usage.");
                return ExitCodes.BadInput;
            }
            var configuration = new InvocationConfiguration
            {
                Output = output,
                Error = error,
                EnableDefaultExceptionHandler = false,
            };
            return await parse.InvokeAsync(configuration);
        }
        catch (Exception e) when (IsInputError(e))
        {
            error.WriteLine($"rotordrive: error: {OneLine(e.Message)}");
            return ExitCodes.BadInput;
        }
        catch (Exception e)
        {
            error.WriteLine($"rotordrive: {Messages.Unexpected($"{e.GetType().Name}: {OneLine(e.Message)}")} (this is a bug in RotorDrive; please report it with the command you ran)");
            return ExitCodes.InternalError;
        }
    }

    private static bool IsInputError(Exception e)
        => e is IOException or UnauthorizedAccessException or JsonException or FormatException or InvalidDataException;

    private static string OneLine(string message) => message.ReplaceLineEndings(" ").Trim();

    /// <summary>The <c>--json</c> document of a run refused for bad input.</summary>
    private sealed record FailureReport(string Command, bool Ok, int ExitCode, IReadOnlyList<ProblemEntry> Problems);

    private sealed record ProblemEntry(string File, int Line, int Column, string Field, string Message);
}

using System.CommandLine;
using System.Text.Json;
using RotorDrive.Cli.Commands;
using RotorDrive.Cli.Output;
using RotorDrive.Files;

namespace RotorDrive.Cli;

/// <summary>Builds the rotordrive command tree and runs it with the shared error handling and exit codes.</summary>
/// <remarks>Each subcommand lives in Commands/ with a static <c>Create()</c>; add one line to the <c>Commands</c> table
/// to register it. Commands write through <c>parse.InvocationConfiguration.Output</c>/<c>.Error</c> so tests can
/// capture them.</remarks>
public static class CliApp
{
    // Every subcommand by the name it is invoked with. A run builds only the one its first argument names (start-up: the
    // other commands' option trees are never constructed); help, version and unknown words get the whole tree.
    private static readonly (string Name, Func<TimeProvider?, Command> Create)[] Commands =
    [
        ("check", _ => CheckCommand.Create()),
        ("load", LoadCommand.Create),
        ("operate", OperateCommand.Create),
        ("ui", _ => UiCommand.Create()),
        ("spinup", SpinupCommand.Create),
        ("endurance", EnduranceCommand.Create),
        ("hover", _ => HoverCommand.Create()),
        ("yaw", _ => YawCommand.Create()),
        ("rank", RankCommand.Create),
        ("stress", StressCommand.Create),
        ("calibrate", _ => CalibrateCommand.Create()),
        ("report", ReportCommand.Create),
        ("demo", _ => DemoCommand.Create()),
        ("schema", _ => SchemaCommand.Create()),
    ];

    /// <summary>The subcommands' names, in the order help lists them.</summary>
    public static IReadOnlyList<string> CommandNames { get; } = Commands.Select(c => c.Name).ToArray();

    /// <summary>Builds the root command with every subcommand.</summary>
    /// <param name="clock">The clock for the date stamped on plots and reports; the system clock when null.</param>
    public static RootCommand BuildRoot(TimeProvider? clock = null) => BuildRoot(clock, only: null);

    /// <summary>Builds the root command with the subcommand named <paramref name="only"/>, or with every subcommand when
    /// <paramref name="only"/> is null or names none.</summary>
    /// <param name="clock">The clock for the date stamped on plots and reports; the system clock when null.</param>
    /// <param name="only">The one subcommand to build (the first word of the command line), or null.</param>
    internal static RootCommand BuildRoot(TimeProvider? clock, string? only)
    {
        var root = new RootCommand("RotorDrive: drivetrain choice and analysis for eddy-current levitation rigs.");
        bool one = only is not null && CommandNames.Contains(only, StringComparer.Ordinal);
        foreach (var (name, create) in Commands)
        {
            if (!one || name == only)
            {
                root.Subcommands.Add(create(clock));
            }
        }
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
            string command = args.FirstOrDefault(a => !a.StartsWith('-')) is { } first && CommandNames.Contains(first, StringComparer.Ordinal)
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
            var parse = BuildRoot(clock, args.FirstOrDefault()).Parse(args);
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

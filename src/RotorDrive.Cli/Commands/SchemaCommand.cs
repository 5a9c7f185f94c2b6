using System.CommandLine;
using RotorDrive.Files;
using RotorDrive.Files.Rigs;

namespace RotorDrive.Cli.Commands;

/// <summary><c>rotordrive schema rig [-o FILE] [--force] [--markdown]</c>: the rig file's JSON Schema (draft 2020-12),
/// generated from the schema table the reader and the resolver use, so an editor completes and checks rig keys.</summary>
public static class SchemaCommand
{
    /// <summary>Builds the subcommand.</summary>
    public static Command Create()
    {
        var kind = new Argument<string>("kind")
        {
            Description = "Which file's schema: rig (the only one so far).",
        };
        kind.AcceptOnlyFromAmong("rig");
        var output = new Option<string?>("--output", "-o")
        {
            Description = "Write the schema to this file (atomically; refuses to replace an existing file without --force) instead of stdout.",
            HelpName = "FILE",
        };
        var markdown = new Option<bool>("--markdown")
        {
            Description = "Write the key table the README shows (Markdown) instead of the JSON Schema.",
        };
        var force = CommonOptions.Force();
        var command = new Command("schema", "Print the rig file's JSON Schema (draft 2020-12) for editors: every key with its unit, range, default and help.");
        command.Arguments.Add(kind);
        command.Options.Add(output);
        command.Options.Add(force);
        command.Options.Add(markdown);
        command.SetAction(parse => Run(parse.GetValue(output), parse.GetValue(force), parse.GetValue(markdown),
            parse.InvocationConfiguration.Output, parse.InvocationConfiguration.Error));
        return command;
    }

    private static int Run(string? path, bool force, bool markdown, TextWriter output, TextWriter error)
    {
        string text = markdown ? RigJsonSchema.MarkdownTable() : RigJsonSchema.Generate();
        if (path is null)
        {
            output.Write(text);
            return ExitCodes.Ok;
        }
        if (AtomicFile.WriteAllText(path, text, force) is { } problem)
        {
            Output.ProblemReport.Print([problem], error);
            return ExitCodes.BadInput;
        }
        error.WriteLine($"Schema written to {path}.");
        return ExitCodes.Ok;
    }
}

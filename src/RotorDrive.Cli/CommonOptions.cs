using System.CommandLine;

namespace RotorDrive.Cli;

/// <summary>Factories for the options and arguments several subcommands share. Each call makes a new instance: a
/// System.CommandLine symbol belongs to one command, so there are no static option holders.</summary>
public static class CommonOptions
{
    /// <summary>The rig file argument.</summary>
    public static Argument<string> RigArgument() => new("rig")
    {
        Description = "The rig file (JSON); the catalogs it names are read relative to it.",
    };

    /// <summary>--json: write a JSON document to stdout instead of text tables.</summary>
    public static Option<bool> Json() => new("--json")
    {
        Description = "Write a JSON document (snake_case keys with units) to stdout instead of tables.",
    };

    /// <summary>--force: allow replacing an existing output file.</summary>
    public static Option<bool> Force() => new("--force")
    {
        Description = "Replace the output file if it already exists.",
    };
}

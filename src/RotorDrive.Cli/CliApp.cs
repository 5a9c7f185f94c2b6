using System.CommandLine;

namespace RotorDrive.Cli;

/// <summary>Builds the rotordrive command tree; one file per subcommand registers itself here.</summary>
public static class CliApp
{
    /// <summary>Builds the root command with every subcommand.</summary>
    public static RootCommand BuildRoot()
    {
        var root = new RootCommand("RotorDrive: drivetrain choice and analysis for eddy-current levitation rigs.");
        return root;
    }

    /// <summary>Parses and runs the command line; returns the process exit code.</summary>
    public static async Task<int> RunAsync(string[] args)
    {
        var root = BuildRoot();
        return await root.Parse(args).InvokeAsync();
    }
}

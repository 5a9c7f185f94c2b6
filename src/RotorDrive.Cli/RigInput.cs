using RotorDrive.Cli.Output;
using RotorDrive.Files;

namespace RotorDrive.Cli;

/// <summary>Loads the rig a subcommand works on, or reports why it cannot.</summary>
public static class RigInput
{
    /// <summary>Loads a rig with its catalogs. On any problem prints every one to <paramref name="error"/> and returns
    /// null; the caller then returns <see cref="ExitCodes.BadInput"/>.</summary>
    /// <example><code>
    /// var loaded = RigInput.LoadOrReport(path, error);
    /// if (loaded is null) { return ExitCodes.BadInput; }
    /// var rig = loaded.Rig!;
    /// </code></example>
    public static RigLoadResult? LoadOrReport(string rigPath, TextWriter error)
    {
        ArgumentNullException.ThrowIfNull(error);
        var result = RigLoader.Load(rigPath);
        if (result.IsClean)
        {
            return result;
        }
        ProblemReport.Print(result.Problems, error);
        return null;
    }
}

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
            // Every analysis of this rig uses the calibrated loads; say so once, on stderr so --json output stays clean.
            foreach (var line in CalibrationNotes(result.Rig!))
            {
                error.WriteLine(line);
            }
            return result;
        }
        ProblemReport.Print(result.Problems, error);
        return null;
    }

    /// <summary>One line per calibrated rotor design: which file and which factors the analyses use.</summary>
    /// <param name="rig">The rig.</param>
    public static IEnumerable<string> CalibrationNotes(Core.Craft.Rig rig)
    {
        ArgumentNullException.ThrowIfNull(rig);
        foreach (var (rotor, c) in rig.Calibrations.OrderBy(c => c.Key, StringComparer.Ordinal))
        {
            yield return $"note: rotor '{rotor}' uses its bench calibration {c.Source} (conductivity_factor {Numbers.Format(c.Factors.ConductivityFactor, 3)}, "
                + $"field_factor {Numbers.Format(c.Factors.FieldFactor, 3)})";
        }
    }
}

using RotorDrive.Core.Craft;

namespace RotorDrive.Cli;

/// <summary>Loads a rig and prepares its <see cref="RigModel"/> for the whole-craft commands, or reports why not.</summary>
public static class CraftInput
{
    /// <summary>Loads the rig and builds its model; on a problem prints it to <paramref name="error"/> and returns null
    /// (the caller returns <see cref="ExitCodes.BadInput"/>).</summary>
    /// <param name="command">The subcommand's name, for the message.</param>
    /// <param name="rigPath">The rig file.</param>
    /// <param name="error">Where problems go.</param>
    public static RigModel? ModelOrReport(string command, string rigPath, TextWriter error)
    {
        ArgumentNullException.ThrowIfNull(error);
        var loaded = RigInput.LoadOrReport(rigPath, error);
        return loaded is null ? null : ModelOrReport(command, loaded, error);
    }

    /// <summary>Builds the model of a rig already loaded clean; on missing parts prints them and returns null.</summary>
    /// <param name="command">The subcommand's name, for the message.</param>
    /// <param name="loaded">The loaded rig (no problems).</param>
    /// <param name="error">Where problems go.</param>
    public static RigModel? ModelOrReport(string command, Files.RigLoadResult loaded, TextWriter error)
        => ModelOrReport(command, loaded, error, null, null);

    /// <summary>Loads the rig and builds its model with a bench's stands at another gap or every station at one duty
    /// (<c>--gap-mm</c>, <c>--duty</c>; <see cref="Rig.OnStands"/>); on a problem, or when either is given for a rig that
    /// is not a bench, prints it and returns null.</summary>
    /// <param name="command">The subcommand's name, for the message.</param>
    /// <param name="rigPath">The rig file.</param>
    /// <param name="error">Where problems go.</param>
    /// <param name="standsGapMm">The stands' gap, mm, or null for the rig's design gap.</param>
    /// <param name="standsDuty">Every station's duty, or null for each station's own (or the rig's max duty).</param>
    public static RigModel? ModelOrReport(string command, string rigPath, TextWriter error, double? standsGapMm, double? standsDuty)
    {
        ArgumentNullException.ThrowIfNull(error);
        var loaded = RigInput.LoadOrReport(rigPath, error);
        return loaded is null ? null : ModelOrReport(command, loaded, error, standsGapMm, standsDuty);
    }

    private static RigModel? ModelOrReport(string command, Files.RigLoadResult loaded, TextWriter error, double? standsGapMm, double? standsDuty)
    {
        ArgumentNullException.ThrowIfNull(loaded);
        ArgumentNullException.ThrowIfNull(error);
        string rigPath = loaded.RigPath;
        var rig = loaded.Rig!;
        if ((standsGapMm is not null || standsDuty is not null) && rig.Mount != MountKind.Bench)
        {
            error.WriteLine($"rotordrive {command}: error: {rigPath}: $.mount: {Files.Messages.StandsOptionsNeedBench(standsGapMm is not null ? "--gap-mm" : "--duty", Output.JsonNames.Of(rig.Mount))}");
            return null;
        }
        if (RefusesMount(command, loaded, error))
        {
            return null;
        }
        var missing = RigModel.MissingParts(rig);
        if (missing.Count > 0)
        {
            foreach (var m in missing)
            {
                error.WriteLine($"rotordrive {command}: error: {rigPath}: {m}; assign one (see 'rotordrive check') before a whole-rig analysis.");
            }
            return null;
        }
        return RigModel.Build(rig.OnStands(standsGapMm / 1000.0, standsDuty));
    }

    /// <summary>True (after printing why) when a whole-craft analysis is asked of a rig it does not fit (rig file
    /// <c>mount</c>), as <see cref="MountFit.Fits"/> says; the caller exits with <see cref="ExitCodes.BadInput"/>.</summary>
    /// <param name="command">The subcommand's name.</param>
    /// <param name="loaded">The loaded rig (no problems).</param>
    /// <param name="error">Where the message goes.</param>
    public static bool RefusesMount(string command, Files.RigLoadResult loaded, TextWriter error)
    {
        ArgumentNullException.ThrowIfNull(loaded);
        ArgumentNullException.ThrowIfNull(error);
        var mount = loaded.Rig!.Mount;
        if (MountFit.Fits(command, mount))
        {
            return false;
        }
        error.WriteLine($"rotordrive {command}: error: {loaded.RigPath}: $.mount: {Files.Messages.NotForMount(command, Output.JsonNames.Of(mount))}");
        return true;
    }
}

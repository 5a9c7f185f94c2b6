using RotorDrive.Core.Craft;
using RotorDrive.Files;

namespace RotorDrive.Tui.Sheets;

/// <summary>What a sheet says instead of its figures when its analysis does not fit the rig's mount: the command line's
/// refusal, from the same table (<see cref="MountFit"/>) and the same message.</summary>
internal static class MountNote
{
    /// <summary>The note for an analysis on this rig, or null when it fits.</summary>
    /// <param name="analysis">The analysis's command name ("hover", "rank", ...).</param>
    /// <param name="rig">The rig.</param>
    internal static string? For(string analysis, Rig rig)
        => MountFit.Fits(analysis, rig.Mount) ? null : "! " + Messages.NotForMount(analysis, rig.Mount.ToString().ToLowerInvariant()) + ".";
}

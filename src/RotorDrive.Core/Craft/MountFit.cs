namespace RotorDrive.Core.Craft;

/// <summary>Which whole-rig analysis fits which mount: the one table the command line and the workbench both ask (the
/// README's mount table says the same). The per-station analyses (<c>check</c>, <c>load</c>, <c>operate</c>) fit every
/// mount and are not listed.</summary>
public static class MountFit
{
    /// <summary>The whole-rig analyses, by their command names, in the README's order.</summary>
    public static IReadOnlyList<string> Analyses { get; } = ["hover", "yaw", "spinup", "endurance", "rank", "stress", "report"];

    /// <summary>Whether an analysis describes a rig held this way: every one fits a free craft; a guided sled gets
    /// <c>hover</c> (its steady state, <see cref="SteadyState"/>), <c>spinup</c> and <c>endurance</c> (the rails carry
    /// pitch, roll and yaw, so no <c>yaw</c> balance, and no ranking, stress test or report built on the trim); a bench
    /// of stands gets <c>spinup</c> and <c>endurance</c> per station at its fixed gap.</summary>
    /// <param name="analysis">The analysis's command name ("hover", "endurance", ...).</param>
    /// <param name="mount">The rig's mount.</param>
    public static bool Fits(string analysis, MountKind mount) => mount switch
    {
        MountKind.Free => true,
        MountKind.Guided => analysis is "hover" or "spinup" or "endurance",
        _ => analysis is "spinup" or "endurance",
    };
}

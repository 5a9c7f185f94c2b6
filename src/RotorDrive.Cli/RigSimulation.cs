using RotorDrive.Core.Craft;
using RotorDrive.Core.Simulation;

namespace RotorDrive.Cli;

/// <summary>Prepares the simulation context of a rig for the spinup and endurance commands, or says why it cannot.</summary>
public static class RigSimulation
{
    /// <summary>Builds the prepared rig; on a missing drivetrain or pack writes one line per problem and returns null
    /// (the caller returns <see cref="ExitCodes.BadInput"/>).</summary>
    /// <param name="rig">The loaded rig.</param>
    /// <param name="rigPath">The rig file, for messages.</param>
    /// <param name="command">The subcommand name, for messages.</param>
    /// <param name="error">Where problems go.</param>
    public static SimulationRig? BuildOrReport(Rig rig, string rigPath, string command, TextWriter error)
    {
        ArgumentNullException.ThrowIfNull(rig);
        ArgumentNullException.ThrowIfNull(error);
        bool ok = true;
        for (int j = 0; j < rig.Stations.Count; j++)
        {
            var s = rig.Stations[j];
            if (s.Motor is null || s.Controller is null)
            {
                error.WriteLine($"rotordrive {command}: error: {rigPath}: stations[{j}] has no {(s.Motor is null ? "motor" : "controller")}; a time simulation needs a motor and a controller on every station.");
                ok = false;
            }
        }
        if (rig.Packs is null)
        {
            error.WriteLine($"rotordrive {command}: error: {rigPath}: the rig names no pack; a time simulation needs one.");
            ok = false;
        }
        return ok ? SimulationRig.Build(rig) : null;
    }
}

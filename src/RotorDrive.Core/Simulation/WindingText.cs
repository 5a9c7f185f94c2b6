using System.Globalization;

namespace RotorDrive.Core.Simulation;

/// <summary>The hottest winding in words, saying where it is not modelled: a motor row without thermal data keeps its
/// winding at the start temperature in the simulation, which must not read as a measured or computed temperature.</summary>
public static class WindingText
{
    /// <summary>"hottest winding 74.2 C", "hottest winding 74.2 C (stations 2, 3 not modelled: no thermal data)" or
    /// "winding temperature not modelled (no thermal data in the motor rows)".</summary>
    /// <param name="rig">The simulated rig (its <see cref="SimulationRig.Windings"/> say which are modelled).</param>
    /// <param name="peakWindingTempC">The run's highest winding temperature, C.</param>
    /// <returns>The text.</returns>
    /// <exception cref="ArgumentNullException">A null rig.</exception>
    public static string Hottest(SimulationRig rig, double peakWindingTempC)
    {
        ArgumentNullException.ThrowIfNull(rig);
        var missing = Enumerable.Range(0, rig.Windings.Count).Where(j => rig.Windings[j] is null).ToList();
        if (missing.Count == rig.Windings.Count)
        {
            return "winding temperature not modelled (no thermal data in the motor rows)";
        }
        string hottest = "hottest winding " + peakWindingTempC.ToString("F1", CultureInfo.InvariantCulture) + " C";
        return missing.Count == 0
            ? hottest
            : $"{hottest} (station{(missing.Count > 1 ? "s" : "")} {string.Join(", ", missing.Select(j => j + 1))} not modelled: no thermal data)";
    }
}

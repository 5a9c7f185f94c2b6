using RotorDrive.Core.Simulation;

namespace RotorDrive.Core.Studies.Ranking;

/// <summary>The full simulations of a shortlisted combination on its own rig model variant: the spin-up from rest on the
/// landing gear through the drag peak to the trimmed hover (<see cref="SpinupSimulator"/>) and the endurance run
/// (<see cref="EnduranceSimulator"/>).</summary>
/// <param name="LiftoffTimeS">Simulated time from rest to lift-off, s; null when the craft never lifts off.</param>
/// <param name="StalledStations">Stations whose rotor ended below its landed-gap drag peak at the controller's current
/// limit (empty when none).</param>
/// <param name="SpinupFindings">Every limit the spin-up fails, in words (stall, no or late lift-off, burst currents,
/// pack cutoff); empty when it passes. The first ones are the stalls and a missing lift-off, when any.</param>
/// <param name="MinBusVoltageV">Lowest bus voltage during the spin-up, V.</param>
/// <param name="PeakPackCurrentA">Largest pack current during the spin-up, A.</param>
/// <param name="EnduranceRuntimeS">Hover time until the first limit with the pack, windings and plate evolving, s.</param>
/// <param name="EnduranceLimit">The limit that ended the endurance run.</param>
/// <param name="EnduranceLimitText">That limit in words.</param>
/// <param name="PeakWindingTempC">Highest winding temperature of the endurance run, C.</param>
/// <param name="PeakPlateTempC">Highest plate patch temperature of the endurance run, C.</param>
public sealed record RankSimulation(
    double? LiftoffTimeS,
    IReadOnlyList<int> StalledStations,
    IReadOnlyList<string> SpinupFindings,
    double MinBusVoltageV,
    double PeakPackCurrentA,
    double EnduranceRuntimeS,
    EnduranceLimit EnduranceLimit,
    string EnduranceLimitText,
    double PeakWindingTempC,
    double PeakPlateTempC)
{
    /// <summary>True when the craft lifts off and no rotor stalls: what keeps a combination on the shortlist.</summary>
    public bool PassesSpinup => LiftoffTimeS is not null && StalledStations.Count == 0;

    /// <summary>Why the spin-up fails (the stalls and a missing lift-off), in words; empty when <see cref="PassesSpinup"/>.</summary>
    public string FailureText => PassesSpinup ? string.Empty : string.Join("; ", SpinupFindings.Take(StalledStations.Count + (LiftoffTimeS is null ? 1 : 0)));
}

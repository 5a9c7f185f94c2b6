using RotorDrive.Core.Simulation;

namespace RotorDrive.Core.Studies.Ranking;

/// <summary>The full checks of a shortlisted combination on its own rig model variant: the spin-up study that the
/// <c>spinup</c> command runs (<see cref="SpinupStudy"/>: from rest on the landing gear through the drag peak to the trimmed
/// hover, and the landings), the hover review that the <c>hover</c> command gives (<see cref="Craft.HoverReview"/>), and the
/// endurance run (<see cref="EnduranceSimulator"/>).</summary>
/// <param name="LiftoffTimeS">Simulated time from rest to lift-off, s; null when the craft never lifts off.</param>
/// <param name="StalledStations">Stations whose rotor ended below its landed-gap drag peak at the controller's current
/// limit (empty when none).</param>
/// <param name="SpinupFindings">Every limit the spin-up study fails (<see cref="SpinupStudyResult.Findings"/>), in words;
/// empty when it passes.</param>
/// <param name="HoverFindings">Every limit the hover review fails (<see cref="Craft.HoverReview.Findings"/>), in words; empty
/// when it passes.</param>
/// <param name="Cautions">What the two give as cautions without failing: the spin-up's (not the landings': run
/// <c>spinup</c> for those) and the hover review's warnings, in words.</param>
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
    IReadOnlyList<string> HoverFindings,
    IReadOnlyList<string> Cautions,
    double MinBusVoltageV,
    double PeakPackCurrentA,
    double EnduranceRuntimeS,
    EnduranceLimit EnduranceLimit,
    string EnduranceLimitText,
    double PeakWindingTempC,
    double PeakPlateTempC)
{
    /// <summary>True when the spin-up study and the hover review both pass: what keeps a combination on the shortlist.</summary>
    public bool Passes => SpinupFindings.Count == 0 && HoverFindings.Count == 0;

    /// <summary>Why it fails, in words (spin-up findings, then hover findings); empty when it <see cref="Passes"/>.</summary>
    public string FailureText => string.Join("; ", [.. SpinupFindings.Select(f => "spin-up: " + f), .. HoverFindings.Select(f => "hover: " + f)]);
}

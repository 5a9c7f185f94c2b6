using RotorDrive.Core.Craft;
using RotorDrive.Core.Simulation;
using RotorDrive.Core.Studies.Ranking;
using RotorDrive.Core.Studies.Stress;

namespace RotorDrive.Files.Reports;

/// <summary>Everything a design-review report shows: the Core results of the same studies the commands run, and where
/// they came from.</summary>
/// <param name="Model">The rig as analysed (parts, masses, packs).</param>
/// <param name="Hover">The trimmed hover at the design gap (<c>hover</c>).</param>
/// <param name="Yaw">The yaw balance (<c>yaw</c>).</param>
/// <param name="Simulation">The prepared rig of the time simulations.</param>
/// <param name="Spinup">The spin-up study (<c>spinup</c>).</param>
/// <param name="Endurance">The endurance run (<c>endurance</c>).</param>
/// <param name="Rank">The catalog ranking (<c>rank</c>), or null when it could not run (see <paramref name="RankNote"/>).</param>
/// <param name="RankEvaluate">Core's evaluation of one ranked combination, for the Pareto plot (null without a ranking).</param>
/// <param name="RankNote">Why there is no ranking, or null.</param>
/// <param name="Stress">The tolerance stress test (<c>stress</c>), or null when not asked for.</param>
/// <param name="StressAcceptPct">The accepted overall failure rate of the stress test, %.</param>
/// <param name="Date">The report's date.</param>
/// <param name="ToolVersion">RotorDrive's version.</param>
/// <param name="CommandLine">The command line that made the report.</param>
/// <param name="Inputs">Every input file with its hash.</param>
public sealed record RigReport(
    RigModel Model,
    HoverReview Hover,
    YawResult Yaw,
    SimulationRig Simulation,
    SpinupStudyResult Spinup,
    EnduranceStudyResult Endurance,
    RankResult? Rank,
    Func<RankCandidate, RankEvaluation>? RankEvaluate,
    string? RankNote,
    StressResult? Stress,
    double StressAcceptPct,
    DateOnly Date,
    string ToolVersion,
    string CommandLine,
    IReadOnlyList<ReportInput> Inputs);

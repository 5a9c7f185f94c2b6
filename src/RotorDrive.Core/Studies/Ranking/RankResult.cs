namespace RotorDrive.Core.Studies.Ranking;

/// <summary>The outcome of ranking every motor x controller x pack (x pack count) for a rig.</summary>
/// <param name="Objective">What was ranked by.</param>
/// <param name="Weights">The score weights.</param>
/// <param name="TotalCombinations">Combinations evaluated.</param>
/// <param name="Ordered">Every accepted combination, best first.</param>
/// <param name="Scores">Weighted score of each entry of <paramref name="Ordered"/>, same order.</param>
/// <param name="ParetoRanks">1-based ranks of the accepted combinations in the Pareto set over runtime (more is
/// better), total mass (less) and current margin (more), ascending.</param>
/// <param name="RejectionCounts">Combinations rejected by each reason (every kind listed, zero included).</param>
/// <param name="Top">The shortlist: the best <see cref="RankOptions.Top"/> combinations, fully evaluated and simulated
/// (spin-up and endurance, <see cref="RankEvaluation.Simulation"/>).</param>
/// <param name="AssignedCandidate">The rig's own drivetrain when every station has the same motor and controller and a
/// pack is named; otherwise null.</param>
/// <param name="Assigned">Its evaluation, or null.</param>
/// <param name="AssignedRank">Its 1-based rank, or null when it is rejected, absent, or not within the sweep.</param>
public sealed record RankResult(
    RankObjective Objective,
    RankWeights Weights,
    long TotalCombinations,
    IReadOnlyList<RankCandidate> Ordered,
    IReadOnlyList<double> Scores,
    IReadOnlyList<int> ParetoRanks,
    IReadOnlyList<RankRejectionCount> RejectionCounts,
    IReadOnlyList<RankedEntry> Top,
    RankCandidate? AssignedCandidate,
    RankEvaluation? Assigned,
    int? AssignedRank)
{
    /// <summary>Combinations that passed every quick check and reached the shortlist, but failed the full checks (spin-up
    /// study and hover review, <see cref="RankStudy.Simulate"/>), best first (each with its <see cref="RankRejectionKind.SpinupSimulation"/> reason and simulation);
    /// they are counted under that reason in <see cref="RejectionCounts"/> and are not in <see cref="Ordered"/>.</summary>
    public IReadOnlyList<RankEvaluation> SimulationRejections { get; init; } = [];

    /// <summary>Accepted combinations.</summary>
    public long AcceptedCount => Ordered.Count;

    /// <summary>Rejected combinations.</summary>
    public long RejectedCount => TotalCombinations - Ordered.Count;

    /// <summary>The 1-based rank of a combination among the accepted ones, or null when it was rejected or is not in
    /// the sweep.</summary>
    /// <param name="candidate">The combination.</param>
    public int? RankOf(RankCandidate candidate)
    {
        for (int i = 0; i < Ordered.Count; i++)
        {
            if (Ordered[i] == candidate)
            {
                return i + 1;
            }
        }
        return null;
    }
}

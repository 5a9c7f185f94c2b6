namespace RotorDrive.Core.Studies.Ranking;

/// <summary>One accepted combination with its place in the ranking.</summary>
/// <param name="Rank">1-based rank by the chosen objective.</param>
/// <param name="Evaluation">Its full evaluation.</param>
/// <param name="Score">Weighted score, 0..1 (computed for every objective).</param>
/// <param name="InParetoSet">True when no other accepted combination is at least as good in runtime, mass and
/// current margin and better in one.</param>
/// <param name="LiftoffTimeS">Simulated time from rest to lift-off, s (the full spin-up simulation of the shortlist,
/// <see cref="RankSimulation.LiftoffTimeS"/>).</param>
public sealed record RankedEntry(int Rank, RankEvaluation Evaluation, double Score, bool InParetoSet, double? LiftoffTimeS);

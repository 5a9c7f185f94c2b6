namespace RotorDrive.Core.Studies.Ranking;

/// <summary>How many combinations one reason rejected (a combination with several reasons counts under each).</summary>
/// <param name="Kind">The reason.</param>
/// <param name="Count">Combinations it rejected.</param>
public readonly record struct RankRejectionCount(RankRejectionKind Kind, long Count);

namespace RotorDrive.Core.Studies.Ranking;

/// <summary>One reason a combination was rejected (or cautioned), with a sentence naming the parts and the numbers.</summary>
/// <param name="Kind">What failed.</param>
/// <param name="Message">A sentence for people.</param>
public sealed record RankRejection(RankRejectionKind Kind, string Message);

namespace RotorDrive.Core.Safety;

/// <summary>One safety caution as structured text that the command line and the terminal UI render.</summary>
/// <param name="Topic">The hazard.</param>
/// <param name="Level">Notice, or Warning when the results put the hazard in play.</param>
/// <param name="Title">A short heading.</param>
/// <param name="Text">The advice, one paragraph of plain text.</param>
/// <param name="Reason">Why it was raised to a warning (figures from the results), or null for a notice.</param>
public sealed record Caution(CautionTopic Topic, CautionLevel Level, string Title, string Text, string? Reason);

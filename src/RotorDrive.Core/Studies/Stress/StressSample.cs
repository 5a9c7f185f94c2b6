namespace RotorDrive.Core.Studies.Stress;

/// <summary>One evaluated sample: its index, its drawn parts and what it showed.</summary>
/// <param name="Index">The sample index.</param>
/// <param name="Parts">The drawn parts.</param>
/// <param name="Outcome">The margins and figures.</param>
public sealed record StressSample(int Index, StressParts Parts, StressOutcome Outcome);

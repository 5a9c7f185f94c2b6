namespace RotorDrive.Core.Drive;

/// <summary>One compatibility finding: what, how serious, and a sentence for people.</summary>
/// <param name="Kind">What was found.</param>
/// <param name="Severity">How serious it is.</param>
/// <param name="Message">A sentence naming the parts and the numbers.</param>
public sealed record DriveFinding(DriveFindingKind Kind, FindingSeverity Severity, string Message);

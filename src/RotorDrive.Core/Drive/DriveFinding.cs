namespace RotorDrive.Core.Drive;

/// <summary>One compatibility finding: what, how serious, and a sentence for people.</summary>
/// <remarks>The sentence is composed on first use, so analyses that only count findings (ranking, stress test) do not pay
/// for formatting.</remarks>
public sealed class DriveFinding
{
    private readonly Func<string> _compose;
    private string? _message;

    /// <summary>Creates a finding whose message is composed when first read.</summary>
    /// <param name="kind">What was found.</param>
    /// <param name="severity">How serious it is.</param>
    /// <param name="compose">Composes the sentence naming the parts and the numbers.</param>
    /// <exception cref="ArgumentNullException">The composer is null.</exception>
    public DriveFinding(DriveFindingKind kind, FindingSeverity severity, Func<string> compose)
    {
        Kind = kind;
        Severity = severity;
        _compose = Preconditions.NotNull(compose, nameof(compose));
    }

    /// <summary>What was found.</summary>
    public DriveFindingKind Kind { get; }

    /// <summary>How serious it is.</summary>
    public FindingSeverity Severity { get; }

    /// <summary>A sentence naming the parts and the numbers.</summary>
    public string Message => _message ??= _compose();

    /// <inheritdoc />
    public override string ToString() => $"{Severity} {Kind}: {Message}";
}

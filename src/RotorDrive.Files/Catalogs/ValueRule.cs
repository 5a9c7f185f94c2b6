namespace RotorDrive.Files.Catalogs;

/// <summary>The range a numeric catalog value must lie in.</summary>
/// <param name="Kind">Which test applies.</param>
/// <param name="Min">Lower bound for <see cref="RuleKind.Between"/> and <see cref="RuleKind.AtLeast"/>.</param>
/// <param name="Max">Upper bound for <see cref="RuleKind.Between"/>.</param>
public sealed record ValueRule(RuleKind Kind, double Min = 0, double Max = 0)
{
    /// <summary>Any finite value.</summary>
    public static ValueRule Any { get; } = new(RuleKind.Any);

    /// <summary>Greater than zero.</summary>
    public static ValueRule Positive { get; } = new(RuleKind.Positive);

    /// <summary>Zero or more.</summary>
    public static ValueRule NonNegative { get; } = new(RuleKind.NonNegative);

    /// <summary>Within [min, max].</summary>
    public static ValueRule Between(double min, double max) => new(RuleKind.Between, min, max);

    /// <summary>Greater than 0 and at most <paramref name="max"/>.</summary>
    /// <param name="max">Largest accepted value (a physical bound, not a preference).</param>
    public static ValueRule PositiveAtMost(double max) => new(RuleKind.PositiveAtMost, 0, max);

    /// <summary>Zero or more and at most <paramref name="max"/>.</summary>
    /// <param name="max">Largest accepted value (a physical bound, not a preference).</param>
    public static ValueRule NonNegativeAtMost(double max) => new(RuleKind.NonNegativeAtMost, 0, max);

    /// <summary>A whole number of at least min (and at most max, a physical bound, when given).</summary>
    public static ValueRule AtLeast(int min, int max = int.MaxValue) => new(RuleKind.AtLeast, min, max);

    /// <summary>The message for a value that breaks the rule, or null when it complies.</summary>
    public string? Check(double value) => Kind switch
    {
        RuleKind.Positive when !(value > 0) => Messages.MustBePositive(value),
        RuleKind.NonNegative when !(value >= 0) => Messages.MustBeNonNegative(value),
        RuleKind.Between when !(value >= Min && value <= Max) => Messages.MustBeBetween(Min, Max, value),
        RuleKind.AtLeast when !(value >= Min) => Messages.MustBeAtLeast((int)Min, (int)value),
        RuleKind.AtLeast when !(value <= Max) => Messages.MustBeAtMost(Max, value),
        RuleKind.PositiveAtMost when !(value > 0) => Messages.MustBePositive(value),
        RuleKind.NonNegativeAtMost when !(value >= 0) => Messages.MustBeNonNegative(value),
        RuleKind.PositiveAtMost or RuleKind.NonNegativeAtMost when !(value <= Max) => Messages.MustBeAtMost(Max, value),
        _ => null,
    };

    /// <summary>The rule in words, for documentation and help ("> 0", "0 to 100").</summary>
    public string Describe() => Kind switch
    {
        RuleKind.Positive => "> 0",
        RuleKind.NonNegative => ">= 0",
        RuleKind.Between => $"{Min.ToString(System.Globalization.CultureInfo.InvariantCulture)} to {Max.ToString(System.Globalization.CultureInfo.InvariantCulture)}",
        RuleKind.AtLeast when Max < int.MaxValue => $"{Min.ToString(System.Globalization.CultureInfo.InvariantCulture)} to {Max.ToString(System.Globalization.CultureInfo.InvariantCulture)}",
        RuleKind.AtLeast => $">= {Min.ToString(System.Globalization.CultureInfo.InvariantCulture)}",
        RuleKind.PositiveAtMost => $"> 0, at most {Max.ToString(System.Globalization.CultureInfo.InvariantCulture)}",
        RuleKind.NonNegativeAtMost => $">= 0, at most {Max.ToString(System.Globalization.CultureInfo.InvariantCulture)}",
        _ => "any",
    };
}

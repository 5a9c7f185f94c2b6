namespace RotorDrive.Files.Catalogs;

/// <summary>The kinds of range test a <see cref="ValueRule"/> applies.</summary>
public enum RuleKind
{
    /// <summary>Any finite value.</summary>
    Any,

    /// <summary>Strictly greater than zero.</summary>
    Positive,

    /// <summary>Zero or more.</summary>
    NonNegative,

    /// <summary>Within an inclusive range.</summary>
    Between,

    /// <summary>A whole number of at least a minimum.</summary>
    AtLeast,

    /// <summary>Greater than 0 and at most <see cref="ValueRule.Max"/> (a physical upper bound for a part of a levitation
    /// rig; beyond it the number is a typo, and the analyses would overflow).</summary>
    PositiveAtMost,

    /// <summary>Zero or more and at most <see cref="ValueRule.Max"/> (a physical upper bound).</summary>
    NonNegativeAtMost,
}

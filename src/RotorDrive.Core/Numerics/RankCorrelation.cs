using MathNet.Numerics.Statistics;

namespace RotorDrive.Core.Numerics;

/// <summary>Spearman's rank correlation between a sampled input (a tolerance draw) and an output (a margin).</summary>
/// <remarks>C. Spearman, "The proof and measurement of association between two things", Am. J. Psychol. 15, 72-101,
/// 1904: the Pearson correlation of the ranks. Tied values get the mean of the ranks they span (mid-ranks; M. G. Kendall
/// and J. D. Gibbons, "Rank Correlation Methods", 5th ed., 1990, ch. 3), as MathNet's Correlation.Spearman ranks them;
/// with ties the textbook shortcut 1 - 6 sum d^2 / (n (n^2 - 1)) no longer applies and is not used. The ranks come from
/// MathNet's Statistics.Ranks (average definition) and their correlation from MathNet's Pearson, so that a series ranked
/// once (<see cref="MidRanks"/>) can be paired with many others (<see cref="OfRanks"/>).</remarks>
public static class RankCorrelation
{
    /// <summary>Spearman's rho of paired values, -1..1, or null when it is undefined: fewer than three pairs, or one
    /// series constant (for example a quantity with zero tolerance).</summary>
    /// <param name="x">First series (finite values).</param>
    /// <param name="y">Second series, same length.</param>
    /// <exception cref="ArgumentException">Lengths differ or a value is not finite.</exception>
    public static double? Spearman(IReadOnlyList<double> x, IReadOnlyList<double> y)
    {
        Preconditions.NotNull(x, nameof(x));
        Preconditions.NotNull(y, nameof(y));
        if (x.Count != y.Count)
        {
            throw new ArgumentException($"series lengths differ: {x.Count} and {y.Count}.", nameof(y));
        }
        for (int i = 0; i < x.Count; i++)
        {
            if (!double.IsFinite(x[i]) || !double.IsFinite(y[i]))
            {
                throw new ArgumentException($"pair {i} ({x[i]}, {y[i]}) is not finite.", nameof(x));
            }
        }
        return OfRanks(MidRanks(x), MidRanks(y));
    }

    /// <summary>The mid-ranks of finite values (1 for the smallest; tied values share the mean of the ranks they span).</summary>
    /// <remarks>A study that correlates one series with many others ranks each series once and pairs the ranks with
    /// <see cref="OfRanks"/>: a stress run's drivers pair every varied input with every criterion's margins.</remarks>
    /// <param name="values">The values.</param>
    /// <exception cref="ArgumentException">A value is not finite.</exception>
    public static double[] MidRanks(IReadOnlyList<double> values)
    {
        Preconditions.NotNull(values, nameof(values));
        for (int i = 0; i < values.Count; i++)
        {
            if (!double.IsFinite(values[i]))
            {
                throw new ArgumentException($"value {i} ({values[i]}) is not finite.", nameof(values));
            }
        }
        return Statistics.Ranks(values, RankDefinition.Average);
    }

    /// <summary>Spearman's rho from the mid-ranks of two paired series (<see cref="MidRanks"/>): the Pearson correlation of
    /// the ranks, or null when fewer than three pairs or one series is constant (all its ranks equal).</summary>
    /// <param name="xRanks">Ranks of the first series.</param>
    /// <param name="yRanks">Ranks of the second series, same length.</param>
    /// <exception cref="ArgumentException">Lengths differ.</exception>
    public static double? OfRanks(IReadOnlyList<double> xRanks, IReadOnlyList<double> yRanks)
    {
        Preconditions.NotNull(xRanks, nameof(xRanks));
        Preconditions.NotNull(yRanks, nameof(yRanks));
        if (xRanks.Count != yRanks.Count)
        {
            throw new ArgumentException($"series lengths differ: {xRanks.Count} and {yRanks.Count}.", nameof(yRanks));
        }
        if (xRanks.Count < 3 || IsConstant(xRanks) || IsConstant(yRanks))
        {
            return null;
        }
        double rho = Correlation.Pearson(xRanks, yRanks);
        return double.IsFinite(rho) ? Math.Clamp(rho, -1.0, 1.0) : null;
    }

    private static bool IsConstant(IReadOnlyList<double> values)
    {
        for (int i = 1; i < values.Count; i++)
        {
            if (values[i] != values[0])
            {
                return false;
            }
        }
        return true;
    }
}

using MathNet.Numerics.Statistics;

namespace RotorDrive.Core.Numerics;

/// <summary>Spearman's rank correlation between a sampled input (a tolerance draw) and an output (a margin).</summary>
/// <remarks>C. Spearman, "The proof and measurement of association between two things", Am. J. Psychol. 15, 72-101,
/// 1904: the Pearson correlation of the ranks. Tied values get the mean of the ranks they span (mid-ranks; M. G. Kendall
/// and J. D. Gibbons, "Rank Correlation Methods", 5th ed., 1990, ch. 3), which is what MathNet's Correlation.Spearman
/// computes; with ties the textbook shortcut 1 - 6 sum d^2 / (n (n^2 - 1)) no longer applies and is not used.</remarks>
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
        if (x.Count < 3 || IsConstant(x) || IsConstant(y))
        {
            return null;
        }
        double rho = Correlation.Spearman(x, y);
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

using MathNet.Numerics.Statistics;

namespace RotorDrive.Core.Numerics;

/// <summary>Sample percentiles by linear interpolation between order statistics.</summary>
/// <remarks>Definition 7 of R. J. Hyndman and Y. Fan, "Sample quantiles in statistical packages", The American
/// Statistician 50(4), 361-365, 1996: for ascending values x_1..x_n and fraction p, h = (n - 1) p and
/// Q(p) = x_(floor h + 1) + (h - floor h) (x_(floor h + 2) - x_(floor h + 1)). It is the default of R and NumPy and
/// matches spreadsheet PERCENTILE.INC, so users can reproduce the figures. MathNet's Statistics.Percentile and
/// Statistics.Quantile use definition 8 instead (approximately median-unbiased); both agree on the median and differ
/// slightly in the tails for small samples. Computed by MathNet's SortedArrayStatistics.QuantileCustom with
/// QuantileDefinition.R7; this class adds the argument checks and the summary.</remarks>
public static class Percentiles
{
    /// <summary>The <paramref name="percent"/>-th percentile of values already sorted ascending.</summary>
    /// <param name="sortedAscending">Finite values in ascending order, at least one.</param>
    /// <param name="percent">Percentile, 0 to 100.</param>
    /// <exception cref="ArgumentException">No values, or a value is not finite, or the values are not sorted.</exception>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="percent"/> is outside [0, 100].</exception>
    public static double OfSorted(ReadOnlySpan<double> sortedAscending, double percent)
    {
        Preconditions.InRange(percent, 0, 100, nameof(percent));
        CheckSorted(sortedAscending);
        return SortedArrayStatistics.QuantileCustom(sortedAscending.ToArray(), percent / 100.0, QuantileDefinition.R7);
    }

    /// <summary>The <paramref name="percent"/>-th percentile of values in any order (sorts a copy).</summary>
    /// <param name="values">Finite values, at least one.</param>
    /// <param name="percent">Percentile, 0 to 100.</param>
    /// <exception cref="ArgumentException">No values, or a value is not finite.</exception>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="percent"/> is outside [0, 100].</exception>
    public static double Of(IEnumerable<double> values, double percent)
    {
        Preconditions.InRange(percent, 0, 100, nameof(percent));
        var sorted = SortedCopy(values);
        return Interpolate(sorted, percent);
    }

    /// <summary>Count, mean, extremes and the 5th, 50th and 95th percentiles of a set of values.</summary>
    /// <param name="values">Finite values, at least one.</param>
    /// <exception cref="ArgumentException">No values, or a value is not finite.</exception>
    public static PercentileSummary Summarize(IEnumerable<double> values)
    {
        var sorted = SortedCopy(values);
        double sum = 0;
        foreach (double v in sorted)
        {
            sum += v;
        }
        return new PercentileSummary(
            sorted.Length,
            sorted[0],
            Interpolate(sorted, 5),
            Interpolate(sorted, 50),
            Interpolate(sorted, 95),
            sorted[^1],
            sum / sorted.Length);
    }

    private static double[] SortedCopy(IEnumerable<double> values)
    {
        var array = Preconditions.NotNull(values, nameof(values)).ToArray();
        CheckFinite(array);
        Array.Sort(array);
        return array;
    }

    private static double Interpolate(double[] sorted, double percent)
        => SortedArrayStatistics.QuantileCustom(sorted, percent / 100.0, QuantileDefinition.R7);

    private static void CheckFinite(ReadOnlySpan<double> values)
    {
        if (values.Length == 0)
        {
            throw new ArgumentException("percentiles need at least one value.", nameof(values));
        }
        for (int i = 0; i < values.Length; i++)
        {
            if (!double.IsFinite(values[i]))
            {
                throw new ArgumentException($"value {i} is {values[i]}; percentiles need finite values.", nameof(values));
            }
        }
    }

    private static void CheckSorted(ReadOnlySpan<double> values)
    {
        CheckFinite(values);
        for (int i = 1; i < values.Length; i++)
        {
            if (values[i] < values[i - 1])
            {
                throw new ArgumentException($"values must be sorted ascending; value {i} ({values[i]}) is below value {i - 1} ({values[i - 1]}).", nameof(values));
            }
        }
    }
}

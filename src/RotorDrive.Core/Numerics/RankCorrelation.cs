namespace RotorDrive.Core.Numerics;

/// <summary>Spearman's rank correlation between a sampled input (a tolerance draw) and an output (a margin).</summary>
/// <remarks>C. Spearman, "The proof and measurement of association between two things", Am. J. Psychol. 15, 72-101,
/// 1904: the Pearson correlation of the ranks. Tied values get the mean of the ranks they span (mid-ranks; M. G. Kendall
/// and J. D. Gibbons, "Rank Correlation Methods", 5th ed., 1990, ch. 3), as MathNet's Correlation.Spearman ranks them;
/// with ties the textbook shortcut 1 - 6 sum d^2 / (n (n^2 - 1)) no longer applies and is not used. The mid-ranks and
/// their Pearson correlation are computed here, each checked in the tests against MathNet.Numerics (Statistics.Ranks with
/// the average definition, Correlation.Spearman), so that a series ranked once (<see cref="MidRanks"/>) can be paired
/// with many others (<see cref="OfRanks"/>) without the generic overheads that made a stress run's F8 wait.</remarks>
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
    public static double[] MidRanks(IReadOnlyList<double> values) => SortOrder(values).MidRanks(null, values.Count);

    /// <summary>Sorts finite values once, keeping where each came from, so that the mid-ranks of the whole series and of
    /// any part of it follow without sorting again (<see cref="Ranking.MidRanks"/>).</summary>
    /// <param name="values">The values.</param>
    /// <exception cref="ArgumentException">A value is not finite.</exception>
    public static Ranking SortOrder(IReadOnlyList<double> values)
    {
        Preconditions.NotNull(values, nameof(values));
        int n = values.Count;
        var keys = new double[n];
        var order = new int[n];
        for (int i = 0; i < n; i++)
        {
            if (!double.IsFinite(values[i]))
            {
                throw new ArgumentException($"value {i} ({values[i]}) is not finite.", nameof(values));
            }
            keys[i] = values[i];
            order[i] = i;
        }
        // Array.Sort is several times faster than MathNet's Statistics.Ranks on a stress run's tens of thousands of
        // samples, and the ranks are the same (checked in the tests).
        Array.Sort(keys, order);
        return new Ranking(keys, order);
    }

    /// <summary>A series sorted once: its values in ascending order and, for each, its position in the series.</summary>
    /// <param name="Sorted">The values, ascending.</param>
    /// <param name="Order">The series position of each sorted value.</param>
    public sealed record Ranking(double[] Sorted, int[] Order)
    {
        /// <summary>The mid-ranks that a part of the series would get if it were ranked alone: values at series positions
        /// with <paramref name="place"/>[position] &gt;= 0 take part, and each one's rank is written at that place; null
        /// takes the whole series, in series order. Ties share the mean of the ranks they span.</summary>
        /// <param name="place">For each series position, the place of its rank in the result, or -1 to leave it out; null
        /// for every position in order.</param>
        /// <param name="count">How many positions take part (the result's length).</param>
        public double[] MidRanks(int[]? place, int count)
        {
            var ranks = new double[count];
            int n = Sorted.Length, ranked = 0;
            for (int k = 0; k < n;)
            {
                // The run of equal values from k, and how many of them take part: they span ranks ranked+1..ranked+members.
                int j = k, members = 0;
                for (; j < n && Sorted[j] == Sorted[k]; j++)
                {
                    if (place is null || place[Order[j]] >= 0)
                    {
                        members++;
                    }
                }
                double rank = ranked + (members + 1) / 2.0;
                for (int m = k; m < j; m++)
                {
                    int at = place is null ? Order[m] : place[Order[m]];
                    if (at >= 0)
                    {
                        ranks[at] = rank;
                    }
                }
                ranked += members;
                k = j;
            }
            return ranks;
        }
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
        // Pearson's r of the ranks, two passes (means, then centred sums).
        int n = xRanks.Count;
        double mx = 0, my = 0;
        for (int i = 0; i < n; i++)
        {
            mx += xRanks[i];
            my += yRanks[i];
        }
        mx /= n;
        my /= n;
        double sxy = 0, sxx = 0, syy = 0;
        for (int i = 0; i < n; i++)
        {
            double dx = xRanks[i] - mx, dy = yRanks[i] - my;
            sxy += dx * dy;
            sxx += dx * dx;
            syy += dy * dy;
        }
        double rho = sxy / Math.Sqrt(sxx * syy);
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

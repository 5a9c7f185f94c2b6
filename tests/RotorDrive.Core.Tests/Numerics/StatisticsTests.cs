using MathNet.Numerics.Distributions;
using MathNet.Numerics.RootFinding;
using MathNet.Numerics.Statistics;
using RotorDrive.Core.Numerics;
using RotorDrive.Core.Studies;
using RotorDrive.Core.Tests.Simulation;
using RotorDrive.Core.Tests.Support;
using Xunit;

namespace RotorDrive.Core.Tests.Numerics;

public class StatisticsTests
{
    [Theory]
    // R. G. Newcombe, Statistics in Medicine 17, 857-872, 1998, worked examples, method 3 (Wilson score interval
    // without continuity correction), 95 %: values quoted from memory; each also agrees to 4 decimals with an
    // independent evaluation of Wilson's formula (and the root-finding check below).
    [InlineData(81, 263, 0.2553, 0.3662)]
    [InlineData(15, 148, 0.0624, 0.1605)]
    [InlineData(0, 20, 0.0000, 0.1611)]
    [InlineData(1, 29, 0.0061, 0.1718)]
    public void Wilson_MatchesNewcombesWorkedValues(int count, int trials, double lower, double upper)
    {
        var interval = WilsonInterval.Compute(count, trials);
        Assert.Equal(lower, interval.LowerFraction, 4);
        Assert.Equal(upper, interval.UpperFraction, 4);
        Assert.Equal((double)count / trials, interval.EstimateFraction, 15);
    }

    [Theory]
    [InlineData(0, 10)]
    [InlineData(3, 10)]
    [InlineData(81, 263)]
    [InlineData(500, 2000)]
    [InlineData(1999, 2000)]
    public void Wilson_LimitsAreTheRootsOfTheScoreEquation(int count, int trials)
    {
        // Wilson 1927 defines the limits as the p where (p_hat - p)^2 = z^2 p (1 - p) / n; find them independently with
        // MathNet's Brent solver on each side of p_hat (p_hat itself excluded: it is a root when x = 0 or x = n) and
        // compare with the closed form.
        double z = Normal.InvCDF(0, 1, 0.975);
        double pHat = (double)count / trials;
        double Score(double p) => (pHat - p) * (pHat - p) - z * z * p * (1 - p) / trials;
        var interval = WilsonInterval.Compute(count, trials);
        if (count > 0)
        {
            RelAssert.Close(Brent.FindRoot(Score, 0, pHat - 1e-9, 1e-14, 200), interval.LowerFraction, 1e-9, 1e-12, "lower");
        }
        if (count < trials)
        {
            RelAssert.Close(Brent.FindRoot(Score, pHat + 1e-9, 1, 1e-14, 200), interval.UpperFraction, 1e-9, 1e-12, "upper");
        }
    }

    [FsCheck.Xunit.Property(MaxTest = 200)]
    public bool Wilson_IsInsideZeroOneAroundTheEstimate_AndMirrorsUnderComplement(ushort trialsCode, ushort countCode)
    {
        // Properties of the score interval (Newcombe 1998): limits within [0, 1], containing p_hat, and the interval for
        // n - x failures is the mirror image of that for x.
        int trials = 1 + trialsCode % 5000;
        int count = countCode % (trials + 1);
        var a = WilsonInterval.Compute(count, trials);
        var b = WilsonInterval.Compute(trials - count, trials);
        return a.LowerFraction >= 0 && a.UpperFraction <= 1 && a.LowerFraction <= a.EstimateFraction && a.EstimateFraction <= a.UpperFraction
            && Math.Abs(a.LowerFraction - (1 - b.UpperFraction)) < 1e-12 && Math.Abs(a.UpperFraction - (1 - b.LowerFraction)) < 1e-12;
    }

    [Fact]
    public void Wilson_RejectsImpossibleCounts()
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => WilsonInterval.Compute(0, 0));
        Assert.Throws<ArgumentOutOfRangeException>(() => WilsonInterval.Compute(5, 4));
        Assert.Throws<ArgumentOutOfRangeException>(() => WilsonInterval.Compute(1, 4, 1.0));
    }

    [Fact]
    public void Percentile_InterpolatesBetweenOrderStatistics()
    {
        // Hyndman & Fan 1996 definition 7 by hand on {15, 20, 35, 40, 50}: P40 has h = 4 x 0.4 = 1.6, so
        // 20 + 0.6 x (35 - 20) = 29 (the same value as spreadsheet PERCENTILE.INC; the example is a common textbook
        // one, quoted from memory). P0 and P100 are the extremes, P50 the median 35.
        double[] data = [15, 20, 35, 40, 50];
        Assert.Equal(29.0, Percentiles.OfSorted(data, 40), 12);
        Assert.Equal(15.0, Percentiles.OfSorted(data, 0), 12);
        Assert.Equal(35.0, Percentiles.OfSorted(data, 50), 12);
        Assert.Equal(50.0, Percentiles.OfSorted(data, 100), 12);
        Assert.Equal(29.0, Percentiles.Of([50, 15, 40, 20, 35], 40), 12);

        // MathNet's default Percentile uses definition 8: h = (n + 1/3) p + 1/3 = 2.4667 (1-based), so
        // 20 + 0.4667 x 15 = 27. The two definitions differ on small samples; ours is stated in the docs.
        Assert.Equal(27.0, Statistics.Percentile(data, 40), 10);
    }

    [FsCheck.Xunit.Property(MaxTest = 200)]
    public bool Percentile_FollowsHyndmanFanDefinition7(int[] raw, byte percentCode)
    {
        if (raw is null || raw.Length == 0)
        {
            return true;
        }
        var sorted = raw.Select(v => v / 7.0).OrderBy(v => v).ToArray();
        double percent = percentCode * 100.0 / 255.0;
        double ours = Percentiles.OfSorted(sorted, percent);
        // Hyndman & Fan (1996), definition 7, written out: h = (n - 1) p, Q = x[floor h] + (h - floor h) (x[floor h + 1] - x[floor h])
        // (0-based); Percentiles delegates to MathNet, so this is the independent check of the definition it asks for.
        double h = (sorted.Length - 1) * percent / 100.0;
        int lo = (int)Math.Floor(h);
        double expected = lo >= sorted.Length - 1 ? sorted[^1] : sorted[lo] + (h - lo) * (sorted[lo + 1] - sorted[lo]);
        // Rounding of the interpolation scales with the data's magnitude, not the result's.
        return Math.Abs(ours - expected) <= 1e-12 * Math.Max(1, sorted.Max(Math.Abs));
    }

    [Fact]
    public void Summary_HoldsCountMeanExtremesAndPercentiles()
    {
        var summary = Percentiles.Summarize(Enumerable.Range(1, 101).Select(i => (double)i));
        // For 1..101, definition 7 gives P5 = 1 + 0.05 x 100 = 6, P50 = 51, P95 = 96; mean 51 (arithmetic series).
        Assert.Equal(new PercentileSummary(101, 1, 6, 51, 96, 101, 51), summary);
        Assert.Throws<ArgumentException>(() => Percentiles.Summarize([1.0, double.NaN]));
        Assert.Throws<ArgumentException>(() => Percentiles.Summarize([]));
        Assert.Throws<ArgumentException>(() => Percentiles.OfSorted([2.0, 1.0], 50));
    }

    [Fact]
    public void Spearman_UsesMidRanksForTies()
    {
        // Hand computation: x = {10, 20, 20, 30, 40} has mid-ranks {1, 2.5, 2.5, 4, 5}; y = {1, 3, 2, 5, 4} ranks
        // {1, 3, 2, 5, 4}. Deviations from the mean rank 3: dx = {-2, -.5, -.5, 1, 2}, dy = {-2, 0, -1, 2, 1};
        // sum dx dy = 8.5, sum dx^2 = 9.5, sum dy^2 = 10, rho = 8.5 / sqrt(95) = 0.8720816 (Pearson of ranks, Spearman
        // 1904; mid-ranks for ties, Kendall & Gibbons 1990). The no-ties shortcut would give 0.875 instead.
        double? rho = RankCorrelation.Spearman([10, 20, 20, 30, 40], [1, 3, 2, 5, 4]);
        Assert.NotNull(rho);
        RelAssert.Close(8.5 / Math.Sqrt(95), rho.Value, 1e-12);
    }

    [FsCheck.Xunit.Property(MaxTest = 100)]
    public bool Spearman_WithoutTies_EqualsTheTextbookFormula(int seed)
    {
        // For distinct values rho = 1 - 6 sum d^2 / (n (n^2 - 1)), d the rank differences (Spearman 1904).
        var random = new Random(seed);
        int n = 3 + random.Next(40);
        var x = Enumerable.Range(0, n).Select(i => i + random.NextDouble() * 0.5).OrderBy(_ => random.Next()).ToArray();
        var y = Enumerable.Range(0, n).Select(i => i + random.NextDouble() * 0.5).OrderBy(_ => random.Next()).ToArray();
        var rankX = x.Select(v => x.Count(w => w < v) + 1.0).ToArray();
        var rankY = y.Select(v => y.Count(w => w < v) + 1.0).ToArray();
        double sumD2 = rankX.Zip(rankY, (a, b) => (a - b) * (a - b)).Sum();
        double expected = 1 - 6 * sumD2 / (n * ((double)n * n - 1));
        return Math.Abs(RankCorrelation.Spearman(x, y)!.Value - expected) < 1e-12;
    }

    [FsCheck.Xunit.Property(MaxTest = 100)]
    public bool Spearman_WithTies_EqualsMathNetsSpearman_AndRankingOnceGivesTheSame(int seed)
    {
        // Reference library: MathNet.Numerics' Correlation.Spearman (mid-ranks, Pearson of the ranks) and Statistics.Ranks
        // (average definition, for the mid-ranks). Values drawn from a
        // few levels so that ties are common. Ranking each series once (MidRanks) and pairing the ranks (OfRanks) is the
        // path the stress study's drivers take.
        var random = new Random(seed);
        int n = 3 + random.Next(60);
        var x = Enumerable.Range(0, n).Select(_ => (double)random.Next(6)).ToArray();
        var y = Enumerable.Range(0, n).Select(_ => random.Next(5) + 0.5 * x[0]).ToArray();
        double? rho = RankCorrelation.Spearman(x, y);
        double? ranked = RankCorrelation.OfRanks(RankCorrelation.MidRanks(x), RankCorrelation.MidRanks(y));
        // The mid-ranks themselves against MathNet's Statistics.Ranks with the average definition.
        var referenceRanks = MathNet.Numerics.Statistics.Statistics.Ranks(x, MathNet.Numerics.Statistics.RankDefinition.Average);
        if (!RankCorrelation.MidRanks(x).SequenceEqual(referenceRanks))
        {
            return false;
        }
        if (x.Distinct().Count() == 1 || y.Distinct().Count() == 1)
        {
            return rho is null && ranked is null;
        }
        double reference = MathNet.Numerics.Statistics.Correlation.Spearman(x, y);
        return rho is { } r && ranked == r && Math.Abs(r - reference) < 1e-12;
    }

    [FsCheck.Xunit.Property(MaxTest = 100)]
    public bool MidRanksOfAPart_FromTheWholeSeriesSortOrder_EqualRankingThePartAlone(int seed)
    {
        // The stress drivers sort each input once over all samples and take the ranks of the samples where a criterion was
        // assessed from that order; they must be the ranks of those samples ranked alone (mid-ranks for ties).
        var random = new Random(seed);
        int n = 1 + random.Next(80);
        var values = Enumerable.Range(0, n).Select(_ => (double)random.Next(8)).ToArray();
        var place = new int[n];
        var part = new List<double>();
        for (int i = 0; i < n; i++)
        {
            place[i] = random.Next(3) == 0 ? -1 : part.Count;
            if (place[i] >= 0)
            {
                part.Add(values[i]);
            }
        }
        var fromOrder = RankCorrelation.SortOrder(values).MidRanks(place, part.Count);
        return fromOrder.SequenceEqual(RankCorrelation.MidRanks(part))
            && RankCorrelation.SortOrder(values).MidRanks(null, n).SequenceEqual(MathNet.Numerics.Statistics.Statistics.Ranks(values, MathNet.Numerics.Statistics.RankDefinition.Average));
    }

    [Fact]
    public void Spearman_IsUndefined_ForAConstantSeriesOrTooFewPairs()
    {
        Assert.Null(RankCorrelation.Spearman([1, 1, 1, 1], [1, 2, 3, 4]));
        Assert.Null(RankCorrelation.Spearman([1, 2], [2, 1]));
        Assert.Equal(-1.0, RankCorrelation.Spearman([1, 2, 3, 4], [9, 7, 5, 1])!.Value, 12);
        Assert.Throws<ArgumentException>(() => RankCorrelation.Spearman([1, 2, 3], [1, 2]));
        Assert.Throws<ArgumentException>(() => RankCorrelation.Spearman([1, 2, double.NaN], [1, 2, 3]));
    }
}

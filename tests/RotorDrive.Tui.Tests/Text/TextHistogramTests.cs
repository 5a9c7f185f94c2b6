using MathNet.Numerics.Random;
using MathNet.Numerics.Statistics;
using RotorDrive.Tui.Text;
using Xunit;

namespace RotorDrive.Tui.Tests.Text;

public class TextHistogramTests
{
    [Theory]
    // H. A. Sturges, "The choice of a class interval", J. Am. Stat. Assoc. 21, 1926: k = 1 + log2 n, rounded up.
    [InlineData(1, 1)]
    [InlineData(2, 2)]
    [InlineData(100, 8)]
    [InlineData(2000, 12)]
    [InlineData(10_000_000, 20)] // 1 + 23.3 -> 25, held at the 20-bin cap
    public void SturgesBins_FollowsSturgesRule(int count, int bins)
        => Assert.Equal(bins, TextHistogram.SturgesBins(count));

    [Fact]
    public void Bins_CountLikeMathNetsHistogram_OverTheSameEdges()
    {
        // Reference: MathNet.Numerics.Statistics.Histogram with the same lower and upper bounds and bucket count. With
        // continuous draws no value sits on an inner edge, so the two must agree bucket by bucket (both count the smallest
        // and largest value in the outer buckets).
        var random = new Xoshiro256StarStar(7);
        var values = Enumerable.Range(0, 500).Select(_ => random.NextDouble() * 3 + 10).ToArray();
        var bins = TextHistogram.Bins(values, 9);
        var reference = new Histogram(values, 9, values.Min(), values.Max());
        Assert.Equal(9, bins.Count);
        Assert.Equal(values.Length, bins.Sum(b => b.Count));
        for (int i = 0; i < 9; i++)
        {
            Assert.Equal(reference[i].LowerBound, bins[i].Low, 12);
            Assert.Equal(reference[i].UpperBound, bins[i].High, 12);
            Assert.Equal((int)reference[i].Count, bins[i].Count);
        }
    }

    [Fact]
    public void Bins_LeaveOutNonFiniteValues_AndPutEqualValuesInOneBin()
    {
        Assert.Empty(TextHistogram.Bins([double.NaN]));
        var one = Assert.Single(TextHistogram.Bins([4.0, 4.0, double.PositiveInfinity, 4.0]));
        Assert.Equal(new HistogramBin(4, 4, 3), one);
    }

    [Fact]
    public void Render_ScalesBarsToTheFullestBin_AndMarksEveryBinWithValues()
    {
        var lines = TextHistogram.Render([new HistogramBin(0, 1, 40), new HistogramBin(1, 2, 1), new HistogramBin(2, 3, 0)], 60, 1);
        Assert.Equal(3, lines.Count);
        Assert.All(lines, l => Assert.True(l.Length <= 60, l));
        int Bar(string l) => l.Count(c => c == '#');
        Assert.Equal(1, Bar(lines[1]));
        Assert.Equal(0, Bar(lines[2]));
        Assert.True(Bar(lines[0]) >= 30);
        Assert.StartsWith("  0.0 - 1.0 |", lines[0]);
        Assert.EndsWith(" 40", lines[0]);
    }
}

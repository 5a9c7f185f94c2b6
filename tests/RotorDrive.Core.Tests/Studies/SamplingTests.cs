using MathNet.Numerics.Distributions;
using MathNet.Numerics.Statistics;
using RotorDrive.Core.Numerics;
using RotorDrive.Core.Studies;
using RotorDrive.Core.Tests.Simulation;
using RotorDrive.Core.Tests.Support;
using Xunit;

namespace RotorDrive.Core.Tests.Studies;

public class SamplingTests
{
    private static double[] Draws(Random random, int count) => Enumerable.Range(0, count).Select(_ => random.NextDouble()).ToArray();

    [Fact]
    public async Task SampleStream_IsReproducible_FromSeedAndIndexAlone()
    {
        // Drawing sample 7 first, or after samples 0..6, or on another thread, gives the same numbers.
        var direct = Draws(SampleStreams.ForSample(1, 7), 20);
        for (int k = 0; k < 7; k++)
        {
            Draws(SampleStreams.ForSample(1, k), 20);
        }
        var later = Draws(SampleStreams.ForSample(1, 7), 20);
        var onThread = await Task.Run(() => Draws(SampleStreams.ForSample(1, 7), 20)).WaitAsync(TimeSpan.FromSeconds(30));
        Assert.Equal(direct, later);
        Assert.Equal(direct, onThread);
        Assert.NotEqual(direct, Draws(SampleStreams.ForSample(1, 8), 20));
        Assert.NotEqual(direct, Draws(SampleStreams.ForSample(2, 7), 20));
    }

    [Fact]
    public void StreamSeeds_AreDistinct_ForEverySampleOfOneStudy()
    {
        // The finaliser is a bijection of 32-bit words (Appleby 2011), so no two samples of one seed share a stream.
        foreach (int seed in new[] { 0, 1, -1, 20260101 })
        {
            var seen = new HashSet<int>();
            for (int k = 0; k < 100_000; k++)
            {
                Assert.True(seen.Add(SampleStreams.StreamSeed(seed, k)), $"seed {seed}: sample {k} repeats a stream seed");
            }
        }
    }

    [Theory]
    [InlineData(1, 0)]
    [InlineData(1, 1999)]
    [InlineData(42, 123456)]
    public void NeighbouringStreams_AreUncorrelated(int seed, int k)
    {
        // Under independence the sample correlation of N pairs has standard error about 1/sqrt(N) (R. A. Fisher,
        // Biometrika 10, 1915; normal approximation); 4 standard errors bounds it with near certainty.
        const int n = 20_000;
        var a = Draws(SampleStreams.ForSample(seed, k), n);
        var b = Draws(SampleStreams.ForSample(seed, k + 1), n);
        Assert.InRange(Correlation.Pearson(a, b), -4 / Math.Sqrt(n), 4 / Math.Sqrt(n));
    }

    [Fact]
    public void FirstDrawsAcrossSamples_AreUniformAndUncorrelated()
    {
        // A sample uses only the first few draws of its stream, so the first draw of streams 0..N-1 must itself look
        // like an independent uniform sequence: mean 1/2 (standard error sqrt(1/12 / N), central limit theorem),
        // lag-1 correlation within 4 / sqrt(N).
        const int n = 20_000;
        var first = Enumerable.Range(0, n).Select(k => SampleStreams.ForSample(1, k).NextDouble()).ToArray();
        Assert.InRange(first.Average(), 0.5 - 4 * Math.Sqrt(1.0 / 12 / n), 0.5 + 4 * Math.Sqrt(1.0 / 12 / n));
        Assert.InRange(Correlation.Pearson(first[..^1], first[1..]), -4 / Math.Sqrt(n), 4 / Math.Sqrt(n));
    }

    [Fact]
    public void NormalTolerance_HasTheNominalMeanAndTheGivenSpread_WithinSamplingError()
    {
        // Central limit theorem: the sample mean of N draws has standard error sigma / sqrt(N); for a normal population
        // the sample standard deviation has standard error about sigma / sqrt(2 (N - 1)) (e.g. A. Stuart & J. K. Ord,
        // "Kendall's Advanced Theory of Statistics", vol. 1, 10.8). Allow 4 standard errors.
        const int n = 20_000;
        const double nominal = 40.0, sigma = 0.08 * nominal;
        var tolerance = Tolerance.Normal(8, ToleranceScale.Percent, keepPositive: true);
        var values = Enumerable.Range(0, n).Select(k => tolerance.Apply(nominal, SampleStreams.ForSample(3, k))).ToArray();
        Assert.InRange(values.Mean(), nominal - 4 * sigma / Math.Sqrt(n), nominal + 4 * sigma / Math.Sqrt(n));
        double seSigma = sigma / Math.Sqrt(2.0 * (n - 1));
        Assert.InRange(values.StandardDeviation(), sigma - 4 * seSigma, sigma + 4 * seSigma);
    }

    [Fact]
    public void UniformTolerance_StaysInItsBounds_WithMeanAndVarianceOfTheUniform()
    {
        // A uniform on [a, b] has mean (a + b)/2 and variance (b - a)^2 / 12; standard error of the mean
        // sqrt(variance / N) (central limit theorem).
        const int n = 20_000;
        const double nominal = 0.010;
        var tolerance = Tolerance.Uniform(-0.0015, 0.0005, ToleranceScale.Absolute, keepPositive: true);
        var values = Enumerable.Range(0, n).Select(k => tolerance.Apply(nominal, SampleStreams.ForSample(4, k))).ToArray();
        Assert.All(values, v => Assert.InRange(v, 0.0085, 0.0105));
        double mean = 0.0095, variance = 0.002 * 0.002 / 12;
        Assert.InRange(values.Mean(), mean - 4 * Math.Sqrt(variance / n), mean + 4 * Math.Sqrt(variance / n));
        RelAssert.Close(variance, values.Variance(), 0.05, what: "variance (about 2 % standard error at N = 20000)");
    }

    [Fact]
    public void TruncatedNormal_StaysPositive_WithTheTruncatedMean()
    {
        // A normal N(mu, sigma^2) conditioned on X > 0 has mean mu + sigma phi(a) / (1 - Phi(a)), a = -mu / sigma
        // (Johnson, Kotz & Balakrishnan 1994, 10.1). For sigma = mu: mu (1 + phi(1) / Phi(1)) = 1.2876 mu.
        const int n = 20_000;
        const double nominal = 2.0;
        var tolerance = Tolerance.Normal(100, ToleranceScale.Percent, keepPositive: true);
        var values = Enumerable.Range(0, n).Select(k => tolerance.Apply(nominal, SampleStreams.ForSample(5, k))).ToArray();
        Assert.All(values, v => Assert.True(v > 0));
        double expectedMean = nominal * (1 + Normal.PDF(0, 1, 1) / Normal.CDF(0, 1, 1));
        RelAssert.Close(expectedMean, values.Mean(), 4 * nominal * 0.75 / Math.Sqrt(n) / expectedMean, what: "truncated mean");
    }

    [Fact]
    public void TruncatedUniform_CutsOffTheNonPositivePart()
    {
        // -150 % .. +50 % of nominal on a positive quantity leaves the uniform on (0, 1.5 nominal): mean 0.75 nominal.
        const int n = 20_000;
        var tolerance = Tolerance.Uniform(-150, 50, ToleranceScale.Percent, keepPositive: true);
        var values = Enumerable.Range(0, n).Select(k => tolerance.Apply(4.0, SampleStreams.ForSample(6, k))).ToArray();
        Assert.All(values, v => Assert.InRange(v, double.Epsilon, 6.0));
        double se = Math.Sqrt(6.0 * 6.0 / 12 / n);
        Assert.InRange(values.Mean(), 3.0 - 4 * se, 3.0 + 4 * se);
        Assert.Throws<ArgumentOutOfRangeException>(() => Tolerance.Uniform(-300, -100, ToleranceScale.Percent, true).Apply(4.0, new Random(1)));
    }

    [Fact]
    public void PercentAndAbsoluteSpreads_GiveTheSameDraws_WhenTheyMeanTheSame()
    {
        var percent = Tolerance.Normal(5, ToleranceScale.Percent, keepPositive: false);
        var absolute = Tolerance.Normal(10, ToleranceScale.Absolute, keepPositive: false);
        for (int k = 0; k < 100; k++)
        {
            Assert.Equal(percent.Apply(200, SampleStreams.ForSample(9, k)), absolute.Apply(200, SampleStreams.ForSample(9, k)), 12);
        }
    }

    [Fact]
    public void EveryApply_ConsumesExactlyOneDraw_WhateverTheShape()
    {
        // So changing one quantity's tolerance never shifts the draws of the next quantities.
        var shapes = new[]
        {
            Tolerance.None,
            Tolerance.Normal(0, ToleranceScale.Percent, true),
            Tolerance.Normal(50, ToleranceScale.Percent, true),
            Tolerance.Uniform(-200, 10, ToleranceScale.Percent, true),
            Tolerance.Uniform(-1, 1, ToleranceScale.Absolute, false),
        };
        var reference = SampleStreams.ForSample(11, 0);
        reference.NextDouble();
        double next = reference.NextDouble();
        foreach (var shape in shapes)
        {
            var stream = SampleStreams.ForSample(11, 0);
            shape.Apply(3.0, stream);
            Assert.Equal(next, stream.NextDouble());
        }
    }

    [Fact]
    public void ZeroTolerances_ReturnTheNominalExactly()
    {
        var random = SampleStreams.ForSample(1, 0);
        Assert.Equal(0.0123, Tolerance.None.Apply(0.0123, random));
        Assert.Equal(0.0123, Tolerance.Normal(0, ToleranceScale.Percent, true).Apply(0.0123, random));
        Assert.Equal(0.0123, Tolerance.Uniform(0, 0, ToleranceScale.Absolute, true).Apply(0.0123, random));
        Assert.Throws<ArgumentOutOfRangeException>(() => Tolerance.Normal(-1, ToleranceScale.Percent, true));
        Assert.Throws<ArgumentOutOfRangeException>(() => Tolerance.Normal(5, ToleranceScale.Percent, true).Apply(-1, random));
    }

    [FsCheck.Xunit.Property(MaxTest = 300)]
    public bool PositiveQuantities_StayPositive_ForAnySpread(byte sigmaCode, sbyte lowCode, byte widthCode, int seed, ushort index)
    {
        var random = SampleStreams.ForSample(seed, index);
        double nominal = 0.5 + index % 17;
        double normal = Tolerance.Normal(sigmaCode * 2.0, ToleranceScale.Percent, true).Apply(nominal, random);
        double low = lowCode, high = lowCode + widthCode + 1.0;
        if (nominal + high * nominal / 100 <= 0)
        {
            return normal > 0;
        }
        double uniform = Tolerance.Uniform(low, high, ToleranceScale.Percent, true).Apply(nominal, random);
        return normal > 0 && double.IsFinite(normal) && uniform > 0 && uniform <= nominal * (1 + high / 100) + 1e-12;
    }

    [Fact]
    public void FailureProbability_OfANormalCurrentLimit_LiesInTheWilsonInterval()
    {
        // Closed form: a controller current limit I ~ N(40 A, (8 %)^2) falls below a 37 A stall threshold with
        // P = Phi((37 - 40) / 3.2) = Phi(-0.9375) (MathNet Normal.CDF). The estimate from 2000 seeded samples must lie
        // in its 95 % Wilson interval, and over 200 independent studies of 250 samples the 95 % intervals must cover P
        // about 95 % of the time (Wilson 1927; Newcombe 1998 reports coverage near nominal for n of hundreds).
        double p = Normal.CDF(40, 3.2, 37);
        var tolerance = Tolerance.Normal(8, ToleranceScale.Percent, keepPositive: true);
        int Failures(int seed, int samples) => Enumerable.Range(0, samples).Count(k => tolerance.Apply(40, SampleStreams.ForSample(seed, k)) < 37);

        var interval = WilsonInterval.Compute(Failures(1, 2000), 2000);
        Assert.InRange(p, interval.LowerFraction, interval.UpperFraction);

        int covered = Enumerable.Range(100, 200).Count(seed =>
        {
            var i = WilsonInterval.Compute(Failures(seed, 250), 250);
            return i.LowerFraction <= p && p <= i.UpperFraction;
        });
        RelAssert.InRange(covered / 200.0, 0.90, 0.99, "coverage of the 95 % Wilson interval");
    }
}

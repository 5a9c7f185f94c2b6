using RotorDrive.Core.Numerics;
using RotorDrive.Core.Studies.Stress;
using Xunit;

namespace RotorDrive.Core.Tests.Studies.Stress;

public class StressVerdictTests
{
    [Theory]
    // R. G. Newcombe, Statistics in Medicine 17, 857-872, 1998, worked examples, method 3 (Wilson score interval, 95 %):
    // 0 of 20 has the upper limit 0.1611, 15 of 148 has 0.1605 (values quoted from memory, checked in StatisticsTests).
    [InlineData(0, 20, 16.2, true)]
    [InlineData(0, 20, 16.0, false)]
    [InlineData(15, 148, 16.1, true)]
    [InlineData(15, 148, 16.0, false)]
    public void Passes_OnlyWhenTheIntervalsUpperEnd_IsBelowTheAcceptedRate(int failures, int samples, double acceptedPct, bool passes)
    {
        var result = Result(WilsonInterval.Compute(failures, samples), samples);
        Assert.Equal(passes, result.PassesAt(acceptedPct));
    }

    [Fact]
    public void Fails_WhenNoSampleRan()
    {
        // Nothing shown is nothing passed: without a failure rate the test cannot show the rate is low.
        Assert.False(Result(null, 0).PassesAt(100));
    }

    private static StressResult Result(ProportionInterval? rate, int samples)
        => new(samples, samples, 1, false, rate, [], [], [], null, [], []);
}

using RotorDrive.Core.Magnetics;
using Xunit;
using RotorDrive.Core.Tests.Support;

namespace RotorDrive.Core.Tests.Magnetics;

public class AccurateMathTests
{
    // Reference values from the Taylor series e^x - 1 = x + x^2/2 + x^3/6 + x^4/24 + ... summed to full precision by hand
    // (small x) and from tables of the exponential for the rest: e^-0.5 = 0.60653065971263342, e^-2 = 0.13533528323661270,
    // e^3 = 20.085536923187668.
    [Theory]
    [InlineData(1e-12, 1.0000000000005e-12)]
    [InlineData(-1e-8, -9.99999995e-9)]
    [InlineData(1e-3, 1.0005001667083417e-3)]
    [InlineData(-0.5, -0.39346934028736658)]
    [InlineData(-2.0, -0.86466471676338730)]
    [InlineData(3.0, 19.085536923187668)]
    [InlineData(-800, -1.0)]
    public void ExpM1_MatchesSeriesAndTables(double x, double expected)
        => RelAssert.Close(expected, AccurateMath.ExpM1(x), 2e-15);
}

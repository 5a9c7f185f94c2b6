using RotorDrive.Core.Magnetics;
using Xunit;

namespace RotorDrive.Core.Tests.Magnetics;

public class AccurateMathTests
{
    // Reference values from the Taylor series e^x - 1 = x + x^2/2 + x^3/6 + x^4/24 + ... summed to full precision by hand
    // (small x) and from e^-0.5 = 0.60653065971263342 (any table of the exponential) for x = -0.5.
    [Theory]
    [InlineData(1e-12, 1.0000000000005e-12)]
    [InlineData(-1e-8, -9.99999995e-9)]
    [InlineData(1e-3, 1.0005001667083417e-3)]
    [InlineData(-0.5, -0.39346934028736658)]
    [InlineData(-800, -1.0)]
    public void ExpM1_MatchesSeriesAndTables(double x, double expected)
        => RelAssert.Close(expected, AccurateMath.ExpM1(x), 2e-15);
}

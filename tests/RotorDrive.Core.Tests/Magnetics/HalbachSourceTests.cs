using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;
using RotorDrive.Core.Magnetics;
using Xunit;
using RotorDrive.Core.Tests.Support;

namespace RotorDrive.Core.Tests.Magnetics;

public class HalbachSourceTests
{
    // K. Halbach, Nucl. Instrum. Methods 169 (1980): the fundamental of an M-segment array is sin(pi/M)/(pi/M) of the
    // continuous one. Reference values are that closed form evaluated by hand: 2/pi, 2 sqrt(2)/pi, sin(pi/8)/(pi/8).
    [Theory]
    [InlineData(2, 0.63661977236758134)]
    [InlineData(4, 0.90031631615710606)]
    [InlineData(8, 0.97449535840443264)]
    public void FundamentalFactor_MatchesHalbachClosedForm(int segmentsPerWavelength, double expected)
        => RelAssert.Close(expected, HalbachSource.FundamentalFactor(segmentsPerWavelength), 1e-14);

    // Halbach (1980): as M grows the segmented array tends to the ideal continuously rotating magnetisation, factor 1;
    // the series sin(x)/x = 1 - x^2/6 + ... gives the approach.
    [Theory]
    [InlineData(1000)]
    [InlineData(1_000_000)]
    public void FundamentalFactor_TendsToOne_AsSegmentsPerWavelengthGrow(int segmentsPerWavelength)
    {
        double x = Math.PI / segmentsPerWavelength;
        RelAssert.Close(1 - x * x / 6, HalbachSource.FundamentalFactor(segmentsPerWavelength), 1e-12);
    }

    // Halbach (1980): a continuous array (M -> infinity) that is thick (k h -> infinity) has a fundamental of Br at its face.
    [Fact]
    public void Field_OfThickContinuousArray_IsTheRemanence()
        => RelAssert.Close(1.3, HalbachSource.FieldT(1.3, 1_000_000, 1.0, 100.0, 0.0), 1e-11);

    // Halbach (1980): Br (1 - e^(-k h)) sin(pi/M)/(pi/M); for a thin magnet 1 - e^(-k h) = k h (1 - k h / 2 + ...).
    [Theory]
    [InlineData(1.3, 4, 0.004, 63.0, 0.0)]
    [InlineData(1.2, 8, 0.010, 40.0, 0.0)]
    [InlineData(1.4, 4, 1e-9, 50.0, 0.0)]
    public void Field_AtTheFace_MatchesHalbachFormula(double br, int m, double h, double k, double g)
    {
        double expected = br * (k * h < 1e-6 ? k * h * (1 - k * h / 2) : 1 - Math.Exp(-k * h)) * Math.Sin(Math.PI / m) / (Math.PI / m);
        RelAssert.Close(expected, HalbachSource.FieldT(br, m, h, k, g), 1e-12);
    }

    // Halbach (1980); Post and Ryutov, IEEE Trans. Appl. Supercond. 10 (2000): below the array the harmonic decays as e^(-k g).
    [Property(MaxTest = 200)]
    public Property Field_DecaysAsExpMinusKg()
    {
        var k = Gen.Choose(5, 500).Select(i => (double)i);
        var g = Gen.Choose(0, 30_000).Select(i => i * 1e-6);
        return Prop.ForAll(k.ToArbitrary(), g.ToArbitrary(), (kk, gg) =>
            RelAssert.IsClose(HalbachSource.FieldT(1.3, 4, 0.005, kk, 0) * Math.Exp(-kk * gg), HalbachSource.FieldT(1.3, 4, 0.005, kk, gg), 1e-13));
    }

    [Fact]
    public void FundamentalFactor_RejectsFewerThanTwoSegments()
        => Assert.Throws<ArgumentOutOfRangeException>(() => HalbachSource.FundamentalFactor(1));
}

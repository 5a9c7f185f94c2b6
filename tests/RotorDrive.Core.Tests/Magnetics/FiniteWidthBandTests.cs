using System.Numerics;
using MathNet.Numerics.Integration;
using RotorDrive.Core.Magnetics;
using RotorDrive.Core.Tests.Loads;
using RotorDrive.Core.Tests.Support;
using Xunit;

namespace RotorDrive.Core.Tests.Magnetics;

public class FiniteWidthBandTests
{
    private static readonly SourceHarmonic HalbachFundamental = new(1, Math.Sin(Math.PI / 4) / (Math.PI / 4), Math.Sin(Math.PI / 4) / (Math.PI / 4));
    private static readonly Plate Aluminium6Mm = new(TestRigs.Aluminium6061, 0.006);

    // ../DESIGN.md §4.7: as the band grows wide compared with the pole pitch (q w large) the three-dimensional mean pressures
    // tend to the exact two-dimensional layer solution (J. R. Reitz, J. Appl. Phys. 41, 1970, with the Halbach field of
    // K. Halbach, Nucl. Instrum. Methods 169, 1980), to 1e-4 at q w = 1e5, and the edge correction falls as 1/(q w).
    [Fact]
    public void WideBand_TendsToTheExactTwoDimensionalSolution()
    {
        const double q = 100, h = 0.003, g = 0.005, sigma = 25e6, v = 10;
        double field = HalbachSource.FieldT(1.0, 4, h, q, g);
        EddyPressure exact = EddyPressure.FromReflection(field, PlateResponse.Reflection(q, Aluminium6Mm.ThicknessM, sigma, q * v));
        double Deviation(double qw)
        {
            EddyPressure p = FiniteWidthBand.MeanPressure(HalbachFundamental, q, qw / q, h, false, g, Aluminium6Mm, sigma, v, tolerance: 1e-9);
            return Math.Max(Math.Abs(p.LiftPa / exact.LiftPa - 1), Math.Abs(p.DragPa / exact.DragPa - 1));
        }
        double d3 = Deviation(1e3), d4 = Deviation(1e4), d5 = Deviation(1e5);
        Assert.True(d5 < 1e-4, $"deviation at q w = 1e5 is {d5:G3}");
        Assert.InRange(d3 / d4, 5.0, 20.0);
    }

    // Russell and Norsworthy (Proc. IEE 105A, 1958; re-derived in EndEffect): a thin sheet at low speed under a field that is
    // uniform across a width 2a and zero outside loses the fraction K = 1 - tanh(q a)/(q a (1 + tanh(q a))) of the power of
    // an infinitely wide field (wide sheet). A thick axially magnetised band at zero gap makes exactly such a field
    // (Br/2 over its face), so the three-dimensional model's end factor must tend to K there.
    [Theory]
    [InlineData(0.5)]
    [InlineData(2.0)]
    [InlineData(8.0)]
    public void ThinSheetAtLowSpeed_EndFactorTendsToRussellNorsworthy(double qa)
    {
        const double q = 100, sigma = 1e6, v = 1e-3;
        var axial = new SourceHarmonic(1, 4 / Math.PI, 0);
        var sheet = new Plate(TestRigs.Aluminium6061, 1e-7);
        double width = 2 * qa / q;
        EddyPressure band = FiniteWidthBand.MeanPressure(axial, q, width, 50.0, false, 1e-6, sheet, sigma, v, tolerance: 1e-7);
        EddyPressure wide = FiniteWidthBand.ComponentPressure(axial, q, 0, 50.0, false, 1e-6, sheet, sigma, v);
        double expected = EndEffect.RussellNorsworthyFactor(q, width / 2);
        RelAssert.Close(expected, band.DragPa / wide.DragPa, 2e-3, "end factor");
    }

    // Independent numerical solution: the series is the trapezoidal rule of the Fourier integral over k_y,
    // mean P = (1/(pi w)) integral_0^inf 4 sin^2(k_y w/2)/k_y^2 P(q, k_y) dk_y. Here that integral is done by brute force
    // (MathNet Gauss-Legendre, 48 points between successive zeros of the sinc, out to where e^(-2 k g) < 1e-16) for a band
    // with the demo rotor's proportions at its mean radius; the two must agree within a few 1e-4 (aliasing ~ e^(-10)).
    [Theory]
    [InlineData(0.010, 28.0)]
    [InlineData(0.004, 5.0)]
    public void Series_MatchesBruteForceFourierIntegral(double gap, double speed)
    {
        const double q = 6 / 0.095, w = 0.05, h = 0.0025, sigma = 25e6;
        EddyPressure series = FiniteWidthBand.MeanPressure(HalbachFundamental, q, w, h, false, gap, Aluminium6Mm, sigma, speed, tolerance: 1e-10);
        double lift = 0, drag = 0;
        double step = 2 * Math.PI / w;
        double top = 18.5 / gap;
        for (double a = 0; a < top; a += step)
        {
            lift += GaussLegendreRule.Integrate(ky => Kernel(ky) * FiniteWidthBand.ComponentPressure(HalbachFundamental, q, ky, h, false, gap, Aluminium6Mm, sigma, speed).LiftPa, a, a + step, 48);
            drag += GaussLegendreRule.Integrate(ky => Kernel(ky) * FiniteWidthBand.ComponentPressure(HalbachFundamental, q, ky, h, false, gap, Aluminium6Mm, sigma, speed).DragPa, a, a + step, 48);
        }
        RelAssert.Close(lift, series.LiftPa, 3e-4, "lift");
        RelAssert.Close(drag, series.DragPa, 3e-4, "drag");

        static double Kernel(double ky)
        {
            double s = ky * w / 2;
            double sinc = s < 1e-8 ? 1.0 : Math.Sin(s) / s;
            // (1/(pi w)) 4 sin^2(k_y w / 2) / k_y^2 = (w / pi) sinc^2(k_y w / 2).
            return w / Math.PI * sinc * sinc;
        }
    }

    // Image method (steel under the plate infinitely permeable): at standstill the plate carries no current and the steel's
    // image of the source, a depth d below the plate's surface, attracts it with pressure (B^2/mu0) e^(-2 k d), i.e. lift
    // -(B^2/mu0) e^(-2 k d) (e.g. K. J. Binns, P. J. Lawrenson, C. W. Trowbridge, The Analytical and Numerical Solution of
    // Electric and Magnetic Fields, 1992, images in a permeable plane; from memory).
    [Fact]
    public void SteelUnderThePlate_AtStandstill_AttractsAsTheImage()
    {
        const double q = 80, h = 0.003, g = 0.008;
        var plate = new Plate(TestRigs.Aluminium6061, 0.006) { BackIronM = 0.01 };
        EddyPressure p = FiniteWidthBand.ComponentPressure(HalbachFundamental, q, 0, h, false, g, plate, 25e6, 0.0);
        double b = HalbachSource.FieldT(1.0, 4, h, q, g);
        RelAssert.Close(-b * b / Units.Mu0 * Math.Exp(-2 * q * plate.ThicknessM), p.LiftPa, 1e-12, "standstill lift");
        Assert.Equal(0.0, p.DragPa);
    }

    // At high speed the plate screens the steel: the steel-backed response tends to the free plate's (both to R = -1).
    [Fact]
    public void SteelUnderThePlate_AtHighSpeed_IsScreenedByThePlate()
    {
        Complex free = PlateResponse.Reflection(1e5, 0.5);
        Complex steel = PlateResponse.SteelBackedReflection(1e5, 0.5);
        Assert.True((free - steel).Magnitude < 1e-6, $"free {free}, steel-backed {steel}");
    }

    // Image method for surface magnets on an infinitely permeable back (e.g. Z. Q. Zhu and D. Howe, IEEE Trans. Magn. 29(1),
    // 1993): an axially magnetised layer on steel acts as one of twice the thickness; the fundamental of alternating poles
    // with arc fraction alpha is (Br/2)(4/pi) sin(pi alpha/2)(1 - e^(-2 k h)) at the face.
    [Theory]
    [InlineData(1.0)]
    [InlineData(0.7)]
    public void AlternatingPolesOnSteel_FaceFieldIsTheImageDoubledLayer(double arc)
    {
        var rotor = TestRigs.Rotor with { SegmentsPerWavelength = 2, Array = RotorArray.Alternating, MagnetArcFraction = arc, BackIronM = 0.005 };
        SourceHarmonic first = ArraySource.Harmonics(rotor, 1)[0];
        const double k = 60, h = 0.004;
        double expected = 0.5 * 4 / Math.PI * Math.Sin(Math.PI * arc / 2) * (1 - Math.Exp(-2 * k * h));
        RelAssert.Close(expected, ArraySource.FaceField(first, k, k, h, true), 1e-12, "face field");
    }

    // A Halbach array has no field on its weak face, so steel behind it changes nothing in two dimensions (Halbach 1980).
    [Fact]
    public void HalbachOnSteel_TwoDimensionalFieldUnchanged()
    {
        const double k = 60, h = 0.004;
        RelAssert.Close(ArraySource.FaceField(HalbachFundamental, k, k, h, false), ArraySource.FaceField(HalbachFundamental, k, k, h, true), 1e-12, "face field");
        RelAssert.Close(HalbachSource.FieldT(1.0, 4, h, k, 0), ArraySource.FaceField(HalbachFundamental, k, k, h, false), 1e-12, "Halbach formula");
    }

    // Halbach (1980): a segmented array has orders n = 1 + jM with amplitude sin(n pi/M)/(n pi/M); M = 4 gives 1, -3, 5, -7.
    [Fact]
    public void HalbachHarmonics_AreTheSegmentedArraySeries()
    {
        SourceHarmonic[] h = ArraySource.Harmonics(TestRigs.Rotor, 4);
        Assert.Equal([1, -3, 5, -7], h.Select(x => x.Order));
        foreach (SourceHarmonic x in h)
        {
            double arg = x.Order * Math.PI / 4;
            RelAssert.Close(Math.Sin(arg) / arg, x.AxialAmplitude, 1e-14, $"a_{x.Order}");
        }
    }
}

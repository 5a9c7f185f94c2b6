using System.Numerics;
using MathNet.Numerics;
using MathNet.Numerics.Integration;
using RotorDrive.Core.Magnetics;
using RotorDrive.Core.Numerics;
using RotorDrive.Core.Tests.Loads;
using RotorDrive.Core.Tests.Support;
using Xunit;

namespace RotorDrive.Core.Tests.Magnetics;

/// <summary>The ring model (cylindrical harmonics over a wide plate, <see cref="AnnularSpectrum"/>), the default
/// three-dimensional load model.</summary>
public class RingModelTests
{
    private const double Sigma = 25e6;

    // F_m(x) = int_0^x t J_m(t) dt and G_m(x) = int_0^x J_m(t) dt from the downward recurrence, against MathNet's
    // general-order Bessel function (Amos's algorithm, a reference library) integrated by 400-point Gauss-Legendre panels.
    [Theory]
    [InlineData(0.5)]
    [InlineData(5.0)]
    [InlineData(40.0)]
    [InlineData(300.0)]
    public void OrderIntegrals_MatchQuadratureOfMathNetBesselJ(double x)
    {
        const int maxOrder = 42;
        var f = new double[maxOrder + 1];
        var g = new double[maxOrder + 1];
        Bessel.OrderIntegrals(x, f, g);
        int panels = Math.Max(1, (int)(x / 10));
        foreach (int m in new[] { 0, 1, 2, 5, 12, 29, 42 })
        {
            double expectedF = 0, expectedG = 0;
            for (int i = 0; i < panels; i++)
            {
                double a = x * i / panels, b = x * (i + 1) / panels;
                expectedF += GaussLegendreRule.Integrate(t => t * SpecialFunctions.BesselJ(m, t), a, b, 64);
                expectedG += GaussLegendreRule.Integrate(t => SpecialFunctions.BesselJ(m, t), a, b, 64);
            }
            double scaleF = Math.Max(1.0, x) * Math.Max(1.0, Math.Sqrt(x));
            RelAssert.Close(expectedF, f[m], 1e-9, 1e-12 * scaleF, $"F_{m}({x})");
            RelAssert.Close(expectedG, g[m], 1e-9, 1e-12, $"G_{m}({x})");
        }
    }

    // The model against its definition computed independently: the source spectrum b(kappa) from MathNet's Bessel
    // functions integrated over the radius by Gauss-Legendre (not the recurrences), the kappa integral by a fine
    // midpoint rule with every sample kept (no grouping), lift = (2 pi Br^2/mu0) int b^2 (-Re R) e^(-2 kappa g) kappa
    // dkappa and torque the same with (m/kappa)(-Im R) (Parseval's theorem for the Hankel transform; C. V. Dodd and
    // W. E. Deeds, J. Appl. Phys. 39(6), 1968, for the layer under a source of cylindrical harmonics). The grouped
    // two-point rules of the model must agree within 0.1 %.
    [Theory]
    [InlineData(0.004, 60.0)]
    [InlineData(0.008, 250.0)]
    [InlineData(0.015, 600.0)]
    public void Model_EqualsTheHankelIntegralComputedIndependently(double gap, double speed)
    {
        RotorDesign rotor = TestRigs.Rotor;
        Plate plate = TestRigs.AluminiumPlate;
        SourceHarmonic[] harmonics = ArraySource.Harmonics(rotor, 2);
        double ri = rotor.InnerRadiusM, ro = rotor.OuterRadiusM, h = rotor.MagnetThicknessM;
        double step = Math.PI / (24 * ro);
        double kappaMax = 40.0 / (2 * gap);
        double lift = 0, torque = 0;
        for (double kappa = 0.5 * step; kappa < kappaMax; kappa += step)
        {
            foreach (SourceHarmonic hm in harmonics)
            {
                int m = Math.Abs(hm.Order) * rotor.PolePairs;
                int nodes = 16 + (int)(kappa * (ro - ri));
                double sa = GaussLegendreRule.Integrate(r => r * SpecialFunctions.BesselJ(m, kappa * r), ri, ro, nodes);
                double st = m * GaussLegendreRule.Integrate(r => SpecialFunctions.BesselJ(m, kappa * r), ri, ro, nodes);
                double b = 0.5 * (1 - Math.Exp(-kappa * h)) * (hm.AxialAmplitude * sa + Math.Sign(hm.Order) * hm.TangentialAmplitude * st / kappa);
                Complex reflection = PlateResponse.Reflection(kappa, plate.ThicknessM, Sigma, m * speed);
                double w = 2 * Math.PI * rotor.RemanenceT * rotor.RemanenceT / Units.Mu0 * b * b * kappa * step * Math.Exp(-2 * kappa * gap);
                lift -= w * reflection.Real;
                torque -= w * m / kappa * reflection.Imaginary;
            }
        }
        EddyForces model = RotorEddyModel.ThreeDimensional(rotor, plate, harmonics: 2).Evaluate(Sigma, speed, gap);
        RelAssert.Close(lift, model.LiftN, 1e-3, "lift");
        RelAssert.Close(torque, model.TorqueNm, 1e-3, "torque");
        RelAssert.Close(model.TorqueNm * speed, model.PowerW, 1e-12, "power = torque x speed");
    }

    // Closed-form limit: a ring of large radius R and fixed width w is locally a straight band, so the ring model must tend
    // to the band solution (FiniteWidthBand, the double Fourier series of Lubin and Rezzoug 2015) at wavenumber q = p/R and
    // speed omega R, with an error of the order of the curvature w/R: it must fall as R grows (about as 1/R) and be under
    // 1 % at w/R = 1/100.
    [Fact]
    public void LargeRing_TendsToTheStraightBand()
    {
        const double width = 0.02, q = 150.0, gap = 0.006, bandSpeed = 20.0;
        Plate plate = TestRigs.AluminiumPlate;
        double Error(double radius)
        {
            int p = (int)Math.Round(q * radius);
            var rotor = new RotorDesign("ring", 4 * p, 4, radius - width / 2, radius + width / 2, 0.004, 1.3, 0, null, 1.0, 0.01, 1000, 0, 0, null, null);
            double pitch = p / radius;
            EddyForces ring = RotorEddyModel.ThreeDimensional(rotor, plate, harmonics: 1, referenceGapM: gap, tolerance: 1e-8).Evaluate(Sigma, bandSpeed / radius, gap);
            SourceHarmonic fundamental = ArraySource.Harmonics(rotor, 1)[0];
            EddyPressure band = FiniteWidthBand.MeanPressure(fundamental, pitch, width, rotor.MagnetThicknessM, false, gap, plate, Sigma, bandSpeed);
            double area = 2 * Math.PI * radius * width;
            double liftError = ring.LiftN / (band.LiftPa * area * rotor.RemanenceT * rotor.RemanenceT) - 1;
            double dragError = ring.TorqueNm / radius / (band.DragPa * area * rotor.RemanenceT * rotor.RemanenceT) - 1;
            return Math.Max(Math.Abs(liftError), Math.Abs(dragError));
        }
        double near = Error(0.5), far = Error(2.0);
        Assert.True(far < 0.01, $"ring of w/R = 1/100 differs from the band by {far:P2}");
        Assert.True(far < 0.5 * near, $"the difference must fall with the radius: {near:P2} at w/R = 1/25, {far:P2} at 1/100");
    }

    // Truncation shown: the default (4 harmonics, spectrum cut at 1e-6 at 2 mm, grouped) against a much finer model
    // (12 harmonics, 1e-10); at gaps from 6.5 mm within 0.2 %, at 3 mm within 2 % (the orders 9 and beyond that the
    // default drops, Halbach 1980), while the fundamental alone misses by more than the truncation.
    [Theory]
    [InlineData(0.003, 100.0, 0.02)]
    [InlineData(0.0065, 300.0, 2e-3)]
    [InlineData(0.010, 600.0, 2e-3)]
    public void DefaultTruncation_IsSmallerThanTheHarmonicsItKeeps(double gap, double speed, double allowed)
    {
        RotorDesign rotor = TestRigs.Rotor;
        Plate plate = TestRigs.AluminiumPlate;
        EddyForces fine = RotorEddyModel.ThreeDimensional(rotor, plate, 12, 0.002, 1e-10).Evaluate(Sigma, speed, gap);
        EddyForces standard = RotorEddyModel.ThreeDimensional(rotor, plate).Evaluate(Sigma, speed, gap);
        EddyForces fundamental = RotorEddyModel.ThreeDimensional(rotor, plate, 1, 0.002, 1e-10).Evaluate(Sigma, speed, gap);
        RelAssert.Close(fine.LiftN, standard.LiftN, allowed, "lift");
        RelAssert.Close(fine.TorqueNm, standard.TorqueNm, allowed, "torque");
        double harmonicsShare = Math.Abs(fundamental.LiftN / fine.LiftN - 1);
        double truncation = Math.Abs(standard.LiftN / fine.LiftN - 1);
        Assert.True(harmonicsShare > 3 * truncation, $"harmonics change lift by {harmonicsShare:P2}, truncation error {truncation:P3}");
    }

    // The ring model keeps one eddy-current time constant across the radius: its drag peak lies between those of bands at
    // the inner and the outer radius, above the strip model's (which weights each radius's own peak towards the outer,
    // slower strips).
    [Fact]
    public void DragPeak_LiesAboveTheStripModels()
    {
        RotorDesign rotor = TestRigs.Rotor;
        Plate plate = TestRigs.AluminiumPlate;
        double ring = PeakSpeed(RotorEddyModel.ThreeDimensional(rotor, plate));
        double strips = PeakSpeed(RotorEddyModel.ThreeDimensionalStrips(rotor, plate));
        Assert.True(ring > strips, $"ring model peaks at {ring:F1} rad/s, strip model at {strips:F1} rad/s");
    }

    private static double PeakSpeed(RotorEddyModel model)
    {
        double best = 0, bestSpeed = 0;
        for (double w = 1; w < 600; w *= 1.01)
        {
            double t = model.Evaluate(Sigma, w, 0.008).TorqueNm;
            if (t > best)
            {
                (best, bestSpeed) = (t, w);
            }
        }
        return bestSpeed;
    }
}

using System.Numerics;
using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;
using MathNet.Numerics.Integration;
using RotorDrive.Core.Magnetics;
using Xunit;
using RotorDrive.Core.Tests.Support;

namespace RotorDrive.Core.Tests.Magnetics;

public class PlateResponseTests
{
    private const double Mu0 = Units.Mu0;

    // The layer solution exactly as written in ../DESIGN.md §4.2 (after Reitz 1970; Bird and Lipo 2007):
    // gamma = sqrt(k^2 + i mu0 sigma we), rho = e^(-2 gamma d)(gamma - k)/(gamma + k), Z = (gamma/k)(1 - rho)/(1 + rho),
    // R = (1 - Z)/(1 + Z). The library uses an algebraically equal, cancellation-free form; they must agree where the
    // literal one is well conditioned.
    private static Complex LiteralLayerReflection(double k, double d, double sigma, double we)
    {
        Complex gamma = Complex.Sqrt(new Complex(k * k, Mu0 * sigma * we));
        Complex rho = Complex.Exp(-2 * gamma * d) * (gamma - k) / (gamma + k);
        Complex z = gamma / k * (1 - rho) / (1 + rho);
        return (1 - z) / (1 + z);
    }

    [Theory]
    [InlineData(63.0, 0.006, 25e6, 1800.0)]
    [InlineData(63.0, 0.006, 25e6, 20.0)]
    [InlineData(50.0, 0.020, 58e6, 3.0e4)]
    [InlineData(200.0, 0.001, 35e6, 600.0)]
    [InlineData(10.0, 0.0005, 58e6, 1.0e5)]
    [InlineData(63.0, 0.006, 25e6, -1800.0)]
    public void Reflection_EqualsTheLayerFormula(double k, double d, double sigma, double we)
    {
        Complex expected = LiteralLayerReflection(k, d, sigma, we);
        Complex actual = PlateResponse.Reflection(k, d, sigma, we);
        Assert.True(Complex.Abs(actual - expected) <= 1e-12 * Complex.Abs(expected), $"R = {actual}, layer formula {expected}");
    }

    // Reitz (1970), thin sheet (k d << 1, d << skin depth): lift pressure (B^2/mu0) s^2/(1+s^2), drag (B^2/mu0) s/(1+s^2),
    // drag/lift = w/v, with s = v/w and w = 2/(mu0 sigma d). In the dimensionless form s = eps k d / 2.
    [Theory]
    [InlineData(0.1)]
    [InlineData(0.5)]
    [InlineData(1.0)]
    [InlineData(2.0)]
    [InlineData(10.0)]
    public void Pressures_TendToReitzThinSheetLimit(double s)
    {
        const double kd = 1e-7;
        double eps = 2 * s / kd;
        EddyPressure p = EddyPressure.FromReflection(1.0, PlateResponse.Reflection(eps, kd));
        double magnetic = 1.0 / Mu0;
        RelAssert.Close(magnetic * s * s / (1 + s * s), p.LiftPa, 1e-5, "lift");
        RelAssert.Close(magnetic * s / (1 + s * s), p.DragPa, 1e-5, "drag");
        RelAssert.Close(1 / s, p.DragPa / p.LiftPa, 1e-5, "drag/lift = w/v");
    }

    // Reitz (1970) in physical units: 0.1 mm aluminium foil (25 MS/m) under a 0.6 m wavelength at v = w and v = 3 w.
    [Theory]
    [InlineData(1.0)]
    [InlineData(3.0)]
    public void Pressures_MatchReitzInPhysicalUnits_ForAThinFoil(double speedOverW)
    {
        double sigma = 25e6, d = 1e-4, k = 2 * Math.PI / 0.6, bs = 0.2;
        double w = 2 / (Mu0 * sigma * d);
        double v = speedOverW * w;
        EddyPressure p = EddyPressure.FromReflection(bs, PlateResponse.Reflection(k, d, sigma, k * v));
        double s = v / w;
        // Corrections are of order k d = 1e-3 and (d/skin depth)^2 = s k d.
        RelAssert.Close(bs * bs / Mu0 * s * s / (1 + s * s), p.LiftPa, 5e-3, "lift");
        RelAssert.Close(w / v, p.DragPa / p.LiftPa, 5e-3, "drag/lift");
    }

    // Reitz (1970); Saslow, Am. J. Phys. 60, 693 (1992): a perfect conductor (R = -1) gives lift B^2/mu0 and no drag.
    [Fact]
    public void Pressures_TendToPerfectConductorLimit_AtVeryHighConductivitySpeed()
    {
        EddyPressure p = EddyPressure.FromReflection(0.5, PlateResponse.Reflection(1e14, 1.0));
        RelAssert.Close(0.25 / Mu0, p.LiftPa, 1e-6, "lift");
        Assert.InRange(p.DragPa / p.LiftPa, 0, 1e-6);
    }

    // Saslow (1992): when the plate is much thicker than the skin depth delta_c = sqrt(2 h/(mu0 sigma v)), the eddy currents
    // crowd into delta_c and drag/lift ~ sqrt(v0/v). For one harmonic (h = 1/k) the layer solution's leading term is
    // drag/lift = k delta with delta = sqrt(2/(mu0 sigma we)); the next term is of relative order k delta.
    [Theory]
    [InlineData(1e6)]
    [InlineData(1e7)]
    [InlineData(1e8)]
    public void DragOverLift_TendsToKTimesSkinDepth_ForThickPlateAtHighSpeed(double we)
    {
        double k = 100, d = 0.5, sigma = 58e6;
        double delta = Math.Sqrt(2 / (Mu0 * sigma * we));
        EddyPressure p = EddyPressure.FromReflection(1.0, PlateResponse.Reflection(k, d, sigma, we));
        RelAssert.Close(k * delta, p.DragPa / p.LiftPa, 1.5 * k * delta, "drag/lift");
    }

    // At rest the plate does nothing (R = 0), and R leaves 0 linearly and continuously: the first-order term of the layer
    // solution in eps is R = -i eps (1 - e^(-2 k d))/4 (expanding ../DESIGN.md §4.2 about gamma = k; for a thin sheet it is
    // Reitz's -i s). The literal formula loses digits here; the library must not.
    [Theory]
    [InlineData(0.4)]
    [InlineData(1e-3)]
    [InlineData(30.0)]
    public void Reflection_IsZeroAtRest_AndLinearInSpeedNearRest(double kd)
    {
        Assert.Equal(Complex.Zero, PlateResponse.Reflection(0.0, kd));
        Complex slope = new Complex(0, -(1 - Math.Exp(-2 * kd)) / 4);
        foreach (double eps in new[] { 1e-6, 1e-9, 1e-12, 1e-15 })
        {
            Complex r = PlateResponse.Reflection(eps, kd) / eps;
            Assert.True(Complex.Abs(r - slope) <= 1e-5 * Complex.Abs(slope), $"eps {eps}: R/eps = {r}, expected {slope}");
        }
    }

    // A plate many skin depths thick is a half-space: R = (k - gamma)/(k + gamma) (Reitz 1970); no overflow for huge k d.
    [Fact]
    public void Reflection_OfAVeryThickPlate_IsTheHalfSpaceValue_WithoutOverflow()
    {
        double k = 60, sigma = 58e6, we = 5000;
        Complex gamma = Complex.Sqrt(new Complex(k * k, Mu0 * sigma * we));
        Complex expected = (k - gamma) / (k + gamma);
        Complex actual = PlateResponse.Reflection(k, 1e4, sigma, we);
        Assert.True(Complex.Abs(actual - expected) <= 1e-13, $"R = {actual}, half-space {expected}");
    }

    // Reversing the motion conjugates the response: lift is even in speed, drag odd (time reversal of the layer solution).
    [Property(MaxTest = 300)]
    public Property Reflection_OfReversedMotion_IsTheConjugate()
        => Prop.ForAll(Generators.Eps.ToArbitrary(), Generators.Kd.ToArbitrary(), (eps, kd) =>
        {
            Complex forward = PlateResponse.Reflection(eps, kd);
            Complex backward = PlateResponse.Reflection(-eps, kd);
            return Complex.Abs(backward - Complex.Conjugate(forward)) <= 1e-15 * (1 + Complex.Abs(forward));
        });

    // Passivity (the plate only dissipates): |R| <= 1, Re R <= 0 (repulsion) and Im R <= 0 for eps > 0 (drag opposes motion).
    [Property(MaxTest = 300)]
    public Property Reflection_IsPassive()
        => Prop.ForAll(Generators.Eps.ToArbitrary(), Generators.Kd.ToArbitrary(), (eps, kd) =>
        {
            Complex r = PlateResponse.Reflection(eps, kd);
            return Complex.Abs(r) <= 1 + 1e-15 && r.Real <= 0 && r.Imaginary <= 0;
        });

    // The table uses eps dR/deps from the analytic derivative; it must match a central difference of R (error ~ h^2).
    [Theory]
    [InlineData(1e-4, 0.4)]
    [InlineData(3.0, 0.4)]
    [InlineData(80.0, 0.05)]
    [InlineData(5e4, 2.0)]
    [InlineData(20.0, 40.0)]
    public void ReflectionSlope_MatchesCentralDifference(double eps, double kd)
    {
        PlateResponse.ReflectionWithSlope(eps, kd, out Complex slope);
        const double h = 1e-5;
        Complex difference = (PlateResponse.Reflection(eps * Math.Exp(h), kd) - PlateResponse.Reflection(eps * Math.Exp(-h), kd)) / (2 * h);
        Assert.True(Complex.Abs(slope - difference) <= 1e-8 * Complex.Abs(slope) + 1e-15, $"slope {slope}, difference {difference}");
    }

    // Energy conservation (Poynting's theorem): the Joule loss in the plate, (sigma we^2/2) * integral of |A|^2 over its
    // thickness, computed here from the field inside the plate solved bottom-up, equals drag pressure times slip speed we/k.
    // This checks Im R (and the source normalisation) independently of the reflection formula.
    [Theory]
    [InlineData(63.0, 0.006, 25e6, 1800.0)]
    [InlineData(63.0, 0.006, 25e6, 30.0)]
    [InlineData(50.0, 0.02, 58e6, 2.0e4)]
    [InlineData(150.0, 0.001, 35e6, 900.0)]
    public void JouleLossInPlate_EqualsDragPressureTimesSlipSpeed(double k, double d, double sigma, double we)
    {
        // Vector potential in the plate (0 <= zeta <= d from its bottom face), with unit amplitude below the plate:
        // A = C1 e^(gamma zeta) + C2 e^(-gamma zeta), C1 = (1 + k/gamma)/2, C2 = (1 - k/gamma)/2.
        Complex gamma = Complex.Sqrt(new Complex(k * k, Mu0 * sigma * we));
        Complex c1 = (1 + k / gamma) / 2, c2 = (1 - k / gamma) / 2;
        Complex AtZeta(double zeta) => c1 * Complex.Exp(gamma * zeta) + c2 * Complex.Exp(-gamma * zeta);
        double integral = GaussLegendreRule.Integrate(z => Math.Pow(Complex.Abs(AtZeta(z)), 2), 0, d, 256);
        double joule = sigma * we * we / 2 * integral;

        // Above the plate A = S (e^(k z) + R e^(-k z)); at its top surface S (1 + R) = A(d), and the source field there is k|S|.
        Complex r = PlateResponse.Reflection(k, d, sigma, we);
        Complex source = AtZeta(d) / (1 + r);
        double bs = k * Complex.Abs(source);
        double dragTimesSpeed = EddyPressure.FromReflection(bs, r).DragPa * (we / k);
        RelAssert.Close(joule, dragTimesSpeed, 1e-10, "Joule loss vs drag x speed");
    }

    private static class Generators
    {
        public static Gen<double> Eps => Gen.Choose(-600, 700).Select(i => Math.Pow(10, i / 100.0));
        public static Gen<double> Kd => Gen.Choose(-500, 300).Select(i => Math.Pow(10, i / 100.0));
    }
}

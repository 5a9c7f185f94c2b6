using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;
using RotorDrive.Core.Loads;
using RotorDrive.Core.Tests.Magnetics;
using Xunit;
using RotorDrive.Core.Tests.Support;

namespace RotorDrive.Core.Tests.Loads;

public class DiscWindageTests
{
    // H. Schlichting, Boundary-Layer Theory (rotating disc in fluid at rest, both sides wetted): laminar C_M = 3.87 Re^-1/2.
    [Theory]
    [InlineData(1e2, 0.387)]
    [InlineData(1e4, 0.0387)]
    [InlineData(2.5e5, 3.87 / 500.0)]
    public void LaminarCoefficient_IsSchlichtings(double reynolds, double expected)
        => RelAssert.Close(expected, DiscWindage.LaminarMomentCoefficient(reynolds), 1e-14);

    // Schlichting (after von Karman 1921): turbulent C_M = 0.146 Re^-1/5; 1e5^0.2 = 10, 1e10^0.2 = 100, 3.2e6^0.2 = 20.
    [Theory]
    [InlineData(1e5, 0.0146)]
    [InlineData(1e10, 0.00146)]
    [InlineData(3.2e6, 0.0073)]
    public void TurbulentCoefficient_IsSchlichtings(double reynolds, double expected)
        => RelAssert.Close(expected, DiscWindage.TurbulentMomentCoefficient(reynolds), 1e-12);

    // Far from the crossing the blend is the correlation of its regime (Schlichting): within 0.1 %.
    [Theory]
    [InlineData(1e3)]
    [InlineData(1e4)]
    public void BlendedCoefficient_IsLaminar_WellBelowTheCrossing(double reynolds)
        => RelAssert.Close(DiscWindage.LaminarMomentCoefficient(reynolds), DiscWindage.MomentCoefficient(reynolds), 1e-3);

    [Theory]
    [InlineData(3e5)]
    [InlineData(1e7)]
    public void BlendedCoefficient_IsTurbulent_WellAboveTheCrossing(double reynolds)
        => RelAssert.Close(DiscWindage.TurbulentMomentCoefficient(reynolds), DiscWindage.MomentCoefficient(reynolds), 1e-3);

    // No jump: between any two nearby Reynolds numbers the blended coefficient moves by no more than the steeper
    // correlation would (|d ln C_M / d ln Re| <= 1/2 plus the blend's own slope, bounded here by 2).
    [Property(MaxTest = 300)]
    public Property BlendedCoefficient_HasNoJump()
    {
        var lnRe = Gen.Choose(400, 1700).Select(i => i / 100.0);
        return Prop.ForAll(lnRe.ToArbitrary(), x =>
        {
            double a = DiscWindage.MomentCoefficient(Math.Exp(x));
            double b = DiscWindage.MomentCoefficient(Math.Exp(x + 1e-6));
            return Math.Abs(Math.Log(b / a)) <= 2e-6;
        });
    }

    // W. G. Cochran, Proc. Camb. Phil. Soc. 30 (1934) (from memory): von Karman's laminar disc has G'(0) = -0.6159, so one
    // face carries 0.6159 (pi/2) rho R^4 sqrt(nu omega^3); Schlichting's 3.87 = 2 x 0.6159 pi is for both faces. At low Re
    // the torque must be twice the one-face value.
    [Fact]
    public void LaminarTorque_IsBothFacesOfVonKarmansDisc()
    {
        double omega = 20, radius = 0.05, rho = 1.2, nu = 1.5e-5;
        double oneFace = 0.6159 * Math.PI / 2 * rho * Math.Pow(radius, 4) * Math.Sqrt(nu * omega * omega * omega);
        RelAssert.Close(2 * oneFace, DiscWindage.TorqueNm(omega, radius, new AirProperties(rho, nu)), 2e-3);
    }

    // Torque = 0.5 C_M rho omega^2 R^5 (Schlichting), with the sign of the speed.
    [Theory]
    [InlineData(628.3, 0.123)]
    [InlineData(-300.0, 0.10)]
    public void Torque_IsHalfCmRhoOmegaSquaredRadiusToTheFifth(double omega, double radius)
    {
        var air = AirProperties.Standard;
        double re = Math.Abs(omega) * radius * radius / air.KinematicViscosityM2PerS;
        double expected = Math.Sign(omega) * 0.5 * DiscWindage.MomentCoefficient(re) * air.DensityKgM3 * omega * omega * Math.Pow(radius, 5);
        RelAssert.Close(expected, DiscWindage.TorqueNm(omega, radius, air), 1e-12);
    }

    [Fact]
    public void Torque_IsZeroAtRest() => Assert.Equal(0.0, DiscWindage.TorqueNm(0, 0.1, AirProperties.Standard));
}

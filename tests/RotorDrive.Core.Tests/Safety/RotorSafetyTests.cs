using MathNet.Numerics.Integration;
using RotorDrive.Core.Magnetics;
using RotorDrive.Core.Safety;
using RotorDrive.Core.Tests.Simulation;
using RotorDrive.Core.Tests.Support;
using Xunit;

namespace RotorDrive.Core.Tests.Safety;

public class RotorSafetyTests
{
    private static readonly double Speed6000Rpm = Units.RpmToRadPerS(6000);

    internal static RotorDesign Rotor(double? retainerM = 0.003, double? allowablePa = 1200e6, double? magnetDensity = 7500, double maxRpm = 7000) => new(
        "R150", 16, 4, 0.10, 0.15, 0.01, 1.3, -0.0012, magnetDensity, 4.0, 0.05, Units.RpmToRadPerS(maxRpm), 0, 0, retainerM, allowablePa);

    [Fact]
    public void ThinRing_AtSixThousandRpm_MatchesTheWorkedValue()
    {
        // Thin rotating ring sigma = rho omega^2 r^2 (Timoshenko & Goodier, "Theory of Elasticity"; Roark's Formulas):
        // rho = 2700 kg/m^3 (aluminium), r = 0.15 m, 6000 rpm = 628.3185 rad/s gives 23.98 MPa.
        RelAssert.Close(23.98e6, RotorSafety.ThinRingHoopStressPa(2700, 0.15, Speed6000Rpm), 2e-4);
    }

    [Fact]
    public void Retainer_CarriesRingAndMagnetStress_AsWorkedByHand()
    {
        // Hand computation for ri = 0.10 m, ro = 0.15 m, h = 0.01 m, NdFeB 7500 kg/m^3, steel ring (7850) t = 3 mm at
        // 6000 rpm (omega^2 = 394784.18): own stress 7850 omega^2 (0.1515)^2 = 71.130 MPa (thin ring); magnet load
        // 7500 omega^2 (0.15^3 - 0.10^3) / (3 x 0.003) = 781.344 MPa (thin-walled cylinder, Roark); total 852.474 MPa.
        // Against 1200 MPa: margin 0.40767, stress reaches the allowable at 6000 sqrt(1200 / 852.474) = 7118.71 rpm.
        var result = RotorSafety.Assess(Rotor(), Speed6000Rpm);
        Assert.Equal(RetainerAssessment.Assessed, result.Assessment);
        RelAssert.Close(71.130e6, result.RingOwnStressPa!.Value, 1e-4, what: "ring own stress");
        RelAssert.Close(781.344e6, result.MagnetLoadStressPa!.Value, 1e-5, what: "magnet load stress");
        RelAssert.Close(852.474e6, result.HoopStressPa!.Value, 1e-5, what: "total hoop stress");
        RelAssert.Close(0.40767, result.MarginFraction!.Value, 1e-4, what: "margin");
        RelAssert.Close(7118.71, Units.RadPerSToRpm(result.SpeedAtAllowableRadPerS!.Value), 1e-5, what: "speed at allowable");
        RelAssert.Close(628.3185 * 0.153, result.RimSpeedMPerS, 1e-6, what: "rim speed at the ring's outer surface");
        RelAssert.Close(7500 * Math.PI * (0.15 * 0.15 - 0.10 * 0.10) * 0.01, result.MagnetMassKg, 1e-12, what: "magnet mass");
    }

    [Fact]
    public void MagnetLoad_EqualsQuadratureOfTheRadialForce_OverTheAnnulus()
    {
        // Independent route: integrate the radial force dF = rho h omega^2 r (2 pi r dr) with MathNet's Gauss-Legendre
        // rule, turn it into an internal pressure p = F / (2 pi ro h) and the thin-cylinder stress p ro / t (Roark).
        var rotor = Rotor();
        double h = rotor.MagnetThicknessM, t = rotor.RetainerThicknessM!.Value;
        double force = GaussLegendreRule.Integrate(r => 7500 * h * Speed6000Rpm * Speed6000Rpm * r * 2 * Math.PI * r, 0.10, 0.15, 8);
        double pressure = force / (2 * Math.PI * 0.15 * h);
        RelAssert.Close(pressure * 0.15 / t, RotorSafety.Assess(rotor, Speed6000Rpm).MagnetLoadStressPa!.Value, 1e-12);
    }

    [Fact]
    public void MissingRetainerData_IsNotAssessed_NotANumber()
    {
        var noRing = RotorSafety.Assess(Rotor(retainerM: null), Speed6000Rpm);
        Assert.Equal(RetainerAssessment.NoRetainerThickness, noRing.Assessment);
        Assert.Null(noRing.HoopStressPa);
        Assert.Null(noRing.MarginFraction);
        RelAssert.Close(Speed6000Rpm * 0.15, noRing.RimSpeedMPerS, 1e-12, what: "rim speed at the magnets' outer radius");

        var noAllowable = RotorSafety.Assess(Rotor(allowablePa: null), Speed6000Rpm);
        Assert.Equal(RetainerAssessment.NoAllowableStress, noAllowable.Assessment);
        Assert.NotNull(noAllowable.HoopStressPa);
        Assert.Null(noAllowable.MarginFraction);
        Assert.Null(noAllowable.SpeedAtAllowableRadPerS);
    }

    [Fact]
    public void MagnetDensity_DefaultsToSinteredNdFeB_WhenTheRowHasNone()
    {
        var stated = RotorSafety.Assess(Rotor(magnetDensity: 7500), Speed6000Rpm);
        var defaulted = RotorSafety.Assess(Rotor(magnetDensity: null), Speed6000Rpm);
        Assert.Equal(stated.HoopStressPa, defaulted.HoopStressPa);
        var composite = RotorSafety.Assess(Rotor(), Speed6000Rpm, new RotorSafetyOptions { RetainerDensityKgM3 = 1600 });
        RelAssert.Close(stated.RingOwnStressPa!.Value * 1600 / 7850, composite.RingOwnStressPa!.Value, 1e-12, what: "own stress scales with ring density");
    }

    [Fact]
    public void AtRatedSpeed_FlagsNothingAbove_AndAssessesTheRatedSpeed()
    {
        var rated = RotorSafety.AtRatedSpeed(Rotor(maxRpm: 7000));
        RelAssert.Close(Units.RpmToRadPerS(7000), rated.SpeedRadPerS, 1e-12);
        Assert.False(rated.AboveRatedSpeed);
        Assert.True(RotorSafety.Assess(Rotor(maxRpm: 7000), Units.RpmToRadPerS(7100)).AboveRatedSpeed);
        Assert.Throws<ArgumentOutOfRangeException>(() => RotorSafety.Assess(Rotor(), 0));
    }

    [FsCheck.Xunit.Property(MaxTest = 100)]
    public bool Stress_GrowsAsSpeedSquared_AndTheMarginVanishesAtTheAllowableSpeed(ushort rpmCode)
    {
        // Both stress terms scale with omega^2 (thin ring and centrifugal load), so (1 + m1)/(1 + m2) = (w2/w1)^2 and
        // the margin is zero at the reported speed at allowable.
        double w1 = Units.RpmToRadPerS(500 + rpmCode % 9000), w2 = 1.7 * w1;
        var a = RotorSafety.Assess(Rotor(), w1);
        var b = RotorSafety.Assess(Rotor(), w2);
        var atAllowable = RotorSafety.Assess(Rotor(), a.SpeedAtAllowableRadPerS!.Value);
        return Math.Abs((1 + a.MarginFraction!.Value) / (1 + b.MarginFraction!.Value) - 1.7 * 1.7) < 1e-9
            && Math.Abs(atAllowable.MarginFraction!.Value) < 1e-9;
    }

    [Fact]
    public void Passes_IsTheOneBurstVerdict_FromMarginAndRatedSpeed()
    {
        // Definition of the margin (allowable / stress - 1) and of the rated speed; no outside value needed.
        var ok = RotorSafety.Assess(Rotor(), Speed6000Rpm);
        Assert.True(ok.MarginFraction >= 0);
        Assert.Equal(true, ok.Passes);
        var weak = RotorSafety.Assess(Rotor(allowablePa: 1e6), Speed6000Rpm);
        Assert.True(weak.MarginFraction < 0);
        Assert.Equal(false, weak.Passes);
        var fast = RotorSafety.Assess(Rotor(maxRpm: 5000), Speed6000Rpm);
        Assert.True(fast.MarginFraction >= 0);
        Assert.Equal(false, fast.Passes);
        Assert.Null(RotorSafety.Assess(Rotor(retainerM: null), Speed6000Rpm).Passes);
        Assert.Null(RotorSafety.Assess(Rotor(allowablePa: null), Speed6000Rpm).Passes);
    }
}

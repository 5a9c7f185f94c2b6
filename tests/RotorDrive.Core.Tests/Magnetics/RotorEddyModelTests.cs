using System.Numerics;
using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;
using MathNet.Numerics.Integration;
using RotorDrive.Core.Magnetics;
using RotorDrive.Core.Tests.Loads;
using Xunit;
using RotorDrive.Core.Tests.Support;

namespace RotorDrive.Core.Tests.Magnetics;

public class RotorEddyModelTests
{
    // The quadrature must equal the annulus integrals of ../DESIGN.md §4.3 computed independently: the strip pressures
    // from the public pieces (Halbach field, layer response, Russell-Norsworthy factor) integrated with MathNet's
    // high-order Gauss-Legendre rule (200 points) over [r_i, r_o]. The integrand is smooth, so 24 points suffice.
    [Theory]
    [InlineData(300.0, 0.010, true)]
    [InlineData(30.0, 0.005, true)]
    [InlineData(600.0, 0.020, false)]
    public void Quadrature_MatchesIndependentAnnulusIntegrals(double speed, double gap, bool endCorrection)
    {
        RotorDesign rotor = TestRigs.Rotor;
        double sigma = 25e6, d = 0.006;
        var model = new RotorEddyModel(rotor, d, endCorrection);
        EddyForces f = model.Evaluate(sigma, speed, gap);

        int p = rotor.PolePairs;
        EddyPressure Strip(double r)
        {
            double k = p / r;
            double endFactor = endCorrection ? EndEffect.RussellNorsworthyFactor(k, rotor.ActiveWidthM / 2) : 1.0;
            double bs = HalbachSource.FieldT(rotor.RemanenceT, rotor.SegmentsPerWavelength, rotor.MagnetThicknessM, k, gap);
            Complex reflection = PlateResponse.Reflection(k, d, sigma * endFactor, p * speed);
            return EddyPressure.FromReflection(bs, reflection);
        }
        double lift = GaussLegendreRule.Integrate(r => Strip(r).LiftPa * 2 * Math.PI * r, rotor.InnerRadiusM, rotor.OuterRadiusM, 200);
        double torque = GaussLegendreRule.Integrate(r => Strip(r).DragPa * r * 2 * Math.PI * r, rotor.InnerRadiusM, rotor.OuterRadiusM, 200);
        RelAssert.Close(lift, f.LiftN, 1e-9, "lift");
        RelAssert.Close(torque, f.TorqueNm, 1e-9, "torque");
    }

    // Conservation: the power dissipated in the plate (drag pressure times local slip speed omega r, over the annulus)
    // equals eddy torque times shaft speed, to rounding.
    [Property(MaxTest = 100)]
    public Property EddyPower_EqualsTorqueTimesSpeed()
        => Prop.ForAll(TestRigs.Rotors.ToArbitrary(), TestRigs.Plates.ToArbitrary(), Speeds.ToArbitrary(), (rotor, plate, speed) =>
        {
            EddyForces f = new RotorEddyModel(rotor, plate.ThicknessM).Evaluate(plate.Material.ConductivitySPerM, speed, 0.01);
            return RelAssert.IsClose(f.TorqueNm * speed, f.PowerW, 1e-9);
        });

    // ../DESIGN.md §4.3: conductivity and speed enter only through sigma omega, so trading one for the other changes
    // neither lift nor torque.
    [Property(MaxTest = 100)]
    public Property Forces_DependOnConductivityAndSpeedOnlyThroughTheirProduct()
    {
        var factor = Gen.Choose(-300, 300).Select(i => Math.Pow(10, i / 100.0));
        return Prop.ForAll(TestRigs.Rotors.ToArbitrary(), Speeds.ToArbitrary(), factor.ToArbitrary(), (rotor, speed, c) =>
        {
            var model = new RotorEddyModel(rotor, 0.006);
            EddyForces a = model.Evaluate(25e6, speed, 0.008);
            EddyForces b = model.Evaluate(25e6 * c, speed / c, 0.008);
            return RelAssert.IsClose(a.LiftN, b.LiftN, 1e-12) && RelAssert.IsClose(a.TorqueNm, b.TorqueNm, 1e-12);
        });
    }

    // Mirror: reversing the spin flips the torque and keeps the lift (R of reversed motion is the conjugate).
    [Property(MaxTest = 100)]
    public Property ReversedSpin_FlipsTorque_AndKeepsLift()
        => Prop.ForAll(TestRigs.Rotors.ToArbitrary(), TestRigs.Plates.ToArbitrary(), Speeds.ToArbitrary(), (rotor, plate, speed) =>
        {
            var model = new RotorEddyModel(rotor, plate.ThicknessM);
            EddyForces forward = model.Evaluate(plate.Material.ConductivitySPerM, speed, 0.01);
            EddyForces backward = model.Evaluate(plate.Material.ConductivitySPerM, -speed, 0.01);
            return backward.LiftN == forward.LiftN && backward.TorqueNm == -forward.TorqueNm && backward.PowerW == forward.PowerW;
        });

    // 2-D strip (Reitz 1970; ../DESIGN.md §4.1): the plate's response does not depend on the gap, and the source field
    // carries e^(-k g), so at a single radius (single k) lift and drag scale exactly as e^(-2 k g).
    [Property(MaxTest = 200)]
    public Property StripLift_ScalesAsExpMinusTwoKg()
    {
        var k = Gen.Choose(10, 400).Select(i => (double)i);
        var gaps = Gen.Two(Gen.Choose(0, 40_000).Select(i => i * 1e-6));
        return Prop.ForAll(k.ToArbitrary(), gaps.ToArbitrary(), Speeds.ToArbitrary(), (kk, g, speed) =>
        {
            Complex r = PlateResponse.Reflection(kk, 0.006, 25e6, 4 * speed);
            EddyPressure at1 = EddyPressure.FromReflection(HalbachSource.FieldT(1.3, 4, 0.005, kk, g.Item1), r);
            EddyPressure at2 = EddyPressure.FromReflection(HalbachSource.FieldT(1.3, 4, 0.005, kk, g.Item2), r);
            double expected = Math.Exp(-2 * kk * (g.Item2 - g.Item1));
            return RelAssert.IsClose(expected, at2.LiftPa / at1.LiftPa, 1e-12) && RelAssert.IsClose(expected, at2.DragPa / at1.DragPa, 1e-12);
        });
    }

    // The end correction lowers the effective conductivity, so at low speed (lift ~ (sigma omega)^2, torque ~ sigma omega)
    // it lowers both: the 2-D strip model without it over-predicts.
    [Fact]
    public void EndCorrection_LowersLiftAndDrag_AtLowSpeed()
    {
        EddyForces with = new RotorEddyModel(TestRigs.Rotor, 0.006, true).Evaluate(25e6, 20, 0.01);
        EddyForces without = new RotorEddyModel(TestRigs.Rotor, 0.006, false).Evaluate(25e6, 20, 0.01);
        Assert.True(with.LiftN < 0.8 * without.LiftN && with.TorqueNm < 0.9 * without.TorqueNm, $"with {with}, without {without}");
    }

    [Fact]
    public void Constructor_RejectsAnInsideOutAnnulus()
        => Assert.Throws<ArgumentOutOfRangeException>(() => new RotorEddyModel(TestRigs.Rotor with { OuterRadiusM = 0.05 }, 0.006));

    private static Gen<double> Speeds => Gen.Choose(1, 12000).Select(rpm => Units.RpmToRadPerS(rpm));
}

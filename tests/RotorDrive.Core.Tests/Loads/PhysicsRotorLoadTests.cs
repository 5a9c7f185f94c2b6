using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;
using RotorDrive.Core.Loads;
using RotorDrive.Core.Magnetics;
using RotorDrive.Core.Tests.Magnetics;
using Xunit;
using RotorDrive.Core.Tests.Support;

namespace RotorDrive.Core.Tests.Loads;

public class PhysicsRotorLoadTests
{
    private static readonly PhysicsRotorLoad Load = new(TestRigs.Rotor, TestRigs.AluminiumPlate);

    // ../DESIGN.md §4.4: Br(T) = Br20 (1 + beta (T - 20)); eddy forces go as the square of the field, so lift, eddy torque
    // and eddy power scale by (Br(T)/Br20)^2 while windage and bearing drag do not change.
    [Theory]
    [InlineData(80.0)]
    [InlineData(-10.0)]
    public void MagnetTemperature_ScalesEddyLoadsBySquaredRemanenceRatio(double magnetTempC)
    {
        LoadPoint cold = Load.Evaluate(300, 0.01, 20, 20);
        LoadPoint hot = Load.Evaluate(300, 0.01, 20, magnetTempC);
        double ratio = 1 + TestRigs.Rotor.RemanenceTempCoeffPerK * (magnetTempC - 20);
        RelAssert.Close(cold.LiftN * ratio * ratio, hot.LiftN, 1e-13, "lift");
        RelAssert.Close(cold.EddyTorqueNm * ratio * ratio, hot.EddyTorqueNm, 1e-13, "eddy torque");
        RelAssert.Close(cold.EddyPowerW * ratio * ratio, hot.EddyPowerW, 1e-13, "eddy power");
        Assert.Equal(cold.WindageTorqueNm, hot.WindageTorqueNm);
        Assert.Equal(cold.BearingTorqueNm, hot.BearingTorqueNm);
    }

    // ../DESIGN.md §4.3-4.4: the plate temperature acts only through sigma(T) omega: a hot plate at one speed gives the eddy
    // lift and torque of a cold plate at the speed with the same product (sigma from IEC 60028's form).
    [Fact]
    public void PlateTemperature_ActsOnlyThroughConductivityTimesSpeed()
    {
        double sigmaHot = TestRigs.Aluminium6061.ConductivityAt(100), sigmaCold = TestRigs.Aluminium6061.ConductivityAt(0);
        LoadPoint hot = Load.Evaluate(400, 0.01, 100, 20);
        LoadPoint cold = Load.Evaluate(400 * sigmaHot / sigmaCold, 0.01, 0, 20);
        RelAssert.Close(hot.LiftN, cold.LiftN, 1e-12, "lift");
        RelAssert.Close(hot.EddyTorqueNm, cold.EddyTorqueNm, 1e-12, "eddy torque");
    }

    // Lift rises with speed (more sigma omega pushes R towards -1) and falls with gap (e^(-2 k g) at every radius):
    // Reitz (1970) for the strip, integrated over the annulus.
    [Property(MaxTest = 150)]
    public Property Lift_RisesWithSpeed_AndFallsWithGap()
    {
        var speeds = Gen.Two(Gen.Choose(0, 20000).Select(rpm => Units.RpmToRadPerS(rpm)));
        var gaps = Gen.Two(Gen.Choose(1000, 40000).Select(um => um * 1e-6));
        var setup = from rotor in TestRigs.Rotors from plate in TestRigs.Plates select (rotor, plate);
        return Prop.ForAll(setup.ToArbitrary(), speeds.ToArbitrary(), gaps.ToArbitrary(), (rp, w, g) =>
        {
            (RotorDesign rotor, Plate plate) = rp;
            var load = new PhysicsRotorLoad(rotor, plate);
            (double slow, double fast) = (Math.Min(w.Item1, w.Item2), Math.Max(w.Item1, w.Item2));
            (double near, double far) = (Math.Min(g.Item1, g.Item2), Math.Max(g.Item1, g.Item2));
            bool rises = load.Evaluate(slow, near, 20, 20).LiftN <= load.Evaluate(fast, near, 20, 20).LiftN * (1 + 1e-12);
            bool falls = load.Evaluate(fast, near, 20, 20).LiftN >= load.Evaluate(fast, far, 20, 20).LiftN;
            return rises && falls;
        });
    }

    // Reitz (1970): over a thin sheet each strip's drag goes as s/(1 + s^2), which has one maximum; across an annulus
    // the strips peak at nearby speeds, so the rotor's eddy torque has exactly one interior maximum.
    [Property(MaxTest = 60)]
    public Property EddyTorque_HasOneInteriorMaximum_OverAThinPlate()
    {
        var thin = Gen.Choose(2, 10).Select(tenthMm => new Plate(TestRigs.Aluminium6061, tenthMm * 1e-4));
        return Prop.ForAll(TestRigs.Rotors.ToArbitrary(), thin.ToArbitrary(), (rotor, plate) =>
        {
            var load = new PhysicsRotorLoad(rotor, plate);
            var torque = Enumerable.Range(0, 241).Select(i => load.Evaluate(Math.Pow(10, -1 + i / 40.0), 0.01, 20, 20).EddyTorqueNm).ToArray();
            int maxima = Enumerable.Range(1, torque.Length - 2).Count(i => torque[i] > torque[i - 1] && torque[i] >= torque[i + 1]);
            return maxima == 1 && torque[0] < torque.Max() && torque[^1] < torque.Max();
        });
    }

    // Mirror: reversing spin flips every torque and the sign of nothing else.
    [Property(MaxTest = 100)]
    public Property ReversedSpin_FlipsTorques_AndKeepsLiftAndPower()
    {
        var speed = Gen.Choose(1, 12000).Select(rpm => Units.RpmToRadPerS(rpm));
        return Prop.ForAll(TestRigs.Rotors.ToArbitrary(), TestRigs.Plates.ToArbitrary(), speed.ToArbitrary(), (rotor, plate, w) =>
        {
            var load = new PhysicsRotorLoad(rotor with { BearingDragNm = 0.01, BearingDampingNmPerRadPerS = 1e-5 }, plate);
            LoadPoint a = load.Evaluate(w, 0.01, 30, 25);
            LoadPoint b = load.Evaluate(-w, 0.01, 30, 25);
            return b.LiftN == a.LiftN && b.EddyTorqueNm == -a.EddyTorqueNm && b.WindageTorqueNm == -a.WindageTorqueNm
                && b.BearingTorqueNm == -a.BearingTorqueNm && b.EddyPowerW == a.EddyPowerW && b.TotalTorqueNm == -a.TotalTorqueNm;
        });
    }

    [Fact]
    public void Evaluate_RejectsNaNSpeed()
        => Assert.Throws<ArgumentOutOfRangeException>(() => Load.Evaluate(double.NaN, 0.01, 20, 20));

    [Fact]
    public void Evaluate_RejectsAPlateTemperatureThatKillsTheConductivity()
        => Assert.Throws<ArgumentOutOfRangeException>(() => Load.Evaluate(100, 0.01, -300, 20));
}

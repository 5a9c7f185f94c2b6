using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;
using RotorDrive.Core.Loads;
using RotorDrive.Core.Magnetics;
using RotorDrive.Core.Tests.Magnetics;
using Xunit;
using RotorDrive.Core.Tests.Support;

namespace RotorDrive.Core.Tests.Loads;

public class TabulatedRotorLoadTests
{
    private const double RelativeTarget = 1e-3;
    private const double FloorOfLargest = 1e-6;

    private static readonly TabulatedRotorLoad Table = RotorLoadTable.Build(
        TestRigs.Rotor, TestRigs.AluminiumPlate, new LoadTableRange(TestRigs.Rotor.MaxSpeedRadPerS, 0.0025, 0.030, -20, 120));

    // Issue 3 accuracy target: against direct quadrature, the table's lift and eddy torque are within 0.1 % of the value,
    // or within 1e-6 of the range's largest value where the value is near zero, over 0..rated speed, gaps from half the
    // landed gap to three times the design gap and plate temperatures from -20 C to the plate limit, for any valid rotor
    // and plate, for the three-dimensional model and the two-dimensional one with the end correction.
    [Property(MaxTest = 40)]
    public Property Table_MatchesDirectQuadrature_WithinTarget()
    {
        var setup =
            from rotor in TestRigs.Rotors
            from plate in TestRigs.Plates
            from designMm in Gen.Choose(4, 20)
            from landedPercent in Gen.Choose(20, 90)
            from hotC in Gen.Choose(40, 200)
            from endCorrection in Gen.Elements(true, false)
            from seed in Gen.Choose(0, int.MaxValue)
            select (rotor, plate, designMm / 1000.0, designMm * landedPercent / 100000.0, (double)hotC, endCorrection, seed);
        return Prop.ForAll(setup.ToArbitrary(), s =>
        {
            (RotorDesign rotor, Plate plate, double design, double landed, double hot, bool endCorrection, int seed) = s;
            var range = new LoadTableRange(rotor.MaxSpeedRadPerS, 0.5 * landed, 3 * design, -20, hot);
            TabulatedRotorLoad table = RotorLoadTable.Build(rotor, plate, range, new LoadModelOptions { Model = endCorrection ? LoadModelKind.TwoDimensional : LoadModelKind.ThreeDimensional });
            return WorstError(table, range, new Random(seed), 150) <= 1.0;
        });
    }

    // The same target on the representative rotor with many points, including very low speeds (log-uniform).
    [Fact]
    public void Table_MatchesDirectQuadrature_OnTheRepresentativeRotor()
    {
        double worst = WorstError(Table, Table.Range, new Random(12345), 3000);
        Assert.True(worst <= 1.0, $"worst error is {worst:G3} of the allowed");
    }

    // At a node the table holds the direct value itself (no interpolation).
    [Fact]
    public void Table_AtANode_EqualsTheDirectModel()
    {
        double x = Table.SigmaOmegaMax;
        (double lift, double torque) = Table.EddyAtSigmaOmega(x, Table.Range.MaxGapM);
        (double directLift, double directTorque) = Table.Direct.EddyAtSigmaOmega(x, Table.Range.MaxGapM);
        RelAssert.Close(directLift, lift, 1e-12, "lift");
        RelAssert.Close(directTorque, torque, 1e-12, "torque");
    }

    // Mirror on the table: torque odd in speed, lift even.
    [Property(MaxTest = 200)]
    public Property ReversedSpin_FlipsTorque_AndKeepsLift()
    {
        var speed = Gen.Choose(0, 6000).Select(rpm => Units.RpmToRadPerS(rpm));
        var gap = Gen.Choose(2500, 30000).Select(um => um * 1e-6);
        return Prop.ForAll(speed.ToArbitrary(), gap.ToArbitrary(), (w, g) =>
        {
            LoadPoint a = Table.Evaluate(w, g, 40, 30);
            LoadPoint b = Table.Evaluate(-w, g, 40, 30);
            return b.LiftN == a.LiftN && b.EddyTorqueNm == -a.EddyTorqueNm && b.TotalTorqueNm == -a.TotalTorqueNm && b.EddyPowerW == a.EddyPowerW;
        });
    }

    [Fact]
    public void Table_AtRest_GivesNoLiftAndNoTorque()
    {
        LoadPoint p = Table.Evaluate(0, 0.01, 20, 20);
        Assert.Equal(new LoadPoint(0, 0, 0, 0, 0), p);
    }

    // Outside its range the table answers with the direct model, exactly.
    [Theory]
    [InlineData(300.0, 0.001)]
    [InlineData(300.0, 0.05)]
    [InlineData(2000.0, 0.01)]
    public void Table_OutsideItsRange_AnswersWithTheDirectModel(double speed, double gap)
    {
        LoadPoint direct = Table.Direct.Evaluate(speed, gap, -20, 20);
        LoadPoint table = Table.Evaluate(speed, gap, -20, 20);
        Assert.Equal(direct.LiftN, table.LiftN);
        Assert.Equal(direct.EddyTorqueNm, table.EddyTorqueNm);
        Assert.Equal(direct.TotalTorqueNm, table.TotalTorqueNm);
        // The table reports torque x speed; the direct model sums the plate loss itself: equal to rounding.
        RelAssert.Close(direct.EddyPowerW, table.EddyPowerW, 1e-12, "eddy power");
    }

    // Lookups allocate nothing (hot loops in analyses and Monte Carlo call them millions of times).
    [Fact]
    public void Lookups_AllocateNothing()
    {
        double sum = Table.Evaluate(100, 0.01, 20, 20).LiftN;
        long before = GC.GetAllocatedBytesForCurrentThread();
        for (int i = 0; i < 10_000; i++)
        {
            sum += Table.Evaluate(i * 0.06, 0.003 + i * 2e-6, 20 + i * 1e-3, 20).TotalTorqueNm;
        }
        long allocated = GC.GetAllocatedBytesForCurrentThread() - before;
        Assert.True(double.IsFinite(sum));
        Assert.Equal(0, allocated);
    }

    [Fact]
    public void Build_RejectsAnEmptyGapRange()
        => Assert.Throws<ArgumentOutOfRangeException>(() => RotorLoadTable.Build(TestRigs.Rotor, TestRigs.AluminiumPlate, new LoadTableRange(600, 0.01, 0.01, -20, 100)));

    // Largest error over random points as a fraction of the allowed error (<= 1 passes).
    private static double WorstError(TabulatedRotorLoad table, LoadTableRange range, Random random, int points)
    {
        double liftFloor = FloorOfLargest * table.LargestLiftN, torqueFloor = FloorOfLargest * table.LargestTorqueNm;
        double worst = 0;
        for (int i = 0; i < points; i++)
        {
            // Half the speeds uniform, half log-uniform over six decades so that the low-speed end is exercised.
            double fraction = i % 2 == 0 ? random.NextDouble() : Math.Pow(10, -6 * random.NextDouble());
            double speed = fraction * range.MaxSpeedRadPerS;
            double gap = range.MinGapM + random.NextDouble() * (range.MaxGapM - range.MinGapM);
            double plateC = range.MinPlateTempC + random.NextDouble() * (range.MaxPlateTempC - range.MinPlateTempC);
            LoadPoint t = table.Evaluate(speed, gap, plateC, 20);
            LoadPoint d = table.Direct.Evaluate(speed, gap, plateC, 20);
            worst = Math.Max(worst, Math.Abs(t.LiftN - d.LiftN) / Math.Max(RelativeTarget * Math.Abs(d.LiftN), liftFloor));
            worst = Math.Max(worst, Math.Abs(t.EddyTorqueNm - d.EddyTorqueNm) / Math.Max(RelativeTarget * Math.Abs(d.EddyTorqueNm), torqueFloor));
        }
        return worst;
    }
}

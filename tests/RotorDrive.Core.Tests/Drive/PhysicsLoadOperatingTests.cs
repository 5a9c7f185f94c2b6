using FsCheck;
using FsCheck.Fluent;
using RotorDrive.Core.Craft;
using RotorDrive.Core.Drive;
using RotorDrive.Core.Loads;
using RotorDrive.Core.Magnetics;
using Xunit;

namespace RotorDrive.Core.Tests.Drive;

/// <summary>A random rotor over a random plate with the precomputed physics load, and a random drive at full duty.</summary>
public sealed record PhysicsCase(StationDrive Drive, OperatingConditions Conditions)
{
    public override string ToString()
    {
        var r = Drive.Rotor;
        var d = Drive.Drivetrain;
        return $"rotor N={r.Segments} ri={r.InnerRadiusM:G3} ro={r.OuterRadiusM:G3} h={r.MagnetThicknessM:G3} gap={Conditions.GapM:G3} " +
               $"Kv={d.Motor.KvRpmPerV:G4} R={d.Motor.ResistanceOhm:G3} lim={d.CurrentLimitA:G4} S={Drive.Packs.CellsSeries}";
    }
}

public static class PhysicsCaseGenerators
{
    // The drive is sized around the rotor's drag peak so that one, two or three crossings all occur: free speed 1.5 to 6
    // times the peak speed, current-limited torque 0.4 to 1.3 times the peak torque.
    public static Arbitrary<PhysicsCase> PhysicsCases() => Arb.From(
        from pairs in Gen.Choose(4, 10)
        from inner in DriveGenerators.Uniform(0.03, 0.09)
        from width in DriveGenerators.Uniform(0.02, 0.06)
        from thickness in DriveGenerators.Uniform(0.003, 0.02)
        from copper in Gen.Elements(false, true)
        from plateMm in DriveGenerators.Uniform(2, 20)
        from gap in DriveGenerators.Uniform(0.004, 0.02)
        from freeOverPeak in DriveGenerators.Uniform(1.5, 6)
        from limitOverPeak in DriveGenerators.Uniform(0.4, 1.3)
        from resistance in DriveGenerators.LogUniform(0.005, 0.1)
        from noLoad in DriveGenerators.Uniform(0.5, 3)
        from cells in Gen.Choose(6, 14)
        from soc in DriveGenerators.Uniform(0.1, 1)
        select Build(pairs, inner, width, thickness, copper, plateMm, gap, freeOverPeak, limitOverPeak, resistance, noLoad, cells, soc));

    private static PhysicsCase Build(int pairs, double inner, double width, double thickness, bool copper, double plateMm, double gap,
        double freeOverPeak, double limitOverPeak, double resistance, double noLoad, int cells, double soc)
    {
        var rotor = new RotorDesign("r", 4 * pairs, 4, inner, inner + width, thickness, 1.3, -0.0012, 7500, 2, 0.02, 1000, 0.01, 1e-5, null, null);
        var plate = new Plate(copper ? new PlateMaterial("cu", 58e6, 0.00393, 8960, 385) : new PlateMaterial("al", 25e6, 0.0039, 2700, 896), plateMm / 1000);
        var peak = DragPeakFinder.Find(new PhysicsRotorLoad(rotor, plate), gap, 20, 20, 5000);
        var packs = new PackBank(new BatteryPack("p", "lipo", cells, 4, 5, 20, 40, 0.003, 1), 1, new CellCurve("lipo", [0.0, 0.5, 1.0], [3.3, 3.8, 4.2]));
        double volts = packs.OpenCircuitVoltageAt(soc);
        double kv = freeOverPeak * peak.SpeedRadPerS / volts;
        double limit = limitOverPeak * peak.TorqueNm * kv + noLoad;
        var motor = new Motor("m", kv, resistance, noLoad, 10, 100, 5000, 14, 1, null, null, null);
        var controller = DriveParts.Controller(burstCurrentA: limit, continuousCurrentA: limit, onResistanceOhm: 0.002, idleCurrentA: 0.05);
        double top = 1.2 * kv * packs.OpenCircuitVoltageAt(1.0);
        var load = RotorLoadTable.Build(rotor, plate, new LoadTableRange(top, 0.002, 0.03, 0, 40, SpeedPoints: 64, GapPoints: 24));
        return new PhysicsCase(
            new StationDrive(new Drivetrain(motor, controller), packs, rotor with { MaxSpeedRadPerS = top }, load, DriveParts.Limits().Station),
            OperatingConditions.Uniform(gap, 20, soc));
    }
}

public class PhysicsLoadOperatingTests
{
    // Against a brute-force reference on the precomputed physics load (layer model, Reitz 1970 / Bird & Lipo 2007): every
    // crossing that 8 000 samples (evenly and log-spaced) bracket is reported by the finder.
    [FsCheck.Xunit.Property(Arbitrary = [typeof(PhysicsCaseGenerators)], MaxTest = 25)]
    public void Finder_FindsEveryCrossing_OnThePhysicsLoad(PhysicsCase c)
    {
        var result = OperatingPointFinder.Find(c.Drive, ThrottleCommand.Duty(1), c.Conditions);
        double top = result.SearchTopRadPerS;
        var source = BusSource.FromPack(c.Drive.Packs, c.Conditions.SocFraction);
        double F(double w)
        {
            var input = new DriveInput(c.Drive.Drivetrain, DriveCommand.Duty(1), w, 20, 20, false);
            DriveBus.Solve(source, in input, out var p);
            return p.TorqueNm - c.Drive.Load.Evaluate(w, c.Conditions.GapM, 20, 20).TotalTorqueNm;
        }
        var xs = Enumerable.Range(0, 4_000).Select(i => top * (i + 1) / 4_000.0)
            .Concat(Enumerable.Range(0, 4_000).Select(i => top * Math.Pow(10, -7 + 7.0 * i / 4_000)))
            .Order().ToArray();
        var crossings = result.Equilibria.Where(e => e.Kind == EquilibriumKind.Crossing).Select(e => e.SpeedRadPerS).ToArray();
        double previous = F(xs[0]);
        for (int i = 1; i < xs.Length; i++)
        {
            double f = F(xs[i]);
            if ((previous > 0) != (f > 0))
            {
                double lo = xs[i - 1], hi = xs[i];
                Assert.True(crossings.Any(w => w >= lo - 1e-9 * top && w <= hi + 1e-9 * top), $"no crossing reported in [{lo}, {hi}] (top {top}); found [{string.Join(", ", crossings)}]");
            }
            previous = f;
        }
    }
}

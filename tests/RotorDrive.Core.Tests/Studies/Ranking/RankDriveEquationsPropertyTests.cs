using FsCheck;
using FsCheck.Fluent;
using RotorDrive.Core.Drive;
using RotorDrive.Core.Studies.Ranking;
using RotorDrive.Core.Tests.Support;
using Xunit;

namespace RotorDrive.Core.Tests.Studies.Ranking;

// Issue 13: ranking's fast kernel keeps a specialised copy of the drive equations (RankDriveEquations); this holds it equal
// to the shared ones hover uses (Motor, Drivetrain, PackBank, BusSource, DriveBus with motor-current commands) to 1e-9
// relative over random motors, controllers, packs, temperatures, speeds and torques. Both are the first-order motor model
// (M. Drela, "First-Order DC Electric Motor Model", MIT, 2007), the averaged switch and a Thevenin pack; for fixed motor
// currents the bus is a closed-form quadratic, so the two may differ only by rounding.
public class RankDriveEquationsPropertyTests
{
    private const double Tolerance = 1e-9;

    private sealed record Case(
        double KvRpmPerV, double WindingOhm, double NoLoadA, double OnOhm, double IdleA, int Cells, double CellOhm, int PackCount,
        double Soc, double WindingTempC, double MagnetTempC, double[] TorquesNm, double[] SpeedsRadPerS);

    private static Gen<double> Range(double low, double high) => Gen.Choose(0, 1_000_000).Select(k => low + (high - low) * k / 1e6);

    private static Gen<Case> Cases() =>
        from kv in Range(60, 400)
        from r in Range(0.005, 0.15)
        from i0 in Range(0.1, 3)
        from ron in Range(0.0005, 0.01)
        from idle in Range(0, 0.1)
        from cells in Gen.Choose(6, 14)
        from cellOhm in Range(0.0005, 0.01)
        from count in Gen.Choose(1, 3)
        from soc in Range(0.05, 1)
        from tw in Range(-10, 120)
        from tm in Range(-10, 100)
        from n in Gen.Choose(1, 8)
        from torques in Range(0, 2.5).ArrayOf(n)
        from speeds in Range(10, 350).ArrayOf(n)
        select new Case(kv, r, i0, ron, idle, cells, cellOhm, count, soc, tw, tm, torques, speeds);

    [Fact]
    public void KernelDriveEquations_EqualTheSharedOnes_OverRandomInputs()
    {
        int compared = 0, collapsed = 0;
        var property = Prop.ForAll(Cases().ToArbitrary(), c =>
        {
            switch (Compare(c))
            {
                case Outcome.Compared:
                    compared++;
                    break;
                case Outcome.Collapsed:
                    collapsed++;
                    break;
            }
        });
        Check.One(Config.QuickThrowOnFailure.WithMaxTest(400).WithQuietOnSuccess(true), property);
        // Not vacuous: most random cases reach a hover both paths solve, and some lie past the pack's maximum power.
        Assert.True(compared >= 200, $"only {compared} of 400 cases were compared");
        Assert.True(collapsed > 0, "no case where the bus collapses");
    }

    private enum Outcome { Compared, Collapsed, OverDuty }

    private static Outcome Compare(Case c)
    {
        var motor = new Motor("m", Units.RpmToRadPerS(c.KvRpmPerV), c.WindingOhm, c.NoLoadA, 10, 1e6, 1e9, 14, 0.3, null, null, null);
        var controller = new SpeedController("c", 1e6, 1e6, 10, 1, 64, c.OnOhm, c.IdleA, 1e9, 0.05, true);
        var pack = new BatteryPack("p", "sloped", c.Cells, 1, 10, 30, 60, c.CellOhm, 1);
        var curve = new CellCurve("sloped", [0.0, 1.0], [3.3, 4.2]);
        var bank = new PackBank(pack, c.PackCount, curve);
        // As hover judges a current-commanded station: no current limit or duty clamp below 1 may interfere.
        var train = new Drivetrain(motor, controller, new DriveOptions(CurrentLimitScale: 1e9, MaxDuty: 1.0));
        double flux = train.FluxFactorAt(c.MagnetTempC);
        double winding = motor.ResistanceAt(c.WindingTempC);
        int n = c.TorquesNm.Length;

        // The kernel.
        var current = new double[n];
        var num = new double[n];
        var motorPower = new double[n];
        double sumP = 0, numMax = 0;
        for (int i = 0; i < n; i++)
        {
            RankDriveEquations.Station(c.TorquesNm[i], c.SpeedsRadPerS[i], motor.KvRadPerSPerV, flux, motor.NoLoadCurrentA, winding,
                controller.OnResistanceOhm, out current[i], out num[i], out motorPower[i]);
            sumP += num[i] * current[i];
            numMax = Math.Max(numMax, num[i]);
        }
        double voc = RankDriveEquations.OpenCircuitV(pack.CellsSeries, curve.OcvAt(c.Soc));
        double rb = RankDriveEquations.BankResistanceOhm(pack, c.PackCount);
        bool busOk = RankDriveEquations.Bus(voc, rb, n * controller.IdleCurrentA, sumP, out double v, out double ipack);

        // The shared equations.
        var source = BusSource.FromPack(bank, c.Soc);
        RelAssert.Close(source.OpenCircuitVoltageV, voc, Tolerance, "open-circuit voltage");
        RelAssert.Close(source.ResistanceOhm, rb, Tolerance, "bank resistance");
        var inputs = new DriveInput[n];
        for (int i = 0; i < n; i++)
        {
            inputs[i] = new DriveInput(train, DriveCommand.MotorCurrent(motor.CurrentForTorqueA(c.TorquesNm[i], flux)), c.SpeedsRadPerS[i],
                c.WindingTempC, c.MagnetTempC, Braking: false);
        }
        var points = new DrivePoint[n];
        var solution = DriveBus.Solve(source, inputs, points);

        if (!busOk)
        {
            // No constant-power bus at or above Voc / 2: DriveBus finds no root, reports the collapse, or (holding the
            // currents would need more than full duty) clamps a controller at full duty; either way the hover is not
            // delivered, which is how the direct evaluation reads it.
            Assert.True(solution.Status != BusStatus.Solved || points.Any(p => p.Regime != DriveRegime.Regulating),
                $"the kernel finds no bus, DriveBus delivers every current at {solution.BusVoltageV} V");
            return Outcome.Collapsed;
        }
        Assert.Equal(BusStatus.Solved, solution.Status);
        if (numMax / v > 1)
        {
            // The hover needs more than full duty: the shared controller clamps (ranking rejects it on duty headroom).
            Assert.Contains(points[..n], p => p.Regime != DriveRegime.Regulating);
            return Outcome.OverDuty;
        }
        RelAssert.Close(solution.BusVoltageV, v, Tolerance, "bus voltage");
        RelAssert.Close(solution.PackCurrentA, ipack, Tolerance, "pack current");
        for (int i = 0; i < n; i++)
        {
            var p = points[i];
            Assert.Equal(DriveRegime.Regulating, p.Regime);
            RelAssert.Close(p.MotorCurrentA, current[i], Tolerance, "motor current");
            // Drela's torque from that current, Q = phi (I - I0) / Kv, gives back the kernel's torque.
            RelAssert.Close(c.TorquesNm[i], p.TorqueNm, Tolerance, 1e-12, "torque");
            RelAssert.Close(p.Duty, num[i] / v, Tolerance, "duty");
            RelAssert.Close(p.MotorInputPowerW, motorPower[i], Tolerance, "motor input power");
            RelAssert.Close(p.BusCurrentA, num[i] * current[i] / v + controller.IdleCurrentA, Tolerance, "controller bus current");
        }
        return Outcome.Compared;
    }
}

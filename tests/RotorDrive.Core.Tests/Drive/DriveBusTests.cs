using RotorDrive.Core.Tests.Support;
using FsCheck.Xunit;
using RotorDrive.Core.Drive;
using Xunit;

namespace RotorDrive.Core.Tests.Drive;

public class DriveBusTests
{
    private static (BusSolution Solution, DrivePoint[] Points) Solve(BusCase c, DriveBusOptions? options = null)
    {
        var points = new DrivePoint[c.Inputs.Length];
        var solution = DriveBus.Solve(c.Source, c.Inputs, points, double.NaN, options ?? DriveBusOptions.Default);
        return (solution, points);
    }

    // Kirchhoff's laws: the pack current is the sum of the controllers' bus currents, and the bus voltage is the pack's
    // Thevenin terminal voltage at that current (equivalent-circuit battery model).
    [Property(Arbitrary = [typeof(DriveGenerators)], MaxTest = 300)]
    public void Bus_SatisfiesKirchhoff_ForAnyNumberOfStations(BusCase c)
    {
        var (s, points) = Solve(c);
        Assert.NotEqual(BusStatus.NoSolution, s.Status);
        double sum = points.Sum(p => p.BusCurrentA);
        RelAssert.Close(sum, s.PackCurrentA, 1e-12, 1e-12 * 1, what: "pack current = sum of bus currents");
        RelAssert.Close(c.Source.OpenCircuitVoltageV - c.Source.ResistanceOhm * sum, s.BusVoltageV, 1e-9, what: "V = Voc - R I");
    }

    // Energy conservation of the averaged drive (Drela 2007 motor + averaged switch): bus power = shaft power + copper loss
    // + no-load loss + controller loss.
    [Property(Arbitrary = [typeof(DriveGenerators)], MaxTest = 300)]
    public void Drive_ConservesEnergy_ElectricalInEqualsShaftPlusLosses(BusCase c)
    {
        var (_, points) = Solve(c);
        foreach (var p in points)
        {
            double losses = p.CopperLossW + p.NoLoadLossW + p.ControllerLossW;
            double scale = Math.Abs(p.BusPowerW) + Math.Abs(p.ShaftPowerW) + losses;
            Assert.True(Math.Abs(p.BusPowerW - (p.ShaftPowerW + losses)) <= 1e-9 * Math.Max(scale, 1e-12), $"balance off: in {p.BusPowerW}, shaft {p.ShaftPowerW}, losses {losses}");
        }
    }

    // The averaged-switch laws each controller must obey at the solution (duty within 0..1, the commanded duty kept unless
    // a limit acts, current within the limit unless the bridge rectifies, no negative current when braking is off and
    // the back-EMF is below the bus, motor voltage = d V - I R_on).
    [Property(Arbitrary = [typeof(DriveGenerators)], MaxTest = 300)]
    public void EveryController_ObeysItsAveragedSwitchLaws(BusCase c)
    {
        var (s, points) = Solve(c);
        for (int j = 0; j < points.Length; j++)
        {
            var p = points[j];
            var input = c.Inputs[j];
            double limit = input.Drivetrain.CurrentLimitA;
            Assert.InRange(p.Duty, -1e-12, 1 + 1e-12);
            RelAssert.Close(p.Duty * s.BusVoltageV - p.MotorCurrentA * input.Drivetrain.Controller.OnResistanceOhm, p.MotorVoltageV, 1e-9, 1e-9 * 1, what: "Vm = d V - I Ron");
            if (p.Regime is not (DriveRegime.Rectifying or DriveRegime.ZeroDuty or DriveRegime.MaxDuty))
            {
                Assert.True(Math.Abs(p.MotorCurrentA) <= limit * (1 + 1e-12), $"current {p.MotorCurrentA} above limit {limit} in {p.Regime}");
            }
            if (input.Command.Kind == DriveCommandKind.Duty && p.Regime == DriveRegime.Regulating)
            {
                RelAssert.Close(input.Command.Value, p.Duty, 1e-12, 1e-12 * 1, what: "commanded duty applied");
            }
            if (!input.Braking && p.BackEmfV <= s.BusVoltageV)
            {
                Assert.True(p.MotorCurrentA >= -1e-9, $"negative current {p.MotorCurrentA} with braking off");
            }
        }
    }

    // The exhaustive interval scan and the fast active-set passes must return the same (highest) solution.
    [Property(Arbitrary = [typeof(DriveGenerators)], MaxTest = 300)]
    public void FastPasses_AndExhaustiveScan_FindTheSameBusVoltage(BusCase c)
    {
        var (fast, _) = Solve(c);
        var (scan, _) = Solve(c, new DriveBusOptions(MaxActiveSetPasses: 0));
        Assert.True(scan.Scanned);
        RelAssert.Close(scan.BusVoltageV, fast.BusVoltageV, 1e-9, what: "bus voltage");
    }

    // A hint only changes the work, not the answer.
    [Property(Arbitrary = [typeof(DriveGenerators)], MaxTest = 100)]
    public void Hint_DoesNotChangeTheSolution(BusCase c)
    {
        var (plain, _) = Solve(c);
        var points = new DrivePoint[c.Inputs.Length];
        var hinted = DriveBus.Solve(c.Source, c.Inputs, points, 0.3 * c.Source.OpenCircuitVoltageV, DriveBusOptions.Default);
        RelAssert.Close(plain.BusVoltageV, hinted.BusVoltageV, 1e-9, what: "bus voltage");
    }

    // Averaged switch with a phase-current limit: at stall (no back-EMF) full duty would draw V / R_t; the limit lowers
    // the duty to I_lim R_t / V (closed form of the averaged model on an ideal bus).
    [Fact]
    public void CurrentLimit_LowersTheDuty_ToHoldTheLimitAtStall()
    {
        var drivetrain = new Drivetrain(DriveParts.Motor(resistanceOhm: 0.05), DriveParts.Controller(burstCurrentA: 40, onResistanceOhm: 0.01));
        var p = DriveBus.Evaluate(44.4, new DriveInput(drivetrain, DriveCommand.Duty(1), 0, 20, 20, false));
        Assert.Equal(DriveRegime.CurrentLimit, p.Regime);
        RelAssert.Close(40, p.MotorCurrentA, 1e-12);
        RelAssert.Close(40 * 0.06 / 44.4, p.Duty, 1e-12);
        RelAssert.Close(p.Duty * 40, p.BusCurrentA, 1e-12, what: "bus current = d I");
    }

    // Freewheeling bridge: with braking off, a duty below back-EMF / V gives no current (the diodes block), only the
    // idle current on the bus; with braking on the same duty drives current backwards and feeds the bus.
    [Fact]
    public void BelowBackEmf_BrakingOffFreewheels_BrakingOnRegenerates()
    {
        var drivetrain = new Drivetrain(DriveParts.Motor(), DriveParts.Controller(burstCurrentA: 80, idleCurrentA: 0.05));
        double omega = 0.8 * 44.4 * drivetrain.Motor.KvRadPerSPerV;
        var off = DriveBus.Evaluate(44.4, new DriveInput(drivetrain, DriveCommand.Duty(0.5), omega, 20, 20, Braking: false));
        var on = DriveBus.Evaluate(44.4, new DriveInput(drivetrain, DriveCommand.Duty(0.5), omega, 20, 20, Braking: true));
        Assert.Equal(DriveRegime.Freewheel, off.Regime);
        Assert.Equal(0, off.MotorCurrentA);
        RelAssert.Close(0.05, off.BusCurrentA, 1e-12, what: "idle only");
        Assert.True(on.MotorCurrentA < 0);
        Assert.True(on.BusCurrentA < 0);
    }

    // Back-EMF above the bus: even with braking off the bridge's diodes conduct, I = (V - E) / R_t (uncontrolled rectifier).
    [Fact]
    public void BackEmfAboveBus_Rectifies_EvenWithBrakingOff()
    {
        var drivetrain = new Drivetrain(DriveParts.Motor(resistanceOhm: 0.05), DriveParts.Controller(burstCurrentA: 80, onResistanceOhm: 0.01));
        double omega = 50 * drivetrain.Motor.KvRadPerSPerV;
        var p = DriveBus.Evaluate(44.4, new DriveInput(drivetrain, DriveCommand.Duty(0.2), omega, 20, 20, false));
        Assert.Equal(DriveRegime.Rectifying, p.Regime);
        RelAssert.Close((44.4 - 50) / 0.06, p.MotorCurrentA, 1e-12);
    }

    // Maximum power transfer: a stalled motor at full duty nearly shorts the pack, so the bus falls below half its
    // open-circuit voltage (past the pack's maximum-power point): collapsed. V = Voc R_t / (R_t + R_pack) closed form.
    [Fact]
    public void StalledMotorOnAWeakPack_IsReportedCollapsed()
    {
        var drivetrain = new Drivetrain(DriveParts.Motor(resistanceOhm: 0.01), DriveParts.Controller(burstCurrentA: 10_000));
        var input = new DriveInput(drivetrain, DriveCommand.Duty(1), 0, 20, 20, false);
        var s = DriveBus.Solve(new BusSource(10, 0.1), in input, out var p);
        Assert.Equal(BusStatus.Collapsed, s.Status);
        RelAssert.Close(10 * 0.01 / 0.11, s.BusVoltageV, 1e-12);
        Assert.Equal(DriveRegime.Regulating, p.Regime);
    }

    // Idle currents alone larger than Voc / R_pack: no positive voltage satisfies V = Voc - R sum(I) (Ohm's law).
    [Fact]
    public void LoadBeyondWhatThePackCanSupply_HasNoSolution()
    {
        var drivetrain = new Drivetrain(DriveParts.Motor(), DriveParts.Controller(idleCurrentA: 200));
        var input = new DriveInput(drivetrain, DriveCommand.Duty(0), 0, 20, 20, false);
        var s = DriveBus.Solve(new BusSource(10, 0.1), in input, out _);
        Assert.Equal(BusStatus.NoSolution, s.Status);
    }

    // Speed-hold's inner loop: a current command is met exactly while the duty allows it.
    [Fact]
    public void CurrentCommand_IsDeliveredExactly_WhileDutyAllows()
    {
        var drivetrain = new Drivetrain(DriveParts.Motor(), DriveParts.Controller(burstCurrentA: 80, onResistanceOhm: 0.005));
        var input = new DriveInput(drivetrain, DriveCommand.MotorCurrent(25), 300, 60, 40, false);
        var s = DriveBus.Solve(new BusSource(44.4, 0.02), in input, out var p);
        Assert.Equal(DriveRegime.Regulating, p.Regime);
        RelAssert.Close(25, p.MotorCurrentA, 1e-12);
        RelAssert.Close(44.4 - 0.02 * p.BusCurrentA, s.BusVoltageV, 1e-12);
    }

    // A current-limited motor on a weak pack has three bus solutions (V^2 - Voc V + R_pack I_lim^2 R_t = 0 on the limited
    // branch, V = Voc / (1 + R_pack / R_t) on the unlimited one): 3.636 V, 7.753 V and 32.247 V. The highest is the
    // operating point of a charged bus; a hint at the low one must not trap the solver there.
    [Fact]
    public void WithThreeBusSolutions_TheHighestIsReturned_WhateverTheHint()
    {
        var drivetrain = new Drivetrain(DriveParts.Motor(resistanceOhm: 0.1), DriveParts.Controller(burstCurrentA: 50));
        var inputs = new[] { new DriveInput(drivetrain, DriveCommand.Duty(1), 0, 20, 20, false) };
        var points = new DrivePoint[1];
        double high = (40 + Math.Sqrt(1600 - 1000)) / 2;
        foreach (double hint in new[] { double.NaN, 3.0, 7.7, 100 })
        {
            var s = DriveBus.Solve(new BusSource(40, 1), inputs, points, hint, DriveBusOptions.Default);
            RelAssert.Close(high, s.BusVoltageV, 1e-12, what: $"hint {hint}");
            Assert.Equal(DriveRegime.CurrentLimit, points[0].Regime);
        }
    }
}

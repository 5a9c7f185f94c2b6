using FsCheck;
using FsCheck.Fluent;
using RotorDrive.Core.Drive;

namespace RotorDrive.Core.Tests.Drive;

/// <summary>One random but physically valid bus: a pack and 1 to 8 stations with their states and commands.</summary>
public sealed record BusCase(BusSource Source, DriveInput[] Inputs)
{
    public override string ToString()
        => $"Voc={Source.OpenCircuitVoltageV:G6} R={Source.ResistanceOhm:G4} " + string.Join(" | ", Inputs.Select(i =>
            $"Kv={i.Drivetrain.Motor.KvRpmPerV:G4} R={i.Drivetrain.Motor.ResistanceOhm:G3} I0={i.Drivetrain.Motor.NoLoadCurrentA:G3} " +
            $"Ron={i.Drivetrain.Controller.OnResistanceOhm:G3} idle={i.Drivetrain.Controller.IdleCurrentA:G3} lim={i.Drivetrain.CurrentLimitA:G4} " +
            $"dmax={i.Drivetrain.MaxDuty:G3} {i.Command.Kind}={i.Command.Value:G4} w={i.SpeedRadPerS:G5} Tw={i.WindingTempC:G3} Tm={i.MagnetTempC:G3} brake={i.Braking}"));
}

/// <summary>FsCheck generators of valid drivetrains and buses (ranges cover hobby to small industrial parts).</summary>
public static class DriveGenerators
{
    private const int Steps = 1_000_000;

    public static Gen<double> Uniform(double lo, double hi) => Gen.Choose(0, Steps).Select(i => lo + (hi - lo) * i / Steps);

    public static Gen<double> LogUniform(double lo, double hi) => Uniform(Math.Log(lo), Math.Log(hi)).Select(Math.Exp);

    public static Gen<Drivetrain> Drivetrain() =>
        from kv in LogUniform(40, 2500)
        from r in LogUniform(0.004, 0.5)
        from i0 in Uniform(0, 4)
        from ron in Uniform(0, 0.02)
        from idle in Uniform(0, 0.3)
        from burst in LogUniform(10, 300)
        from scale in Uniform(0.5, 1.5)
        from maxDuty in Gen.Elements(1.0, 0.98, 0.9)
        from poles in Gen.Elements(8, 12, 14, 20, 28)
        select new Drivetrain(
            DriveParts.Motor(kvRpmPerV: kv, resistanceOhm: r, noLoadCurrentA: i0, poles: poles),
            DriveParts.Controller(burstCurrentA: burst, continuousCurrentA: 0.7 * burst, onResistanceOhm: ron, idleCurrentA: idle),
            new DriveOptions(CurrentLimitScale: scale, MaxDuty: maxDuty));

    public static Gen<DriveInput> Input(double voc) =>
        from d in Drivetrain()
        from speedFraction in Uniform(0, 1.3)
        from command in Gen.OneOf(
            Uniform(0, 1).Select(DriveCommand.Duty),
            Uniform(-1.2, 1.2).Select(f => DriveCommand.MotorCurrent(f * d.CurrentLimitA)))
        from tw in Uniform(-10, 140)
        from tm in Uniform(-10, 120)
        from braking in Gen.Elements(false, true)
        select new DriveInput(d, command, speedFraction * d.FreeSpeedRadPerS(voc, 1.0, tm), tw, tm, braking);

    public static Gen<BusCase> Bus() =>
        from cells in Gen.Choose(2, 16)
        from cellV in Uniform(3.0, 4.2)
        from r in Gen.OneOf(Gen.Constant(0.0), LogUniform(0.001, 0.3))
        from n in Gen.Choose(1, 8)
        let source = new BusSource(cells * cellV, r)
        from inputs in Input(source.OpenCircuitVoltageV).ArrayOf(n)
        select new BusCase(source, inputs);

    public static Arbitrary<BusCase> BusCases() => Arb.From(Bus());

    public static Gen<OperatingCase> Operating() =>
        from drivetrain in Drivetrain()
        from cells in Gen.Choose(3, 14)
        from cellResistance in LogUniform(0.0005, 0.02)
        from parallel in Gen.Choose(1, 3)
        from forceN in LogUniform(1, 300)
        from radius in Uniform(0.05, 0.15)
        from speedC in LogUniform(5, 2000)
        from bearing in Uniform(0, 0.1)
        from hold in Gen.Elements(false, true)
        from throttle in Uniform(0, 1)
        from soc in Uniform(0, 1)
        from braking in Gen.Elements(false, true)
        from temp in Uniform(-10, 100)
        let packs = new global::RotorDrive.Core.Drive.PackBank(
            new BatteryPack("p", "lipo", cells, parallel, 5, 20, 40, cellResistance, 1),
            1,
            new CellCurve("lipo", [0.0, 0.1, 0.5, 0.9, 1.0], [3.3, 3.6, 3.8, 4.0, 4.2]))
        let free = drivetrain.FreeSpeedRadPerS(packs.OpenCircuitVoltageAt(soc), 1.0, temp)
        select new OperatingCase(
            new StationDrive(drivetrain, packs, DriveParts.Rotor(maxSpeedRadPerS: 0.8 * free + 1), new ThinSheetStripLoad(forceN, radius, speedC, bearing), DriveParts.Limits().Station),
            hold ? ThrottleCommand.HoldSpeed(Math.Max(1e-3, 1.2 * throttle * free)) : ThrottleCommand.Duty(throttle),
            OperatingConditions.Uniform(0.01, temp, soc) with { Braking = braking });

    public static Arbitrary<OperatingCase> OperatingCases() => Arb.From(Operating());
}

/// <summary>One random rotor operating question: a drive with a thin-sheet strip load, a throttle and conditions.</summary>
public sealed record OperatingCase(StationDrive Drive, ThrottleCommand Throttle, OperatingConditions Conditions)
{
    public override string ToString()
    {
        var d = Drive.Drivetrain;
        // Every drawn number, in full, so that a failing case can be rebuilt as a regression test.
        var ci = System.Globalization.CultureInfo.InvariantCulture;
        return string.Create(ci, $"Kv={d.Motor.KvRpmPerV:R} R={d.Motor.ResistanceOhm:R} I0={d.Motor.NoLoadCurrentA:R} poles={d.Motor.Poles} ")
            + string.Create(ci, $"Ron={d.Controller.OnResistanceOhm:R} idle={d.Controller.IdleCurrentA:R} lim={d.CurrentLimitA:R} dmax={d.MaxDuty:R} ")
            + string.Create(ci, $"S={Drive.Packs.CellsSeries} P={Drive.Packs.Pack.CellsParallel} Rcell={Drive.Packs.Pack.CellResistanceOhm:R} {Drive.Load} ")
            + string.Create(ci, $"{Throttle} soc={Conditions.SocFraction:R} brake={Conditions.Braking} T={Conditions.PlateTempC:R}");
    }
}

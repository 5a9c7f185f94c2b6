using RotorDrive.Core.Drive;
using RotorDrive.Core.Tests.Support;
using Xunit;

namespace RotorDrive.Core.Tests.Drive;

public class MotorModelTests
{
    // M. Drela, "First-Order DC Electric Motor Model", MIT, 2007: I = Q Kv + I0, omega = (V - I R) Kv, eta = Q omega / (V I).
    // Row 1 is the worked case of the issue (values computed from the model's equations); row 2 computed the same way.
    [Theory]
    [InlineData(100, 0.05, 1.5, 44.4, 3.0, 32.916, 4275.4, 0.91905)]
    [InlineData(1000, 0.1, 1.0, 12.0, 0.05, 6.23599, 11376.4, 0.79601)]
    public void Motor_MatchesDrelaFirstOrderWorkedValues(double kvRpm, double r, double i0, double volts, double torque, double current, double rpm, double efficiency)
    {
        var motor = DriveParts.Motor(kvRpmPerV: kvRpm, resistanceOhm: r, noLoadCurrentA: i0);
        double i = motor.CurrentForTorqueA(torque, 1.0);
        double omega = (volts - i * r) * motor.KvRadPerSPerV;
        RelAssert.Close(current, i, 5e-5, what: "current");
        RelAssert.Close(rpm, Units.RadPerSToRpm(omega), 5e-5, what: "rpm");
        RelAssert.Close(torque, motor.TorqueNm(motor.CurrentA(volts, omega, 20, 1.0), 1.0), 1e-12, what: "torque round trip");
        RelAssert.Close(efficiency, torque * omega / (volts * i), 5e-5, what: "efficiency");
    }

    // Same worked values, reached by the operating-point search: constant 3 N m load, ideal 44.4 V source, lossless
    // controller at full duty (Drela 2007, as above).
    [Theory]
    [InlineData(100, 0.05, 1.5, 44.4, 3.0, 32.916, 4275.4, 0.91905)]
    [InlineData(1000, 0.1, 1.0, 12.0, 0.05, 6.23599, 11376.4, 0.79601)]
    public void OperatingPoint_ReproducesDrelaWorkedValues_OnAnIdealSource(double kvRpm, double r, double i0, double volts, double torque, double current, double rpm, double efficiency)
    {
        var drive = new StationDrive(
            new Drivetrain(DriveParts.Motor(kvRpmPerV: kvRpm, resistanceOhm: r, noLoadCurrentA: i0, maxCurrentA: 1000, maxPowerW: 1e6),
                DriveParts.Controller(burstCurrentA: 10_000, continuousCurrentA: 10_000)),
            DriveParts.FlatPack(cells: 12, cellV: volts / 12),
            DriveParts.Rotor(maxSpeedRadPerS: 5000),
            new ConstantTorqueLoad(torque),
            DriveParts.Limits().Station);
        var result = OperatingPointFinder.Find(drive, ThrottleCommand.Duty(1.0), DriveParts.At20C());
        var point = Assert.Single(result.Equilibria);
        Assert.True(point.Stable);
        RelAssert.Close(current, point.MotorCurrentA, 5e-5, what: "current");
        RelAssert.Close(rpm, point.SpeedRpm, 5e-5, what: "rpm");
        RelAssert.Close(efficiency, point.Efficiency, 5e-5, what: "efficiency");
    }

    // Kt [N m/A] = 60 / (2 pi Kv [rpm/V]): the torque and speed constants are one constant in SI (Drela 2007).
    [Theory]
    [InlineData(100, 0.0954929658551372)]
    [InlineData(380, 0.0251297278566151)]
    [InlineData(2300, 0.00415186808065814)]
    public void TorqueConstant_Is60Over2PiKv(double kvRpm, double ktNmPerA)
    {
        var motor = DriveParts.Motor(kvRpmPerV: kvRpm);
        RelAssert.Close(ktNmPerA, motor.TorqueConstantNmPerA, 1e-12);
        RelAssert.Close(60 / (2 * Math.PI * kvRpm), motor.TorqueConstantNmPerA, 1e-12);
    }

    // IEC 60028 (international standard of resistance for copper): alpha20 = 0.00393 /K, R(T) = R20 (1 + alpha (T - 20));
    // at 100 C a 0.1 ohm winding reads 0.1 x 1.3144 = 0.13144 ohm.
    [Theory]
    [InlineData(0.1, 100, 0.13144)]
    [InlineData(0.05, 20, 0.05)]
    [InlineData(0.2, -20, 0.168560)]
    public void WindingResistance_FollowsIec60028CopperCoefficient(double r20, double tempC, double expected)
    {
        var motor = DriveParts.Motor(resistanceOhm: r20);
        RelAssert.Close(expected, motor.ResistanceAt(tempC), 1e-12);
    }

    // Reversible remanence loss of sintered NdFeB, -0.12 %/K (vendor technical note, Advanced Magnets: "typical
    // -0.09 to -0.12 %/C", N48SH -0.119 %/C): hot magnets give 12 % less torque per amp at 120 C.
    [Fact]
    public void HotMagnets_LowerTorquePerAmpAndBackEmf_ByTheRemanenceCoefficient()
    {
        var drivetrain = new Drivetrain(DriveParts.Motor(noLoadCurrentA: 0), DriveParts.Controller());
        var cold = DriveBus.Evaluate(44.4, new DriveInput(drivetrain, DriveCommand.MotorCurrent(20), 200, 20, 20, false));
        var hot = DriveBus.Evaluate(44.4, new DriveInput(drivetrain, DriveCommand.MotorCurrent(20), 200, 20, 120, false));
        RelAssert.Close(0.88 * cold.TorqueNm, hot.TorqueNm, 1e-12, what: "torque");
        RelAssert.Close(0.88 * cold.BackEmfV, hot.BackEmfV, 1e-12, what: "back-EMF");
    }

    // C-rate definition: current as a multiple of the reference current It = capacity / 1 h (IEC 61434).
    [Theory]
    [InlineData(10, 1, 25, 2.5)]
    [InlineData(5, 2, 100, 10)]
    [InlineData(2.2, 3, 6.6, 1)]
    public void CRate_IsCurrentOverCapacity(double cellAh, int parallel, double currentA, double cRate)
    {
        var pack = new BatteryPack("p", "lipo", 6, parallel, cellAh, 20, 40, 0.003, 1);
        RelAssert.Close(cRate, pack.CRate(currentA), 1e-12);
        RelAssert.Close(20 * cellAh * parallel, pack.ContinuousCurrentA, 1e-12, what: "continuous current = C x Ah");
        RelAssert.Close(40 * cellAh * parallel, pack.BurstCurrentA, 1e-12, what: "burst current = C x Ah");
    }
}

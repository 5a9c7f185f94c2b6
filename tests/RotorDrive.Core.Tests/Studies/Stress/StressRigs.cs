using RotorDrive.Core.Craft;
using RotorDrive.Core.Drive;
using RotorDrive.Core.Magnetics;
using RotorDrive.Core.Studies;
using RotorDrive.Core.Studies.Stress;

namespace RotorDrive.Core.Tests.Studies.Stress;

/// <summary>A four-station rig for the stress tests: test inputs chosen to give a rig that spins up and trims, not
/// catalog data.</summary>
internal static class StressRigs
{
    public static Motor Motor { get; } = new("m", Units.RpmToRadPerS(90), 0.0214, 1.8, 20, 94, 4200, 28, 1.086, null, null, null);

    public static SpeedController Controller { get; } = new("c", 120, 170, 5, 6, 12, 0.0013, 0.12, 140_000, 0.17, true);

    public static RotorDesign Rotor { get; } = new("r", 16, 4, 0.06, 0.13, 0.003, 1.25, -0.0012, 7500, 2.26, 0.021,
        Units.RpmToRadPerS(5000), 0.03, 0.004 / Units.RpmToRadPerS(1000), 0.004, 500e6);

    public static PackBank Packs { get; } = new(
        new BatteryPack("p", "lin", 12, 2, 10, 15, 30, 0.0018, 5.75),
        2,
        new CellCurve("lin", [0.0, 1.0], [3.3, 4.2]));

    /// <summary>Four stations on a 0.6 m square, diagonal pairs spinning the same way, centre of gravity at the centre.</summary>
    public static Rig Square { get; } = new(
        "stress test square",
        new Plate(new PlateMaterial("al", 35.4e6, 0.00403, 2705, 900), 0.012),
        22,
        22,
        new CraftBody(20, 10, 0, 0, 8, 0.2),
        0.010,
        0.0065,
        [
            new Station(0.3, 0.3, SpinDirection.Clockwise, Rotor, Motor, Controller),
            new Station(-0.3, 0.3, SpinDirection.CounterClockwise, Rotor, Motor, Controller),
            new Station(-0.3, -0.3, SpinDirection.Clockwise, Rotor, Motor, Controller),
            new Station(0.3, -0.3, SpinDirection.CounterClockwise, Rotor, Motor, Controller),
        ],
        Packs,
        new RigLimits(2, 60, 3.3, 0.8, 0.95, 6),
        5,
        12);

    /// <summary>Spreads on every quantity, of the sizes the issue describes.</summary>
    public static StressTolerances Spreads { get; } = new(new Dictionary<StressQuantity, Tolerance>
    {
        [StressQuantity.MotorKv] = Tolerance.Normal(2, ToleranceScale.Percent, true),
        [StressQuantity.MotorResistance] = Tolerance.Normal(5, ToleranceScale.Percent, true),
        [StressQuantity.MotorNoLoadCurrent] = Tolerance.Uniform(-15, 15, ToleranceScale.Percent, false),
        [StressQuantity.ControllerCurrentLimit] = Tolerance.Uniform(-16, 0, ToleranceScale.Percent, true),
        [StressQuantity.MagnetRemanence] = Tolerance.Normal(1, ToleranceScale.Percent, true),
        [StressQuantity.GapOffset] = Tolerance.Normal(0.0007, ToleranceScale.Absolute, false),
        [StressQuantity.PlateThickness] = Tolerance.Uniform(-0.0003, 0.0003, ToleranceScale.Absolute, true),
        [StressQuantity.PlateConductivity] = Tolerance.Normal(5, ToleranceScale.Percent, true),
        [StressQuantity.AmbientTemperature] = Tolerance.Uniform(-12, 12, ToleranceScale.Absolute, false),
        [StressQuantity.PlateTemperature] = Tolerance.Uniform(-12, 12, ToleranceScale.Absolute, false),
        [StressQuantity.PackStateOfCharge] = Tolerance.Uniform(-0.5, 0, ToleranceScale.Absolute, false),
        [StressQuantity.PackResistance] = Tolerance.Normal(15, ToleranceScale.Percent, true),
        [StressQuantity.Payload] = Tolerance.Normal(2, ToleranceScale.Absolute, false),
        [StressQuantity.CgOffsetX] = Tolerance.Normal(0.005, ToleranceScale.Absolute, false),
        [StressQuantity.CgOffsetY] = Tolerance.Normal(0.005, ToleranceScale.Absolute, false),
    });
}

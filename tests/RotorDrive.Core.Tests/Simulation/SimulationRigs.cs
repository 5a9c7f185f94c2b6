using RotorDrive.Core.Craft;
using RotorDrive.Core.Drive;
using RotorDrive.Core.Loads;
using RotorDrive.Core.Magnetics;
using RotorDrive.Core.Simulation;

namespace RotorDrive.Core.Tests.Simulation;

/// <summary>Rigs for the transient tests. The numbers are test inputs chosen to exercise the equations (a plausible
/// four-rotor bench rig over copper), not catalog data.</summary>
internal static class SimulationRigs
{
    public static readonly RotorDesign Rotor = new(
        "sim-120", 24, 4, 0.07, 0.12, 0.004, 1.3, -0.0012, 7500, 2.0, 0.0193, Units.RpmToRadPerS(6000), 0.01, 1e-5, 0.003, 2e8);

    public static readonly Plate CopperPlate = new(new PlateMaterial("cu", 58e6, 0.00393, 8960, 385), 0.006);

    /// <summary>A load that returns nothing: a bare inertia on the motor shaft.</summary>
    public sealed class NoLoad : IRotorLoad
    {
        public LoadPoint Evaluate(double speedRadPerS, double gapM, double plateTempC, double magnetTempC) => default;
    }

    public static Motor Motor(double kvRpmPerV = 100, double resistanceOhm = 0.03, double noLoadCurrentA = 1.0, double? rth = 0.5, double? tau = 300, double? maxC = 150)
        => new("m-sim", Units.RpmToRadPerS(kvRpmPerV), resistanceOhm, noLoadCurrentA, 10, 100, 5000, 14, 0.5, rth, tau, maxC);

    public static SpeedController Controller(double burstCurrentA = 150, double continuousCurrentA = 100, double onResistanceOhm = 0.002, double idleCurrentA = 0.1)
        => new("c-sim", continuousCurrentA, burstCurrentA, 5, 6, 14, onResistanceOhm, idleCurrentA, 200_000, 0.1, true);

    public static PackBank Pack(double cellResistanceOhm = 0.002, double capacityAh = 20, bool flat = false)
        => new(
            new BatteryPack("p-sim", flat ? "flat" : "lipo", 12, 1, capacityAh, 20, 40, cellResistanceOhm, 3.0),
            1,
            flat ? new CellCurve("flat", [0.0, 1.0], [3.8, 3.8]) : new CellCurve("lipo", [0.0, 0.1, 0.5, 0.9, 1.0], [3.3, 3.65, 3.82, 4.1, 4.2]));

    public static Rig Rig(
        double bodyMassKg,
        Motor? motor = null,
        SpeedController? controller = null,
        PackBank? pack = null,
        double maxDuty = 0.95,
        double convection = 12,
        Plate? plate = null,
        int stations = 4,
        double ambientC = 20,
        double usableFraction = 0.8,
        double plateLimitC = 80)
    {
        motor ??= Motor();
        controller ??= Controller();
        var list = new List<Station>();
        for (int j = 0; j < stations; j++)
        {
            double a = 2 * Math.PI * j / stations;
            list.Add(new Station(0.3 * Math.Cos(a), 0.3 * Math.Sin(a), j % 2 == 0 ? SpinDirection.Clockwise : SpinDirection.CounterClockwise, Rotor, motor, controller));
        }
        return new Rig(
            "sim-rig", plate ?? CopperPlate, ambientC, ambientC,
            new CraftBody(bodyMassKg, 0, 0, 0, 3.0, 0.3),
            0.010, 0.006, list, pack ?? Pack(),
            new RigLimits(2, plateLimitC, 3.3, usableFraction, maxDuty, 6),
            5.0, convection);
    }

    private static readonly Lazy<TabulatedRotorLoad> CopperTable = new(() => TableFor(CopperPlate));

    /// <summary>The rotor's table over a plate, from the first-generation (2-D) load model: this rig was sized on it, and the
    /// transient tests check the simulator's mechanics, not the load model (under the 3-D model its 100 kg body would need
    /// more than full duty to hover).</summary>
    public static TabulatedRotorLoad TableFor(Plate plate)
        => RotorLoadTable.Build(Rotor, plate, new LoadTableRange(Rotor.MaxSpeedRadPerS, 0.003, 0.03, -20, 200), new LoadModelOptions { Model = LoadModelKind.TwoDimensional });

    /// <summary>A prepared rig on the shared copper table (or on the given load).</summary>
    public static SimulationRig Prepared(Rig rig, IRotorLoad? load = null)
        => SimulationRig.FromModel(Model(rig, load));

    /// <summary>The rig model on the shared copper table (or on the given load).</summary>
    public static RigModel Model(Rig rig, IRotorLoad? load = null)
        => RigModel.Build(rig, Enumerable.Repeat(load ?? CopperTable.Value, rig.Stations.Count).ToArray());

    /// <summary>The hover rig of the tests: 100 kg body on four rotors, Kv 60 motors, 400 A controllers.</summary>
    public static Rig Hovering(double burstCurrentA = 400) => Rig(
        100, motor: Motor(kvRpmPerV: 60), controller: Controller(burstCurrentA: burstCurrentA, continuousCurrentA: 200));
}

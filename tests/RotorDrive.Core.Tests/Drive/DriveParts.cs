using RotorDrive.Core.Craft;
using RotorDrive.Core.Drive;
using RotorDrive.Core.Magnetics;

namespace RotorDrive.Core.Tests.Drive;

/// <summary>Builders for test parts. The numbers are test inputs chosen to exercise the equations, not catalog data.</summary>
internal static class DriveParts
{
    public static Motor Motor(
        double kvRpmPerV = 100,
        double resistanceOhm = 0.05,
        double noLoadCurrentA = 1.5,
        double maxCurrentA = 60,
        double maxPowerW = 2500,
        int poles = 14)
        => new("m-test", Units.RpmToRadPerS(kvRpmPerV), resistanceOhm, noLoadCurrentA, 10, maxCurrentA, maxPowerW, poles, 0.4, null, null, null);

    public static SpeedController Controller(
        double burstCurrentA = 1000,
        double continuousCurrentA = 80,
        double onResistanceOhm = 0,
        double idleCurrentA = 0,
        double maxErpm = 240_000,
        int minCells = 6,
        int maxCells = 14,
        bool reversible = false)
        => new("c-test", continuousCurrentA, burstCurrentA, 10, minCells, maxCells, onResistanceOhm, idleCurrentA, maxErpm, 0.1, reversible);

    /// <summary>A bank of one pack whose cells sit at a flat open-circuit voltage (a constant-voltage test source).</summary>
    public static PackBank FlatPack(int cells = 12, double cellV = 3.7, double cellResistanceOhm = 0, double capacityAh = 10, double continuousC = 20, double burstC = 40)
        => new(
            new BatteryPack("p-test", "flat", cells, 1, capacityAh, continuousC, burstC, cellResistanceOhm, 1.5),
            1,
            new CellCurve("flat", [0.0, 1.0], [cellV, cellV]));

    public static RotorDesign Rotor(double maxSpeedRadPerS = 1000)
        => new("r-test", 32, 4, 0.08, 0.12, 0.02, 1.3, -0.0012, 7500, 3, 0.02, maxSpeedRadPerS, 0, 0, null, null);

    public static RigLimits Limits(double cellCutoffV = 3.3, double maxDuty = 0.95)
        => new(1, 80, cellCutoffV, 0.8, maxDuty, 5);

    public static OperatingConditions At20C(double socFraction = 1.0, bool braking = false)
        => OperatingConditions.Uniform(0.01, 20, socFraction) with { Braking = braking };
}

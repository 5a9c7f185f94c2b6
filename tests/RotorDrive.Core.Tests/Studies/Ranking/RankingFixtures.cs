using RotorDrive.Core.Craft;
using RotorDrive.Core.Drive;
using RotorDrive.Core.Magnetics;

namespace RotorDrive.Core.Tests.Studies.Ranking;

/// <summary>Invented rigs and parts for the ranking tests (physically plausible, not from any product).</summary>
internal static class RankingFixtures
{
    public const double DesignGapM = 0.010;
    public const double LandedGapM = 0.0065;

    /// <summary>A rotor: 1 kg, rated 6000 rpm, inertia 0.01 kg m^2.</summary>
    public static RotorDesign Rotor { get; } = new(
        "syn-rotor", 24, 4, 0.07, 0.12, 0.004, 1.3, -0.0012, 7500, 1.0, 0.01, Units.RpmToRadPerS(6000), 0, 0, null, null);

    public static Plate Plate { get; } = new(new PlateMaterial("al", 35e6, 0.004, 2700, 900), 0.012);

    /// <summary>Flat 3.7 V per cell whatever the state of charge: the loaded voltage stays constant over the run.</summary>
    public static CellCurve FlatCurve { get; } = new("flat", [0.0, 1.0], [3.7, 3.7]);

    /// <summary>A straight 3.3 to 4.2 V per cell.</summary>
    public static CellCurve SlopedCurve { get; } = new("sloped", [0.0, 1.0], [3.3, 4.2]);

    public static SpeedController Controller(string id, double continuousA, double burstA, bool reversible = true, int minCells = 6, int maxCells = 14, double massKg = 0.05)
        => new(id, continuousA, burstA, 10, minCells, maxCells, 0.002, 0.05, 200000, massKg, reversible);

    public static Motor Motor(string id, double kvRpmPerV, double maxCurrentA, double massKg = 0.3, double resistanceOhm = 0.05, double noLoadA = 1.0)
        => new(id, Units.RpmToRadPerS(kvRpmPerV), resistanceOhm, noLoadA, 10, maxCurrentA, 5000, 14, massKg, null, null, null);

    public static BatteryPack Pack(string id, string chemistry, int cells = 12, double capacityAh = 10, double massKg = 1.0, double continuousC = 30, double cellResistanceOhm = 0.002)
        => new(id, chemistry, cells, 1, capacityAh, continuousC, 2 * continuousC, cellResistanceOhm, massKg);

    /// <summary>Four stations on a 0.3 m square, spins alternating, body centre of gravity at the centre, at 20 C.</summary>
    public static Rig SquareRig(double bodyKg, double payloadKg, PackBank? packs = null, double cgXM = 0, double cgYM = 0)
    {
        var stations = new[]
        {
            new Station(0.3, 0.3, SpinDirection.Clockwise, Rotor, null, null),
            new Station(-0.3, 0.3, SpinDirection.CounterClockwise, Rotor, null, null),
            new Station(-0.3, -0.3, SpinDirection.Clockwise, Rotor, null, null),
            new Station(0.3, -0.3, SpinDirection.CounterClockwise, Rotor, null, null),
        };
        return new Rig(
            "square test rig (invented)", Plate, 20, 20, new CraftBody(bodyKg, payloadKg, cgXM, cgYM, 5, 0.2), DesignGapM, LandedGapM,
            stations, packs, new RigLimits(2, 60, 3.3, 0.8, 0.95, 6), 5, 12);
    }

    /// <summary>Six stations on a 0.35 m hexagon, spins alternating, at 20 C: more stations than the four balance equations,
    /// so the trim's least-spread choice matters.</summary>
    public static Rig HexRig(double bodyKg, double payloadKg, double cgXM, double cgYM, Motor? motor = null, SpeedController? controller = null, PackBank? packs = null)
    {
        var stations = new Station[6];
        for (int i = 0; i < 6; i++)
        {
            double angle = i * Math.PI / 3;
            stations[i] = new Station(0.35 * Math.Cos(angle), 0.35 * Math.Sin(angle), i % 2 == 0 ? SpinDirection.Clockwise : SpinDirection.CounterClockwise,
                Rotor, motor, controller);
        }
        return new Rig(
            "hexagon test rig (invented)", Plate, 20, 20, new CraftBody(bodyKg, payloadKg, cgXM, cgYM, 6, 0.2), DesignGapM, LandedGapM,
            stations, packs, new RigLimits(2, 60, 3.3, 0.8, 0.95, 6), 5, 12);
    }

    public static IReadOnlyList<SyntheticLoad> FourOf(SyntheticLoad load) => [load, load, load, load];

    public static IReadOnlyList<SyntheticLoad> SixOf(SyntheticLoad load) => [load, load, load, load, load, load];

    public static PartsCatalog Catalog(IReadOnlyList<Motor> motors, IReadOnlyList<SpeedController> controllers, IReadOnlyList<BatteryPack> packs)
        => new(motors, controllers, packs, [FlatCurve, SlopedCurve], [Rotor], [Plate.Material]);
}

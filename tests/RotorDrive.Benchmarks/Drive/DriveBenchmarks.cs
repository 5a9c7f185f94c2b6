using BenchmarkDotNet.Attributes;
using RotorDrive.Core;
using RotorDrive.Core.Craft;
using RotorDrive.Core.Drive;
using RotorDrive.Core.Loads;
using RotorDrive.Core.Magnetics;

namespace RotorDrive.Benchmarks.Drive;

/// <summary>Drive benchmarks: one operating-point solve (every equilibrium) and bus solves of 1 and 6 stations.</summary>
/// <remarks>Target (issue 4): one operating-point solve &lt;= 5 microseconds median with the table-backed load.</remarks>
[MemoryDiagnoser]
public class DriveBenchmarks
{
    private StationDrive _drive = null!;
    private OperatingConditions _conditions = null!;
    private BusSource _source;
    private DriveInput[] _six = null!;
    private DrivePoint[] _points = null!;
    private DriveInput _one;

    /// <summary>The load behind the operating-point benchmark.</summary>
    public static IRotorLoad CreateLoad() => new AnalyticStripLoad(100, 0.12, 60, 2e-7, 0.02);

    /// <summary>Sets up a 12-cell drive whose current limit sits below the drag peak (three equilibria).</summary>
    [GlobalSetup]
    public void Setup()
    {
        var motor = new Motor("bench-motor", Units.RpmToRadPerS(180), 0.035, 1.2, 25, 60, 2000, 14, 0.5, null, null, null);
        var controller = new SpeedController("bench-esc", 50, 60, 10, 6, 14, 0.004, 0.05, 240_000, 0.1, false);
        var packs = new PackBank(
            new BatteryPack("bench-pack", "lipo", 12, 1, 10, 20, 40, 0.003, 1.6),
            1,
            new CellCurve("lipo", [0.0, 0.1, 0.5, 0.9, 1.0], [3.3, 3.6, 3.8, 4.0, 4.2]));
        var rotor = new RotorDesign("bench-rotor", 32, 4, 0.08, 0.13, 0.02, 1.3, -0.0012, 7500, 3, 0.02, Units.RpmToRadPerS(9000), 0.02, 0, null, null);
        var drivetrain = new Drivetrain(motor, controller, new DriveOptions(CurrentLimitScale: 0.5));
        _drive = new StationDrive(drivetrain, packs, rotor, CreateLoad(), new RigLimits(1, 80, 3.3, 0.8, 0.95, 5));
        _conditions = OperatingConditions.Uniform(0.01, 25, 0.8);
        _source = BusSource.FromPack(packs, 0.8);
        var full = new Drivetrain(motor, controller);
        _six = Enumerable.Range(0, 6)
            .Select(j => new DriveInput(full, DriveCommand.Duty(0.55 + 0.05 * j), 300 + 40 * j, 40, 30, false))
            .ToArray();
        _points = new DrivePoint[6];
        _one = _six[0];
        int count = OperatingPointFinder.Find(_drive, ThrottleCommand.Duty(1.0), _conditions).Equilibria.Count;
        if (count != 3)
        {
            throw new InvalidOperationException($"The benchmark drive should have three equilibria; it has {count}.");
        }
    }

    /// <summary>Every equilibrium of one rotor at full duty, with stability and margins.</summary>
    [Benchmark]
    public int OperatingPointAllEquilibria() => OperatingPointFinder.Find(_drive, ThrottleCommand.Duty(1.0), _conditions).Equilibria.Count;

    /// <summary>A speed-hold operating point (held point plus saturated crossings below it).</summary>
    [Benchmark]
    public int OperatingPointSpeedHold() => OperatingPointFinder.Find(_drive, ThrottleCommand.HoldRpm(4000), _conditions).Equilibria.Count;

    /// <summary>One controller on its pack.</summary>
    [Benchmark]
    public double BusSolveOneStation() => DriveBus.Solve(_source, in _one, out _).BusVoltageV;

    /// <summary>Six controllers on one pack (the demo rig's size).</summary>
    [Benchmark]
    public double BusSolveSixStations() => DriveBus.Solve(_source, _six, _points).BusVoltageV;
}

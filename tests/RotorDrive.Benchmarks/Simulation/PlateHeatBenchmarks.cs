using BenchmarkDotNet.Attributes;
using RotorDrive.Core.Craft;
using RotorDrive.Core.Simulation;
using RotorDrive.Files;

namespace RotorDrive.Benchmarks.Simulation;

/// <summary>Endurance runs of the demo rig with the plate's sheet field (issue 16 target: a 10-minute run in 100 ms or
/// less on one core): the demo as it is (the plate limit ends it), a full 10 minutes in place with the plate limit set
/// out of reach, and 10 minutes on a route across the floor.</summary>
/// <remarks>Run: dotnet run -c Release --project tests/RotorDrive.Benchmarks -- --filter '*PlateHeatBenchmarks*' --job short.
/// The rig model and load tables are built once in the setup (the endurance command and the ranking reuse them).</remarks>
[MemoryDiagnoser]
[MedianColumn]
public class PlateHeatBenchmarks
{
    private SimulationRig _demo = null!;
    private SimulationRig _unlimited = null!;
    private SimulationRig _route = null!;
    private readonly EnduranceOptions _tenMinutes = EnduranceOptions.Default with { RecordTrace = false, MaxDurationS = 600 };

    [GlobalSetup]
    public void Setup()
    {
        var dir = new DirectoryInfo(AppContext.BaseDirectory);
        while (dir is not null && !File.Exists(Path.Combine(dir.FullName, "RotorDrive.sln")))
        {
            dir = dir.Parent;
        }
        string path = Path.Combine(dir?.FullName ?? throw new InvalidOperationException("RotorDrive.sln not found"), "catalogs", "demo-rig.json");
        var rig = RigLoader.Load(path).Rig ?? throw new InvalidOperationException("demo rig did not load");
        var model = RigModel.Build(rig);
        _demo = SimulationRig.FromModel(model);
        var open = rig with { Limits = rig.Limits with { PlateTempC = 1000 } };
        _unlimited = SimulationRig.FromModel(RigModel.Build(open));
        var moving = open with { Route = new CraftRoute([RouteLeg.Move(2.0, 0, 0.2), RouteLeg.Dwell(30), RouteLeg.Move(0, 0, 0.2), RouteLeg.Dwell(30)]) };
        _route = SimulationRig.FromModel(RigModel.Build(moving));
        var r = EnduranceSimulator.Run(_unlimited, 1.0, _tenMinutes);
        Console.WriteLine($"// 10 min in place: {r.Steps} steps, grid {r.PlateSetup?.GridCount} at {r.PlateSetup?.GridSpacingM * 1000:F1} mm, ended by {r.FirstLimit} at {r.RuntimeS:F0} s");
    }

    [Benchmark(Baseline = true)]
    public EnduranceResult EnduranceDemo() => EnduranceSimulator.Run(_demo, 1.0, EnduranceOptions.Default with { RecordTrace = false });

    [Benchmark]
    public EnduranceResult Endurance10MinInPlace() => EnduranceSimulator.Run(_unlimited, 1.0, _tenMinutes);

    [Benchmark]
    public EnduranceResult Endurance10MinOnRoute() => EnduranceSimulator.Run(_route, 1.0, _tenMinutes);
}

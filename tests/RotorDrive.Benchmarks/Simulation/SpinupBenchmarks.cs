using BenchmarkDotNet.Attributes;
using RotorDrive.Core.Craft;
using RotorDrive.Core.Simulation;
using RotorDrive.Files;

namespace RotorDrive.Benchmarks.Simulation;

/// <summary>A 3 s spin-up of the six-station demo rig on its precomputed load table (target: 5 ms or less on one core),
/// the same without traces (as the Monte Carlo study runs it), a demo endurance run, and the cost of preparing the
/// simulation rig from an existing model (target: well under 0.5 ms), fresh and as a perturbed variant.</summary>
/// <remarks>Run: dotnet run -c Release --project tests/RotorDrive.Benchmarks -- --filter '*SpinupBenchmarks*'. The rig
/// and its tables are prepared once in the setup (as ranking and stress studies reuse them).</remarks>
[MemoryDiagnoser]
[MedianColumn]
public class SpinupBenchmarks
{
    private SimulationRig _rig = null!;
    private RigModel _model = null!;
    private RigModel _variant = null!;
    private SpinupRequest _duty = null!;
    private SpinupRequest _hold = null!;
    private readonly SpinupOptions _noTrace = SpinupOptions.Default with { RecordTrace = false };

    [GlobalSetup]
    public void Setup()
    {
        var dir = new DirectoryInfo(AppContext.BaseDirectory);
        while (dir is not null && !File.Exists(Path.Combine(dir.FullName, "RotorDrive.sln")))
        {
            dir = dir.Parent;
        }
        string path = Path.Combine(dir?.FullName ?? throw new InvalidOperationException("RotorDrive.sln not found"), "catalogs", "demo-rig.json");
        var loaded = RigLoader.Load(path);
        _model = RigModel.Build(loaded.Rig ?? throw new InvalidOperationException("demo rig did not load"));
        _rig = SimulationRig.FromModel(_model);
        // A tolerance sample: every station's gap and plate temperature a little off nominal.
        _variant = _model;
        for (int j = 0; j < _model.Stations.Count; j++)
        {
            var c = _model.Stations[j].Conditions;
            _variant = _variant.WithConditions(j, c with { GapOffsetM = 1e-4 * (j - 2.5), PlateTempC = c.PlateTempC + j });
        }
        _duty = new SpinupRequest(ThrottleProfile.SpinUp(ControllerMode.Duty, _rig.HoverThrottle(ControllerMode.Duty, 1.0), 1.0), 3.0);
        _hold = new SpinupRequest(ThrottleProfile.SpinUp(ControllerMode.SpeedHold, _rig.HoverThrottle(ControllerMode.SpeedHold, 1.0), 1.0), 3.0);
        var r = SpinupSimulator.Run(_rig, _duty, _noTrace);
        Console.WriteLine($"// duty 3 s: {r.StepsAccepted} steps, {r.Evaluations} evaluations, lift-off {r.LiftoffTimeS:F3} s");
    }

    [Benchmark(Baseline = true)]
    public SpinupResult Spinup3sDuty() => SpinupSimulator.Run(_rig, _duty);

    [Benchmark]
    public SpinupResult Spinup3sDutyNoTrace() => SpinupSimulator.Run(_rig, _duty, _noTrace);

    [Benchmark]
    public SpinupResult Spinup3sHoldNoTrace() => SpinupSimulator.Run(_rig, _hold, _noTrace);

    [Benchmark]
    public SimulationRig FromModelDemo() => SimulationRig.FromModel(_model);

    [Benchmark]
    public SimulationRig WithVariantDemo() => _rig.With(_variant);

    [Benchmark]
    public EnduranceResult EnduranceDemo() => EnduranceSimulator.Run(_rig, 1.0, EnduranceOptions.Default with { RecordTrace = false });
}

using BenchmarkDotNet.Attributes;
using RotorDrive.Core.Studies.Stress;
using RotorDrive.Files;

namespace RotorDrive.Benchmarks.Studies;

/// <summary>The tolerance stress test on the six-station demo rig: one sample (its rig-model variant, drag peaks and trimmed
/// hover via SimulationRig.With, spin-up with heave to lift-off, equal-duty yaw residual and the two trims at the yaw
/// tolerance, retainer check) on one core, and a whole 10,000-sample study on every core. Target (issue 9): 10,000 samples
/// in at most 20 s on 2 cores.</summary>
[MemoryDiagnoser]
public class StressBenchmarks
{
    private RigStressModel _model = null!;
    private StressTolerances _tolerances = StressTolerances.None;
    private IStressEvaluator _evaluator = null!;
    private StressParts[] _parts = [];
    private int _next;
    private StressResult _fiveThousand = null!;
    private StressSample[] _fortyFiveThousand = [];

    [GlobalSetup]
    public void Setup()
    {
        var dir = new DirectoryInfo(AppContext.BaseDirectory);
        while (dir is not null && !File.Exists(Path.Combine(dir.FullName, "RotorDrive.sln")))
        {
            dir = dir.Parent;
        }
        var loaded = RigLoader.Load(Path.Combine(dir?.FullName ?? throw new InvalidOperationException("RotorDrive.sln not found"), "catalogs", "demo-rig.json"));
        _tolerances = loaded.Tolerances;
        _model = new RigStressModel(loaded.Rig!, _tolerances);
        _evaluator = _model.CreateEvaluator();
        _parts = Enumerable.Range(0, 64).Select(k => StressSampler.Draw(loaded.Rig!, _tolerances, 1, k)).ToArray();
        _fiveThousand = StressStudy.Run(_model, _tolerances, new StressStudyOptions(5_000, 1));
        _fortyFiveThousand = Enumerable.Range(0, 9)
            .SelectMany(copy => _fiveThousand.SampleResults.Select(x => x with { Index = x.Index + copy * 5_000 })).ToArray();
    }

    /// <summary>Aggregating 45,000 samples: F8 near the end of a 50,000-sample run. Made of nine copies of the 5,000 (every
    /// value tied nine times; the sorts do the same work).</summary>
    [Benchmark]
    public StressResult AggregateFortyFiveThousand() => StressStudy.Aggregate(_fortyFiveThousand, 50_000, 1, _fiveThousand.Inputs);

    /// <summary>Aggregating 5,000 evaluated samples (rates, percentiles, the drivers' rank correlations): what F8 waits for
    /// after the workers stop (issue 15 item 1: F8 ends a run within 0.5 s keeping what finished).</summary>
    [Benchmark]
    public StressResult AggregateFiveThousand()
        => StressStudy.Aggregate(_fiveThousand.SampleResults, 5_000, 1, _fiveThousand.Inputs);

    /// <summary>One sample of the demo rig with its drawn parts (cycling through 64 samples).</summary>
    [Benchmark]
    public StressOutcome OneSample() => _evaluator.Evaluate(_parts[_next++ & 63], recordTrace: false);

    /// <summary>Building the stress model on the rig: the nominal model's table, two more for the thickness spread, and the
    /// nominal simulation rig (drag peaks, trim).</summary>
    [Benchmark]
    public RigStressModel BuildModel() => new(_model.Rig, _tolerances);

    /// <summary>The whole study: 10,000 samples on every core, aggregated (rates, percentiles, drivers).</summary>
    [Benchmark]
    [IterationCount(3)]
    [WarmupCount(1)]
    [InvocationCount(1)]
    public StressResult TenThousandSamples() => StressStudy.Run(_model, _tolerances, new StressStudyOptions(10_000, 1));
}

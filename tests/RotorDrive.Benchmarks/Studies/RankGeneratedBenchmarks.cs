using BenchmarkDotNet.Attributes;
using BenchmarkDotNet.Engines;
using RotorDrive.Core;
using RotorDrive.Core.Craft;
using RotorDrive.Core.Studies.Ranking;
using RotorDrive.Files;

namespace RotorDrive.Benchmarks.Studies;

/// <summary>Ranking a generated catalog of 1,000 motors x 60 controllers x 80 packs (4.8 million combinations, one pack
/// at a time) for the demo rig. Target: under 60 s on 2 cores with peak memory under 1 GiB (issue 7). One shot: the run
/// is long enough that warm-up and repetition add nothing.</summary>
[SimpleJob(RunStrategy.Monitoring, launchCount: 1, warmupCount: 0, iterationCount: 1)]
[MemoryDiagnoser]
public class RankGeneratedBenchmarks
{
    private Rig? _rig;
    private PartsCatalog? _catalog;

    [GlobalSetup]
    public void Setup() => (_rig, _catalog) = Make();

    [Benchmark]
    public RankResult RankGenerated4_8M() => RankStudy.Create(_rig!, _catalog!, new RankOptions(MaxPackCount: 1)).Run();

    /// <summary>The demo rig and the generated catalog (seed 7).</summary>
    public static (Rig Rig, PartsCatalog Catalog) Make(int motors = 1000, int controllers = 60, int packs = 80)
    {
        var loaded = RigLoader.Load(BenchmarkPaths.DemoRig);
        return (loaded.Rig!, CatalogGenerator.Generate(loaded.Catalog!, motors, controllers, packs, seed: 7));
    }
}

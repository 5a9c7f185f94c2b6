using BenchmarkDotNet.Attributes;
using RotorDrive.Cli;
using RotorDrive.Core.Studies.Ranking;
using RotorDrive.Files;

namespace RotorDrive.Benchmarks.Studies;

/// <summary>Ranking the demo catalogs for the demo rig: the whole <c>rotordrive rank</c> (read, check, tables, sweep,
/// report) and the study alone. Target: under one second end to end (issue 7).</summary>
[MemoryDiagnoser]
public class RankBenchmarks
{
    private string _demoRig = "";
    private RigLoadResult? _loaded;

    [GlobalSetup]
    public void Setup()
    {
        _demoRig = BenchmarkPaths.DemoRig;
        _loaded = RigLoader.Load(_demoRig);
    }

    [Benchmark]
    public Task<int> RankDemoEndToEnd() => CliApp.RunAsync(["rank", _demoRig], TextWriter.Null, TextWriter.Null);

    [Benchmark]
    public RankResult RankDemoStudy() => RankStudy.Create(_loaded!.Rig!, _loaded.Catalog!).Run();
}

using BenchmarkDotNet.Attributes;
using RotorDrive.Cli.Commands;
using RotorDrive.Files;

namespace RotorDrive.Benchmarks;

/// <summary>Reading and checking the demo rig: the whole of <c>rotordrive check</c> after process start.
/// Target: under one second (issue 2).</summary>
[MemoryDiagnoser]
public class LoadingBenchmarks
{
    private string _demoRig = "";

    [GlobalSetup]
    public void Setup()
    {
        var dir = new DirectoryInfo(AppContext.BaseDirectory);
        while (dir is not null && !File.Exists(Path.Combine(dir.FullName, "RotorDrive.sln")))
        {
            dir = dir.Parent;
        }
        _demoRig = Path.Combine(dir?.FullName ?? throw new InvalidOperationException("RotorDrive.sln not found"), "catalogs", "demo-rig.json");
    }

    [Benchmark]
    public RigLoadResult LoadDemoRig() => RigLoader.Load(_demoRig);

    [Benchmark]
    public int CheckDemoRig() => CheckCommand.Run(_demoRig, json: false, TextWriter.Null, TextWriter.Null);

    [Benchmark]
    public int CheckDemoRigJson() => CheckCommand.Run(_demoRig, json: true, TextWriter.Null, TextWriter.Null);
}

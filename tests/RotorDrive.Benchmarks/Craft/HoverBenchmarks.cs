using BenchmarkDotNet.Attributes;
using RotorDrive.Core.Craft;
using RotorDrive.Files;

namespace RotorDrive.Benchmarks.Craft;

/// <summary>Whole-craft solves on the six-station demo rig, table-backed (the model and its load table are built once in
/// setup). Target: trimmed hover &lt;= 200 us median (issue 5).</summary>
[MemoryDiagnoser]
public class HoverBenchmarks
{
    private RigModel _model = null!;
    private RigModel _variant = null!;

    [GlobalSetup]
    public void Setup()
    {
        var dir = new DirectoryInfo(AppContext.BaseDirectory);
        while (dir is not null && !File.Exists(Path.Combine(dir.FullName, "RotorDrive.sln")))
        {
            dir = dir.Parent;
        }
        string rig = Path.Combine(dir?.FullName ?? throw new InvalidOperationException("RotorDrive.sln not found"), "catalogs", "demo-rig.json");
        _model = RigModel.Build(RigLoader.Load(rig).Rig ?? throw new InvalidOperationException("demo rig does not load"));
        _variant = _model.WithPayload(_model.PayloadKg + 5);
    }

    /// <summary>The trimmed hover of the demo rig at its design gap (the 200 us target).</summary>
    [Benchmark(Baseline = true)]
    public HoverResult TrimmedHover() => HoverTrim.Solve(_model);

    /// <summary>A cheap variant (payload + 5 kg) and its trim: what a stress-test sample costs.</summary>
    [Benchmark]
    public HoverResult VariantAndTrim() => HoverTrim.Solve(_variant.WithPayload(_model.PayloadKg + 4));

    /// <summary>The gap at one common duty (nested Brent over the shared bus).</summary>
    [Benchmark]
    public HoverResult CommonDutyGap() => CommonDutyHover.Solve(_model, 0.42);
}

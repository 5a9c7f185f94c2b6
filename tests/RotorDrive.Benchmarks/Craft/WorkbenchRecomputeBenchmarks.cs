using BenchmarkDotNet.Attributes;
using RotorDrive.Core.Craft;
using RotorDrive.Core.Simulation;
using RotorDrive.Files;

namespace RotorDrive.Benchmarks.Craft;

/// <summary>What the workbench's result sheets compute after every rig edit, on the six-station demo rig, from the
/// resolved rig (load tables included, as the sheets rebuild them for an edited rig): the Hover &amp; yaw sheet (model,
/// reviewed trim, payload capacity, yaw balance) and its parts, the Spin-up sheet's study and the Endurance sheet's run.
/// No fixed target: an edit should show its figures within about a second on a lab laptop.</summary>
/// <remarks>Run: dotnet run -c Release --project tests/RotorDrive.Benchmarks -- --filter '*WorkbenchRecompute*'.</remarks>
[MemoryDiagnoser]
public class WorkbenchRecomputeBenchmarks
{
    private Rig _rig = null!;
    private RigModel _model = null!;

    [GlobalSetup]
    public void Setup()
    {
        _rig = RigLoader.Load(BenchmarkPaths.DemoRig).Rig ?? throw new InvalidOperationException("demo rig does not load");
        _model = RigModel.Build(_rig);
    }

    /// <summary>The whole Hover &amp; yaw sheet from the rig: model with its load table, reviewed trim, payload capacity,
    /// yaw balance.</summary>
    [Benchmark(Baseline = true)]
    public YawResult HoverSheetFromRig()
    {
        var model = RigModel.Build(_rig);
        HoverReview.Trimmed(model, model.DesignGapM);
        HoverReview.PayloadCapacityKg(model, model.DesignGapM);
        return YawBalance.Analyse(model);
    }

    /// <summary>The reviewed trim alone (trim, rotor safety, cautions) on a built model.</summary>
    [Benchmark]
    public HoverReview ReviewedTrim() => HoverReview.Trimmed(_model, _model.DesignGapM);

    /// <summary>The payload capacity alone (a bisection of trims) on a built model.</summary>
    [Benchmark]
    public double? PayloadCapacity() => HoverReview.PayloadCapacityKg(_model, _model.DesignGapM);

    /// <summary>The yaw balance alone on a built model.</summary>
    [Benchmark]
    public YawResult Yaw() => YawBalance.Analyse(_model);

    /// <summary>The Spin-up sheet from the rig: prepared simulation rig and the study (spin-up with traces, two landings).</summary>
    [Benchmark]
    public SpinupStudyResult SpinupSheetFromRig() => SpinupStudy.Run(SimulationRig.Build(_rig), new SpinupStudyRequest(ControllerMode.Duty, 2.0, 1.0));

    /// <summary>The Endurance sheet from the rig: prepared simulation rig and the run to its first limit.</summary>
    [Benchmark]
    public EnduranceResult EnduranceSheetFromRig() => EnduranceSimulator.Run(SimulationRig.Build(_rig), 1.0);
}

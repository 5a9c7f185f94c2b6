using RotorDrive.Core.Loads;
using RotorDrive.Core.Studies.Calibration;
using Xunit;
using Xunit.Abstractions;

namespace RotorDrive.Core.Tests.Studies.Calibration;

public class CalibrationStudyTests
{
    private static readonly LoadCalibration Truth = new(0.8, 0.9, 0.012, 2e-5);
    private readonly ITestOutputHelper _out;

    public CalibrationStudyTests(ITestOutputHelper output) => _out = output;

    private void Show(CalibrationResult r)
    {
        _out.WriteLine($"refusal {r.Refusal}: {r.RefusalDetail}");
        foreach (var e in r.Estimates)
        {
            _out.WriteLine($"{e.Key}: {e.Value:G5} [{e.Lower:G5}, {e.Upper:G5}] se {e.StandardError:G3} fitted {e.Fitted} und {e.Undetermined} {e.Why}");
        }
        _out.WriteLine(r.Quality.ToString());
        _out.WriteLine($"last residual sample {r.Residuals[^1].TimeS} s {r.Residuals[^1].Measured}");
    }

    [Fact]
    public void SteadySweep_RecoversKnownFactors_WithinIntervals()
    {
        var points = BenchSynthesis.Sweep(Truth with { BearingDragNm = null, BearingDampingNmPerRadPerS = null }, 1, 0.01, 1.0);
        var r = CalibrationStudy.Run(BenchSynthesis.Steady(points));
        Show(r);
        Assert.True(r.Accepted, r.RefusalDetail);
        AssertCovers(r[CalibrationParameter.ConductivityFactor], 0.8);
        AssertCovers(r[CalibrationParameter.FieldFactor], 0.9);
    }

    [Fact]
    public void SpinDown_RecoversKnownFactorsAndBearing_WithinIntervals()
    {
        var trace = BenchSynthesis.SpinDown(Truth, 2, 6000, 0.015, 200, 0.05, 5);
        var r = CalibrationStudy.Run(BenchSynthesis.Trace(trace));
        Show(r);
        Assert.True(r.Accepted, r.RefusalDetail);
        AssertCovers(r[CalibrationParameter.ConductivityFactor], 0.8);
        AssertCovers(r[CalibrationParameter.FieldFactor], 0.9);
    }

    private static void AssertCovers(CalibrationEstimate e, double truth)
    {
        Assert.True(e.Lower <= truth && truth <= e.Upper, $"{e.Key}: {truth} outside [{e.Lower}, {e.Upper}]");
    }
}

using RotorDrive.Core.Numerics;
using RotorDrive.Core.Studies;
using RotorDrive.Core.Studies.Stress;
using Xunit;

namespace RotorDrive.Core.Tests.Studies.Stress;

public class StressFigureTests
{
    [Fact]
    public void FigureValue_GivesEachSamplesValue_ThatTheStudysPercentilesSummarise()
    {
        // Consistency law: summarising the per-sample values (Hyndman and Fan 1996, definition 7) reproduces the study's
        // own percentile table for every figure key.
        var model = new RigStressModel(StressRigs.Square, StressRigs.Spreads);
        var result = StressStudy.Run(model, StressRigs.Spreads, new StressStudyOptions(12, 5, 1));
        foreach (var figure in result.Percentiles)
        {
            var values = result.SampleResults.Select(s => StressStudy.FigureValue(s.Outcome, figure.Key))
                .Where(v => v is not null && double.IsFinite(v.Value)).Select(v => v!.Value).ToArray();
            Assert.Equal(figure.Summary, values.Length == 0 ? null : Percentiles.Summarize(values));
        }
        Assert.Equal(result.SampleResults[0].Outcome.HoverSpeedRpm, StressStudy.FigureValue(result.SampleResults[0].Outcome, "hover_speed_rpm"));
    }

    [Fact]
    public void FigureValue_RejectsAKeyThatIsNoFigure()
    {
        var model = new RigStressModel(StressRigs.Square, StressTolerances.None);
        var sample = StressStudy.RunSample(model, StressTolerances.None, 1, 0);
        var e = Assert.Throws<ArgumentException>(() => StressStudy.FigureValue(sample.Outcome, "hover_speed"));
        Assert.Contains("hover_speed_rpm", e.Message);
    }
}

using RotorDrive.Core.Simulation;
using Xunit;

namespace RotorDrive.Core.Tests.Simulation;

public sealed class EnduranceStudyTests
{
    // The study is the simulator's run with the verdict attached: same runtime and ending, progress that never falls and
    // ends at 1, and a verdict that names the ending as the limiting constraint (the run's own rule, EnduranceLimits).
    [Fact]
    public void EnduranceStudy_IsTheSimulatorsRun_WithProgressToOne_AndTheEndingAsLimitingConstraint()
    {
        var sim = SimulationRigs.Prepared(SimulationRigs.Hovering());
        var direct = EnduranceSimulator.Run(sim);
        var seen = new List<double>();
        var study = EnduranceStudy.Run(sim, null, default, new SynchronousProgress(seen.Add));
        Assert.Equal(direct.RuntimeS, study.Run.RuntimeS);
        Assert.Equal(direct.FirstLimit, study.Run.FirstLimit);
        Assert.Equal(direct.Passes(), study.Passes);
        Assert.Equal(study.Passes, study.FailedCriteria.Count == 0);
        Assert.Equal(EnduranceStudy.Key(direct.FirstLimit), study.LimitingConstraint);
        Assert.NotEmpty(seen);
        Assert.Equal(1.0, seen[^1]);
        Assert.True(seen.Zip(seen.Skip(1)).All(p => p.Second >= p.First), "progress never falls");
    }

    [Fact]
    public void EnduranceStudy_StopsWhenCancelled()
    {
        var sim = SimulationRigs.Prepared(SimulationRigs.Hovering());
        using var cancel = new CancellationTokenSource();
        cancel.Cancel();
        Assert.Throws<OperationCanceledException>(() => EnduranceStudy.Run(sim, null, cancel.Token));
    }

    [Theory]
    [InlineData(EnduranceLimit.PlateTemperature, "plate_temperature")]
    [InlineData(EnduranceLimit.UsableCapacity, "usable_capacity")]
    [InlineData(EnduranceLimit.TrimLost, "trim_lost")]
    public void EnduranceLimitKey_IsSnakeCase(EnduranceLimit limit, string key) => Assert.Equal(key, EnduranceStudy.Key(limit));

    private sealed class SynchronousProgress(Action<double> report) : IProgress<double>
    {
        public void Report(double value) => report(value);
    }
}

using RotorDrive.Core.Craft;
using RotorDrive.Core.Drive;
using RotorDrive.Core.Safety;
using RotorDrive.Core.Studies;
using RotorDrive.Core.Tests.Simulation;
using Xunit;

namespace RotorDrive.Core.Tests.Studies;

public sealed class OperateStudyTests
{
    // The rig's limits.max_duty caps the controller's modulator in every analysis (a rule of ours, common practice to
    // keep control headroom, no source): a throttle above the cap runs at the cap, so duty 1 and duty max_duty give the
    // same equilibria, and no equilibrium runs above the cap.
    [Fact]
    public void ADutyAboveTheRigsMaxDuty_RunsAtTheCap()
    {
        var rig = SimulationRigs.Hovering();
        rig = rig with { Limits = rig.Limits with { MaxDuty = 0.8 } };
        var full = OperateStudy.Run(rig, new OperateStudyRequest(0, Throttle: ThrottleCommand.Duty(1.0)));
        var capped = OperateStudy.Run(rig, new OperateStudyRequest(0, Throttle: ThrottleCommand.Duty(0.8)));
        Assert.Equal(0.8, full.Drive.Drivetrain.MaxDuty);
        Assert.NotEmpty(full.Point.Equilibria);
        Assert.All(full.Point.Equilibria, e => Assert.True(e.Duty <= 0.8 + 1e-12, $"duty {e.Duty} above the cap"));
        Assert.Equal(capped.Point.Equilibria.Select(e => e.SpeedRadPerS), full.Point.Equilibria.Select(e => e.SpeedRadPerS));
        // Without a throttle the study runs at the cap too, and a sweep ends there.
        Assert.Equal(0.8, OperateStudy.Run(rig, new OperateStudyRequest(0)).Point.Throttle.Value);
        Assert.Equal(0.8, OperateStudy.Run(rig, new OperateStudyRequest(0, SweepSteps: 5)).Sweep![^1].Throttle.Value);
    }

    // The verdict and the binding limit are read from the same point: the point reached from rest fails exactly the
    // limits it exceeds, and the limiting constraint is its smallest margin.
    [Theory]
    [InlineData(0.3)]
    [InlineData(0.6)]
    [InlineData(0.95)]
    public void TheVerdict_NamesEveryExceededLimit_AndTheSmallestMargin(double duty)
    {
        var result = OperateStudy.Run(SimulationRigs.Hovering(), new OperateStudyRequest(0, Throttle: ThrottleCommand.Duty(duty)));
        var reached = result.Point.ReachedFromRest!;
        Assert.Equal(reached.ExceededLimits.Select(m => m.Limit.Key()), result.FailedCriteria.Where(k => k is not ("incompatible_parts" or "stays_at_rest")));
        Assert.Equal(result.FailedCriteria.Count == 0, result.Passes);
        Assert.Equal(reached.Margins.MinBy(m => m.MarginFraction).Limit.Key(), result.LimitingConstraint);
    }
}

public sealed class HoverSafetyReportTests
{
    private static RotorSafetyResult Ring(string id, double? stressPa, double? margin, bool aboveRated = false)
        => new(id, aboveRated ? 200 : 100, 150, 50, 1, margin is null ? RetainerAssessment.NoRetainerThickness : RetainerAssessment.Assessed,
            stressPa, null, null, margin is null ? null : 100e6, margin, null);

    // One rule for the ring to show (issue 13): a failed check first, then the smallest margin, then one not assessed
    // (the highest stress among those first).
    [Fact]
    public void Worst_IsTheFailedRing_ThenTheSmallestMargin_ThenTheHighestUnassessedStress()
    {
        var failed = Ring("over", 120e6, -0.2);
        var tight = Ring("tight", 90e6, 0.1);
        var easy = Ring("easy", 50e6, 1.0);
        var unassessedHigh = Ring("u-high", 80e6, null);
        var unassessedLow = Ring("u-low", 30e6, null);
        Assert.Same(failed, HoverSafetyReport.Worst([easy, tight, unassessedHigh, failed]));
        Assert.Same(tight, HoverSafetyReport.Worst([easy, unassessedHigh, tight]));
        Assert.Same(unassessedHigh, HoverSafetyReport.Worst([unassessedLow, unassessedHigh]));
        var fast = Ring("fast", 20e6, 2.0, aboveRated: true);
        Assert.Same(fast, HoverSafetyReport.Worst([tight, fast]));
        Assert.Null(HoverSafetyReport.Worst([]));
    }
}

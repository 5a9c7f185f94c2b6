using MathNet.Numerics.Distributions;
using RotorDrive.Core.Studies;
using RotorDrive.Core.Studies.Stress;
using Xunit;

namespace RotorDrive.Core.Tests.Studies.Stress;

public class StressStudyTests
{
    private static readonly RigStressModel Model = new(StressRigs.Square, StressRigs.Spreads);

    [Fact]
    public void ZeroTolerances_GiveEverySampleTheNominalSpinUpAndHover()
    {
        var model = new RigStressModel(StressRigs.Square, StressTolerances.None);
        var nominal = model.CreateEvaluator().Evaluate(StressSampler.Nominal(StressRigs.Square), recordTrace: false);
        Assert.True(nominal.LiftoffTimeS > 0);
        Assert.NotNull(nominal.HoverSpeedRpm);
        var result = StressStudy.Run(model, StressTolerances.None, new StressStudyOptions(12, Seed: 7, Threads: 2));
        Assert.Equal(12, result.Samples);
        Assert.All(result.SampleResults, s =>
        {
            Assert.Equal(nominal.Margins, s.Outcome.Margins);
            Assert.Equal(nominal.LiftoffTimeS, s.Outcome.LiftoffTimeS);
            Assert.Equal(nominal.HoverSpeedRpm, s.Outcome.HoverSpeedRpm);
            Assert.Equal(nominal.HoverCurrentA, s.Outcome.HoverCurrentA);
            Assert.Equal(nominal.PeakMotorCurrentA, s.Outcome.PeakMotorCurrentA);
            Assert.Equal(nominal.MinPackVoltageV, s.Outcome.MinPackVoltageV);
        });
        // No input varies, so there is nothing to rank.
        Assert.Empty(result.Drivers);
    }

    [Fact]
    public void SymmetricNominalRig_TrimsWithoutYawResidual()
    {
        // Four identical stations, centre of gravity at the centre, pairs spinning opposite ways: statics gives equal
        // shares and the reactions cancel, so the linearised equal-duty residual is zero (to rounding).
        var nominal = Model.CreateEvaluator().Evaluate(StressSampler.Nominal(StressRigs.Square), recordTrace: false);
        Assert.True(nominal.YawResidualNm < 1e-9, $"residual {nominal.YawResidualNm}");
        Assert.True(nominal.YawAuthorityNm > 0);
        Assert.True(nominal.PassedAll);
    }

    [Theory]
    // Closed form: a limit drawn N(mu, (s mu)^2) falls below t with P = Phi((t - mu) / (s mu)) (standard normal CDF,
    // MathNet Normal.CDF); stations draw independently, so some station of four stalls with 1 - (1 - P)^4.
    [InlineData(0.95, 8.0, 1)]
    [InlineData(0.90, 8.0, 2)]
    [InlineData(0.97, 5.0, 3)]
    public void StallProbability_MatchesTheNormalClosedForm_WithinWilsonInterval(double thresholdFraction, double sdPct, int seed)
    {
        double mu = StressRigs.Controller.BurstCurrentA;
        double threshold = thresholdFraction * mu;
        var tolerances = StressTolerances.None.With(StressQuantity.ControllerCurrentLimit, Tolerance.Normal(sdPct, ToleranceScale.Percent, true));
        var result = StressStudy.Run(new ThresholdModel(StressRigs.Square, threshold), tolerances, new StressStudyOptions(4000, seed, 2));
        double p = Normal.CDF(0, 1, (threshold - mu) / (sdPct / 100 * mu));
        double anyOfFour = 1 - Math.Pow(1 - p, 4);
        var stall = result.Criteria[(int)StressCriterion.Stall].Rate;
        Assert.InRange(anyOfFour, stall.Lower, stall.Upper);
        Assert.Equal(stall, result.FailureRate);
        // Station 0 alone: its stalls are counted from the sample rows.
        int station0 = result.SampleResults.Count(s => s.Outcome.StalledStations.Contains(0));
        var own = WilsonInterval.Compute(station0, result.Samples);
        Assert.InRange(p, own.Lower, own.Upper);
    }

    [Fact]
    public void Results_AreIdentical_ForOneAndTwoThreads()
    {
        var one = StressStudy.Run(Model, StressRigs.Spreads, new StressStudyOptions(16, 3, 1));
        var two = StressStudy.Run(Model, StressRigs.Spreads, new StressStudyOptions(16, 3, 2));
        Assert.Equal(one.FailureRate, two.FailureRate);
        Assert.Equal(one.Criteria, two.Criteria);
        Assert.Equal(one.Percentiles, two.Percentiles);
        Assert.Equal(one.Drivers, two.Drivers);
        Assert.Equal(one.WorstSample, two.WorstSample);
        for (int k = 0; k < 16; k++)
        {
            Assert.Equal(one.SampleResults[k].Outcome.Margins, two.SampleResults[k].Outcome.Margins);
        }
    }

    [Fact]
    public void RunSample_ReproducesSampleKOfAStudyExactly()
    {
        var study = StressStudy.Run(Model, StressRigs.Spreads, new StressStudyOptions(10, 5, 2));
        foreach (int k in new[] { 0, 7, study.WorstSample!.Value })
        {
            var again = StressStudy.RunSample(Model, StressRigs.Spreads, 5, k);
            var before = study.SampleResults[k];
            Assert.Equal(before.Parts.Stations, again.Parts.Stations);
            Assert.Equal(before.Parts with { Stations = [] }, again.Parts with { Stations = [] });
            Assert.Equal(before.Outcome.Margins, again.Outcome.Margins);
            Assert.Equal(before.Outcome.HoverSpeedRpm, again.Outcome.HoverSpeedRpm);
            Assert.Equal(before.Outcome.LiftoffTimeS, again.Outcome.LiftoffTimeS);
            Assert.NotNull(again.Outcome.Trace);
            Assert.True(again.Outcome.Trace!.Count > 2);
            Assert.Equal(0.0, again.Outcome.Trace[0].TimeS);
        }
    }

    [Fact]
    public void Draws_DependOnlyOnSeedAndIndex_AndOneToleranceLeavesOtherDrawsAlone()
    {
        var a = StressSampler.Draw(StressRigs.Square, StressRigs.Spreads, 11, 42);
        var b = StressSampler.Draw(StressRigs.Square, StressRigs.Spreads, 11, 42);
        Assert.Equal(a.Stations, b.Stations);
        var c = StressSampler.Draw(StressRigs.Square, StressRigs.Spreads, 11, 43);
        Assert.NotEqual(a.Stations[0].KvRadPerSPerV, c.Stations[0].KvRadPerSPerV);
        // Switching the Kv spread off changes Kv only: every quantity always consumes its one draw.
        var noKv = StressSampler.Draw(StressRigs.Square, StressRigs.Spreads.With(StressQuantity.MotorKv, Tolerance.None), 11, 42);
        Assert.Equal(StressRigs.Motor.KvRadPerSPerV, noKv.Stations[2].KvRadPerSPerV);
        Assert.Equal(a.Stations[2].CurrentLimitA, noKv.Stations[2].CurrentLimitA);
        Assert.Equal(a.PayloadKg, noKv.PayloadKg);
        // Stations draw independently: their limits differ.
        Assert.Equal(4, a.Stations.Select(s => s.CurrentLimitA).Distinct().Count());
    }

    [Fact]
    public async Task Cancellation_ReportsTheFinishedSamplesAsPartial()
    {
        using var cts = new CancellationTokenSource();
        var progress = new CancelAfter(cts, 3);
        var result = await Task.Run(() => StressStudy.Run(Model, StressRigs.Spreads, new StressStudyOptions(400, 1, 1), progress, cts.Token));
        Assert.True(result.Partial);
        Assert.InRange(result.Samples, 3, 399);
        Assert.Equal(400, result.RequestedSamples);
        Assert.Equal(result.Samples, result.FailureRate!.Trials);
    }

    [Fact]
    public void Drivers_AreSortedByMagnitude_AndLowLimitsDriveTheStallMargin()
    {
        var tolerances = StressTolerances.None.With(StressQuantity.ControllerCurrentLimit, Tolerance.Normal(8, ToleranceScale.Percent, true));
        var result = StressStudy.Run(new ThresholdModel(StressRigs.Square, 160), tolerances, new StressStudyOptions(2000, 2, 2));
        var rhos = result.Drivers.Select(d => Math.Abs(d.Rho)).ToArray();
        Assert.Equal(rhos.OrderByDescending(r => r), rhos);
        // The stall margin is min over stations of limit / threshold - 1: each station's limit correlates positively.
        Assert.All(result.Drivers.Where(d => d.Criterion == StressCriterion.Stall), d => Assert.True(d.Rho > 0.15, d.ToString()));
    }

    private sealed class CancelAfter(CancellationTokenSource cts, int count) : IProgress<int>
    {
        public void Report(int value)
        {
            if (value >= count)
            {
                cts.Cancel();
            }
        }
    }
}

public class StressThicknessTests
{
    [Fact]
    public void ThicknessSpread_InterpolatedBetweenThreeTables_MatchesATableBuiltAtTheDrawnThickness()
    {
        // Three-point Lagrange interpolation in thickness (Abramowitz & Stegun 25.2.11) against a model whose nominal plate
        // is the drawn thickness itself: the figures agree to the interpolation error. Near hover the lift saturates
        // (d ln L / d ln omega is a few tenths), which multiplies a relative lift error several times in the trimmed speed.
        var rig = StressRigs.Square;
        var spread = StressTolerances.None.With(StressQuantity.PlateThickness, Tolerance.Normal(0.0004, ToleranceScale.Absolute, true));
        var interpolated = new RigStressModel(rig, spread);
        Assert.Equal(0.0012, interpolated.ThicknessStepM, 12);
        double drawn = rig.Plate.ThicknessM + 0.00071;
        var parts = StressSampler.Nominal(rig) with { PlateThicknessM = drawn };
        var direct = new RigStressModel(rig with { Plate = rig.Plate with { ThicknessM = drawn } }, StressTolerances.None);
        var a = interpolated.CreateEvaluator().Evaluate(parts, recordTrace: false);
        var b = direct.CreateEvaluator().Evaluate(parts, recordTrace: false);
        Magnetics.RelAssert.Close(b.HoverSpeedRpm!.Value, a.HoverSpeedRpm!.Value, 1e-3, "hover speed");
        Magnetics.RelAssert.Close(b.LiftoffTimeS!.Value, a.LiftoffTimeS!.Value, 1e-3, "lift-off time");
        Magnetics.RelAssert.Close(b.HoverCurrentA!.Value, a.HoverCurrentA!.Value, 1e-3, "hover current");
    }
}

using MathNet.Numerics.Distributions;
using RotorDrive.Core.Craft;
using RotorDrive.Core.Numerics;
using RotorDrive.Core.Simulation;
using RotorDrive.Core.Studies;
using RotorDrive.Core.Tests.Magnetics;
using RotorDrive.Core.Studies.Stress;
using Xunit;
using RotorDrive.Core.Tests.Support;

namespace RotorDrive.Core.Tests.Studies.Stress;

public class StressStudyTests
{
    private static readonly RigStressModel Model = new(StressRigs.Square, StressRigs.Spreads);

    [Fact]
    public void ZeroTolerances_GiveEverySampleTheNominalSpinUpTrimAndYaw_FigureByFigure()
    {
        // A rig whose centre of gravity sits off centre (the trim spreads the speeds) and whose station 0 has a faster
        // motor (at equal duties its rotor runs faster, so the yaw residual is not zero).
        var square = StressRigs.Square;
        var rig = square with
        {
            Body = square.Body with { CgXM = 0.02, CgYM = -0.01 },
            Stations = [square.Stations[0] with { Motor = StressRigs.Motor with { KvRadPerSPerV = 1.03 * StressRigs.Motor.KvRadPerSPerV } }, .. square.Stations.Skip(1)],
        };
        var model = new RigStressModel(rig, StressTolerances.None);
        var options = model.Options;

        // The nominal analyses, exactly as the spinup, hover and yaw commands run them on the rig's model.
        var nominal = RigModel.Build(rig);
        var sim = SimulationRig.FromModel(nominal, new SimulationRigOptions(Hover: options.Hover));
        var hover = HoverTrim.Solve(nominal, options.Hover);
        var profile = ThrottleProfile.SpinUp(ControllerMode.Duty, sim.HoverThrottle(ControllerMode.Duty), options.RampTimeS);
        var spin = SpinupSimulator.Run(sim, new SpinupRequest(profile, rig.Limits.LiftoffTimeS, nominal.SocFraction), options.Spinup(false));
        var yaw = YawBalance.Analyse(nominal, options.Hover);
        Assert.NotNull(spin.LiftoffTimeS);
        Assert.Equal(HoverStatus.Hovering, hover.Status);
        Assert.True(Math.Abs(yaw.ResidualTorqueNm!.Value) > 1e-4, $"residual {yaw.ResidualTorqueNm}");

        var result = StressStudy.Run(model, StressTolerances.None, new StressStudyOptions(6, Seed: 7, Threads: 2));
        Assert.Equal(6, result.Samples);
        Assert.All(result.SampleResults, s =>
        {
            var o = s.Outcome;
            Assert.Equal(spin.LiftoffTimeS, o.LiftoffTimeS);
            Assert.Equal(spin.StalledStations, o.StalledStations);
            Assert.Equal(spin.Stations.Max(x => x.Motor.PeakA), o.PeakMotorCurrentA);
            Assert.Equal(spin.Pack.PeakA, o.PeakPackCurrentA);
            Assert.Equal(spin.MinBusVoltageV, o.MinPackVoltageV);
            Assert.Equal(hover.Stations.Max(x => x.SpeedRpm), o.HoverSpeedRpm);
            Assert.Equal(hover.Stations.Max(x => x.MotorCurrentA), o.HoverCurrentA);
            Assert.Equal(hover.BusVoltageV, o.HoverPackVoltageV);
            Assert.Null(o.TrimLimit);
            // The yaw command brackets the equal duty over the whole range, the sample next to the trim's mean duty: both are
            // Brent roots to 1e-12 in duty of the same equal-duty lift balance.
            RelAssert.Close(Math.Abs(yaw.ResidualTorqueNm.Value), o.YawResidualNm!.Value, 1e-9, "yaw residual");
            Assert.Equal(yaw.Pass, o.Passed(StressCriterion.Yaw));
            Assert.True(o.PassedAll);
        });
        // No input varies, so there is nothing to rank.
        Assert.Empty(result.Drivers);
    }

    [Fact]
    public void ARotorWhoseCurrentLimitCannotPassItsDragPeak_FailsStall_AsTheSpinUpReportsIt()
    {
        // Station 0's controller limits at a tenth of its burst rating: its torque cannot pass the drag peak at the landed
        // gap (the stall definition of SpinupSimulator: below the peak speed at the current limit when the run ends).
        var tolerances = StressTolerances.None.With(StressQuantity.ControllerCurrentLimit, Tolerance.Uniform(-90, -90, ToleranceScale.Percent, true));
        var parts = StressSampler.Draw(StressRigs.Square, tolerances, 1, 0);
        var model = new RigStressModel(StressRigs.Square, tolerances);
        var outcome = model.CreateEvaluator().Evaluate(parts, recordTrace: false);
        Assert.Equal(0.1 * StressRigs.Controller.BurstCurrentA, parts.Stations[0].CurrentLimitA, 9);
        Assert.Contains(0, outcome.StalledStations);
        Assert.False(outcome.Passed(StressCriterion.Stall));
        Assert.True(outcome.Margins[(int)StressCriterion.Stall] < 0);
    }

    [Fact]
    public void Variant_CarriesEveryDrawnValue_IntoTheRigModel()
    {
        var parts = StressSampler.Draw(StressRigs.Square, StressRigs.Spreads, 3, 5);
        var variant = Model.Variant(parts);
        for (int i = 0; i < 4; i++)
        {
            var s = variant.Stations[i];
            var p = parts.Stations[i];
            Assert.Equal(p.KvRadPerSPerV, s.Drivetrain.Motor.KvRadPerSPerV);
            Assert.Equal(p.ResistanceOhm, s.Drivetrain.Motor.ResistanceOhm);
            Assert.Equal(p.NoLoadCurrentA, s.Drivetrain.Motor.NoLoadCurrentA);
            RelAssert.Close(p.CurrentLimitA, s.Drivetrain.CurrentLimitA, 1e-15, "current limit");
            Assert.Equal(new StationConditions(p.GapOffsetM, parts.PlateTempC, parts.AmbientC, parts.AmbientC, parts.AmbientC), s.Conditions);
        }
        Assert.Equal(parts.PayloadKg, variant.PayloadKg);
        Assert.Equal(parts.SocFraction, variant.SocFraction);
        RelAssert.Close(parts.PackResistanceOhm, variant.Packs.ResistanceOhm, 1e-14, "pack resistance");
        Assert.Equal(StressRigs.Square.Body.CgXM + parts.CgOffsetXM, variant.Rig.Body.CgXM);
        // Remanence: lift scales as (Br'/Br)^2 (the layer model's pressures go as the source field squared; Halbach 1980).
        var nominalLoad = Model.Nominal.Stations[0].Load.Evaluate(300, 0.01, 20, 20);
        var onlyBr = StressSampler.Nominal(StressRigs.Square) with
        {
            Stations = [parts.Stations[0] with { KvRadPerSPerV = StressRigs.Motor.KvRadPerSPerV }, .. StressSampler.Nominal(StressRigs.Square).Stations.Skip(1)],
        };
        var scaled = Model.Variant(onlyBr).Stations[0].Load.Evaluate(300, 0.01, 20, 20);
        double ratio = parts.Stations[0].RemanenceT / StressRigs.Rotor.RemanenceT;
        RelAssert.Close(nominalLoad.LiftN * ratio * ratio, scaled.LiftN, 1e-12, "lift with drawn remanence");
    }

    [Fact]
    public void SymmetricNominalRig_TrimsWithoutYawResidual()
    {
        // Four identical stations, centre of gravity at the centre, pairs spinning opposite ways: statics gives equal
        // shares and the reactions cancel, so the equal-duty residual is zero (to rounding) and the trim can command the
        // rig's yaw tolerance both ways.
        var nominal = Model.CreateEvaluator().Evaluate(StressSampler.Nominal(StressRigs.Square), recordTrace: false);
        Assert.True(nominal.YawResidualNm < 1e-9, $"residual {nominal.YawResidualNm}");
        Assert.Equal(StressRigs.Square.Limits.YawTorqueNm, nominal.YawAuthorityNm);
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
        Assert.InRange(anyOfFour, stall.LowerFraction, stall.UpperFraction);
        Assert.Equal(stall, result.FailureRate);
        // Station 0 alone: its stalls are counted from the sample rows.
        int station0 = result.SampleResults.Count(s => s.Outcome.StalledStations.Contains(0));
        var own = WilsonInterval.Compute(station0, result.Samples);
        Assert.InRange(p, own.LowerFraction, own.UpperFraction);
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

    [Fact]
    public void AStoppedRun_CanLeaveItsDriversPending_AndCompleteThemLater_ToTheSameDrivers()
    {
        // The workbench shows a stopped run's figures at once and its drivers after (issue 15 item 1: F8 within 0.5 s).
        var tolerances = StressTolerances.None.With(StressQuantity.ControllerCurrentLimit, Tolerance.Normal(8, ToleranceScale.Percent, true));
        using var cts = new CancellationTokenSource();
        var stopped = StressStudy.Run(new ThresholdModel(StressRigs.Square, 160), tolerances,
            new StressStudyOptions(100_000, 2, 1, DriversWhenStopped: false), new CancelAfter(cts, 300), cts.Token);
        Assert.True(stopped.Partial);
        Assert.True(stopped.DriversPending);
        Assert.Empty(stopped.Drivers);
        var completed = StressStudy.CompleteDrivers(stopped);
        Assert.False(completed.DriversPending);
        Assert.NotEmpty(completed.Drivers);
        Assert.Equal(StressStudy.Aggregate(stopped.SampleResults, stopped.RequestedSamples, stopped.Seed, stopped.Inputs).Drivers, completed.Drivers);
        Assert.Equal(stopped.FailureRate, completed.FailureRate);
        Assert.Same(completed, StressStudy.CompleteDrivers(completed));

        // A run that finishes computes its drivers whatever the option says.
        var whole = StressStudy.Run(new ThresholdModel(StressRigs.Square, 160), tolerances, new StressStudyOptions(50, 2, 1, DriversWhenStopped: false));
        Assert.False(whole.DriversPending);
        Assert.NotEmpty(whole.Drivers);
    }

    [Fact]
    public void Drivers_EqualSpearmanOfEachPair_OverTheSamplesWhereTheMarginWasAssessed()
    {
        // The drivers rank each series once and pair the ranks (RankCorrelation.OfRanks); this recomputes every pair from
        // scratch with RankCorrelation.Spearman (itself checked against a hand computation, the textbook formula and
        // MathNet's Correlation.Spearman in StatisticsTests). The constructed model leaves the Currents margin unassessed
        // on about half the samples, so both paths of the aggregation are taken: ranks over every sample, and over a subset.
        var tolerances = StressTolerances.None
            .With(StressQuantity.ControllerCurrentLimit, Tolerance.Normal(8, ToleranceScale.Percent, true))
            .With(StressQuantity.MotorKv, Tolerance.Normal(3, ToleranceScale.Percent, true));
        var result = StressStudy.Run(new PartlyAssessedModel(StressRigs.Square), tolerances, new StressStudyOptions(600, 3, 2));
        var expected = new List<StressDriver>();
        foreach (var criterion in StressCriteria.All)
        {
            var assessed = result.SampleResults.Where(s => s.Outcome.Margins[(int)criterion] is not null).ToArray();
            var margins = assessed.Select(s => s.Outcome.Margins[(int)criterion]!.Value).ToArray();
            foreach (var input in result.Inputs)
            {
                if (RankCorrelation.Spearman(assessed.Select(s => input.ValueIn(s.Parts)).ToArray(), margins) is { } rho)
                {
                    expected.Add(new StressDriver(input.Name, criterion, rho));
                }
            }
        }
        int partly = result.SampleResults.Count(s => s.Outcome.Margins[(int)StressCriterion.Currents] is null);
        Assert.InRange(partly, 150, 450);
        Assert.Contains(result.Drivers, d => d.Criterion == StressCriterion.Currents);
        Assert.Equal(expected.Count, result.Drivers.Count);
        foreach (var e in expected)
        {
            var got = Assert.Single(result.Drivers, d => d.Input == e.Input && d.Criterion == e.Criterion);
            Assert.Equal(e.Rho, got.Rho, 12);
        }
    }

    // Stall margin on every sample; Currents margin only where station 1's Kv drew above nominal.
    private sealed class PartlyAssessedModel(Rig rig) : IStressModel
    {
        public Rig Rig => rig;

        public IStressEvaluator CreateEvaluator() => new Evaluator(rig);

        private sealed class Evaluator(Rig rig) : IStressEvaluator
        {
            public StressOutcome Evaluate(StressParts parts, bool recordTrace)
            {
                var margins = new double?[StressCriteria.All.Count];
                double worst = parts.Stations.Min(s => s.CurrentLimitA);
                margins[(int)StressCriterion.Stall] = worst / 160 - 1;
                double kvRatio = parts.Stations[0].KvRadPerSPerV / rig.Stations[0].Motor!.KvRadPerSPerV;
                margins[(int)StressCriterion.Currents] = kvRatio > 1 ? 0.2 - (kvRatio - 1) - 0.001 * parts.Stations[1].CurrentLimitA : null;
                return new StressOutcome(margins, null, [], worst, 0, 0, null, null, null, null, null, null, null);
            }
        }
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
        RelAssert.Close(b.HoverSpeedRpm!.Value, a.HoverSpeedRpm!.Value, 1e-3, "hover speed");
        RelAssert.Close(b.LiftoffTimeS!.Value, a.LiftoffTimeS!.Value, 1e-3, "lift-off time");
        RelAssert.Close(b.HoverCurrentA!.Value, a.HoverCurrentA!.Value, 1e-3, "hover current");
    }
}

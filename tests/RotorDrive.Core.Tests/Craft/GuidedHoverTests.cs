using RotorDrive.Core.Craft;
using RotorDrive.Core.Drive;
using RotorDrive.Core.Studies;
using RotorDrive.Core.Tests.Support;
using Xunit;

namespace RotorDrive.Core.Tests.Craft;

/// <summary>A guided sled (rig <c>mount</c> "guided", issue 14 item 7): one common duty at the gap carries the weight,
/// the rails carry pitch, roll and yaw.</summary>
public sealed class GuidedHoverTests
{
    // Three stations (too few for a free trim) with the centre of gravity off the middle, so the rails carry moments.
    private static RigModel Guided(double payloadKg = 0)
        => CraftRigs.Model(CraftRigs.Circle(3, cgXM: 0.02, cgYM: -0.01, payloadKg: payloadKg) with { Mount = MountKind.Guided });

    // Statics (Newton's first law, vertical): at the duty found the lifts at the speeds reached sum to m g. The lifts are
    // recomputed here from each station's load model at the reported speeds, not taken from the solver's totals; the
    // bisection's bracket (Burden & Faires, Numerical Analysis, 9th ed. 2010, section 2.1) closes to 1e-12 in duty.
    [Fact]
    public void CommonDutyFound_MakesTheTotalLiftEqualTheWeight()
    {
        var model = Guided();
        var study = HoverStudy.Run(model);
        var h = study.Review.Hover;
        Assert.Equal(HoverMode.Guided, h.Mode);
        Assert.True(h.Balanced, string.Join("; ", study.Review.Findings.Select(f => f.Message)));
        Assert.Equal(CraftRigs.Gap, h.GapM);
        double lift = h.Stations.Sum(s => model.Stations[s.Index].LoadAt(s.SpeedRadPerS, h.GapM).LiftN);
        RelAssert.Close(model.MassKg * Units.StandardGravity, lift, 1e-6, what: "sum of station lifts against m g");
        // One common duty: every station's duty on the shared bus is the same and within max_duty.
        double duty = h.Stations[0].Duty;
        foreach (var s in h.Stations)
        {
            RelAssert.Close(duty, s.Duty, 1e-6, what: $"duty of station {s.Index + 1}");
            Assert.True(s.Duty <= model.Limits.MaxDuty);
        }
        // Round trip: the rotors settle at the same speeds when that duty is applied (Drela's model, both ways).
        var state = CommonDutyHover.SpeedsAt(model, Enumerable.Repeat(duty, 3).ToArray(), h.GapM);
        for (int i = 0; i < 3; i++)
        {
            RelAssert.Close(h.Stations[i].SpeedRadPerS, state.SpeedsRadPerS[i], 1e-5, what: $"speed of station {i + 1}");
        }
    }

    // The bisection needs the lift to rise with the duty (a higher applied voltage raises the motor torque at every
    // speed, so the top equilibrium moves up; Drela, First-Order DC Electric Motor Model, MIT 2007).
    [Fact]
    public void TotalLift_RisesWithTheCommonDuty()
    {
        var model = Guided();
        double previous = -1;
        for (double d = 0.05; d <= model.Limits.MaxDuty + 1e-12; d += 0.05)
        {
            double lift = CommonDutyHover.SpeedsAt(model, [d, d, d], CraftRigs.Gap).TotalLiftN;
            Assert.True(lift >= previous, $"lift {lift} N at duty {d} below {previous} N");
            previous = lift;
        }
    }

    // Rigid-body statics: with equal lifts W/3 on stations placed symmetrically about the rig's middle (sum of x and y
    // is zero) the lift moment about the centre of gravity is -W x_cg (pitch) and -W y_cg (roll); the yaw torque is the
    // sum of the reactions (two clockwise rotors, one counter-clockwise: one shaft torque left over).
    [Fact]
    public void RailLoads_AreTheLiftMomentsAboutTheCentreOfGravity()
    {
        var model = Guided();
        var study = HoverStudy.Run(model);
        var rails = study.Rails!;
        double w = model.WeightN;
        RelAssert.Close(-w * model.CgXM, rails.PitchMomentNm, 1e-6, what: "pitch moment");
        RelAssert.Close(-w * model.CgYM, rails.RollMomentNm, 1e-6, what: "roll moment");
        var h = study.Review.Hover;
        RelAssert.Close(h.Stations[0].ShaftTorqueNm, Math.Abs(rails.YawTorqueNm), 1e-6, what: "yaw torque");
        // Reported, not failed: the rails carry them, so no pitch, roll or yaw finding; no yaw balance either.
        Assert.DoesNotContain(study.Review.Findings, f => f.Limit is "stability" or "yaw_torque");
        Assert.Null(study.Yaw);
        Assert.Null(study.PayloadCapacityKg);
    }

    // One verdict rule: the guided hover passes exactly when no finding is left, and a rotor rated below the hover speed
    // fails with the rotor_max_speed finding (the verdict follows the findings, HoverReview.Pass).
    [Fact]
    public void Verdict_MatchesTheFindings()
    {
        var study = HoverStudy.Run(Guided());
        Assert.Equal(study.Review.Findings.Count == 0, study.Review.Pass);
        double hoverRpm = study.Review.Hover.Stations.Max(s => s.SpeedRpm);

        var slow = CraftRigs.Model(CraftRigs.Circle(3, cgXM: 0.02, cgYM: -0.01, payloadKg: 0, rotor: CraftRigs.Rotor(maxRpm: 0.8 * hoverRpm)) with { Mount = MountKind.Guided });
        var failed = HoverStudy.Run(slow);
        Assert.False(failed.Review.Pass);
        Assert.Equal(HoverStatus.LimitExceeded, failed.Review.Hover.Status);
        Assert.Contains(failed.Review.Findings, f => f.Limit == DriveLimit.RotorMaxSpeed.Key());
        Assert.Contains(DriveLimit.RotorMaxSpeed.Key(), failed.FailedCriteria);
    }

    // Too heavy for max_duty: lift at the limit (checked here from SpeedsAt at max_duty) is below the weight, so no
    // state exists; the failed verdict names the duty limit and holds no station, hence no duty above max_duty.
    [Fact]
    public void TooHeavyForMaxDuty_FailsNamingThatLimit()
    {
        var model = Guided(payloadKg: 500);
        double max = model.Limits.MaxDuty;
        Assert.True(CommonDutyHover.SpeedsAt(model, [max, max, max], CraftRigs.Gap).TotalLiftN < model.WeightN);
        var study = HoverStudy.Run(model);
        var h = study.Review.Hover;
        Assert.Equal(HoverStatus.NoBalance, h.Status);
        Assert.Empty(h.Stations);
        Assert.False(study.Review.Pass);
        var finding = Assert.Single(study.Review.Hover.Findings);
        Assert.Equal(DriveLimit.DutyHeadroom.Key(), finding.Limit);
        Assert.Contains("max_duty 0.950", finding.Message, StringComparison.Ordinal);
        Assert.Null(study.Rails);
    }

    private static RigModel GuidedWithDuties(IReadOnlyList<double> duties, double payloadKg = 0)
    {
        var rig = CraftRigs.Circle(3, cgXM: 0.02, cgYM: -0.01, payloadKg: payloadKg) with { Mount = MountKind.Guided };
        return CraftRigs.Model(rig with { Stations = rig.Stations.Select((s, i) => s with { Duty = duties[i] }).ToArray() });
    }

    // Inverse problems agree: the common duty the sled needs at the design gap, set on every station, hovers the sled
    // back at that gap (total lift falls with the gap at fixed duties, so lift = weight has one root; the lifts
    // recomputed here from the load model at the reported speeds sum to m g, Newton's first law).
    [Fact]
    public void SetDuties_EqualToTheCommonDutyFound_HoverAtTheDesignGap()
    {
        double duty = HoverStudy.Run(Guided()).Review.Hover.Stations[0].Duty;
        var model = GuidedWithDuties([duty, duty, duty]);
        var study = HoverStudy.Run(model);
        var h = study.Review.Hover;
        Assert.Equal(HoverMode.GuidedSetDuties, h.Mode);
        Assert.True(h.Balanced, string.Join("; ", study.Review.Findings.Select(f => f.Message)));
        RelAssert.Close(CraftRigs.Gap, h.GapM, 1e-6, what: "gap found, m");
        double lift = h.Stations.Sum(s => model.Stations[s.Index].LoadAt(s.SpeedRadPerS, h.GapM).LiftN);
        RelAssert.Close(model.WeightN, lift, 1e-6, what: "sum of station lifts against m g");
        Assert.NotNull(study.Rails);
    }

    // Unequal set duties: each station runs at its own duty (the duty the drive equations need at the reported speed
    // equals the one set, Drela 2007 both ways), the gap is common, and the rails carry the moment of the unequal lifts
    // (rigid-body statics about the centre of gravity).
    [Fact]
    public void UnequalSetDuties_RunEachStationAtItsDuty_AndTheRailsCarryTheMoment()
    {
        double common = HoverStudy.Run(Guided()).Review.Hover.Stations[0].Duty;
        double[] duties = [common + 0.1, common, common - 0.05];
        var model = GuidedWithDuties(duties);
        var study = HoverStudy.Run(model);
        var h = study.Review.Hover;
        Assert.True(h.Balanced, string.Join("; ", study.Review.Findings.Select(f => f.Message)));
        for (int i = 0; i < 3; i++)
        {
            RelAssert.Close(duties[i], h.Stations[i].Duty, 1e-6, what: $"duty of station {i + 1}");
        }
        Assert.True(h.Stations[0].LiftN > h.Stations[2].LiftN);
        double pitch = h.Stations.Sum(s => s.LiftN * (model.Stations[s.Index].XM - model.CgXM));
        RelAssert.Close(pitch, study.Rails!.PitchMomentNm, 1e-9, what: "pitch moment, N m");
    }

    // Duties too low to lift the weight at any gap down to half the landed gap: no state, one named criterion.
    [Fact]
    public void SetDutiesTooLow_FailNamingTheLift_AndPrintNoState()
    {
        var study = HoverStudy.Run(GuidedWithDuties([0.02, 0.02, 0.02], payloadKg: 20));
        var h = study.Review.Hover;
        Assert.Equal(HoverStatus.NoBalance, h.Status);
        Assert.Empty(h.Stations);
        Assert.Contains(Assert.Single(h.Findings).Limit, new[] { "lift", "landed_gap" });
        Assert.False(study.Review.Pass);
        Assert.Null(study.Rails);
    }

    // Duties that carry the weight only below the landed gap: the gear holds the sled there, so no hover state exists.
    [Fact]
    public void SetDutiesThatLiftOnlyBelowTheLandedGap_AreNoHover()
    {
        var rig = CraftRigs.Circle(3, payloadKg: 0) with { Mount = MountKind.Guided };
        var model = CraftRigs.Model(rig);
        // The duty whose lift balances the weight at 0.8 x the landed gap lies below the one needed at the landed gap.
        double duty = CommonDutyHover.SolveAtGap(model, 0.8 * rig.LandedGapM).Stations[0].Duty;
        var study = HoverStudy.Run(GuidedWithDuties([duty, duty, duty]));
        var finding = Assert.Single(study.Review.Hover.Findings);
        Assert.Equal("landed_gap", finding.Limit);
        Assert.Empty(study.Review.Hover.Stations);
    }

    // Only some stations with a duty: the steady state does not mix set and solved duties (the rig reader refuses such a
    // rig; here the core falls back to the common duty).
    [Fact]
    public void SomeStationsWithoutADuty_AreNotASetOfDuties()
    {
        var rig = CraftRigs.Circle(3) with { Mount = MountKind.Guided };
        rig = rig with { Stations = rig.Stations.Select((s, i) => i == 0 ? s with { Duty = 0.5 } : s).ToArray() };
        Assert.Null(SteadyState.SetDuties(rig));
        Assert.Equal(HoverMode.Guided, SteadyState.Solve(CraftRigs.Model(rig)).Mode);
    }
}

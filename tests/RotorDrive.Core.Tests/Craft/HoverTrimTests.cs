using RotorDrive.Core.Tests.Support;
using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;
using RotorDrive.Core.Craft;
using RotorDrive.Core.Tests.Drive;
using Xunit;

namespace RotorDrive.Core.Tests.Craft;

public sealed class HoverTrimTests
{
    // Symmetry: a rig invariant under the rotations of its station pattern, with its centre of gravity on the axis, has a
    // symmetric solution; the least-norm trim picks it (equal speeds minimise the spread), so every duty is equal and the
    // equal cw/ccw reactions cancel (Newton's third law).
    [Theory]
    [InlineData(4)]
    [InlineData(6)]
    [InlineData(8)]
    public void SymmetricRig_TrimsToEqualDuties_AndZeroYaw(int stations)
    {
        var model = CraftRigs.Model(CraftRigs.Circle(stations));
        var hover = HoverTrim.Solve(model);
        Assert.Equal(HoverStatus.Hovering, hover.Status);
        double duty = hover.Stations[0].Duty;
        foreach (var s in hover.Stations)
        {
            RelAssert.Close(duty, s.Duty, 1e-9, what: $"duty of station {s.Index}");
            RelAssert.Close(model.WeightN / stations, s.LiftN, 1e-9, what: $"lift of station {s.Index}");
            Assert.True(s.Stable);
        }
        Assert.True(Math.Abs(hover.YawTorqueNm) <= 1e-9 * hover.Stations.Sum(s => s.ShaftTorqueNm));
    }

    // Solver residuals (Nocedal & Wright, Numerical Optimization, 2006: check the constraints, not only the values):
    // force, pitch, roll and yaw balance to 1e-6 relative with an offset centre of gravity.
    [Theory]
    [InlineData(4, 0.02, -0.015)]
    [InlineData(6, 0.015, -0.01)]
    [InlineData(6, -0.03, 0.02)]
    [InlineData(8, 0.01, 0.03)]
    public void Trim_BalancesForceMomentsAndYaw_To1e6Relative(int stations, double cgX, double cgY)
    {
        var model = CraftRigs.Model(CraftRigs.Circle(stations, cgXM: cgX, cgYM: cgY));
        var hover = HoverTrim.Solve(model);
        Assert.Equal(HoverStatus.Hovering, hover.Status);
        double lift = hover.Stations.Sum(s => s.LiftN);
        double pitch = hover.Stations.Sum(s => s.LiftN * (model.Stations[s.Index].XM - model.CgXM));
        double roll = hover.Stations.Sum(s => s.LiftN * (model.Stations[s.Index].YM - model.CgYM));
        double arm = model.Stations.Max(s => Math.Max(Math.Abs(s.XM - model.CgXM), Math.Abs(s.YM - model.CgYM)));
        double torque = hover.Stations.Sum(s => s.ShaftTorqueNm);
        Assert.True(Math.Abs(lift - model.WeightN) <= 1e-6 * model.WeightN, $"force residual {lift - model.WeightN}");
        Assert.True(Math.Abs(pitch) <= 1e-6 * model.WeightN * arm, $"pitch residual {pitch}");
        Assert.True(Math.Abs(roll) <= 1e-6 * model.WeightN * arm, $"roll residual {roll}");
        Assert.True(Math.Abs(hover.YawTorqueNm) <= 1e-6 * torque, $"yaw residual {hover.YawTorqueNm}");
        Assert.True(Math.Abs(hover.ForceResidualRatio) <= 1e-6 && Math.Abs(hover.PitchResidualRatio) <= 1e-6 && Math.Abs(hover.RollResidualRatio) <= 1e-6);
    }

    // Lever rule (statics of a beam on two supports, J. L. Meriam & L. G. Kraige, Engineering Mechanics: Statics): with
    // stations at x = +-a the front pair carries W (a + x_cg) / 2a and the back pair the rest, whatever the yaw trim.
    [Theory]
    [InlineData(0.0)]
    [InlineData(0.02)]
    [InlineData(0.03)]
    [InlineData(-0.025)]
    public void MovingTheCgTowardAStationPair_RaisesItsShare_AsTheLeverRulePredicts(double cgX)
    {
        const double a = 0.2, b = 0.15;
        var model = CraftRigs.Model(CraftRigs.Rectangle(a, b, cgX, 0));
        var hover = HoverTrim.Solve(model);
        Assert.Equal(HoverStatus.Hovering, hover.Status);
        double front = hover.Stations.Where(s => model.Stations[s.Index].XM > 0).Sum(s => s.LiftN);
        // The station masses sit at the stations, so the model's centre of gravity (not the body's) is the one to use.
        RelAssert.Close(model.WeightN * (a + model.CgXM) / (2 * a), front, 1e-7, what: "front pair lift");
        if (cgX > 0)
        {
            var centred = HoverTrim.Solve(CraftRigs.Model(CraftRigs.Rectangle(a, b, 0, 0)));
            Assert.True(hover.Stations[0].LiftN > centred.Stations[0].LiftN);
        }
    }

    // Lift ~ e^(-2 k g) gives heave stiffness k_h = 2 k W at fixed rotor speeds, so omega_n = sqrt(k_h / m) = sqrt(2 k g)
    // (closed form; Post & Ryutov, IEEE Trans. Appl. Supercond. 10, 2000, for the e^(-k g) field decay).
    [Fact]
    public void HeaveNaturalFrequency_ForASingleWavenumber_IsSqrtTwoKG()
    {
        var model = CraftRigs.Model(CraftRigs.Circle(6, cgXM: 0.01));
        var hover = HoverTrim.Solve(model);
        double expected = Math.Sqrt(2 * CraftRigs.Wavenumber * Units.StandardGravity) / (2 * Math.PI);
        RelAssert.Close(expected, hover.HeaveFrequencyHz, 1e-6, what: "heave frequency, Hz");
        RelAssert.Close(2 * CraftRigs.Wavenumber * model.WeightN, hover.HeaveStiffnessNPerM, 1e-6, what: "heave stiffness");
    }

    // Thin-ring hoop stress sigma = rho omega^2 r^2 (S. P. Timoshenko & J. N. Goodier, Theory of Elasticity, 1970, rotating
    // thin ring): 2700 kg/m3, r = 0.15 m, 6000 rpm -> 2700 (628.32 x 0.15)^2 = 23.98 MPa (worked by hand).
    [Fact]
    public void HoverSafety_ReportsTheThinRingHoopStressWorkedValue_AtMaxRpm()
    {
        const double t = 0.004;
        var rotor = CraftRigs.Rotor(maxRpm: 6000, retainerM: t, outerM: 0.15 - t / 2);
        var rig = CraftRigs.Circle(4, rotor: rotor);
        var options = RigModelOptions.Default with { Safety = new global::RotorDrive.Core.Safety.RotorSafetyOptions { RetainerDensityKgM3 = 2700 } };
        var model = CraftRigs.Model(rig, options);
        var hover = HoverTrim.Solve(model);
        var safety = HoverSafety.Assess(model, hover);
        var atMax = Assert.Single(safety.AtMaxRpm);
        RelAssert.Close(23.98e6, atMax.RingOwnStressPa!.Value, 2e-4, what: "ring hoop stress, Pa");
        Assert.Equal(hover.Stations.Count, safety.AtHover.Count);
        Assert.Contains(safety.Cautions, c => c.Topic == global::RotorDrive.Core.Safety.CautionTopic.RotorBurst);
    }

    // Over-loaded: the first failing limit is named, and the largest payload found by bisection does hover while one
    // bisection step more does not (check by re-solving).
    [Fact]
    public void OverloadedRig_NamesTheFailingLimit_AndAMaxPayloadThatHovers()
    {
        // Far beyond what the rotors can lift at any speed: the rotor speed is what stops it.
        var hopeless = HoverTrim.Solve(CraftRigs.Model(CraftRigs.Circle(4, payloadKg: 40)));
        Assert.Equal(HoverStatus.NoBalance, hopeless.Status);
        Assert.Contains(hopeless.Findings, f => f.Limit == "rotor_max_speed");

        // Just beyond: the lift exists below the rated speed but needs more duty than the limit allows.
        var model = CraftRigs.Model(CraftRigs.Circle(4, payloadKg: 9.5));
        var hover = HoverTrim.Solve(model);
        Assert.NotEqual(HoverStatus.Hovering, hover.Status);
        Assert.Contains(hover.Findings, f => f.Limit == "duty_headroom");
        double? max = HoverTrim.MaxPayloadKg(model);
        Assert.NotNull(max);
        Assert.InRange(max!.Value, 0.0, 9.5);
        Assert.Equal(HoverStatus.Hovering, HoverTrim.Solve(model.WithPayload(max.Value)).Status);
        Assert.NotEqual(HoverStatus.Hovering, HoverTrim.Solve(model.WithPayload(max.Value + 2 * HoverOptions.Default.PayloadToleranceKg)).Status);
    }

    // Mirror symmetry (x -> -x and every spin reversed): the mirrored rig's trim has the same speeds and duties station by
    // station and every reaction torque flips sign; with a Kv mismatch the equal-duty residual yaw flips sign too.
    [Property(MaxTest = 25)]
    public Property MirroringTheRig_MirrorsTheTrim_AndFlipsTheYawSign()
    {
        var gen =
            from n in Gen.Elements(4, 6)
            from radiusCm in Gen.Choose(20, 40)
            from cgXmm in Gen.Choose(-20, 20)
            from cgYmm in Gen.Choose(-20, 20)
            from payload in Gen.Choose(0, 6)
            from odd in Gen.Choose(0, n - 1)
            select (n, radiusCm / 100.0, cgXmm / 1000.0, cgYmm / 1000.0, (double)payload, odd);
        return Prop.ForAll(gen.ToArbitrary(), p =>
        {
            var (n, radius, cgX, cgY, payload, odd) = p;
            var rig = CraftRigs.Circle(n, radius, cgX, cgY, payload);
            var model = CraftRigs.Model(rig);
            var mirror = CraftRigs.Model(CraftRigs.Mirrored(rig));
            var a = HoverTrim.Solve(model);
            var b = HoverTrim.Solve(mirror);
            // Mirroring cannot change whether the craft balances or which limits fail; some drawn rigs (heavy payload,
            // far-off CG) balance with a limit exceeded, and the mirror law holds for them too.
            Assert.Equal(a.Status, b.Status);
            // A balance beyond the drivetrain reports no state (and the same stations falling short).
            Assert.Contains(a.Status, new[] { HoverStatus.Hovering, HoverStatus.LimitExceeded, HoverStatus.BeyondDrivetrain });
            Assert.Equal(a.Findings.Select(f => (f.Limit, f.Station)), b.Findings.Select(f => (f.Limit, f.Station)));
            for (int i = 0; i < a.Stations.Count; i++)
            {
                RelAssert.Close(a.Stations[i].SpeedRadPerS, b.Stations[i].SpeedRadPerS, 1e-7, what: $"speed {i}");
                RelAssert.Close(a.Stations[i].Duty, b.Stations[i].Duty, 1e-7, what: $"duty {i}");
                RelAssert.Close(-a.Stations[i].ReactionTorqueNm, b.Stations[i].ReactionTorqueNm, 1e-7, what: $"reaction {i}");
            }
            var kv = CraftRigs.Motor(kvRpmPerV: 102);
            var duties = Enumerable.Repeat(0.6, n).ToArray();
            double yaw = CommonDutyHover.SpeedsAt(model.WithParts(odd, kv, CraftRigs.Controller), duties, CraftRigs.Gap).YawTorqueNm;
            double yawMirror = CommonDutyHover.SpeedsAt(mirror.WithParts(odd, kv, CraftRigs.Controller), duties, CraftRigs.Gap).YawTorqueNm;
            Assert.True(Math.Abs(yaw) > 1e-6, "the mismatch should leave a residual yaw");
            RelAssert.Close(-yaw, yawMirror, 1e-7, what: "residual yaw");
        });
    }
    // A state that cannot exist is never reported (issue 14 item 2): from a light craft to one the drivetrain cannot hold,
    // every balanced result lies within the drivetrain's physical range (duty at most the controller's maximum, the
    // controller regulating, the bus below the pack's open-circuit voltage: Kirchhoff, V = Voc - I R with I > 0), and
    // where the trim needs more, the result says so and holds no operating state.
    [Fact]
    public void Trim_NeverReportsAStateOutsideTheDrivetrainsRange_AndSaysWhenItNeedsMore()
    {
        bool beyond = false;
        for (double payload = 0; payload <= 12; payload += 0.5)
        {
            var model = CraftRigs.Model(CraftRigs.Circle(4, cgXM: 0.03, payloadKg: payload));
            var hover = HoverTrim.Solve(model);
            if (hover.Balanced)
            {
                Assert.True(hover.BusVoltageV < model.Source.OpenCircuitVoltageV, $"payload {payload}: bus {hover.BusVoltageV} V");
                foreach (var s in hover.Stations)
                {
                    Assert.True(s.Duty <= model.Stations[s.Index].Drivetrain.MaxDuty, $"payload {payload}: station {s.Index} duty {s.Duty}");
                    Assert.Equal(global::RotorDrive.Core.Drive.DriveRegime.Regulating, s.Regime);
                }
            }
            else if (hover.Status == HoverStatus.BeyondDrivetrain)
            {
                beyond = true;
                Assert.Empty(hover.Stations);
                Assert.True(double.IsNaN(hover.BusVoltageV));
                Assert.Contains(hover.Findings, f => f.Station is not null && f.Limit is "duty_headroom" or "controller_current_limit");
                Assert.Contains(hover.Findings, f => f.Limit == "drivetrain" && f.Message.Contains("not a hover", StringComparison.Ordinal));
            }
        }
        Assert.True(beyond, "the sweep should reach a payload the drivetrain cannot hold");
    }
}

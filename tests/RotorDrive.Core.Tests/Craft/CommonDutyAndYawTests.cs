using RotorDrive.Core.Craft;
using RotorDrive.Core.Loads;
using RotorDrive.Core.Magnetics;
using RotorDrive.Core.Tests.Drive;
using RotorDrive.Core.Tests.Support;
using Xunit;

namespace RotorDrive.Core.Tests.Craft;

public sealed class CommonDutyAndYawTests
{
    // Round trip between the two hover questions: the common duty that carries the weight at the design gap (yaw
    // analysis) puts the craft back at the design gap when the gap is solved for that duty; the lift there equals the
    // weight (root residual, Brent 1973) and each station's trimmed-state duty is that common duty.
    [Fact]
    public void CommonDutyGap_AtTheEqualDuty_IsTheDesignGap()
    {
        var model = CraftRigs.Model(CraftRigs.Circle(6, cgXM: 0.01));
        var yaw = YawBalance.Analyse(model);
        Assert.NotNull(yaw.EqualDuty);
        var hover = CommonDutyHover.Solve(model, yaw.EqualDuty!.Value);
        RelAssert.Close(CraftRigs.Gap, hover.GapM, 1e-7, what: "gap");
        Assert.True(Math.Abs(hover.ForceResidualRatio) <= 1e-7);
        foreach (var s in hover.Stations)
        {
            RelAssert.Close(yaw.EqualDuty.Value, s.Duty, 1e-7, what: $"duty {s.Index}");
            Assert.True(s.Stable);
        }
        Assert.True(Math.Abs(hover.PitchResidualRatio) > 1e-4, "an untrimmed craft with an offset centre of gravity must show a pitch moment");
    }

    // A Kv mismatch leaves a residual yaw at equal duty; the differential duty found cancels it (residual check) while the
    // rotors still carry the weight; identical rotors leave none (Newton's third law, equal and opposite reactions).
    [Fact]
    public void DifferentialDuty_CancelsTheResidualYaw_AndStillCarriesTheWeight()
    {
        var nominal = CraftRigs.Model(CraftRigs.Circle(4));
        var clean = YawBalance.Analyse(nominal);
        Assert.True(Math.Abs(clean.ResidualTorqueNm!.Value) < 1e-9);
        Assert.True(clean.Pass);

        var model = nominal.WithParts(0, CraftRigs.Motor(kvRpmPerV: 103), CraftRigs.Controller);
        var yaw = YawBalance.Analyse(model);
        Assert.True(Math.Abs(yaw.ResidualTorqueNm!.Value) > 1e-3);
        Assert.NotNull(yaw.TrimDeltaDuty);
        var duties = model.Stations.Select(s => s.Spin == SpinDirection.Clockwise ? yaw.ClockwiseDuty!.Value : yaw.CounterClockwiseDuty!.Value).ToArray();
        var state = CommonDutyHover.SpeedsAt(model, duties, CraftRigs.Gap);
        Assert.True(Math.Abs(state.YawTorqueNm) <= 1e-7 * state.ReactionTorquesNm.Sum(Math.Abs));
        RelAssert.Close(model.WeightN, state.TotalLiftN, 1e-8, what: "lift");
        RelAssert.Close(yaw.ResidualTorqueNm.Value / model.YawInertiaKgM2, yaw.YawAccelerationRadPerS2!.Value, 1e-12);
        Assert.True(yaw.AuthorityNm > 0);
    }

    // The yaw authority is the edge of the feasible trims: at the authority the trim still hovers, 5 % beyond it does not.
    [Fact]
    public void YawAuthority_IsTheLargestCommandedYawThatStillHovers()
    {
        var model = CraftRigs.Model(CraftRigs.Circle(4));
        var yaw = YawBalance.Analyse(model);
        Assert.Equal(HoverStatus.Hovering, HoverTrim.Solve(model, CraftRigs.Gap, yaw.AuthorityPositiveNm).Status);
        Assert.NotEqual(HoverStatus.Hovering, HoverTrim.Solve(model, CraftRigs.Gap, yaw.AuthorityPositiveNm * 1.05).Status);
        Assert.Equal(HoverStatus.Hovering, HoverTrim.Solve(model, CraftRigs.Gap, -yaw.AuthorityNegativeNm).Status);
    }

    // Sensitivities have the physical sign: above the drag peak a faster rotor (higher Kv) or a rotor farther from the
    // plate (less eddy drag, e^(-2kg)) has less shaft torque; station 0 spins clockwise (reaction sign -1), so both
    // raise the net (counter-clockwise positive) yaw torque. Reitz 1970 thin-sheet drag s/(1+s^2) falls for s > 1.
    [Fact]
    public void YawSensitivities_HaveThePhysicalSign()
    {
        var yaw = YawBalance.Analyse(CraftRigs.Model(CraftRigs.Circle(4)));
        var s = yaw.Sensitivity!;
        Assert.Equal(0, s.StationA);
        Assert.Equal(1, s.StationB);
        Assert.True(s.KvMismatchNm > 0, $"Kv: {s.KvMismatchNm}");
        Assert.True(s.GapDifferenceNm > 0, $"gap: {s.GapDifferenceNm}");
        // A warmer plate raises w, so s = omega/w falls toward the peak and the drag rises: the yaw falls.
        Assert.True(s.PlateTempDifferenceNm < 0, $"plate: {s.PlateTempDifferenceNm}");
    }

    // Sharing: every station with the same rotor uses one load table instance, and variants reuse it (no rebuild).
    [Fact]
    public void RigModel_SharesOneTablePerRotor_AndVariantsReuseIt()
    {
        var rotor = new RotorDesign("tab", 16, 4, 0.07, 0.12, 0.01, 1.3, -0.0012, 7500, 1.5, 0.02, Units.RpmToRadPerS(6000), 0.01, 1e-5, null, null);
        var rig = CraftRigs.Circle(4, rotor: rotor);
        var model = RigModel.Build(rig);
        Assert.IsType<TabulatedRotorLoad>(model.Stations[0].Load);
        Assert.All(model.Stations, s => Assert.Same(model.Stations[0].Load, s.Load));
        var heavier = model.WithPayload(model.PayloadKg + 2);
        Assert.Same(model.Stations[0].Load, heavier.Stations[0].Load);
        RelAssert.Close(model.MassKg + 2, heavier.MassKg, 1e-12);
        Assert.Equal(rig.TotalMassKg, model.MassKg, 9);
        Assert.Equal(rig.CentreOfGravity().XM, model.CgXM, 12);
    }

    [Fact]
    public void RigModel_RefusesARigWithoutParts_AndSaysWhich()
    {
        var rig = CraftRigs.Circle(4);
        rig = rig with { Stations = rig.Stations.Select((s, i) => i == 2 ? s with { Motor = null } : s).ToArray(), Packs = null };
        var missing = RigModel.MissingParts(rig);
        Assert.Contains(missing, m => m.Contains("station 3 has no motor", StringComparison.Ordinal)); // stations count from 1 (index 2)
        Assert.Contains(missing, m => m.Contains("no pack", StringComparison.Ordinal));
        Assert.Throws<ArgumentException>(() => RigModel.Build(rig));
    }
}

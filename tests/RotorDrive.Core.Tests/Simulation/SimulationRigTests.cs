using RotorDrive.Core.Craft;
using RotorDrive.Core.Simulation;
using RotorDrive.Core.Tests.Support;
using Xunit;

namespace RotorDrive.Core.Tests.Simulation;

public sealed class SimulationRigTests
{
    private static SpinupResult SpinUp(SimulationRig rig, double durationS)
        => SpinupSimulator.Run(rig, new SpinupRequest(ThrottleProfile.SpinUp(ControllerMode.Duty, rig.HoverThrottle(ControllerMode.Duty), 1.0), durationS));

    // Eddy forces on a magnet array over a conductor fall off as e^(-2 k g) with the gap (J. R. Reitz, "Forces on Moving
    // Magnets due to Eddy Currents", J. Appl. Phys. 41, 1970): a station set 1 mm lower on its gear meets a higher drag
    // peak, its rotor comes up through the peak later, and so does the craft.
    [Fact]
    public void SmallerGapOffset_RaisesTheLandedDragPeak_AndDelaysLiftoff()
    {
        var model = SimulationRigs.Model(SimulationRigs.Hovering());
        var nominal = SimulationRig.FromModel(model);
        var lowered = SimulationRig.FromModel(model.WithConditions(0, model.Stations[0].Conditions with { GapOffsetM = -1e-3 }));
        Assert.Equal(0.005, lowered.LandedGapM(0), 12);
        Assert.True(lowered.LandedDragPeaks[0].TorqueNm > 1.05 * nominal.LandedDragPeaks[0].TorqueNm,
            $"drag peak {lowered.LandedDragPeaks[0].TorqueNm} N m at 5 mm against {nominal.LandedDragPeaks[0].TorqueNm} N m at 6 mm");
        RelAssert.Close(nominal.LandedDragPeaks[1].TorqueNm, lowered.LandedDragPeaks[1].TorqueNm, 1e-12, what: "the other stations' peaks");

        var a = SpinUp(nominal, 4.0);
        var b = SpinUp(lowered, 4.0);
        Assert.True(b.Stations[0].Motor.PeakA >= a.Stations[0].Motor.PeakA * (1 - 1e-9), "the lowered rotor needs at least the same current");
        Assert.True(b.LiftoffTimeS > a.LiftoffTimeS, $"lift-off {b.LiftoffTimeS} s with the lowered station against {a.LiftoffTimeS} s");
    }

    // The drag peak found from a neighbouring peak's bracket (SimulationRig.With) is the one the full search finds: a
    // maximum is a maximum however it is bracketed (Brent's method on the slope, R. P. Brent, "Algorithms for
    // Minimization without Derivatives", 1973).
    [Theory]
    [InlineData(-1.5e-3)]
    [InlineData(2e-3)]
    public void HintedDragPeak_EqualsTheFullSearch(double offsetM)
    {
        var model = SimulationRigs.Model(SimulationRigs.Hovering());
        var variant = model.WithConditions(1, model.Stations[1].Conditions with { GapOffsetM = offsetM, PlateTempC = 45 });
        var hinted = SimulationRig.FromModel(model).With(variant);
        var full = SimulationRig.FromModel(variant);
        RelAssert.Close(full.LandedDragPeaks[1].SpeedRadPerS, hinted.LandedDragPeaks[1].SpeedRadPerS, 1e-5, what: "peak speed");
        RelAssert.Close(full.LandedDragPeaks[1].TorqueNm, hinted.LandedDragPeaks[1].TorqueNm, 1e-9, what: "peak torque");
    }

    // Parts set on one station reach the simulation: a controller whose current limit is below the current that balances
    // the landed drag peak (I = Q Kv / phi + I0, M. Drela, "First-Order DC Electric Motor Model", MIT, 2007) holds that
    // motor at its limit while the others draw more, and the craft lifts off later than with four strong controllers (once
    // airborne the gap opens, the peak falls and the weak rotor comes through).
    [Fact]
    public void PartsFromWithParts_ReachTheSimulation()
    {
        var model = SimulationRigs.Model(SimulationRigs.Hovering());
        var weak = SimulationRigs.Controller(burstCurrentA: 150, continuousCurrentA: 100);
        var rig = SimulationRig.FromModel(model.WithParts(2, model.Stations[2].Drivetrain.Motor, weak));
        Assert.Equal(150, rig.Drivetrains[2].CurrentLimitA);
        var result = SpinUp(rig, 4.0);
        var nominal = SpinUp(SimulationRig.FromModel(model), 4.0);
        Assert.True(result.Stations[2].PassingCurrentA > 150, $"passing current {result.Stations[2].PassingCurrentA} A");
        RelAssert.Close(150, result.Stations[2].Motor.PeakA, 1e-9, what: "the weak station's peak current, A");
        Assert.True(result.Stations[0].Motor.PeakA > 160, $"a strong station draws {result.Stations[0].Motor.PeakA} A");
        Assert.True(result.LiftoffTimeS > nominal.LiftoffTimeS, $"lift-off {result.LiftoffTimeS} s against {nominal.LiftoffTimeS} s");
        Assert.True(result.PeakYawTorqueNm > 1, "the unequal motor torques yaw the frame");
    }

    // The spin-up starts from each station's conditions: windings and plate patches at their own temperatures (a warm
    // restart), the state of the lumped nodes at t = 0 (Incropera et al., "Fundamentals of Heat and Mass Transfer", 5.2).
    [Fact]
    public void Spinup_StartsFromEachStationsTemperatures()
    {
        var model = SimulationRigs.Model(SimulationRigs.Hovering());
        var warm = model.WithConditions(3, model.Stations[3].Conditions with { WindingTempC = 70, PlateTempC = 45 });
        var trace = SpinUp(SimulationRig.FromModel(warm), 0.5).Trace!;
        Assert.Equal(70, trace.WindingTempC[3][0]);
        Assert.Equal(45, trace.PlateTempC[3][0]);
        Assert.Equal(20, trace.WindingTempC[0][0]);
    }

    // The hover the simulations aim for is the trimmed hover of the model: the duties at a state of charge are those of
    // HoverTrim on the model at that state of charge (the same solve, so to round-off).
    [Fact]
    public void HoverThrottle_IsTheTrimmedHover_AtTheStateOfCharge()
    {
        var model = SimulationRigs.Model(SimulationRigs.Hovering());
        var rig = SimulationRig.FromModel(model);
        var trim = HoverTrim.Solve(model.WithSoc(0.4));
        var duties = rig.HoverThrottle(ControllerMode.Duty, 0.4);
        var speeds = rig.HoverThrottle(ControllerMode.SpeedHold, 0.4);
        for (int j = 0; j < 4; j++)
        {
            RelAssert.Close(trim.Stations[j].Duty, duties[j], 1e-12, what: $"duty {j}");
            RelAssert.Close(trim.Stations[j].SpeedRadPerS, speeds[j], 1e-9, what: $"speed {j}");
        }
    }
}

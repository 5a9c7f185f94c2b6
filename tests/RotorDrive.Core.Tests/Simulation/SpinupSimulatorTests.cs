using RotorDrive.Core.Craft;
using RotorDrive.Core.Simulation;
using RotorDrive.Core.Tests.Support;
using Xunit;

namespace RotorDrive.Core.Tests.Simulation;

public sealed class SpinupSimulatorTests
{
    private static SpinupResult SpinUp(SimulationRig rig, double durationS, SpinupOptions? options = null, double rampS = 1.0, ControllerMode mode = ControllerMode.Duty)
        => SpinupSimulator.Run(rig, new SpinupRequest(ThrottleProfile.SpinUp(mode, rig.HoverThrottle(mode, 1.0), rampS), durationS), options);

    // Newton's second law for rotation: a constant torque Q on an inertia J gives omega = Q t / J. The controller holds
    // its current limit (the back-EMF stays far below the bus), so the motor torque is (I_lim - I0) / Kv (Drela 2007).
    [Theory]
    [InlineData(100.0, 0.2)]
    [InlineData(60.0, 0.15)]
    public void ConstantTorqueOnAnInertia_GivesOmegaEqualsQtOverJ(double limitA, double durationS)
    {
        var motor = SimulationRigs.Motor(rth: null, tau: null, maxC: null);
        var rig = SimulationRigs.Prepared(
            SimulationRigs.Rig(10, motor: motor, controller: SimulationRigs.Controller(burstCurrentA: limitA), pack: SimulationRigs.Pack(0, flat: true)),
            new SimulationRigs.NoLoad());
        var result = SpinupSimulator.Run(rig, new SpinupRequest(ThrottleProfile.SpinUp(ControllerMode.Duty, [1.0, 1.0, 1.0, 1.0], 0), durationS));
        double torque = (limitA - motor.NoLoadCurrentA) / motor.KvRadPerSPerV;
        var trace = result.Trace!;
        for (int i = 1; i < trace.TimeS.Count; i += 5)
        {
            RelAssert.Close(torque * trace.TimeS[i] / SimulationRigs.Rotor.InertiaKgM2, trace.SpeedRadPerS[0][i], 1e-7, what: $"omega at {trace.TimeS[i]} s");
        }
        Assert.Null(result.LiftoffTimeS);
    }

    // First-order DC motor on a pure inertia, no losses but the winding resistance (I0 = 0, no on-resistance, no idle
    // current, ideal source): J omega' = Kt (V - Kt omega)/R, so omega = V Kv (1 - e^(-t/tau)), tau = J R / Kt^2
    // (M. Drela, "First-Order DC Electric Motor Model", MIT, 2007).
    [Theory]
    [InlineData(100.0, 0.03)]
    [InlineData(60.0, 0.05)]
    public void MotorOnAPureInertia_RisesAsOneMinusExponential(double kvRpmPerV, double resistanceOhm)
    {
        var motor = SimulationRigs.Motor(kvRpmPerV, resistanceOhm, noLoadCurrentA: 0, rth: null, tau: null, maxC: null);
        var controller = SimulationRigs.Controller(burstCurrentA: 1e6, onResistanceOhm: 0, idleCurrentA: 0);
        var rig = SimulationRigs.Prepared(
            SimulationRigs.Rig(10, motor: motor, controller: controller, pack: SimulationRigs.Pack(0, flat: true), maxDuty: 1.0),
            new SimulationRigs.NoLoad());
        var result = SpinupSimulator.Run(rig, new SpinupRequest(ThrottleProfile.SpinUp(ControllerMode.Duty, [1.0, 1.0, 1.0, 1.0], 0), 1.0),
            SpinupOptions.Default with { RelativeTolerance = 1e-9 });
        double kt = 1 / motor.KvRadPerSPerV, j = SimulationRigs.Rotor.InertiaKgM2, v = 12 * 3.8;
        double tau = j * resistanceOhm / (kt * kt);
        var trace = result.Trace!;
        for (int i = 1; i < trace.TimeS.Count; i += 7)
        {
            double t = trace.TimeS[i];
            RelAssert.Close(v / kt * (1 - Math.Exp(-t / tau)), trace.SpeedRadPerS[2][i], 1e-6, what: $"omega at {t} s");
        }
    }

    // Conservation of energy (first law): what the cells give up (integral of Voc I) equals the pack's internal loss, the
    // winding, controller and no-load losses, the eddy heat in the plate, windage and bearing loss and the rotors' kinetic
    // energy (Drela 2007 for the motor terms; the eddy heat is drag torque x speed, Reitz 1970).
    [Fact]
    public void EnergyBookkeeping_OverASpinup_ClosesTo1e3()
    {
        var rig = SimulationRigs.Prepared(SimulationRigs.Hovering());
        var result = SpinUp(rig, 3.0);
        var e = result.Energy;
        Assert.True(e.PackChemicalJ > 1000, $"the spin-up draws energy ({e.PackChemicalJ} J)");
        Assert.True(e.EddyJ > 0 && e.CopperJ > 0 && e.KineticChangeJ > 0 && e.PackInternalJ > 0 && e.ControllerJ > 0);
        RelAssert.Close(0, e.ResidualJ, 0, absoluteFloor: 1e-3 * e.PackChemicalJ, what: "energy residual, J");
        double kinetic = 4 * 0.5 * SimulationRigs.Rotor.InertiaKgM2 * Math.Pow(result.Stations[0].FinalSpeedRadPerS, 2);
        RelAssert.Close(kinetic, e.KineticChangeJ, 1e-9, what: "kinetic energy (all four rotors alike)");
    }

    // The results must not depend on the integrator's step sizes: tightening the tolerance by four decades changes the
    // findings by less than 1e-4 relative (the method's convergence: Hairer, Norsett & Wanner 1993, II.4).
    [Fact]
    public void Findings_DoNotDependOnStepSize()
    {
        var rig = SimulationRigs.Prepared(SimulationRigs.Hovering());
        var coarse = SpinUp(rig, 3.0, SpinupOptions.Default with { RecordTrace = false });
        var fine = SpinUp(rig, 3.0, SpinupOptions.Default with { RelativeTolerance = 1e-10, AbsoluteTolerance = 1e-10, RecordTrace = false });
        Assert.True(fine.StepsAccepted > 2 * coarse.StepsAccepted, "the fine run takes more steps");
        RelAssert.Close(fine.LiftoffTimeS!.Value, coarse.LiftoffTimeS!.Value, 1e-4, what: "lift-off time");
        RelAssert.Close(fine.Stations[0].FinalSpeedRadPerS, coarse.Stations[0].FinalSpeedRadPerS, 1e-4, what: "final speed");
        RelAssert.Close(fine.Stations[0].Motor.PeakA, coarse.Stations[0].Motor.PeakA, 1e-4, what: "peak current");
        RelAssert.Close(fine.MinBusVoltageV, coarse.MinBusVoltageV, 1e-4, what: "lowest bus voltage");
        RelAssert.Close(fine.Energy.PackChemicalJ, coarse.Energy.PackChemicalJ, 1e-4, what: "energy drawn");
        RelAssert.Close(fine.Stations[1].PeakPlateTempC, coarse.Stations[1].PeakPlateTempC, 1e-4, what: "plate temperature");
    }

    // A rotor whose controller limits the current below what balances the drag peak at the landed gap
    // (I = Q_peak Kv / phi + I0, Drela 2007 inverted) stays below the peak: it is named, with the passing current; raising
    // the limit to the suggested value lets it through and the craft lifts off.
    [Fact]
    public void StalledRotor_IsDetected_AndPassesOnceItsCurrentLimitIsRaised()
    {
        var stalledRig = SimulationRigs.Prepared(SimulationRigs.Hovering(burstCurrentA: 150));
        var stalled = SpinUp(stalledRig, 4.0);
        Assert.Equal([0, 1, 2, 3], stalled.StalledStations);
        Assert.Null(stalled.LiftoffTimeS);
        var s = stalled.Stations[0];
        Assert.True(s.PassingCurrentA > 150, $"passing current {s.PassingCurrentA} A is above the 150 A limit");
        Assert.True(s.FinalSpeedRadPerS < s.DragPeakSpeedRadPerS);

        var raisedRig = SimulationRigs.Prepared(SimulationRigs.Hovering(burstCurrentA: Math.Ceiling(s.SuggestedCurrentLimitA)));
        var passed = SpinUp(raisedRig, 4.0);
        Assert.Empty(passed.StalledStations);
        Assert.NotNull(passed.LiftoffTimeS);
        Assert.True(passed.Stations[0].FinalSpeedRadPerS > s.DragPeakSpeedRadPerS);

        // Just below the passing current the rotor still stalls: the threshold is not a guess.
        var justBelow = SpinUp(SimulationRigs.Prepared(SimulationRigs.Hovering(burstCurrentA: 0.97 * s.PassingCurrentA)), 4.0);
        Assert.NotEmpty(justBelow.StalledStations);
    }

    // Lumped capacitance (Incropera et al., "Fundamentals of Heat and Mass Transfer", 5.2): with the plate at ambient the
    // patch under a rotor heats at P / (m c), m = rho pi (ro^2 - ri^2) d; copper rho = 8960 kg/m^3 (CRC Handbook, from
    // memory), c = 385 J/(kg K) (Incropera Table A.1). P is the eddy power, drag torque x speed.
    [Fact]
    public void PlatePatch_HeatsAtPOverMc_AtTheStartOfAHover()
    {
        var rig = SimulationRigs.Prepared(SimulationRigs.Hovering());
        double w = rig.HoverSpeedsRadPerS[0];
        var profile = new ThrottleProfile(ControllerMode.SpeedHold, [w, w, w, w], [w, w, w, w], 0);
        var result = SpinupSimulator.Run(rig, new SpinupRequest(profile, 0.02, StartHovering: true), SpinupOptions.Default with { OutputIntervalS = 0.001 });
        var trace = result.Trace!;
        double power = rig.Loads[0].Evaluate(w, 0.010, 20, 20).EddyTorqueNm * w;
        double mass = 8960 * Math.PI * (0.12 * 0.12 - 0.07 * 0.07) * 0.006;
        double rate = (trace.PlateTempC[0][1] - trace.PlateTempC[0][0]) / (trace.TimeS[1] - trace.TimeS[0]);
        RelAssert.Close(power / (mass * 385), rate, 2e-3, what: "initial plate heating rate, K/s");
    }

    // Counter-rotating pairs of identical drivetrains cancel their reaction torques (Newton's third law): no yaw. With
    // every rotor spinning the same way the frame takes the sum of the motor torques; the gear's friction holds it only
    // up to its friction torque.
    [Fact]
    public void Yaw_CancelsForCounterRotatingPairs_AndBuildsWhenAllSpinOneWay()
    {
        var rig = SimulationRigs.Hovering();
        var balanced = SpinUp(SimulationRigs.Prepared(rig), 2.0);
        RelAssert.Close(0, balanced.PeakYawTorqueNm, 0, absoluteFloor: 1e-9, what: "balanced yaw torque");
        RelAssert.Close(0, balanced.FinalYawAngleRad, 0, absoluteFloor: 1e-12, what: "balanced yaw angle");

        var oneWay = rig with { Stations = rig.Stations.Select(s => s with { Spin = SpinDirection.Clockwise }).ToArray() };
        var result = SpinUp(SimulationRigs.Prepared(oneWay), 2.0);
        Assert.True(result.PeakYawTorqueNm > 4 * 10, $"four motors near their limit give a large reaction ({result.PeakYawTorqueNm} N m)");
        Assert.True(result.FinalYawAngleRad > 0.1, $"clockwise rotors turn the frame counter-clockwise ({result.FinalYawAngleRad} rad)");
    }

    // A stop with braking regenerates into the pack (negative pack current, bus above the open-circuit voltage); without
    // braking the controllers freewheel and the pack current never goes negative.
    [Fact]
    public void Stop_WithBraking_Regenerates_AndWithoutBraking_DoesNot()
    {
        var rig = SimulationRigs.Prepared(SimulationRigs.Hovering());
        var running = rig.HoverThrottle(ControllerMode.Duty, 0.5);
        var braking = SpinupSimulator.Run(rig, new SpinupRequest(ThrottleProfile.Stop(ControllerMode.Duty, running, 0.0, braking: true), 2.0, 0.5, StartHovering: true));
        var coasting = SpinupSimulator.Run(rig, new SpinupRequest(ThrottleProfile.Stop(ControllerMode.Duty, running, 0.0, braking: false), 2.0, 0.5, StartHovering: true));
        Assert.True(braking.PeakRegenCurrentA > 1, $"regenerated {braking.PeakRegenCurrentA} A");
        double ocv = rig.Packs.OpenCircuitVoltageAt(0.5);
        Assert.True(braking.MaxBusVoltageV > ocv, "regeneration lifts the bus above the open-circuit voltage");
        Assert.Equal(0, coasting.PeakRegenCurrentA);
        Assert.NotNull(braking.TouchdownTimeS);
        Assert.NotNull(coasting.TouchdownTimeS);
    }
}

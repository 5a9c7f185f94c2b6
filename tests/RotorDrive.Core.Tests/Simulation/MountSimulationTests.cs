using RotorDrive.Core.Craft;
using RotorDrive.Core.Simulation;
using RotorDrive.Core.Tests.Support;
using Xunit;

namespace RotorDrive.Core.Tests.Simulation;

/// <summary>Spin-up and endurance of guided sleds and bench rigs (rig <c>mount</c>, issue 14 item 7): the time simulations
/// start from and hold the steady state the mount gives (<see cref="SteadyState"/>).</summary>
public sealed class MountSimulationTests
{
    private static Rig WithDuty(Rig rig, double duty)
        => rig with { Stations = rig.Stations.Select(s => s with { Duty = duty }).ToArray() };

    // Same steady state, same physics: the four-station test rig is symmetric (centre of gravity on the axis, identical
    // stations on a circle, spins alternating), so its trimmed hover has every station at one speed and duty, which is
    // also the common duty a guided sled finds at the same gap (uniqueness of the top equilibrium; Drela, First-Order DC
    // Electric Motor Model, MIT 2007). The endurance runs must then draw the same pack current and end alike.
    [Fact]
    public void GuidedEndurance_OfASymmetricRig_EqualsTheFreeCraftsRun()
    {
        var free = SimulationRigs.Hovering();
        var guided = free with { Mount = MountKind.Guided };
        var options = EnduranceOptions.Default with { RecordTrace = false };
        var a = EnduranceSimulator.Run(SimulationRigs.Prepared(free), 1.0, options);
        var b = EnduranceSimulator.Run(SimulationRigs.Prepared(guided), 1.0, options);
        Assert.Equal(HoverMode.Trimmed, a.StartHover.Mode);
        Assert.Equal(HoverMode.Guided, b.StartHover.Mode);
        RelAssert.Close(a.StartPackCurrentA, b.StartPackCurrentA, 1e-6, what: "pack current at the start, A");
        for (int j = 0; j < 4; j++)
        {
            RelAssert.Close(a.StartHover.Stations[j].SpeedRadPerS, b.StartHover.Stations[j].SpeedRadPerS, 1e-6, what: $"speed of station {j + 1}");
        }
        Assert.Equal(a.FirstLimit, b.FirstLimit);
        RelAssert.Close(a.RuntimeS, b.RuntimeS, 1e-4, what: "runtime, s");
        RelAssert.Close(a.FinalPackCurrentA, b.FinalPackCurrentA, 1e-4, what: "pack current at the end, A");
    }

    // One station on a stand at duty 0.5: the pack feeds that station alone, so at every instant the pack current is
    // the station's bus current; the averaged switch gives that bus current as duty x motor current + the controller's
    // idle current; the motor current carries the load torque, I = T Kv / flux + I0 (M. Drela, First-Order DC Electric
    // Motor Model, MIT 2007, with Kt = 1/Kv); the bus sits at Voc - R_pack I (Thevenin source). Checked on the start
    // state the endurance run reports, with the load evaluated here from the station's own load at the reported speed.
    [Fact]
    public void BenchEndurance_OneStation_DrawsTheStationsBusCurrent_AsTheDriveEquationsGive()
    {
        var rig = WithDuty(SimulationRigs.Rig(100, motor: SimulationRigs.Motor(kvRpmPerV: 60), stations: 1), 0.5) with { Mount = MountKind.Bench };
        var sim = SimulationRigs.Prepared(rig);
        var run = EnduranceSimulator.Run(sim, 1.0, EnduranceOptions.Default with { RecordTrace = false, MaxDurationS = 60 });
        var h = run.StartHover;
        Assert.Equal(HoverMode.Bench, h.Mode);
        var s = Assert.Single(h.Stations);
        var station = sim.Model.Stations[0];
        var motor = station.Drivetrain.Motor;
        RelAssert.Close(0.5, s.Duty, 1e-6, what: "duty");
        RelAssert.Close(s.BusCurrentA, run.StartPackCurrentA, 1e-12, what: "pack current = the station's bus current, A");
        double torque = station.LoadAt(s.SpeedRadPerS, rig.DesignGapM).TotalTorqueNm;
        RelAssert.Close(torque * motor.KvRadPerSPerV / station.FluxFactor + motor.NoLoadCurrentA, s.MotorCurrentA, 1e-9, what: "motor current, A");
        RelAssert.Close(0.5 * s.MotorCurrentA + station.Drivetrain.Controller.IdleCurrentA, s.BusCurrentA, 1e-6, what: "bus current, A");
        var source = sim.Model.Source;
        RelAssert.Close(source.OpenCircuitVoltageV - source.ResistanceOhm * run.StartPackCurrentA, h.BusVoltageV, 1e-9, what: "bus voltage, V");
        // The stand holds the gap: the run never leaves the design gap.
        Assert.Equal(rig.DesignGapM, h.GapM);
    }

    // A bench spin-up: the rotor runs from rest at the stand's gap to its duty; no lift-off is judged, the rig never turns
    // (the stand carries the reaction), and the rotor settles where the bench steady state puts it.
    [Fact]
    public void BenchSpinup_SettlesAtTheBenchState_WithoutLiftOff()
    {
        var rig = WithDuty(SimulationRigs.Rig(100, motor: SimulationRigs.Motor(kvRpmPerV: 60), stations: 1), 0.5) with { Mount = MountKind.Bench };
        var sim = SimulationRigs.Prepared(rig);
        var study = SpinupStudy.Run(sim, new SpinupStudyRequest(SettleS: 10));
        Assert.DoesNotContain(study.Findings, f => f.Key is "liftoff" or "liftoff_time" or "hover");
        Assert.Null(study.Spinup.LiftoffTimeS);
        Assert.Equal(0.0, study.Spinup.FinalYawAngleRad);
        RelAssert.Close(0.5, Assert.Single(study.TargetsSi), 1e-9, what: "target duty (recovered from the settled state)");
        // The lumped plate patch under the rotor warms during the run (tens of kelvin in seconds), so the speed it settles
        // at is the bench state at the end's plate and winding temperatures and state of charge (quasi-static: the rotor's
        // mechanical time constant is a fraction of a second, the patch's tens of seconds).
        var trace = study.Spinup.Trace!;
        double windingC = trace.WindingTempC[0][^1];
        var c = sim.Model.Stations[0].Conditions;
        var end = sim.Model.WithSoc(trace.SocFraction[^1]).WithStationConditions(
            [c with { PlateTempC = trace.PlateTempC[0][^1], WindingTempC = windingC, MotorMagnetTempC = c.MotorMagnetTempC + (windingC - c.WindingTempC) }]);
        RelAssert.Close(BenchState.Solve(end, rig.DesignGapM).Stations[0].SpeedRadPerS, trace.SpeedRadPerS[0][^1], 2e-3, what: "settled speed, rad/s");
        Assert.All(study.Spinup.Trace!.GapM, g => Assert.Equal(rig.DesignGapM, g, 12));
    }

    // A guided sled's spin-up aims for the guided hover (its common duty) and lifts off its gear; the rails hold yaw.
    [Fact]
    public void GuidedSpinup_RampsToTheCommonDuty_AndDoesNotTurn()
    {
        var rig = SimulationRigs.Hovering() with { Mount = MountKind.Guided };
        var sim = SimulationRigs.Prepared(rig);
        var study = SpinupStudy.Run(sim);
        Assert.True(sim.HoverExists);
        Assert.All(study.TargetsSi, d => RelAssert.Close(sim.Hover.Stations[0].Duty, d, 1e-9, what: "target duty"));
        Assert.NotNull(study.Spinup.LiftoffTimeS);
        Assert.Equal(0.0, study.Spinup.FinalYawAngleRad);
        Assert.Equal(0.0, study.Spinup.PeakYawRateRadPerS);
    }
}

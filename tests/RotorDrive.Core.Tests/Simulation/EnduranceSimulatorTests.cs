using RotorDrive.Core.Craft;
using RotorDrive.Core.Magnetics;
using RotorDrive.Core.Simulation;
using RotorDrive.Core.Tests.Support;
using Xunit;

namespace RotorDrive.Core.Tests.Simulation;

public sealed class EnduranceSimulatorTests
{
    // Charge balance: a constant current I drawn from capacity C until the usable fraction u is spent lasts u C / I
    // (definition of capacity in ampere-hours, IEC 61434). Constant current: flat open-circuit voltage, no pack
    // resistance, no winding heating data, a plate material whose conductivity does not depend on temperature.
    [Theory]
    [InlineData(0.8, 20.0)]
    [InlineData(0.5, 12.0)]
    public void ConstantCurrentDraw_LastsCapacityTimesUsableOverCurrent(double usable, double capacityAh)
    {
        var plate = new Plate(new PlateMaterial("cu-flat", 58e6, 0.0, 8960, 385), 0.006);
        var rig = SimulationRigs.Rig(100, motor: SimulationRigs.Motor(kvRpmPerV: 60, rth: null, tau: null, maxC: null) with { MaxCurrentA = 500 },
            controller: SimulationRigs.Controller(burstCurrentA: 400, continuousCurrentA: 300), pack: SimulationRigs.Pack(0, capacityAh, flat: true),
            plate: plate, usableFraction: usable, plateLimitC: 1e4);
        var sim = SimulationRigs.Prepared(rig, SimulationRigs.TableFor(plate));
        var result = EnduranceSimulator.Run(sim, 1.0, EnduranceOptions.Default with { MaxDurationS = 1e5 });
        Assert.Equal(EnduranceLimit.UsableCapacity, result.FirstLimit);
        RelAssert.Close(usable * capacityAh * 3600 / result.StartPackCurrentA, result.RuntimeS, 1e-9, what: "runtime, s");
        Assert.Contains("usable pack capacity", result.FirstLimitText);
    }

    // The first limit is the one reached first, and it is named: the plate's hottest point (sheet field, DESIGN 4.8) under
    // still air ends the hover before the pack, and the run stops with it at the limit; with a generous plate limit
    // and strong cooling the pack ends it.
    [Fact]
    public void FirstLimit_IsNamed_PlateBeforePack_ThenPack()
    {
        var hot = EnduranceSimulator.Run(SimulationRigs.Prepared(SimulationRigs.Rig(100, motor: SimulationRigs.Motor(kvRpmPerV: 60),
            controller: SimulationRigs.Controller(burstCurrentA: 400, continuousCurrentA: 200), plateLimitC: 60)));
        Assert.Equal(EnduranceLimit.PlateTemperature, hot.FirstLimit);
        RelAssert.Close(60, hot.PeakPlateTempC, 1e-6, what: "plate temperature at the limit, C");
        Assert.Contains("plate temperature", hot.FirstLimitText);

        var cool = EnduranceSimulator.Run(SimulationRigs.Prepared(SimulationRigs.Rig(100, motor: SimulationRigs.Motor(kvRpmPerV: 60),
            controller: SimulationRigs.Controller(burstCurrentA: 400, continuousCurrentA: 200), plateLimitC: 1000, convection: 400)));
        Assert.True(cool.FirstLimit is EnduranceLimit.UsableCapacity or EnduranceLimit.PackCutoff or EnduranceLimit.WindingTemperature, cool.FirstLimitText);
        Assert.True(cool.RuntimeS > hot.RuntimeS);
        var trace = cool.Trace!;
        for (int i = 1; i < trace.TimeS.Count; i++)
        {
            Assert.True(trace.SocFraction[i] < trace.SocFraction[i - 1], "state of charge falls");
        }
    }

    // Step convergence: halving the quasi-static step changes the runtime by less than 0.1 % (Heun's method for charge and
    // windings is second order; the plate field is exact over each step for its mean eddy powers).
    [Fact]
    public void Runtime_DoesNotDependOnTheStep()
    {
        var sim = SimulationRigs.Prepared(SimulationRigs.Rig(100, motor: SimulationRigs.Motor(kvRpmPerV: 60),
            controller: SimulationRigs.Controller(burstCurrentA: 400, continuousCurrentA: 200), plateLimitC: 60));
        var a = EnduranceSimulator.Run(sim, 1.0, EnduranceOptions.Default with { StepS = 5, RecordTrace = false });
        var b = EnduranceSimulator.Run(sim, 1.0, EnduranceOptions.Default with { StepS = 2.5, RecordTrace = false });
        RelAssert.Close(b.RuntimeS, a.RuntimeS, 1e-3, what: "runtime, s");
    }

    // The endurance holds the trimmed hover: at t = 0 its operating point is HoverTrim's on the same model (speeds, motor
    // currents and pack current; the same solve, so to round-off), here with an off-centre payload so the speeds differ.
    [Fact]
    public void StartOperatingPoint_EqualsHoverTrimOfTheModel()
    {
        var rig = SimulationRigs.Hovering();
        rig = rig with { Body = rig.Body with { CgXM = 0.02 } };
        var model = SimulationRigs.Model(rig).WithSoc(0.9);
        var trim = HoverTrim.Solve(model);
        var result = EnduranceSimulator.Run(SimulationRig.FromModel(model), null, EnduranceOptions.Default with { MaxDurationS = 10 });
        Assert.True(trim.Stations[0].SpeedRadPerS > trim.Stations[2].SpeedRadPerS, "the station near the centre of gravity spins faster");
        for (int j = 0; j < 4; j++)
        {
            RelAssert.Close(trim.Stations[j].SpeedRadPerS, result.StartHover.Stations[j].SpeedRadPerS, 1e-9, what: $"speed {j}");
            RelAssert.Close(trim.Stations[j].MotorCurrentA, result.StartHover.Stations[j].MotorCurrentA, 1e-9, what: $"current {j}");
            RelAssert.Close(trim.Stations[j].SpeedRadPerS, result.Trace!.SpeedRadPerS[j][0], 1e-9, what: $"traced speed {j}");
        }
        RelAssert.Close(trim.PackCurrentA, result.StartPackCurrentA, 1e-9, what: "pack current");
        RelAssert.Close(0.9, result.Trace!.SocFraction[0], 1e-12, what: "start state of charge from the model");
    }

    // When no trim exists the run ends at once and says so: a payload the rotors cannot carry even at twice their rated
    // speed (the lift from the same load table is checked first), and a duty limit below the duty the trimmed speeds need
    // on this bus (Drela 2007: duty = (I R + E) / V_bus).
    [Fact]
    public void EnduranceWithoutATrim_EndsAtOnce_NamingTheLostTrim()
    {
        var model = SimulationRigs.Model(SimulationRigs.Hovering());
        var heavy = model.WithPayload(5000);
        double top = 2 * SimulationRigs.Rotor.MaxSpeedRadPerS;
        Assert.True(4 * heavy.Stations[0].LoadAt(top, heavy.DesignGapM).LiftN < heavy.WeightN, "the rotors cannot carry this payload");
        var result = EnduranceSimulator.Run(SimulationRig.FromModel(heavy));
        Assert.Equal(EnduranceLimit.TrimLost, result.FirstLimit);
        Assert.Equal(0, result.RuntimeS);
        Assert.Contains("no longer exists", result.FirstLimitText);

        var trim = HoverTrim.Solve(model);
        double needed = trim.Stations.Max(s => s.Duty);
        var capped = SimulationRigs.Model(SimulationRigs.Rig(100, motor: SimulationRigs.Motor(kvRpmPerV: 60),
            controller: SimulationRigs.Controller(burstCurrentA: 400, continuousCurrentA: 200), maxDuty: 0.9 * needed));
        var cappedResult = EnduranceSimulator.Run(SimulationRig.FromModel(capped));
        Assert.Equal(EnduranceLimit.TrimLost, cappedResult.FirstLimit);
        Assert.Equal(0, cappedResult.RuntimeS);
    }
}

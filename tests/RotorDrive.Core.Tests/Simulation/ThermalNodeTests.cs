using RotorDrive.Core.Drive;
using RotorDrive.Core.Magnetics;
using RotorDrive.Core.Numerics;
using RotorDrive.Core.Simulation;
using RotorDrive.Core.Tests.Support;
using Xunit;

namespace RotorDrive.Core.Tests.Simulation;

public class ThermalNodeTests
{
    // Handbook copper: density 8960 kg/m^3 (CRC Handbook of Chemistry and Physics, 20 C; from memory; Incropera's
    // Table A.1 lists 8933 at 300 K) and specific heat 385 J/(kg K) (F. P. Incropera et al., "Fundamentals of Heat and
    // Mass Transfer", Table A.1, pure copper at 300 K; from memory). Conductivity 58.0 MS/m = 100 % IACS (IEC 60028).
    private static readonly PlateMaterial Copper = new("copper", 58.0e6, 0.00393, 8960, 385);

    private static RotorDesign Rotor(double innerM, double outerM) => new(
        "test rotor", 16, 4, innerM, outerM, 0.01, 1.3, -0.0012, 7500, 2.0, 0.02, 600, 0, 0, 0.003, 800e6);

    private static Motor Motor(double? rth = 0.8, double? tau = 300) => new(
        "test motor", Units.RpmToRadPerS(100), 0.05, 1.0, 20.0, 60, 3000, 14, 0.6, rth, tau, 120);

    [Fact]
    public void PlatePatch_HeatsAtPOverMc_AtTheStart()
    {
        // Hand computation: annulus pi (0.15^2 - 0.08^2) = 0.0505796 m^2; copper 5 mm thick gives
        // m = 8960 x 0.0505796 x 0.005 = 2.265968 kg, m c = 872.398 J/K; 500 W then heats at 0.573133 K/s
        // (lumped capacitance, Incropera section 5.2, with T = ambient so convection is zero).
        var node = PlatePatchThermalNode.UnderRotor(Rotor(0.08, 0.15), new Plate(Copper, 0.005), convectionWPerM2K: 10);
        RelAssert.Close(2.265968, node.MassKg, 1e-6, what: "patch mass, kg");
        RelAssert.Close(0.573133, node.RateKPerS(500, 25, 25), 1e-6, what: "initial rate, K/s");
        RelAssert.Close(2 * 0.0505796, node.CooledAreaM2, 1e-6, what: "both faces");
    }

    [Fact]
    public void PlatePatch_SpreadingFactor_ScalesMassAndArea()
    {
        var plate = new Plate(Copper, 0.005);
        var narrow = PlatePatchThermalNode.UnderRotor(Rotor(0.08, 0.15), plate, 10);
        var wide = PlatePatchThermalNode.UnderRotor(Rotor(0.08, 0.15), plate, 10, spreadingFactor: 2.0, cooledFaces: 1);
        RelAssert.Close(2 * narrow.MassKg, wide.MassKg, 1e-12);
        RelAssert.Close(narrow.CooledAreaM2, wide.CooledAreaM2, 1e-12, what: "twice the area, one face");
        RelAssert.Close(narrow.RateKPerS(500, 20, 20) / 2, wide.RateKPerS(500, 20, 20), 1e-12);
    }

    [Fact]
    public void PlatePatch_SteadyStateAndTimeConstant_FollowTheLumpedModel()
    {
        // T_ss = T_amb + P / (h A), tau = m c / (h A) (Incropera section 5.2; Newton's law of cooling).
        var node = PlatePatchThermalNode.UnderRotor(Rotor(0.08, 0.15), new Plate(Copper, 0.005), 25);
        double hA = 25 * node.CooledAreaM2;
        RelAssert.Close(20 + 300 / hA, node.SteadyStateC(300, 20), 1e-12);
        RelAssert.Close(node.HeatCapacityJPerK / hA, node.TimeConstantS, 1e-12);
        Assert.Equal(0.0, node.RateKPerS(300, node.SteadyStateC(300, 20), 20), 10);
        // After one time constant 1 - 1/e of the rise is done (closed form of the first-order lag).
        double rise = node.SteadyStateC(300, 20) - 20;
        RelAssert.Close(20 + rise * (1 - Math.Exp(-1)), node.TemperatureAfterC(20, 300, 20, node.TimeConstantS), 1e-12);
    }

    [Fact]
    public void Winding_SteadyState_IsAmbientPlusPowerTimesRth()
    {
        // One-node thermal circuit: T_ss = T_amb + P Rth (Incropera section 3.1 thermal resistance, 5.2 lumped model).
        var node = WindingThermalNode.FromMotor(Motor(rth: 0.8, tau: 300))!;
        RelAssert.Close(25 + 60 * 0.8, node.SteadyStateC(60, 25), 1e-12, what: "25 C + 60 W x 0.8 K/W");
        RelAssert.Close(300 / 0.8, node.HeatCapacityJPerK, 1e-12, what: "C = tau / Rth");
        RelAssert.Close(60 / node.HeatCapacityJPerK, node.RateKPerS(60, 25, 25), 1e-12, what: "P / C at ambient");
    }

    [Theory]
    // Closed form of the first-order lag T(t) = T_ss + (T_0 - T_ss) e^(-t / tau): after 1, 2 and 3 time constants the
    // remaining fraction of the rise is e^-1, e^-2, e^-3 (Incropera section 5.2, eq. 5.6).
    [InlineData(1.0)]
    [InlineData(2.0)]
    [InlineData(3.0)]
    public void Winding_ApproachesSteadyState_ExponentiallyWithTau(double timeConstants)
    {
        var node = new WindingThermalNode(0.8, 300);
        double start = 25, ambient = 25, power = 50;
        double tSs = node.SteadyStateC(power, ambient);
        double t = timeConstants * node.TimeConstantS;
        RelAssert.Close(tSs - (tSs - start) * Math.Exp(-timeConstants), node.TemperatureAfterC(start, power, ambient, t), 1e-12);

        // The rate function integrated by the Dormand-Prince integrator reproduces the closed form.
        var y = new[] { start };
        var result = new DormandPrince45(1, new DormandPrince45Options { RelativeTolerance = 1e-10, AbsoluteTolerance = 1e-10 })
            .Integrate((time, s, d) => d[0] = node.RateKPerS(power, s[0], ambient), 0, y, t);
        Assert.Equal(OdeStatus.Completed, result.Status);
        RelAssert.Close(node.TemperatureAfterC(start, power, ambient, t), y[0], 1e-9, what: "integrated temperature");
    }

    [Fact]
    public void WindingHeat_IsCopperLossAtTemperaturePlusNoLoadLoss()
    {
        // Drela 2007: losses = I^2 R + I0 x back-EMF. Hand computation: 20 A, R20 = 0.05 ohm at 70 C gives
        // R = 0.05 (1 + 0.00393 x 50) = 0.059825 ohm (IEC 60028 copper coefficient), I^2 R = 23.93 W; Kv = 100 rpm/V
        // = 10.47198 rad/s/V, 500 rad/s gives 47.74648 V, times I0 = 1 A: 47.74648 W; total 71.67648 W.
        RelAssert.Close(71.67648, WindingThermalNode.HeatW(Motor(), 20, 500, 70), 1e-6);
        RelAssert.Close(71.67648, WindingThermalNode.HeatW(Motor(), -20, -500, 70), 1e-6, what: "sign of current and speed");
        // Magnets at 90 % of their rated flux scale the back-EMF, so the no-load loss: 23.93 + 0.9 x 47.74648 = 66.90183 W.
        RelAssert.Close(66.901832, WindingThermalNode.HeatW(Motor(), 20, 500, 70, fluxFactor: 0.9), 1e-6, what: "flux factor");
    }

    [Fact]
    public void WindingNode_IsNotAssessed_WithoutCatalogThermalData()
    {
        Assert.Null(WindingThermalNode.FromMotor(Motor(rth: null)));
        Assert.Null(WindingThermalNode.FromMotor(Motor(tau: null)));
        Assert.Throws<ArgumentOutOfRangeException>(() => new WindingThermalNode(0, 300));
        Assert.Throws<ArgumentOutOfRangeException>(() => PlatePatchThermalNode.UnderRotor(Rotor(0.08, 0.15), new Plate(Copper, 0.005), 10, spreadingFactor: 0.5));
    }

    [FsCheck.Xunit.Property(MaxTest = 100)]
    public bool PlateTemperature_StaysBetweenStartAndSteadyState(byte powerCode, byte timeCode, byte startCode)
    {
        // A first-order lag under constant input moves monotonically from its start toward its steady state.
        var node = PlatePatchThermalNode.UnderRotor(Rotor(0.08, 0.15), new Plate(Copper, 0.005), 15);
        double power = 10 + 10 * powerCode, start = 10 + startCode / 2.0, elapsed = 20.0 * timeCode;
        double tSs = node.SteadyStateC(power, 20);
        double t = node.TemperatureAfterC(start, power, 20, elapsed);
        return t >= Math.Min(start, tSs) - 1e-9 && t <= Math.Max(start, tSs) + 1e-9;
    }
}

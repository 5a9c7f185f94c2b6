using RotorDrive.Core.Simulation;
using Xunit;

namespace RotorDrive.Core.Tests.Simulation;

public class WindingTextTests
{
    [Fact]
    public void MotorsWithoutThermalData_SayTheWindingIsNotModelled_InsteadOfShowingTheStartTemperature()
    {
        // Without Rth and tau the one-node winding model (Incropera et al., Fundamentals of Heat and Mass Transfer, 5.2)
        // has nothing to integrate: the winding stays at its start temperature, which is not a result.
        var bare = SimulationRig.FromModel(SimulationRigs.Model(SimulationRigs.Rig(20, motor: SimulationRigs.Motor(rth: null, tau: null, maxC: null))));
        Assert.Equal("winding temperature not modelled (no thermal data in the motor rows)", WindingText.Hottest(bare, 20));

        var modelled = SimulationRig.FromModel(SimulationRigs.Model(SimulationRigs.Rig(20)));
        Assert.Equal("hottest winding 74.2 C", WindingText.Hottest(modelled, 74.24));
    }
}

using RotorDrive.Core.Simulation;
using Xunit;

namespace RotorDrive.Core.Tests.Simulation;

public sealed class SpinupStudyTests
{
    // A healthy rig passes: it lifts off within its limit, no rotor stalls, and the landing with braking regenerates into
    // the pack (negative pack current) while the one without braking does not (the controller's body diodes conduct only
    // when the back-EMF exceeds the bus; M. Drela, "First-Order DC Electric Motor Model", MIT, 2007).
    [Fact]
    public void HealthyRig_Passes_AndOnlyTheBrakingLandingRegenerates()
    {
        var rig = SimulationRigs.Prepared(SimulationRigs.Hovering());
        var study = SpinupStudy.Run(rig, new SpinupStudyRequest(RampS: 1.0, SettleS: 3.0));
        Assert.True(study.Passes, string.Join("; ", study.Findings.Select(f => f.Message)));
        Assert.NotNull(study.Spinup.LiftoffTimeS);
        Assert.True(study.LandingBraking.PeakRegenCurrentA > 1);
        Assert.Equal(0, study.LandingCoasting.PeakRegenCurrentA);
        Assert.Equal(4, study.TargetsSi.Count);
        Assert.Equal(14 * 4.2, study.ControllerMaxVoltageV, 12); // the test controller takes up to 14 cells
    }

    // A controller limit below the current that balances the landed drag peak (I = Q Kv / phi + I0, Drela 2007) is a
    // finding per station, in words, with the limit that would pass it; the craft never lifts off, which is a finding too.
    [Fact]
    public void StalledRotors_AreFindings_NamingEachStationAndThePassingLimit()
    {
        var rig = SimulationRigs.Prepared(SimulationRigs.Hovering(burstCurrentA: 150));
        var study = SpinupStudy.Run(rig, new SpinupStudyRequest(RampS: 1.0, SettleS: 3.0));
        Assert.False(study.Passes);
        var stalls = study.Findings.Where(f => f.Key == "stall").ToList();
        Assert.Equal([0, 1, 2, 3], stalls.Select(f => f.Station!.Value));
        Assert.Contains("would pass it", stalls[0].Message);
        Assert.Contains(study.Findings, f => f.Key == "liftoff" && f.Station is null);
    }
}

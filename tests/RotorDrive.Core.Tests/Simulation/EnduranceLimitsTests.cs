using RotorDrive.Core.Simulation;
using Xunit;

namespace RotorDrive.Core.Tests.Simulation;

public sealed class EnduranceLimitsTests
{
    // The pass rule of the endurance analysis as the README states it for `rotordrive endurance` (exit 0 only when the pack
    // - its usable capacity or its cutoff voltage - ends the hover, or nothing does within the time limit); every other
    // limit coming first is a design fault. Project documentation (common practice, no source).
    [Theory]
    [InlineData(EnduranceLimit.UsableCapacity, true)]
    [InlineData(EnduranceLimit.PackCutoff, true)]
    [InlineData(EnduranceLimit.TimeLimit, true)]
    [InlineData(EnduranceLimit.TrimLost, false)]
    [InlineData(EnduranceLimit.WindingTemperature, false)]
    [InlineData(EnduranceLimit.MotorCurrent, false)]
    [InlineData(EnduranceLimit.ControllerCurrent, false)]
    [InlineData(EnduranceLimit.PackCurrent, false)]
    [InlineData(EnduranceLimit.PlateTemperature, false)]
    public void Passes_OnlyWhenThePackOrTheTimeLimitEndsTheHover(EnduranceLimit limit, bool passes)
        => Assert.Equal(passes, limit.Passes());
}

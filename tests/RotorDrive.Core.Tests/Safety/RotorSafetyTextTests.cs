using RotorDrive.Core.Safety;
using Xunit;

namespace RotorDrive.Core.Tests.Safety;

public class RotorSafetyTextTests
{
    private static RotorSafetyResult Checked(double rpm, double? retainerM = 0.003, double? allowablePa = 1200e6, double maxRpm = 7000)
        => RotorSafety.Assess(RotorSafetyTests.Rotor(retainerM, allowablePa, 7500, maxRpm), Units.RpmToRadPerS(rpm));

    [Fact]
    public void APassingCheck_UnderTheCautionsMargin_SaysSo_InTheSameLineEveryInterfacePrints()
    {
        // The example rotor's margin is 0.408 at 6000 rpm (thin-ring hoop stress rho w^2 r^2 plus the magnet load, see
        // RotorSafetyTests), under the burst caution's default 0.5, and 4.63 at 3000 rpm.
        var thin = Checked(6000);
        Assert.True(thin.Passes);
        string line = RotorSafetyText.Line(thin, "rated");
        Assert.StartsWith("passes burst check: rotor ", line);
        Assert.Contains("at 6000 rpm (rated)", line);
        Assert.Contains("margin 41 % (caution: under 50 %)", line);
        Assert.DoesNotContain("caution", RotorSafetyText.Line(Checked(3000), "hover"));
    }

    [Fact]
    public void NotAssessed_IsSaidOnlyWhenTheRowLacksTheRetainer()
    {
        Assert.Contains("ring stress not assessed (the rotor row gives no retainer thickness)", RotorSafetyText.Line(Checked(3000, retainerM: null), "hover"));
        Assert.Contains("no allowable stress in the rotor row", RotorSafetyText.Line(Checked(3000, allowablePa: null), "hover"));
        Assert.DoesNotContain("not assessed", RotorSafetyText.Line(Checked(3000), "hover"));
    }

    [Fact]
    public void AboveTheRatedSpeed_Fails_AndTheClosestToFailingLeads()
    {
        var over = Checked(7100);
        Assert.False(over.Passes);
        Assert.StartsWith("! FAILS burst check", RotorSafetyText.Line(over, "hover"));
        Assert.Contains("above its rated 7000 rpm", RotorSafetyText.Line(over, "hover"));
        Assert.Same(over, RotorDrive.Core.Craft.HoverSafetyReport.Worst([Checked(3000), over, Checked(3000, retainerM: null)]));
        Assert.Null(RotorDrive.Core.Craft.HoverSafetyReport.Worst([]));
    }
}

using RotorDrive.Core.Safety;
using Xunit;

namespace RotorDrive.Core.Tests.Safety;

public class CautionsTests
{
    private static RotorSafetyResult Checked(double rpm, double? retainerM = 0.003, double? allowablePa = 1200e6, double maxRpm = 7000)
        => RotorSafety.Assess(RotorSafetyTests.Rotor(retainerM, allowablePa, 7500, maxRpm), Units.RpmToRadPerS(rpm));

    [Fact]
    public void EveryReport_CarriesMagnetsBurstHotAndEstimates_AsNotices()
    {
        // At 3000 rpm the example rotor's margin is about 4.6 (stress scales as speed squared), far above 0.5.
        var cautions = Cautions.For(new CautionFindings(HasPack: false, [Checked(3000)], 30, 40));
        Assert.Equal([CautionTopic.StrongMagnets, CautionTopic.RotorBurst, CautionTopic.HotSurfaces, CautionTopic.EstimatesOnly], cautions.Select(c => c.Topic));
        Assert.All(cautions, c => Assert.Equal(CautionLevel.Notice, c.Level));
        Assert.All(cautions, c => Assert.Null(c.Reason));
    }

    [Fact]
    public void Pack_AddsTheLithiumCaution()
    {
        var cautions = Cautions.For(new CautionFindings(HasPack: true, []));
        Assert.Contains(cautions, c => c.Topic == CautionTopic.LithiumPacks);
        Assert.Equal(CautionTopic.EstimatesOnly, cautions[^1].Topic);
    }

    [Theory]
    // 45 C threshold: burn thresholds for prolonged contact lie near 43-48 C (ISO 13732-1, from memory).
    [InlineData(44.9, null, false)]
    [InlineData(45.1, null, true)]
    [InlineData(null, 80.0, true)]
    [InlineData(null, null, false)]
    public void HotSurfaceCaution_IsEmphasised_AboveFortyFiveDegrees(double? plateC, double? windingC, bool warning)
    {
        var cautions = Cautions.For(new CautionFindings(false, [], plateC, windingC));
        var hot = cautions.Single(c => c.Topic == CautionTopic.HotSurfaces);
        Assert.Equal(warning ? CautionLevel.Warning : CautionLevel.Notice, hot.Level);
        Assert.Equal(warning, hot.Reason is not null);
        if (warning)
        {
            Assert.Equal(CautionTopic.HotSurfaces, cautions[0].Topic);
        }
    }

    [Fact]
    public void BurstCaution_IsAWarning_WhenTheMarginIsBelowHalf()
    {
        // The example rotor's margin is 0.408 at 6000 rpm (see RotorSafetyTests) and 4.63 at 3000 rpm.
        var low = Cautions.For(new CautionFindings(false, [Checked(3000), Checked(6000)]));
        Assert.Equal(CautionTopic.RotorBurst, low[0].Topic);
        Assert.Equal(CautionLevel.Warning, low[0].Level);
        Assert.Contains("margin 41 % at 6000 rpm is under the 50 % asked for", low[0].Reason);

        var ample = Cautions.For(new CautionFindings(false, [Checked(3000)]));
        Assert.Equal(CautionLevel.Notice, ample.Single(c => c.Topic == CautionTopic.RotorBurst).Level);

        var stricter = Cautions.For(new CautionFindings(false, [Checked(3000)]), new CautionThresholds { BurstMargin = 5 });
        Assert.Equal(CautionLevel.Warning, stricter.Single(c => c.Topic == CautionTopic.RotorBurst).Level);
    }

    [Fact]
    public void BurstCaution_IsAWarning_WhenTheRetainerIsNotAssessedOrTheRotorOverspeeds()
    {
        var unknown = Cautions.For(new CautionFindings(false, [Checked(3000, retainerM: null)]));
        Assert.Contains("not assessed", unknown[0].Reason);
        Assert.Equal(CautionLevel.Warning, unknown[0].Level);

        var overspeed = Cautions.For(new CautionFindings(false, [Checked(3000, maxRpm: 2500)]));
        Assert.Contains("above its rated 2500 rpm", overspeed[0].Reason);
    }

    [Fact]
    public void EveryCaution_HasATitleAndText_AndTheEstimatesCautionDefersToCodesAndRatings()
    {
        Assert.Equal(Enum.GetValues<CautionTopic>(), Cautions.All.Select(c => c.Topic));
        Assert.All(Cautions.All, c => Assert.False(string.IsNullOrWhiteSpace(c.Title) || string.IsNullOrWhiteSpace(c.Text)));
        var estimates = Cautions.All.Single(c => c.Topic == CautionTopic.EstimatesOnly).Text;
        Assert.Contains("local codes", estimates);
        Assert.Contains("manufacturers", estimates);
        Assert.Contains("licensed", estimates);
        Assert.Contains("pacemaker", Cautions.All.Single(c => c.Topic == CautionTopic.StrongMagnets).Text);
    }
}

using RotorDrive.Core.Studies;
using RotorDrive.Core.Studies.Stress;
using Xunit;

namespace RotorDrive.Core.Tests.Studies.Stress;

public class StressSpreadRuleTests
{
    [Theory]
    // Lowest reach: nominal + lower bound (uniform), nominal - 5 sd (normal); the 5 sd cut-off leaves Phi(-5) = 2.87e-7
    // per draw (Abramowitz & Stegun 1964, table 26.1).
    [InlineData(ToleranceShape.Uniform, ToleranceScale.Absolute, -0.5, 2.0, 1.5)]
    [InlineData(ToleranceShape.Uniform, ToleranceScale.Percent, -30, 2.0, 1.4)]
    [InlineData(ToleranceShape.Normal, ToleranceScale.Absolute, 0.1, 2.0, 1.5)]
    [InlineData(ToleranceShape.Normal, ToleranceScale.Percent, 10, 2.0, 1.0)]
    public void Lowest_IsTheUniformLowerBoundOrFiveStandardDeviationsBelow(ToleranceShape shape, ToleranceScale scale, double spread, double nominal, double expected)
    {
        var t = shape == ToleranceShape.Uniform ? Tolerance.Uniform(spread, 1, scale, true) : Tolerance.Normal(spread, scale, true);
        Assert.Equal(expected, StressSpreadRule.Lowest(t, nominal), 12);
    }

    [Fact]
    public void Check_FlagsSpreadsThatReachZero_AndPassesThoseThatStayAbove()
    {
        var rig = StressRigs.Square;
        Assert.Empty(StressSpreadRule.Check(rig, StressRigs.Spreads));
        // Landed gap 6.5 mm: an offset reaching -6.5 mm closes it; -6.4 mm does not.
        var closes = StressTolerances.None.With(StressQuantity.GapOffset, Tolerance.Uniform(-0.0065, 0, ToleranceScale.Absolute, false));
        var v = Assert.Single(StressSpreadRule.Check(rig, closes));
        Assert.Equal(StressQuantity.GapOffset, v.Quantity);
        Assert.Equal(0, v.Station);
        Assert.Equal(0.0, v.LowestSi, 15);
        Assert.Empty(StressSpreadRule.Check(rig, StressTolerances.None.With(StressQuantity.GapOffset, Tolerance.Uniform(-0.0064, 0, ToleranceScale.Absolute, false))));
        // A normal spread of 20 % reaches zero at 5 sd; 19 % does not. Payload may reach zero but not go below.
        Assert.Single(StressSpreadRule.Check(rig, StressTolerances.None.With(StressQuantity.MotorResistance, Tolerance.Normal(20, ToleranceScale.Percent, true))));
        Assert.Empty(StressSpreadRule.Check(rig, StressTolerances.None.With(StressQuantity.MotorResistance, Tolerance.Normal(19, ToleranceScale.Percent, true))));
        Assert.Empty(StressSpreadRule.Check(rig, StressTolerances.None.With(StressQuantity.Payload, Tolerance.Normal(2, ToleranceScale.Absolute, false))));
        Assert.Single(StressSpreadRule.Check(rig, StressTolerances.None.With(StressQuantity.Payload, Tolerance.Normal(2.1, ToleranceScale.Absolute, false))));
    }

    [Fact]
    public void StressModel_RefusesASpreadThatBreaksTheRule()
        => Assert.Throws<ArgumentException>(() => new RigStressModel(StressRigs.Square,
            StressTolerances.None.With(StressQuantity.PlateThickness, Tolerance.Uniform(-0.012, 0, ToleranceScale.Absolute, true))));
}

using RotorDrive.Core.Loads;
using RotorDrive.Core.Tests.Magnetics;
using Xunit;
using RotorDrive.Core.Tests.Support;

namespace RotorDrive.Core.Tests.Loads;

public class RotorInertiaTests
{
    // Hollow cylinder about its axis: I = m (ri^2 + ro^2)/2; solid disc (ri = 0) m R^2/2; thin ring (ri = ro) m R^2
    // (standard tables of mass moments of inertia, e.g. Meriam and Kraige, Engineering Mechanics: Dynamics, appendix).
    [Theory]
    [InlineData(2.0, 0.07, 0.12, 0.0193)]
    [InlineData(3.0, 0.0, 0.10, 0.015)]
    [InlineData(0.5, 0.10, 0.10, 0.005)]
    public void Annulus_IsHalfMassTimesSumOfSquaredRadii(double mass, double ri, double ro, double expected)
        => RelAssert.Close(expected, RotorInertia.AnnulusKgM2(mass, ri, ro), 1e-12);

    [Fact]
    public void Annulus_RejectsOuterRadiusBelowInner()
        => Assert.Throws<ArgumentOutOfRangeException>(() => RotorInertia.AnnulusKgM2(1, 0.1, 0.05));
}

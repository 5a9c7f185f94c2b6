using RotorDrive.Core.Magnetics;
using Xunit;
using RotorDrive.Core.Tests.Support;

namespace RotorDrive.Core.Tests.Magnetics;

public class PlateMaterialTests
{
    private static readonly PlateMaterial AnnealedCopper = new("cu-iacs", 58.0e6, 0.00393, 8890, 385);

    // IEC 60028 (international standard of resistance for copper): 100 % IACS = 58.0 MS/m at 20 C (1/58 ohm mm^2/m), and the
    // resistivity rises with alpha = 0.00393 /K at 20 C, so sigma(T) = 58.0e6 / (1 + 0.00393 (T - 20)).
    [Theory]
    [InlineData(20.0, 58.0e6)]
    [InlineData(75.0, 58.0e6 / 1.216150)]
    [InlineData(-20.0, 58.0e6 / 0.842800)]
    [InlineData(120.0, 58.0e6 / 1.393)]
    public void AnnealedCopper_FollowsIec60028(double tempC, double expected)
        => RelAssert.Close(expected, AnnealedCopper.ConductivityAt(tempC), 1e-12);

    // IEC 60028: the resistivity of the standard annealed copper at 20 C is defined as 1/58 ohm mm^2/m (0.017241...).
    [Fact]
    public void AnnealedCopper_Resistivity_IsTheIecValue()
        => RelAssert.Close(1.0 / 58.0 * 1e-6, 1.0 / AnnealedCopper.ConductivityAt(20.0), 1e-14);
}

using RotorDrive.Core.Loads;
using RotorDrive.Core.Tests.Magnetics;
using Xunit;
using RotorDrive.Core.Tests.Support;

namespace RotorDrive.Core.Tests.Loads;

public class BearingDragTests
{
    // Coulomb plus viscous bearing drag, T0 sign(omega) + c omega (common practice, no source).
    [Theory]
    [InlineData(100.0, 0.01, 1e-5, 0.011)]
    [InlineData(-100.0, 0.01, 1e-5, -0.011)]
    [InlineData(0.0, 0.01, 1e-5, 0.0)]
    public void Torque_IsConstantWithSignPlusViscous(double speed, double constant, double viscous, double expected)
        => RelAssert.Close(expected, BearingDrag.TorqueNm(speed, constant, viscous), 1e-14);
}

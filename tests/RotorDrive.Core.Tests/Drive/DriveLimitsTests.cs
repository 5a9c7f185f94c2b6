using RotorDrive.Core.Drive;
using Xunit;

namespace RotorDrive.Core.Tests.Drive;

public class DriveLimitsTests
{
    [Fact]
    public void RotorSpeed_ReadsInRpm_AndDutyInPercent_NotInRadPerSecondOrOne()
    {
        // 1 rpm = 2 pi / 60 rad/s (the definition of the revolution per minute; BIPM, The International System of Units,
        // 9th edition, 2019, table 8 for the minute and the radian): 5000 rpm = 523.599 rad/s.
        var speed = new LimitMargin(DriveLimit.RotorMaxSpeed, 5250 * 2 * Math.PI / 60, 5000 * 2 * Math.PI / 60);
        Assert.Equal("rotor max speed 5250 rpm exceeds the allowed 5000 rpm", speed.Sentence());
        var duty = new LimitMargin(DriveLimit.DutyHeadroom, 0.98, 0.95);
        Assert.Equal("duty headroom 98 % exceeds the allowed 95 %", duty.Sentence());
        var cutoff = new LimitMargin(DriveLimit.PackCutoffVoltage, 38.2, 39.6, IsLowerBound: true);
        Assert.Equal("pack cutoff voltage 38.2 V is below the allowed 39.6 V", cutoff.Sentence());
        Assert.All(Enum.GetValues<DriveLimit>(), l => Assert.NotEqual("1", l.UserUnit()));
        Assert.All(Enum.GetValues<DriveLimit>(), l => Assert.NotEqual("rad/s", l.UserUnit()));
    }
}

using Xunit;

namespace RotorDrive.Files.Tests;

public class InputProblemTests
{
    [Fact]
    public void ToString_ReadsFileLineColumnFieldMessage()
    {
        var p = new InputProblem("motors.csv", 4, 3, "resistance_ohm", Messages.MustBePositive(-1));
        Assert.Equal("motors.csv:4:3: resistance_ohm: must be greater than 0; got -1", p.ToString());
    }

    [Fact]
    public void ToString_LeavesOutAnEmptyField()
    {
        var p = new InputProblem("rig.json", 0, 0, "", Messages.FileNotFound());
        Assert.Equal("rig.json:0:0: file not found", p.ToString());
    }
}

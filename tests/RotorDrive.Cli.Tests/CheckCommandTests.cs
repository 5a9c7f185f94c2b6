using RotorDrive.Files;
using Xunit;

namespace RotorDrive.Cli.Tests;

public class CheckCommandTests
{
    [Fact]
    public async Task Check_OnAMissingRigFile_ReportsItAndExitsWithBadInput()
    {
        string path = Path.Combine(Path.GetTempPath(), "rotordrive-missing-" + Guid.NewGuid().ToString("N") + ".json");
        var (code, _, error) = await CliRunner.RunAsync("check", path);
        Assert.Equal(ExitCodes.BadInput, code);
        Assert.Contains($"{path}:0:0: {Messages.FileNotFound()}", error);
        Assert.DoesNotContain("   at ", error);
    }

    [Fact]
    public async Task Check_WithoutItsArgument_ExitsWithBadInput()
    {
        var (code, output, error) = await CliRunner.RunAsync("check");
        Assert.Equal(ExitCodes.BadInput, code);
        Assert.Contains("rotordrive:", error);
        Assert.Equal("", output);
    }
}

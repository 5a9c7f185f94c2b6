using Xunit;

namespace RotorDrive.Cli.Tests;

public class CliAppTests
{
    /// <summary>A writer that fails the way a bug would: with an exception that is not about the input.</summary>
    private sealed class BrokenWriter : StringWriter
    {
        public override void WriteLine(string? value) => throw new InvalidOperationException("writer broke\non two lines");
    }

    [Fact]
    public async Task AnUnexpectedException_IsReportedInOneLineWithoutStackTrace_AndExitsWithInternalError()
    {
        using var error = new StringWriter();
        int code = await CliApp.RunAsync(["check", RepoPaths.DemoRig], new BrokenWriter(), error).WaitAsync(TimeSpan.FromMinutes(1));
        Assert.Equal(ExitCodes.InternalError, code);
        string text = error.ToString();
        Assert.Single(text.ReplaceLineEndings("\n").TrimEnd('\n').Split('\n'));
        Assert.Contains("InvalidOperationException: writer broke on two lines", text);
        Assert.DoesNotContain(" at ", text.Replace("writer broke", ""));
    }

    [Fact]
    public async Task Help_ListsTheCheckCommand_AndExitsOk()
    {
        var (code, output, _) = await CliRunner.RunAsync("--help");
        Assert.Equal(ExitCodes.Ok, code);
        Assert.Contains("check", output);
    }
}

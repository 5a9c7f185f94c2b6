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

    [Fact]
    public void EachRegisteredName_BuildsThatCommandAlone_AndHelpBuildsThemAll()
    {
        // Start-up (issue 19 item 5): a run builds only the subcommand its first word names; the name each command is
        // registered under must be the name it parses as, or that command could not be invoked.
        var all = CliApp.BuildRoot().Subcommands.Select(c => c.Name).ToList();
        Assert.Equal(CliApp.CommandNames, all);
        foreach (string name in CliApp.CommandNames)
        {
            Assert.Equal([name], CliApp.BuildRoot(null, name).Subcommands.Select(c => c.Name));
        }
        Assert.Equal(all, CliApp.BuildRoot(null, "--help").Subcommands.Select(c => c.Name));
        Assert.Equal(all, CliApp.BuildRoot(null, "hovr").Subcommands.Select(c => c.Name));
    }

    [Fact]
    public async Task AMistypedCommand_IsStillAnsweredWithTheWholeTree()
    {
        var (code, _, error) = await CliRunner.RunAsync("hovr", "catalogs/demo-rig.json");
        Assert.Equal(ExitCodes.BadInput, code);
        Assert.Contains("hovr", error);
    }
}

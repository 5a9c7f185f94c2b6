using System.Text.Json;
using RotorDrive.Files;
using Xunit;

namespace RotorDrive.Cli.Tests;

/// <summary>A bench or guided rig (rig file <c>mount</c>) gets the per-station analyses; the whole-craft ones refuse it
/// with a clear message and exit 2 instead of failing differently in each command.</summary>
public sealed class MountTests : IDisposable
{
    private readonly string _folder = Directory.CreateTempSubdirectory("rotordrive-mount-").FullName;

    public void Dispose() => Directory.Delete(_folder, recursive: true);

    private string RigWith(string mount)
    {
        string text = File.ReadAllText(RepoPaths.DemoRig);
        foreach (string catalog in new[] { "motors", "controllers", "packs", "cell_curves", "rotors", "plates" })
        {
            text = text.Replace($"\"{catalog}.csv\"", JsonSerializer.Serialize(Path.Combine(RepoPaths.Catalogs, catalog + ".csv")), StringComparison.Ordinal);
        }
        text = text.Replace("\"stations\": [", $"\"mount\": \"{mount}\", \"stations\": [", StringComparison.Ordinal);
        string path = Path.Combine(_folder, mount + "-rig.json");
        File.WriteAllText(path, text);
        return path;
    }

    [Theory]
    [InlineData("bench", "hover")]
    [InlineData("bench", "yaw")]
    [InlineData("bench", "spinup")]
    [InlineData("bench", "endurance")]
    [InlineData("bench", "rank")]
    [InlineData("bench", "stress")]
    [InlineData("guided", "hover")]
    [InlineData("guided", "yaw")]
    public async Task WholeCraftAnalyses_RefuseARigThatIsNotFree_WithExit2(string mount, string command)
    {
        var (code, output, error) = await CliRunner.RunAsync(command, RigWith(mount));
        Assert.Equal(ExitCodes.BadInput, code);
        Assert.Contains(Messages.NotForMount(command, mount), error);
        Assert.Equal("", output);
    }

    [Fact]
    public async Task Report_RefusesABenchRig_BeforeWritingAnything()
    {
        string html = Path.Combine(_folder, "report.html");
        var (code, _, error) = await CliRunner.RunAsync("report", RigWith("bench"), "-o", html);
        Assert.Equal(ExitCodes.BadInput, code);
        Assert.Contains(Messages.NotForMount("report", "bench"), error);
        Assert.False(File.Exists(html));
    }

    [Theory]
    [InlineData("check")]
    [InlineData("load")]
    [InlineData("operate")]
    public async Task PerStationAnalyses_RunOnABenchRig(string command)
    {
        var (code, _, error) = await CliRunner.RunAsync(command, RigWith("bench"));
        Assert.True(code is ExitCodes.Ok or ExitCodes.LimitFindings, error);
    }

    [Fact]
    public async Task ABenchRefusal_WithJson_IsAProblemsDocument()
    {
        var (code, output, _) = await CliRunner.RunAsync("hover", RigWith("bench"), "--json");
        Assert.Equal(ExitCodes.BadInput, code);
        var problem = Assert.Single(JsonDocument.Parse(output).RootElement.GetProperty("problems").EnumerateArray());
        Assert.Contains("not for a bench rig", problem.GetProperty("message").GetString());
    }
}

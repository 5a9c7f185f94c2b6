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
    [InlineData("guided", "yaw")]
    [InlineData("guided", "spinup")]
    [InlineData("guided", "endurance")]
    [InlineData("guided", "rank")]
    [InlineData("guided", "stress")]
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

    // A guided sled hovers at one common duty at its design gap: every station's duty is the same and within max_duty,
    // the lifts sum to the weight (statics, Newton's first law; 1e-6 relative after rounding-free JSON) and the rails'
    // loads are reported.
    [Fact]
    public async Task Hover_OnAGuidedRig_GivesTheCommonDutyAtTheGap()
    {
        var (code, output, error) = await CliRunner.RunAsync("hover", RigWith("guided"), "--json");
        Assert.True(code is ExitCodes.Ok or ExitCodes.LimitFindings, error);
        var root = JsonDocument.Parse(output).RootElement;
        Assert.Equal("guided", root.GetProperty("mode").GetString());
        var stations = root.GetProperty("stations").EnumerateArray().ToList();
        Assert.NotEmpty(stations);
        double duty = stations[0].GetProperty("duty").GetDouble();
        Assert.All(stations, s => Assert.Equal(duty, s.GetProperty("duty").GetDouble(), 1e-9));
        Assert.True(duty <= 0.95, $"duty {duty} above the demo rig's max_duty 0.95");
        double lift = stations.Sum(s => s.GetProperty("lift_n").GetDouble());
        double weight = root.GetProperty("weight_n").GetDouble();
        Assert.True(Math.Abs(lift - weight) <= 1e-6 * weight, $"lift {lift} N, weight {weight} N");
        Assert.Equal(JsonValueKind.Object, root.GetProperty("rails").ValueKind);
        Assert.Equal(code == ExitCodes.Ok, root.GetProperty("pass").GetBoolean());
        Assert.Equal(root.GetProperty("limits").GetArrayLength() == 0, root.GetProperty("pass").GetBoolean());
    }

    // Too heavy for max_duty: the failure names the duty limit, and no duty (let alone one above max_duty) is printed.
    [Fact]
    public async Task Hover_OnAGuidedRigTooHeavyForMaxDuty_FailsNamingTheLimit()
    {
        string path = RigWith("guided");
        File.WriteAllText(path, File.ReadAllText(path).Replace("\"payload_kg\": 25,", "\"payload_kg\": 900,", StringComparison.Ordinal));
        var (code, output, _) = await CliRunner.RunAsync("hover", path);
        Assert.Equal(ExitCodes.LimitFindings, code);
        Assert.Contains("[duty_headroom]", output, StringComparison.Ordinal);
        Assert.Contains("max_duty 0.950", output, StringComparison.Ordinal);
        Assert.DoesNotContain("station  spin   duty", output, StringComparison.Ordinal);
        Assert.Contains("Result: FAIL", output, StringComparison.Ordinal);
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

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

    private string RigWith(string mount, int stations = 6, double? duty = null, string? name = null)
    {
        string text = File.ReadAllText(RepoPaths.DemoRig);
        foreach (string catalog in new[] { "motors", "controllers", "packs", "cell_curves", "rotors", "plates" })
        {
            text = text.Replace($"\"{catalog}.csv\"", JsonSerializer.Serialize(Path.Combine(RepoPaths.Catalogs, catalog + ".csv")), StringComparison.Ordinal);
        }
        text = text.Replace("\"stations\": [", $"\"mount\": \"{mount}\", \"stations\": [", StringComparison.Ordinal);
        // Keep the first stations (a bench of one, a sled of two or three), each with the duty given.
        var lines = text.Split('\n').ToList();
        var rows = lines.Select((l, i) => (l, i)).Where(x => x.l.Contains("\"rotor\": \"hx130-p4\"", StringComparison.Ordinal)).Select(x => x.i).ToList();
        for (int k = rows.Count - 1; k >= stations; k--)
        {
            lines.RemoveAt(rows[k]);
        }
        for (int k = 0; k < stations; k++)
        {
            string row = lines[rows[k]].TrimEnd().TrimEnd(',');
            if (duty is { } d)
            {
                row = row[..row.LastIndexOf('}')].TrimEnd() + ", \"duty\": " + d.ToString(System.Globalization.CultureInfo.InvariantCulture) + " }";
            }
            lines[rows[k]] = "    " + row.Trim() + (k < stations - 1 ? "," : "");
        }
        text = string.Join('\n', lines);
        string path = Path.Combine(_folder, (name ?? mount) + "-rig.json");
        File.WriteAllText(path, text);
        return path;
    }

    [Theory]
    [InlineData("bench", "hover")]
    [InlineData("bench", "yaw")]
    [InlineData("bench", "rank")]
    [InlineData("bench", "stress")]
    [InlineData("guided", "yaw")]
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

    // The demo's six stations on stands at max duty have no steady state: endurance says so and prints no end state
    // (a 0 V bus at "the end" of a run that never started would be a state that cannot exist).
    [Fact]
    public async Task BenchEndurance_WithoutASteadyState_PrintsNoEndState()
    {
        var (code, output, error) = await CliRunner.RunAsync("endurance", RigWith("bench"));
        Assert.True(code is ExitCodes.Ok or ExitCodes.LimitFindings, error);
        if (output.Contains("no steady state of the stations exists", StringComparison.Ordinal))
        {
            Assert.DoesNotContain("at the end:", output);
            Assert.DoesNotContain("hot spot at the end", output);
        }
        else
        {
            Assert.Contains("at the end:", output);
        }
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

    // The README's mount table is MountFit's: a cell says "refused" exactly where the table refuses the command.
    [Fact]
    public void TheReadmesMountTable_IsMountFit()
    {
        string readme = File.ReadAllText(Path.Combine(RepoPaths.Root, "README.md"));
        int start = readme.IndexOf("<!-- mount-table -->", StringComparison.Ordinal);
        int end = readme.IndexOf("<!-- mount-table end -->", StringComparison.Ordinal);
        Assert.True(start >= 0 && end > start, "the README has the mount table");
        var rows = readme[start..end].Split('\n').Where(l => l.StartsWith("| `", StringComparison.Ordinal)).ToList();
        Assert.Equal(RotorDrive.Core.Craft.MountFit.Analyses, rows.Select(r => r.Split('|')[1].Trim().Trim('`')));
        foreach (string row in rows)
        {
            string[] cells = row.Split('|');
            string command = cells[1].Trim().Trim('`');
            var mounts = new[] { RotorDrive.Core.Craft.MountKind.Free, RotorDrive.Core.Craft.MountKind.Guided, RotorDrive.Core.Craft.MountKind.Bench };
            for (int m = 0; m < 3; m++)
            {
                Assert.Equal(!RotorDrive.Core.Craft.MountFit.Fits(command, mounts[m]), cells[2 + m].Trim().StartsWith("refused", StringComparison.Ordinal));
            }
        }
    }

    // A guided sled of three with a duty set on every station: hover finds the gap where those duties lift the weight;
    // every station runs at its set duty and the lifts sum to the weight (Newton's first law, vertical).
    [Fact]
    public async Task Hover_OnAGuidedSledWithSetDuties_FindsTheGap()
    {
        string path = RigWith("guided", stations: 3, duty: 0.6);
        File.WriteAllText(path, File.ReadAllText(path).Replace("\"empty_mass_kg\": 38", "\"empty_mass_kg\": 2", StringComparison.Ordinal)
            .Replace("\"payload_kg\": 25", "\"payload_kg\": 20", StringComparison.Ordinal));
        var (code, output, error) = await CliRunner.RunAsync("hover", path, "--json");
        Assert.True(code is ExitCodes.Ok or ExitCodes.LimitFindings, error);
        var root = JsonDocument.Parse(output).RootElement;
        Assert.Equal("guided_set_duties", root.GetProperty("mode").GetString());
        var stations = root.GetProperty("stations").EnumerateArray().ToList();
        Assert.Equal(3, stations.Count);
        Assert.All(stations, s => Assert.Equal(0.6, s.GetProperty("duty").GetDouble(), 1e-6));
        double lift = stations.Sum(s => s.GetProperty("lift_n").GetDouble());
        double weight = root.GetProperty("weight_n").GetDouble();
        Assert.True(Math.Abs(lift - weight) <= 1e-6 * weight, $"lift {lift} N, weight {weight} N");
        Assert.True(root.GetProperty("gap_mm").GetDouble() > 6.5, "above the landed gap");
        Assert.Equal(JsonValueKind.Object, root.GetProperty("rails").ValueKind);
    }

    [Fact]
    public async Task AGuidedRigWithDutiesOnSomeStationsOnly_IsBadInput()
    {
        string path = RigWith("guided", stations: 3, duty: 0.6);
        string text = File.ReadAllText(path);
        int last = text.LastIndexOf(", \"duty\": 0.6", StringComparison.Ordinal);
        File.WriteAllText(path, text.Remove(last, ", \"duty\": 0.6".Length));
        var (code, _, error) = await CliRunner.RunAsync("hover", path);
        Assert.Equal(ExitCodes.BadInput, code);
        Assert.Contains(Messages.GuidedDutiesPartial(1), error);
    }

    // Each new path ends with a verdict and finite numbers: spin-up and endurance of a guided sled (common duty and set
    // duties) and of a bench of one station (its duty, or --gap-mm / --duty).
    [Theory]
    [InlineData("guided", 3, null, "spinup")]
    [InlineData("guided", 2, 0.9, "spinup")]
    [InlineData("guided", 3, null, "endurance")]
    [InlineData("guided", 3, 0.8, "endurance")]
    [InlineData("bench", 1, 0.5, "spinup")]
    [InlineData("bench", 1, null, "endurance")]
    [InlineData("bench", 1, 0.5, "endurance", "--gap-mm", "14", "--duty", "0.4")]
    public async Task SpinupAndEndurance_OnGuidedAndBenchRigs_GiveAVerdictWithFiniteNumbers(string mount, int stations, double? duty, string command, params string[] extra)
    {
        string path = RigWith(mount, stations, duty);
        File.WriteAllText(path, File.ReadAllText(path).Replace("\"empty_mass_kg\": 38", "\"empty_mass_kg\": 2", StringComparison.Ordinal)
            .Replace("\"payload_kg\": 25", "\"payload_kg\": 20", StringComparison.Ordinal));
        var (code, output, error) = await CliRunner.RunAsync([command, path, "--json", .. extra]);
        Assert.True(code is ExitCodes.Ok or ExitCodes.LimitFindings, error);
        Assert.DoesNotContain("NaN", output);
        Assert.DoesNotContain("Infinity", output);
        var root = JsonDocument.Parse(output).RootElement;
        Assert.Equal(mount, root.GetProperty("mount").GetString());
        Assert.Equal(code == ExitCodes.Ok, root.GetProperty("pass").GetBoolean());
    }

    [Fact]
    public async Task BenchOptions_OnARigThatIsNotABench_AreBadInput()
    {
        var (code, output, error) = await CliRunner.RunAsync("endurance", RigWith("guided"), "--gap-mm", "12");
        Assert.Equal(ExitCodes.BadInput, code);
        Assert.Contains(Messages.StandsOptionsNeedBench("--gap-mm", "guided"), error);
        Assert.Equal("", output);
    }
}

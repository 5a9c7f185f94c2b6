using System.Text.Json;
using Xunit;

namespace RotorDrive.Cli.Tests;

public sealed class HoverCommandTests : IDisposable
{
    private readonly string _folder = Path.Combine(Path.GetTempPath(), "rotordrive-hover-" + Guid.NewGuid().ToString("N"));

    public void Dispose()
    {
        if (Directory.Exists(_folder))
        {
            Directory.Delete(_folder, recursive: true);
        }
    }

    private static string TestRig => Path.Combine(RepoPaths.Catalogs, "test-rig.json");

    // Statics (force balance): the stations' lifts add up to the weight; the documented keys are all there.
    [Theory]
    [InlineData("demo-rig.json", 6)]
    [InlineData("test-rig.json", 4)]
    public async Task Hover_Json_TrimsTheRig_WithEveryDocumentedKey(string rigFile, int stations)
    {
        var (code, output, error) = await CliRunner.RunAsync("hover", Path.Combine(RepoPaths.Catalogs, rigFile), "--json");
        Assert.True(code == ExitCodes.Ok, error + output);
        using var doc = JsonDocument.Parse(output);
        var root = doc.RootElement;
        Assert.Equal("trimmed", root.GetProperty("mode").GetString());
        foreach (string key in new[] { "gap_mm", "pack_current_a", "pack_voltage_v", "electrical_power_w", "plate_power_w", "lift_specific_power_w_per_n", "heave_stiffness_n_per_mm", "heave_frequency_hz", "yaw_torque_nm", "mass_kg", "weight_n" })
        {
            Assert.True(root.GetProperty(key).ValueKind == JsonValueKind.Number, key);
        }
        var st = root.GetProperty("stations").EnumerateArray().ToArray();
        Assert.Equal(stations, st.Length);
        foreach (string key in new[] { "duty", "speed_rpm", "lift_n", "shaft_torque_nm", "motor_current_a", "bus_current_a", "eddy_power_w", "lift_specific_power_w_per_n" })
        {
            Assert.True(st[0].GetProperty(key).ValueKind == JsonValueKind.Number, key);
        }
        Assert.NotEmpty(st[0].GetProperty("margins").EnumerateArray());
        double lift = st.Sum(s => s.GetProperty("lift_n").GetDouble());
        double weight = root.GetProperty("weight_n").GetDouble();
        Assert.True(Math.Abs(lift - weight) <= 1e-6 * weight, $"lift {lift} vs weight {weight}");
        Assert.Empty(root.GetProperty("limits").EnumerateArray());
        Assert.True(root.GetProperty("safety").GetProperty("retainer_stress_mpa").GetDouble() > 0);
        Assert.Contains(root.GetProperty("cautions").EnumerateArray(), c => c.GetProperty("topic").GetString() == "strong_magnets");
    }

    [Fact]
    public async Task Hover_Text_ShowsTheTableTotalsSafetyAndCautions()
    {
        var (code, output, _) = await CliRunner.RunAsync("hover", RepoPaths.DemoRig);
        Assert.Equal(ExitCodes.Ok, code);
        Assert.Contains("Trimmed hover", output);
        Assert.Contains("speed_rpm", output);
        Assert.Contains("lift-specific power", output);
        Assert.Contains("Rotor safety", output);
        Assert.Contains("Result: PASS", output);
        Assert.Contains("Lithium packs", output);
    }

    [Fact]
    public async Task Hover_BurstChecks_AreCoresOneWording_InTextAndJson_WithTheMarginInPercent()
    {
        var (_, text, _) = await CliRunner.RunAsync("hover", RepoPaths.DemoRig);
        var (_, json, _) = await CliRunner.RunAsync("hover", RepoPaths.DemoRig, "--json");
        var checks = JsonDocument.Parse(json).RootElement.GetProperty("safety").GetProperty("checks").EnumerateArray().Select(c => c.GetString()!).ToList();
        Assert.Equal(2, checks.Count);
        Assert.StartsWith("passes burst check: rotor hx130-p4 at ", checks[0]);
        Assert.Contains(" rpm (hover), ring ", checks[0]);
        // The demo rotor passes at its rated 5000 rpm with a margin under the burst caution's 50 %: the check line says so,
        // and the caution's reason uses the same per cent, not a bare fraction (issue 14 item 9).
        Assert.StartsWith("passes burst check: rotor hx130-p4 at 5000 rpm (rated)", checks[1]);
        Assert.Contains("margin 33 % (caution: under 50 %)", checks[1]);
        Assert.All(checks, c => Assert.Contains("  " + c, text));
        Assert.Contains("retaining-ring margin 33 % at 5000 rpm is under the 50 % asked for", text);
        Assert.DoesNotContain("max_rpm", text);
    }

    // The over-loaded demo names the failing limit and a payload that does hover; re-running at that payload passes.
    [Fact]
    public async Task Hover_Overloaded_ExitsOne_NamesTheLimit_AndAPayloadThatHovers()
    {
        var (code, output, _) = await CliRunner.RunAsync("hover", RepoPaths.DemoRig, "--payload-kg", "60", "--json");
        Assert.Equal(ExitCodes.LimitFindings, code);
        using var doc = JsonDocument.Parse(output);
        var limits = doc.RootElement.GetProperty("limits").EnumerateArray().ToArray();
        Assert.NotEmpty(limits);
        Assert.All(limits, l => Assert.False(string.IsNullOrEmpty(l.GetProperty("limit").GetString())));
        double max = doc.RootElement.GetProperty("max_payload_kg").GetDouble();
        Assert.InRange(max, 0, 60);
        var again = await CliRunner.RunAsync("hover", RepoPaths.DemoRig, "--payload-kg", max.ToString("R", System.Globalization.CultureInfo.InvariantCulture));
        Assert.Equal(ExitCodes.Ok, again.ExitCode);
    }

    [Fact]
    public async Task Hover_CommonDuty_SolvesTheGap()
    {
        var (code, output, error) = await CliRunner.RunAsync("hover", TestRig, "--common-duty", "0.7", "--json");
        Assert.True(code is ExitCodes.Ok or ExitCodes.LimitFindings, error);
        using var doc = JsonDocument.Parse(output);
        Assert.Equal("common_duty", doc.RootElement.GetProperty("mode").GetString());
        double gap = doc.RootElement.GetProperty("gap_mm").GetDouble();
        Assert.InRange(gap, 2.5, 24);
        Assert.All(doc.RootElement.GetProperty("stations").EnumerateArray(), s => Assert.Equal(0.7, s.GetProperty("duty").GetDouble(), 6));
    }

    [Fact]
    public async Task Hover_GapAndCommonDutyTogether_IsBadInput()
    {
        var (code, _, error) = await CliRunner.RunAsync("hover", RepoPaths.DemoRig, "--gap-mm", "9", "--common-duty", "0.5");
        Assert.Equal(ExitCodes.BadInput, code);
        Assert.Contains("cannot be used together", error);
    }

    [Fact]
    public async Task Hover_RigWithoutAMotor_IsBadInput_NamingTheStation()
    {
        Directory.CreateDirectory(_folder);
        foreach (var file in Directory.GetFiles(RepoPaths.Catalogs))
        {
            File.Copy(file, Path.Combine(_folder, Path.GetFileName(file)));
        }
        string rig = Path.Combine(_folder, "demo-rig.json");
        string text = File.ReadAllText(rig);
        int at = text.IndexOf("\"motor\": \"or1050-kv90\", ", StringComparison.Ordinal);
        File.WriteAllText(rig, text.Remove(at, "\"motor\": \"or1050-kv90\", ".Length));
        foreach (string command in new[] { "hover", "yaw" })
        {
            var (code, output, error) = await CliRunner.RunAsync(command, rig);
            Assert.Equal(ExitCodes.BadInput, code);
            Assert.Contains("station 1 has no motor", error);
            Assert.Equal("", output);
        }
    }
    // A payload the drivetrain cannot hold (issue 14 item 2): no operating state is printed (today's code printed duties
    // above 1 and a bus voltage above the pack's), the stations that fall short are named, exit 1.
    [Fact]
    public async Task Hover_BeyondTheDrivetrain_PrintsNoImpossibleState()
    {
        var (code, output, error) = await CliRunner.RunAsync("hover", RepoPaths.DemoRig, "--payload-kg", "40", "--json");
        Assert.True(code == ExitCodes.LimitFindings, error + output);
        using var doc = JsonDocument.Parse(output);
        var root = doc.RootElement;
        Assert.Equal(0, root.GetProperty("stations").GetArrayLength());
        Assert.Equal(JsonValueKind.Null, root.GetProperty("pack_voltage_v").ValueKind);
        Assert.False(root.GetProperty("pass").GetBoolean());
        Assert.Contains(root.GetProperty("limits").EnumerateArray(), l => l.GetProperty("limit").GetString() == "duty_headroom"
            && l.GetProperty("station").ValueKind == JsonValueKind.Number);
        var (_, text, _) = await CliRunner.RunAsync("hover", RepoPaths.DemoRig, "--payload-kg", "40");
        Assert.Contains("No hover state exists here", text);
        Assert.Contains("not a hover", text);
        Assert.DoesNotContain("speed_rpm", text);
    }
}

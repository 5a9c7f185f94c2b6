using System.Globalization;
using System.Text.Json;
using RotorDrive.Files;
using Xunit;

namespace RotorDrive.Cli.Tests;

public sealed class StressCommandTests : IDisposable
{
    private readonly string _folder = Path.Combine(Path.GetTempPath(), "rotordrive-stress-" + Guid.NewGuid().ToString("N"));

    public StressCommandTests() => Directory.CreateDirectory(_folder);

    public void Dispose() => Directory.Delete(_folder, recursive: true);

    private string CopyDemo(Func<string, string>? edit = null)
    {
        foreach (var file in Directory.GetFiles(RepoPaths.Catalogs))
        {
            File.Copy(file, Path.Combine(_folder, Path.GetFileName(file)), overwrite: true);
        }
        string rig = Path.Combine(_folder, "demo-rig.json");
        if (edit is not null)
        {
            File.WriteAllText(rig, edit(File.ReadAllText(rig)));
        }
        return rig;
    }

    [Fact]
    public async Task Stress_Json_HasTheDocumentedKeys()
    {
        var (code, output, error) = await CliRunner.RunAsync("stress", RepoPaths.DemoRig, "--samples", "24", "--seed", "4", "--json");
        Assert.True(code is ExitCodes.Ok or ExitCodes.LimitFindings, error);
        using var doc = JsonDocument.Parse(output);
        var root = doc.RootElement;
        Assert.Equal(24, root.GetProperty("samples").GetInt32());
        Assert.Equal(4, root.GetProperty("seed").GetInt32());
        Assert.False(root.GetProperty("partial").GetBoolean());
        var rate = root.GetProperty("failure_rate");
        Assert.True(rate.GetProperty("ci_low").GetDouble() <= rate.GetProperty("rate").GetDouble());
        Assert.True(rate.GetProperty("rate").GetDouble() <= rate.GetProperty("ci_high").GetDouble());
        Assert.Equal(7, root.GetProperty("criteria").GetArrayLength());
        Assert.Equal(5, root.GetProperty("percentiles").GetArrayLength());
        Assert.True(root.GetProperty("drivers").GetArrayLength() > 0);
        Assert.True(root.GetProperty("worst_sample").GetProperty("index").GetInt32() is >= 0 and < 24);
        // Progress goes to stderr, never to stdout.
        Assert.Contains("stress: 24 of 24 samples", error);
        Assert.DoesNotContain("stress:", output);
    }

    [Fact]
    public async Task SameSeed_GivesByteIdenticalJson_WithOneAndTwoThreads()
    {
        var one = await CliRunner.RunAsync("stress", RepoPaths.DemoRig, "--samples", "16", "--threads", "1", "--json");
        var two = await CliRunner.RunAsync("stress", RepoPaths.DemoRig, "--samples", "16", "--threads", "2", "--json");
        Assert.Equal(one.ExitCode, two.ExitCode);
        Assert.Equal(one.Output, two.Output);
    }

    [Fact]
    public async Task SampleK_ReproducesTheStudysRowExactly()
    {
        string csv = Path.Combine(_folder, "rows.csv");
        var (code, _, error) = await CliRunner.RunAsync("stress", RepoPaths.DemoRig, "--samples", "12", "--seed", "9", "--csv", csv);
        Assert.True(code is ExitCodes.Ok or ExitCodes.LimitFindings, error);
        string[] lines = File.ReadAllLines(csv);
        string[] header = lines[0].Split(',');
        Assert.Equal(13, lines.Length);
        foreach (int k in new[] { 3, 11 })
        {
            string[] row = lines[k + 1].Split(',');
            var (sampleCode, output, _) = await CliRunner.RunAsync("stress", RepoPaths.DemoRig, "--seed", "9", "--sample", k.ToString(CultureInfo.InvariantCulture), "--json");
            using var doc = JsonDocument.Parse(output);
            var root = doc.RootElement;
            Assert.Equal(k, root.GetProperty("sample").GetInt32());
            Assert.Equal(row[1] == "true", root.GetProperty("passed").GetBoolean());
            Assert.Equal(row[1] == "true" ? ExitCodes.Ok : ExitCodes.LimitFindings, sampleCode);
            foreach (var margin in root.GetProperty("margins").EnumerateObject())
            {
                string cell = row[Array.IndexOf(header, "margin_" + margin.Name)];
                if (margin.Value.ValueKind == JsonValueKind.Null)
                {
                    Assert.Equal("", cell);
                }
                else
                {
                    // The CSV writes 15 significant digits (CsvNumber); the JSON keeps every digit.
                    Assert.Equal(Files.Exports.CsvNumber.Format(margin.Value.GetDouble()), cell);
                }
            }
            string hover = row[Array.IndexOf(header, "hover_speed_rpm")];
            if (hover.Length > 0)
            {
                Assert.Equal(Files.Exports.CsvNumber.Format(root.GetProperty("hover_speed_rpm").GetDouble()), hover);
            }
            Assert.True(root.GetProperty("trace").GetArrayLength() > 2);
            Assert.Equal(6, root.GetProperty("parts").GetProperty("stations").GetArrayLength());
        }
    }

    [Fact]
    public async Task Csv_RefusesToOverwrite_WithoutForce()
    {
        string csv = Path.Combine(_folder, "keep.csv");
        File.WriteAllText(csv, "mine");
        var (code, _, error) = await CliRunner.RunAsync("stress", RepoPaths.DemoRig, "--samples", "2", "--csv", csv);
        Assert.Equal(ExitCodes.BadInput, code);
        Assert.Contains(Messages.FileExists(), error);
        Assert.Equal("mine", File.ReadAllText(csv));
        var (forced, _, _) = await CliRunner.RunAsync("stress", RepoPaths.DemoRig, "--samples", "2", "--csv", csv, "--force");
        Assert.NotEqual(ExitCodes.BadInput, forced);
        Assert.StartsWith("sample,passed,margin_liftoff", File.ReadAllText(csv));
    }

    [Fact]
    public async Task SampleTrace_GoesToCsv()
    {
        string csv = Path.Combine(_folder, "trace.csv");
        var (code, output, _) = await CliRunner.RunAsync("stress", RepoPaths.DemoRig, "--sample", "0", "--csv", csv);
        Assert.NotEqual(ExitCodes.BadInput, code);
        Assert.Contains("Stress sample 0", output);
        Assert.StartsWith("time_s,duty,speed_rpm_1,", File.ReadAllText(csv));
    }

    [Fact]
    public async Task BadTolerance_IsReportedWithFileLineAndRule_ExitTwo()
    {
        string rig = CopyDemo(t => t.Replace("\"gap_offset_mm\": { \"normal_sd\": 0.7 }", "\"gap_offset_mm\": { \"normal_sd_pct\": 5 }", StringComparison.Ordinal));
        int line = Array.FindIndex(File.ReadAllLines(rig), l => l.Contains("\"gap_offset_mm\"", StringComparison.Ordinal)) + 1;
        var (code, output, error) = await CliRunner.RunAsync("stress", rig, "--samples", "2");
        Assert.Equal(ExitCodes.BadInput, code);
        Assert.Equal("", output);
        Assert.Contains($"demo-rig.json:{line}:", error);
        Assert.Contains("$.tolerances.gap_offset_mm.normal_sd_pct", error);
        Assert.Contains(Messages.ToleranceAbsoluteOnly("gap_offset_mm"), error);
    }

    [Theory]
    // Each spread can reach zero or below before a study runs (StressSpreadRule: a uniform lower bound, or 5 standard
    // deviations below nominal; the demo's landed gap is 6.5 mm, its plate 12 mm, its payload 25 kg).
    [InlineData("\"gap_offset_mm\": { \"normal_sd\": 0.7 }", "\"gap_offset_mm\": { \"uniform\": [-7, 0] }", "gap_offset_mm.uniform", "landed gap plus gap offset at station 1")]
    [InlineData("\"gap_offset_mm\": { \"normal_sd\": 0.7 }", "\"gap_offset_mm\": { \"normal_sd\": 1.4 }", "gap_offset_mm.normal_sd", "landed gap plus gap offset at station 1")]
    [InlineData("\"plate_thickness_mm\": { \"uniform\": [-0.3, 0.3] }", "\"plate_thickness_mm\": { \"uniform\": [-12, 0.3] }", "plate_thickness_mm.uniform", "plate thickness")]
    [InlineData("\"pack_resistance_mohm\": { \"normal_sd_pct\": 15 }", "\"pack_resistance_mohm\": { \"normal_sd_pct\": 25 }", "pack_resistance_mohm.normal_sd_pct", "pack internal resistance")]
    [InlineData("\"payload_kg\": { \"normal_sd\": 4 }", "\"payload_kg\": { \"normal_sd\": 6 }", "payload_kg.normal_sd", "payload")]
    public async Task SpreadThatCanReachZero_IsABadInputAtReadTime_NamingFileLinePathAndRule(string from, string to, string path, string what)
    {
        string rig = CopyDemo(t => t.Replace(from, to, StringComparison.Ordinal));
        string key = path[..path.IndexOf('.', StringComparison.Ordinal)];
        int line = Array.FindIndex(File.ReadAllLines(rig), l => l.Contains($"\"{key}\": {{", StringComparison.Ordinal)) + 1;
        var (code, output, error) = await CliRunner.RunAsync("stress", rig, "--samples", "2", "--json");
        Assert.Equal(ExitCodes.BadInput, code);
        // With --json the problems are also the stdout document.
        var problem = Assert.Single(JsonDocument.Parse(output).RootElement.GetProperty("problems").EnumerateArray());
        Assert.Equal("$.tolerances." + path, problem.GetProperty("field").GetString());
        Assert.Contains($"demo-rig.json:{line}:", error);
        Assert.Contains("$.tolerances." + path, error);
        Assert.Contains("this spread can make the " + what, error);
        Assert.Contains("rule: a uniform spread's lower bound, or 5 standard deviations below nominal", error);
        Assert.DoesNotContain("   at ", error);
    }

    [Fact]
    public async Task TemperatureSpreadBeyondTheFilesRange_IsABadInputAtReadTime()
    {
        // Ambient 22 C; the file accepts -40 .. 60 C.
        string rig = CopyDemo(t => t.Replace("\"ambient_c\": { \"uniform\": [-12, 12] }", "\"ambient_c\": { \"uniform\": [-70, 12] }", StringComparison.Ordinal));
        var (code, _, error) = await CliRunner.RunAsync("stress", rig, "--samples", "2");
        Assert.Equal(ExitCodes.BadInput, code);
        Assert.Contains("$.tolerances.ambient_c.uniform", error);
        Assert.Contains(Messages.ToleranceTemperatureRange("ambient temperature", -48, 34, -40, 60), error);
    }

    [Fact]
    public async Task BadOptions_AreRejectedAtParseTime()
    {
        Assert.Equal(ExitCodes.BadInput, (await CliRunner.RunAsync("stress", RepoPaths.DemoRig, "--samples", "0")).ExitCode);
        Assert.Equal(ExitCodes.BadInput, (await CliRunner.RunAsync("stress", RepoPaths.DemoRig, "--sample", "-1")).ExitCode);
        Assert.Equal(ExitCodes.BadInput, (await CliRunner.RunAsync("stress", RepoPaths.DemoRig, "--threads", "0")).ExitCode);
    }
    // A sample whose trim fails (here: a payload beyond what the drivetrain holds) counts as a trim failure and is left out
    // of the hover figures' percentiles, which say how many they leave out (issue 14 item 2).
    [Fact]
    public async Task Stress_LeavesFailedTrimsOutOfTheHoverFigures_AndSaysHowMany()
    {
        string rig = CopyDemo(t => t.Replace("\"payload_kg\": 25,", "\"payload_kg\": 28,", StringComparison.Ordinal));
        var (_, output, error) = await CliRunner.RunAsync("stress", rig, "--samples", "16", "--seed", "3", "--json");
        using var doc = JsonDocument.Parse(output);
        var root = doc.RootElement;
        var trim = root.GetProperty("criteria").EnumerateArray().Single(c => c.GetProperty("key").GetString() == "trim");
        var speed = root.GetProperty("percentiles").EnumerateArray().Single(p => p.GetProperty("figure").GetString() == "hover_speed_rpm");
        int leftOut = speed.GetProperty("left_out").GetInt32();
        Assert.True(leftOut > 0, error + output);
        Assert.Equal(16, speed.GetProperty("count").GetInt32() + leftOut);
        Assert.True(trim.GetProperty("failures").GetInt32() >= leftOut);
        // No hover figure may come from a state the drivetrain cannot reach: the hover pack voltage stays below the
        // packs' open-circuit voltage at full charge (Kirchhoff: V = Voc - I R with I > 0), 12 cells x 4.2 V.
        var volts = root.GetProperty("percentiles").EnumerateArray().Single(p => p.GetProperty("figure").GetString() == "hover_pack_voltage_v");
        Assert.True(volts.GetProperty("max").GetDouble() < 12 * 4.2);
        var (_, text, _) = await CliRunner.RunAsync("stress", rig, "--samples", "16", "--seed", "3");
        Assert.Contains($"leave out {leftOut} sample(s) without a trimmed hover", text);
    }
}

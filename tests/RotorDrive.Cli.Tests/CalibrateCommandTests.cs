using System.Globalization;
using System.Text.Json;
using Xunit;

namespace RotorDrive.Cli.Tests;

public sealed class CalibrateCommandTests
{
    private static string Bench(string name) => Path.Combine(RepoPaths.Catalogs, "bench", name);

    [Fact]
    public async Task Calibrate_DemoSpinDown_Json_GivesFactorsIntervalsAndResiduals()
    {
        var (code, output, error) = await CliRunner.RunAsync("calibrate", RepoPaths.DemoRig, "--rotor", "hx130-p4", "--bench", Bench("hx130-spin-down.csv"), "--json");
        Assert.True(code == ExitCodes.Ok, error + output);
        using var doc = JsonDocument.Parse(output);
        var root = doc.RootElement;
        Assert.True(root.GetProperty("accepted").GetBoolean());
        Assert.Equal("spin_down", root.GetProperty("kind").GetString());
        var estimates = root.GetProperty("estimates").EnumerateArray().ToList();
        Assert.Equal(["conductivity_factor", "field_factor", "bearing_drag_nm", "bearing_damping_nm_per_krpm"], estimates.Select(e => e.GetProperty("key").GetString()));
        // The invented demo trace was made with conductivity factor 0.88 and field factor 0.97 (catalogs/bench/README.md).
        var cf = estimates[0];
        Assert.InRange(0.88, cf.GetProperty("lower").GetDouble(), cf.GetProperty("upper").GetDouble());
        var ff = estimates[1];
        Assert.InRange(0.97, ff.GetProperty("lower").GetDouble(), ff.GetProperty("upper").GetDouble());
        Assert.True(root.GetProperty("residuals").GetArrayLength() > 100);
    }

    [Fact]
    public async Task Calibrate_TorqueInNewtonCentimetres_IsRefusedWithExit2NamingTheUnit()
    {
        string folder = Directory.CreateTempSubdirectory("rotordrive-cal-").FullName;
        try
        {
            var lines = File.ReadAllLines(Bench("hx130-load-cell.csv"));
            var scaled = lines.Take(1).Concat(lines.Skip(1).Select(l =>
            {
                var f = l.Split(',');
                f[2] = (double.Parse(f[2], CultureInfo.InvariantCulture) * 100).ToString("R", CultureInfo.InvariantCulture);
                return string.Join(',', f);
            }));
            string path = Path.Combine(folder, "ncm.csv");
            File.WriteAllLines(path, scaled);
            var (code, _, error) = await CliRunner.RunAsync("calibrate", RepoPaths.DemoRig, "--rotor", "hx130-p4", "--bench", path);
            Assert.Equal(ExitCodes.BadInput, code);
            Assert.Contains("N cm", error);
        }
        finally
        {
            Directory.Delete(folder, true);
        }
    }

    [Fact]
    public async Task Calibrate_Out_WritesTheFile_AndRefusesToReplaceItWithoutForce()
    {
        string folder = Directory.CreateTempSubdirectory("rotordrive-cal-").FullName;
        try
        {
            string cal = Path.Combine(folder, "cal.csv");
            var first = await CliRunner.RunAsync("calibrate", RepoPaths.DemoRig, "--rotor", "hx130-p4", "--bench", Bench("hx130-load-cell.csv"), "--out", cal);
            Assert.Equal(ExitCodes.Ok, first.ExitCode);
            Assert.StartsWith("key,value,lower,upper", File.ReadAllText(cal));
            var again = await CliRunner.RunAsync("calibrate", RepoPaths.DemoRig, "--rotor", "hx130-p4", "--bench", Bench("hx130-load-cell.csv"), "--out", cal);
            Assert.Equal(ExitCodes.BadInput, again.ExitCode);
            Assert.Contains("--force", again.Error);
            var forced = await CliRunner.RunAsync("calibrate", RepoPaths.DemoRig, "--rotor", "hx130-p4", "--bench", Bench("hx130-load-cell.csv"), "--out", cal, "--force");
            Assert.Equal(ExitCodes.Ok, forced.ExitCode);
        }
        finally
        {
            Directory.Delete(folder, true);
        }
    }

    [Fact]
    public async Task Analyses_OnACalibratedRig_SayTheyUseTheCalibration()
    {
        var (code, output, error) = await CliRunner.RunAsync("hover", Path.Combine(RepoPaths.Catalogs, "bench", "demo-rig-calibrated.json"), "--json");
        Assert.True(code is ExitCodes.Ok or ExitCodes.LimitFindings, error);
        Assert.Contains("uses its bench calibration hx130-calibration.csv", error);
        using var _ = JsonDocument.Parse(output);
    }
}

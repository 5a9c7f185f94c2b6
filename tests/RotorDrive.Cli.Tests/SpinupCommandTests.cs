using System.Text.Json;
using Xunit;

namespace RotorDrive.Cli.Tests;

public sealed class SpinupCommandTests : IDisposable
{
    private readonly string _folder = Directory.CreateTempSubdirectory("rotordrive-spinup-").FullName;

    public SpinupCommandTests()
    {
        foreach (var file in Directory.GetFiles(RepoPaths.Catalogs))
        {
            File.Copy(file, Path.Combine(_folder, Path.GetFileName(file)));
        }
    }

    public void Dispose() => Directory.Delete(_folder, recursive: true);

    private string Rig => Path.Combine(_folder, "demo-rig.json");

    private void Edit(string name, string from, string to)
    {
        string path = Path.Combine(_folder, name);
        string text = File.ReadAllText(path);
        Assert.Contains(from, text);
        File.WriteAllText(path, text.Replace(from, to, StringComparison.Ordinal));
    }

    // The demo rig (invented data): its rotors pass the landed-gap drag peak under the controllers' 170 A limit (the
    // Core tests check the physics); the JSON carries the documented keys and agrees with itself.
    [Fact]
    public async Task Spinup_Json_OnTheDemoRig_LiftsOff_WithNoStalledRotor()
    {
        var (code, output, error) = await CliRunner.RunAsync("spinup", Rig, "--json");
        Assert.True(code is ExitCodes.Ok or ExitCodes.LimitFindings, error);
        using var doc = JsonDocument.Parse(output);
        var root = doc.RootElement;
        double liftoff = root.GetProperty("time_to_liftoff_s").GetDouble();
        Assert.InRange(liftoff, 0.01, 8.0);
        Assert.Equal(0, root.GetProperty("stalled_stations").GetArrayLength());
        Assert.True(root.TryGetProperty("time_to_hover_s", out _));
        var stations = root.GetProperty("stations").EnumerateArray().ToArray();
        Assert.Equal(6, stations.Length);
        double peak = stations.Max(s => s.GetProperty("peak_motor_current_a").GetDouble());
        Assert.Equal(peak, root.GetProperty("peak_motor_current_a").GetDouble(), 9);
        Assert.True(root.GetProperty("peak_pack_current_a").GetDouble() > 0);
        Assert.Equal(2, root.GetProperty("landing").GetArrayLength());
        Assert.Equal(code == ExitCodes.Ok, root.GetProperty("pass").GetBoolean());
    }

    // A controller limit below the current that balances the drag peak (from I = Q_peak Kv + I0, Drela 2007; about 114 A
    // for the demo's motor with the 2-D load model, less with the 3-D model, whose landed drag peak is lower) leaves every
    // rotor stuck on the gear: named, never lifting off, exit 1.
    [Fact]
    public async Task Spinup_WithAWeakCurrentLimit_NamesStalledRotors_AndExitsOne()
    {
        Edit("controllers.csv", "sc120-12s,120,170,5,", "sc120-12s,40,45,5,");
        var (code, output, _) = await CliRunner.RunAsync("spinup", Rig, "--json");
        Assert.Equal(ExitCodes.LimitFindings, code);
        using var doc = JsonDocument.Parse(output);
        var root = doc.RootElement;
        Assert.Equal(JsonValueKind.Null, root.GetProperty("time_to_liftoff_s").ValueKind);
        Assert.Equal([1, 2, 3, 4, 5, 6], root.GetProperty("stalled_stations").EnumerateArray().Select(e => e.GetInt32()));
        double suggested = root.GetProperty("stations")[0].GetProperty("suggested_current_limit_a").GetDouble();
        Assert.InRange(suggested, 100, 170);
    }

    [Fact]
    public async Task Spinup_Text_HoldMode_ShowsTheTable()
    {
        var (code, output, _) = await CliRunner.RunAsync("spinup", Rig, "--mode", "hold", "--ramp-s", "3", "--soc-pct", "60");
        Assert.True(code is ExitCodes.Ok or ExitCodes.LimitFindings);
        Assert.Contains("hold mode, ramp 3.0 s, pack at 60 %", output);
        Assert.Contains("lift-off:", output);
        Assert.Contains("landing, braking on", output);
    }

    [Fact]
    public async Task Spinup_Csv_RefusesToOverwrite_WithoutForce()
    {
        string csv = Path.Combine(_folder, "trace.csv");
        File.WriteAllText(csv, "keep me");
        var (code, _, error) = await CliRunner.RunAsync("spinup", Rig, "--csv", csv);
        Assert.Equal(ExitCodes.BadInput, code);
        Assert.Contains(csv, error);
        Assert.Equal("keep me", File.ReadAllText(csv));

        (code, _, _) = await CliRunner.RunAsync("spinup", Rig, "--csv", csv, "--force");
        Assert.True(code is ExitCodes.Ok or ExitCodes.LimitFindings);
        string[] lines = File.ReadAllLines(csv);
        Assert.StartsWith("time_s,speed_rpm_1,current_a_1,", lines[0]);
        foreach (string key in new[] { "gap_mm", "pack_voltage_v", "pack_current_a", "soc_pct", "winding_temp_c_5", "plate_temp_c_5" })
        {
            Assert.Contains(key, lines[0]);
        }
        Assert.True(lines.Length > 100);
        Assert.DoesNotContain("NaN", File.ReadAllText(csv));
        Assert.Empty(Directory.GetFiles(_folder, "*.tmp"));
    }

    [Fact]
    public async Task Spinup_BadOptions_ExitTwo()
    {
        Assert.Equal(ExitCodes.BadInput, (await CliRunner.RunAsync("spinup", Rig, "--mode", "fast")).ExitCode);
        Assert.Equal(ExitCodes.BadInput, (await CliRunner.RunAsync("spinup", Rig, "--soc-pct", "120")).ExitCode);
        Assert.Equal(ExitCodes.BadInput, (await CliRunner.RunAsync("spinup", Rig, "--ramp-s", "-1")).ExitCode);
        Assert.Equal(ExitCodes.BadInput, (await CliRunner.RunAsync("spinup", Path.Combine(_folder, "missing.json"))).ExitCode);
    }

    [Fact]
    public async Task Endurance_Json_GivesRuntimeAndFirstLimitInWords()
    {
        var (code, output, error) = await CliRunner.RunAsync("endurance", Rig, "--json");
        Assert.True(code is ExitCodes.Ok or ExitCodes.LimitFindings, error);
        using var doc = JsonDocument.Parse(output);
        var root = doc.RootElement;
        Assert.True(root.GetProperty("runtime_s").GetDouble() > 0);
        string limit = root.GetProperty("first_limit").GetString()!;
        Assert.False(string.IsNullOrWhiteSpace(limit));
        Assert.Contains(" ", limit);
        Assert.Equal(code == ExitCodes.Ok, root.GetProperty("pass").GetBoolean());
    }

    // With the plate limit lifted and a plate that sheds its heat, the pack ends the demo hover. Charge balance (IEC 61434
    // capacity in ampere-hours) and the mean-value theorem: the runtime lies between usable charge / final current and
    // usable charge / starting current, since the current only rises as the pack sags.
    [Fact]
    public async Task Endurance_WhenThePackEndsIt_RuntimeIsUsableChargeOverCurrent()
    {
        Edit("demo-rig.json", "\"plate_temp_c\": 60", "\"plate_temp_c\": 400");
        Edit("demo-rig.json", "\"temperature_c\": 22 }", "\"temperature_c\": 22, \"convection_w_per_m2k\": 1000 }");
        var (code, output, error) = await CliRunner.RunAsync("endurance", Rig, "--json");
        Assert.Equal(ExitCodes.Ok, code);
        using var doc = JsonDocument.Parse(output);
        var root = doc.RootElement;
        Assert.Contains("usable pack capacity", root.GetProperty("first_limit").GetString());
        double charge = 0.8 * 40 * 3600;
        double runtime = root.GetProperty("runtime_s").GetDouble();
        Assert.InRange(runtime, charge / root.GetProperty("final_pack_current_a").GetDouble(), charge / root.GetProperty("start_pack_current_a").GetDouble());
        Assert.Equal(20.0, root.GetProperty("final_soc_pct").GetDouble(), 6);
        Assert.Equal("", error);
    }

    // The endurance models the plate as a sheet field and says so; its JSON trace has the plate's hottest point and the
    // mean under every annulus at each step (the hottest point is never below a mean), and the hot spot at the end. A
    // bottom face that sheds more heat (a plate on a cooled floor) lets the rig hover longer: the face loss H enters the
    // sheet equation as -H (T - T_a) (Carslaw & Jaeger 1959, plate with surface loss), so more loss means a lower field.
    [Fact]
    public async Task Endurance_StatesThePlateModel_TracesThePlate_AndACooledFloorHoversLonger()
    {
        var (_, text, _) = await CliRunner.RunAsync("endurance", Rig);
        Assert.Contains("2-D sheet with lateral conduction", text);
        Assert.Contains("plate hot spot at the end", text);
        var (_, warm, _) = await CliRunner.RunAsync("endurance", Rig, "--json");
        using var a = JsonDocument.Parse(warm);
        var root = a.RootElement;
        Assert.Contains("plate temperature", root.GetProperty("first_limit").GetString());
        var trace = root.GetProperty("trace");
        Assert.Equal(root.GetProperty("steps").GetInt32() + 1, trace.GetArrayLength());
        foreach (var entry in trace.EnumerateArray())
        {
            double peak = entry.GetProperty("plate_peak_c").GetDouble();
            Assert.Equal(6, entry.GetProperty("plate_under_station_c").GetArrayLength());
            Assert.All(entry.GetProperty("plate_under_station_c").EnumerateArray(), m => Assert.True(m.GetDouble() <= peak + 1e-9));
        }
        var hot = root.GetProperty("plate_hotspot");
        Assert.Equal(60.0, hot.GetProperty("temperature_c").GetDouble(), 3);
        Assert.True(Math.Abs(hot.GetProperty("x_mm").GetDouble()) < 700 && Math.Abs(hot.GetProperty("y_mm").GetDouble()) < 700);

        Edit("demo-rig.json", "\"temperature_c\": 22 }", "\"temperature_c\": 22, \"convection_bottom_w_per_m2k\": 300 }");
        var (code, cooled, error) = await CliRunner.RunAsync("endurance", Rig, "--json");
        Assert.True(code is ExitCodes.Ok or ExitCodes.LimitFindings, error);
        using var b = JsonDocument.Parse(cooled);
        Assert.True(b.RootElement.GetProperty("runtime_s").GetDouble() > 1.2 * root.GetProperty("runtime_s").GetDouble());

        Edit("demo-rig.json", "\"convection_bottom_w_per_m2k\": 300 }", "\"spreading_factor\": 0.5 }");
        var (badCode, _, badError) = await CliRunner.RunAsync("endurance", Rig);
        Assert.Equal(ExitCodes.BadInput, badCode);
        Assert.Contains("$.plate.spreading_factor", badError);
        Assert.Contains("demo-rig.json:", badError);
    }

    // --plate-map writes the final field (x_mm, y_mm, temperature_c; its hottest row is the reported hot spot's
    // temperature within the grid's resolution) and refuses to replace a file without --force.
    [Fact]
    public async Task Endurance_PlateMap_WritesTheField_AndRefusesToOverwrite()
    {
        string map = Path.Combine(Path.GetDirectoryName(Rig)!, "plate.csv");
        var (code, _, error) = await CliRunner.RunAsync("endurance", Rig, "--plate-map", map);
        Assert.True(code is ExitCodes.Ok or ExitCodes.LimitFindings, error);
        var lines = File.ReadAllLines(map);
        Assert.Equal("x_mm,y_mm,temperature_c", lines[0]);
        double hottest = lines.Skip(1).Select(l => double.Parse(l.Split(',')[2], System.Globalization.CultureInfo.InvariantCulture)).Max();
        Assert.InRange(hottest, 55, 60.001);
        var (again, _, refused) = await CliRunner.RunAsync("endurance", Rig, "--plate-map", map);
        Assert.Equal(ExitCodes.BadInput, again);
        Assert.Contains("--force", refused);
    }

    [Fact]
    public async Task Spinup_AndEndurance_OnARigWithoutAMotor_AreBadInput_NamingTheStation()
    {
        Edit("demo-rig.json", "\"motor\": \"or1050-kv90\", ", "");
        foreach (string command in new[] { "spinup", "endurance" })
        {
            var (code, output, error) = await CliRunner.RunAsync(command, Rig);
            Assert.Equal(ExitCodes.BadInput, code);
            Assert.Contains("station 1 has no motor", error);
            Assert.Contains("demo-rig.json", error);
            Assert.Equal("", output);
        }
    }

    [Fact]
    public async Task Endurance_Csv_RefusesToOverwrite_WithoutForce()
    {
        string csv = Path.Combine(_folder, "endurance.csv");
        File.WriteAllText(csv, "keep me");
        var (code, _, _) = await CliRunner.RunAsync("endurance", Rig, "--csv", csv);
        Assert.Equal(ExitCodes.BadInput, code);
        Assert.Equal("keep me", File.ReadAllText(csv));
        (code, _, _) = await CliRunner.RunAsync("endurance", Rig, "--csv", csv, "--force");
        Assert.True(code is ExitCodes.Ok or ExitCodes.LimitFindings);
        Assert.StartsWith("time_s,", File.ReadAllText(csv));
    }
}

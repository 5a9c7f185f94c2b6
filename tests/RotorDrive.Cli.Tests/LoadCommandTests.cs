using System.Globalization;
using System.Text.Json;
using RotorDrive.Core;
using RotorDrive.Core.Loads;
using RotorDrive.Core.Magnetics;
using Xunit;

namespace RotorDrive.Cli.Tests;

public sealed class LoadCommandTests : IDisposable
{
    private readonly string _folder = Path.Combine(Path.GetTempPath(), "rotordrive-load-" + Guid.NewGuid().ToString("N"));
    private readonly string _rig;

    public LoadCommandTests()
    {
        Directory.CreateDirectory(_folder);
        _rig = TestRigFiles.Write(_folder);
    }

    public void Dispose() => Directory.Delete(_folder, recursive: true);

    // The command reports the Core load model's numbers (its physics is tested against its sources in
    // RotorDrive.Core.Tests): lift and eddy torque at 3000 rpm agree with the direct model to the table's 0.1 % target.
    [Fact]
    public async Task Load_Json_GivesEverySpeed_TheModelsNumbers_AndTheDragPeak()
    {
        var (code, output, error) = await CliRunner.RunAsync("load", _rig, "--rpm", "0:6000:250", "--json");
        Assert.Equal(ExitCodes.Ok, code);
        Assert.DoesNotContain("error", error);
        using var doc = JsonDocument.Parse(output);
        JsonElement root = doc.RootElement;
        Assert.Equal(TestRigFiles.RotorId, root.GetProperty("rotor").GetString());
        Assert.Equal(10.0, root.GetProperty("gap_mm").GetDouble(), 9);
        JsonElement[] points = root.GetProperty("points").EnumerateArray().ToArray();
        Assert.Equal(25, points.Length);
        Assert.Equal(0.0, points[0].GetProperty("lift_n").GetDouble());
        Assert.Equal(6000.0, points[^1].GetProperty("speed_rpm").GetDouble(), 9);
        foreach (string key in new[] { "speed_rpm", "lift_n", "eddy_torque_nm", "windage_torque_nm", "bearing_torque_nm", "total_torque_nm", "eddy_power_w" })
        {
            Assert.True(points[5].TryGetProperty(key, out _), $"point lacks {key}");
        }

        var direct = new PhysicsRotorLoad(TestRigFiles.Rotor, TestRigFiles.Plate, new LoadModelOptions { Model = LoadModelKind.TwoDimensional });
        LoadPoint expected = direct.Evaluate(Units.RpmToRadPerS(3000), 0.010, TestRigFiles.PlateTempC, TestRigFiles.AmbientC);
        JsonElement at3000 = points.Single(p => Math.Abs(p.GetProperty("speed_rpm").GetDouble() - 3000) < 1e-6);
        Assert.Equal(expected.LiftN, at3000.GetProperty("lift_n").GetDouble(), expected.LiftN * 1e-3);
        Assert.Equal(expected.EddyTorqueNm, at3000.GetProperty("eddy_torque_nm").GetDouble(), expected.EddyTorqueNm * 1e-3);

        JsonElement peak = root.GetProperty("drag_peak");
        Assert.Equal("converged", peak.GetProperty("status").GetString());
        double peakRpm = peak.GetProperty("speed_rpm").GetDouble();
        Assert.InRange(peakRpm, 100, 6000);
        double peakTorque = peak.GetProperty("torque_nm").GetDouble();
        Assert.True(points.All(p => p.GetProperty("eddy_torque_nm").GetDouble() <= peakTorque * (1 + 1e-9)), "a swept point exceeds the drag peak");
    }

    [Fact]
    public async Task Load_ByDefault_SweepsZeroToMaxRpmInTwentyFiveSteps_AsATable()
    {
        var (code, output, _) = await CliRunner.RunAsync("load", _rig);
        Assert.Equal(ExitCodes.Ok, code);
        Assert.Contains("speed_rpm", output);
        Assert.Contains("eddy_power_w", output);
        Assert.Contains("Drag peak:", output);
        Assert.Contains("calibrate against bench data", output);
        string[] rows = output.Split('\n').Where(l => l.TrimStart().Length > 0 && char.IsDigit(l.TrimStart()[0])).ToArray();
        Assert.Equal(26, rows.Length);
        Assert.StartsWith("6000", rows[^1].TrimStart());
    }

    // The width correction lowers the effective conductivity, so without it the low-speed lift is higher.
    [Fact]
    public async Task Load_WithoutEndCorrection_PredictsMoreLowSpeedLift()
    {
        var (_, on, _) = await CliRunner.RunAsync("load", _rig, "--rpm", "300:300:1", "--json");
        var (_, off, _) = await CliRunner.RunAsync("load", _rig, "--rpm", "300:300:1", "--json", "--no-end-correction");
        double Lift(string json) => JsonDocument.Parse(json).RootElement.GetProperty("points")[0].GetProperty("lift_n").GetDouble();
        Assert.True(Lift(off) > 1.2 * Lift(on), $"without correction {Lift(off)}, with {Lift(on)}");
        Assert.False(JsonDocument.Parse(off).RootElement.GetProperty("end_correction").GetBoolean());
    }

    // --model chooses between the 3-D model and the 2-D one for comparison; they differ (the 3-D model has no width factor
    // and includes fringing and the array's harmonics) and the JSON names the model used.
    [Fact]
    public async Task Load_Model_ChoosesThreeOrTwoDimensions()
    {
        var (code3, three, _) = await CliRunner.RunAsync("load", _rig, "--rpm", "1500:1500:1", "--json", "--model", "3d");
        var (code2, two, _) = await CliRunner.RunAsync("load", _rig, "--rpm", "1500:1500:1", "--json", "--model", "2d");
        Assert.Equal(ExitCodes.Ok, code3);
        Assert.Equal(ExitCodes.Ok, code2);
        double Lift(string json) => JsonDocument.Parse(json).RootElement.GetProperty("points")[0].GetProperty("lift_n").GetDouble();
        Assert.Equal("3d", JsonDocument.Parse(three).RootElement.GetProperty("model").GetString());
        Assert.Equal("2d", JsonDocument.Parse(two).RootElement.GetProperty("model").GetString());
        Assert.True(Math.Abs(Lift(three) / Lift(two) - 1) > 0.01, $"3-D {Lift(three)}, 2-D {Lift(two)}");
        var (bad, _, error) = await CliRunner.RunAsync("load", _rig, "--model", "3d", "--no-end-correction");
        Assert.Equal(ExitCodes.BadInput, bad);
        Assert.Contains("--model 2d", error);
    }

    [Fact]
    public async Task Load_ForACatalogRotor_AtAGivenGapAndPlateTemperature_UsesThem()
    {
        var (code, output, _) = await CliRunner.RunAsync("load", _rig, "--rotor", TestRigFiles.SmallRotorId, "--gap-mm", "6", "--plate-temp-c", "80", "--rpm", "1000:2000:500", "--json");
        Assert.Equal(ExitCodes.Ok, code);
        JsonElement root = JsonDocument.Parse(output).RootElement;
        Assert.Equal(TestRigFiles.SmallRotorId, root.GetProperty("rotor").GetString());
        Assert.Equal(JsonValueKind.Null, root.GetProperty("station").ValueKind);
        Assert.Equal(6.0, root.GetProperty("gap_mm").GetDouble(), 9);
        Assert.Equal(80.0, root.GetProperty("plate_temp_c").GetDouble(), 9);
        Assert.Equal(3, root.GetProperty("points").GetArrayLength());
    }

    [Theory]
    [InlineData("--rpm", "0:6000")]
    [InlineData("--rpm", "6000:0:100")]
    [InlineData("--rpm", "0:6000:0")]
    [InlineData("--gap-mm", "-3")]
    [InlineData("--plate-temp-c", "900")]
    [InlineData("--station", "-1")]
    public async Task Load_WithABadOption_ExitsWithBadInput_NamingTheOption(string option, string value)
    {
        var (code, output, error) = await CliRunner.RunAsync("load", _rig, option, value);
        Assert.Equal(ExitCodes.BadInput, code);
        Assert.Contains(option, error);
        Assert.Equal("", output);
        Assert.DoesNotContain("   at ", error);
    }

    [Fact]
    public async Task Load_WithStationAndRotorTogether_ExitsWithBadInput()
    {
        var (code, _, error) = await CliRunner.RunAsync("load", _rig, "--station", "0", "--rotor", TestRigFiles.RotorId);
        Assert.Equal(ExitCodes.BadInput, code);
        Assert.Contains("--station and --rotor", error);
    }

    [Fact]
    public async Task Load_WithAStationBeyondTheRig_OrAnUnknownRotor_ExitsWithBadInput()
    {
        var (stationCode, _, stationError) = await CliRunner.RunAsync("load", _rig, "--station", "7");
        Assert.Equal(ExitCodes.BadInput, stationCode);
        Assert.Contains("--station 7", stationError);
        var (rotorCode, _, rotorError) = await CliRunner.RunAsync("load", _rig, "--rotor", "no-such-rotor");
        Assert.Equal(ExitCodes.BadInput, rotorCode);
        Assert.Contains("no-such-rotor", rotorError);
    }

    [Fact]
    public async Task Load_AboveTheRatedSpeed_WarnsOnStandardError()
    {
        var (code, _, error) = await CliRunner.RunAsync("load", _rig, "--rpm", "0:8000:4000");
        Assert.Equal(ExitCodes.Ok, code);
        Assert.Contains("can burst", error);
    }

    /// <summary>A small rig and its six catalogs (invented test data, not the demo).</summary>
    private static class TestRigFiles
    {
        public const string RotorId = "test-r120";
        public const string SmallRotorId = "test-r80";
        public const double PlateTempC = 25.0;
        public const double AmbientC = 22.0;

        public static RotorDesign Rotor => new(RotorId, 24, 4, 0.07, 0.12, 0.004, 1.3, -0.0012, 7500, 2.0, 0.0193,
            Units.RpmToRadPerS(6000), 0.01, 1e-5, null, null);

        public static Plate Plate => new(new PlateMaterial("al6061", 25e6, 0.0039, 2700, 896), 0.006);

        public static string Write(string folder)
        {
            File.WriteAllText(Path.Combine(folder, "motors.csv"),
                "id,kv_rpm_per_v,resistance_ohm,no_load_current_a,no_load_voltage_v,max_current_a,max_power_w,poles,mass_g,thermal_resistance_k_per_w,thermal_time_constant_s,max_winding_temp_c\n"
                + "m-test,300,0.05,1.5,10,60,2000,14,400,,,\n");
            File.WriteAllText(Path.Combine(folder, "controllers.csv"),
                "id,continuous_current_a,burst_current_a,burst_duration_s,min_cells,max_cells,on_resistance_mohm,idle_current_a,max_erpm,mass_g,reversible\n"
                + "c-test,60,80,10,6,12,2,0.1,200000,80,true\n");
            File.WriteAllText(Path.Combine(folder, "packs.csv"),
                "id,chemistry,cells_series,cells_parallel,cell_capacity_mah,continuous_c,burst_c,cell_resistance_mohm,mass_g\n"
                + "p-test,lipo,12,1,8000,20,40,3,2000\n");
            File.WriteAllText(Path.Combine(folder, "cell_curves.csv"), "chemistry,soc_pct,ocv_v\nlipo,0,3.3\nlipo,50,3.8\nlipo,100,4.2\n");
            File.WriteAllText(Path.Combine(folder, "rotors.csv"),
                "id,segments,segments_per_wavelength,inner_radius_mm,outer_radius_mm,magnet_thickness_mm,remanence_t,remanence_temp_coeff_pct_per_k,magnet_density_kg_m3,rotor_mass_g,inertia_kg_m2,max_rpm,bearing_drag_nm,bearing_damping_nm_per_krpm,retainer_thickness_mm,retainer_allowable_mpa\n"
                + $"{RotorId},24,4,70,120,4,1.3,-0.12,7500,2000,0.0193,6000,0.01,{(1e-5 * 1000 * Units.RadPerSPerRpm).ToString("R", CultureInfo.InvariantCulture)},,\n"
                + $"{SmallRotorId},16,4,45,80,5,1.25,-0.12,7500,900,0.004,8000,,,,\n");
            File.WriteAllText(Path.Combine(folder, "plates.csv"),
                "id,conductivity_ms_per_m,temp_coeff_per_k,density_kg_m3,specific_heat_j_per_kg_k\nal6061,25,0.0039,2700,896\n");
            string rig = Path.Combine(folder, "rig.json");
            File.WriteAllText(rig, $$"""
                {
                  "name": "load command test rig (invented)",
                  "catalogs": { "motors": "motors.csv", "controllers": "controllers.csv", "packs": "packs.csv",
                                "cell_curves": "cell_curves.csv", "rotors": "rotors.csv", "plates": "plates.csv" },
                  "plate": { "material": "al6061", "thickness_mm": 6, "temperature_c": {{PlateTempC}} },
                  "craft": { "empty_mass_kg": 20, "payload_kg": 5, "cg_x_mm": 0, "cg_y_mm": 0, "yaw_inertia_kg_m2": 2 },
                  "gap": { "design_mm": 10, "landed_mm": 4 },
                  "ambient_c": {{AmbientC}},
                  "load_model": "2d",
                  "stations": [
                    { "x_mm": 200, "y_mm": 0, "spin": "cw", "rotor": "{{RotorId}}" },
                    { "x_mm": -200, "y_mm": 0, "spin": "ccw", "rotor": "{{RotorId}}" }
                  ],
                  "limits": { "yaw_torque_nm": 0.5, "plate_temp_c": 90 }
                }
                """);
            return rig;
        }
    }
}

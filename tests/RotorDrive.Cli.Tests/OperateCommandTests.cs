using System.Globalization;
using System.Text.Json;
using RotorDrive.Core;
using RotorDrive.Core.Craft;
using RotorDrive.Core.Drive;
using RotorDrive.Core.Loads;
using RotorDrive.Core.Magnetics;
using Xunit;

namespace RotorDrive.Cli.Tests;

public sealed class OperateCommandTests : IDisposable
{
    private readonly string _folder = Path.Combine(Path.GetTempPath(), "rotordrive-operate-" + Guid.NewGuid().ToString("N"));
    private readonly string _rig;

    public OperateCommandTests()
    {
        Directory.CreateDirectory(_folder);
        _rig = OperateRigFiles.Write(_folder);
    }

    public void Dispose() => Directory.Delete(_folder, recursive: true);

    // Without a throttle the command runs at the rig's own highest allowed duty (limits.max_duty), so a plain `operate`
    // shows full throttle within the rig's limits rather than a duty the rig itself forbids (a choice of ours).
    [Fact]
    public async Task Operate_WithoutThrottle_RunsAtTheRigsMaxDuty()
    {
        double maxDuty = RotorDrive.Files.RigLoader.Load(RepoPaths.DemoRig).Rig!.Limits.MaxDuty;
        var (_, output, _) = await CliRunner.RunAsync("operate", RepoPaths.DemoRig, "--json");
        using var doc = JsonDocument.Parse(output);
        Assert.Equal(maxDuty, doc.RootElement.GetProperty("throttle").GetProperty("duty").GetDouble(), 12);
        Assert.True(maxDuty < 1, "the demo rig caps the duty below 1, so the default differs from full duty");
    }

    // The command reports the Core finder's equilibria (its physics is tested against its sources in RotorDrive.Core.Tests):
    // the station's 152 A limit (about 13 N m) sits below this rotor's 17 N m drag peak, so there are three equilibria,
    // low stable, middle unstable and high stable, and the JSON carries the keys the issue lists.
    [Fact]
    public async Task Operate_Json_ListsEveryEquilibrium_WithStabilityAndLimits()
    {
        var (code, output, error) = await CliRunner.RunAsync("operate", _rig, "--duty", "1", "--soc-pct", "80", "--json");
        Assert.Equal(ExitCodes.LimitFindings, code);
        Assert.DoesNotContain("error", error);
        using var doc = JsonDocument.Parse(output);
        var equilibria = doc.RootElement.GetProperty("equilibria").EnumerateArray().ToArray();
        Assert.Equal(3, equilibria.Length);
        Assert.Equal([true, false, true], equilibria.Select(e => e.GetProperty("stable").GetBoolean()).ToArray());
        foreach (string key in new[] { "speed_rpm", "stable", "motor_current_a", "bus_current_a", "duty", "shaft_power_w", "electrical_power_w", "efficiency", "lift_n", "eddy_power_w", "limits" })
        {
            Assert.True(equilibria[0].TryGetProperty(key, out _), $"equilibrium lacks {key}");
        }

        var expected = OperateRigFiles.Expected(socFraction: 0.8);
        for (int i = 0; i < 3; i++)
        {
            Assert.Equal(expected.Equilibria[i].SpeedRpm, equilibria[i].GetProperty("speed_rpm").GetDouble(), expected.Equilibria[i].SpeedRpm * 1e-9);
            Assert.Equal(expected.Equilibria[i].MotorCurrentA, equilibria[i].GetProperty("motor_current_a").GetDouble(), 1e-6);
        }
        var limits = equilibria[0].GetProperty("limits").EnumerateArray().ToArray();
        Assert.Contains(limits, l => l.GetProperty("limit").GetString() == "controller_continuous_current" && l.GetProperty("exceeded").GetBoolean());
        Assert.Equal(1, doc.RootElement.GetProperty("reached_from_rest").GetInt32());
        // The verdict names each failed criterion and the binding limit (the reached point's smallest margin); duty 1 runs
        // at the rig's max_duty cap.
        var failed = doc.RootElement.GetProperty("failed_criteria").EnumerateArray().Select(e => e.GetString()).ToList();
        Assert.Contains("controller_continuous_current", failed);
        Assert.Equal(expected.ReachedFromRest!.Margins.MinBy(m => m.MarginFraction)!.Limit.Key(), doc.RootElement.GetProperty("limiting_constraint").GetString());
        Assert.All(equilibria, e => Assert.True(e.GetProperty("duty").GetDouble() <= 0.95 + 1e-12));
    }

    // The table for people names the stall below the drag peak.
    [Fact]
    public async Task Operate_Text_ShowsTheTable_AndTheStallBelowThePeak()
    {
        var (code, output, _) = await CliRunner.RunAsync("operate", _rig, "--soc-pct", "80");
        Assert.Equal(ExitCodes.LimitFindings, code);
        Assert.Contains("Equilibria (3):", output);
        Assert.Contains("speed_rpm", output);
        Assert.Contains("settles at #1", output);
        Assert.Contains("Caution:", output);
    }

    // Speed hold: 300 rpm is held within limits (exit 0); 3000 rpm needs more than the current limit, which is named.
    [Fact]
    public async Task Operate_HoldRpm_IsMetOrNamesTheLimitThatStopsIt()
    {
        var (okCode, okOutput, _) = await CliRunner.RunAsync("operate", _rig, "--hold-rpm", "300", "--json");
        using (var ok = JsonDocument.Parse(okOutput))
        {
            Assert.True(ok.RootElement.GetProperty("hold_met").GetBoolean());
            var held = ok.RootElement.GetProperty("equilibria").EnumerateArray().Last();
            Assert.Equal("held", held.GetProperty("kind").GetString());
            Assert.Equal(300, held.GetProperty("speed_rpm").GetDouble(), 1e-9);
        }
        Assert.Equal(ExitCodes.Ok, okCode);

        var (code, output, _) = await CliRunner.RunAsync("operate", _rig, "--hold-rpm", "3000", "--json");
        using var doc = JsonDocument.Parse(output);
        Assert.False(doc.RootElement.GetProperty("hold_met").GetBoolean());
        Assert.Equal("controller current limit", doc.RootElement.GetProperty("hold_stopped_by").GetString());
        Assert.Equal(ExitCodes.LimitFindings, code);
    }

    // --sweep: 21 duties from 0 to the rig's max_duty (0.95); zero duty leaves the rotor at rest.
    [Fact]
    public async Task Operate_Sweep_TabulatesThePointReachedFromRest()
    {
        var (code, output, _) = await CliRunner.RunAsync("operate", _rig, "--sweep", "--json");
        Assert.Equal(ExitCodes.Ok, code);
        using var doc = JsonDocument.Parse(output);
        var rows = doc.RootElement.GetProperty("sweep").EnumerateArray().ToArray();
        Assert.Equal(21, rows.Length);
        Assert.Equal(0.0, rows[0].GetProperty("duty").GetDouble());
        Assert.Equal("at_rest", rows[0].GetProperty("reached_from_rest").GetProperty("kind").GetString());
        Assert.Equal(0.95, rows[^1].GetProperty("duty").GetDouble(), 12);
    }

    // At duty 0.0005 the stalled motor draws d V / R_t = 0.0005 x ~46 V / 0.022 ohm = ~1 A, below its 2 A no-load
    // current, so its torque (I - I0) / Kv is negative (Drela 2007) and the rotor never starts: a failed finding (exit 1),
    // said in words. At duty 0 staying at rest is what was asked (exit 0).
    [Fact]
    public async Task Operate_RotorThatNeverStarts_IsAFinding_UnlessTheDutyIsZero()
    {
        var (code, output, _) = await CliRunner.RunAsync("operate", _rig, "--duty", "0.0005");
        Assert.Equal(ExitCodes.LimitFindings, code);
        Assert.Contains("yes (at rest)", output);
        Assert.Contains("the rotor does not turn (#1)", output);
        var (zeroCode, zeroOutput, _) = await CliRunner.RunAsync("operate", _rig, "--duty", "0", "--json");
        Assert.Equal(ExitCodes.Ok, zeroCode);
        using var doc = JsonDocument.Parse(zeroOutput);
        var rest = Assert.Single(doc.RootElement.GetProperty("equilibria").EnumerateArray().ToArray());
        Assert.Equal("at_rest", rest.GetProperty("kind").GetString());
        Assert.Equal(0.0, rest.GetProperty("shaft_power_w").GetDouble());
        Assert.False(double.IsNegative(rest.GetProperty("shaft_power_w").GetDouble()), "no -0 in the output");
    }

    // A pack whose cell count the controller does not accept is a finding (exit 1), not a crash.
    [Fact]
    public async Task Operate_WithAnIncompatiblePack_ReportsTheFinding()
    {
        var (code, output, error) = await CliRunner.RunAsync("operate", _rig, "--pack", "p-16s");
        Assert.Equal(ExitCodes.LimitFindings, code);
        Assert.Contains("error: pack p-16s has 16 cells in series", output);
        Assert.DoesNotContain("   at ", error);
    }

    [Theory]
    [InlineData("--duty", "1.5")]
    [InlineData("--soc-pct", "120")]
    [InlineData("--hold-rpm", "-5")]
    [InlineData("--station", "7")]
    [InlineData("--motor", "no-such-motor")]
    public async Task Operate_WithBadInput_ExitsWithTwo_AndSaysWhy(string option, string value)
    {
        var (code, output, error) = await CliRunner.RunAsync("operate", _rig, option, value);
        Assert.Equal(ExitCodes.BadInput, code);
        Assert.Contains(option, error);
        Assert.Equal("", output);
        Assert.DoesNotContain("   at ", error);
    }

    [Fact]
    public async Task Operate_WithDutyAndHoldTogether_ExitsWithTwo()
    {
        var (code, _, error) = await CliRunner.RunAsync("operate", _rig, "--duty", "0.5", "--hold-rpm", "1000");
        Assert.Equal(ExitCodes.BadInput, code);
        Assert.Contains("--duty and --hold-rpm", error);
    }

    private static class OperateRigFiles
    {
        public const double AmbientC = 20.0;

        private static RotorDesign Rotor => new("r120", 24, 4, 0.07, 0.12, 0.004, 1.3, -0.0012, 7500, 2.0, 0.0193,
            Units.RpmToRadPerS(6000), 0.01, 1e-5, null, null);

        private static Plate Plate => new(new PlateMaterial("al6061", 25e6, 0.0039, 2700, 896), 0.006);

        // The same numbers as the files below, through Core directly (SI).
        public static OperatingPointResult Expected(double socFraction)
        {
            var motor = new Motor("m-110", Units.RpmToRadPerS(110), 0.02, 2.0, 20, 120, 6000, 14, 1.1, null, null, null);
            var controller = new SpeedController("c-152", 120, 152, 10, 6, 14, 0.002, 0.05, 240_000, 0.2, false);
            var packs = new PackBank(new BatteryPack("p-12s", "lipo", 12, 4, 5, 25, 50, 0.003, 3), 1,
                new CellCurve("lipo", [0.0, 0.5, 1.0], [3.3, 3.8, 4.2]));
            var rig = new Rig("t", Plate, AmbientC, AmbientC, new CraftBody(20, 5, 0, 0, 2, 0.2), 0.010, 0.004, [], packs,
                new RigLimits(0.5, 90, 3.3, 0.8, 0.95, 6), 5, 12);
            // The drivetrain capped at the rig's max_duty (0.95), as every analysis builds it; duty 1 runs at the cap.
            var drivetrain = new Drivetrain(motor, controller, DriveOptions.Default with { MaxDuty = rig.Limits.MaxDuty });
            double free = drivetrain.FreeSpeedRadPerS(packs.OpenCircuitVoltageAt(1.0), drivetrain.MaxDuty, AmbientC);
            var range = rig.LoadTableRangeFor(Rotor);
            range = range with { MaxSpeedRadPerS = Math.Max(range.MaxSpeedRadPerS, 1.1 * free), MinGapM = Math.Min(range.MinGapM, 0.005), MaxGapM = Math.Max(range.MaxGapM, 0.015) };
            var drive = new StationDrive(drivetrain, packs, Rotor, RotorLoadTable.Build(Rotor, Plate, range, new LoadModelOptions { Model = LoadModelKind.TwoDimensional }), rig.Limits.Station);
            var conditions = new OperatingConditions(0.010, AmbientC, AmbientC, AmbientC, AmbientC, socFraction);
            return OperatingPointFinder.Find(drive, ThrottleCommand.Duty(1), conditions);
        }

        public static string Write(string folder)
        {
            File.WriteAllText(Path.Combine(folder, "motors.csv"),
                "id,kv_rpm_per_v,resistance_ohm,no_load_current_a,no_load_voltage_v,max_current_a,max_power_w,poles,mass_g,thermal_resistance_k_per_w,thermal_time_constant_s,max_winding_temp_c\n"
                + "m-110,110,0.02,2,20,120,6000,14,1100,,,\n");
            File.WriteAllText(Path.Combine(folder, "controllers.csv"),
                "id,continuous_current_a,burst_current_a,burst_duration_s,min_cells,max_cells,on_resistance_mohm,idle_current_a,max_erpm,mass_g,reversible\n"
                + "c-152,120,152,10,6,14,2,0.05,240000,200,false\n");
            File.WriteAllText(Path.Combine(folder, "packs.csv"),
                "id,chemistry,cells_series,cells_parallel,cell_capacity_mah,continuous_c,burst_c,cell_resistance_mohm,mass_g\n"
                + "p-12s,lipo,12,4,5000,25,50,3,3000\n"
                + "p-16s,lipo,16,4,5000,25,50,3,4000\n");
            File.WriteAllText(Path.Combine(folder, "cell_curves.csv"), "chemistry,soc_pct,ocv_v\nlipo,0,3.3\nlipo,50,3.8\nlipo,100,4.2\n");
            File.WriteAllText(Path.Combine(folder, "rotors.csv"),
                "id,segments,segments_per_wavelength,inner_radius_mm,outer_radius_mm,magnet_thickness_mm,remanence_t,remanence_temp_coeff_pct_per_k,magnet_density_kg_m3,rotor_mass_g,inertia_kg_m2,max_rpm,bearing_drag_nm,bearing_damping_nm_per_krpm,retainer_thickness_mm,retainer_allowable_mpa\n"
                + $"r120,24,4,70,120,4,1.3,-0.12,7500,2000,0.0193,6000,0.01,{(1e-5 * 1000 * Units.RadPerSPerRpm).ToString("R", CultureInfo.InvariantCulture)},,\n");
            File.WriteAllText(Path.Combine(folder, "plates.csv"),
                "id,conductivity_ms_per_m,temp_coeff_per_k,density_kg_m3,specific_heat_j_per_kg_k\nal6061,25,0.0039,2700,896\n");
            string rig = Path.Combine(folder, "rig.json");
            File.WriteAllText(rig, $$"""
                {
                  "name": "operate command test rig (invented)",
                  "catalogs": { "motors": "motors.csv", "controllers": "controllers.csv", "packs": "packs.csv",
                                "cell_curves": "cell_curves.csv", "rotors": "rotors.csv", "plates": "plates.csv" },
                  "plate": { "material": "al6061", "thickness_mm": 6, "temperature_c": {{AmbientC}} },
                  "craft": { "empty_mass_kg": 20, "payload_kg": 5, "cg_x_mm": 0, "cg_y_mm": 0, "yaw_inertia_kg_m2": 2 },
                  "gap": { "design_mm": 10, "landed_mm": 4 },
                  "ambient_c": {{AmbientC}},
                  "load_model": "2d",
                  "stations": [
                    { "x_mm": 200, "y_mm": 0, "spin": "cw", "rotor": "r120", "motor": "m-110", "controller": "c-152" },
                    { "x_mm": -200, "y_mm": 0, "spin": "ccw", "rotor": "r120", "motor": "m-110", "controller": "c-152" }
                  ],
                  "pack": { "id": "p-12s", "count": 1 },
                  "limits": { "yaw_torque_nm": 0.5, "plate_temp_c": 90 }
                }
                """);
            return rig;
        }
    }
    // One numbering everywhere (issue 14 item 6): stations count from 1 as people count and as the workbench shows them;
    // --station 6 is the demo rig's sixth (last) station, --station 7 does not exist and --station 0 is refused.
    [Fact]
    public async Task Station_CountsFromOne_LikeTheWorkbench()
    {
        var (code, output, error) = await CliRunner.RunAsync("operate", RepoPaths.DemoRig, "--station", "6", "--json");
        Assert.True(code is ExitCodes.Ok or ExitCodes.LimitFindings, error);
        using var doc = System.Text.Json.JsonDocument.Parse(output);
        Assert.Equal(6, doc.RootElement.GetProperty("station").GetInt32());
        var (seven, _, sevenError) = await CliRunner.RunAsync("operate", RepoPaths.DemoRig, "--station", "7");
        Assert.Equal(ExitCodes.BadInput, seven);
        Assert.Contains("numbered 1 to 6", sevenError);
        var (zero, _, zeroError) = await CliRunner.RunAsync("load", RepoPaths.DemoRig, "--station", "0");
        Assert.Equal(ExitCodes.BadInput, zero);
        Assert.Contains("--station counts from 1", zeroError);
        var (_, hover, _) = await CliRunner.RunAsync("hover", RepoPaths.DemoRig, "--json");
        using var h = System.Text.Json.JsonDocument.Parse(hover);
        Assert.Equal([1, 2, 3, 4, 5, 6], h.RootElement.GetProperty("stations").EnumerateArray().Select(s => s.GetProperty("station").GetInt32()));
    }
}

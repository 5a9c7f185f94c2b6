using RotorDrive.Core;
using RotorDrive.Core.Studies.Calibration;
using RotorDrive.Files.Bench;
using RotorDrive.Files.Tests.Support;
using Xunit;

namespace RotorDrive.Files.Tests.Bench;

public class BenchDataTests
{
    [Fact]
    public void SteadyPoints_AreReadInSi_WhenTheHeaderNamesTorque()
    {
        var data = BenchData.Read("speed_rpm,gap_mm,torque_nm,lift_n\n1000,10,2.5,120\n2000,10,2.0,\n3000,12,1.8,150\n", "b.csv", 10);
        Assert.True(data.IsClean);
        Assert.Equal(CalibrationKind.SteadyPoints, data.Kind);
        Assert.Equal(3, data.Points!.Count);
        Assert.Equal(Units.RpmToRadPerS(1000), data.Points[0].SpeedRadPerS, 12);
        Assert.Equal(0.010, data.Points[0].GapM, 12);
        Assert.Null(data.Points[1].LiftN);
        Assert.Equal(64, data.Sha256.Length);
    }

    [Fact]
    public void SpinDown_WithoutGapColumn_UsesTheDefaultGap()
    {
        var data = BenchData.Read("time_s,speed_rpm\n0,3000\n0.1,2900\n0.2,2810\n", "s.csv", 9);
        Assert.True(data.IsClean);
        Assert.Equal(CalibrationKind.SpinDown, data.Kind);
        Assert.All(data.Trace!, s => Assert.Equal(0.009, s.GapM, 12));
    }

    [Fact]
    public void EveryProblem_IsReportedAtOnce_WithLineAndColumn()
    {
        var data = BenchData.Read("speed_rpm,gap_mm,torque_nm,lift\n1000,10,abc,1\n-5,10,1,2\n", "b.csv", 10);
        Assert.False(data.IsClean);
        Assert.Contains(data.Problems, p => p.Line == 1 && p.Column == 4 && p.Field == "lift" && p.Message.StartsWith("unknown column 'lift'", StringComparison.Ordinal));
        Assert.Contains(data.Problems, p => p.Line == 2 && p.Column == 3 && p.Message == Messages.NotANumber("abc"));
        Assert.Contains(data.Problems, p => p.Line == 3 && p.Column == 1 && p.Message == Messages.MustBeNonNegative(-5));
    }

    [Fact]
    public void SpinDown_WithTimesNotIncreasing_IsReportedOnTheTimeColumn()
    {
        var data = BenchData.Read("time_s,speed_rpm,gap_mm\n0,3000,10\n0.2,2900,10\n0.1,2810,10\n", "s.csv", 10);
        var problem = Assert.Single(data.Problems);
        Assert.Equal((4, 1, "time_s"), (problem.Line, problem.Column, problem.Field));
        Assert.Equal(Messages.TimeNotIncreasing(0.2, 0.1), problem.Message);
    }

    [Fact]
    public void AHeaderNamingNeitherShape_IsRefused()
    {
        var data = BenchData.Read("rpm,torque\n1,2\n", "x.csv", 10);
        Assert.Null(data.Kind);
        Assert.Equal(Messages.BenchHeaderUnknown(), Assert.Single(data.Problems).Message);
    }

    [Fact]
    public void CalibrationFile_RoundTrips_FactorsAndCovariance()
    {
        var loaded = RigLoader.Load(RepoPaths.DemoRig);
        var rig = loaded.Rig!;
        var rotor = loaded.Catalog!.Rotors.First(r => r.Id == "hx130-p4");
        var data = BenchData.ReadFile(Path.Combine(RepoPaths.Catalogs, "bench", "hx130-spin-down.csv"), rig.DesignGapM * 1000);
        var result = CalibrationStudy.Run(new CalibrationRequest(rotor, rig.Plate, rig.PlateTemperatureC, rig.AmbientC, data.Points, data.Trace));
        Assert.True(result.Accepted, result.RefusalDetail);
        string text = CalibrationFile.Write(result, rotor, "hx130-spin-down.csv", data.Sha256);
        var problems = new List<InputProblem>();
        var read = CalibrationFile.Read(text, "cal.csv", problems);
        Assert.Empty(problems);
        var (calibration, hash, dataFile, dataHash) = read!.Value;
        Assert.Equal("hx130-spin-down.csv", dataFile);
        Assert.Equal(data.Sha256, dataHash);
        Assert.Equal(CalibrationFile.RotorRowHash(rotor), hash);
        // Bearing damping is written in N m per 1000 rpm and read back in SI: the two unit conversions may move the last bit.
        var expected = result.ToLoadCalibration();
        Assert.Equal(expected.ConductivityFactor, calibration.Factors.ConductivityFactor);
        Assert.Equal(expected.FieldFactor, calibration.Factors.FieldFactor);
        Assert.Equal(expected.BearingDragNm!.Value, calibration.Factors.BearingDragNm!.Value, 1e-15 * Math.Abs(expected.BearingDragNm.Value));
        Assert.Equal(expected.BearingDampingNmPerRadPerS!.Value, calibration.Factors.BearingDampingNmPerRadPerS!.Value, 1e-15 * Math.Abs(expected.BearingDampingNmPerRadPerS.Value));
        for (int a = 0; a < 4; a++)
        {
            for (int b = 0; b < 4; b++)
            {
                Assert.Equal(result.Covariance[a][b], calibration.Covariance[a][b], Math.Abs(result.Covariance[a][b]) * 1e-12);
            }
        }
    }

    [Fact]
    public void CalibratedDemoRig_LoadsItsCalibration_AndRefusesAChangedRotorRow()
    {
        var clean = RigLoader.Load(Path.Combine(RepoPaths.Catalogs, "bench", "demo-rig-calibrated.json"));
        Assert.True(clean.IsClean, string.Join("\n", clean.Problems));
        Assert.True(clean.Rig!.Calibrations.ContainsKey("hx130-p4"));

        using var temp = new TempRig();
        string bench = Path.Combine(temp.Folder, "bench");
        Directory.CreateDirectory(bench);
        foreach (var file in Directory.GetFiles(Path.Combine(RepoPaths.Catalogs, "bench")))
        {
            File.Copy(file, Path.Combine(bench, Path.GetFileName(file)));
        }
        temp.Edit("rotors.csv", "hx130-p4,16,4,60,130,3,1.25,-0.12,7500,2260,0.021", "hx130-p4,16,4,60,130,3,1.25,-0.12,7500,2260,0.025");
        var changed = RigLoader.Load(Path.Combine(bench, "demo-rig-calibrated.json"));
        Assert.False(changed.IsClean);
        Assert.Contains(changed.Problems, p => p.Message == Messages.CalibrationRotorChanged("hx130-p4"));
    }
}

using System.Globalization;
using Terminal.Gui.Input;
using RotorDrive.Core;
using RotorDrive.Core.Loads;
using RotorDrive.Tui.Sheets;
using RotorDrive.Tui.Tests.Support;
using Xunit;

namespace RotorDrive.Tui.Tests.Sheets;

public class LiftDragSheetTests
{
    // The drag peak straight from Core: the rig's load table and the peak finder (what `rotordrive load` reports).
    private static DragPeak CorePeak(RotorDrive.Core.Craft.Rig rig, double gapM)
    {
        var rotor = rig.Stations[0].Rotor;
        var range = rig.LoadTableRangeFor(rotor);
        range = range with { MinGapM = Math.Min(range.MinGapM, gapM), MaxGapM = Math.Max(range.MaxGapM, gapM * 1.01) };
        var table = RotorLoadTable.Build(rotor, rig.Plate, range);
        return DragPeakFinder.Find(table, gapM, rig.PlateTemperatureC, rig.AmbientC, rotor.MaxSpeedRadPerS);
    }

    [Fact]
    public async Task LiftDragSheet_OpensOnTheDemoRig_ShowingCoresDragPeak()
    {
        using var bench = new Bench(columns: 100, rows: 30);
        bench.Window.ShowSheet("Lift & drag");
        await bench.SettleAsync();
        var sheet = Assert.IsType<LiftDragSheet>(bench.Window.CurrentSheet);
        var rig = bench.Context.Session.Rig!;
        var peak = CorePeak(rig, rig.DesignGapM);
        Assert.NotNull(sheet.Result);
        Assert.Contains($"drag peak X {peak.SpeedRpm.ToString("F0", CultureInfo.InvariantCulture)} rpm, {peak.TorqueNm.ToString("F2", CultureInfo.InvariantCulture)} N m", bench.Screen);
        Assert.Contains("X drag peak", sheet.Chart.LegendText);
        Assert.Contains('X', bench.Screen);
    }

    [Fact]
    public async Task EditingTheGap_Recomputes_OffTheUiThread()
    {
        using var bench = new Bench();
        bench.Window.ShowSheet("Lift & drag");
        await bench.SettleAsync();
        var sheet = Assert.IsType<LiftDragSheet>(bench.Window.CurrentSheet);
        double before = sheet.Result!.DragPeak.TorqueNm;
        sheet.GapField.SetFocus();
        sheet.GapField.Text = "";
        bench.Type("14");
        await bench.SettleAsync();
        Assert.Equal(0.014, sheet.Result!.GapM, 12);
        var expected = CorePeak(bench.Context.Session.Rig!, 0.014);
        Assert.Equal(expected.TorqueNm, sheet.Result.DragPeak.TorqueNm, 9);
        Assert.True(sheet.Result.DragPeak.TorqueNm < before, "a larger gap lowers the drag peak");
        // The rig itself is unchanged: the gap here is a what-if.
        Assert.False(bench.Context.Session.IsDirty);
    }

    [Fact]
    public async Task F7_SwitchesToTheLiftChart_WithTheWeightShare()
    {
        using var bench = new Bench();
        bench.Window.ShowSheet("Lift & drag");
        await bench.SettleAsync();
        var sheet = Assert.IsType<LiftDragSheet>(bench.Window.CurrentSheet);
        bench.Press(Key.F7);
        Assert.Contains("weight share per station", sheet.Chart.LegendText);
        var rig = bench.Context.Session.Rig!;
        double share = rig.TotalMassKg * Units.StandardGravity / rig.Stations.Count;
        Assert.Contains($"share of weight {share.ToString("F0", CultureInfo.InvariantCulture)} N", sheet.Readout);
    }

    [Fact]
    public async Task EditingTheRigsDesignGap_IsPickedUpByTheLoadSheet()
    {
        using var bench = new Bench();
        var rigSheet = Assert.IsType<RigSheet>(bench.Window.CurrentSheet);
        var gap = rigSheet.Fields.Single(f => f.Spec.JsonPath == "$.gap.design_mm");
        gap.Field.SetFocus();
        gap.Field.Text = "";
        bench.Type("12");
        bench.Window.ShowSheet("Lift & drag");
        await bench.SettleAsync();
        var sheet = Assert.IsType<LiftDragSheet>(bench.Window.CurrentSheet);
        Assert.Equal(0.012, sheet.Result!.GapM, 12);
    }

    // A rig naming a steady-point calibration shows the bench points at the shown gap over the calibrated curves, and the
    // readout names the calibration (files read through the workbench's own file service).
    [Fact]
    public async Task CalibratedRig_ShowsMeasuredBenchPointsOverTheFittedCurve()
    {
        var files = MemoryFiles.WithDemoCatalogs();
        string benchFolder = Path.Combine(Repo.CatalogsFolder, "bench");
        foreach (string path in Directory.GetFiles(benchFolder))
        {
            files["/lab/bench/" + Path.GetFileName(path)] = File.ReadAllText(path);
        }
        var loaded = RotorDrive.Files.RigLoader.Load(Repo.DemoRig);
        var rig = loaded.Rig!;
        var rotor = loaded.Catalog!.Rotors.First(r => r.Id == "hx130-p4");
        var data = RotorDrive.Files.Bench.BenchData.Read(files["/lab/bench/hx130-load-cell.csv"], "hx130-load-cell.csv", 10);
        var fit = RotorDrive.Core.Studies.Calibration.CalibrationStudy.Run(
            new RotorDrive.Core.Studies.Calibration.CalibrationRequest(rotor, rig.Plate, rig.PlateTemperatureC, rig.AmbientC, data.Points, null));
        files["/lab/bench/hx130-calibration.csv"] = RotorDrive.Files.Bench.CalibrationFile.Write(fit, rotor, "hx130-load-cell.csv", data.Sha256);

        using var bench = new Bench(columns: 160, rows: 30, rigPath: "/lab/bench/demo-rig-calibrated.json", files: files);
        bench.Window.ShowSheet("Lift & drag");
        await bench.SettleAsync();
        var sheet = Assert.IsType<LiftDragSheet>(bench.Window.CurrentSheet);
        Assert.NotNull(sheet.Result);
        Assert.Contains("calibrated hx130-calibration.csv", sheet.Readout);
        Assert.Contains("13 bench pts here", sheet.Readout);
        Assert.Contains("measured", sheet.Chart.LegendText);
    }
}

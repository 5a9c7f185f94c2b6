using RotorDrive.Core.Drive;
using RotorDrive.Core.Loads;
using RotorDrive.Tui.Sheets;
using RotorDrive.Tui.Tests.Support;
using Xunit;

namespace RotorDrive.Tui.Tests.Sheets;

public class RunningPointsSheetTests
{
    [Fact]
    public async Task RunningPointsSheet_ShowsCoresEquilibria_StableAndUnstableMarkedInText()
    {
        using var bench = new Bench(columns: 120, rows: 34);
        bench.Window.ShowSheet("Running points");
        await bench.SettleAsync();
        var sheet = Assert.IsType<RunningPointsSheet>(bench.Window.CurrentSheet);
        var rig = bench.Context.Session.Rig!;
        var s = rig.Stations[0];
        // The same picture straight from Core: the rig's load table, drivetrain and pack, duties as on the sheet.
        var table = RotorLoadTable.Build(s.Rotor, rig.Plate, rig.LoadTableRangeFor(s.Rotor));
        var drive = new StationDrive(new Drivetrain(s.Motor!, s.Controller!), rig.Packs!, s.Rotor, table, rig.Limits.Station);
        var conditions = OperatingConditions.Uniform(rig.DesignGapM, rig.AmbientC, 1.0) with { PlateTempC = rig.PlateTemperatureC };
        var map = TorqueSpeedMap.Compute(drive, conditions, RunningPointsSheet.Duties);
        Assert.NotNull(sheet.Map);
        string screen = bench.Screen;
        foreach (var curve in map.Curves)
        {
            Assert.Contains(RunningPointsSheet.Describe(curve), sheet.Readout);
        }
        Assert.Contains("O stable", sheet.Chart.LegendText);
        Assert.Contains("x unstable", sheet.Chart.LegendText);
        Assert.Contains("duty 25", screen);
    }

    [Fact]
    public async Task EditingTheGap_RecomputesTheRunningPoints()
    {
        using var bench = new Bench();
        bench.Window.ShowSheet("Running points");
        await bench.SettleAsync();
        var sheet = Assert.IsType<RunningPointsSheet>(bench.Window.CurrentSheet);
        var before = sheet.Map!.LoadTorqueNm.Max();
        sheet.GapField.SetFocus();
        sheet.GapField.Text = "";
        bench.Type("7");
        await bench.SettleAsync();
        Assert.True(sheet.Map!.LoadTorqueNm.Max() > before, "a smaller gap raises the load torque");
    }
}

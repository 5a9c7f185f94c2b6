using RotorDrive.Core.Studies;
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
        // The same picture straight from Core's operating-point study (what `rotordrive operate` runs), duties as on the sheet.
        var map = OperateStudy.Run(rig, new OperateStudyRequest(0, MapDuties: RunningPointsSheet.Duties)).Map!;
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

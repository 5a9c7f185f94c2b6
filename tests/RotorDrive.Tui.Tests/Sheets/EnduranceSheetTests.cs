using System.Globalization;
using Terminal.Gui.Input;
using RotorDrive.Core.Simulation;
using RotorDrive.Tui.Sheets;
using RotorDrive.Tui.Tests.Support;
using Xunit;

namespace RotorDrive.Tui.Tests.Sheets;

public class EnduranceSheetTests
{
    private static async Task<EnduranceSheet> OpenAsync(Bench bench)
    {
        bench.Window.ShowSheet("Endurance");
        await bench.SettleAsync();
        return Assert.IsType<EnduranceSheet>(bench.Window.CurrentSheet);
    }

    // The same run straight from Core, as the endurance command runs it (full pack).
    [Fact]
    public async Task EnduranceSheet_OpensOnTheDemoRig_ShowingCoresRuntimeAndFirstLimit_WithCharts()
    {
        using var bench = new Bench(columns: 120, rows: 40);
        var sheet = await OpenAsync(bench);
        var expected = EnduranceSimulator.Run(SimulationRig.Build(bench.Context.Session.Rig!), 1.0);
        var shown = sheet.Shown!.Result!;
        Assert.Equal(expected.RuntimeS, shown.RuntimeS);
        Assert.Equal(expected.FirstLimit, shown.FirstLimit);

        string readout = sheet.Panel.Readout;
        Assert.Contains($"runtime {EnduranceSheet.Runtime(expected.RuntimeS)}", readout);
        Assert.Contains(expected.RuntimeS.ToString("F0", CultureInfo.InvariantCulture) + " s", readout);
        // Core names the limit with 0-based stations; the workbench numbers them from 1.
        string words = expected.LimitStation is { } i ? expected.FirstLimitText.Replace($"station {i}", $"station {i + 1}", StringComparison.Ordinal) : expected.FirstLimitText;
        Assert.Contains("ended by " + words, readout);
        Assert.Equal(expected.Passes(), !readout.Contains("!! not the pack", StringComparison.Ordinal));

        Assert.Equal(["state of charge, %", "pack voltage, V", "winding temperature, C", "plate temperature, C"], sheet.Panel.Pages.Select(p => p.YLabel));
        var soc = sheet.Panel.Pages[0].Lines[0].Points;
        Assert.Equal(expected.FinalSocFraction * 100, soc[^1].Y, 6);
        Assert.Contains(sheet.Panel.Pages[3].Lines, l => l.Name == "plate limit" && l.Points[0].Y == bench.Context.Session.Rig!.Limits.PlateTempC);
        bench.Press(Key.F7);
        Assert.Contains("* pack  - cutoff", sheet.Panel.Chart.LegendText);
        Assert.Contains("Hot surfaces", sheet.Panel.Details);
        Assert.Contains("Lithium packs", sheet.Panel.Details);
    }

    [Fact]
    public async Task AtEightyColumns_TheChartsAndReadoutTakeTheWidth_AndTheHeatMapWaitsForAWiderTerminal()
    {
        using var bench = new Bench(80, 24);
        var sheet = await OpenAsync(bench);
        bench.Draw();
        Assert.False(sheet.HeatMap.Visible);
        string screen = bench.Screen;
        // Nothing of the readout is cut off (the sheet is 60 columns wide at 80; a long ending wraps onto the spare line):
        // the last line is there whole and every line's last word is on the screen.
        string[] lines = sheet.Panel.Readout.Split('\n');
        Assert.True(screen.Contains(lines[^1], StringComparison.Ordinal), lines[^1] + "\n" + screen);
        Assert.All(lines, line => Assert.True(screen.Contains(line.Split(' ')[^1], StringComparison.Ordinal), line + "\n" + screen));

        bench.App.Driver!.SetScreenSize(120, 40);
        bench.Draw();
        Assert.True(sheet.HeatMap.Visible);
    }

    [Fact]
    public async Task StartingFromHalfCharge_Recomputes_AsCoreDoes()
    {
        using var bench = new Bench();
        var sheet = await OpenAsync(bench);
        sheet.ChargeField.SetFocus();
        sheet.ChargeField.Text = "";
        bench.Type("50");
        await bench.SettleAsync();
        var expected = EnduranceSimulator.Run(SimulationRig.Build(bench.Context.Session.Rig!), 0.5);
        Assert.Equal(expected.RuntimeS, sheet.Shown!.Result!.RuntimeS);
        Assert.True(sheet.Shown.Result.FinalSocFraction <= 0.5);
    }
}

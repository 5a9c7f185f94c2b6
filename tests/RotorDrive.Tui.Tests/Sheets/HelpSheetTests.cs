using RotorDrive.Tui.Sheets;
using RotorDrive.Tui.Shell;
using RotorDrive.Tui.Tests.Support;
using Xunit;

namespace RotorDrive.Tui.Tests.Sheets;

public class HelpSheetTests
{
    [Fact]
    public void Help_ListsEveryKey_AndEveryCaution()
    {
        string help = HelpSheet.Compose();
        foreach (var (keys, _) in KeyMap.All)
        {
            Assert.Contains(keys, help);
        }
        // The cautions are Core's own (RotorDrive.Core.Safety), rendered word for word.
        foreach (var caution in RotorDrive.Core.Safety.Cautions.All)
        {
            Assert.Contains(caution.Title, help);
            Assert.Contains(caution.Text, help);
        }
        Assert.Contains("pacemaker", help);
        Assert.Contains("local codes", help);
    }

    [Fact]
    public void HelpSheet_OpensWithF1_AndShowsTheKeys()
    {
        using var bench = new Bench(columns: 80, rows: 24);
        bench.Press(Terminal.Gui.Input.Key.F1);
        Assert.Equal("Help", bench.Window.CurrentSheet.SheetName);
        Assert.Contains("save the rig", bench.Screen);
    }

    [Fact]
    public void Help_ReWrapsWhenTheTerminalIsResized_AndSaysWhereTheViewIs()
    {
        using var bench = new Bench(columns: 120, rows: 30);
        bench.Press(Terminal.Gui.Input.Key.F1);
        bench.Draw();
        var sheet = Assert.IsType<HelpSheet>(bench.Window.CurrentSheet);
        int wide = sheet.Lines.Count;
        Assert.StartsWith("lines 1-", sheet.PositionText);
        Assert.EndsWith($"of {wide}, PageDown for more", sheet.PositionText);
        Assert.Contains(sheet.PositionText, bench.Screen);

        bench.App.Driver!.SetScreenSize(80, 24);
        bench.Draw();
        Assert.True(sheet.Lines.Count > wide, $"{sheet.Lines.Count} lines at 80 columns against {wide} at 120");
        Assert.All(sheet.Lines, l => Assert.True(l.Length < 60, l));
        Assert.EndsWith($"of {sheet.Lines.Count}, PageDown for more", sheet.PositionText);
    }
}

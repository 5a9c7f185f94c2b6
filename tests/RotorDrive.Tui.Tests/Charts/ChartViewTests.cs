using Terminal.Gui.Input;
using RotorDrive.Tui.Charts;
using RotorDrive.Tui.Sheets;
using RotorDrive.Tui.Tests.Support;
using Xunit;

namespace RotorDrive.Tui.Tests.Charts;

public class ChartViewTests
{
    [Fact]
    public async Task CursorKeys_MoveAReadoutAlongTheCurve_PrintingItsExactValues()
    {
        using var bench = new Bench(columns: 100, rows: 30);
        bench.Window.ShowSheet("Lift & drag");
        await bench.SettleAsync();
        var sheet = Assert.IsType<LiftDragSheet>(bench.Window.CurrentSheet);
        var chart = sheet.Chart;
        var data = chart.Chart!;
        chart.SetFocus();
        bench.Press(Key.CursorRight);
        Assert.Equal((0, 0), chart.ReadoutCursor);
        bench.Press(Key.CursorRight);
        bench.Press(Key.CursorRight);
        var point = data.Lines[0].Points.Where(p => double.IsFinite(p.X) && double.IsFinite(p.Y)).ElementAt(2);
        Assert.Equal(ChartRenderer.Readout(data, (0, 2)), chart.CursorReadout);
        Assert.Contains(ChartRenderer.Exact(point.X), chart.CursorReadout);
        Assert.Contains(chart.CursorReadout, bench.Screen);
        bench.Press(Key.CursorDown);
        Assert.Equal(1, chart.ReadoutCursor!.Value.Line);
    }
}

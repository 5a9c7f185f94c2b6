using System.Globalization;
using Terminal.Gui.Input;
using RotorDrive.Tui.Sheets;
using RotorDrive.Tui.Tests.Support;
using Xunit;

namespace RotorDrive.Tui.Tests.Sheets;

public class PartsSheetTests
{
    [Fact]
    public void PartsSheet_ShowsEveryMotorOfTheCatalog_AndTheFilesPath()
    {
        using var bench = new Bench(columns: 120);
        bench.Window.ShowSheet("Parts");
        var sheet = Assert.IsType<PartsSheet>(bench.Window.CurrentSheet);
        Assert.Equal(bench.Context.Session.Catalog!.Motors.Count, sheet.Table.Table!.Rows);
        string screen = bench.Screen;
        Assert.Contains("/lab/motors.csv", screen);
        Assert.Contains("kv_rpm_per_v", screen);
        Assert.Contains("Read-only here", screen);
    }

    [Fact]
    public void Filter_KeepsOnlyMatchingRows()
    {
        using var bench = new Bench();
        bench.Window.ShowSheet("Parts");
        var sheet = Assert.IsType<PartsSheet>(bench.Window.CurrentSheet);
        var first = bench.Context.Session.Catalog!.Motors[0].Id;
        sheet.Filter.SetFocus();
        bench.Type(first);
        int expected = bench.Context.Session.Catalog!.Motors.Count(m => m.Id.Contains(first, StringComparison.OrdinalIgnoreCase));
        Assert.Equal(expected, sheet.Table.Table!.Rows);
        Assert.Equal(first, sheet.Table.Table[0, 0]);
    }

    [Fact]
    public void Sort_OrdersNumbersAsNumbers_AndASecondSortReverses()
    {
        using var bench = new Bench();
        bench.Window.ShowSheet("Parts");
        var sheet = Assert.IsType<PartsSheet>(bench.Window.CurrentSheet);
        sheet.SortBy(1); // kv_rpm_per_v
        var kv = Enumerable.Range(0, sheet.Table.Table!.Rows)
            .Select(r => double.Parse((string)sheet.Table.Table[r, 1], CultureInfo.InvariantCulture)).ToList();
        Assert.Equal(kv.OrderBy(v => v), kv);
        sheet.SortBy(1);
        var reversed = Enumerable.Range(0, sheet.Table.Table!.Rows)
            .Select(r => double.Parse((string)sheet.Table.Table[r, 1], CultureInfo.InvariantCulture)).ToList();
        Assert.Equal(kv.OrderByDescending(v => v), reversed);
    }

    [Fact]
    public void EveryCatalogKind_Opens_WithItsRowCount()
    {
        using var bench = new Bench();
        bench.Window.ShowSheet("Parts");
        var sheet = Assert.IsType<PartsSheet>(bench.Window.CurrentSheet);
        var c = bench.Context.Session.Catalog!;
        int[] expected = [c.Motors.Count, c.Controllers.Count, c.Packs.Count, c.Rotors.Count, c.Plates.Count];
        for (int i = 0; i < expected.Length; i++)
        {
            sheet.ShowKind(i);
            Assert.Equal(expected[i], sheet.Table.Table!.Rows);
        }
        sheet.ShowKind(5);
        Assert.Equal(c.CellCurves.Sum(cc => cc.SocFraction.Count), sheet.Table.Table!.Rows);
        bench.Press(Key.F7);
        Assert.Contains("sorted by", bench.Screen);
    }
}

using Terminal.Gui.ViewBase;
using RotorDrive.Tui.Tests.Support;
using Xunit;

namespace RotorDrive.Tui.Tests.Shell;

public class AllSheetsTests
{
    private static IEnumerable<View> Tree(View view)
    {
        yield return view;
        foreach (var sub in view.SubViews)
        {
            foreach (var v in Tree(sub))
            {
                yield return v;
            }
        }
    }

    [Theory]
    [InlineData(80, 24)]
    [InlineData(120, 40)]
    public async Task EverySheet_Opens_WithoutThrowing_AndNoViewIsLeftUndisposed(int columns, int rows)
    {
        // Small catalogs: the Shortlist sheet ranks on opening, and the whole demo catalog would take most of the suite's time.
        var bench = new Bench(columns, rows, files: SmallCatalogs.Files());
        var views = new List<View>();
        var disposed = new HashSet<View>(ReferenceEqualityComparer.Instance);
        try
        {
            for (int i = 0; i < bench.Window.Sheets.Count; i++)
            {
                bench.Window.ShowSheet(i);
                string screen = bench.Screen;
                Assert.Contains(bench.Window.Sheets[i].SheetName, screen);
                await bench.SettleAsync();
            }
            foreach (var sheet in bench.Window.Sheets)
            {
                views.AddRange(Tree(sheet));
            }
            views.AddRange(Tree(bench.Window));
            foreach (var v in views.Distinct())
            {
                v.Disposing += (_, _) => disposed.Add(v);
            }
        }
        finally
        {
            bench.Dispose();
        }
        var left = views.Distinct().Where(v => !disposed.Contains(v)).Select(v => v.GetType().Name + ":" + v.Title).ToList();
        Assert.Empty(left);
    }
}

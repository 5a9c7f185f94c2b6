using Terminal.Gui.Input;
using Terminal.Gui.ViewBase;
using RotorDrive.Tui.Sheets;
using RotorDrive.Tui.Tests.Support;
using RotorDrive.Tui.Work;
using Xunit;

namespace RotorDrive.Tui.Tests.Shell;

public class RedrawTests
{
    // Every view under the window (the sheet on show included), each counting its draws.
    private static List<(View View, Func<int> Draws)> Watch(View root)
    {
        int draws = 0;
        root.DrawComplete += (_, _) => draws++;
        var all = new List<(View, Func<int>)> { (root, () => draws) };
        foreach (var sub in root.SubViews)
        {
            all.AddRange(Watch(sub));
        }
        return all;
    }

    [Fact]
    public async Task AProgressTickDuringAStressRun_RedrawsFewViews_NotTheWholeWindow()
    {
        // Issue 15 item 1: during a long run the UI thread must stay free for keys. Each progress tick changes a count and
        // a bar; before this, assigning the progress line's width (even the same one) laid out and redrew every view
        // of the window four times a second (the window with the Stress sheet was about 100 views; about 50 since field
        // labels, units and messages are drawn by the view holding the fields).
        using var bench = new Bench(120, 40);
        var sheet = NothingLostTests.StartLongStressRun(bench);
        var deadline = DateTime.UtcNow.AddSeconds(120);
        while (sheet.SamplesDone < 3 && DateTime.UtcNow < deadline)
        {
            await Task.Delay(50);
        }
        bench.Time.Advance(BackgroundWork.ProgressInterval);
        bench.App.TimedEvents!.RunTimers();
        bench.Draw();
        var views = Watch(bench.Window);
        const int ticks = 3;
        for (int tick = 0; tick < ticks; tick++)
        {
            await Task.Delay(20);
            bench.Time.Advance(BackgroundWork.ProgressInterval);
            bench.App.TimedEvents!.RunTimers();
            bench.App.LayoutAndDraw(false);
        }
        int drawn = views.Sum(v => v.Draws());
        string which = string.Join(", ", views.Where(v => v.Draws() > 0).GroupBy(v => v.View.GetType().Name).Select(g => $"{g.Key} x{g.Sum(v => v.Draws())}"));
        string running = sheet.StateText;
        bench.Press(Key.F8);
        await bench.SettleAsync();
        Assert.StartsWith("Running: ", running);
        Assert.True(views.Count > 40, $"the window holds the Stress sheet's views ({views.Count})");
        // A tick redraws the progress line and the run's state (about 19 views with the chain above them); a whole-window
        // redraw would be every view, each tick.
        Assert.True(drawn <= ticks * 25 && drawn < ticks * views.Count / 2, $"{drawn} draws in {ticks} progress ticks of a window of {views.Count} views: {which}");
    }
}

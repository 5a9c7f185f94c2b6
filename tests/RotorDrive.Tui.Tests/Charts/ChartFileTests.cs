using System.Xml.Linq;
using Terminal.Gui.Input;
using RotorDrive.Tui.Sheets;
using RotorDrive.Tui.Tests.Support;
using Xunit;

namespace RotorDrive.Tui.Tests.Charts;

public class ChartFileTests
{
    [Fact]
    public async Task F6_OnLiftAndDrag_WritesTheChartPagesAsSvg_WithEveryLegendEntry()
    {
        using var bench = new Bench();
        bench.Window.ShowSheet("Lift & drag");
        await bench.SettleAsync();
        var sheet = Assert.IsType<LiftDragSheet>(bench.Window.CurrentSheet);
        Assert.Contains("F6 chart file", bench.Screen);
        bench.Prompts.Answers.Enqueue("/lab/lift.svg");
        bench.Press(Key.F6);
        var svg = XDocument.Parse(bench.Files["/lab/lift.svg"]);
        XNamespace ns = "http://www.w3.org/2000/svg";
        var texts = svg.Descendants(ns + "text").Select(t => t.Value.Trim()).ToList();
        // One panel per chart page, each series of each page named once in its legend.
        var pages = sheet.Panel.Pages;
        Assert.NotEmpty(pages);
        foreach (var line in pages.SelectMany(p => p.Lines))
        {
            Assert.Contains(line.Name, texts);
        }
        Assert.Equal(pages.Sum(p => p.Lines.Count), texts.Count(t => pages.SelectMany(p => p.Lines).Any(l => l.Name == t)));
        Assert.Contains(texts, t => t.StartsWith("rig: ", StringComparison.Ordinal) && t.Contains(bench.Clock.Now.ToString("yyyy-MM-dd"), StringComparison.Ordinal));
    }

    [Fact]
    public async Task F6_AsksBeforeReplacingAFile_AndKeepsItWhenTold()
    {
        using var bench = new Bench();
        bench.Window.ShowSheet("Spin-up");
        await bench.SettleAsync();
        bench.Files.WriteAllTextAtomic("/lab/spin.svg", "mine");
        bench.Prompts.Answers.Enqueue("/lab/spin.svg");
        bench.Prompts.Answers.Enqueue("Keep it");
        bench.Press(Key.F6);
        Assert.Equal("mine", bench.Files["/lab/spin.svg"]);
        Assert.Contains(bench.Prompts.Asked, a => a.StartsWith("Replace file", StringComparison.Ordinal));
    }
}

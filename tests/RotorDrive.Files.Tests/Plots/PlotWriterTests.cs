using System.Xml.Linq;
using FsCheck;
using FsCheck.Fluent;
using RotorDrive.Files.Plots;
using Xunit;

namespace RotorDrive.Files.Tests.Plots;

public class PlotWriterTests
{
    [Theory]
    [InlineData("a.svg", PlotFormat.Svg)]
    [InlineData("dir/B.SVG", PlotFormat.Svg)]
    [InlineData("c.png", PlotFormat.Png)]
    [InlineData("d.Png", PlotFormat.Png)]
    [InlineData("e.pdf", null)]
    [InlineData("noextension", null)]
    public void FormatOf_IsChosenByTheExtension(string path, PlotFormat? expected) => Assert.Equal(expected, PlotWriter.FormatOf(path));

    [Fact]
    public void Svg_NamesEverySeriesInTheLegend_AndStampsRigAndDate()
    {
        var figure = new PlotFigure("Test figure", "bench rig", new DateOnly(2026, 1, 2),
        [
            new PlotPanel("upper", "time, s", "speed, rpm", [PlotSeries.Line("alpha", [0.0, 1, 2], [0.0, 1, 4]), PlotSeries.Level("limit a", 3)]),
            new PlotPanel("lower", "time, s", "current, A", [PlotSeries.Marks("beta", [0.5], [2.0], hollow: true), PlotSeries.Threshold("limit b", 1)]),
        ]);
        var svg = XDocument.Parse(PlotWriter.Svg(figure));
        XNamespace ns = "http://www.w3.org/2000/svg";
        var texts = svg.Descendants(ns + "text").Select(t => t.Value.Trim()).ToList();
        foreach (string name in new[] { "alpha", "limit a", "beta", "limit b", "speed, rpm", "current, A", "Test figure: upper", "lower" })
        {
            Assert.Equal(1, texts.Count(t => t == name));
        }
        Assert.Contains("rig: bench rig | 2026-01-02 | RotorDrive", texts);
        Assert.Equal(PlotWriter.WidthPx.ToString(System.Globalization.CultureInfo.InvariantCulture), svg.Root!.Attribute("width")!.Value);
        Assert.Equal((2 * PlotWriter.PanelHeightPx).ToString(System.Globalization.CultureInfo.InvariantCulture), svg.Root!.Attribute("height")!.Value);
    }

    [Fact]
    public void Write_RefusesAnExistingFile_AndAnUnknownExtension()
    {
        string folder = Directory.CreateTempSubdirectory("rotordrive-plotwriter-").FullName;
        try
        {
            var figure = new PlotFigure("t", "r", new DateOnly(2026, 1, 2), [new PlotPanel("p", "x, m", "y, m", [PlotSeries.Line("l", [0.0, 1], [0.0, 1])])]);
            string png = Path.Combine(folder, "f.png");
            Assert.Null(PlotWriter.Write(figure, png, overwrite: false));
            Assert.Equal(new byte[] { 137, 80, 78, 71 }, File.ReadAllBytes(png)[..4]);
            Assert.Equal(Messages.FileExists(), PlotWriter.Write(figure, png, overwrite: false)!.Message);
            Assert.Equal(Messages.PlotExtension(), PlotWriter.Write(figure, Path.Combine(folder, "f.jpg"), overwrite: false)!.Message);
            Assert.False(File.Exists(Path.Combine(folder, "f.jpg")));
        }
        finally
        {
            Directory.Delete(folder, recursive: true);
        }
    }

    // Laws of a histogram (common practice, no source): the counts add up to the number of values, every value lies in
    // its bin, and no bin straddles zero (so a bar never mixes passing and failing margins).
    [Fact]
    public void Histogram_CountsEveryValueOnce_InItsBin_WithAnEdgeAtZero()
    {
        Prop.ForAll(Gen.Choose(-1000, 1000).Select(i => i / 37.0).ArrayOf().Where(a => a.Length >= 2 && a.Distinct().Count() >= 2).ToArbitrary(), values =>
        {
            var (centres, counts) = StressPlot.Histogram(values, 30);
            double width = centres.Length > 1 ? centres[1] - centres[0] : 1;
            bool sum = Math.Abs(counts.Sum() - values.Length) < 1e-9;
            bool zeroEdge = centres.All(c => !(c - width / 2 < -1e-9 * width && c + width / 2 > 1e-9 * width));
            bool inside = values.All(v => centres.Any(c => v >= c - width / 2 - 1e-9 * width && v <= c + width / 2 + 1e-9 * width));
            return sum && zeroEdge && inside;
        }).QuickCheckThrowOnFailure();
    }
}

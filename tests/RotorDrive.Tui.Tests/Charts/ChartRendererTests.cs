using RotorDrive.Tui.Charts;
using Xunit;

namespace RotorDrive.Tui.Tests.Charts;

public class ChartRendererTests
{
    private static readonly ChartData Diagonal = new("speed, rpm", "torque, N m",
        [new ChartLine("load", '*', [(0.0, 0.0), (100.0, 10.0)]), new ChartLine("peak", 'X', [(50.0, 5.0)], Joined: false)]);

    // Every cell above the legend row (the legend repeats each series' glyph).
    private static IEnumerable<(int C, int R)> Cells(ChartPicture p) =>
        from r in Enumerable.Range(0, p.Height - 1) from c in Enumerable.Range(0, p.Width) select (c, r);

    [Fact]
    public void ACurve_IsDrawnInBrailleDots_InsideThePlotOnly_WithTheMarkOnTop()
    {
        var p = ChartRenderer.Render(Diagonal, 60, 16, ChartStyle.Rich);
        var curve = Cells(p).Where(x => p.OwnerAt(x.C, x.R) == 0).ToList();
        Assert.NotEmpty(curve);
        // Unicode Braille Patterns block U+2800..U+28FF (The Unicode Standard, ch. 21).
        Assert.All(curve, x => Assert.InRange(p.CharAt(x.C, x.R), '\u2801', '\u28FF'));
        Assert.All(curve, x =>
        {
            Assert.InRange(x.C, p.PlotLeft, p.PlotLeft + p.PlotWidth - 1);
            Assert.InRange(x.R, p.PlotTop, p.PlotTop + p.PlotHeight - 1);
        });
        // A rising line: its dots go up from left to right, so the leftmost curve cell sits lowest.
        Assert.True(curve.MinBy(x => x.C).R > curve.MaxBy(x => x.C).R);
        Assert.Single(Cells(p), x => p.OwnerAt(x.C, x.R) == 1 && p.CharAt(x.C, x.R) == 'X');
    }

    [Fact]
    public void SubCellResolution_GivesFourDotRowsPerCharacterRow()
    {
        // A flat line at a value between two cell rows sets dots of one braille row only (not whole cells).
        var flat = new ChartData("t, s", "v, V", [new ChartLine("v", '*', [(0.0, 1.0), (10.0, 1.0)]), new ChartLine("base", '.', [(0.0, 0.0), (10.0, 4.0)], Joined: false)]);
        var p = ChartRenderer.Render(flat, 40, 12, ChartStyle.Rich);
        var chars = Cells(p).Where(x => p.OwnerAt(x.C, x.R) == 0).Select(x => p.CharAt(x.C, x.R)).Distinct().ToList();
        Assert.All(chars, ch => Assert.Contains(ch - 0x2800, new[] { 0x09, 0x12, 0x24, 0xC0 }));
    }

    [Fact]
    public void Segments_LeavingTheRange_AreClipped_NotDrawnOverLabelsOrBelowTheAxis()
    {
        var wild = new ChartData("x, m", "y, N", [new ChartLine("y", '*', [(0.0, 0.0), (1.0, 1.0), (2.0, -1e9), (3.0, 1.0)]), new ChartLine("ref", 'o', [(0.0, 0.0), (3.0, 1.0)], Joined: false)]) { YFromZero = true };
        var p = ChartRenderer.Render(wild with { Lines = [wild.Lines[0] with { Points = [(0.0, 0.0), (1.0, 1.0), (2.0, 0.5)] }, wild.Lines[1]] }, 50, 14, ChartStyle.Rich);
        var q = ChartRenderer.Render(new ChartData("x, m", "y, N", [new ChartLine("y", '*', [(0.0, 0.0), (1.0, 1.0), (2.0, double.NaN), (3.0, 1.0)])]), 50, 14, ChartStyle.Rich);
        foreach (var pic in new[] { p, q })
        {
            Assert.All(Cells(pic).Where(x => pic.OwnerAt(x.C, x.R) >= 0 && x.R < pic.Height - 1), x =>
            {
                Assert.InRange(x.C, pic.PlotLeft, pic.PlotLeft + pic.PlotWidth - 1);
                Assert.InRange(x.R, pic.PlotTop, pic.PlotTop + pic.PlotHeight - 1);
            });
        }
    }

    [Fact]
    public void BothEndsOfEachAxis_AreLabelled_AndTheAxisNamesShow()
    {
        var p = ChartRenderer.Render(Diagonal, 60, 16, ChartStyle.Rich);
        string text = p.ToString();
        Assert.Contains("↑ torque, N m", p.Row(0));
        Assert.Contains("speed, rpm →", p.Row(0));
        string xLabels = p.Row(p.Height - 2);
        Assert.StartsWith("0", xLabels.Trim());
        Assert.EndsWith("100", xLabels.TrimEnd());
        Assert.Contains("10┤", text);
        Assert.Contains(" 0┤", text);
        Assert.Equal("* load  X peak", p.Row(p.Height - 1).TrimEnd());
    }

    [Fact]
    public void ThePlainStyle_UsesOnlyPlainCharacters_AndEachSeriesGlyph()
    {
        var p = ChartRenderer.Render(Diagonal, 60, 16, ChartStyle.Plain);
        Assert.All(p.ToString().Where(ch => ch != '\n'), ch => Assert.True(ch < 128, $"'{ch}' is not plain"));
        Assert.Contains(Cells(p), x => p.OwnerAt(x.C, x.R) == 0 && p.CharAt(x.C, x.R) == '*');
    }

    [Fact]
    public void TheCursor_ReadsTheExactValues_OfItsPoint()
    {
        var p = ChartRenderer.Render(Diagonal, 60, 16, ChartStyle.Rich, cursor: (0, 1));
        Assert.Equal("load: speed 100 rpm, torque 10 N m", ChartRenderer.Readout(Diagonal, (0, 1)));
        Assert.StartsWith("load: speed 100 rpm", p.Row(0));
        Assert.Single(Cells(p), x => p.OwnerAt(x.C, x.R) == ChartPicture.Cursor);
    }

    [Fact]
    public void TheStyle_FollowsNoColorAndTheAsciiSwitch()
    {
        string? ascii = Environment.GetEnvironmentVariable("ROTORDRIVE_ASCII"), noColour = Environment.GetEnvironmentVariable("NO_COLOR");
        try
        {
            Environment.SetEnvironmentVariable("ROTORDRIVE_ASCII", null);
            Environment.SetEnvironmentVariable("NO_COLOR", "1");
            Assert.Equal(new ChartStyle(true, false), ChartStyle.FromEnvironment());
            Environment.SetEnvironmentVariable("ROTORDRIVE_ASCII", "1");
            Assert.Equal(ChartStyle.Plain, ChartStyle.FromEnvironment());
        }
        finally
        {
            Environment.SetEnvironmentVariable("ROTORDRIVE_ASCII", ascii);
            Environment.SetEnvironmentVariable("NO_COLOR", noColour);
        }
    }
}

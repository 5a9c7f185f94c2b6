using RotorDrive.Tui.Text;
using Xunit;

namespace RotorDrive.Tui.Tests.Text;

public class StationSketchTests
{
    [Fact]
    public void Sketch_PutsForwardUp_AndLeftLeft()
    {
        // Station 1 forward (+x), station 2 to the left (+y): top view with x up and y to the left.
        var stations = new[] { new SketchStation(0, 500, 0, true, null), new SketchStation(1, 0, 500, false, null) };
        var lines = StationSketch.Render(stations, 0, 0, 41, 11, letters: false);
        int row1 = lines.ToList().FindIndex(l => l.Contains("1↻"));
        int row2 = lines.ToList().FindIndex(l => l.Contains("2↺"));
        int rowCg = lines.ToList().FindIndex(l => l.Contains('+'));
        Assert.True(row1 < rowCg, "forward station above the centre");
        Assert.Equal(rowCg, row2);
        Assert.True(lines[row2].IndexOf("2↺", StringComparison.Ordinal) < lines[rowCg].IndexOf('+'), "left station left of the centre");
    }

    [Fact]
    public void Sketch_FitsItsSize_AndDrawsRims()
    {
        var stations = Enumerable.Range(0, 6)
            .Select(i => new SketchStation(i, 450 * Math.Cos(i * Math.PI / 3), 450 * Math.Sin(i * Math.PI / 3), i % 2 == 0, 140))
            .ToList();
        var lines = StationSketch.Render(stations, 15, -10, 58, 8, letters: true);
        Assert.Equal(8, lines.Count);
        Assert.All(lines, l => Assert.True(l.Length <= 58));
        for (int i = 0; i < 6; i++)
        {
            Assert.Contains(StationSketch.Mark(stations[i], letters: true), string.Join("\n", lines));
        }
        Assert.Contains('.', string.Join("", lines));
    }
}

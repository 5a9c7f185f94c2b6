using RotorDrive.Core.Thermal;
using RotorDrive.Tui.Charts;
using Xunit;

namespace RotorDrive.Tui.Tests.Charts;

public sealed class PlateHeatMapViewTests
{
    // A field hot in its north-east corner on a 4 x 4 grid: the raster puts north at the top and east on the right, and
    // the colour scale runs from blue (coolest) to red (hottest).
    [Fact]
    public void Sample_PutsNorthUp_AndHeatRunsFromBlueToRed()
    {
        var t = new double[16];
        t[3 * 4 + 3] = 50;
        var map = new PlateTemperatureMap(0, 0, 1, 4, t, 10);
        var raster = PlateHeatMapView.Sample(map, (0, 3, 0, 3), 4, 2);
        Assert.Equal(50, raster[3, 0]);
        Assert.Equal(0, raster[0, 3]);
        var cold = PlateHeatMapView.Heat(0, 0, 50);
        var hot = PlateHeatMapView.Heat(50, 0, 50);
        Assert.True(cold.B > cold.R && hot.R > hot.B, $"{cold} {hot}");
    }

    [Fact]
    public void Window_CoversTheRotorsAndTheRoute_WithinTheMap()
    {
        var map = new PlateTemperatureMap(-5, -5, 0.1, 101, new double[101 * 101], 0);
        var w = PlateHeatMapView.Window(map, [(0.5, 0, 0.06, 0.13)], [(0, 0), (3, 0)]);
        Assert.True(w.X0 <= 0.5 - 0.13 && w.X1 >= 3 && w.Y0 <= -0.13 && w.Y1 >= 0.13);
        var clipped = PlateHeatMapView.Window(map, [(0.5, 0, 0.06, 0.13)], [(0, 0), (30, 0)]);
        Assert.Equal(5, clipped.X1, 9);
    }
}

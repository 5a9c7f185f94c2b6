using System.Text;
using Terminal.Gui.Drawing;
using Terminal.Gui.ViewBase;
using RotorDrive.Core.Craft;
using RotorDrive.Core.Thermal;
using TuiAttribute = Terminal.Gui.Drawing.Attribute;

namespace RotorDrive.Tui.Charts;

/// <summary>The plate's temperature field as a colour heat map: two map rows per text row (upper half block in the upper
/// row's colour over the lower row's), the rotors' magnet annuli outlined with 'o' and the route's corners with '+',
/// and a scale line under it.</summary>
/// <remarks>Shows the part of the plate around the rotors and the route (the solver's domain is larger); colours run
/// from blue (coolest shown) through green and yellow to red (hottest). No physics here: the map comes from Core's
/// endurance run.</remarks>
public sealed class PlateHeatMapView : View
{
    private PlateTemperatureMap? _map;
    private IReadOnlyList<(double XM, double YM, double InnerM, double OuterM)> _rotors = [];
    private IReadOnlyList<(double XM, double YM)> _route = [];

    /// <summary>The scale line of the map on show ("" when none).</summary>
    public string ScaleText { get; private set; } = "";

    /// <summary>Shows a field with the rotors where they are at the end of the run and the route's corners.</summary>
    /// <param name="map">The field, or null to clear.</param>
    /// <param name="rotors">Each rotor's axis and annulus radii on the plate, m.</param>
    /// <param name="route">The route's corners on the plate, m (empty for a hover in place).</param>
    public void Show(PlateTemperatureMap? map, IReadOnlyList<(double XM, double YM, double InnerM, double OuterM)> rotors, IReadOnlyList<(double XM, double YM)> route)
    {
        _map = map;
        _rotors = rotors ?? [];
        _route = route ?? [];
        ScaleText = map is null ? "" : Scale(map, Window(map, _rotors, _route));
        SetNeedsDraw();
    }

    /// <summary>The plate window shown, m: the rotors and the route with a margin of one rotor radius, within the map.</summary>
    internal static (double X0, double X1, double Y0, double Y1) Window(PlateTemperatureMap map, IReadOnlyList<(double XM, double YM, double InnerM, double OuterM)> rotors,
        IReadOnlyList<(double XM, double YM)> route)
    {
        double margin = rotors.Count > 0 ? rotors.Max(r => r.OuterM) * 2 : 0.2;
        var xs = rotors.Select(r => r.XM).Concat(route.Select(p => p.XM)).DefaultIfEmpty(0).ToArray();
        var ys = rotors.Select(r => r.YM).Concat(route.Select(p => p.YM)).DefaultIfEmpty(0).ToArray();
        double x0 = Math.Max(map.XM(0), xs.Min() - margin), x1 = Math.Min(map.XM(map.Count - 1), xs.Max() + margin);
        double y0 = Math.Max(map.YM(0), ys.Min() - margin), y1 = Math.Min(map.YM(map.Count - 1), ys.Max() + margin);
        return (x0, x1, y0, y1);
    }

    /// <summary>Temperatures sampled for a raster of cells (two samples per cell, upper then lower), nearest grid point,
    /// north (larger y) at the top.</summary>
    internal static double[,] Sample(PlateTemperatureMap map, (double X0, double X1, double Y0, double Y1) window, int columns, int rows)
    {
        var t = new double[columns, 2 * rows];
        for (int c = 0; c < columns; c++)
        {
            double x = window.X0 + (c + 0.5) / columns * (window.X1 - window.X0);
            int gx = Math.Clamp((int)Math.Round((x - map.OriginXM) / map.SpacingM), 0, map.Count - 1);
            for (int r = 0; r < 2 * rows; r++)
            {
                double y = window.Y1 - (r + 0.5) / (2 * rows) * (window.Y1 - window.Y0);
                int gy = Math.Clamp((int)Math.Round((y - map.OriginYM) / map.SpacingM), 0, map.Count - 1);
                t[c, r] = map.At(gx, gy);
            }
        }
        return t;
    }

    /// <summary>The colour of a temperature between the coolest and hottest shown: blue, cyan, green, yellow, red.</summary>
    internal static (int R, int G, int B) Heat(double t, double low, double high)
    {
        double f = high > low ? Math.Clamp((t - low) / (high - low), 0, 1) : 0;
        (double r, double g, double b)[] stops = [(0, 0, 160), (0, 170, 200), (0, 180, 60), (230, 210, 0), (220, 30, 0)];
        double p = f * (stops.Length - 1);
        int i = Math.Min((int)p, stops.Length - 2);
        double w = p - i;
        return ((int)(stops[i].r + w * (stops[i + 1].r - stops[i].r)), (int)(stops[i].g + w * (stops[i + 1].g - stops[i].g)), (int)(stops[i].b + w * (stops[i + 1].b - stops[i].b)));
    }

    /// <inheritdoc/>
    protected override bool OnDrawingContent(DrawContext? context)
    {
        if (_map is not { } map || Viewport.Width < 4 || Viewport.Height < 3)
        {
            return base.OnDrawingContent(context);
        }
        int columns = Viewport.Width, rows = Viewport.Height - 1;
        var window = Window(map, _rotors, _route);
        var t = Sample(map, window, columns, rows);
        double low = map.TemperaturesC.Min(), high = map.TemperaturesC.Max();
        for (int c = 0; c < columns; c++)
        {
            for (int r = 0; r < rows; r++)
            {
                var top = Heat(t[c, 2 * r], low, high);
                var bottom = Heat(t[c, 2 * r + 1], low, high);
                SetAttribute(new TuiAttribute(new Color(top.R, top.G, top.B), new Color(bottom.R, bottom.G, bottom.B)));
                AddRune(c, r, new Rune('\u2580'));
            }
        }
        (int C, int R)? Cell(double x, double y)
        {
            int c = (int)Math.Floor((x - window.X0) / (window.X1 - window.X0) * columns);
            int r = (int)Math.Floor((window.Y1 - y) / (window.Y1 - window.Y0) * rows);
            return c >= 0 && c < columns && r >= 0 && r < rows ? (c, r) : null;
        }
        SetAttribute(new TuiAttribute(new Color(255, 255, 255), new Color(0, 0, 0)));
        foreach (var rotor in _rotors)
        {
            foreach (double radius in new[] { rotor.InnerM, rotor.OuterM })
            {
                for (int k = 0; k < 48; k++)
                {
                    double a = 2 * Math.PI * k / 48;
                    if (Cell(rotor.XM + radius * Math.Cos(a), rotor.YM + radius * Math.Sin(a)) is { } cell)
                    {
                        AddRune(cell.C, cell.R, new Rune('o'));
                    }
                }
            }
        }
        foreach (var corner in _route)
        {
            if (Cell(corner.XM, corner.YM) is { } cell)
            {
                AddRune(cell.C, cell.R, new Rune('+'));
            }
        }
        SetAttribute(GetAttributeForRole(VisualRole.Normal));
        Move(0, rows);
        AddStr(ScaleText.Length > columns ? ScaleText[..columns] : ScaleText.PadRight(columns));
        return true;
    }

    // The scale line: coolest and hottest shown, the window's size and the marks.
    private static string Scale(PlateTemperatureMap map, (double X0, double X1, double Y0, double Y1) w)
        => $"plate at {map.TimeS:0} s: blue {map.TemperaturesC.Min():0.0} C to red {map.TemperaturesC.Max():0.0} C; "
            + $"{(w.X1 - w.X0) * 1000:0} x {(w.Y1 - w.Y0) * 1000:0} mm; o rotors, + route";
}

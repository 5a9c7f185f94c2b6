namespace RotorDrive.Tui.Charts;

/// <summary>A named curve or set of marks on a chart, drawn with its own character so it is not told apart by colour alone.</summary>
/// <param name="Name">Shown in the legend.</param>
/// <param name="Glyph">The character the curve or marks are drawn with.</param>
/// <param name="Points">The points (x, y) in the chart's units; non-finite points are left out.</param>
/// <param name="Joined">True to join the points with a line; false for marks only.</param>
/// <param name="Group">Lines of one family (every station's curve) that the legend names once, with the range of their
/// characters ("1..6 stations"); null for a line named on its own.</param>
public sealed record ChartLine(string Name, char Glyph, IReadOnlyList<(double X, double Y)> Points, bool Joined = true, string? Group = null)
{
    /// <summary>Most points a time trace keeps: a terminal chart has far fewer columns, and fewer points draw faster.</summary>
    public const int MaxTracePoints = 240;

    /// <summary>A time trace (or any sampled curve): y against x, every k-th sample kept so at most
    /// <see cref="MaxTracePoints"/> remain, the last sample always kept.</summary>
    /// <param name="name">The legend name.</param>
    /// <param name="glyph">The character.</param>
    /// <param name="x">The abscissae (times).</param>
    /// <param name="y">The values, as many as <paramref name="x"/>.</param>
    /// <param name="scale">Applied to each value (a unit conversion), or null.</param>
    public static ChartLine Trace(string name, char glyph, IReadOnlyList<double> x, IReadOnlyList<double> y, Func<double, double>? scale = null)
    {
        ArgumentNullException.ThrowIfNull(x);
        ArgumentNullException.ThrowIfNull(y);
        int n = Math.Min(x.Count, y.Count);
        int step = Math.Max(1, (int)Math.Ceiling(n / (double)MaxTracePoints));
        var points = new List<(double, double)>(n / step + 2);
        for (int i = 0; i < n; i += step)
        {
            points.Add((x[i], scale is null ? y[i] : scale(y[i])));
        }
        if (n > 0 && (n - 1) % step != 0)
        {
            points.Add((x[n - 1], scale is null ? y[n - 1] : scale(y[n - 1])));
        }
        return new ChartLine(name, glyph, points);
    }

    /// <summary>One trace per station, each drawn with the station's number (<see cref="StationGlyph"/>) and named once in
    /// the legend as a group.</summary>
    /// <param name="group">The legend's name for the family ("stations").</param>
    /// <param name="x">The abscissae (times).</param>
    /// <param name="perStation">The values, [station][sample].</param>
    /// <param name="scale">Applied to each value, or null.</param>
    public static IEnumerable<ChartLine> PerStation(string group, IReadOnlyList<double> x, IReadOnlyList<IReadOnlyList<double>> perStation, Func<double, double>? scale = null)
    {
        ArgumentNullException.ThrowIfNull(perStation);
        for (int i = 0; i < perStation.Count; i++)
        {
            yield return Trace("station " + (i + 1), StationGlyph(i), x, perStation[i], scale) with { Group = group };
        }
    }

    /// <summary>A horizontal line at one value (a limit or a target) from <paramref name="x0"/> to <paramref name="x1"/>.</summary>
    public static ChartLine Level(string name, char glyph, double x0, double x1, double y) => new(name, glyph, [(x0, y), (x1, y)]);

    /// <summary>The character for a station's curve: its workbench number 1..9, then letters.</summary>
    /// <param name="index">The station index, 0-based.</param>
    public static char StationGlyph(int index) => index < 9 ? (char)('1' + index) : (char)('a' + (index - 9) % 26);
}

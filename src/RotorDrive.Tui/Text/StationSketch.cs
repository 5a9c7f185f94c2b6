using System.Text;

namespace RotorDrive.Tui.Text;

/// <summary>Draws the rig's top view as text: forward is up, left is left; each station is a mark with its 1-based
/// number and spin ("1↻" clockwise, "2↺" counter-clockwise, or "1cw"/"2ccw" in letters), its rotor's rim dotted,
/// and the centre of gravity marked "+".</summary>
public static class StationSketch
{
    /// <summary>The mark for a station: number and spin.</summary>
    public static string Mark(SketchStation s, bool letters)
        => (s.Index + 1).ToString(System.Globalization.CultureInfo.InvariantCulture) + s.Clockwise switch
        {
            true => letters ? "cw" : "↻",
            false => letters ? "ccw" : "↺",
            null => "?",
        };

    /// <summary>The legend line that explains the marks (at most 42 characters, so a "Station N of M" heading fits
    /// beside it on 80 columns).</summary>
    public static string Legend(bool letters)
        => letters
            ? "Ncw/Nccw spin from above [sel] +CG up=fwd"
            : "↻ cw ↺ ccw from above [sel] +CG up=fwd";

    /// <summary>Renders the sketch into <paramref name="rows"/> lines of <paramref name="columns"/> characters.</summary>
    /// <param name="stations">The stations.</param>
    /// <param name="cgXMm">Centre of gravity forward, mm, or null when unknown.</param>
    /// <param name="cgYMm">Centre of gravity left, mm, or null when unknown.</param>
    /// <param name="columns">Width in characters (at least 12).</param>
    /// <param name="rows">Height in lines (at least 5).</param>
    /// <param name="letters">True to spell the spin as cw/ccw instead of arrows.</param>
    /// <param name="selected">The selected station's index (0-based): its mark is bracketed ("[2↺]") and its rim drawn
    /// with 'o' instead of '.', so it stands out without colour; null for none.</param>
    public static IReadOnlyList<string> Render(IReadOnlyList<SketchStation> stations, double? cgXMm, double? cgYMm, int columns, int rows, bool letters, int? selected = null)
    {
        ArgumentNullException.ThrowIfNull(stations);
        columns = Math.Max(12, columns);
        rows = Math.Max(5, rows);
        var grid = new char[rows, columns];
        for (int r = 0; r < rows; r++)
        {
            for (int c = 0; c < columns; c++)
            {
                grid[r, c] = ' ';
            }
        }
        if (stations.Count == 0)
        {
            return ToLines(grid);
        }

        // Extent: every axis plus its rim; characters are about twice as tall as wide, so columns get two per row.
        double extent = 1;
        foreach (var s in stations)
        {
            double rim = s.RadiusMm ?? 0;
            extent = Math.Max(extent, Math.Max(Math.Abs(s.XMm), Math.Abs(s.YMm)) + rim);
        }
        if (cgXMm is { } gx && cgYMm is { } gy)
        {
            extent = Math.Max(extent, Math.Max(Math.Abs(gx), Math.Abs(gy)));
        }
        double perRow = (rows - 1) / 2.0 / extent;
        double perColumn = (columns - 5) / 2.0 / extent;
        perRow = Math.Min(perRow, perColumn / 2.0);
        perColumn = perRow * 2.0;
        int centreRow = rows / 2, centreColumn = columns / 2;
        (int Row, int Column) Place(double xMm, double yMm)
            => ((int)Math.Round(centreRow - xMm * perRow), (int)Math.Round(centreColumn - yMm * perColumn));

        void Put(int r, int c, char ch)
        {
            if (r >= 0 && r < rows && c >= 0 && c < columns)
            {
                grid[r, c] = ch;
            }
        }

        // Rims first, so marks are drawn over them; the selected station's rim last, so it is whole.
        foreach (var s in stations.OrderBy(s => s.Index == selected))
        {
            if (s.RadiusMm is not { } radius || radius <= 0)
            {
                continue;
            }
            for (int k = 0; k < 48; k++)
            {
                double a = 2 * Math.PI * k / 48;
                var (r, c) = Place(s.XMm + radius * Math.Cos(a), s.YMm + radius * Math.Sin(a));
                Put(r, c, s.Index == selected ? 'o' : '.');
            }
        }
        if (cgXMm is { } cx && cgYMm is { } cy)
        {
            var (r, c) = Place(cx, cy);
            Put(r, c, '+');
        }
        foreach (var s in stations.OrderBy(s => s.Index == selected))
        {
            var (r, c) = Place(s.XMm, s.YMm);
            string mark = s.Index == selected ? "[" + Mark(s, letters) + "]" : Mark(s, letters);
            int start = Math.Clamp(c - mark.Length / 2, 0, Math.Max(0, columns - mark.Length));
            for (int i = 0; i < mark.Length; i++)
            {
                Put(r, start + i, mark[i]);
            }
        }
        return ToLines(grid);
    }

    private static IReadOnlyList<string> ToLines(char[,] grid)
    {
        var lines = new List<string>(grid.GetLength(0));
        var sb = new StringBuilder();
        for (int r = 0; r < grid.GetLength(0); r++)
        {
            sb.Clear();
            for (int c = 0; c < grid.GetLength(1); c++)
            {
                sb.Append(grid[r, c]);
            }
            lines.Add(sb.ToString().TrimEnd());
        }
        return lines;
    }
}

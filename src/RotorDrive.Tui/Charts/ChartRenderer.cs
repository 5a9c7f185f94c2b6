using System.Globalization;

namespace RotorDrive.Tui.Charts;

/// <summary>Draws a <see cref="ChartData"/> into character cells: curves at sub-cell resolution with Unicode braille (2 x
/// 4 dots per cell) or one plain character per cell, clipped to the plot area; axes with round ticks and both ends
/// labelled; the axis names; a legend; and an optional readout cursor on one point of one series.</summary>
/// <remarks>Lines are rasterised with Bresenham's algorithm (J. E. Bresenham, "Algorithm for computer control of a digital
/// plotter", IBM Systems Journal 4(1), 1965) after clipping each segment to the plot's range (Y.-D. Liang &amp; B. A. Barsky,
/// "A new concept and method for line clipping", ACM Transactions on Graphics 3(1), 1984). Braille dot bits follow the
/// Unicode Braille Patterns block (U+2800..U+28FF, The Unicode Standard, chapter 21).</remarks>
public static class ChartRenderer
{
    /// <summary>Rows the chart needs besides its plot: the title or readout, the axis, the tick labels and the legend.</summary>
    public const int FrameRows = 4;

    // Dot bits of a braille cell by (column 0..1, row 0..3): Unicode Braille Patterns, dots 1-2-3-7 left, 4-5-6-8 right.
    private static readonly int[,] BrailleBits = { { 0x01, 0x02, 0x04, 0x40 }, { 0x08, 0x10, 0x20, 0x80 } };

    /// <summary>Draws the chart.</summary>
    /// <param name="data">What to draw.</param>
    /// <param name="width">Columns.</param>
    /// <param name="height">Rows.</param>
    /// <param name="style">Braille or plain characters (colour is the view's business).</param>
    /// <param name="cursor">The readout cursor (a line index and a point index in <see cref="ChartData.Lines"/>), or null.</param>
    /// <param name="caption">Text put before the legend (a page number), or "".</param>
    public static ChartPicture Render(ChartData data, int width, int height, ChartStyle style, (int Line, int Point)? cursor = null, string caption = "")
    {
        ArgumentNullException.ThrowIfNull(data);
        ArgumentNullException.ThrowIfNull(style);
        var picture = new ChartPicture(width, height);
        WriteLegend(picture, data, caption ?? "");
        var finite = data.Lines.SelectMany(l => l.Points).Where(Finite).ToList();
        if (finite.Count == 0 || picture.Height < FrameRows + 2 || picture.Width < 16)
        {
            picture.Write(0, 0, finite.Count == 0 ? "(nothing to draw)" : "(too small to draw)", ChartPicture.Text);
            return picture;
        }
        var (xLo, xHi, xStep, yLo, yHi, yStep) = Ranges(data, finite, picture.Width, picture.Height);
        var yTicks = Ticks(yLo, yHi, yStep);
        int labelWidth = yTicks.Max(t => ChartView.Short(t).Length);
        int plotLeft = labelWidth + 1;
        var plot = new PlotArea(xLo, xHi, yLo, yHi, plotLeft, 1, Math.Max(4, picture.Width - plotLeft - 1), picture.Height - FrameRows);
        picture.PlotLeft = plot.Left;
        picture.PlotTop = plot.Top;
        picture.PlotWidth = plot.Width;
        picture.PlotHeight = plot.Height;

        bool u = style.Unicode;
        DrawAxes(picture, plot, yTicks, u);
        WriteXTicks(picture, Ticks(xLo, xHi, xStep), plot.Column, plot.AxisRow, u);
        // Curves (braille dots or plain characters), then marks on top, then the cursor.
        DrawCurves(picture, plot, data.Lines, u);
        DrawMarks(picture, plot, data.Lines);
        string top = TopLine(picture, plot, data, cursor, u);
        picture.Write(0, 0, top.Length > picture.Width ? top[..picture.Width] : top, ChartPicture.Text);
        return picture;
    }

    // The plot's value ranges and its cells in the picture (the y axis in the column left of it, the x axis in the row
    // below it).
    private readonly record struct PlotArea(double XLo, double XHi, double YLo, double YHi, int Left, int Top, int Width, int Height)
    {
        public int AxisColumn => Left - 1;

        public int AxisRow => Top + Height;

        public int Column(double x) => Left + (int)Math.Round((x - XLo) / (XHi - XLo) * (Width - 1));

        public int Row(double y) => Top + (int)Math.Round((YHi - y) / (YHi - YLo) * (Height - 1));

        public bool Contains((double X, double Y) p) => p.X >= XLo && p.X <= XHi && p.Y >= YLo && p.Y <= YHi;
    }

    // The y axis with its ticks and labels (both ends always, the others where they do not touch), and the x axis line.
    private static void DrawAxes(ChartPicture picture, PlotArea plot, List<double> yTicks, bool u)
    {
        int axisColumn = plot.AxisColumn, axisRow = plot.AxisRow;
        for (int r = plot.Top; r < axisRow; r++)
        {
            picture.Set(axisColumn, r, u ? '│' : '|', ChartPicture.Axis);
        }
        picture.Set(axisColumn, axisRow, u ? '└' : '+', ChartPicture.Axis);
        for (int c = plot.Left; c < plot.Left + plot.Width; c++)
        {
            picture.Set(c, axisRow, u ? '─' : '-', ChartPicture.Axis);
        }
        int lastLabelRow = -2;
        foreach (double t in yTicks.OrderByDescending(t => t))
        {
            int r = plot.Row(t);
            picture.Set(axisColumn, r, u ? '┤' : '+', ChartPicture.Axis);
            bool end = t == yTicks[0] || t == yTicks[^1];
            if (end || r > lastLabelRow + 1)
            {
                string label = ChartView.Short(t);
                picture.Write(axisColumn - label.Length, r, label, ChartPicture.Text);
                lastLabelRow = r;
            }
        }
    }

    // The joined series as clipped line segments: braille dots (2 x 4 per cell) or one plain character per cell; a cell
    // belongs to the last series that touched it.
    private static void DrawCurves(ChartPicture picture, PlotArea plot, IReadOnlyList<ChartLine> lines, bool u)
    {
        int plotWidth = plot.Width, plotHeight = plot.Height;
        int pw = u ? plotWidth * 2 : plotWidth, ph = u ? plotHeight * 4 : plotHeight;
        var bits = new int[plotHeight, plotWidth];
        var owner = new int[plotHeight, plotWidth];
        for (int r = 0; r < plotHeight; r++)
        {
            for (int c = 0; c < plotWidth; c++)
            {
                owner[r, c] = ChartPicture.Blank;
            }
        }
        void Dot(int px, int py, int line)
        {
            if (px < 0 || py < 0 || px >= pw || py >= ph)
            {
                return;
            }
            int c = u ? px / 2 : px, r = u ? py / 4 : py;
            bits[r, c] |= u ? BrailleBits[px % 2, py % 4] : 1;
            owner[r, c] = line;
        }
        double Px(double x) => (x - plot.XLo) / (plot.XHi - plot.XLo) * (pw - 1);
        double Py(double y) => (plot.YHi - y) / (plot.YHi - plot.YLo) * (ph - 1);
        for (int i = 0; i < lines.Count; i++)
        {
            var points = lines[i].Points.Where(Finite).ToList();
            if (!lines[i].Joined || points.Count < 2)
            {
                continue;
            }
            for (int k = 1; k < points.Count; k++)
            {
                if (Clip(points[k - 1], points[k], plot.XLo, plot.XHi, plot.YLo, plot.YHi) is { } seg)
                {
                    Bresenham((int)Math.Round(Px(seg.A.X)), (int)Math.Round(Py(seg.A.Y)), (int)Math.Round(Px(seg.B.X)), (int)Math.Round(Py(seg.B.Y)), i, Dot);
                }
            }
        }
        for (int r = 0; r < plotHeight; r++)
        {
            for (int c = 0; c < plotWidth; c++)
            {
                if (owner[r, c] >= 0)
                {
                    picture.Set(plot.Left + c, plot.Top + r, u ? (char)(0x2800 + bits[r, c]) : lines[owner[r, c]].Glyph, owner[r, c]);
                }
            }
        }
    }

    // The series drawn as marks (not joined, or fewer than two finite points): each point's glyph in its cell.
    private static void DrawMarks(ChartPicture picture, PlotArea plot, IReadOnlyList<ChartLine> lines)
    {
        for (int i = 0; i < lines.Count; i++)
        {
            if (lines[i].Joined && lines[i].Points.Count(Finite) >= 2)
            {
                continue;
            }
            foreach (var p in lines[i].Points.Where(Finite))
            {
                if (plot.Contains(p))
                {
                    picture.Set(plot.Column(p.X), plot.Row(p.Y), lines[i].Glyph, i);
                }
            }
        }
    }

    // The top line: with a cursor, its mark in the plot and the readout; otherwise the axis names at either end.
    private static string TopLine(ChartPicture picture, PlotArea plot, ChartData data, (int Line, int Point)? cursor, bool u)
    {
        if (cursor is { } at && CursorPoint(data, at) is { } point)
        {
            if (plot.Contains(point))
            {
                picture.Set(plot.Column(point.X), plot.Row(point.Y), u ? '◆' : '@', ChartPicture.Cursor);
            }
            return Readout(data, at);
        }
        string yName = (u ? "↑ " : "^ ") + data.YLabel;
        string xName = data.XLabel + (u ? " →" : " >");
        int gap = picture.Width - yName.Length - xName.Length;
        return gap >= 2 ? yName + new string(' ', gap) + xName : yName + "; " + xName;
    }

    /// <summary>The exact values at the cursor, in words ("station 1: speed 4520 rpm, torque 1.234 N m").</summary>
    /// <param name="data">The chart.</param>
    /// <param name="cursor">A line index and a point index.</param>
    public static string Readout(ChartData data, (int Line, int Point) cursor)
    {
        ArgumentNullException.ThrowIfNull(data);
        if (CursorPoint(data, cursor) is not { } p)
        {
            return "";
        }
        var (xName, xUnit) = NameAndUnit(data.XLabel);
        var (yName, yUnit) = NameAndUnit(data.YLabel);
        return $"{data.Lines[cursor.Line].Name}: {xName} {Exact(p.X)}{xUnit}, {yName} {Exact(p.Y)}{yUnit}";
    }

    /// <summary>The finite point a cursor stands on, or null when the cursor is out of range.</summary>
    public static (double X, double Y)? CursorPoint(ChartData data, (int Line, int Point) cursor)
    {
        ArgumentNullException.ThrowIfNull(data);
        if (cursor.Line < 0 || cursor.Line >= data.Lines.Count)
        {
            return null;
        }
        var points = data.Lines[cursor.Line].Points.Where(Finite).ToList();
        return cursor.Point >= 0 && cursor.Point < points.Count ? points[cursor.Point] : null;
    }

    /// <summary>A value with five significant digits, for the readout.</summary>
    public static string Exact(double v) => v.ToString("G5", CultureInfo.InvariantCulture);

    internal static bool Finite((double X, double Y) p) => double.IsFinite(p.X) && double.IsFinite(p.Y);

    private static (string Name, string Unit) NameAndUnit(string label)
    {
        int comma = label.LastIndexOf(", ", StringComparison.Ordinal);
        return comma < 0 ? (label, "") : (label[..comma], " " + label[(comma + 2)..]);
    }

    private static (double XLo, double XHi, double XStep, double YLo, double YHi, double YStep) Ranges(ChartData data, List<(double X, double Y)> finite, int width, int height)
    {
        double xMin = finite.Min(p => p.X), xMax = finite.Max(p => p.X);
        double yMin = finite.Min(p => p.Y), yMax = finite.Max(p => p.Y);
        if (xMax <= xMin)
        {
            xMax = xMin + 1;
        }
        if (data.YFromZero)
        {
            yMin = Math.Min(0, yMin);
        }
        else
        {
            // Fitted to the data with a margin, so a sag of a few per cent fills the chart instead of a flat line at its top.
            double pad = Math.Max((yMax - yMin) * 0.15, Math.Max(Math.Abs(yMax), 1e-9) * 1e-3);
            yMin -= pad;
            yMax += pad;
        }
        if (yMax <= yMin)
        {
            yMax = yMin + 1;
        }
        // Round ends, so both ends of each axis carry a label that reads as a plain number.
        double xStep = ChartView.NiceStep((xMax - xMin) / Math.Max(1, (width - 8) / 12));
        double yStep = ChartView.NiceStep((yMax - yMin) / Math.Max(1, (height - FrameRows) / 3));
        double xLo = Math.Floor(xMin / xStep + 1e-9) * xStep, xHi = Math.Ceiling(xMax / xStep - 1e-9) * xStep;
        double yLo = Math.Floor(yMin / yStep + 1e-9) * yStep, yHi = Math.Ceiling(yMax / yStep - 1e-9) * yStep;
        if (yHi < yMax + (yMax - yMin) * 0.02)
        {
            yHi += yStep;
        }
        return (xLo, Math.Max(xHi, xLo + xStep), xStep, yLo, Math.Max(yHi, yLo + yStep), yStep);
    }

    private static List<double> Ticks(double lo, double hi, double step)
    {
        var ticks = new List<double>();
        for (int k = 0; lo + k * step <= hi + step * 1e-6 && k < 1000; k++)
        {
            // Rounded to the step's decimals so 0.30000000000000004 prints as 0.3.
            ticks.Add(Math.Round(lo + k * step, 12));
        }
        return ticks;
    }

    private static void WriteXTicks(ChartPicture picture, List<double> ticks, Func<double, int> column, int axisRow, bool unicode)
    {
        int labelRow = axisRow + 1;
        var placed = new List<(int From, int To)>();
        bool Free(int from, int to) => from >= 0 && to < picture.Width && placed.All(p => to < p.From - 1 || from > p.To + 1);
        // Both ends first, then the ticks between where they fit.
        var order = ticks.Count <= 2 ? ticks : [ticks[0], ticks[^1], .. ticks.Skip(1).Take(ticks.Count - 2)];
        foreach (double t in order)
        {
            int c = column(t);
            picture.Set(c, axisRow, unicode ? '┬' : '+', ChartPicture.Axis);
            string label = ChartView.Short(t);
            int from = Math.Clamp(c - label.Length / 2, 0, Math.Max(0, picture.Width - label.Length));
            if (Free(from, from + label.Length - 1))
            {
                picture.Write(from, labelRow, label, ChartPicture.Text);
                placed.Add((from, from + label.Length - 1));
            }
        }
    }

    private static void WriteLegend(ChartPicture picture, ChartData data, string caption)
    {
        int row = picture.Height - 1;
        int at = 0;
        void Put(string text, int owner)
        {
            picture.Write(at, row, text, owner);
            at += text.Length;
        }
        if (caption.Length > 0)
        {
            Put(caption + " ", ChartPicture.Text);
        }
        var lines = data.Lines;
        for (int i = 0; i < lines.Count; i++)
        {
            if (i > 0)
            {
                Put("  ", ChartPicture.Text);
            }
            int last = i;
            while (lines[i].Group is not null && last + 1 < lines.Count && lines[last + 1].Group == lines[i].Group)
            {
                last++;
            }
            Put(lines[i].Glyph.ToString(), i);
            if (last > i)
            {
                Put("..", ChartPicture.Text);
                Put(lines[last].Glyph.ToString(), last);
                Put(" " + lines[i].Group, ChartPicture.Text);
                i = last;
            }
            else
            {
                Put(" " + lines[i].Name, ChartPicture.Text);
            }
        }
    }

    private static ((double X, double Y) A, (double X, double Y) B)? Clip((double X, double Y) a, (double X, double Y) b, double xLo, double xHi, double yLo, double yHi)
    {
        // Liang-Barsky: the parameter interval of the segment inside the rectangle.
        double t0 = 0, t1 = 1, dx = b.X - a.X, dy = b.Y - a.Y;
        foreach (var (p, q) in new[] { (-dx, a.X - xLo), (dx, xHi - a.X), (-dy, a.Y - yLo), (dy, yHi - a.Y) })
        {
            if (p == 0)
            {
                if (q < 0)
                {
                    return null;
                }
                continue;
            }
            double r = q / p;
            if (p < 0)
            {
                t0 = Math.Max(t0, r);
            }
            else
            {
                t1 = Math.Min(t1, r);
            }
            if (t0 > t1)
            {
                return null;
            }
        }
        return ((a.X + t0 * dx, a.Y + t0 * dy), (a.X + t1 * dx, a.Y + t1 * dy));
    }

    private static void Bresenham(int x0, int y0, int x1, int y1, int line, Action<int, int, int> dot)
    {
        int dx = Math.Abs(x1 - x0), sx = x0 < x1 ? 1 : -1;
        int dy = -Math.Abs(y1 - y0), sy = y0 < y1 ? 1 : -1;
        int err = dx + dy;
        while (true)
        {
            dot(x0, y0, line);
            if (x0 == x1 && y0 == y1)
            {
                return;
            }
            int e2 = 2 * err;
            if (e2 >= dy)
            {
                err += dy;
                x0 += sx;
            }
            if (e2 <= dx)
            {
                err += dx;
                y0 += sy;
            }
        }
    }
}

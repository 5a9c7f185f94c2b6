using System.Globalization;
using System.Text;
using Terminal.Gui.Drawing;
using Terminal.Gui.Input;
using Terminal.Gui.ViewBase;
using Attribute = Terminal.Gui.Drawing.Attribute;
using Color = Terminal.Gui.Drawing.Color;

namespace RotorDrive.Tui.Charts;

/// <summary>A chart in the terminal, drawn by <see cref="ChartRenderer"/>: curves in braille dots (or plain characters
/// with <see cref="ChartStyle.Plain"/>), each series in its own colour and named in the legend on the last row, axes
/// labelled at both ends. With the focus, Left/Right (Home/End) move a readout cursor along a series and Up/Down choose
/// the series; the top row then prints the exact values there.</summary>
public sealed class ChartView : View
{
    // Series colours, chosen to stay apart on dark and light backgrounds; the glyph in the legend tells them apart too.
    private static readonly ColorName16[] Palette =
    [
        ColorName16.BrightGreen, ColorName16.BrightCyan, ColorName16.BrightYellow, ColorName16.BrightMagenta,
        ColorName16.BrightRed, ColorName16.BrightBlue, ColorName16.Green, ColorName16.Cyan, ColorName16.Yellow, ColorName16.Magenta,
    ];

    private ChartData? _data;
    private string _caption = "";
    private (int Line, int Point)? _cursor;
    private ChartPicture? _picture;

    /// <summary>Creates an empty chart in the style the environment asks for (<see cref="ChartStyle.FromEnvironment"/>).</summary>
    public ChartView()
    {
        CanFocus = true;
        Style = ChartStyle.FromEnvironment();
    }

    /// <summary>Braille or plain characters, colour or not.</summary>
    public ChartStyle Style { get; set; }

    /// <summary>The legend text.</summary>
    public string LegendText => _data is null ? "" : (_caption.Length > 0 ? _caption + " " : "") + Legend(_data);

    /// <summary>The chart on show.</summary>
    public ChartData? Chart => _data;

    /// <summary>The readout cursor (a line index and a point index), or null before a cursor key was pressed.</summary>
    public (int Line, int Point)? ReadoutCursor => _cursor;

    /// <summary>The exact values at the cursor ("" without a cursor).</summary>
    public string CursorReadout => _data is not null && _cursor is { } c ? ChartRenderer.Readout(_data, c) : "";

    /// <summary>The picture as last drawn (for tests), or one drawn now at the view's size.</summary>
    public ChartPicture? Picture => _data is null ? null : _picture ?? Render();

    /// <summary>Shows new data.</summary>
    public void Show(ChartData? data) => Show(data, "");

    /// <summary>Shows new data with a caption at the start of the legend line (e.g. the page number).</summary>
    public void Show(ChartData? data, string caption)
    {
        // The cursor stays on the same series and point index when the new data still has them (a recompute).
        if (_cursor is { } c && (data is null || ChartRenderer.CursorPoint(data, c) is null))
        {
            _cursor = null;
        }
        _data = data;
        _caption = caption ?? "";
        _picture = null;
        SetNeedsDraw();
    }

    /// <summary>The legend: each line's character and name.</summary>
    public static string Legend(ChartData data)
    {
        ArgumentNullException.ThrowIfNull(data);
        var sb = new StringBuilder();
        var lines = data.Lines;
        for (int i = 0; i < lines.Count; i++)
        {
            if (sb.Length > 0)
            {
                sb.Append("  ");
            }
            var line = lines[i];
            int last = i;
            while (line.Group is not null && last + 1 < lines.Count && lines[last + 1].Group == line.Group)
            {
                last++;
            }
            if (last > i)
            {
                sb.Append(line.Glyph).Append("..").Append(lines[last].Glyph).Append(' ').Append(line.Group);
                i = last;
            }
            else
            {
                sb.Append(line.Glyph).Append(' ').Append(line.Name);
            }
        }
        return sb.ToString();
    }

    /// <summary>Moves the readout cursor: <paramref name="points"/> along the series, <paramref name="lines"/> to another
    /// series with points (keeping the nearest x). Starts on the first series' first point.</summary>
    public void MoveCursor(int points, int lines)
    {
        if (_data is null)
        {
            return;
        }
        var withPoints = Enumerable.Range(0, _data.Lines.Count).Where(i => _data.Lines[i].Points.Any(ChartRenderer.Finite)).ToList();
        if (withPoints.Count == 0)
        {
            return;
        }
        if (_cursor is not { } c || ChartRenderer.CursorPoint(_data, c) is not { } at)
        {
            _cursor = (withPoints[0], 0);
        }
        else
        {
            int line = c.Line, point = c.Point;
            if (lines != 0)
            {
                int k = withPoints.IndexOf(line);
                line = withPoints[((k < 0 ? 0 : k) + lines % withPoints.Count + withPoints.Count) % withPoints.Count];
                var next = _data.Lines[line].Points.Where(ChartRenderer.Finite).ToList();
                point = next.Select((p, i) => (Distance: Math.Abs(p.X - at.X), i)).MinBy(t => t.Distance).i;
            }
            int count = _data.Lines[line].Points.Count(ChartRenderer.Finite);
            _cursor = (line, Math.Clamp(point + points, 0, count - 1));
        }
        _picture = null;
        SetNeedsDraw();
    }

    /// <inheritdoc/>
    protected override bool OnKeyDown(Key key)
    {
        if (key == Key.CursorLeft || key == Key.CursorRight)
        {
            MoveCursor(key == Key.CursorLeft ? -1 : 1, 0);
            return true;
        }
        if (key == Key.CursorLeft.WithShift || key == Key.CursorRight.WithShift)
        {
            MoveCursor(key == Key.CursorLeft.WithShift ? -10 : 10, 0);
            return true;
        }
        if (key == Key.Home || key == Key.End)
        {
            MoveCursor(key == Key.Home ? -100_000 : 100_000, 0);
            return true;
        }
        if ((key == Key.CursorUp || key == Key.CursorDown) && _cursor is not null)
        {
            MoveCursor(0, key == Key.CursorUp ? -1 : 1);
            return true;
        }
        return base.OnKeyDown(key);
    }

    /// <inheritdoc/>
    protected override bool OnDrawingContent(DrawContext? context)
    {
        var normal = GetAttributeForRole(VisualRole.Normal);
        SetAttribute(normal);
        ClearViewport();
        if (_data is null)
        {
            return true;
        }
        var picture = _picture = Render();
        for (int r = 0; r < picture.Height; r++)
        {
            for (int c = 0; c < picture.Width; c++)
            {
                int owner = picture.OwnerAt(c, r);
                SetAttribute(AttributeFor(owner, normal));
                AddRune(c, r, new Rune(picture.CharAt(c, r)));
            }
        }
        SetAttribute(normal);
        return true;
    }

    /// <summary>The round tick step (1, 2 or 5 times a power of ten) nearest above a wanted step, so axis labels read 0, 2,
    /// 4 rather than 0, 1.7, 3.4.</summary>
    /// <param name="wanted">The step the chart's size asks for, &gt; 0.</param>
    public static double NiceStep(double wanted)
    {
        if (!(wanted > 0) || !double.IsFinite(wanted))
        {
            return 1;
        }
        double decade = Math.Pow(10, Math.Floor(Math.Log10(wanted)));
        double mantissa = wanted / decade;
        double nice = mantissa <= 1 + 1e-9 ? 1 : mantissa <= 2 + 1e-9 ? 2 : mantissa <= 5 + 1e-9 ? 5 : 10;
        return nice * decade;
    }

    /// <summary>A number in at most 6 characters for an axis label.</summary>
    public static string Short(double v)
    {
        double a = Math.Abs(v);
        string s = a >= 10000 ? (v / 1000).ToString("0.#", CultureInfo.InvariantCulture) + "k"
            : a >= 100 ? v.ToString("0", CultureInfo.InvariantCulture)
            : a >= 1 ? v.ToString("0.#", CultureInfo.InvariantCulture)
            : a == 0 ? "0"
            : v.ToString("0.###", CultureInfo.InvariantCulture);
        return s;
    }

    private ChartPicture Render()
    {
        int width = Viewport.Width > 0 ? Viewport.Width : 60;
        int height = Viewport.Height > 0 ? Viewport.Height : 16;
        return ChartRenderer.Render(_data!, width, height, Style, _cursor, _caption);
    }

    private Attribute AttributeFor(int owner, Attribute normal)
    {
        if (!Style.Colour || owner == ChartPicture.Blank || owner == ChartPicture.Text)
        {
            return normal;
        }
        if (owner == ChartPicture.Axis)
        {
            return new Attribute(new Color(ColorName16.Gray), normal.Background);
        }
        if (owner == ChartPicture.Cursor)
        {
            return new Attribute(new Color(ColorName16.White), new Color(ColorName16.Red));
        }
        return new Attribute(new Color(Palette[owner % Palette.Length]), normal.Background);
    }
}

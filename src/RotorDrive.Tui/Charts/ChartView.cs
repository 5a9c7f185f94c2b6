using System.Drawing;
using System.Globalization;
using System.Text;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;

namespace RotorDrive.Tui.Charts;

/// <summary>A chart in the terminal: curves drawn as lines of their own character (GraphView path annotations), marks
/// as scatter points, axes scaled to the data, and a legend line in words under it.</summary>
public sealed class ChartView : View
{
    private readonly GraphView _graph;
    private readonly Label _legend;
    private ChartData? _data;
    private string _caption = "";

    /// <summary>Creates an empty chart.</summary>
    public ChartView()
    {
        _graph = new GraphView { X = 0, Y = 0, Width = Dim.Fill(), Height = Dim.Fill(1) };
        _legend = new Label { X = 0, Y = Pos.AnchorEnd(1), Width = Dim.Fill(), Height = 1, Text = "" };
        Add(_graph, _legend);
        FrameChanged += (_, _) => Layout(_data);
    }

    /// <summary>The legend text.</summary>
    public string LegendText => _legend.Text;

    /// <summary>The chart on show.</summary>
    public ChartData? Chart => _data;

    /// <summary>Shows new data.</summary>
    public void Show(ChartData? data) => Show(data, "");

    /// <summary>Shows new data with a caption at the start of the legend line (e.g. the page number).</summary>
    public void Show(ChartData? data, string caption)
    {
        _data = data;
        _caption = caption ?? "";
        Layout(data);
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

    private void Layout(ChartData? data)
    {
        _graph.Reset();
        _graph.Series.Clear();
        _graph.Annotations.Clear();
        if (data is null)
        {
            _legend.Text = "";
            SetNeedsDraw();
            return;
        }
        _legend.Text = _caption.Length > 0 ? _caption + " " + Legend(data) : Legend(data);
        var finite = data.Lines.SelectMany(l => l.Points).Where(p => double.IsFinite(p.X) && double.IsFinite(p.Y)).ToList();
        if (finite.Count == 0)
        {
            SetNeedsDraw();
            return;
        }
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
        yMax += (yMax - yMin) * 0.05;

        const int marginLeft = 8;
        const int marginBottom = 2;
        // Three columns stay free on the right so the last tick's label is not cut off.
        int width = Math.Max(10, (_graph.Viewport.Width > 0 ? _graph.Viewport.Width : 60) - marginLeft - 4);
        int height = Math.Max(4, (_graph.Viewport.Height > 0 ? _graph.Viewport.Height : 14) - marginBottom - 1);
        _graph.MarginLeft = marginLeft;
        _graph.MarginBottom = marginBottom;
        _graph.CellSize = new PointF((float)((xMax - xMin) / width), (float)((yMax - yMin) / height));
        _graph.ScrollOffset = new PointF((float)xMin, (float)yMin);
        double xStep = NiceStep((xMax - xMin) / width * 10);
        double yStep = NiceStep((yMax - yMin) / height * 2);
        _graph.AxisX.Increment = (float)xStep;
        _graph.AxisX.ShowLabelsEvery = 1;
        _graph.AxisX.Minimum = (float)(Math.Ceiling(xMin / xStep - 1e-9) * xStep);
        _graph.AxisX.Text = data.XLabel;
        _graph.AxisX.LabelGetter = v => Short(v.Value);
        _graph.AxisY.Increment = (float)yStep;
        _graph.AxisY.ShowLabelsEvery = 1;
        _graph.AxisY.Minimum = (float)(Math.Ceiling(yMin / yStep - 1e-9) * yStep);
        _graph.AxisY.Text = data.YLabel;
        _graph.AxisY.LabelGetter = v => Short(v.Value);

        foreach (var line in data.Lines)
        {
            var points = line.Points.Where(p => double.IsFinite(p.X) && double.IsFinite(p.Y)).Select(p => new PointF((float)p.X, (float)p.Y)).ToList();
            if (points.Count == 0)
            {
                continue;
            }
            if (line.Joined && points.Count > 1)
            {
                var path = new PathAnnotation { LineRune = new Rune(line.Glyph), BeforeSeries = true };
                path.Points.AddRange(points);
                _graph.Annotations.Add(path);
            }
            else
            {
                _graph.Series.Add(new ScatterSeries { Points = points, Fill = new GraphCellToRender(new Rune(line.Glyph)) });
            }
        }
        SetNeedsDraw();
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
}

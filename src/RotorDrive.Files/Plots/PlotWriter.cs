using ScottPlot;
using ScottPlot.Plottables;
using SkiaSharp;

namespace RotorDrive.Files.Plots;

/// <summary>Draws a <see cref="PlotFigure"/> with ScottPlot and writes it as SVG or PNG (the extension chooses),
/// atomically and never over an existing file unless asked.</summary>
public static class PlotWriter
{
    /// <summary>Width of every figure, pixels.</summary>
    public const int WidthPx = 960;

    /// <summary>Height of a single-panel figure, pixels; each further panel adds <see cref="PanelHeightPx"/>.</summary>
    public const int SingleHeightPx = 600;

    /// <summary>Height of each panel of a figure with several, pixels.</summary>
    public const int PanelHeightPx = 340;

    private static readonly Lock RenderGate = new();

    /// <summary>The format a file name asks for: .svg or .png (any case); null for any other extension.</summary>
    /// <param name="path">The file name.</param>
    public static PlotFormat? FormatOf(string path)
    {
        ArgumentNullException.ThrowIfNull(path);
        return Path.GetExtension(path).ToLowerInvariant() switch
        {
            ".svg" => PlotFormat.Svg,
            ".png" => PlotFormat.Png,
            _ => null,
        };
    }

    /// <summary>The figure's height in pixels for its number of panels.</summary>
    /// <param name="figure">The figure.</param>
    public static int HeightOf(PlotFigure figure)
    {
        ArgumentNullException.ThrowIfNull(figure);
        return figure.Panels.Count <= 1 ? SingleHeightPx : PanelHeightPx * figure.Panels.Count;
    }

    /// <summary>Writes the figure to a file, SVG or PNG by the file's extension.</summary>
    /// <param name="figure">The figure.</param>
    /// <param name="path">Destination; its extension must be .svg or .png.</param>
    /// <param name="overwrite">False refuses to replace an existing file.</param>
    /// <returns>Null on success; otherwise the problem (nothing was written).</returns>
    public static InputProblem? Write(PlotFigure figure, string path, bool overwrite)
    {
        ArgumentNullException.ThrowIfNull(figure);
        ArgumentNullException.ThrowIfNull(path);
        return FormatOf(path) switch
        {
            PlotFormat.Svg => AtomicFile.WriteAllText(path, Svg(figure), overwrite),
            PlotFormat.Png => AtomicFile.WriteAllBytes(path, Png(figure), overwrite),
            _ => new InputProblem(path, 0, 0, "", Messages.PlotExtension()),
        };
    }

    /// <summary>The figure as an SVG document (text as text, in the embedded DejaVu Sans).</summary>
    /// <param name="figure">The figure.</param>
    public static string Svg(PlotFigure figure)
    {
        ArgumentNullException.ThrowIfNull(figure);
        int height = HeightOf(figure);
        using var stream = new MemoryStream();
        lock (RenderGate)
        {
            var multiplot = Build(figure);
            using (var canvas = SKSvgCanvas.Create(new SKRect(0, 0, WidthPx, height), stream))
            {
                multiplot.Render(canvas, new PixelRect(0, WidthPx, height, 0));
            }
        }
        return System.Text.Encoding.UTF8.GetString(stream.ToArray());
    }

    /// <summary>The figure as a PNG image (<see cref="WidthPx"/> wide, <see cref="HeightOf"/> high).</summary>
    /// <param name="figure">The figure.</param>
    public static byte[] Png(PlotFigure figure)
    {
        ArgumentNullException.ThrowIfNull(figure);
        int height = HeightOf(figure);
        lock (RenderGate)
        {
            var multiplot = Build(figure);
            using var surface = SKSurface.Create(new SKImageInfo(WidthPx, height))
                ?? throw new InvalidOperationException($"Could not create a {WidthPx} x {height} drawing surface.");
            multiplot.Render(surface);
            using var image = surface.Snapshot();
            using var data = image.Encode(SKEncodedImageFormat.Png, 100);
            return data.ToArray();
        }
    }

    // ScottPlot's font list is process-wide, so figures are built and drawn one at a time.
    private static Multiplot Build(PlotFigure figure)
    {
        EmbeddedFont.EnsureRegistered();
        var plots = new List<Plot>();
        for (int i = 0; i < figure.Panels.Count; i++)
        {
            var panel = figure.Panels[i];
            var plot = new Plot();
            string title = i == 0 ? $"{figure.Title}: {panel.Title}" : panel.Title;
            if (i == 0 && string.IsNullOrEmpty(panel.Title))
            {
                title = figure.Title;
            }
            plot.Title(title);
            plot.XLabel(panel.XLabel);
            plot.YLabel(panel.YLabel);
            foreach (var series in panel.Series)
            {
                Add(plot, series);
            }
            plot.Axes.AutoScale();
            if (panel.YFromZero)
            {
                var limits = plot.Axes.GetLimits();
                if (limits.Bottom > 0)
                {
                    plot.Axes.SetLimitsY(0, limits.Top);
                }
            }
            if (panel.Series.Count > 0)
            {
                plot.ShowLegend(Alignment.UpperRight);
            }
            if (i == figure.Panels.Count - 1)
            {
                var stamp = plot.Add.Annotation(figure.Stamp, Alignment.LowerRight);
                stamp.LabelFontSize = 11;
                stamp.LabelFontName = EmbeddedFont.Family;
            }
            plot.Font.Set(EmbeddedFont.Family);
            // ScottPlot draws a plot twice on its first render when the layout settles; a render in memory at the panel's
            // size first keeps the SVG to one copy of every element.
            plot.RenderInMemory(WidthPx, figure.Panels.Count <= 1 ? SingleHeightPx : PanelHeightPx);
            plots.Add(plot);
        }
        // A new Multiplot holds one empty plot of its own; start it from the first panel instead.
        var multiplot = new Multiplot(plots.Count > 0 ? plots[0] : new Plot());
        foreach (var plot in plots.Skip(1))
        {
            multiplot.AddPlot(plot);
        }
        return multiplot;
    }

    private static void Add(Plot plot, PlotSeries series)
    {
        var (xs, ys) = Finite(series);
        switch (series.Kind)
        {
            case PlotSeriesKind.Line:
            {
                var line = plot.Add.ScatterLine(xs, ys);
                line.LegendText = series.Name;
                line.LineWidth = 2;
                if (series.Dashed)
                {
                    line.LinePattern = LinePattern.Dashed;
                }
                break;
            }
            case PlotSeriesKind.Marks:
            {
                var marks = plot.Add.ScatterPoints(xs, ys);
                marks.LegendText = series.Name;
                marks.MarkerSize = 11;
                marks.MarkerShape = series.Hollow ? MarkerShape.OpenCircle : MarkerShape.FilledCircle;
                break;
            }
            case PlotSeriesKind.Level:
            {
                var level = plot.Add.HorizontalLine(series.Y[0]);
                level.LegendText = series.Name;
                level.LinePattern = LinePattern.Dashed;
                level.LineWidth = 1.5f;
                break;
            }
            case PlotSeriesKind.Threshold:
            {
                var threshold = plot.Add.VerticalLine(series.X[0]);
                threshold.LegendText = series.Name;
                threshold.LinePattern = LinePattern.Dashed;
                threshold.LineWidth = 1.5f;
                break;
            }
            case PlotSeriesKind.Bars:
            {
                double width = xs.Length > 1 ? xs[1] - xs[0] : 1;
                var bars = plot.Add.Bars(xs, ys);
                bars.LegendText = series.Name;
                foreach (var bar in bars.Bars)
                {
                    bar.Size = width;
                    bar.LineWidth = 0;
                }
                break;
            }
            default:
                throw new ArgumentOutOfRangeException(nameof(series), series.Kind, "Unknown series kind.");
        }
    }

    // Non-finite points are left out (never drawn as zeros); an empty series keeps its legend entry.
    private static (double[] X, double[] Y) Finite(PlotSeries series)
    {
        int n = Math.Min(series.X.Count, series.Y.Count);
        var xs = new List<double>(n);
        var ys = new List<double>(n);
        for (int i = 0; i < n; i++)
        {
            if (double.IsFinite(series.X[i]) && double.IsFinite(series.Y[i]))
            {
                xs.Add(series.X[i]);
                ys.Add(series.Y[i]);
            }
        }
        return (xs.ToArray(), ys.ToArray());
    }
}

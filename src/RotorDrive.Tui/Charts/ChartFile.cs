using RotorDrive.Files.Plots;
using RotorDrive.Tui.Shell;

namespace RotorDrive.Tui.Charts;

/// <summary>Writes a sheet's chart pages to an SVG or PNG file (F6), from the same <see cref="ChartData"/> the terminal
/// chart draws, through the plot writer the command line's <c>--plot</c> uses.</summary>
public static class ChartFile
{
    /// <summary>The figure for a sheet's chart pages: one panel per page, the sheet's name as the title.</summary>
    /// <param name="pages">The chart pages.</param>
    /// <param name="title">The figure's title (the sheet's name).</param>
    /// <param name="rigName">The rig's name, for the stamp.</param>
    /// <param name="date">The date for the stamp.</param>
    public static PlotFigure ToFigure(IReadOnlyList<ChartData> pages, string title, string rigName, DateOnly date)
    {
        ArgumentNullException.ThrowIfNull(pages);
        var panels = pages.Select(p => new PlotPanel(
            p.YLabel,
            p.XLabel,
            p.YLabel,
            p.Lines.Select(l => new PlotSeries(
                l.Name,
                l.Joined ? PlotSeriesKind.Line : PlotSeriesKind.Marks,
                l.Points.Select(q => q.X).ToArray(),
                l.Points.Select(q => q.Y).ToArray())).ToList(),
            p.YFromZero)).ToList();
        return new PlotFigure(title, rigName, date, panels);
    }

    /// <summary>Asks for a file name and writes the chart pages to it (asking before replacing a file); tells the user
    /// the outcome on the status line.</summary>
    /// <param name="context">The workbench context (prompts, files, clock, status line).</param>
    /// <param name="pages">The chart pages shown.</param>
    /// <param name="sheetName">The sheet's name (the title and the suggested file name).</param>
    /// <returns>The path written, or null when nothing was written.</returns>
    public static string? Export(WorkbenchContext context, IReadOnlyList<ChartData> pages, string sheetName)
    {
        ArgumentNullException.ThrowIfNull(context);
        ArgumentNullException.ThrowIfNull(pages);
        if (pages.Count == 0)
        {
            context.Tell("No chart to write yet.");
            return null;
        }
        string folder = context.Session.RigPath is { } rigPath ? Path.GetDirectoryName(context.Files.FullPath(rigPath)) ?? "." : ".";
        string slug = new string(sheetName.ToLowerInvariant().Select(c => char.IsLetterOrDigit(c) ? c : '-').ToArray()).Trim('-');
        string? path = context.Prompts.AskPath("Write the chart to a file (.svg or .png)", Path.Combine(folder, slug + ".svg"));
        if (string.IsNullOrWhiteSpace(path))
        {
            return null;
        }
        var format = PlotWriter.FormatOf(path);
        if (format is null)
        {
            context.Tell($"! {path}: {Files.Messages.PlotExtension()}");
            return null;
        }
        bool exists = context.Files.Exists(path);
        if (exists && context.Prompts.Ask("Replace file", $"{path} exists. Replace it?", ["Keep it", "Replace"]) != 1)
        {
            context.Tell("Chart not written.");
            return null;
        }
        var figure = ToFigure(pages, sheetName, context.Session.DisplayName, DateOnly.FromDateTime(context.Clock.Now.DateTime));
        string? failure = format == PlotFormat.Svg
            ? context.Files.WriteAllTextAtomic(path, PlotWriter.Svg(figure))
            : PlotWriter.Write(figure, path, overwrite: exists)?.Message;
        context.Tell(failure is null ? $"Chart written to {path}." : $"! Chart not written: {failure}");
        return failure is null ? path : null;
    }
}

namespace RotorDrive.Files.Plots;

/// <summary>One named series of a plot panel; it gets a legend entry.</summary>
/// <param name="Name">The legend text.</param>
/// <param name="Kind">How it is drawn.</param>
/// <param name="X">Abscissae in the panel's units (non-finite points are left out).</param>
/// <param name="Y">Ordinates in the panel's units, as many as <paramref name="X"/>.</param>
/// <param name="Hollow">For marks: drawn as open circles (an unstable point) instead of filled ones.</param>
/// <param name="Dashed">For lines and levels: drawn dashed (limits).</param>
public sealed record PlotSeries(string Name, PlotSeriesKind Kind, IReadOnlyList<double> X, IReadOnlyList<double> Y, bool Hollow = false, bool Dashed = false)
{
    /// <summary>A curve through (x, y).</summary>
    public static PlotSeries Line(string name, IReadOnlyList<double> x, IReadOnlyList<double> y) => new(name, PlotSeriesKind.Line, x, y);

    /// <summary>Marks at (x, y).</summary>
    public static PlotSeries Marks(string name, IReadOnlyList<double> x, IReadOnlyList<double> y, bool hollow = false)
        => new(name, PlotSeriesKind.Marks, x, y, Hollow: hollow);

    /// <summary>A dashed horizontal line at <paramref name="y"/> (a limit).</summary>
    public static PlotSeries Level(string name, double y) => new(name, PlotSeriesKind.Level, [0.0], [y], Dashed: true);

    /// <summary>A dashed vertical line at <paramref name="x"/> (a limit on the abscissa).</summary>
    public static PlotSeries Threshold(string name, double x) => new(name, PlotSeriesKind.Threshold, [x], [0.0], Dashed: true);
}

using RotorDrive.Core.Studies.Stress;

namespace RotorDrive.Files.Plots;

/// <summary>The <c>stress</c> figure: a histogram of the samples' margin per criterion, with the limit (margin 0) line;
/// samples left of it fail.</summary>
public static class StressPlot
{
    /// <summary>Bins of each histogram.</summary>
    public const int Bins = 30;

    /// <summary>Builds the figure; criteria no sample has a margin for are left out.</summary>
    /// <param name="result">The stress study.</param>
    /// <param name="rigName">The rig's name, for the stamp.</param>
    /// <param name="date">The date for the stamp.</param>
    public static PlotFigure Build(StressResult result, string rigName, DateOnly date)
    {
        ArgumentNullException.ThrowIfNull(result);
        var panels = new List<PlotPanel>();
        foreach (var criterion in StressCriteria.All)
        {
            var margins = result.SampleResults
                .Select(s => s.Outcome.Margins[(int)criterion])
                .Where(m => m is { } v && double.IsFinite(v))
                .Select(m => m!.Value)
                .ToArray();
            if (margins.Length == 0)
            {
                continue;
            }
            var (centres, counts) = Histogram(margins, Bins);
            int failed = margins.Count(m => m < 0);
            panels.Add(new PlotPanel(
                $"{criterion.Key()}: {criterion.Describe()} ({failed} of {margins.Length} below 0)",
                "margin (0 at the limit, negative fails)", "samples",
                [
                    new PlotSeries("samples", PlotSeriesKind.Bars, centres, counts),
                    PlotSeries.Threshold("limit (margin 0)", 0),
                ]));
        }
        return new PlotFigure($"Tolerance stress test, {result.Samples} samples, seed {result.Seed}", rigName, date, panels);
    }

    // Equal-width bins with an edge at 0, so no bar mixes passing and failing samples (one bin around a single value).
    internal static (double[] Centres, double[] Counts) Histogram(IReadOnlyList<double> values, int bins)
    {
        double lo = values.Min(), hi = values.Max();
        if (!(hi > lo))
        {
            return ([lo], [values.Count]);
        }
        double width = (hi - lo) / bins;
        double start = Math.Floor(lo / width) * width;
        int n = (int)Math.Floor((hi - start) / width) + 1;
        var counts = new double[n];
        foreach (double v in values)
        {
            counts[Math.Clamp((int)Math.Floor((v - start) / width), 0, n - 1)]++;
        }
        var centres = Enumerable.Range(0, n).Select(i => start + (i + 0.5) * width).ToArray();
        return (centres, counts);
    }
}

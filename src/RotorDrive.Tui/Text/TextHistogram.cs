using System.Globalization;

namespace RotorDrive.Tui.Text;

/// <summary>A histogram drawn with text: one line per bin, "low - high |#### count", bars scaled to the fullest bin.</summary>
public static class TextHistogram
{
    /// <summary>Largest number of bins.</summary>
    public const int MaxBins = 20;

    /// <summary>Longest bar, in characters (wider screens do not stretch the bars beyond easy reading).</summary>
    public const int MaxBar = 50;

    /// <summary>The number of bins for n values by Sturges' rule, ceil(log2 n) + 1 (H. A. Sturges, "The choice of a
    /// class interval", J. Am. Stat. Assoc. 21, 1926), at most <see cref="MaxBins"/>.</summary>
    public static int SturgesBins(int count)
        => count <= 1 ? 1 : Math.Min(MaxBins, (int)Math.Ceiling(Math.Log2(count)) + 1);

    /// <summary>Sorts finite values into equal-width bins between their smallest and largest value (non-finite values are
    /// left out); empty when there is no finite value, one bin when all are equal.</summary>
    /// <param name="values">The values.</param>
    /// <param name="bins">Number of bins, or null for <see cref="SturgesBins"/>.</param>
    public static IReadOnlyList<HistogramBin> Bins(IEnumerable<double> values, int? bins = null)
    {
        ArgumentNullException.ThrowIfNull(values);
        var finite = values.Where(double.IsFinite).ToArray();
        if (finite.Length == 0)
        {
            return [];
        }
        double min = finite.Min(), max = finite.Max();
        if (max <= min)
        {
            return [new HistogramBin(min, max, finite.Length)];
        }
        int k = Math.Max(1, bins ?? SturgesBins(finite.Length));
        double width = (max - min) / k;
        var counts = new int[k];
        foreach (double v in finite)
        {
            counts[Math.Min(k - 1, (int)((v - min) / width))]++;
        }
        return Enumerable.Range(0, k).Select(i => new HistogramBin(min + i * width, i == k - 1 ? max : min + (i + 1) * width, counts[i])).ToArray();
    }

    /// <summary>The bins as lines of at most <paramref name="width"/> characters.</summary>
    /// <param name="bins">The bins.</param>
    /// <param name="width">Line width, at least 30.</param>
    /// <param name="decimals">Decimals of the bin edges.</param>
    public static IReadOnlyList<string> Render(IReadOnlyList<HistogramBin> bins, int width, int decimals)
    {
        ArgumentNullException.ThrowIfNull(bins);
        if (bins.Count == 0)
        {
            return [];
        }
        string format = "F" + Math.Clamp(decimals, 0, 6).ToString(CultureInfo.InvariantCulture);
        var edges = bins.Select(b => (Low: b.Low.ToString(format, CultureInfo.InvariantCulture), High: b.High.ToString(format, CultureInfo.InvariantCulture))).ToList();
        int lowWidth = edges.Max(e => e.Low.Length), highWidth = edges.Max(e => e.High.Length);
        int countWidth = bins.Max(b => b.Count).ToString(CultureInfo.InvariantCulture).Length;
        int barWidth = Math.Clamp(Math.Max(30, width) - (2 + lowWidth + 3 + highWidth + 2 + 1 + countWidth), 5, MaxBar);
        int most = Math.Max(1, bins.Max(b => b.Count));
        var lines = new List<string>(bins.Count);
        for (int i = 0; i < bins.Count; i++)
        {
            int count = bins[i].Count;
            // A bin with any value shows at least one mark, so it is never mistaken for an empty one.
            int length = count == 0 ? 0 : Math.Max(1, (int)Math.Round((double)count / most * barWidth));
            lines.Add($"  {edges[i].Low.PadLeft(lowWidth)} - {edges[i].High.PadLeft(highWidth)} |{new string('#', length).PadRight(barWidth)} {count.ToString(CultureInfo.InvariantCulture).PadLeft(countWidth)}");
        }
        return lines;
    }
}

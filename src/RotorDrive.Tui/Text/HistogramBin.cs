namespace RotorDrive.Tui.Text;

/// <summary>One bin of a histogram: values from <paramref name="Low"/> up to <paramref name="High"/> (the last bin
/// includes its upper edge).</summary>
/// <param name="Low">Lower edge, in the values' unit.</param>
/// <param name="High">Upper edge, in the values' unit.</param>
/// <param name="Count">Values in the bin.</param>
public sealed record HistogramBin(double Low, double High, int Count);

namespace RotorDrive.Core.Studies;

/// <summary>Summary of a sampled figure: count, extremes, mean and the 5th, 50th and 95th percentiles
/// (Hyndman and Fan 1996, definition 7; see <see cref="Percentiles"/>), in the figure's own unit.</summary>
/// <param name="Count">Number of values.</param>
/// <param name="Min">Smallest value.</param>
/// <param name="P5">5th percentile.</param>
/// <param name="P50">Median.</param>
/// <param name="P95">95th percentile.</param>
/// <param name="Max">Largest value.</param>
/// <param name="Mean">Arithmetic mean.</param>
public sealed record PercentileSummary(int Count, double Min, double P5, double P50, double P95, double Max, double Mean);

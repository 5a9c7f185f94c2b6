namespace RotorDrive.Core.Numerics;

/// <summary>Summary of a sampled figure: count, extremes, mean and the 5th, 50th and 95th percentiles
/// (Hyndman and Fan 1996, definition 7; see <see cref="Percentiles"/>), in the figure's own SI unit (hence the Si suffix: m, N, s, ... or a fraction).</summary>
/// <param name="Count">Number of values.</param>
/// <param name="MinSi">Smallest value.</param>
/// <param name="P5Si">5th percentile.</param>
/// <param name="P50Si">Median.</param>
/// <param name="P95Si">95th percentile.</param>
/// <param name="MaxSi">Largest value.</param>
/// <param name="MeanSi">Arithmetic mean.</param>
public sealed record PercentileSummary(int Count, double MinSi, double P5Si, double P50Si, double P95Si, double MaxSi, double MeanSi);

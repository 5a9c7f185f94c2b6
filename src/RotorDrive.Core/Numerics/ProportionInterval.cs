namespace RotorDrive.Core.Numerics;

/// <summary>An observed proportion (failures out of samples) with its two-sided confidence interval.</summary>
/// <param name="Count">Number of samples with the outcome (for example failures), 0 to <paramref name="Trials"/>.</param>
/// <param name="Trials">Number of samples, at least 1.</param>
/// <param name="EstimateFraction">Observed proportion Count / Trials, 0..1.</param>
/// <param name="LowerFraction">Lower confidence limit, 0..1.</param>
/// <param name="UpperFraction">Upper confidence limit, 0..1.</param>
/// <param name="ConfidenceLevelFraction">Two-sided confidence level, for example 0.95.</param>
public sealed record ProportionInterval(int Count, int Trials, double EstimateFraction, double LowerFraction, double UpperFraction, double ConfidenceLevelFraction);

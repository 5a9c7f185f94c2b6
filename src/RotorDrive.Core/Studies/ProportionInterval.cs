namespace RotorDrive.Core.Studies;

/// <summary>An observed proportion (failures out of samples) with its two-sided confidence interval.</summary>
/// <param name="Count">Number of samples with the outcome (for example failures), 0 to <paramref name="Trials"/>.</param>
/// <param name="Trials">Number of samples, at least 1.</param>
/// <param name="Estimate">Observed proportion Count / Trials, 0..1.</param>
/// <param name="Lower">Lower confidence limit, 0..1.</param>
/// <param name="Upper">Upper confidence limit, 0..1.</param>
/// <param name="ConfidenceLevel">Two-sided confidence level, for example 0.95.</param>
public sealed record ProportionInterval(int Count, int Trials, double Estimate, double Lower, double Upper, double ConfidenceLevel);

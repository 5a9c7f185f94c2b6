using RotorDrive.Core.Numerics;

namespace RotorDrive.Core.Studies.Stress;

/// <summary>How strongly one drawn input drives one criterion's margin: Spearman's rank correlation over the samples.</summary>
/// <param name="Input">The input's name, e.g. "controller_current_limit[3]".</param>
/// <param name="Criterion">The criterion whose margin is correlated.</param>
/// <param name="Rho">Spearman's rho, -1..1 (<see cref="RankCorrelation.Spearman"/>); positive when a larger input value
/// gives a larger (safer) margin.</param>
public sealed record StressDriver(string Input, StressCriterion Criterion, double Rho)
{
    /// <summary>The criterion's key.</summary>
    public string Margin => Criterion.Key();
}

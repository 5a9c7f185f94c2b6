using RotorDrive.Core.Numerics;

namespace RotorDrive.Core.Studies.Stress;

/// <summary>How often one criterion failed in a study, with its 95 % Wilson score interval.</summary>
/// <param name="Criterion">The criterion.</param>
/// <param name="Rate">Failures out of the samples evaluated, with the interval (<see cref="WilsonInterval"/>).</param>
public sealed record StressCriterionRate(StressCriterion Criterion, ProportionInterval Rate)
{
    /// <summary>The criterion's stable key.</summary>
    public string Key => Criterion.Key();

    /// <summary>What failing it means.</summary>
    public string Description => Criterion.Describe();
}

using RotorDrive.Core.Numerics;

namespace RotorDrive.Core.Studies.Stress;

/// <summary>The result of a stress study: failure rates with intervals, percentiles, drivers, the worst sample and every
/// sample's row.</summary>
/// <param name="Samples">Samples evaluated (fewer than requested when the run was cancelled).</param>
/// <param name="RequestedSamples">Samples asked for.</param>
/// <param name="Seed">The study's seed.</param>
/// <param name="Partial">True when the run was cancelled before every sample was evaluated; the figures then cover the
/// evaluated samples only.</param>
/// <param name="FailureRate">Samples failing any criterion, with the 95 % Wilson interval; null when no sample ran.</param>
/// <param name="Criteria">Failure rate per criterion, in <see cref="StressCriteria.All"/> order (empty when no sample ran).</param>
/// <param name="Percentiles">Spread of hover speed, hover current, hover pack voltage, lift-off time and yaw residual.</param>
/// <param name="Drivers">Rank correlation of every varied input with every criterion's margin, largest |rho| first.</param>
/// <param name="WorstSample">Index of the sample with the smallest minimum margin (ties: lowest index), or null.</param>
/// <param name="Inputs">The varied inputs (the drivers' candidates), in draw order.</param>
/// <param name="SampleResults">Every evaluated sample, in index order.</param>
public sealed record StressResult(
    int Samples,
    int RequestedSamples,
    int Seed,
    bool Partial,
    ProportionInterval? FailureRate,
    IReadOnlyList<StressCriterionRate> Criteria,
    IReadOnlyList<StressFigure> Percentiles,
    IReadOnlyList<StressDriver> Drivers,
    int? WorstSample,
    IReadOnlyList<StressInput> Inputs,
    IReadOnlyList<StressSample> SampleResults)
{
    /// <summary>True when the drivers have not been computed yet (a stopped run asked to return at once; see
    /// <see cref="StressStudyOptions.DriversWhenStopped"/>): <see cref="Drivers"/> is then empty, and
    /// <see cref="StressStudy.CompleteDrivers"/> gives the result with them.</summary>
    public bool DriversPending { get; init; }

    /// <summary>The accepted overall failure rate when none is given, %: 1 % (common practice, no source).</summary>
    public const double DefaultAcceptedFailurePct = 1.0;

    /// <summary>The stress test's verdict: true only when the study shows, at 95 % confidence, that the overall failure
    /// rate is below the accepted level (the upper end of <see cref="FailureRate"/>'s Wilson interval is below it); false
    /// when no sample ran.</summary>
    /// <param name="acceptedFailurePct">The accepted overall failure rate, %.</param>
    public bool PassesAt(double acceptedFailurePct) => FailureRate is { } f && f.UpperFraction < acceptedFailurePct / 100.0;
}

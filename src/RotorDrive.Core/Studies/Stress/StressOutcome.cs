namespace RotorDrive.Core.Studies.Stress;

/// <summary>What one stress sample showed: a margin per criterion (pass when at least 0) and the figures reported
/// as percentiles.</summary>
/// <param name="Margins">Relative margin per criterion in <see cref="StressCriteria.All"/> order, dimensionless: 0 at the
/// limit, negative when failed; null when the criterion could not be assessed (for example a rotor without retainer data),
/// which counts as passed.</param>
/// <param name="LiftoffTimeS">Time to lift-off, s, or null when the craft did not lift off within the time limit.</param>
/// <param name="StalledStations">Indices of stations whose motor cannot out-pull the drag peak at the landed gap.</param>
/// <param name="PeakMotorCurrentA">Largest motor current of any station during the spin-up, A.</param>
/// <param name="PeakPackCurrentA">Largest pack current during the spin-up, A.</param>
/// <param name="MinPackVoltageV">Smallest bus voltage during the spin-up, V.</param>
/// <param name="HoverSpeedRpm">Largest trimmed hover speed of any station, rpm, or null when no balance was found.</param>
/// <param name="HoverCurrentA">Largest trimmed hover motor current of any station, A, or null.</param>
/// <param name="HoverPackVoltageV">Bus voltage in trimmed hover, V, or null.</param>
/// <param name="YawResidualNm">Magnitude of the yaw torque with every station at the one duty that carries the weight
/// (<see cref="Craft.YawBalance.EqualDutyResidual"/>), N m, or null without a trim or such a duty.</param>
/// <param name="YawAuthorityNm">The yaw torque the trim was shown to command both ways within every limit: the rig's yaw
/// tolerance when it can, 0 when it cannot, N m; null when it was not checked (no trim).</param>
/// <param name="TrimLimit">What stops the trimmed hover (the first finding's limit key, e.g. "duty_headroom", or the hover
/// status), or null when it exists within limits.</param>
/// <param name="Trace">The spin-up trace when it was asked for, otherwise null.</param>
public sealed record StressOutcome(
    IReadOnlyList<double?> Margins,
    double? LiftoffTimeS,
    IReadOnlyList<int> StalledStations,
    double PeakMotorCurrentA,
    double PeakPackCurrentA,
    double MinPackVoltageV,
    double? HoverSpeedRpm,
    double? HoverCurrentA,
    double? HoverPackVoltageV,
    double? YawResidualNm,
    double? YawAuthorityNm,
    string? TrimLimit,
    IReadOnlyList<StressTracePoint>? Trace)
{
    /// <summary>True when the criterion passed (its margin is at least 0 or was not assessed).</summary>
    /// <param name="criterion">The criterion.</param>
    public bool Passed(StressCriterion criterion) => Margins[(int)criterion] is not { } m || m >= 0;

    /// <summary>True when every criterion passed.</summary>
    public bool PassedAll => StressCriteria.All.All(Passed);

    /// <summary>Every criterion this sample fails, as keys (<see cref="StressCriteria.Key"/>), in the order of
    /// <see cref="StressCriteria.All"/>; empty when it passes all.</summary>
    public IReadOnlyList<string> FailedCriteria => StressCriteria.All.Where(c => !Passed(c)).Select(c => c.Key()).ToList();

    /// <summary>The smallest assessed margin (the sample's distance to its nearest failure), or +infinity when none was
    /// assessed. The worst sample of a study is the one with the smallest value.</summary>
    public double MinimumMarginFraction => Margins.Where(m => m is not null).Select(m => m!.Value).DefaultIfEmpty(double.PositiveInfinity).Min();
}

namespace RotorDrive.Core.Craft;

/// <summary>Yaw balance of a rig at its design gap.</summary>
/// <param name="EqualDuty">The one duty at which all stations together carry the weight at the design gap, or null when
/// none within the duty limit does.</param>
/// <param name="ResidualTorqueNm">Net yaw torque with every station at <paramref name="EqualDuty"/>, N m (positive
/// counter-clockwise seen from above).</param>
/// <param name="YawAccelerationRadPerS2">Residual torque / yaw inertia, rad/s^2.</param>
/// <param name="TrimDeltaDuty">Duty of the clockwise group minus that of the counter-clockwise group that cancels the
/// residual while still carrying the weight, or null when it cannot be found.</param>
/// <param name="ClockwiseDuty">The clockwise group's duty with that trim, or null.</param>
/// <param name="CounterClockwiseDuty">The counter-clockwise group's duty with that trim, or null.</param>
/// <param name="AuthorityPositiveNm">Largest counter-clockwise yaw torque the trimmed hover can command within every
/// limit, N m.</param>
/// <param name="AuthorityNegativeNm">Largest clockwise yaw torque (as a positive number), N m.</param>
/// <param name="LimitNm">The rig's yaw tolerance limits.yaw_torque_nm, N m.</param>
/// <param name="AuthorityLimitedBy">The limit key that bounds the authority in the weaker direction: the first finding of
/// the trim just beyond the authority found, or null.</param>
/// <param name="Sensitivity">Yaw torque from small pair mismatches, or null when the rig has no counter-rotating pair
/// or no equal duty.</param>
/// <param name="Findings">Why a part of the analysis could not be done, or what fails.</param>
public sealed record YawResult(
    double? EqualDuty,
    double? ResidualTorqueNm,
    double? YawAccelerationRadPerS2,
    double? TrimDeltaDuty,
    double? ClockwiseDuty,
    double? CounterClockwiseDuty,
    double AuthorityPositiveNm,
    double AuthorityNegativeNm,
    double LimitNm,
    string? AuthorityLimitedBy,
    YawSensitivity? Sensitivity,
    IReadOnlyList<string> Findings)
{
    /// <summary>Yaw authority: the smaller of the two directions, N m.</summary>
    public double AuthorityNm => Math.Min(AuthorityPositiveNm, AuthorityNegativeNm);

    /// <summary>Authority / tolerance - 1 (negative when the trim cannot command the tolerated torque both ways).</summary>
    public double AuthorityMarginFraction => AuthorityNm / LimitNm - 1;

    /// <summary>Whether an equal duty exists and its residual yaw torque is within the tolerance.</summary>
    public bool ResidualWithinTolerance => ResidualTorqueNm is { } r && Math.Abs(r) <= LimitNm;

    /// <summary>Whether the trim can command at least the tolerance both ways.</summary>
    public bool AuthorityCoversTolerance => AuthorityNm >= LimitNm;

    /// <summary>Pass: an equal duty exists, its residual yaw torque is within the tolerance, and the trim can command
    /// at least the tolerance both ways.</summary>
    public bool Pass => ResidualWithinTolerance && AuthorityCoversTolerance;

    /// <summary>Every failed criterion as a key: <c>yaw_residual</c> (no equal duty, or its residual above the tolerance)
    /// and <c>yaw_authority</c>; empty when the yaw balance passes.</summary>
    public IReadOnlyList<string> FailedCriteria => [.. ResidualWithinTolerance ? Array.Empty<string>() : ["yaw_residual"], .. AuthorityCoversTolerance ? Array.Empty<string>() : ["yaw_authority"]];
}

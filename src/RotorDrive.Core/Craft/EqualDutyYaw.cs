namespace RotorDrive.Core.Craft;

/// <summary>The yaw residual of a rig with every station at one duty that carries the weight at the design gap (the
/// first part of <see cref="YawBalance.Analyse"/>).</summary>
/// <param name="EqualDuty">The common duty, or null when none up to the rig's max duty carries the weight.</param>
/// <param name="ResidualTorqueNm">Net yaw torque of the rotor reactions at that duty, N m (positive counter-clockwise seen
/// from above), or null.</param>
/// <param name="Evaluations">Equal-duty states solved (<see cref="CommonDutyHover.SpeedsAt"/> calls).</param>
public sealed record EqualDutyYaw(double? EqualDuty, double? ResidualTorqueNm, int Evaluations);

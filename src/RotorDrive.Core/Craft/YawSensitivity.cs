namespace RotorDrive.Core.Craft;

/// <summary>Yaw torque caused by a small mismatch between two paired (counter-rotating) rotors at the equal duty.</summary>
/// <param name="StationA">The perturbed station (the first clockwise one), 0-based.</param>
/// <param name="StationB">Its partner (the first counter-clockwise one), 0-based.</param>
/// <param name="KvMismatchNm">Change of net yaw torque when station A's motor Kv is 1 % higher, N m.</param>
/// <param name="GapDifferenceNm">Change when station A's gap is 1 mm larger, N m.</param>
/// <param name="PlateTempDifferenceNm">Change when the plate under station A is 10 K warmer, N m.</param>
public sealed record YawSensitivity(int StationA, int StationB, double KvMismatchNm, double GapDifferenceNm, double PlateTempDifferenceNm);

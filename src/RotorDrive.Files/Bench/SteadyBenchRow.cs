namespace RotorDrive.Files.Bench;

/// <summary>One steady bench point in the file's units.</summary>
/// <param name="SpeedRpm">Shaft speed, rpm.</param>
/// <param name="GapMm">Air gap, mm.</param>
/// <param name="TorqueNm">Measured shaft torque, N m.</param>
/// <param name="LiftN">Measured lift, N, or null.</param>
/// <param name="PlateTempC">Plate temperature, C, or null.</param>
public sealed record SteadyBenchRow(double SpeedRpm, double GapMm, double TorqueNm, double? LiftN, double? PlateTempC);

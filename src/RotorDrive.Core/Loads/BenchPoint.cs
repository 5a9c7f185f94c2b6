namespace RotorDrive.Core.Loads;

/// <summary>One steady bench point: a rotor held at a speed and gap on a load cell, with the shaft torque it needed and,
/// when measured, the lift.</summary>
/// <param name="SpeedRadPerS">Shaft speed, rad/s, at least 0.</param>
/// <param name="GapM">Air gap between magnet face and plate, m, at least 0.</param>
/// <param name="TorqueNm">Measured shaft torque (eddy drag, windage and bearing together), N m.</param>
/// <param name="LiftN">Measured lift, N, or null when not measured.</param>
/// <param name="PlateTempC">Plate temperature at the point, C, or null for the calibration's default.</param>
public sealed record BenchPoint(double SpeedRadPerS, double GapM, double TorqueNm, double? LiftN, double? PlateTempC);

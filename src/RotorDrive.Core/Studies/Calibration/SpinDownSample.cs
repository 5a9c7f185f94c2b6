namespace RotorDrive.Core.Studies.Calibration;

/// <summary>One sample of a spin-down trace: the rotor's speed at a time after the power was cut.</summary>
/// <param name="TimeS">Time, s (samples in increasing order).</param>
/// <param name="SpeedRadPerS">Measured shaft speed, rad/s, at least 0.</param>
/// <param name="GapM">Air gap at that time, m, at least 0.</param>
public sealed record SpinDownSample(double TimeS, double SpeedRadPerS, double GapM);

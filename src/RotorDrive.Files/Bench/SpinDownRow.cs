namespace RotorDrive.Files.Bench;

/// <summary>One spin-down sample in the file's units.</summary>
/// <param name="TimeS">Time, s.</param>
/// <param name="SpeedRpm">Shaft speed, rpm.</param>
/// <param name="GapMm">Air gap, mm, or null (the trace's default gap).</param>
public sealed record SpinDownRow(double TimeS, double SpeedRpm, double? GapMm);

namespace RotorDrive.Core.Studies.Stress;

/// <summary>One point of a sample's spin-up trace (recorded only when asked for, e.g. to reproduce one sample).</summary>
/// <param name="TimeS">Time from the start, s.</param>
/// <param name="Duty">Commanded duty, mean over the stations (each ramps to its own trimmed-hover duty), 0..1.</param>
/// <param name="SpeedRadPerS">Every station's speed, rad/s.</param>
/// <param name="MotorCurrentA">Every station's motor current, A.</param>
/// <param name="BusVoltageV">Bus (pack terminal) voltage, V.</param>
/// <param name="PackCurrentA">Pack current, A.</param>
/// <param name="LiftN">Total lift, N.</param>
public sealed record StressTracePoint(
    double TimeS,
    double Duty,
    IReadOnlyList<double> SpeedRadPerS,
    IReadOnlyList<double> MotorCurrentA,
    double BusVoltageV,
    double PackCurrentA,
    double LiftN);

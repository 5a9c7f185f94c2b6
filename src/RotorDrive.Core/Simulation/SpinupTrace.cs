namespace RotorDrive.Core.Simulation;

/// <summary>Time traces of a run on the output grid (one entry per sample; per-station traces indexed [station][sample]).</summary>
/// <param name="TimeS">Sample times, s.</param>
/// <param name="SpeedRadPerS">Rotor speed per station, rad/s.</param>
/// <param name="MotorCurrentA">Motor (phase) current per station, A.</param>
/// <param name="WindingTempC">Winding temperature per station, C.</param>
/// <param name="PlateTempC">Plate patch temperature per station, C.</param>
/// <param name="GapM">Air gap, m.</param>
/// <param name="LiftN">Total lift, N.</param>
/// <param name="BusVoltageV">Bus (pack terminal) voltage, V.</param>
/// <param name="PackCurrentA">Pack current, A (negative while regenerating).</param>
/// <param name="SocFraction">Pack state of charge, 0..1.</param>
/// <param name="YawTorqueNm">Reaction yaw torque on the frame, N m (positive counter-clockwise seen from above).</param>
/// <param name="YawRateRadPerS">Yaw rate, rad/s.</param>
/// <param name="YawAngleRad">Accumulated yaw angle, rad.</param>
public sealed record SpinupTrace(
    IReadOnlyList<double> TimeS,
    IReadOnlyList<IReadOnlyList<double>> SpeedRadPerS,
    IReadOnlyList<IReadOnlyList<double>> MotorCurrentA,
    IReadOnlyList<IReadOnlyList<double>> WindingTempC,
    IReadOnlyList<IReadOnlyList<double>> PlateTempC,
    IReadOnlyList<double> GapM,
    IReadOnlyList<double> LiftN,
    IReadOnlyList<double> BusVoltageV,
    IReadOnlyList<double> PackCurrentA,
    IReadOnlyList<double> SocFraction,
    IReadOnlyList<double> YawTorqueNm,
    IReadOnlyList<double> YawRateRadPerS,
    IReadOnlyList<double> YawAngleRad);

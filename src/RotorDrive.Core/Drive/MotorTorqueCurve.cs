namespace RotorDrive.Core.Drive;

/// <summary>The torque a drivetrain delivers over speed at one duty, after current limiting and pack sag.</summary>
/// <param name="Duty">The commanded duty, 0..1.</param>
/// <param name="TorqueNm">Motor shaft torque at each speed of the map, N m.</param>
/// <param name="MotorCurrentA">Motor current at each speed, A.</param>
/// <param name="BusVoltageV">Loaded pack voltage at each speed, V.</param>
/// <param name="Regimes">The controller's rule at each speed (current limit, regulating, freewheel, ...).</param>
/// <param name="Equilibria">The equilibria at this duty, to mark on a chart.</param>
public sealed record MotorTorqueCurve(
    double Duty,
    IReadOnlyList<double> TorqueNm,
    IReadOnlyList<double> MotorCurrentA,
    IReadOnlyList<double> BusVoltageV,
    IReadOnlyList<DriveRegime> Regimes,
    IReadOnlyList<OperatingPoint> Equilibria);

namespace RotorDrive.Core.Drive;

/// <summary>The electrical and mechanical state of one drivetrain at a solved bus voltage.</summary>
/// <remarks>Energy balance, exact by construction: bus power = shaft power + copper loss + no-load loss + controller loss,
/// with copper loss I^2 R(T), no-load loss I0 E (Drela 2007: the no-load current times the back-EMF) and controller loss
/// I^2 R_on + Vbus I_idle.</remarks>
/// <param name="Regime">Which rule set the current.</param>
/// <param name="SpeedRadPerS">Shaft speed, rad/s.</param>
/// <param name="BusVoltageV">Bus voltage at the controller's input, V.</param>
/// <param name="Duty">Duty actually applied (after current limiting or freewheel clamping), 0..1.</param>
/// <param name="MotorVoltageV">Averaged motor terminal voltage, V.</param>
/// <param name="MotorCurrentA">Motor current, A (negative when regenerating).</param>
/// <param name="BackEmfV">Back-EMF, V.</param>
/// <param name="TorqueNm">Shaft torque delivered by the motor, N m.</param>
/// <param name="BusCurrentA">Current the controller draws from the bus, A (negative when feeding it).</param>
/// <param name="CopperLossW">Winding loss I^2 R(T), W.</param>
/// <param name="NoLoadLossW">No-load (iron and friction) loss I0 E, W.</param>
/// <param name="ControllerLossW">Controller loss I^2 R_on + Vbus I_idle, W.</param>
public readonly record struct DrivePoint(
    DriveRegime Regime,
    double SpeedRadPerS,
    double BusVoltageV,
    double Duty,
    double MotorVoltageV,
    double MotorCurrentA,
    double BackEmfV,
    double TorqueNm,
    double BusCurrentA,
    double CopperLossW,
    double NoLoadLossW,
    double ControllerLossW)
{
    /// <summary>Shaft power, W (torque x speed).</summary>
    // Adding +0 turns the -0 of a negative (no-load) torque at rest into 0, so no "-0 W" reaches a report.
    public double ShaftPowerW => TorqueNm * SpeedRadPerS + 0.0;

    /// <summary>Electrical power drawn from the bus, W (bus voltage x bus current).</summary>
    public double BusPowerW => BusVoltageV * BusCurrentA;

    /// <summary>Electrical power into the motor terminals, W.</summary>
    public double MotorInputPowerW => MotorVoltageV * MotorCurrentA;

    /// <summary>Drive efficiency: shaft power over bus power, 0..1; 0 when either is not positive.</summary>
    public double Efficiency => BusPowerW > 0 && ShaftPowerW > 0 ? ShaftPowerW / BusPowerW : 0.0;

    /// <summary>Motor efficiency: shaft power over motor input power, 0..1; 0 when either is not positive.</summary>
    public double MotorEfficiency => MotorInputPowerW > 0 && ShaftPowerW > 0 ? ShaftPowerW / MotorInputPowerW : 0.0;
}

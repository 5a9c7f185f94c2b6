using RotorDrive.Core.Drive;

namespace RotorDrive.Core.Craft;

/// <summary>One station in a hover state.</summary>
/// <param name="Index">Station index, 0-based.</param>
/// <param name="Spin">Spin direction.</param>
/// <param name="Duty">Controller duty, 0..1 (the duty that holds this speed on the shared bus).</param>
/// <param name="SpeedRadPerS">Rotor speed, rad/s.</param>
/// <param name="LiftN">Lift, N.</param>
/// <param name="ShaftTorqueNm">Shaft torque = load torque (eddy + windage + bearing), N m.</param>
/// <param name="ReactionTorqueNm">Yaw torque on the frame: shaft torque x spin sign, N m.</param>
/// <param name="MotorCurrentA">Motor (phase-equivalent DC) current, A.</param>
/// <param name="BusCurrentA">Controller input current, A.</param>
/// <param name="EddyPowerW">Eddy power into the plate, W.</param>
/// <param name="ElectricalPowerW">Power drawn from the bus, W.</param>
/// <param name="Regime">The controller's regime at this point (Regulating when the duty is free).</param>
/// <param name="Stable">Whether the speed is a stable equilibrium at this duty (d(motor - load torque)/d speed &lt; 0).</param>
/// <param name="StabilitySlopeNmPerRadPerS">d(motor torque - load torque)/d speed at fixed duty and bus voltage.</param>
/// <param name="Margins">Margins to the motor, controller, rotor and duty limits.</param>
public sealed record HoverStation(
    int Index,
    SpinDirection Spin,
    double Duty,
    double SpeedRadPerS,
    double LiftN,
    double ShaftTorqueNm,
    double ReactionTorqueNm,
    double MotorCurrentA,
    double BusCurrentA,
    double EddyPowerW,
    double ElectricalPowerW,
    DriveRegime Regime,
    bool Stable,
    double StabilitySlopeNmPerRadPerS,
    IReadOnlyList<LimitMargin> Margins)
{
    /// <summary>Speed, rpm.</summary>
    public double SpeedRpm => Units.RadPerSToRpm(SpeedRadPerS);

    /// <summary>Lift-specific power, W per N of lift (electrical power / lift); infinite without lift.</summary>
    public double LiftSpecificPowerWPerN => LiftN > 0 ? ElectricalPowerW / LiftN : double.PositiveInfinity;
}

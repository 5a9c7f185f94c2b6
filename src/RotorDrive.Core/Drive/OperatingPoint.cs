using RotorDrive.Core.Loads;

namespace RotorDrive.Core.Drive;

/// <summary>One steady operating point (equilibrium) of a rotor on its drivetrain, with its margins to every limit.</summary>
/// <param name="Kind">Crossing, at rest, or held by a speed-holding controller.</param>
/// <param name="SpeedRadPerS">Shaft speed, rad/s, in the rotor's spin direction.</param>
/// <param name="Stable">True when a small speed rise makes the net torque decelerate the rotor (d(motor - load)/d omega
/// &lt; 0 across the crossing); at rest and held points are stable.</param>
/// <param name="StabilitySlopeNmPerRadPerS">d(motor torque - load torque)/d omega at the crossing, N m per rad/s
/// (forward difference); null for at-rest and held points.</param>
/// <param name="Drive">The drivetrain's electrical state (duty, motor current and voltage, bus current, losses).</param>
/// <param name="Load">The rotor's load at this speed (lift, torques, eddy power).</param>
/// <param name="PackCurrentA">Pack current, A (this rotor's bus current alone).</param>
/// <param name="Margins">Margins to every limit of motor, controller, rotor and pack.</param>
public sealed record OperatingPoint(
    EquilibriumKind Kind,
    double SpeedRadPerS,
    bool Stable,
    double? StabilitySlopeNmPerRadPerS,
    DrivePoint Drive,
    LoadPoint Load,
    double PackCurrentA,
    IReadOnlyList<LimitMargin> Margins)
{
    /// <summary>Shaft speed, rpm.</summary>
    public double SpeedRpm => Units.RadPerSToRpm(SpeedRadPerS);

    /// <summary>Duty applied, 0..1.</summary>
    public double Duty => Drive.Duty;

    /// <summary>Motor current, A.</summary>
    public double MotorCurrentA => Drive.MotorCurrentA;

    /// <summary>Averaged motor voltage, V.</summary>
    public double MotorVoltageV => Drive.MotorVoltageV;

    /// <summary>Controller bus current, A.</summary>
    public double BusCurrentA => Drive.BusCurrentA;

    /// <summary>Bus (loaded pack) voltage, V.</summary>
    public double BusVoltageV => Drive.BusVoltageV;

    /// <summary>Shaft power, W.</summary>
    public double ShaftPowerW => Drive.ShaftPowerW;

    /// <summary>Electrical power drawn from the bus, W.</summary>
    public double ElectricalPowerW => Drive.BusPowerW;

    /// <summary>Drive efficiency (shaft over bus power), 0..1.</summary>
    public double Efficiency => Drive.Efficiency;

    /// <summary>Lift, N.</summary>
    public double LiftN => Load.LiftN;

    /// <summary>Power dissipated in the plate by eddy currents, W.</summary>
    public double EddyPowerW => Load.EddyPowerW;

    /// <summary>The limits this point exceeds, in the order of <see cref="Margins"/>.</summary>
    public IEnumerable<LimitMargin> ExceededLimits => Margins.Where(m => m.Exceeded);
}

using RotorDrive.Core.Drive;
using RotorDrive.Core.Loads;
using RotorDrive.Core.Magnetics;

namespace RotorDrive.Core.Craft;

/// <summary>One station of a <see cref="RigModel"/>: geometry, spin, rotor, drivetrain, its shared load table and its
/// local conditions.</summary>
/// <param name="XM">Rotor axis x from the rig origin, m.</param>
/// <param name="YM">Rotor axis y from the rig origin, m.</param>
/// <param name="Spin">Spin direction seen from above; the rotor's reaction on the frame is its shaft torque times
/// <see cref="SpinDirectionExtensions.Sign"/>.</param>
/// <param name="Rotor">The rotor design.</param>
/// <param name="Drivetrain">Motor and controller (max duty taken from the rig's limits).</param>
/// <param name="Load">The rotor load over this rig's plate; a shared, immutable, thread-safe table.</param>
/// <param name="Conditions">Local gap offset and temperatures.</param>
public sealed record CraftStation(
    double XM,
    double YM,
    SpinDirection Spin,
    RotorDesign Rotor,
    Drivetrain Drivetrain,
    IRotorLoad Load,
    StationConditions Conditions)
{
    /// <summary>Motor and controller mass, kg (rotor excluded).</summary>
    public double DrivetrainMassKg => Drivetrain.MassKg;

    /// <summary>Station mass: rotor, motor and controller, kg.</summary>
    public double MassKg => Rotor.RotorMassKg + Drivetrain.MassKg;

    /// <summary>The load at a speed and the rig gap, under this station's conditions (gap offset added).</summary>
    /// <param name="speedRadPerS">Rotor speed, rad/s (&gt;= 0).</param>
    /// <param name="rigGapM">The rig's gap, m.</param>
    public LoadPoint LoadAt(double speedRadPerS, double rigGapM)
        => Load.Evaluate(speedRadPerS, rigGapM + Conditions.GapOffsetM, Conditions.PlateTempC, Conditions.RotorMagnetTempC);

    /// <summary>The motor's flux factor 1 + beta (T - 20) at this station's motor magnet temperature.</summary>
    public double FluxFactor => Drivetrain.FluxFactorAt(Conditions.MotorMagnetTempC);

    /// <summary>The drive input for a command at a speed under this station's winding and magnet temperatures.</summary>
    /// <param name="command">Duty or motor-current command.</param>
    /// <param name="speedRadPerS">Shaft speed, rad/s.</param>
    public DriveInput Input(DriveCommand command, double speedRadPerS)
        => new(Drivetrain, command, speedRadPerS, Conditions.WindingTempC, Conditions.MotorMagnetTempC, false);
}

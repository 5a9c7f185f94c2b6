namespace RotorDrive.Core.Loads;

/// <summary>The load one rotor puts on its shaft: lift and torque versus speed, air gap and temperatures.</summary>
/// <remarks>Every analysis reads rotor loads through this interface, so a physics model, a precomputed table or a
/// model calibrated to bench data can stand in for one another.</remarks>
public interface IRotorLoad
{
    /// <summary>Evaluates the load at a shaft speed (rad/s, signed), air gap (m) and plate and magnet temperatures (C).</summary>
    LoadPoint Evaluate(double speedRadPerS, double gapM, double plateTempC, double magnetTempC);
}

namespace RotorDrive.Core.Drive;

/// <summary>The state one rotor operates in: air gap, temperatures, the pack's state of charge and the braking setting.</summary>
/// <param name="GapM">Air gap between magnet face and plate, m, greater than 0.</param>
/// <param name="PlateTempC">Plate temperature, C.</param>
/// <param name="RotorMagnetTempC">Temperature of the rotor's levitation magnets, C.</param>
/// <param name="WindingTempC">Motor winding temperature, C.</param>
/// <param name="MotorMagnetTempC">Motor magnet temperature, C.</param>
/// <param name="SocFraction">Pack state of charge, 0..1.</param>
/// <param name="Braking">True when the controller may brake (drive current backwards).</param>
public sealed record OperatingConditions(
    double GapM,
    double PlateTempC,
    double RotorMagnetTempC,
    double WindingTempC,
    double MotorMagnetTempC,
    double SocFraction,
    bool Braking = false)
{
    /// <summary>Conditions with every part at one temperature (a cold start), braking off.</summary>
    /// <param name="gapM">Air gap, m.</param>
    /// <param name="tempC">Temperature of plate, magnets and windings, C.</param>
    /// <param name="socFraction">State of charge, 0..1.</param>
    public static OperatingConditions Uniform(double gapM, double tempC, double socFraction)
        => new(gapM, tempC, tempC, tempC, tempC, socFraction);
}

namespace RotorDrive.Core.Loads;

/// <summary>Properties of the air a rotor spins in.</summary>
/// <remarks>Defaults are dry air at about 20 C and one standard atmosphere: density 1.20 kg/m^3 and kinematic viscosity
/// 1.5e-5 m^2/s (handbook values, e.g. CRC Handbook of Chemistry and Physics, "Properties of air"; rounded).</remarks>
/// <param name="DensityKgM3">Air density, kg/m^3, greater than 0.</param>
/// <param name="KinematicViscosityM2PerS">Kinematic viscosity, m^2/s, greater than 0.</param>
public sealed record AirProperties(double DensityKgM3 = 1.2, double KinematicViscosityM2PerS = 1.5e-5)
{
    /// <summary>Air at about 20 C and sea-level pressure (1.2 kg/m^3, 1.5e-5 m^2/s).</summary>
    public static AirProperties Standard { get; } = new();
}

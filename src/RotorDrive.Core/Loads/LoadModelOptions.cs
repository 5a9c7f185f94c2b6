namespace RotorDrive.Core.Loads;

/// <summary>Settings of the rotor load model.</summary>
/// <remarks>Defaults: end correction on, 24 Gauss-Legendre points over the magnet annulus, standard air, no calibration.</remarks>
public sealed record LoadModelOptions
{
    /// <summary>The defaults.</summary>
    public static LoadModelOptions Default { get; } = new();

    /// <summary>Apply the Russell-Norsworthy finite-width factor to the plate conductivity (default true).</summary>
    public bool EndEffectCorrection { get; init; } = true;

    /// <summary>Gauss-Legendre points over the magnet annulus, 2..256 (default 24).</summary>
    public int RadialPoints { get; init; } = 24;

    /// <summary>Air for the windage torque (default <see cref="AirProperties.Standard"/>).</summary>
    public AirProperties Air { get; init; } = AirProperties.Standard;

    /// <summary>Factors fitted to bench data for this rotor over this plate, or null for the uncorrected model (default).</summary>
    public LoadCalibration? Calibration { get; init; }
}

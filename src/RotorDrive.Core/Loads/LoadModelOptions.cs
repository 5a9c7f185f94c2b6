namespace RotorDrive.Core.Loads;

/// <summary>Settings of the rotor load model.</summary>
/// <remarks>Defaults: the three-dimensional ring model with 4 harmonics of the array and its spectrum cut at
/// 1e-6 at a 2 mm gap; for the two-dimensional model, the end correction on and 24 Gauss-Legendre points
/// over the magnet annulus; standard air; no calibration.</remarks>
public sealed record LoadModelOptions
{
    /// <summary>The defaults.</summary>
    public static LoadModelOptions Default { get; } = new();

    /// <summary>The eddy-current model (default <see cref="LoadModelKind.ThreeDimensional"/>).</summary>
    public LoadModelKind Model { get; init; } = LoadModelKind.ThreeDimensional;

    /// <summary>Two-dimensional model only: apply the Russell-Norsworthy finite-width factor to the plate conductivity (default true).</summary>
    public bool EndEffectCorrection { get; init; } = true;

    /// <summary>Two-dimensional model: Gauss-Legendre points over the magnet annulus, 2..256 (default 24).</summary>
    public int RadialPoints { get; init; } = 24;

    /// <summary>Three-dimensional model: harmonics of the array kept, 1..64 (default 4).</summary>
    public int Harmonics { get; init; } = 4;

    /// <summary>Three-dimensional model: the gap at which the series truncation tolerance is met, m (default 2 mm).</summary>
    public double ReferenceGapM { get; init; } = 0.002;

    /// <summary>Three-dimensional model: relative truncation tolerance of the Fourier series (default 1e-6).</summary>
    public double SeriesTolerance { get; init; } = 1e-6;

    /// <summary>Air for the windage torque (default <see cref="AirProperties.Standard"/>).</summary>
    public AirProperties Air { get; init; } = AirProperties.Standard;

    /// <summary>Factors fitted to bench data for this rotor over this plate, or null for the uncorrected model (default).</summary>
    public LoadCalibration? Calibration { get; init; }
}

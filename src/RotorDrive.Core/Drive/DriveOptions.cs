namespace RotorDrive.Core.Drive;

/// <summary>Settings of one drivetrain that are not catalog ratings: the current limit's scale, the motor magnets'
/// temperature coefficient and the controller's largest duty.</summary>
/// <param name="CurrentLimitScale">Phase-current limit as a multiple of the controller's burst current, dimensionless,
/// greater than 0. Default 1: the controller limits at its burst rating. The tolerance study varies it.</param>
/// <param name="MagnetFluxTempCoeffPerK">Relative temperature coefficient of the motor magnets' flux, 1/K, in [-0.01, 0].
/// Default <see cref="Motor.NdFeBFluxTempCoeffPerK"/> (-0.0012, typical sintered NdFeB); 0 switches the effect off.</param>
/// <param name="MaxDuty">Largest duty the controller's modulator reaches, in (0, 1]. Default 1.</param>
public sealed record DriveOptions(
    double CurrentLimitScale = 1.0,
    double MagnetFluxTempCoeffPerK = Motor.NdFeBFluxTempCoeffPerK,
    double MaxDuty = 1.0)
{
    /// <summary>The defaults: limit at burst current, NdFeB magnets, full duty available.</summary>
    public static DriveOptions Default { get; } = new();
}

namespace RotorDrive.Core.Loads;

/// <summary>A rotor design's bench calibration as a rig uses it: the factors, their covariance, and where they came from.</summary>
/// <param name="RotorId">The rotor design's catalog id.</param>
/// <param name="Factors">The fitted factors and bearing terms.</param>
/// <param name="Covariance">4 x 4 covariance of conductivity factor, field factor, bearing drag (N m) and bearing damping
/// (N m per rad/s), in that order; rows and columns of quantities not fitted are zero.</param>
/// <param name="Source">The calibration file's name, for reports.</param>
public sealed record RotorCalibration(string RotorId, LoadCalibration Factors, double[][] Covariance, string Source)
{
    /// <summary>The steady bench points the calibration was fitted to, when they were found with it (for showing measured
    /// points over the fitted curve); empty for a spin-down or when the data file is not at hand.</summary>
    public IReadOnlyList<BenchPoint> BenchPoints { get; init; } = [];
}

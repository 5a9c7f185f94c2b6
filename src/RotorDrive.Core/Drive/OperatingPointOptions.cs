namespace RotorDrive.Core.Drive;

/// <summary>Numerical settings of the operating-point search.</summary>
/// <param name="ScanPoints">Speeds of the quadratic grid sampled up to the search top to bracket crossings, at least 4,
/// spaced as top x (i / (n - 1))^2 so that low speeds (drag peak, stall) are sampled finely; a geometric ladder below its
/// first sample (see <paramref name="LowSpeedRatio"/>), the current-limit corner of the motor curve and the load's peak are
/// added. Default 12.</param>
/// <param name="RelativeAccuracy">Brent accuracy on the speed (relative to the search top) and on the torque balance
/// (relative to the largest torque difference sampled). Default 1e-10.</param>
/// <param name="MaxIterations">Brent iteration limit per crossing. Default 100.</param>
/// <param name="TangencyProbes">Extra evaluations spent at each local minimum of |motor - load| that does not change
/// sign between samples, looking for two close crossings (Brent's parabolic steps safeguarded by golden sections, in
/// ln(speed)). Default 4.</param>
/// <param name="SlopeStepRelative">Speed step of the stability slope's forward difference, relative to the search top.
/// Default 1e-6.</param>
/// <param name="LowSpeedRatio">Ratio between successive samples of the geometric ladder that extends the scan below its
/// first quadratic sample (while the load is not yet proportional to speed, down to 10^-7 of the search top at most), in
/// [1.5, 1000]; a drag peak far below the search top lies on this ladder. Default 10.</param>
public sealed record OperatingPointOptions(
    int ScanPoints = 12,
    double RelativeAccuracy = 1e-10,
    int MaxIterations = 100,
    int TangencyProbes = 4,
    double SlopeStepRelative = 1e-6,
    double LowSpeedRatio = 10)
{
    /// <summary>The defaults.</summary>
    public static OperatingPointOptions Default { get; } = new();
}

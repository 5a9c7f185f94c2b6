namespace RotorDrive.Core.Loads;

/// <summary>Settings of the drag-peak search.</summary>
/// <param name="ScanPoints">Speeds scanned, log-spaced, to bracket the maximum, 8..10000 (default 64).</param>
/// <param name="LowestSpeedFraction">Lowest scanned speed as a fraction of the top speed, in (0, 0.5] (default 1e-4).</param>
/// <param name="RelativeTolerance">Tolerance on the peak speed, relative, in [1e-12, 1e-2] (default 1e-7).</param>
/// <param name="MaxIterations">Most refinement iterations, 1..1000 (default 100).</param>
public sealed record DragPeakOptions(int ScanPoints = 64, double LowestSpeedFraction = 1e-4, double RelativeTolerance = 1e-7, int MaxIterations = 100)
{
    /// <summary>The defaults.</summary>
    public static DragPeakOptions Default { get; } = new();
}

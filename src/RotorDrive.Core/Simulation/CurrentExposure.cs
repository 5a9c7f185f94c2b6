namespace RotorDrive.Core.Simulation;

/// <summary>How hard one part was driven in current during a run: its peak, its continuous rating, how long it was above
/// it, and the burst allowance it has.</summary>
/// <param name="Part">What the current belongs to, in words ("motor", "controller", "pack").</param>
/// <param name="PeakA">Largest current magnitude, A.</param>
/// <param name="ContinuousA">Continuous rating, A.</param>
/// <param name="BurstA">Burst (peak) rating, A; null when the catalog gives none.</param>
/// <param name="TimeAboveContinuousS">Total time above the continuous rating, s.</param>
/// <param name="BurstAllowanceS">How long the part may stay above its continuous rating, s; null when the catalog gives
/// no duration (then only the burst current is checked).</param>
public sealed record CurrentExposure(string Part, double PeakA, double ContinuousA, double? BurstA, double TimeAboveContinuousS, double? BurstAllowanceS)
{
    /// <summary>True when the peak exceeds the burst rating, or the time above continuous exceeds the allowance.</summary>
    public bool Exceeded =>
        (BurstA is { } burst && PeakA > burst * (1 + 1e-9))
        || (BurstAllowanceS is { } allowance && TimeAboveContinuousS > allowance);
}

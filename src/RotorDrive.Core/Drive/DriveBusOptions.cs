namespace RotorDrive.Core.Drive;

/// <summary>Numerical settings of the bus solver.</summary>
/// <param name="MaxActiveSetPasses">Fast active-set passes before the exhaustive interval scan takes over, at least 0.
/// Default 8; typical solves settle in 1 to 3.</param>
/// <param name="RelativeVoltageTolerance">Two successive pass voltages closer than this (relative) count as settled
/// when a station sits exactly on a limit switch. Default 1e-13.</param>
public sealed record DriveBusOptions(int MaxActiveSetPasses = 8, double RelativeVoltageTolerance = 1e-13)
{
    /// <summary>The defaults.</summary>
    public static DriveBusOptions Default { get; } = new();
}

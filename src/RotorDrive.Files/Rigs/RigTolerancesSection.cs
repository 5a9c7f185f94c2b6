namespace RotorDrive.Files.Rigs;

/// <summary>"tolerances": the spread of part values for the stress test, keyed by the quantity's file key
/// (<see cref="RigToleranceKeys"/>); absent keys do not vary. The whole section is optional.</summary>
public sealed class RigTolerancesSection
{
    /// <summary>The entries by file key, e.g. "motor_kv_rpm_per_v".</summary>
    public Dictionary<string, RigToleranceEntry> Entries { get; } = new(StringComparer.Ordinal);
}

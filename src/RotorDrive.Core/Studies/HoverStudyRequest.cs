using RotorDrive.Core.Craft;

namespace RotorDrive.Core.Studies;

/// <summary>What a hover study runs: the trimmed hover at a gap (or the gap reached at one common duty), and optionally
/// the payload capacity and the yaw balance.</summary>
/// <param name="GapM">Trim gap, m (&gt; 0), or null for the rig's design gap; ignored with <paramref name="CommonDuty"/>.</param>
/// <param name="CommonDuty">Give every station this duty, (0, 1], and find the gap where the craft hovers; null to trim.</param>
/// <param name="PayloadKg">Payload, kg (&gt;= 0), or null for the rig's.</param>
/// <param name="PayloadCapacity">Whether to search the largest payload that hovers within every limit at the gap
/// (several trims).</param>
/// <param name="Yaw">Whether to analyse the yaw balance at the design gap.</param>
/// <param name="Options">Numerical settings of the trim, or null for the defaults.</param>
public sealed record HoverStudyRequest(
    double? GapM = null,
    double? CommonDuty = null,
    double? PayloadKg = null,
    bool PayloadCapacity = false,
    bool Yaw = false,
    HoverOptions? Options = null)
{
    /// <summary>Everything the workbench's hover sheet shows: the trim at the design gap, the payload capacity and the
    /// yaw balance.</summary>
    public static HoverStudyRequest Complete { get; } = new(PayloadCapacity: true, Yaw: true);
}

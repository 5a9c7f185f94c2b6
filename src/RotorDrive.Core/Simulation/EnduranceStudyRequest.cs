namespace RotorDrive.Core.Simulation;

/// <summary>What an endurance study runs: the trimmed hover held from a state of charge until its first limit.</summary>
/// <param name="SocFraction">Pack state of charge at the start, 0..1, or null (default) for the rig model's.</param>
/// <param name="Options">Step, duration, trace and plate-field settings, or null for <see cref="EnduranceOptions.Default"/>.</param>
public sealed record EnduranceStudyRequest(double? SocFraction = null, EnduranceOptions? Options = null)
{
    /// <summary>The defaults.</summary>
    public static EnduranceStudyRequest Default { get; } = new();
}

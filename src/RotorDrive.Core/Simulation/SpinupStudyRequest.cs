namespace RotorDrive.Core.Simulation;

/// <summary>What a spin-up study runs: the spin-up from rest on the gear under a throttle ramp to the trimmed-hover
/// throttle, then the landing from that hover with the controllers' braking on and off.</summary>
/// <param name="Mode">Controller mode; default duty.</param>
/// <param name="RampS">Throttle ramp time from 0 to the hover throttle, s (&gt;= 0); default 2.</param>
/// <param name="SocFraction">Pack state of charge at the start, 0..1, or null (default) for the rig model's.</param>
/// <param name="SettleS">Simulated time after the ramp, s (&gt; 0); default 6.</param>
/// <param name="StopRampS">Ramp time of the landing, s (&gt;= 0); default 0: the throttle cut at once, the hardest case for
/// regeneration.</param>
/// <param name="StopDurationS">Simulated time of each landing after its ramp, s (&gt; 0); default 4.</param>
/// <param name="FullCellV">Full-charge voltage per cell used for the controllers' rated bus voltage (max cells x this),
/// V; default 4.2 (lithium polymer; common practice, no source).</param>
/// <param name="Options">Integrator and reporting settings of the spin-up, or null for <see cref="SpinupOptions.Default"/>
/// (the landings never record traces).</param>
public sealed record SpinupStudyRequest(
    ControllerMode Mode = ControllerMode.Duty,
    double RampS = 2.0,
    double? SocFraction = null,
    double SettleS = 6.0,
    double StopRampS = 0.0,
    double StopDurationS = 4.0,
    double FullCellV = 4.2,
    SpinupOptions? Options = null)
{
    /// <summary>The defaults.</summary>
    public static SpinupStudyRequest Default { get; } = new();
}

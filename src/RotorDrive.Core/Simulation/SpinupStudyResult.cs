namespace RotorDrive.Core.Simulation;

/// <summary>The outcome of a spin-up study (<see cref="SpinupStudy.Run"/>).</summary>
/// <param name="Request">What was run.</param>
/// <param name="SocFraction">Pack state of charge at the start, 0..1.</param>
/// <param name="TargetsSi">The hover throttle per station the ramp aims for (duty, or rad/s in speed hold).</param>
/// <param name="Spinup">The spin-up from rest on the landing gear.</param>
/// <param name="LandingBraking">The landing from the trimmed hover with the controllers' braking on.</param>
/// <param name="LandingCoasting">The same landing with braking off (the rotors freewheel).</param>
/// <param name="ControllerMaxVoltageV">The lowest controller rating on the bus: min max cells x full-cell voltage, V.</param>
/// <param name="Findings">Every failed limit, in words; empty when the spin-up passes.</param>
/// <param name="Cautions">Landing results worth a caution (not failed limits: the catalogs give no regeneration or
/// over-voltage ratings), in words.</param>
public sealed record SpinupStudyResult(
    SpinupStudyRequest Request,
    double SocFraction,
    IReadOnlyList<double> TargetsSi,
    SpinupResult Spinup,
    SpinupResult LandingBraking,
    SpinupResult LandingCoasting,
    double ControllerMaxVoltageV,
    IReadOnlyList<SpinupFinding> Findings,
    IReadOnlyList<string> Cautions)
{
    /// <summary>True when no limit failed: lift-off in time, no stalled rotor, currents within their burst allowances,
    /// the pack above its cutoff and a trimmed hover to aim for.</summary>
    public bool Passes => Findings.Count == 0;

    /// <summary>The two landings: braking on, then off.</summary>
    public IReadOnlyList<SpinupResult> Landings => [LandingBraking, LandingCoasting];
}

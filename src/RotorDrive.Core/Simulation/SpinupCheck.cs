namespace RotorDrive.Core.Simulation;

/// <summary>The spin-up of a spin-up study and its verdict, without the landings (<see cref="SpinupStudy.SpinUp"/>).</summary>
/// <param name="SocFraction">Pack state of charge at the start, 0..1.</param>
/// <param name="TargetsSi">The hover throttle per station the ramp aims for (duty, or rad/s in speed hold).</param>
/// <param name="Spinup">The spin-up from rest on the landing gear.</param>
/// <param name="Findings">Every failed limit, in words; empty when the spin-up passes (the same as the full study's).</param>
/// <param name="Cautions">The rig's cautions that do not need the landings (steel under the plate), in words.</param>
public sealed record SpinupCheck(
    double SocFraction,
    IReadOnlyList<double> TargetsSi,
    SpinupResult Spinup,
    IReadOnlyList<SpinupFinding> Findings,
    IReadOnlyList<string> Cautions)
{
    /// <summary>True when no limit failed (as <see cref="SpinupStudyResult.Passes"/>).</summary>
    public bool Passes => Findings.Count == 0;
}

namespace RotorDrive.Core.Simulation;

/// <summary>The outcome of a spin-up study (<see cref="SpinupStudy.Run"/>).</summary>
/// <param name="Request">What was run.</param>
/// <param name="SocFraction">Pack state of charge at the start, 0..1.</param>
/// <param name="TargetsSi">The hover throttle per station the ramp aims for (duty, or rad/s in speed hold).</param>
/// <param name="Spinup">The spin-up from rest on the landing gear.</param>
/// <param name="LandingBraking">The landing from the trimmed hover with the controllers' braking on.</param>
/// <param name="LandingCoasting">The same landing with braking off (the rotors freewheel).</param>
/// <param name="ControllerMaxVoltageV">The lowest controller rating on the bus: min max cells x full-cell voltage, V.</param>
/// <param name="LiftoffLimitS">The rig's lift-off time limit, s.</param>
/// <param name="Findings">Every failed limit, in words; empty when the spin-up passes.</param>
/// <param name="Cautions">Landing results worth a caution (not failed limits: the catalogs give no regeneration or
/// over-voltage ratings), in words.</param>
/// <param name="RatedBurstChecks">The retaining-ring check of each station's rotor at its rated speed (the speed a
/// spin-up may reach), as the hover review makes it.</param>
public sealed record SpinupStudyResult(
    SpinupStudyRequest Request,
    double SocFraction,
    IReadOnlyList<double> TargetsSi,
    SpinupResult Spinup,
    SpinupResult LandingBraking,
    SpinupResult LandingCoasting,
    double ControllerMaxVoltageV,
    double LiftoffLimitS,
    IReadOnlyList<SpinupFinding> Findings,
    IReadOnlyList<string> Cautions,
    IReadOnlyList<Safety.RotorSafetyResult> RatedBurstChecks)
{
    /// <summary>True when no limit failed: lift-off in time, no stalled rotor, currents within their burst allowances,
    /// the pack above its cutoff and a trimmed hover to aim for.</summary>
    public bool Passes => Findings.Count == 0;

    /// <summary>Whether lift-off fails: the craft never lifts off, or later than <see cref="LiftoffLimitS"/>.</summary>
    public bool LiftoffFails => Findings.Any(f => f.Key is "liftoff" or "liftoff_time");

    /// <summary>The station whose peak motor current comes closest to (or furthest past) its controller's current
    /// limit.</summary>
    public StationSpinup WorstStation => Spinup.Stations.MaxBy(s => s.Motor.PeakA / Math.Max(s.CurrentLimitA, 1e-9))!;

    /// <summary>Whether a landing's regeneration lifts the bus above the controllers' rating (a caution).</summary>
    /// <param name="landing">One of <see cref="Landings"/>.</param>
    public bool RegenAboveRating(SpinupResult landing) => Preconditions.NotNull(landing, nameof(landing)).MaxBusVoltageV > ControllerMaxVoltageV;

    /// <summary>Every failed criterion as a key (<see cref="SpinupFinding.Key"/>, each once); empty when the spin-up passes.</summary>
    public IReadOnlyList<string> FailedCriteria => Findings.Select(f => f.Key).Distinct().ToList();

    /// <summary>The safety cautions for the run: magnets, burst, packs, and hot plates and windings at the run's peak
    /// temperatures, the burst caution from the rated-speed checks.</summary>
    public IReadOnlyList<Safety.Caution> SafetyCautions => Safety.Cautions.For(new Safety.CautionFindings(true, RatedBurstChecks,
        Spinup.Stations.Max(s => s.PeakPlateTempC), Spinup.Stations.Max(s => s.PeakWindingTempC)));

    /// <summary>The two landings: braking on, then off.</summary>
    public IReadOnlyList<SpinupResult> Landings => [LandingBraking, LandingCoasting];
}

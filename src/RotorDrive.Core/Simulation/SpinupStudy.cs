using System.Globalization;

namespace RotorDrive.Core.Simulation;

/// <summary>The spin-up study of a rig, shared by the command line and the terminal UI: the spin-up from rest on the
/// landing gear through the drag peak to the trimmed hover, the landing from that hover with braking on and off, and the
/// findings and cautions in words.</summary>
/// <remarks>The target is the rig's steady state (<see cref="Craft.SteadyState"/>: a free craft's trim, a guided sled's
/// hover, or a bench's stations at their duties on their stands, which never lift off). The throttle ramps from 0 to the steady-state throttle (<see cref="SimulationRig.HoverThrottle"/>: per-station
/// duties or speeds) over the ramp time; the spin-up lasts the ramp plus the settle time. Each landing starts from the
/// trimmed hover at the state of charge the spin-up ended with and cuts the throttle to zero over the stop ramp. Failed
/// limits: no trimmed hover to aim for, no lift-off or lift-off later than the rig's limit, a rotor stalled below its drag
/// peak (with the current limit that would pass it), a controller above its continuous rating longer than its burst
/// allowance, the pack above its burst rating, the bus below the pack's cutoff or collapsing. Regeneration that lifts
/// the bus above the controllers' rating draws a caution. Thread-safe; three simulator runs.</remarks>
public static class SpinupStudy
{
    /// <summary>Runs the study.</summary>
    /// <param name="rig">The prepared rig.</param>
    /// <param name="request">What to run, or null for <see cref="SpinupStudyRequest.Default"/>.</param>
    /// <exception cref="ArgumentNullException">The rig is null.</exception>
    /// <exception cref="ArgumentOutOfRangeException">A request value is out of range.</exception>
    public static SpinupStudyResult Run(SimulationRig rig, SpinupStudyRequest? request = null)
    {
        request ??= SpinupStudyRequest.Default;
        var check = SpinUp(rig, request);
        var (soc, targets, spin) = (check.SocFraction, check.TargetsSi, check.Spinup);
        var options = request.Options ?? SpinupOptions.Default;
        var mode = request.Mode;
        double socAfter = Math.Clamp(spin.FinalSocFraction, 0, 1);
        var running = rig.HoverThrottle(mode, socAfter);
        var quiet = options with { RecordTrace = false, StopAtLiftoff = false };
        SpinupResult Land(bool braking) => SpinupSimulator.Run(rig,
            new SpinupRequest(ThrottleProfile.Stop(mode, running, request.StopRampS, braking), request.StopRampS + request.StopDurationS, socAfter, StartHovering: true), quiet);
        var landBraking = Land(true);
        var landCoasting = Land(false);

        double controllerMaxV = rig.Drivetrains.Min(d => d.Controller.MaxCells) * request.FullCellV;
        return new SpinupStudyResult(request, soc, targets, spin, landBraking, landCoasting, controllerMaxV, rig.Rig.Limits.LiftoffTimeS,
            check.Findings, [.. check.Cautions, .. LandingCautions(landBraking, landCoasting, controllerMaxV, request.FullCellV)],
            Craft.HoverSafety.AtRatedSpeed(rig.Rig.Stations.Select(st => st.Rotor)));
    }

    /// <summary>The spin-up alone and its verdict: what <see cref="Run"/> finds before it simulates the landings (the
    /// findings are the same; the cautions leave out the landings' regeneration). One simulator run: the ranking's check
    /// of a shortlisted drivetrain.</summary>
    /// <param name="rig">The prepared rig.</param>
    /// <param name="request">What to run (the landing settings are not used), or null for <see cref="SpinupStudyRequest.Default"/>.</param>
    /// <exception cref="ArgumentNullException">The rig is null.</exception>
    /// <exception cref="ArgumentOutOfRangeException">A request value is out of range.</exception>
    public static SpinupCheck SpinUp(SimulationRig rig, SpinupStudyRequest? request = null)
    {
        Preconditions.NotNull(rig, nameof(rig));
        request ??= SpinupStudyRequest.Default;
        Preconditions.NonNegative(request.RampS, nameof(request.RampS));
        Preconditions.Positive(request.SettleS, nameof(request.SettleS));
        Preconditions.NonNegative(request.StopRampS, nameof(request.StopRampS));
        Preconditions.Positive(request.StopDurationS, nameof(request.StopDurationS));
        Preconditions.Positive(request.FullCellV, nameof(request.FullCellV));
        double soc = Preconditions.InRange(request.SocFraction ?? rig.SocFraction, 0, 1, nameof(request.SocFraction));
        var options = request.Options ?? SpinupOptions.Default;
        var targets = rig.HoverThrottle(request.Mode, soc);
        var spin = SpinupSimulator.Run(rig, new SpinupRequest(ThrottleProfile.SpinUp(request.Mode, targets, request.RampS), request.RampS + request.SettleS, soc), options);
        return new SpinupCheck(soc, targets, spin, Findings(rig, spin), RigCautions(rig));
    }

    private static List<SpinupFinding> Findings(SimulationRig rig, SpinupResult spin)
    {
        var limits = rig.Rig.Limits;
        var list = new List<SpinupFinding>();
        var mount = rig.Rig.Mount;
        if (!rig.HoverExists)
        {
            string why = rig.Hover.Findings.Count > 0 ? ": " + rig.Hover.Findings[0].Message : string.Empty;
            list.Add(new SpinupFinding("hover", null, mount switch
            {
                Craft.MountKind.Bench => $"no steady state of the stations at the stands' {F(rig.Rig.DesignGapM * 1000, 1)} mm gap{why}",
                Craft.MountKind.Guided => $"no guided hover of the sled's {F(rig.WeightN, 0)} N{why}",
                _ => $"no trimmed hover of the craft's {F(rig.WeightN, 0)} N at the design gap{why}",
            }));
        }
        // Stands hold a bench's rotors at their gap: there is no lift-off to judge.
        if (mount != Craft.MountKind.Bench && spin.LiftoffTimeS is null)
        {
            list.Add(new SpinupFinding("liftoff", null, "the craft never lifts off"));
        }
        else if (mount != Craft.MountKind.Bench && spin.LiftoffTimeS > limits.LiftoffTimeS)
        {
            list.Add(new SpinupFinding("liftoff_time", null, $"lift-off at {F(spin.LiftoffTimeS!.Value, 2)} s is later than the limit of {F(limits.LiftoffTimeS, 1)} s"));
        }
        foreach (var s in spin.Stations)
        {
            if (s.Stalled)
            {
                list.Add(new SpinupFinding("stall", s.Index, $"station {s.Index + 1} stalls below its drag peak ({F(Units.RadPerSToRpm(s.DragPeakSpeedRadPerS), 0)} rpm, "
                    + $"{F(s.DragPeakTorqueNm, 2)} N m at its landed gap): its controller limits the current to {F(s.CurrentLimitA, 0)} A; "
                    + $"{F(s.PassingCurrentA, 0)} A just balances the peak, a limit of {F(s.SuggestedCurrentLimitA, 0)} A would pass it"));
            }
            if (s.Controller.Exceeded)
            {
                list.Add(new SpinupFinding("controller_current", s.Index, $"station {s.Index + 1}: controller above its continuous {F(s.Controller.ContinuousA, 0)} A for "
                    + $"{F(s.Controller.TimeAboveContinuousS, 2)} s (burst allowance {F(s.Controller.BurstAllowanceS ?? 0, 1)} s)"));
            }
        }
        if (spin.Pack.Exceeded)
        {
            list.Add(new SpinupFinding("pack_current", null, $"pack current {F(spin.Pack.PeakA, 0)} A exceeds its burst rating of {F(spin.Pack.BurstA ?? 0, 0)} A"));
        }
        if (spin.BelowCutoff)
        {
            list.Add(new SpinupFinding("pack_cutoff", null, $"pack voltage sags to {F(spin.MinBusVoltageV, 1)} V, below the cutoff of {F(spin.CutoffVoltageV, 1)} V"));
        }
        if (spin.BusCollapsed)
        {
            list.Add(new SpinupFinding("bus_collapse", null, "the pack cannot feed the controllers at some instant (bus collapse)"));
        }
        return list;
    }

    private static List<string> RigCautions(SimulationRig rig)
    {
        var list = new List<string>();
        // The rig starts and ends on its gear: a plate on steel pulls the stopped rotors down (the one rule, PlateAttraction).
        if (Craft.PlateAttraction.AtStandstill(rig.Model) is { } steel)
        {
            var caution = Safety.Cautions.SteelUnderPlate(steel);
            list.Add($"{caution.Title.ToLowerInvariant()}: {caution.Reason}. {caution.Text}");
        }
        return list;
    }

    private static List<string> LandingCautions(SpinupResult braking, SpinupResult coasting, double controllerMaxV, double fullCellV)
    {
        var list = new List<string>();
        foreach (var (l, name) in new[] { (braking, "with braking"), (coasting, "without braking") })
        {
            if (l.MaxBusVoltageV > controllerMaxV)
            {
                list.Add($"landing {name}: regeneration of {F(l.PeakRegenCurrentA, 0)} A lifts the bus to {F(l.MaxBusVoltageV, 1)} V, "
                    + $"above the controllers' {F(controllerMaxV, 1)} V (max cells x {F(fullCellV, 1)} V); cut the throttle more gently or land from a part-charged pack");
            }
        }
        return list;
    }

    private static string F(double value, int decimals)
        => double.IsFinite(value) ? value.ToString("F" + decimals, CultureInfo.InvariantCulture) : "n/a";
}

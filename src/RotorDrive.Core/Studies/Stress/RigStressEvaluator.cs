using RotorDrive.Core.Craft;
using RotorDrive.Core.Drive;
using RotorDrive.Core.Safety;
using RotorDrive.Core.Simulation;

namespace RotorDrive.Core.Studies.Stress;

/// <summary>Evaluates one stress sample of a rig (see <see cref="RigStressModel"/>): its rig-model variant run through
/// the analyses the commands use, and every criterion read from their results.</summary>
/// <remarks>
/// <para>Per sample: the variant (<see cref="RigStressModel.Variant"/>) is prepared for time simulation from the nominal
/// one (<see cref="SimulationRig.With"/>, which also trims it: <see cref="HoverTrim.Solve(RigModel, HoverOptions?)"/>);
/// the spin-up (<see cref="SpinupSimulator.Run"/>, with heave, from rest on the gear) ramps every station's duty to its
/// trimmed-hover duty (<see cref="SimulationRig.HoverThrottle"/>) over the ramp time and ends at lift-off or at
/// limits.liftoff_time_s, whichever comes first: the current peaks and the voltage dip of the drag-peak passage lie
/// before lift-off. Only when a rotor is still below its drag peak at its current limit at lift-off is the run repeated
/// for the spinup command's ramp plus settle time, and the stall judged at its end. Yaw: the equal-duty residual (<see cref="YawBalance.EqualDutyResidual"/>, the first part of the yaw
/// command's analysis) and the trim's authority to command the rig's yaw tolerance both ways within every limit (two
/// trims at plus and minus limits.yaw_torque_nm): the yaw command's pass rule (<see cref="YawResult.Pass"/>) without its
/// bisection for the exact authority. Retainer: <see cref="RotorSafety.Assess"/> at each station's trimmed speed.</para>
/// <para>Margins (0 at the limit, negative when failed): lift-off (limit - t) / limit, or total lift at the end over the
/// weight - 1 without lift-off; stall, for a stalled station its end speed over its drag-peak speed - 1, otherwise the
/// smallest current limit over the current that just passes the peak - 1 (at least 0); currents, the smallest of
/// 1 - peak / burst rating and 1 - time above continuous / burst allowance over motors, controllers and pack; pack voltage,
/// minimum bus voltage / cutoff - 1 (-1 when the bus collapsed); trim, the smallest limit margin of the trimmed hover
/// (-1 without a balance or with an unstable station); yaw, the smallest of 1 - |residual| / tolerance and the trim margins
/// at plus and minus the tolerance; retainer, the smallest ring margin.</para>
/// </remarks>
internal sealed class RigStressEvaluator(RigStressModel model) : IStressEvaluator
{
    public StressOutcome Evaluate(StressParts parts, bool recordTrace)
    {
        var variant = model.Variant(parts);
        var rig = model.Rig;
        var limits = rig.Limits;
        var sim = model.Simulation.With(variant);
        var hover = sim.Hover;

        // Spin-up to the trimmed-hover duties, ending at lift-off or at the lift-off time limit.
        var targets = sim.HoverThrottle(ControllerMode.Duty);
        var profile = ThrottleProfile.SpinUp(ControllerMode.Duty, targets, model.Options.RampTimeS);
        var spin = SpinupSimulator.Run(sim, new SpinupRequest(profile, limits.LiftoffTimeS, variant.SocFraction), model.Options.Spinup(recordTrace));
        if (spin.LiftoffTimeS is not null && spin.StalledStations.Count > 0)
        {
            // A rotor still climbing through its drag peak at its current limit when the others lift the craft is not
            // necessarily stuck: run on (the spinup command's ramp plus settle time) and judge it at the end.
            double longer = Math.Max(limits.LiftoffTimeS, model.Options.RampTimeS + SpinupStudyRequest.Default.SettleS);
            spin = SpinupSimulator.Run(sim, new SpinupRequest(profile, longer, variant.SocFraction), model.Options.Spinup(recordTrace) with { StopAtLiftoff = false });
        }

        var margins = new double?[StressCriteria.All.Count];
        margins[(int)StressCriterion.Liftoff] = LiftoffMargin(spin, variant, limits.LiftoffTimeS);
        margins[(int)StressCriterion.Stall] = StallMargin(spin);
        margins[(int)StressCriterion.Currents] = CurrentMargin(spin);
        margins[(int)StressCriterion.PackVoltage] = spin.BusCollapsed ? -1 : spin.MinBusVoltageV / spin.CutoffVoltageV - 1;
        margins[(int)StressCriterion.Trim] = TrimMargin(hover);

        double? residual = null, authority = null, retainer = null;
        double? speedRpm = null, currentA = null, busV = null;
        if (hover.Balanced)
        {
            var yaw = YawBalance.EqualDutyResidual(variant, null, model.Options.Hover);
            double yawMargin = -1;
            if (yaw.ResidualTorqueNm is { } r)
            {
                residual = Math.Abs(r);
                double tolerance = limits.YawTorqueNm;
                double plus = TrimMargin(HoverTrim.Solve(variant, variant.DesignGapM, tolerance, model.Options.Hover));
                double minus = TrimMargin(HoverTrim.Solve(variant, variant.DesignGapM, -tolerance, model.Options.Hover));
                authority = plus >= 0 && minus >= 0 ? tolerance : 0;
                yawMargin = Math.Min(1 - residual.Value / tolerance, Math.Min(plus, minus));
            }
            margins[(int)StressCriterion.Yaw] = yawMargin;
            for (int i = 0; i < hover.Stations.Count; i++)
            {
                if (RotorSafety.Assess(variant.Stations[i].Rotor, hover.Stations[i].SpeedRadPerS, variant.Options.Safety).MarginFraction is { } m)
                {
                    retainer = retainer is { } low ? Math.Min(low, m) : m;
                }
            }
            speedRpm = hover.Stations.Max(s => s.SpeedRpm);
            currentA = hover.Stations.Max(s => s.MotorCurrentA);
            busV = hover.BusVoltageV;
        }
        else
        {
            margins[(int)StressCriterion.Yaw] = -1;
        }
        margins[(int)StressCriterion.Retainer] = retainer;

        return new StressOutcome(
            margins,
            spin.LiftoffTimeS,
            spin.StalledStations,
            spin.PeakMotorCurrentA,
            spin.Pack.PeakA,
            spin.MinBusVoltageV,
            speedRpm,
            currentA,
            busV,
            residual,
            authority,
            hover.Status == HoverStatus.Hovering ? null : hover.Findings.FirstOrDefault()?.Limit ?? hover.Status.ToString(),
            recordTrace && spin.Trace is { } trace ? Trace(trace, profile) : null);
    }

    private static double LiftoffMargin(SpinupResult spin, RigModel variant, double limitS)
    {
        if (spin.LiftoffTimeS is { } t)
        {
            return (limitS - t) / limitS;
        }
        // Still on the gear: how far the lift at the end is from the weight (negative by construction).
        double lift = 0;
        for (int i = 0; i < spin.Stations.Count; i++)
        {
            lift += variant.Stations[i].LoadAt(spin.Stations[i].FinalSpeedRadPerS, variant.Rig.LandedGapM).LiftN;
        }
        return Math.Min(lift / variant.WeightN - 1, -1e-12);
    }

    private static double StallMargin(SpinupResult spin)
    {
        double stalled = double.PositiveInfinity, passing = double.PositiveInfinity;
        foreach (var s in spin.Stations)
        {
            if (s.Stalled)
            {
                stalled = Math.Min(stalled, Math.Min(s.FinalSpeedRadPerS / s.DragPeakSpeedRadPerS - 1, -1e-12));
            }
            else if (s.PassingCurrentA > 0)
            {
                passing = Math.Min(passing, Math.Max(s.CurrentLimitA / s.PassingCurrentA - 1, 0));
            }
        }
        return double.IsFinite(stalled) ? stalled : double.IsFinite(passing) ? passing : 0;
    }

    private static double CurrentMargin(SpinupResult spin)
    {
        double margin = Exposure(spin.Pack);
        foreach (var s in spin.Stations)
        {
            margin = Math.Min(margin, Math.Min(Exposure(s.Motor), Exposure(s.Controller)));
        }
        return double.IsFinite(margin) ? margin : 1;
    }

    // 0 exactly where CurrentExposure.Exceeded switches (burst rating with its 1e-9 allowance for rounding).
    private static double Exposure(CurrentExposure e)
    {
        double margin = double.PositiveInfinity;
        if (e.BurstA is { } burst && burst > 0)
        {
            margin = 1 + 1e-9 - e.PeakA / burst;
        }
        if (e.BurstAllowanceS is { } allowance && allowance > 0)
        {
            margin = Math.Min(margin, 1 - e.TimeAboveContinuousS / allowance);
        }
        return margin;
    }

    // The smallest limit margin of a trimmed hover; -1 without a balance, or when it fails for another reason (an unstable
    // station) while every limit holds.
    private static double TrimMargin(HoverResult hover)
    {
        if (!hover.Balanced)
        {
            return -1;
        }
        double margin = double.PositiveInfinity;
        foreach (var s in hover.Stations)
        {
            foreach (var m in s.Margins)
            {
                margin = Math.Min(margin, m.MarginFraction);
            }
        }
        foreach (var m in hover.PackMargins)
        {
            margin = Math.Min(margin, m.MarginFraction);
        }
        if (hover.Status != HoverStatus.Hovering && margin >= 0)
        {
            return -1;
        }
        return double.IsFinite(margin) ? margin : 1;
    }

    private static List<StressTracePoint> Trace(SpinupTrace trace, ThrottleProfile profile)
    {
        int n = trace.SpeedRadPerS.Count;
        var points = new List<StressTracePoint>(trace.TimeS.Count);
        for (int k = 0; k < trace.TimeS.Count; k++)
        {
            double t = trace.TimeS[k], duty = 0;
            var speeds = new double[n];
            var currents = new double[n];
            for (int j = 0; j < n; j++)
            {
                speeds[j] = trace.SpeedRadPerS[j][k];
                currents[j] = trace.MotorCurrentA[j][k];
                duty += profile.ValueAt(j, t) / n;
            }
            points.Add(new StressTracePoint(t, duty, speeds, currents, trace.BusVoltageV[k], trace.PackCurrentA[k], trace.LiftN[k]));
        }
        return points;
    }
}

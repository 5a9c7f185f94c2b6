using System.Globalization;
using RotorDrive.Core.Craft;
using RotorDrive.Core.Drive;
using RotorDrive.Core.Safety;
using RotorDrive.Core.Simulation;

namespace RotorDrive.Core.Studies.Ranking;

public sealed partial class RankStudy
{
    /// <summary>Evaluates one combination through the fast path with a fresh trim, with every reason in words.</summary>
    /// <param name="candidate">The combination.</param>
    /// <returns>Its evaluation (figures equal to the sweep's within the trim tolerance).</returns>
    /// <exception cref="ArgumentOutOfRangeException">An index is out of range.</exception>
    public RankEvaluation Evaluate(RankCandidate candidate)
    {
        CheckCandidate(candidate);
        var worker = new RankWorker(_model.Stations.Count);
        EvaluateFast(candidate, worker, fresh: true);
        return ToEvaluation(candidate, worker.Outcome);
    }

    /// <summary>Every combination of one motor (with every controller, pack and pack count), with its reasons: what
    /// <c>--why-not</c> shows.</summary>
    /// <param name="motorIndex">Index into the catalog's motors.</param>
    /// <returns>One evaluation per controller x pack x pack count, in sweep order.</returns>
    /// <exception cref="ArgumentOutOfRangeException">The index is out of range.</exception>
    public IReadOnlyList<RankEvaluation> ExplainMotor(int motorIndex)
    {
        Preconditions.InRange(motorIndex, 0, _catalog.Motors.Count - 1, nameof(motorIndex));
        var worker = new RankWorker(_model.Stations.Count);
        var list = new List<RankEvaluation>();
        for (int c = 0; c < _catalog.Controllers.Count; c++)
        {
            for (int p = 0; p < _catalog.Packs.Count; p++)
            {
                for (int k = 1; k <= _maxPackCount; k++)
                {
                    var candidate = new RankCandidate(motorIndex, c, p, k);
                    EvaluateFast(candidate, worker, fresh: false);
                    list.Add(ToEvaluation(candidate, worker.Outcome));
                }
            }
        }
        return list;
    }

    /// <summary>Runs the full checks of one combination on its rig model variant (<see cref="ModelFor"/>, prepared by
    /// <see cref="SimulationRig.FromModel"/>): the spin-up study's verdict with the <c>spinup</c> command's defaults
    /// (<see cref="SpinupStudy.SpinUp"/>, no traces; the landings, which only add cautions, are left to <c>spinup</c>), the hover review the <c>hover</c> command gives
    /// (<see cref="HoverReview.Of"/> of the trimmed hover at the design gap), and the endurance run from the model's state
    /// of charge (<see cref="EnduranceSimulator"/>). One rule: a combination the ranking keeps passes the same checks
    /// those commands apply to that drivetrain on that rig.</summary>
    /// <remarks>Tens of milliseconds on the demo rig: the ranking runs it for its shortlist only. Thread-safe.</remarks>
    /// <param name="candidate">The combination.</param>
    /// <returns>Lift-off time, stalled stations, the spin-up and hover findings and cautions, endurance runtime and its
    /// first limit.</returns>
    /// <exception cref="ArgumentOutOfRangeException">An index is out of range.</exception>
    public RankSimulation Simulate(RankCandidate candidate)
    {
        var sim = SimulationRig.FromModel(ModelFor(candidate));
        // The spin-up study's verdict (SpinUp: the same findings as SpinupStudy.Run, without its two landing simulations,
        // which only add regeneration cautions and cost ten times the spin-up).
        var study = SpinupStudy.SpinUp(sim, SpinupStudyRequest.Default with { Options = SpinupOptions.Default with { RecordTrace = false } });
        var review = HoverReview.Of(sim.Model, sim.Hover);
        var cautions = new List<string>(study.Cautions);
        cautions.AddRange(review.Safety.Cautions.Where(c => c.Level == CautionLevel.Warning).Select(c => $"{c.Title.ToLowerInvariant()}: {c.Reason}"));
        var endurance = EnduranceSimulator.Run(sim, null, EnduranceOptions.Default with { RecordTrace = false });
        var spin = study.Spinup;
        return new RankSimulation(spin.LiftoffTimeS, spin.StalledStations, study.Findings.Select(f => f.Message).ToList(),
            review.Pass ? [] : review.Findings.Select(f => f.Message).ToList(), cautions, spin.MinBusVoltageV, spin.Pack.PeakA,
            endurance.RuntimeS, endurance.FirstLimit, endurance.FirstLimitText, endurance.PeakWindingTempC, endurance.PeakPlateTempC);
    }

    // The station whose ring is furthest over its allowable at the trimmed speeds, in the hover review's words.
    private string RetainerMessage(RankOutcome o)
    {
        int worst = 0;
        for (int i = 1; i < _model.Stations.Count; i++)
        {
            if (o.Speeds[i] / _ringSpeed[i] > o.Speeds[worst] / _ringSpeed[worst])
            {
                worst = i;
            }
        }
        var r = RotorSafety.Assess(_model.Stations[worst].Rotor, o.Speeds[worst], _model.Options.Safety);
        return string.Format(CultureInfo.InvariantCulture,
            "station {0}: the retaining ring of rotor {1} carries {2:0.0} MPa at the hover speed {3:0} rpm, above its allowable {4:0.0} MPa (reached at {5:0} rpm)",
            worst + 1, r.RotorId, r.HoopStressPa!.Value / 1e6, Units.RadPerSToRpm(o.Speeds[worst]), r.AllowablePa!.Value / 1e6,
            Units.RadPerSToRpm(_ringSpeed[worst]));
    }

    // Turns an outcome into the public record, composing a sentence per reason.
    private RankEvaluation ToEvaluation(RankCandidate c, RankOutcome o)
    {
        var controller = _catalog.Controllers[c.ControllerIndex];
        var cautions = new List<RankRejection>();
        if (o.CautionNotReversible)
        {
            cautions.Add(new RankRejection(RankRejectionKind.ControllerNotReversible, string.Format(CultureInfo.InvariantCulture,
                "controller {0} is not reversible: set each rotor's direction by the motor wiring (swap two phases); it cannot reverse-brake a spinning rotor when landing",
                controller.Id)));
        }
        return new RankEvaluation(c, _catalog.Motors[c.MotorIndex].Id, controller.Id, _catalog.Packs[c.PackIndex].Id, FiguresOf(o), ReasonsFor(c, o), cautions);
    }

    // One sentence per rejection the outcome holds, in the kinds' order.
    private List<RankRejection> ReasonsFor(RankCandidate c, RankOutcome o)
    {
        var ci = CultureInfo.InvariantCulture;
        var motor = _catalog.Motors[c.MotorIndex];
        var controller = _catalog.Controllers[c.ControllerIndex];
        var pack = _catalog.Packs[c.PackIndex];
        int n = _model.Stations.Count;
        var reasons = new List<RankRejection>();
        void Add(RankRejectionKind kind, string message)
        {
            if (o.Has(kind))
            {
                reasons.Add(new RankRejection(kind, message));
            }
        }
        Add(RankRejectionKind.CellsOutOfControllerRange, string.Format(ci,
            "pack {0} has {1} cells in series; controller {2} is rated for {3} to {4}",
            pack.Id, pack.CellsSeries, controller.Id, controller.MinCells, controller.MaxCells));
        Add(RankRejectionKind.ControllerNotReversible, string.Format(ci,
            "controller {0} is not reversible and reversing was required", controller.Id));
        if (o.Has(RankRejectionKind.RotorSpeed))
        {
            int worst = -1;
            double over = 0;
            for (int i = 0; o.Trimmed && i < n; i++)
            {
                double ratio = o.Speeds[i] / _maxSpeed[i];
                if (ratio > over)
                {
                    over = ratio;
                    worst = i;
                }
            }
            reasons.Add(new RankRejection(RankRejectionKind.RotorSpeed, worst >= 0 && over > 1
                ? string.Format(ci, "to lift {0:0.0} kg at the design gap station {1} must spin at {2:0} rpm, above its rotor's rated {3:0} rpm",
                    o.MassKg, worst + 1, Units.RadPerSToRpm(o.Speeds[worst]), Units.RadPerSToRpm(_maxSpeed[worst]))
                : string.Format(ci, "the rotors cannot lift {0:0.0} kg at the design gap within {1:0.#} x their rated speed (no trim)", o.MassKg, _hoverOptions.SpeedSearchFactor)));
        }
        if (o.Has(RankRejectionKind.RetainerStress))
        {
            reasons.Add(new RankRejection(RankRejectionKind.RetainerStress, RetainerMessage(o)));
        }
        Add(RankRejectionKind.ControllerErpm, string.Format(ci,
            "controller {0} commutates at most {1:0} erpm, i.e. {2:0} rpm with the {3}-pole motor {4}, below the hover speed {5:0} rpm",
            controller.Id, controller.MaxErpm, controller.MaxErpm / Math.Max(1, motor.PolePairs), motor.Poles, motor.Id,
            o.Trimmed ? Units.RadPerSToRpm(o.Speeds[o.FastestStation]) : 0));
        Add(RankRejectionKind.DutyHeadroom, double.IsFinite(o.NeededDuty)
            ? string.Format(ci, "on a full pack the hover needs {0:0.000} duty, above the limit {1:0.00}: motor {2} ({3:0} rpm/V) is too slow for {4} x {5} ({6} cells)",
                o.NeededDuty, _rig.Limits.MaxDuty, motor.Id, motor.KvRpmPerV, c.PackCount, pack.Id, pack.CellsSeries)
            : string.Format(ci, "{0} x {1} cannot deliver the hover power of motor {2} at any bus voltage (the pack would collapse)",
                c.PackCount, pack.Id, motor.Id));
        Add(RankRejectionKind.PackCutoff, string.Format(ci,
            "on a full charge the loaded pack gives {0:0.0} V, below the cutoff {1:0.0} V", o.BusVoltageV, o.CutoffV));
        Add(RankRejectionKind.MotorCurrent, string.Format(ci,
            "hover needs {0:0.0} A in motor {1}, above its rated {2:0.0} A", o.MaxCurrentA, motor.Id, motor.MaxCurrentA));
        Add(RankRejectionKind.MotorPower, string.Format(ci,
            "hover needs {0:0} W into motor {1}, above its rated {2:0} W", o.MaxMotorPowerW, motor.Id, motor.MaxPowerW));
        Add(RankRejectionKind.ControllerCurrent, string.Format(ci,
            "hover needs {0:0.0} A phase current, above controller {1}'s continuous {2:0.0} A", o.MaxCurrentA, controller.Id, controller.ContinuousCurrentA));
        Add(RankRejectionKind.PackCurrent, string.Format(ci,
            "the packs deliver up to {0:0.0} A during the hover, above {1} x {2}'s continuous {3:0.0} A ({4:0.#} C)",
            o.PeakPackCurrentA, c.PackCount, pack.Id, c.PackCount * pack.ContinuousCurrentA, pack.ContinuousC));
        if (o.Has(RankRejectionKind.DragPeak))
        {
            int i = o.PeakStation;
            var rotor = _rig.Stations[i].Rotor;
            double flux = 1 + Motor.NdFeBFluxTempCoeffPerK * (_rig.AmbientC - 20.0);
            double needA = motor.CurrentForTorqueA(_peakLoadTorqueNm[i], flux);
            reasons.Add(new RankRejection(RankRejectionKind.DragPeak, string.Format(ci,
                "on the landing gear ({0:0.0} mm) rotor {1} needs {2:0.00} N m at its drag peak ({3:0} rpm); motor {4} gets {5:0.00} N m there under controller {6}'s {7:0} A limit at {8:0.00} duty (it would need about {9:0} A)",
                _rig.LandedGapM * 1000, rotor.Id, _peakLoadTorqueNm[i], _peaks[i].SpeedRpm, motor.Id, o.PeakMotorTorqueNm,
                controller.Id, controller.BurstCurrentA, _rig.Limits.MaxDuty, needA)));
        }
        return reasons;
    }

    // The figures of a trimmed outcome, null when no trim was found.
    private static RankFigures? FiguresOf(RankOutcome o)
    {
        RankFigures? figures = null;
        if (o.Trimmed)
        {
            double weight = o.MassKg * Units.StandardGravity;
            double power = o.BusVoltageV * o.PackCurrentA;
            figures = new RankFigures(
                o.MassKg,
                o.Speeds.ToArray(),
                o.Currents.ToArray(),
                double.IsFinite(o.NeededDuty) ? o.Duties.ToArray() : [],
                o.BusVoltageV,
                o.PackCurrentA,
                power,
                o.EddyPowers.Sum(),
                power / weight,
                o.RuntimeS,
                o.HoverReached ? o.RuntimeLimit : "hover not reached",
                o.PeakPackCurrentA,
                o.HoverReached ? o.CurrentMargin : null,
                o.PeakStation >= 0 ? o.PeakTorqueRatio - 1 : null);
        }
        return figures;
    }
}

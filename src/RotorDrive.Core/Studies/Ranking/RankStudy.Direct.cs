using RotorDrive.Core.Craft;
using RotorDrive.Core.Drive;
using RotorDrive.Core.Loads;

namespace RotorDrive.Core.Studies.Ranking;

public sealed partial class RankStudy
{
    /// <summary>Evaluates one combination the straightforward way: a rig built with these parts (mass from
    /// <see cref="Rig.TotalMassKg"/>), the trimmed hover of its model variant (<see cref="ModelFor"/>) by
    /// <see cref="HoverTrim.Solve(RigModel, HoverOptions)"/> from a cold start, drag peaks searched again, every bus state through <see cref="DriveBus"/> with motor-current
    /// commands and every limit through <see cref="DriveMargins"/>. Slow; the reference the fast sweep is tested against.</summary>
    /// <param name="candidate">The combination.</param>
    /// <returns>Its evaluation.</returns>
    /// <exception cref="ArgumentOutOfRangeException">An index is out of range.</exception>
    public RankEvaluation EvaluateDirect(RankCandidate candidate)
    {
        CheckCandidate(candidate);
        int n = _model.Stations.Count;
        var o = new RankOutcome(n);
        o.Clear();
        var motor = _catalog.Motors[candidate.MotorIndex];
        var controller = _catalog.Controllers[candidate.ControllerIndex];
        var pack = _catalog.Packs[candidate.PackIndex];
        var bank = new PackBank(pack, candidate.PackCount, _packCurves[candidate.PackIndex]);
        var rig = _rig with
        {
            Stations = _rig.Stations.Select(s => s with { Motor = motor, Controller = controller }).ToArray(),
            Packs = bank,
        };
        o.MassKg = rig.TotalMassKg;
        var compatibility = DriveCompatibility.Check(new StationDrive(new Drivetrain(motor, controller), bank, rig.Stations[0].Rotor, Loads[0], rig.Limits.Station, ReverseRequired: _options.RequireReversible));
        foreach (var finding in compatibility)
        {
            if (finding.Kind == DriveFindingKind.ControllerNotReversible)
            {
                o.Reject(RankRejectionKind.ControllerNotReversible);
            }
        }
        o.CautionNotReversible = !controller.Reversible && !_options.RequireReversible;
        if (compatibility.Any(f => f.Kind == DriveFindingKind.CellsOutOfControllerRange))
        {
            o.Reject(RankRejectionKind.CellsOutOfControllerRange);
            return ToEvaluation(candidate, o);
        }

        // Spin-up through the drag peak, peaks searched again for this combination.
        var peaks = new DragPeak[n];
        var peakTorques = new double[n];
        var spinTrain = new Drivetrain(motor, controller, new DriveOptions(MaxDuty: rig.Limits.MaxDuty));
        var spinInputs = new DriveInput[n];
        for (int i = 0; i < n; i++)
        {
            peaks[i] = DragPeakFinder.Find(Loads[i], rig.LandedGapM, rig.PlateTemperatureC, rig.AmbientC, rig.Stations[i].Rotor.MaxSpeedRadPerS);
            peakTorques[i] = peaks[i].Status == DragPeakStatus.NoDrag ? 0 : Loads[i].Evaluate(peaks[i].SpeedRadPerS, rig.LandedGapM, rig.PlateTemperatureC, rig.AmbientC).TotalTorqueNm;
            spinInputs[i] = new DriveInput(spinTrain, DriveCommand.Duty(rig.Limits.MaxDuty), peaks[i].SpeedRadPerS, rig.AmbientC, rig.AmbientC, Braking: false);
        }
        var spinPoints = new DrivePoint[n];
        var spin = DriveBus.Solve(BusSource.FromPack(bank, 1.0), spinInputs, spinPoints);
        JudgePeaks(spin, spinPoints, peakTorques, peaks, o);

        // The trim in speed space (the drivetrain is judged below, against what these speeds need).
        var model = ModelFor(candidate);
        var trimmed = new double[n];
        if (HoverTrim.SolveSpeeds(model.Stations, model.DesignGapM, model.WeightN, model.CgXM, model.CgYM, 0.0, trimmed, warm: false,
                _hoverOptions, new HoverTrimWorkspace(n), out _) != HoverTrim.SpeedSolve.Converged)
        {
            o.Reject(RankRejectionKind.RotorSpeed);
            return ToEvaluation(candidate, o);
        }
        o.Trimmed = true;
        for (int i = 0; i < n; i++)
        {
            var load = model.Stations[i].LoadAt(trimmed[i], model.DesignGapM);
            o.Speeds[i] = trimmed[i];
            o.Torques[i] = load.TotalTorqueNm;
            o.EddyPowers[i] = load.EddyPowerW;
        }

        // Hover: each motor draws the current its trimmed torque needs; no current limit or duty clamp may interfere here.
        var hoverTrain = new Drivetrain(motor, controller, new DriveOptions(CurrentLimitScale: 1e9, MaxDuty: 1.0));
        double flux = hoverTrain.FluxFactorAt(rig.AmbientC);
        var inputs = new DriveInput[n];
        for (int i = 0; i < n; i++)
        {
            inputs[i] = new DriveInput(hoverTrain, DriveCommand.MotorCurrent(motor.CurrentForTorqueA(o.Torques[i], flux)), o.Speeds[i], rig.AmbientC, rig.AmbientC, Braking: false);
        }
        var points = new DrivePoint[n];
        bool Hover(double soc, out BusSolution solution, out string failure)
        {
            solution = DriveBus.Solve(BusSource.FromPack(bank, soc), inputs, points);
            bool delivered = solution.Status == BusStatus.Solved && points.All(p => p.Regime == DriveRegime.Regulating);
            if (!delivered || points.Max(p => p.Duty) > rig.Limits.MaxDuty)
            {
                failure = "duty headroom (the pack can no longer hold the hover speeds)";
                return false;
            }
            if (solution.BusVoltageV < rig.Limits.CellCutoffV * bank.CellsSeries)
            {
                failure = "pack cutoff voltage";
                return false;
            }
            failure = "";
            return true;
        }

        bool ok = Hover(1.0, out var start, out _);
        bool delivered = start.Status == BusStatus.Solved && points.All(p => p.Regime == DriveRegime.Regulating);
        double fastest = -1;
        // The motor side of a current-regulated point (current, terminal voltage I R + E, power) does not depend on the bus
        // voltage, so the ratings are checked at what the hover needs, even when this pack cannot deliver it.
        var needs = new DrivePoint[n];
        for (int i = 0; i < n; i++)
        {
            needs[i] = DriveBus.Evaluate(1e9, inputs[i]);
        }
        for (int i = 0; i < n; i++)
        {
            var margins = DriveMargins.ForStation(hoverTrain, rig.Stations[i].Rotor, needs[i]);
            if (margins[5].Exceeded)
            {
                o.Reject(RankRejectionKind.RotorSpeed);
            }
            if (RingOverAllowable(i, o.Speeds[i]))
            {
                o.Reject(RankRejectionKind.RetainerStress);
            }
            if (o.Speeds[i] > fastest)
            {
                fastest = o.Speeds[i];
                o.FastestStation = i;
            }
            o.Currents[i] = needs[i].MotorCurrentA;
            o.Duties[i] = points[i].Duty;
            o.MaxCurrentA = Math.Max(o.MaxCurrentA, margins[0].ValueSi);
            o.MaxMotorPowerW = Math.Max(o.MaxMotorPowerW, margins[1].ValueSi);
        }
        var fastestMargins = DriveMargins.ForStation(hoverTrain, rig.Stations[o.FastestStation].Rotor, needs[o.FastestStation]);
        if (fastestMargins[4].Exceeded)
        {
            o.Reject(RankRejectionKind.ControllerErpm);
        }
        if (o.MaxCurrentA > motor.MaxCurrentA)
        {
            o.Reject(RankRejectionKind.MotorCurrent);
        }
        if (o.MaxMotorPowerW > motor.MaxPowerW)
        {
            o.Reject(RankRejectionKind.MotorPower);
        }
        if (o.MaxCurrentA > controller.ContinuousCurrentA)
        {
            o.Reject(RankRejectionKind.ControllerCurrent);
        }
        o.CutoffV = rig.Limits.CellCutoffV * bank.CellsSeries;
        o.NeededDuty = delivered ? points.Max(p => p.Duty) : double.PositiveInfinity;
        if (delivered)
        {
            o.BusVoltageV = start.BusVoltageV;
            o.PackCurrentA = start.PackCurrentA;
        }
        if (!delivered || o.NeededDuty > rig.Limits.MaxDuty)
        {
            o.Reject(RankRejectionKind.DutyHeadroom);
            return ToEvaluation(candidate, o);
        }
        if (!ok)
        {
            o.Reject(RankRejectionKind.PackCutoff);
            return ToEvaluation(candidate, o);
        }
        o.HoverReached = true;

        int steps = _options.RuntimeSteps;
        double stepAh = rig.Limits.UsableCapacityFraction * bank.CapacityAh / steps;
        double time = 0, peak = start.PackCurrentA;
        string limit = "usable capacity";
        for (int k = 0; k < steps; k++)
        {
            if (!Hover(SocAt(2 * k + 2), out var end, out string failure))
            {
                double good = SocAt(2 * k), bad = SocAt(2 * k + 2);
                for (int b = 0; b < 60; b++)
                {
                    double mid = 0.5 * (good + bad);
                    if (Hover(mid, out var atMid, out string why))
                    {
                        good = mid;
                        peak = Math.Max(peak, atMid.PackCurrentA);
                    }
                    else
                    {
                        bad = mid;
                        failure = why;
                    }
                }
                Hover(0.5 * (SocAt(2 * k) + good), out var partial, out _);
                time += (SocAt(2 * k) - good) * bank.CapacityAh * 3600.0 / partial.PackCurrentA;
                limit = failure;
                break;
            }
            Hover(SocAt(2 * k + 1), out var middle, out _);
            time += stepAh * 3600.0 / middle.PackCurrentA;
            peak = Math.Max(peak, end.PackCurrentA);
        }
        o.RuntimeS = time;
        o.RuntimeLimit = limit;
        o.PeakPackCurrentA = peak;
        var packMargins = DriveMargins.ForPack(bank, peak, o.CutoffV, rig.Limits.CellCutoffV);
        if (packMargins[0].Exceeded)
        {
            o.Reject(RankRejectionKind.PackCurrent);
        }
        o.CurrentMargin = Math.Min(Math.Min(1 - o.MaxCurrentA / motor.MaxCurrentA, 1 - o.MaxCurrentA / controller.ContinuousCurrentA), packMargins[0].MarginFraction);
        return ToEvaluation(candidate, o);
    }
}

using RotorDrive.Core.Craft;
using RotorDrive.Core.Drive;
using RotorDrive.Core.Loads;

namespace RotorDrive.Core.Studies.Ranking;

public sealed partial class RankStudy
{
    // The fast evaluation of one combination into the worker's outcome (see the class remarks).
    private void EvaluateFast(RankCandidate c, RankWorker w, bool fresh)
    {
        var o = w.Outcome;
        o.Clear();
        var motor = _catalog.Motors[c.MotorIndex];
        var controller = _catalog.Controllers[c.ControllerIndex];
        var pack = _catalog.Packs[c.PackIndex];
        int n = _model.Stations.Count;
        int cells = pack.CellsSeries;
        if (!controller.Reversible)
        {
            if (_options.RequireReversible)
            {
                o.Reject(RankRejectionKind.ControllerNotReversible);
            }
            else
            {
                o.CautionNotReversible = true;
            }
        }
        double drivetrainKg = motor.MassKg + controller.MassKg;
        double packsKg = c.PackCount * pack.MassKg;
        (double mass, double cgX, double cgY) = MassAndCg(drivetrainKg, packsKg);
        o.MassKg = mass;
        if (!controller.AcceptsCells(cells))
        {
            // The controller cannot run on this pack at all: nothing further is meaningful.
            o.Reject(RankRejectionKind.CellsOutOfControllerRange);
            return;
        }

        double rb = RankDriveEquations.BankResistanceOhm(pack, c.PackCount);
        double[] ocv = _ocvGrid[c.PackIndex];
        double vocFull = RankDriveEquations.OpenCircuitV(cells, ocv[0]);
        SpinupCheckFast(c, motor, controller, vocFull, rb, w);

        if (fresh || !w.TrimCached || w.LastDrivetrainKg != drivetrainKg || w.LastPacksKg != packsKg)
        {
            w.TrimOk = Trim(mass, cgX, cgY, w, warm: !fresh);
            w.TrimCached = true;
            w.LastDrivetrainKg = drivetrainKg;
            w.LastPacksKg = packsKg;
        }
        if (!w.TrimOk)
        {
            o.Reject(RankRejectionKind.RotorSpeed);
            return;
        }
        o.Trimmed = true;
        for (int i = 0; i < n; i++)
        {
            var load = _model.Stations[i].LoadAt(w.TrimSpeeds[i], _model.DesignGapM);
            o.Speeds[i] = w.TrimSpeeds[i];
            o.Torques[i] = load.TotalTorqueNm;
            o.EddyPowers[i] = load.EddyPowerW;
        }

        var limits = _rig.Limits;
        double kv = motor.KvRadPerSPerV;
        double sumP = 0, numMax = 0, fastest = 0;
        for (int i = 0; i < n; i++)
        {
            // The station's flux factor does not depend on the motor (drive options and magnet temperature only).
            double flux = _model.Stations[i].FluxFactor;
            double r = motor.ResistanceAt(_model.Stations[i].Conditions.WindingTempC);
            double speed = o.Speeds[i];
            if (speed > _maxSpeed[i])
            {
                o.Reject(RankRejectionKind.RotorSpeed);
            }
            if (speed > _ringSpeed[i])
            {
                o.Reject(RankRejectionKind.RetainerStress);
            }
            if (speed > fastest)
            {
                fastest = speed;
                o.FastestStation = i;
            }
            RankDriveEquations.Station(o.Torques[i], speed, kv, flux, motor.NoLoadCurrentA, r, controller.OnResistanceOhm,
                out double current, out double num, out double motorPower);
            o.Currents[i] = current;
            o.Duties[i] = num;
            sumP += num * current;
            numMax = Math.Max(numMax, num);
            o.MaxCurrentA = Math.Max(o.MaxCurrentA, current);
            o.MaxMotorPowerW = Math.Max(o.MaxMotorPowerW, motorPower);
        }
        if (motor.ElectricalRpm(fastest) > controller.MaxErpm)
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

        double idle = n * controller.IdleCurrentA;
        double cutoff = limits.CellCutoffV * cells;
        o.CutoffV = cutoff;
        bool busOk = RankDriveEquations.Bus(vocFull, rb, idle, sumP, out double v, out double ipack);
        o.NeededDuty = busOk ? numMax / v : double.PositiveInfinity;
        if (busOk)
        {
            o.BusVoltageV = v;
            o.PackCurrentA = ipack;
            for (int i = 0; i < n; i++)
            {
                o.Duties[i] /= v;
            }
        }
        if (!busOk || o.NeededDuty > limits.MaxDuty)
        {
            o.Reject(RankRejectionKind.DutyHeadroom);
            return;
        }
        if (v < cutoff)
        {
            o.Reject(RankRejectionKind.PackCutoff);
            return;
        }
        o.HoverReached = true;

        // Runtime: equal charge steps over the usable capacity, bus re-solved at each step's midpoint and end.
        var curve = _packCurves[c.PackIndex];
        double capacityAh = c.PackCount * pack.CapacityAh;
        int steps = _options.RuntimeSteps;
        double stepAh = limits.UsableCapacityFraction * capacityAh / steps;
        double time = 0, peak = ipack;
        string limit = "usable capacity";
        for (int k = 0; k < steps; k++)
        {
            if (!RunState(RankDriveEquations.OpenCircuitV(cells, ocv[2 * k + 2]), rb, idle, sumP, numMax, cutoff, limits.MaxDuty, out double iEnd, out string failure))
            {
                double good = SocAt(2 * k), bad = SocAt(2 * k + 2);
                for (int b = 0; b < 60; b++)
                {
                    double mid = 0.5 * (good + bad);
                    if (RunState(RankDriveEquations.OpenCircuitV(cells, curve.OcvAt(mid)), rb, idle, sumP, numMax, cutoff, limits.MaxDuty, out double iMid, out string why))
                    {
                        good = mid;
                        peak = Math.Max(peak, iMid);
                    }
                    else
                    {
                        bad = mid;
                        failure = why;
                    }
                }
                double soc = 0.5 * (SocAt(2 * k) + good);
                RankDriveEquations.Bus(RankDriveEquations.OpenCircuitV(cells, curve.OcvAt(soc)), rb, idle, sumP, out _, out double iPart);
                time += (SocAt(2 * k) - good) * capacityAh * 3600.0 / iPart;
                limit = failure;
                break;
            }
            RankDriveEquations.Bus(RankDriveEquations.OpenCircuitV(cells, ocv[2 * k + 1]), rb, idle, sumP, out _, out double iMidStep);
            time += stepAh * 3600.0 / iMidStep;
            peak = Math.Max(peak, iEnd);
        }
        o.RuntimeS = time;
        o.RuntimeLimit = limit;
        o.PeakPackCurrentA = peak;
        double bankContinuous = c.PackCount * pack.ContinuousCurrentA;
        if (peak > bankContinuous)
        {
            o.Reject(RankRejectionKind.PackCurrent);
        }
        o.CurrentMargin = Math.Min(Math.Min(1 - o.MaxCurrentA / motor.MaxCurrentA, 1 - o.MaxCurrentA / controller.ContinuousCurrentA), 1 - peak / bankContinuous);
    }

    // The trim at this mass and centre of gravity through HoverTrim's speed solve, warm-started from the worker's last
    // trim when asked (the fixed point does not depend on the start; a failed warm start falls back to the cold one).
    private bool Trim(double massKg, double cgXM, double cgYM, RankWorker w, bool warm)
        => HoverTrim.SolveSpeeds(_model.Stations, _model.DesignGapM, massKg * Units.StandardGravity, cgXM, cgYM, 0.0,
            w.TrimSpeeds, warm, _hoverOptions, w.TrimSpace, out _) == HoverTrim.SpeedSolve.Converged;

    // One state of charge of the run: false (with the limit in words) when the bus collapses, the loaded voltage is below
    // the cutoff, or the duty exceeds the limit.
    private static bool RunState(double voc, double rb, double idle, double sumP, double numMax, double cutoff, double maxDuty, out double ipack, out string failure)
    {
        if (!RankDriveEquations.Bus(voc, rb, idle, sumP, out double v, out ipack) || numMax / v > maxDuty)
        {
            failure = "duty headroom (the pack can no longer hold the hover speeds)";
            return false;
        }
        if (v < cutoff)
        {
            failure = "pack cutoff voltage";
            return false;
        }
        failure = "";
        return true;
    }

    // All rotors on the landing gear at their drag-peak speeds, full allowed duty under the current limit, full pack.
    private void SpinupCheckFast(RankCandidate c, Motor motor, SpeedController controller, double vocFull, double rb, RankWorker w)
    {
        if (w.DrivetrainMotor != c.MotorIndex || w.DrivetrainController != c.ControllerIndex || w.Drivetrain is null)
        {
            w.Drivetrain = new Drivetrain(motor, controller, new DriveOptions(MaxDuty: _rig.Limits.MaxDuty));
            w.DrivetrainMotor = c.MotorIndex;
            w.DrivetrainController = c.ControllerIndex;
        }
        int n = _model.Stations.Count;
        var command = new DriveCommand(DriveCommandKind.Duty, _rig.Limits.MaxDuty);
        for (int i = 0; i < n; i++)
        {
            w.Inputs[i] = new DriveInput(w.Drivetrain, command, _peaks[i].SpeedRadPerS, _rig.AmbientC, _rig.AmbientC, Braking: false);
        }
        var solution = DriveBus.Solve(new BusSource(vocFull, rb), w.Inputs, w.Points);
        JudgePeaks(solution, w.Points, _peakLoadTorqueNm, _peaks, w.Outcome);
    }

    private static void JudgePeaks(BusSolution solution, ReadOnlySpan<DrivePoint> points, IReadOnlyList<double> loadTorques, IReadOnlyList<DragPeak> peaks, RankOutcome o)
    {
        for (int i = 0; i < loadTorques.Count; i++)
        {
            if (peaks[i].Status == DragPeakStatus.NoDrag || !(loadTorques[i] > 0))
            {
                continue;
            }
            double torque = solution.Status == BusStatus.NoSolution ? 0.0 : points[i].TorqueNm;
            double ratio = torque / loadTorques[i];
            if (ratio < o.PeakTorqueRatio)
            {
                o.PeakTorqueRatio = ratio;
                o.PeakStation = i;
                o.PeakMotorTorqueNm = torque;
            }
        }
        if (o.PeakStation >= 0 && !(o.PeakTorqueRatio > 1))
        {
            o.Reject(RankRejectionKind.DragPeak);
        }
    }
}

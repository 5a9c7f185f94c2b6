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
        var bank = new PackBank(_catalog.Packs[candidate.PackIndex], candidate.PackCount, _packCurves[candidate.PackIndex]);
        var rig = _rig with
        {
            Stations = _rig.Stations.Select(s => s with { Motor = motor, Controller = controller }).ToArray(),
            Packs = bank,
        };
        o.MassKg = rig.TotalMassKg;
        if (!DirectCompatible(rig, motor, controller, bank, o))
        {
            return ToEvaluation(candidate, o);
        }
        DirectSpinup(rig, motor, controller, bank, o);

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

        var hover = new DirectHover(rig, bank, motor, controller, o);
        if (DirectHoverLimits(rig, hover, o))
        {
            DirectRuntime(rig, hover, o);
        }
        return ToEvaluation(candidate, o);
    }

    // The static checks through DriveCompatibility: false when the pack's cells are outside the controller's range.
    private bool DirectCompatible(Rig rig, Motor motor, SpeedController controller, PackBank bank, RankOutcome o)
    {
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
            return false;
        }
        return true;
    }

    // Spin-up through the drag peak, peaks searched again for this combination.
    private void DirectSpinup(Rig rig, Motor motor, SpeedController controller, PackBank bank, RankOutcome o)
    {
        int n = _model.Stations.Count;
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
    }

    // The hover on the shared bus: each motor draws the current its trimmed torque needs; no current limit or duty clamp
    // may interfere here.
    private sealed class DirectHover
    {
        private readonly Rig _rig;
        private readonly PackBank _bank;

        public DirectHover(Rig rig, PackBank bank, Motor motor, SpeedController controller, RankOutcome o)
        {
            _rig = rig;
            _bank = bank;
            Train = new Drivetrain(motor, controller, new DriveOptions(CurrentLimitScale: 1e9, MaxDuty: 1.0));
            double flux = Train.FluxFactorAt(rig.AmbientC);
            int n = o.Speeds.Length;
            Inputs = new DriveInput[n];
            for (int i = 0; i < n; i++)
            {
                Inputs[i] = new DriveInput(Train, DriveCommand.MotorCurrent(motor.CurrentForTorqueA(o.Torques[i], flux)), o.Speeds[i], rig.AmbientC, rig.AmbientC, Braking: false);
            }
            Points = new DrivePoint[n];
        }

        public Drivetrain Train { get; }

        public DriveInput[] Inputs { get; }

        public DrivePoint[] Points { get; }

        public PackBank Bank => _bank;

        public bool Delivered(BusSolution solution) => solution.Status == BusStatus.Solved && Points.All(p => p.Regime == DriveRegime.Regulating);

        // One state of charge: false (with the limit in words) when the hover is not delivered within the duty limit or
        // the loaded pack is below the cutoff.
        public bool At(double soc, out BusSolution solution, out string failure)
        {
            solution = DriveBus.Solve(BusSource.FromPack(_bank, soc), Inputs, Points);
            if (!Delivered(solution) || Points.Max(p => p.Duty) > _rig.Limits.MaxDuty)
            {
                failure = "duty headroom (the pack can no longer hold the hover speeds)";
                return false;
            }
            if (solution.BusVoltageV < _rig.Limits.CellCutoffV * _bank.CellsSeries)
            {
                failure = "pack cutoff voltage";
                return false;
            }
            failure = "";
            return true;
        }
    }

    // The limits at hover on a full pack through DriveMargins; false when the hover is not reached (no runtime then).
    private bool DirectHoverLimits(Rig rig, DirectHover hover, RankOutcome o)
    {
        int n = _model.Stations.Count;
        var motor = hover.Train.Motor;
        var controller = hover.Train.Controller;
        bool ok = hover.At(1.0, out var start, out _);
        bool delivered = hover.Delivered(start);
        double fastest = -1;
        // The motor side of a current-regulated point (current, terminal voltage I R + E, power) does not depend on the bus
        // voltage, so the ratings are checked at what the hover needs, even when this pack cannot deliver it.
        var needs = new DrivePoint[n];
        for (int i = 0; i < n; i++)
        {
            needs[i] = DriveBus.Evaluate(1e9, hover.Inputs[i]);
        }
        for (int i = 0; i < n; i++)
        {
            var margins = DriveMargins.ForStation(hover.Train, rig.Stations[i].Rotor, needs[i]);
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
            o.Duties[i] = hover.Points[i].Duty;
            o.MaxCurrentA = Math.Max(o.MaxCurrentA, margins[0].ValueSi);
            o.MaxMotorPowerW = Math.Max(o.MaxMotorPowerW, margins[1].ValueSi);
        }
        var fastestMargins = DriveMargins.ForStation(hover.Train, rig.Stations[o.FastestStation].Rotor, needs[o.FastestStation]);
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
        o.CutoffV = rig.Limits.CellCutoffV * hover.Bank.CellsSeries;
        o.NeededDuty = delivered ? hover.Points.Max(p => p.Duty) : double.PositiveInfinity;
        if (delivered)
        {
            o.BusVoltageV = start.BusVoltageV;
            o.PackCurrentA = start.PackCurrentA;
        }
        if (!delivered || o.NeededDuty > rig.Limits.MaxDuty)
        {
            o.Reject(RankRejectionKind.DutyHeadroom);
            return false;
        }
        if (!ok)
        {
            o.Reject(RankRejectionKind.PackCutoff);
            return false;
        }
        o.HoverReached = true;
        return true;
    }

    // Runtime: equal charge steps over the usable capacity, every bus state through DriveBus, the pack's current margin.
    private void DirectRuntime(Rig rig, DirectHover hover, RankOutcome o)
    {
        var bank = hover.Bank;
        int steps = _options.RuntimeSteps;
        double stepAh = rig.Limits.UsableCapacityFraction * bank.CapacityAh / steps;
        double time = 0, peak = o.PackCurrentA;
        string limit = "usable capacity";
        for (int k = 0; k < steps; k++)
        {
            if (!hover.At(SocAt(2 * k + 2), out var end, out string failure))
            {
                double good = SocAt(2 * k), bad = SocAt(2 * k + 2);
                for (int b = 0; b < 60; b++)
                {
                    double mid = 0.5 * (good + bad);
                    if (hover.At(mid, out var atMid, out string why))
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
                hover.At(0.5 * (SocAt(2 * k) + good), out var partial, out _);
                time += (SocAt(2 * k) - good) * bank.CapacityAh * 3600.0 / partial.PackCurrentA;
                limit = failure;
                break;
            }
            hover.At(SocAt(2 * k + 1), out var middle, out _);
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
        o.CurrentMargin = Math.Min(Math.Min(1 - o.MaxCurrentA / hover.Train.Motor.MaxCurrentA, 1 - o.MaxCurrentA / hover.Train.Controller.ContinuousCurrentA), packMargins[0].MarginFraction);
    }
}

using MathNet.Numerics.LinearAlgebra;
using MathNet.Numerics.RootFinding;
using RotorDrive.Core.Craft;
using RotorDrive.Core.Drive;
using RotorDrive.Core.Loads;
using RotorDrive.Core.Magnetics;
using RotorDrive.Core.Safety;
using RotorDrive.Core.Simulation;

namespace RotorDrive.Core.Studies.Stress;

/// <summary>Evaluates one stress sample of a rig: a spin-up at the landed gap and a trimmed hover at the design gap with
/// the sample's parts (see <see cref="RigStressModel"/>); one per worker thread.</summary>
/// <remarks>
/// <para>Spin-up: every rotor starts at rest; all controllers get one duty that ramps from 0 to limits.max_duty over the
/// ramp time and then holds; each controller limits its phase current to the sample's drawn limit; all share the pack
/// (DriveBus: Thevenin pack, averaged controllers, Drela's first-order motors). Rotor dynamics J domega/dt = motor torque -
/// load torque (eddy drag at the station's landed gap, windage, bearing drag), integrated with the Dormand-Prince 5(4)
/// integrator from rest until lift-off (the total lift at the landed gap reaches the weight; located as an integrator
/// event) or limits.liftoff_time_s, whichever comes first: the spin-up at full command that the trim then takes over from.
/// Heave is not simulated (the craft sits at the landed gap until lift-off). Stall is judged at each rotor's drag peak at
/// the landed gap: the torque the motor can give there (current at the drawn limit, or less if limits.max_duty on the
/// lowest bus voltage of the spin-up cannot drive it) against the load torque. The state of charge is held at its start value (a few seconds draw well
/// under 1 % of a pack) and the temperatures at their start values. Peaks and the time above continuous ratings are read
/// at the integrator's accepted steps (at most <see cref="StressModelOptions.MaxStepS"/> apart).</para>
/// <para>Trimmed hover: per-station speeds at the design gap (plus each station's offset) such that total lift equals the
/// weight, pitch and roll moments about the centre of gravity vanish and the rotors' reaction torques cancel in yaw
/// (reaction of a rotor on the frame = minus its shaft torque, signed by spin). Solved by Newton's method in speed space
/// from the common speed that carries the weight, each step the minimum-norm solution of the linearised constraints
/// (the Moore-Penrose pseudo-inverse via MathNet's SVD; G. H. Golub and C. F. Van Loan, "Matrix Computations", 4th ed.,
/// 2013, 5.5), which for more than four stations keeps the speed spread small. Duties and currents follow from the motor
/// model at the trimmed speeds on the shared bus (one quadratic in the bus voltage, as in DriveBus).</para>
/// <para>Yaw: the residual is the yaw torque with every station at the mean trimmed duty, linearised about the trim
/// (each station's speed moves by domega/dduty at fixed bus voltage, from the motor's torque-speed slope and the load's
/// torque slope); the authority is the sum over stations of the reaction torque each can add or remove by moving its duty
/// within its headroom to limits.max_duty, capped by its current headroom to the continuous ratings and the drawn limit
/// (above the drag peak the load torque falls with speed, so raising a duty can lower a torque; the small-signal
/// authority counts the magnitude either way). Both are first-order estimates about the trim, ignoring the lift change
/// the other stations re-level.</para>
/// </remarks>
internal sealed class RigStressEvaluator : IStressEvaluator
{
    private const double StandardGravity = 9.80665; // m/s^2, CGPM 1901 (conventional value).
    private const double FiniteDifference = 1e-4;

    private readonly RigStressModel _model;
    private readonly Rig _rig;
    private readonly int _n;
    private readonly DormandPrince45 _integrator;
    private readonly DriveInput[] _inputs;
    private readonly DrivePoint[] _points;
    private readonly TabulatedRotorLoad[][] _tables;
    private readonly double[] _inertia;
    private readonly double[] _remanenceScale;
    private readonly double[] _landedGap;
    private readonly double[] _designGap;
    private readonly double[] _w = new double[3];
    private Drivetrain[] _drives = [];
    private double _sigma;
    private double _busHint = double.NaN;
    private BusSource _source;
    private double _maxDuty;
    private double _ramp;

    public RigStressEvaluator(RigStressModel model)
    {
        _model = model;
        _rig = model.Rig;
        _n = _rig.Stations.Count;
        _integrator = new DormandPrince45(_n, new DormandPrince45Options
        {
            RelativeTolerance = model.Options.RelativeTolerance,
            AbsoluteTolerance = model.Options.AbsoluteToleranceRadPerS,
            MaxStepS = model.Options.MaxStepS,
        });
        _inputs = new DriveInput[_n];
        _points = new DrivePoint[_n];
        _tables = _rig.Stations.Select(s => model.TablesFor(s.Rotor)).ToArray();
        _inertia = _rig.Stations.Select(s => s.Rotor.InertiaKgM2).ToArray();
        _remanenceScale = new double[_n];
        _landedGap = new double[_n];
        _designGap = new double[_n];
    }

    public StressOutcome Evaluate(StressParts parts, bool recordTrace)
    {
        Preconditions.NotNull(parts, nameof(parts));
        if (parts.Stations.Count != _n)
        {
            throw new ArgumentException($"the parts have {parts.Stations.Count} stations; the rig has {_n}.", nameof(parts));
        }
        Prepare(parts);
        var spin = SpinUp(parts, recordTrace);
        var hover = Trim(parts);
        var margins = new double?[StressCriteria.All.Count];
        margins[(int)StressCriterion.Liftoff] = spin.LiftoffMargin;
        margins[(int)StressCriterion.Stall] = spin.StallMargin;
        margins[(int)StressCriterion.Currents] = spin.CurrentMargin;
        margins[(int)StressCriterion.PackVoltage] = spin.VoltageMargin;
        margins[(int)StressCriterion.Trim] = hover.TrimMargin;
        margins[(int)StressCriterion.Yaw] = hover.YawMargin;
        margins[(int)StressCriterion.Retainer] = hover.RetainerMargin;
        return new StressOutcome(
            margins,
            spin.LiftoffTimeS,
            spin.Stalled,
            spin.PeakMotorCurrentA,
            spin.PeakPackCurrentA,
            spin.MinBusVoltageV,
            hover.SpeedRpm,
            hover.CurrentA,
            hover.BusVoltageV,
            hover.YawResidualNm,
            hover.YawAuthorityNm,
            hover.Limit,
            spin.Trace);
    }

    // ---- per-sample setup ----

    private void Prepare(StressParts parts)
    {
        var material = _rig.Plate.Material;
        _sigma = PhysicsRotorLoad.PlateConductivity(material with { ConductivitySPerM = parts.PlateConductivitySPerM }, parts.PlateTempC);
        double h = _model.ThicknessStepM;
        if (h > 0)
        {
            // Three-point Lagrange weights at u = (d - d0) / h over the nodes -1, 0, +1 (Abramowitz & Stegun 25.2.11).
            double u = (parts.PlateThicknessM - _rig.Plate.ThicknessM) / h;
            _w[0] = 0.5 * u * (u - 1);
            _w[1] = 1 - u * u;
            _w[2] = 0.5 * u * (u + 1);
        }
        _drives = new Drivetrain[_n];
        for (int i = 0; i < _n; i++)
        {
            var station = _rig.Stations[i];
            var p = parts.Stations[i];
            var rotor = station.Rotor;
            double ratio = p.RemanenceT / rotor.RemanenceT;
            _remanenceScale[i] = ratio * ratio * PhysicsRotorLoad.RemanenceScale(rotor, parts.AmbientC);
            _landedGap[i] = Math.Max(0, _rig.LandedGapM + p.GapOffsetM);
            _designGap[i] = Math.Max(0, _rig.DesignGapM + p.GapOffsetM);
            var motor = station.Motor! with { KvRadPerSPerV = p.KvRadPerSPerV, ResistanceOhm = p.ResistanceOhm, NoLoadCurrentA = p.NoLoadCurrentA };
            var controller = station.Controller!;
            _drives[i] = new Drivetrain(motor, controller, new DriveOptions(CurrentLimitScale: p.CurrentLimitA / controller.BurstCurrentA));
        }
        var bank = _model.Packs;
        _source = new BusSource(bank.OpenCircuitVoltageAt(parts.SocFraction), parts.PackResistanceOhm);
        _maxDuty = _rig.Limits.MaxDuty;
        _ramp = _model.Options.RampTimeS;
        _busHint = double.NaN;
    }

    private double Weight(StressParts parts) => StandardGravity * (_rig.TotalMassKg - _rig.Body.PayloadKg + parts.PayloadKg);

    // Eddy lift and total shaft load torque of station i at a speed and gap.
    private void Load(int i, double speed, double gap, out double lift, out double torque)
    {
        var tables = _tables[i];
        double x = _sigma * speed;
        double l, q;
        if (tables.Length == 1)
        {
            (l, q) = tables[0].EddyAtSigmaOmega(x, gap);
        }
        else
        {
            var (l0, q0) = tables[0].EddyAtSigmaOmega(x, gap);
            var (l1, q1) = tables[1].EddyAtSigmaOmega(x, gap);
            var (l2, q2) = tables[2].EddyAtSigmaOmega(x, gap);
            l = _w[0] * l0 + _w[1] * l1 + _w[2] * l2;
            q = _w[0] * q0 + _w[1] * q1 + _w[2] * q2;
        }
        var (windage, bearing) = tables[0].Direct.MechanicalTorques(speed);
        lift = _remanenceScale[i] * l;
        torque = _remanenceScale[i] * q + windage + bearing;
    }

    private double DutyAt(double timeS) => _ramp > 0 ? _maxDuty * Math.Min(1.0, timeS / _ramp) : _maxDuty;

    private BusSolution SolveBus(double timeS, ReadOnlySpan<double> speeds, double ambientC)
    {
        double duty = DutyAt(timeS);
        for (int i = 0; i < _n; i++)
        {
            _inputs[i] = new DriveInput(_drives[i], new DriveCommand(DriveCommandKind.Duty, duty), Math.Max(0, speeds[i]), ambientC, ambientC, false);
        }
        var bus = DriveBus.Solve(_source, _inputs, _points, _busHint, DriveBusOptions.Default);
        if (bus.Status != BusStatus.NoSolution && bus.BusVoltageV > 0)
        {
            _busHint = bus.BusVoltageV;
        }
        return bus;
    }

    // ---- spin-up ----

    private readonly struct SpinSystem(RigStressEvaluator owner, double ambientC) : IOdeSystem
    {
        public void Derivatives(double timeS, ReadOnlySpan<double> state, Span<double> derivatives)
        {
            owner.SolveBus(timeS, state, ambientC);
            for (int i = 0; i < owner._n; i++)
            {
                double speed = Math.Max(0, state[i]);
                owner.Load(i, speed, owner._landedGap[i], out _, out double load);
                double accel = (owner._points[i].TorqueNm - load) / owner._inertia[i];
                derivatives[i] = speed <= 0 && accel < 0 ? 0 : accel;
            }
        }
    }

    // Lift-off: the total lift at the landed gap rises through the weight.
    private sealed class LiftoffEvent(RigStressEvaluator owner, double weightN) : IOdeEvents
    {
        public int Count => 1;

        public void Evaluate(double timeS, ReadOnlySpan<double> state, Span<double> values)
        {
            double lift = 0;
            for (int i = 0; i < owner._n; i++)
            {
                owner.Load(i, Math.Max(0, state[i]), owner._landedGap[i], out double l, out _);
                lift += l;
            }
            values[0] = lift - weightN;
        }

        public EventDirection Direction(int index) => EventDirection.Rising;
    }

    private sealed class SpinObserver(RigStressEvaluator owner, StressParts parts, bool recordTrace) : IOdeObserver
    {
        public readonly double[] AboveControllerS = new double[owner._n];
        public readonly double[] AboveMotorS = new double[owner._n];
        public readonly double[] PeakMotorA = new double[owner._n];
        public readonly List<StressTracePoint>? Trace = recordTrace ? [] : null;
        public double PeakPackA;
        public double MinBusV = double.PositiveInfinity;
        public double LastLiftN;
        private double _lastTime = double.NaN;
        private readonly bool[] _wasAboveController = new bool[owner._n];
        private readonly bool[] _wasAboveMotor = new bool[owner._n];

        public void Observe(double timeS, ReadOnlySpan<double> state, ObservationKind kind)
        {
            var bus = owner.SolveBus(timeS, state, parts.AmbientC);
            double lift = 0;
            for (int i = 0; i < owner._n; i++)
            {
                owner.Load(i, Math.Max(0, state[i]), owner._landedGap[i], out double l, out _);
                lift += l;
            }
            double dt = double.IsNaN(_lastTime) ? 0 : timeS - _lastTime;
            for (int i = 0; i < owner._n; i++)
            {
                var drive = owner._drives[i];
                double current = Math.Abs(owner._points[i].MotorCurrentA);
                PeakMotorA[i] = Math.Max(PeakMotorA[i], current);
                bool aboveController = current > drive.Controller.ContinuousCurrentA;
                bool aboveMotor = current > drive.Motor.MaxCurrentA;
                // Trapezoid on the indicator between accepted steps.
                AboveControllerS[i] += 0.5 * dt * ((aboveController ? 1 : 0) + (_wasAboveController[i] ? 1 : 0));
                AboveMotorS[i] += 0.5 * dt * ((aboveMotor ? 1 : 0) + (_wasAboveMotor[i] ? 1 : 0));
                _wasAboveController[i] = aboveController;
                _wasAboveMotor[i] = aboveMotor;
            }
            PeakPackA = Math.Max(PeakPackA, bus.PackCurrentA);
            MinBusV = Math.Min(MinBusV, bus.BusVoltageV);
            _lastTime = timeS;
            LastLiftN = lift;
            if (Trace is not null)
            {
                var speeds = new double[owner._n];
                var currents = new double[owner._n];
                for (int i = 0; i < owner._n; i++)
                {
                    speeds[i] = Math.Max(0, state[i]);
                    currents[i] = owner._points[i].MotorCurrentA;
                }
                Trace.Add(new StressTracePoint(timeS, owner.DutyAt(timeS), speeds, currents, bus.BusVoltageV, bus.PackCurrentA, lift));
            }
        }
    }

    private sealed record SpinFindings(
        double? LiftoffTimeS,
        double LiftoffMargin,
        int[] Stalled,
        double StallMargin,
        double CurrentMargin,
        double VoltageMargin,
        double PeakMotorCurrentA,
        double PeakPackCurrentA,
        double MinBusVoltageV,
        IReadOnlyList<StressTracePoint>? Trace);

    private SpinFindings SpinUp(StressParts parts, bool recordTrace)
    {
        double weight = Weight(parts);
        double horizon = _rig.Limits.LiftoffTimeS;
        Span<double> state = _n <= 32 ? stackalloc double[_n] : new double[_n];
        state.Clear();
        var observer = new SpinObserver(this, parts, recordTrace);
        var run = _integrator.Integrate(new SpinSystem(this, parts.AmbientC), 0.0, state, horizon, new LiftoffEvent(this, weight), observer);
        double? liftoff = run.Status == OdeStatus.EventHit ? run.TimeS : null;

        // Stall: at the speed of its drag peak at the landed gap, can the motor still out-pull the load? Available torque
        // with the current at the drawn limit, or at limits.max_duty if the bus (at its lowest during the spin-up) cannot
        // push that current against the back-EMF (Drela 2007); margin = available / load - 1.
        var stalled = new List<int>();
        double stallMargin = double.PositiveInfinity;
        double busLow = double.IsFinite(observer.MinBusV) ? observer.MinBusV : _source.OpenCircuitVoltageV;
        for (int i = 0; i < _n; i++)
        {
            var drive = _drives[i];
            double peak = DragPeakSpeed(i, _landedGap[i]);
            Load(i, peak, _landedGap[i], out _, out double loadTorque);
            double flux = drive.FluxFactorAt(parts.AmbientC);
            double emf = drive.Motor.BackEmfV(peak, flux);
            double current = Math.Min(drive.CurrentLimitA, (_maxDuty * busLow - emf) / drive.LoopResistanceAt(parts.AmbientC));
            double margin = drive.Motor.TorqueNm(current, flux) / loadTorque - 1;
            stallMargin = Math.Min(stallMargin, margin);
            if (margin < 0)
            {
                stalled.Add(i);
            }
        }

        double currentMargin = double.PositiveInfinity;
        for (int i = 0; i < _n; i++)
        {
            var drive = _drives[i];
            double burst = drive.Controller.BurstDurationS;
            currentMargin = Math.Min(currentMargin, 1 - observer.AboveControllerS[i] / burst);
            currentMargin = Math.Min(currentMargin, 1 - observer.AboveMotorS[i] / burst);
            currentMargin = Math.Min(currentMargin, 1 - observer.PeakMotorA[i] / drive.Controller.BurstCurrentA);
        }
        currentMargin = Math.Min(currentMargin, 1 - observer.PeakPackA / _model.Packs.BurstCurrentA);
        double cutoff = _model.Packs.CellsSeries * _rig.Limits.CellCutoffV;
        double liftoffMargin = liftoff is { } t ? (horizon - t) / horizon : observer.LastLiftN / weight - 1;
        return new SpinFindings(
            liftoff,
            liftoffMargin,
            stalled.ToArray(),
            stallMargin,
            currentMargin,
            observer.MinBusV / cutoff - 1,
            observer.PeakMotorA.Max(),
            observer.PeakPackA,
            observer.MinBusV,
            observer.Trace);
    }

    private sealed class StationLoad(RigStressEvaluator owner, int station) : IRotorLoad
    {
        public LoadPoint Evaluate(double speedRadPerS, double gapM, double plateTempC, double magnetTempC)
        {
            owner.Load(station, Math.Abs(speedRadPerS), gapM, out double lift, out double torque);
            return new LoadPoint(lift, torque, 0, 0, torque * speedRadPerS);
        }
    }

    private static readonly DragPeakOptions PeakSearch = new(ScanPoints: 32, LowestSpeedFraction: 1e-3, RelativeTolerance: 1e-5);

    private double DragPeakSpeed(int i, double gap)
    {
        double top = _tables[i][0].Range.MaxSpeedRadPerS;
        // Temperatures are already in the station's load (conductivity and remanence scale), so they are passed as 20 C.
        return DragPeakFinder.Find(new StationLoad(this, i), gap, 20, 20, top, PeakSearch).SpeedRadPerS;
    }

    // ---- trimmed hover ----

    private sealed record HoverFindings(
        double TrimMargin,
        double? YawMargin,
        double? RetainerMargin,
        double? SpeedRpm,
        double? CurrentA,
        double? BusVoltageV,
        double? YawResidualNm,
        double? YawAuthorityNm,
        string? Limit);

    private static HoverFindings NoTrim(string limit) => new(-1, -1, null, null, null, null, null, null, limit);

    private HoverFindings Trim(StressParts parts)
    {
        double weight = Weight(parts);
        var body = _rig.Body with
        {
            PayloadKg = parts.PayloadKg,
            CgXM = _rig.Body.CgXM + parts.CgOffsetXM,
            CgYM = _rig.Body.CgYM + parts.CgOffsetYM,
        };
        var (xc, yc) = (_rig with { Body = body }).CentreOfGravity();
        double top = _tables.Min(t => t[0].Range.MaxSpeedRadPerS);

        // Common speed that carries the weight: the starting point.
        double TotalLift(double speed)
        {
            double sum = 0;
            for (int i = 0; i < _n; i++)
            {
                Load(i, speed, _designGap[i], out double l, out _);
                sum += l;
            }
            return sum - weight;
        }
        if (TotalLift(top) < 0)
        {
            return NoTrim("lift_short");
        }
        if (!Brent.TryFindRoot(TotalLift, 1e-3 * top, top, 1e-9 * top, 200, out double common))
        {
            return NoTrim("no_solution");
        }

        int rows = Math.Min(4, _n);
        double span = 0;
        for (int i = 0; i < _n; i++)
        {
            span = Math.Max(span, Math.Sqrt(Math.Pow(_rig.Stations[i].XM - xc, 2) + Math.Pow(_rig.Stations[i].YM - yc, 2)));
        }
        var speed = Vector<double>.Build.Dense(_n, common);
        var lift = new double[_n];
        var torque = new double[_n];
        var liftSlope = new double[_n];
        var torqueSlope = new double[_n];
        var jacobian = Matrix<double>.Build.Dense(rows, _n);
        var residual = Vector<double>.Build.Dense(rows);
        bool converged = false;
        for (int iteration = 0; iteration < 50; iteration++)
        {
            double torqueScale = 0;
            for (int i = 0; i < _n; i++)
            {
                double w = speed[i], h = FiniteDifference * w;
                Load(i, w, _designGap[i], out lift[i], out torque[i]);
                Load(i, w + h, _designGap[i], out double lp, out double qp);
                Load(i, w - h, _designGap[i], out double lm, out double qm);
                liftSlope[i] = (lp - lm) / (2 * h);
                torqueSlope[i] = (qp - qm) / (2 * h);
                torqueScale += Math.Abs(torque[i]);
            }
            // Rows scaled to comparable sizes: force / W, moments / (W span), yaw / sum |Q|.
            double f = -weight, mx = 0, my = 0, yaw = 0;
            for (int i = 0; i < _n; i++)
            {
                var st = _rig.Stations[i];
                int sign = st.Spin.Sign();
                f += lift[i];
                mx += lift[i] * (st.YM - yc);
                my += lift[i] * (st.XM - xc);
                yaw += sign * torque[i];
                double[] column = [liftSlope[i] / weight, liftSlope[i] * (st.YM - yc) / (weight * span), liftSlope[i] * (st.XM - xc) / (weight * span), sign * torqueSlope[i] / torqueScale];
                for (int r = 0; r < rows; r++)
                {
                    jacobian[r, i] = column[r];
                }
            }
            double[] scaled = [f / weight, mx / (weight * span), my / (weight * span), yaw / torqueScale];
            double worst = 0;
            for (int r = 0; r < rows; r++)
            {
                residual[r] = scaled[r];
                worst = Math.Max(worst, Math.Abs(scaled[r]));
            }
            if (worst < 1e-10)
            {
                converged = true;
                break;
            }
            var step = jacobian.Svd(computeVectors: true).Solve(-residual);
            // Damp a step that would leave (0, top].
            double damping = 1;
            for (int i = 0; i < _n; i++)
            {
                double next = speed[i] + step[i];
                if (next <= 0.05 * common)
                {
                    damping = Math.Min(damping, 0.5 * (speed[i] - 0.05 * common) / -step[i]);
                }
                else if (next > top)
                {
                    damping = Math.Min(damping, 0.5 * (top - speed[i]) / step[i]);
                }
            }
            speed += damping * step;
            if (iteration == 49)
            {
                converged = worst < 1e-6;
            }
        }
        if (!converged)
        {
            return NoTrim("no_solution");
        }

        return Drives(parts, speed, torque, torqueSlope);
    }

    private HoverFindings Drives(StressParts parts, Vector<double> speed, double[] torque, double[] torqueSlope)
    {
        var limits = _rig.Limits;
        var bank = _model.Packs;
        double ambient = parts.AmbientC;
        var current = new double[_n];
        var loop = new double[_n];
        var emf = new double[_n];
        var flux = new double[_n];
        double power = 0, idle = 0;
        for (int i = 0; i < _n; i++)
        {
            var drive = _drives[i];
            flux[i] = drive.FluxFactorAt(ambient);
            current[i] = drive.Motor.CurrentForTorqueA(torque[i], flux[i]);
            loop[i] = drive.LoopResistanceAt(ambient);
            emf[i] = drive.Motor.BackEmfV(speed[i], flux[i]);
            power += (current[i] * loop[i] + emf[i]) * current[i];
            idle += drive.Controller.IdleCurrentA;
        }
        // Bus: V = Voc - R (sum P / V + idle)  =>  V^2 - (Voc - R idle) V + R sum P = 0; the larger root is the stable one.
        double voc = _source.OpenCircuitVoltageV, rp = _source.ResistanceOhm;
        double b = voc - rp * idle;
        double disc = b * b - 4 * rp * power;
        if (disc < 0)
        {
            return NoTrim("pack_collapse");
        }
        double v = 0.5 * (b + Math.Sqrt(disc));
        double packCurrent = power / v + idle;

        string? limit = null;
        double margin = double.PositiveInfinity;
        void Check(double m, string key)
        {
            if (m < margin)
            {
                margin = m;
                limit = key;
            }
        }
        var duty = new double[_n];
        double maxSpeed = 0, maxCurrent = 0;
        for (int i = 0; i < _n; i++)
        {
            var drive = _drives[i];
            var rotor = _rig.Stations[i].Rotor;
            duty[i] = (current[i] * loop[i] + emf[i]) / v;
            Check(1 - duty[i] / limits.MaxDuty, "duty_headroom");
            Check(1 - current[i] / drive.Motor.MaxCurrentA, "motor_current");
            Check(1 - current[i] / drive.Controller.ContinuousCurrentA, "controller_continuous_current");
            Check(1 - current[i] / drive.CurrentLimitA, "controller_current_limit");
            Check(1 - speed[i] / rotor.MaxSpeedRadPerS, "rotor_max_speed");
            Check(1 - drive.Motor.ElectricalRpm(speed[i]) / drive.Controller.MaxErpm, "controller_erpm");
            maxSpeed = Math.Max(maxSpeed, speed[i]);
            maxCurrent = Math.Max(maxCurrent, current[i]);
        }
        Check(1 - packCurrent / bank.ContinuousCurrentA, "pack_continuous_current");
        Check(v / (bank.CellsSeries * limits.CellCutoffV) - 1, "pack_cutoff_voltage");

        // Yaw, linearised about the trim at fixed bus voltage: a duty change dd moves station i's speed by k_i dd with
        // k_i = (phi V / (Kv Rt)) / (Q'_load + phi^2 / (Kv^2 Rt)) (Drela's motor: Q = phi (I - I0) / Kv, I = (d V - E) / Rt).
        double meanDuty = duty.Average();
        double residual = 0, authority = 0;
        for (int i = 0; i < _n; i++)
        {
            var drive = _drives[i];
            double kv = drive.Motor.KvRadPerSPerV;
            double dTorqueDDuty = flux[i] * v / (kv * loop[i]);
            double motorSlope = flux[i] * flux[i] / (kv * kv * loop[i]);
            double k = dTorqueDDuty / (torqueSlope[i] + motorSlope);
            int sign = _rig.Stations[i].Spin.Sign();
            residual += sign * torqueSlope[i] * k * (meanDuty - duty[i]);
            // Small-signal authority: the station can move its reaction torque either way by moving its duty by up to its
            // headroom to limits.max_duty, capped by the torque its remaining current headroom allows.
            double currentRoom = Math.Min(Math.Min(drive.Controller.ContinuousCurrentA, drive.Motor.MaxCurrentA), drive.CurrentLimitA) - current[i];
            double byDuty = Math.Abs(torqueSlope[i] * k) * Math.Max(0, limits.MaxDuty - duty[i]);
            authority += Math.Max(0, Math.Min(byDuty, flux[i] * Math.Max(0, currentRoom) / kv));
        }
        double yawResidual = Math.Abs(residual);
        double yawMargin = authority + yawResidual > 0 ? (authority - yawResidual) / (authority + yawResidual) : 0;

        double? retainer = null;
        for (int i = 0; i < _n; i++)
        {
            if (RotorSafety.Assess(_rig.Stations[i].Rotor, speed[i]).Margin is { } m)
            {
                retainer = retainer is { } r ? Math.Min(r, m) : m;
            }
        }
        return new HoverFindings(margin, yawMargin, retainer, Units.RadPerSToRpm(maxSpeed), maxCurrent, v, yawResidual, authority,
            margin < 0 ? limit : null);
    }
}

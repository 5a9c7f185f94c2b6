using RotorDrive.Core.Craft;
using RotorDrive.Core.Drive;
using RotorDrive.Core.Loads;
using RotorDrive.Core.Numerics;

namespace RotorDrive.Core.Simulation;

/// <summary>The right-hand side, events and observer of one spin-up or stop run (one instance per run, not shared).</summary>
/// <remarks>State layout for n stations (units chosen so one absolute tolerance suits every component):
/// [0, n) rotor speeds, rad/s; n gap, mm; n+1 heave velocity, mm/s; n+2 charge drawn, C; [n+3, 2n+3) winding
/// temperatures, C; [2n+3, 3n+3) plate patch temperatures, C; 3n+3 yaw rate, rad/s; 3n+4 yaw angle, rad;
/// [3n+5, 3n+12) energy integrals, J (pack chemical, pack internal, copper, controller, no-load, eddy, windage+bearing).</remarks>
internal sealed class SpinupModel : IOdeEvents, IOdeObserver
{
    public const int EnergyTerms = 7;
    private readonly SimulationRig _rig;
    private readonly ThrottleProfile _profile;
    private readonly SpinupOptions _options;
    private readonly int _n;
    private readonly double[] _inertia;
    private readonly int[] _sign;
    private readonly IRotorLoad[] _loads;
    private readonly Drivetrain[] _drives;
    private readonly DriveInput[] _inputs;
    private readonly DrivePoint[] _points;
    private readonly LoadPoint[] _loadPoints;
    private readonly double[] _scratch;
    private readonly double[] _gapOffsetM;
    private readonly double[] _rotorMagnetC;
    private readonly double[] _windingStartC;
    private readonly double[] _motorMagnetStartC;
    private readonly double[] _plateStartC;
    private readonly double _landedMm;
    private readonly MountKind _mount;
    private readonly double _socStart;
    private readonly double _chargeCapacityC;
    private double _voltageHint = double.NaN;

    // The (t, y) of the last evaluation, so that the algebra is not solved twice at one point (the integrator's last
    // stage, the event check and the observer all look at the end of an accepted step).
    private readonly double[] _lastY;
    private double _lastT = double.NaN;

    // Last evaluation's algebraic outputs.
    private BusSolution _bus;
    private double _lift;
    private double _yawTorque;
    private double _ocv;

    public SpinupModel(SimulationRig rig, ThrottleProfile profile, SpinupOptions options, double socStart, double durationS)
    {
        _rig = rig;
        _profile = profile;
        _options = options;
        _n = rig.StationCount;
        _inertia = new double[_n];
        _sign = new int[_n];
        _loads = rig.Loads.ToArray();
        _drives = rig.Drivetrains.ToArray();
        _gapOffsetM = new double[_n];
        _rotorMagnetC = new double[_n];
        _windingStartC = new double[_n];
        _motorMagnetStartC = new double[_n];
        _plateStartC = new double[_n];
        for (int j = 0; j < _n; j++)
        {
            var s = rig.Stations[j];
            _inertia[j] = s.Rotor.InertiaKgM2;
            _sign[j] = s.Spin.Sign();
            _gapOffsetM[j] = s.Conditions.GapOffsetM;
            _rotorMagnetC[j] = s.Conditions.RotorMagnetTempC;
            _windingStartC[j] = s.Conditions.WindingTempC;
            _motorMagnetStartC[j] = s.Conditions.MotorMagnetTempC;
            _plateStartC[j] = s.Conditions.PlateTempC;
        }
        _inputs = new DriveInput[_n];
        _points = new DrivePoint[_n];
        _loadPoints = new LoadPoint[_n];
        _scratch = new double[Dimension];
        _lastY = new double[Dimension];
        _landedMm = rig.Rig.StartGapM * 1000.0;
        _mount = rig.Rig.Mount;
        _socStart = socStart;
        _chargeCapacityC = rig.Packs.CapacityAh * 3600.0;
        Recorder = new SpinupRecorder(this, rig, options, durationS);
    }

    public int Dimension => 3 * _n + 5 + EnergyTerms;

    public int StationCount => _n;

    public bool Grounded { get; set; } = true;

    public SpinupRecorder Recorder { get; }

    public int Gap => _n;

    public int Velocity => _n + 1;

    public int Charge => _n + 2;

    public int Winding => _n + 3;

    public int PlateTemp => 2 * _n + 3;

    public int YawRate => 3 * _n + 3;

    public int YawAngle => 3 * _n + 4;

    public int EnergyStart => 3 * _n + 5;

    public ReadOnlySpan<DrivePoint> Points => _points;

    public ReadOnlySpan<LoadPoint> LoadPoints => _loadPoints;

    public BusSolution Bus => _bus;

    public double Lift => _lift;

    public double YawTorque => _yawTorque;

    public double SocAt(ReadOnlySpan<double> y) => _socStart - y[Charge] / _chargeCapacityC;

    /// <summary>Motor magnet temperature of station j at winding temperature tw: its start value plus the winding's rise
    /// (conservative: hot magnets give less torque per amp).</summary>
    public double MotorMagnetC(int j, double windingC) => _motorMagnetStartC[j] + (windingC - _windingStartC[j]);

    public double KineticEnergyJ(ReadOnlySpan<double> y)
    {
        double e = 0;
        for (int j = 0; j < _n; j++)
        {
            e += 0.5 * _inertia[j] * y[j] * y[j];
        }
        return e;
    }

    public void InitialState(Span<double> y, bool hovering)
    {
        y.Clear();
        var rig = _rig.Rig;
        for (int j = 0; j < _n; j++)
        {
            y[j] = hovering ? _rig.HoverSpeedsRadPerS[j] : 0.0;
            y[Winding + j] = _windingStartC[j];
            y[PlateTemp + j] = _plateStartC[j];
        }
        // A bench holds its rotors at the stands' gap throughout; a craft or sled starts at its steady gap or on its gear.
        y[Gap] = _mount == MountKind.Bench ? _landedMm : hovering ? (_rig.Hover.Balanced ? _rig.Hover.GapM : rig.DesignGapM) * 1000.0 : _landedMm;
        Grounded = !hovering || _mount == MountKind.Bench;
    }

    /// <summary>Evaluates the algebra (loads, bus) and the derivatives at (t, y).</summary>
    public void Derivatives(double t, ReadOnlySpan<double> y, Span<double> dy)
    {
        var rig = _rig.Rig;
        int n = _n;
        double gapM = Math.Max(y[Gap], 1e-3) / 1000.0;
        double soc = Math.Clamp(SocAt(y), 0.0, 1.0);
        var source = BusSource.FromPack(_rig.Packs, soc);
        _ocv = source.OpenCircuitVoltageV;
        double lift = 0;
        for (int j = 0; j < n; j++)
        {
            double w = Math.Max(y[j], 0.0);
            double tw = y[Winding + j];
            double tm = MotorMagnetC(j, tw);
            var load = _loads[j].Evaluate(w, Math.Max(gapM + _gapOffsetM[j], 1e-6), y[PlateTemp + j], _rotorMagnetC[j]);
            _loadPoints[j] = load;
            lift += load.LiftN;
            DriveCommand command;
            double target = _profile.ValueAt(j, t);
            if (_profile.Mode == ControllerMode.Duty)
            {
                command = new DriveCommand(DriveCommandKind.Duty, Math.Clamp(target, 0.0, 1.0));
            }
            else
            {
                var drive = _drives[j];
                double flux = drive.FluxFactorAt(tm);
                double torque = load.TotalTorqueNm + _inertia[j] * (_profile.RateAt(j, t) + _options.HoldBandwidthRadPerS * (target - w));
                double current = drive.Motor.CurrentForTorqueA(torque, flux);
                command = new DriveCommand(DriveCommandKind.MotorCurrent, current);
            }
            _inputs[j] = new DriveInput(_drives[j], command, w, tw, tm, _profile.Braking);
        }
        _lift = lift;
        _bus = DriveBus.Solve(source, _inputs, _points, _voltageHint, DriveBusOptions.Default);
        if (_bus.Status != BusStatus.NoSolution)
        {
            _voltageHint = _bus.BusVoltageV;
        }

        double yawTorque = 0, copper = 0, controller = 0, noLoad = 0, eddy = 0, mech = 0;
        for (int j = 0; j < n; j++)
        {
            ref readonly var p = ref _points[j];
            ref readonly var load = ref _loadPoints[j];
            double w = Math.Max(y[j], 0.0);
            double net = p.TorqueNm - load.TotalTorqueNm;
            // A rotor at rest stays at rest while the net torque would turn it backwards (static friction, no reversal).
            dy[j] = y[j] <= 0 && net < 0 ? 0.0 : net / _inertia[j];
            // Reaction on the frame: minus the motor torque in the rotor's spin sense.
            yawTorque -= _sign[j] * p.TorqueNm;
            double heatWinding = p.CopperLossW + p.NoLoadLossW;
            dy[Winding + j] = _rig.Windings[j] is { } wn ? wn.RateKPerS(heatWinding, y[Winding + j], rig.AmbientC) : 0.0;
            dy[PlateTemp + j] = _rig.PlatePatches[j].RateKPerS(load.EddyTorqueNm * w, y[PlateTemp + j], rig.AmbientC);
            copper += p.CopperLossW;
            controller += p.ControllerLossW;
            noLoad += p.NoLoadLossW;
            eddy += load.EddyTorqueNm * w;
            mech += (load.WindageTorqueNm + load.BearingTorqueNm) * w;
        }
        _yawTorque = yawTorque;

        if (Grounded)
        {
            dy[Gap] = 0;
            dy[Velocity] = 0;
        }
        else
        {
            dy[Gap] = y[Velocity];
            dy[Velocity] = 1000.0 * (lift - _rig.WeightN) / _rig.MassKg - _rig.HeaveDampingNsPerM / _rig.MassKg * y[Velocity];
        }
        double packCurrent = _bus.PackCurrentA;
        dy[Charge] = packCurrent;

        double yawInertia = _rig.Model.YawInertiaKgM2;
        double rate = y[YawRate];
        if (_mount != MountKind.Free)
        {
            // Rails or stands carry the yaw reaction: the rig does not turn.
            dy[YawRate] = 0;
        }
        else if (Grounded)
        {
            double friction = rig.GearYawFrictionNm;
            if (rate == 0 && Math.Abs(yawTorque) <= friction)
            {
                dy[YawRate] = 0;
            }
            else
            {
                double opposing = rate != 0 ? Math.Sign(rate) * friction : Math.Sign(yawTorque) * friction;
                dy[YawRate] = (yawTorque - opposing) / yawInertia;
            }
        }
        else
        {
            dy[YawRate] = yawTorque / yawInertia;
        }
        dy[YawAngle] = rate;

        int e = EnergyStart;
        dy[e] = _ocv * packCurrent;
        dy[e + 1] = packCurrent * packCurrent * _rig.Packs.ResistanceOhm;
        dy[e + 2] = copper;
        dy[e + 3] = controller;
        dy[e + 4] = noLoad;
        dy[e + 5] = eddy;
        dy[e + 6] = mech;
        _lastT = t;
        y.CopyTo(_lastY);
    }

    /// <summary>Evaluates the algebra at (t, y) without keeping the derivatives.</summary>
    public void EvaluateAt(double t, ReadOnlySpan<double> y)
    {
        if (t != _lastT || !y.SequenceEqual(_lastY))
        {
            Derivatives(t, y, _scratch);
        }
    }

    // Total lift at (t, y) from the loads alone (no bus solve), N.
    private double LiftAt(double t, ReadOnlySpan<double> y)
    {
        if (t == _lastT && y.SequenceEqual(_lastY))
        {
            return _lift;
        }
        double gapM = Math.Max(y[Gap], 1e-3) / 1000.0, lift = 0;
        for (int j = 0; j < _n; j++)
        {
            lift += _loads[j].Evaluate(Math.Max(y[j], 0.0), Math.Max(gapM + _gapOffsetM[j], 1e-6), y[PlateTemp + j], _rotorMagnetC[j]).LiftN;
        }
        return lift;
    }

    // Event 0: lift-off (lift - weight rises through 0 on the gear). Event 1: touch-down (gap falls to the landed gap).
    public int Count => 2;

    public void Evaluate(double timeS, ReadOnlySpan<double> state, Span<double> values)
    {
        if (_mount == MountKind.Bench)
        {
            // Stands never lift off nor land.
            values[0] = -1.0;
            values[1] = 1.0;
        }
        else if (Grounded)
        {
            values[0] = LiftAt(timeS, state) - _rig.WeightN;
            values[1] = 1.0;
        }
        else
        {
            values[0] = -1.0;
            values[1] = state[Gap] - _landedMm;
        }
    }

    public EventDirection Direction(int index) => index == 0 ? EventDirection.Rising : EventDirection.Falling;

    public void Observe(double timeS, ReadOnlySpan<double> state, ObservationKind kind)
    {
        EvaluateAt(timeS, state);
        Recorder.Record(timeS, state, kind);
    }
}

/// <summary>The struct face of the model for the integrator (specialised by the JIT).</summary>
internal readonly struct SpinupSystem(SpinupModel model) : IOdeSystem
{
    public void Derivatives(double timeS, ReadOnlySpan<double> state, Span<double> derivatives) => model.Derivatives(timeS, state, derivatives);
}

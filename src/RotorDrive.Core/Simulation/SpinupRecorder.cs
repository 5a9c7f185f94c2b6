using RotorDrive.Core.Numerics;

namespace RotorDrive.Core.Simulation;

/// <summary>Collects the output-grid samples of a run: traces, peaks, minimum and maximum bus voltage and the time each
/// current spent above its continuous rating (crossings interpolated linearly between samples).</summary>
internal sealed class SpinupRecorder
{
    private readonly SpinupModel _model;
    private readonly SimulationRig _rig;
    private readonly int _n;
    private readonly List<double> _time;
    private readonly List<double>[] _speed, _current, _winding, _plate;
    private readonly List<double> _gap, _lift, _voltage, _packCurrent, _soc, _yawTorque, _yawRate, _yawAngle;
    private readonly double[] _motorAbove, _controllerAbove, _peakMotor, _peakWinding, _peakPlate;
    private readonly double[] _prevMotorExcess, _prevControllerExcess;
    private double _prevPackExcess;
    private double _prevTime = double.NegativeInfinity;
    private readonly bool _full;

    public SpinupRecorder(SpinupModel model, SimulationRig rig, SpinupOptions options, double durationS)
    {
        _model = model;
        _rig = rig;
        _n = rig.StationCount;
        // Without a trace only the times, gaps and speeds are kept (the steady-hover search reads them).
        _full = options.RecordTrace;
        // One sample per grid point plus the start, the stop and the events: sized once, no regrowth.
        int capacity = (int)Math.Min(1e6, durationS / options.OutputIntervalS) + 8;
        int traced = _full ? capacity : 0;
        _time = new List<double>(capacity);
        _gap = new List<double>(capacity);
        _speed = NewLists(_n, capacity);
        _current = NewLists(_n, traced);
        _winding = NewLists(_n, traced);
        _plate = NewLists(_n, traced);
        _lift = new List<double>(traced);
        _voltage = new List<double>(traced);
        _packCurrent = new List<double>(traced);
        _soc = new List<double>(traced);
        _yawTorque = new List<double>(traced);
        _yawRate = new List<double>(traced);
        _yawAngle = new List<double>(traced);
        _motorAbove = new double[_n];
        _controllerAbove = new double[_n];
        _peakMotor = new double[_n];
        _peakWinding = Enumerable.Repeat(double.NegativeInfinity, _n).ToArray();
        _peakPlate = Enumerable.Repeat(double.NegativeInfinity, _n).ToArray();
        _prevMotorExcess = new double[_n];
        _prevControllerExcess = new double[_n];
    }

    public IReadOnlyList<double> Times => _time;

    public IReadOnlyList<double> Gaps => _gap;

    public IReadOnlyList<double> Speeds(int station) => _speed[station];

    public IReadOnlyList<double> Currents(int station) => _current[station];

    public double PeakMotorA(int station) => _peakMotor[station];

    public double MotorAboveS(int station) => _motorAbove[station];

    public double ControllerAboveS(int station) => _controllerAbove[station];

    public double PeakWindingC(int station) => _peakWinding[station];

    public double PeakPlateC(int station) => _peakPlate[station];

    public double PeakPackA { get; private set; }

    public double PackAboveS { get; private set; }

    public double PeakRegenA { get; private set; }

    public double MinVoltageV { get; private set; } = double.PositiveInfinity;

    public double MaxVoltageV { get; private set; } = double.NegativeInfinity;

    public double PeakYawTorqueNm { get; private set; }

    public double PeakYawRate { get; private set; }

    public bool Collapsed { get; private set; }

    public void Record(double t, ReadOnlySpan<double> y, ObservationKind kind)
    {
        if (t <= _prevTime)
        {
            return;
        }
        bool first = _prevTime == double.NegativeInfinity;
        double dt = first ? 0 : t - _prevTime;
        var points = _model.Points;
        var bus = _model.Bus;
        for (int j = 0; j < _n; j++)
        {
            double i = Math.Abs(points[j].MotorCurrentA);
            var drive = _rig.Drivetrains[j];
            double motorExcess = i - drive.Motor.MaxCurrentA;
            double controllerExcess = i - drive.Controller.ContinuousCurrentA;
            if (!first)
            {
                _motorAbove[j] += TimeAbove(_prevMotorExcess[j], motorExcess, dt);
                _controllerAbove[j] += TimeAbove(_prevControllerExcess[j], controllerExcess, dt);
            }
            _prevMotorExcess[j] = motorExcess;
            _prevControllerExcess[j] = controllerExcess;
            _peakMotor[j] = Math.Max(_peakMotor[j], i);
            _peakWinding[j] = Math.Max(_peakWinding[j], y[_model.Winding + j]);
            _peakPlate[j] = Math.Max(_peakPlate[j], y[_model.PlateTemp + j]);
            // A rotor braked to rest can overshoot zero by the integration error; it does not reverse (see the model).
            _speed[j].Add(Math.Max(y[j], 0.0));
            if (_full)
            {
                _current[j].Add(points[j].MotorCurrentA);
                _winding[j].Add(y[_model.Winding + j]);
                _plate[j].Add(y[_model.PlateTemp + j]);
            }
        }
        double pack = bus.PackCurrentA;
        double packExcess = Math.Abs(pack) - _rig.Packs.ContinuousCurrentA;
        if (!first)
        {
            PackAboveS += TimeAbove(_prevPackExcess, packExcess, dt);
        }
        _prevPackExcess = packExcess;
        PeakPackA = Math.Max(PeakPackA, Math.Abs(pack));
        PeakRegenA = Math.Max(PeakRegenA, -pack);
        if (bus.Status == Drive.BusStatus.Solved)
        {
            MinVoltageV = Math.Min(MinVoltageV, bus.BusVoltageV);
            MaxVoltageV = Math.Max(MaxVoltageV, bus.BusVoltageV);
        }
        else
        {
            Collapsed = true;
            MinVoltageV = Math.Min(MinVoltageV, bus.BusVoltageV);
        }
        PeakYawTorqueNm = Math.Max(PeakYawTorqueNm, Math.Abs(_model.YawTorque));
        PeakYawRate = Math.Max(PeakYawRate, Math.Abs(y[_model.YawRate]));
        _time.Add(t);
        _gap.Add(y[_model.Gap] / 1000.0);
        _prevTime = t;
        if (!_full)
        {
            return;
        }
        _lift.Add(_model.Lift);
        _voltage.Add(bus.BusVoltageV);
        _packCurrent.Add(pack);
        _soc.Add(_model.SocAt(y));
        _yawTorque.Add(_model.YawTorque);
        _yawRate.Add(y[_model.YawRate]);
        _yawAngle.Add(y[_model.YawAngle]);
    }

    public SpinupTrace ToTrace() => new(
        _time.ToArray(),
        Freeze(_speed),
        Freeze(_current),
        Freeze(_winding),
        Freeze(_plate),
        _gap.ToArray(),
        _lift.ToArray(),
        _voltage.ToArray(),
        _packCurrent.ToArray(),
        _soc.ToArray(),
        _yawTorque.ToArray(),
        _yawRate.ToArray(),
        _yawAngle.ToArray());

    // Time within one sample interval during which a linearly varying excess (current minus rating) is positive.
    private static double TimeAbove(double before, double after, double dt)
    {
        if (before > 0 && after > 0)
        {
            return dt;
        }
        if (before <= 0 && after <= 0)
        {
            return 0;
        }
        double positive = Math.Max(before, after);
        return dt * positive / (Math.Abs(before) + Math.Abs(after));
    }

    private static List<double>[] NewLists(int n, int capacity)
    {
        var lists = new List<double>[n];
        for (int j = 0; j < n; j++)
        {
            lists[j] = new List<double>(capacity);
        }
        return lists;
    }

    private static IReadOnlyList<IReadOnlyList<double>> Freeze(List<double>[] lists)
        => lists.Select(l => (IReadOnlyList<double>)l.ToArray()).ToArray();
}

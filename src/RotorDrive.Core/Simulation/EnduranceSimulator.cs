using RotorDrive.Core.Craft;
using RotorDrive.Core.Drive;

namespace RotorDrive.Core.Simulation;

/// <summary>Holds the rig in trimmed hover, in place or along a route, while the pack discharges and sags, the windings
/// and the plate heat, and stops at the first limit reached, naming it and the plate's hottest point.</summary>
/// <remarks>
/// <para>Quasi-static march: the electrical and rotor dynamics settle in well under a second, the state of charge and the
/// temperatures change over minutes, so at every instant the rig sits in its steady state for the present charge and
/// temperatures. Every evaluation re-solves <see cref="SteadyState.Solve"/> (a free craft's trim: force, pitch, roll and
/// yaw balance at the design gap; a guided sled's common or set duties; a bench's stations at their duties) on the rig model at the present state of charge with each station's present winding temperature and the mean
/// plate temperature under its magnet annulus (<see cref="RigModel.WithSoc"/>, <see cref="RigModel.WithStationConditions"/>):
/// the falling conductivity of a hot plate raises a station's speed, a hot winding its loss, a sagging pack the duties.
/// Charge drawn and winding temperatures advance by Heun's method (explicit trapezoidal rule) over the lumped winding
/// nodes (<see cref="WindingThermalNode"/>; F. P. Incropera et al., "Fundamentals of Heat and Mass Transfer", 5.2).</para>
/// <para>The plate is a 2-D sheet (<see cref="Thermal.PlateSheet"/>, ../DESIGN.md 4.8) whose field is advanced exactly
/// over each step for the step's eddy powers (the mean of the powers at both ends, Heun's corrector) and the craft's
/// velocity on its route: each rotor's eddy power is spread over its magnet annulus as the load model's radial strips
/// give it (taken at the start hover), uniform in angle. The conductivity is the catalog's or, absent, the
/// Wiedemann-Franz estimate at the starting plate temperature; the plate starts uniform at the mean of the stations'
/// plate temperatures. The run stops when the hottest point of the plate reaches the rig's limit.</para>
/// <para>The first limit inside a step is located by bisection on the state interpolated linearly across the step (the
/// plate's hottest temperature too), so a draw at constant current ends at exactly capacity x usable fraction / current;
/// the plate field is then advanced exactly to that instant.</para>
/// <para>Thread safety: <see cref="Run"/> allocates its own buffers; runs may share one <see cref="SimulationRig"/>.
/// Cost: two trims per step (about 0.1 ms each on the six-station demo rig), two passes over the plate's modes and one
/// inverse FFT for its hottest point.</para>
/// </remarks>
public static class EnduranceSimulator
{
    // Progress is reported this often, in steps (a step costs tens of microseconds).
    private const int ProgressEverySteps = 64;

    /// <summary>Runs an endurance simulation from a state of charge, with each station's winding at its conditions'
    /// temperature and the plate at theirs.</summary>
    /// <param name="rig">The prepared rig.</param>
    /// <param name="socFraction">State of charge at the start, 0..1, or null for the rig model's.</param>
    /// <param name="options">Settings, or null for <see cref="EnduranceOptions.Default"/>.</param>
    /// <param name="cancel">Checked once per step.</param>
    /// <param name="progress">Progress 0..1 (the larger of the charge used and the time used), reported every few steps;
    /// or null.</param>
    /// <returns>Runtime, first limit, traces and the plate field.</returns>
    /// <exception cref="ArgumentNullException">The rig is null.</exception>
    /// <exception cref="ArgumentOutOfRangeException">A value is out of range.</exception>
    /// <exception cref="OperationCanceledException">Cancelled.</exception>
    public static EnduranceResult Run(SimulationRig rig, double? socFraction = null, EnduranceOptions? options = null,
        CancellationToken cancel = default, IProgress<double>? progress = null)
    {
        Preconditions.NotNull(rig, nameof(rig));
        double soc = Preconditions.InRange(socFraction ?? rig.SocFraction, 0, 1, nameof(socFraction));
        options ??= EnduranceOptions.Default;
        Preconditions.Positive(options.StepS, nameof(options.StepS));
        Preconditions.Positive(options.MaxDurationS, nameof(options.MaxDurationS));
        Preconditions.InRange(options.LimitBisections, 1, 200, nameof(options.LimitBisections));
        Preconditions.Positive(options.PlateMarginLengths, nameof(options.PlateMarginLengths));
        Preconditions.InRange(options.PlateMaxGrid, 16, 1024, nameof(options.PlateMaxGrid));

        var march = new March(rig, soc);
        int n = rig.StationCount;
        int dim = 1 + 2 * n;
        var s0 = new double[dim];
        for (int j = 0; j < n; j++)
        {
            s0[1 + j] = rig.Stations[j].Conditions.WindingTempC;
            s0[1 + n + j] = rig.Stations[j].Conditions.PlateTempC;
        }
        var start = march.Evaluate(s0);
        var route = new RouteCursor(rig.Rig.Route);
        var plate = PlateField.Create(rig, start.Hover!, start.PackCurrent, soc, options);
        plate.Solver.Means(s0.AsSpan(1 + n, n));
        start = march.Evaluate(s0);
        var hot = plate.Solver.Hottest();
        double limitC = rig.Rig.Limits.PlateTempC;
        double? plateLimitTime = hot.TemperatureC >= limitC ? 0.0 : null;
        var trace = new TraceBuilder(n);
        double peakWinding = s0.Skip(1).Take(n).Max(), peakPlate = hot.TemperatureC;
        var (limit, station) = march.Violation(s0, start, hot, options.StopAtPlateLimit);
        double t = 0;
        int steps = 0;
        var k0 = new double[dim];
        var k1 = new double[dim];
        var s1 = new double[dim];
        var sMid = new double[dim];
        var power = new double[n];
        var point = start;
        var snapshot = plate.Solver.Save();
        if (options.RecordTrace)
        {
            trace.Add(t, s0, point, march, hot.TemperatureC, route);
        }
        while (limit is null)
        {
            cancel.ThrowIfCancellationRequested();
            if (progress is not null && steps % ProgressEverySteps == 0)
            {
                progress.Report(Math.Clamp(Math.Max(t / options.MaxDurationS, soc > 0 ? 1 - march.Soc(s0) / soc : 0), 0, 1));
            }
            double h = Math.Min(Math.Min(options.StepS, options.MaxDurationS - t), route.TimeLeftS);
            if (options.MaxDurationS - t <= 0)
            {
                limit = EnduranceLimit.TimeLimit;
                break;
            }
            double vx = route.VxMPerS, vy = route.VyMPerS;
            // Heun: predictor with the rates and eddy powers at the start, corrector with the mean of start and end.
            march.Rates(s0, point, k0);
            for (int i = 0; i <= n; i++)
            {
                s1[i] = s0[i] + h * k0[i];
            }
            plate.Solver.MeansAfter(point.PlateHeat, h, vx, vy, s1.AsSpan(1 + n, n));
            var predicted = march.Evaluate(s1);
            Array.Copy(point.PlateHeat, power, n);
            if (predicted.Trimmed)
            {
                march.Rates(s1, predicted, k1);
                for (int i = 0; i <= n; i++)
                {
                    s1[i] = s0[i] + 0.5 * h * (k0[i] + k1[i]);
                }
                for (int j = 0; j < n; j++)
                {
                    power[j] = 0.5 * (point.PlateHeat[j] + predicted.PlateHeat[j]);
                }
            }
            plate.Solver.Save(snapshot);
            plate.Solver.Advance(power, h, vx, vy);
            plate.Solver.Means(s1.AsSpan(1 + n, n));
            var end = march.Evaluate(s1);
            var hotEnd = plate.Solver.Hottest();
            var (endLimit, endStation) = march.Violation(s1, end, hotEnd, options.StopAtPlateLimit);
            steps++;
            if (plateLimitTime is null && hotEnd.TemperatureC >= limitC)
            {
                double f = (limitC - hot.TemperatureC) / (hotEnd.TemperatureC - hot.TemperatureC);
                plateLimitTime = t + Math.Clamp(f, 0, 1) * h;
            }
            if (endLimit is not null)
            {
                // Bisection for the first violation on the state interpolated linearly across the step.
                double lo = 0, hi = 1;
                (limit, station) = (endLimit, endStation);
                for (int b = 0; b < options.LimitBisections; b++)
                {
                    double mid = 0.5 * (lo + hi);
                    for (int i = 0; i < dim; i++)
                    {
                        sMid[i] = s0[i] + mid * (s1[i] - s0[i]);
                    }
                    var hotMid = hot with { TemperatureC = hot.TemperatureC + mid * (hotEnd.TemperatureC - hot.TemperatureC) };
                    var (midLimit, midStation) = march.Violation(sMid, march.Evaluate(sMid), hotMid, options.StopAtPlateLimit);
                    if (midLimit is null)
                    {
                        lo = mid;
                    }
                    else
                    {
                        hi = mid;
                        (limit, station) = (midLimit, midStation);
                    }
                }
                if (limit == EnduranceLimit.PlateTemperature)
                {
                    // The peak does not rise linearly across a step: find the instant the field's own hottest point
                    // reaches the limit by regula falsi with the Illinois modification (exact advances of the field;
                    // M. Dowell & P. Jarratt, BIT 11, 1971).
                    hi = PlateLimitFraction(plate.Solver, snapshot, power, h, vx, vy, hot.TemperatureC - limitC, hotEnd.TemperatureC - limitC, limitC);
                }
                for (int i = 0; i <= n; i++)
                {
                    s1[i] = s0[i] + hi * (s1[i] - s0[i]);
                }
                plate.Solver.Restore(snapshot);
                plate.Solver.Advance(power, hi * h, vx, vy);
                plate.Solver.Means(s1.AsSpan(1 + n, n));
                t += hi * h;
                route.Advance(hi * h);
                end = march.Evaluate(s1);
                hotEnd = plate.Solver.Hottest();
                if (limit == EnduranceLimit.PlateTemperature)
                {
                    station = plate.NearestStation(hotEnd, route);
                    plateLimitTime = t;
                }
            }
            else
            {
                t += h;
                route.Advance(h);
            }
            Array.Copy(s1, s0, dim);
            point = end;
            hot = hotEnd;
            for (int j = 0; j < n; j++)
            {
                peakWinding = Math.Max(peakWinding, s0[1 + j]);
            }
            peakPlate = Math.Max(peakPlate, hot.TemperatureC);
            if (options.RecordTrace)
            {
                trace.Add(t, s0, point, march, hot.TemperatureC, route);
            }
        }
        return new EnduranceResult(
            t,
            limit.Value,
            march.Describe(limit.Value, station, options.MaxDurationS, hot),
            station,
            start.Hover!,
            start.PackCurrent,
            march.Soc(s0),
            point.Trimmed ? point.BusVoltage : 0.0,
            point.Trimmed ? point.PackCurrent : 0.0,
            peakWinding,
            peakPlate,
            steps,
            options.RecordTrace ? trace.Build() : null)
        {
            PlateHotspot = hot,
            PlateMap = plate.Solver.Field(),
            PlatePeakTraceC = options.RecordTrace ? trace.Peaks() : null,
            CraftPositionTraceM = options.RecordTrace ? trace.Positions() : null,
            PlateLimitTimeS = plateLimitTime,
            PlateSetup = plate.Setup,
        };
    }

    // The fraction of the step at which the hottest point of the field reaches the limit, given the excess over the limit
    // at both ends (below, then at or above it).
    private static double PlateLimitFraction(Thermal.PlateHeatSolver solver, Thermal.PlateHeatSolver.Snapshot snapshot, double[] power, double h,
        double vx, double vy, double f0, double f1, double limitC)
    {
        if (!(f0 < 0) || !(f1 >= 0))
        {
            return f0 >= 0 ? 0.0 : 1.0;
        }
        double a = 0, b = 1, fa = f0, fb = f1;
        int side = 0;
        for (int iteration = 0; iteration < 30 && b - a > 1e-12; iteration++)
        {
            double c = (a * fb - b * fa) / (fb - fa);
            solver.Restore(snapshot);
            solver.Advance(power, Math.Max(c, 1e-12) * h, vx, vy);
            double fc = solver.Hottest().TemperatureC - limitC;
            if (Math.Abs(fc) < 1e-7)
            {
                return c;
            }
            if (fc < 0)
            {
                (a, fa) = (c, fc);
                fb = side == -1 ? 0.5 * fb : fb;
                side = -1;
            }
            else
            {
                (b, fb) = (c, fc);
                fa = side == 1 ? 0.5 * fa : fa;
                side = 1;
            }
        }
        return b;
    }

    // The trimmed hover at one state: [charge drawn C, winding temperatures, plate temperatures].
    private sealed class HoverPoint(int n)
    {
        public HoverResult? Hover;
        public bool Trimmed;
        public double BusVoltage;
        public double PackCurrent;
        public double YawTorque;
        public readonly double[] Speed = new double[n];
        public readonly double[] Current = new double[n];
        public readonly double[] WindingHeat = new double[n];
        public readonly double[] PlateHeat = new double[n];
    }

    private sealed class March
    {
        private readonly SimulationRig _rig;
        private readonly Rig _r;
        private readonly int _n;
        private readonly double _soc0;
        private readonly double _capacityC;
        private readonly StationConditions[] _conditions;

        public March(SimulationRig rig, double soc0)
        {
            _rig = rig;
            _r = rig.Rig;
            _n = rig.StationCount;
            _soc0 = soc0;
            _capacityC = rig.Packs.CapacityAh * 3600.0;
            _conditions = new StationConditions[_n];
        }

        public double Soc(double[] s) => _soc0 - s[0] / _capacityC;

        // Re-trims the model at this state: its state of charge, and per station the present plate patch and winding
        // temperatures (the motor magnets rise with the winding).
        public HoverPoint Evaluate(double[] s)
        {
            var p = new HoverPoint(_n);
            for (int j = 0; j < _n; j++)
            {
                var c = _rig.Stations[j].Conditions;
                double tw = s[1 + j];
                _conditions[j] = c with { PlateTempC = s[1 + _n + j], WindingTempC = tw, MotorMagnetTempC = c.MotorMagnetTempC + (tw - c.WindingTempC) };
            }
            var model = _rig.Model.WithSoc(Math.Clamp(Soc(s), 0, 1)).WithStationConditions(_conditions);
            var hover = SteadyState.Solve(model, _rig.Options.Hover);
            p.Hover = hover;
            if (!hover.Balanced)
            {
                return p;
            }
            p.Trimmed = hover.BusVoltageV > 0;
            for (int j = 0; j < _n; j++)
            {
                var h = hover.Stations[j];
                var station = model.Stations[j];
                var motor = station.Drivetrain.Motor;
                if (h.Regime is not DriveRegime.Regulating)
                {
                    p.Trimmed = false;
                }
                p.Speed[j] = h.SpeedRadPerS;
                p.Current[j] = h.MotorCurrentA;
                // Winding heat: copper loss I^2 R(T) and the no-load loss I0 E (Drela 2007), as the drive model books them.
                p.WindingHeat[j] = WindingThermalNode.HeatW(motor, h.MotorCurrentA, h.SpeedRadPerS, station.Conditions.WindingTempC, station.FluxFactor);
                p.PlateHeat[j] = h.EddyPowerW;
            }
            p.BusVoltage = hover.BusVoltageV;
            p.PackCurrent = hover.PackCurrentA;
            p.YawTorque = hover.YawTorqueNm;
            return p;
        }

        public void Rates(double[] s, HoverPoint p, double[] ds)
        {
            ds[0] = p.PackCurrent;
            for (int j = 0; j < _n; j++)
            {
                ds[1 + j] = _rig.Windings[j] is { } wn ? wn.RateKPerS(p.WindingHeat[j], s[1 + j], _r.AmbientC) : 0.0;
                ds[1 + _n + j] = 0.0;
            }
        }

        // The first limit broken at this state, in the order of the enum, with its station; (null, null) when none.
        public (EnduranceLimit?, int?) Violation(double[] s, HoverPoint p, Thermal.PlateHotspot hot, bool plateLimit)
        {
            if (!p.Trimmed)
            {
                return (EnduranceLimit.TrimLost, null);
            }
            var packs = _rig.Packs;
            if (p.BusVoltage <= packs.CellsSeries * _r.Limits.CellCutoffV)
            {
                return (EnduranceLimit.PackCutoff, null);
            }
            if (Soc(s) <= 1 - _r.Limits.UsableCapacityFraction)
            {
                return (EnduranceLimit.UsableCapacity, null);
            }
            for (int j = 0; j < _n; j++)
            {
                if (_rig.Drivetrains[j].Motor.MaxWindingTempC is { } max && _rig.Windings[j] is not null && s[1 + j] >= max)
                {
                    return (EnduranceLimit.WindingTemperature, j);
                }
            }
            for (int j = 0; j < _n; j++)
            {
                if (Math.Abs(p.Current[j]) > _rig.Drivetrains[j].Motor.MaxCurrentA)
                {
                    return (EnduranceLimit.MotorCurrent, j);
                }
            }
            for (int j = 0; j < _n; j++)
            {
                if (Math.Abs(p.Current[j]) > _rig.Drivetrains[j].Controller.ContinuousCurrentA)
                {
                    return (EnduranceLimit.ControllerCurrent, j);
                }
            }
            if (p.PackCurrent > packs.ContinuousCurrentA)
            {
                return (EnduranceLimit.PackCurrent, null);
            }
            if (plateLimit && hot.TemperatureC >= _r.Limits.PlateTempC)
            {
                return (EnduranceLimit.PlateTemperature, null);
            }
            return (null, null);
        }

        public string Describe(EnduranceLimit limit, int? station, double maxDurationS, Thermal.PlateHotspot hot)
        {
            var inv = System.Globalization.CultureInfo.InvariantCulture;
            string At(double v, string unit) => v.ToString("0.#", inv) + " " + unit;
            var packs = _rig.Packs;
            return limit switch
            {
                EnduranceLimit.TimeLimit => $"none: the run reached its time limit of {At(maxDurationS, "s")}",
                EnduranceLimit.PackCutoff => $"pack cutoff voltage ({At(packs.CellsSeries * _r.Limits.CellCutoffV, "V")}: {packs.CellsSeries} cells x {At(_r.Limits.CellCutoffV, "V")})",
                EnduranceLimit.UsableCapacity => $"usable pack capacity ({At(100 * _r.Limits.UsableCapacityFraction, "%")} of {At(packs.CapacityAh, "A h")})",
                EnduranceLimit.TrimLost => _r.Mount switch
                {
                    MountKind.Guided => "the guided hover no longer exists (the rotors or controllers can no longer carry the sled)",
                    MountKind.Bench => "the stations' steady state no longer exists (a rotor or controller can no longer hold its duty)",
                    _ => "the hover trim no longer exists (the rotors or controllers can no longer hold the design gap)",
                },
                EnduranceLimit.WindingTemperature => $"winding temperature of station {station + 1} ({At(_rig.Drivetrains[station!.Value].Motor.MaxWindingTempC ?? 0, "C")})",
                EnduranceLimit.MotorCurrent => $"motor current of station {station + 1} above its continuous {At(_rig.Drivetrains[station!.Value].Motor.MaxCurrentA, "A")}",
                EnduranceLimit.ControllerCurrent => $"controller current of station {station + 1} above its continuous {At(_rig.Drivetrains[station!.Value].Controller.ContinuousCurrentA, "A")}",
                EnduranceLimit.PackCurrent => $"pack current above its continuous {At(packs.ContinuousCurrentA, "A")}",
                EnduranceLimit.PlateTemperature => $"plate temperature ({At(_r.Limits.PlateTempC, "C")} limit) at x {At(hot.XM * 1000, "mm")}, y {At(hot.YM * 1000, "mm")}"
                    + (station is { } j ? $", nearest station {j + 1}" : string.Empty),
                _ => limit.ToString(),
            };
        }
    }

    private sealed class TraceBuilder(int n)
    {
        private readonly List<double> _t = [], _gap = [], _lift = [], _v = [], _i = [], _soc = [], _yaw = [], _zero = [], _peak = [];
        private readonly List<(double XM, double YM)> _position = [];
        private readonly List<double>[] _speed = Lists(n), _current = Lists(n), _winding = Lists(n), _plate = Lists(n);

        public void Add(double t, double[] s, HoverPoint p, March march, double peakC, RouteCursor route)
        {
            _t.Add(t);
            _peak.Add(peakC);
            _position.Add((route.XM, route.YM));
            for (int j = 0; j < n; j++)
            {
                _speed[j].Add(p.Speed[j]);
                _current[j].Add(p.Current[j]);
                _winding[j].Add(s[1 + j]);
                _plate[j].Add(s[1 + n + j]);
            }
            _gap.Add(p.Trimmed ? p.Hover!.GapM : 0);
            _lift.Add(p.Trimmed ? p.Hover!.Stations.Sum(s => s.LiftN) : 0);
            _v.Add(p.BusVoltage);
            _i.Add(p.PackCurrent);
            _soc.Add(march.Soc(s));
            _yaw.Add(p.YawTorque);
            _zero.Add(0);
        }

        public SpinupTrace Build() => new(
            _t.ToArray(), Freeze(_speed), Freeze(_current), Freeze(_winding), Freeze(_plate),
            _gap.ToArray(), _lift.ToArray(), _v.ToArray(), _i.ToArray(), _soc.ToArray(), _yaw.ToArray(), _zero.ToArray(), _zero.ToArray());

        public IReadOnlyList<double> Peaks() => _peak.ToArray();

        public IReadOnlyList<(double XM, double YM)> Positions() => _position.ToArray();

        private static List<double>[] Lists(int count) => Enumerable.Range(0, count).Select(_ => new List<double>()).ToArray();

        private static IReadOnlyList<IReadOnlyList<double>> Freeze(List<double>[] lists) => lists.Select(l => (IReadOnlyList<double>)l.ToArray()).ToArray();
    }
}

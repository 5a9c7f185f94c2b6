using RotorDrive.Core.Craft;
using RotorDrive.Core.Drive;

namespace RotorDrive.Core.Simulation;

/// <summary>Holds the rig in trimmed hover while the pack discharges and sags, the windings and the plate under each rotor
/// heat, and stops at the first limit reached, naming it.</summary>
/// <remarks>
/// <para>Quasi-static march: the electrical and rotor dynamics settle in well under a second, the state of charge and the
/// temperatures change over minutes, so at every instant the rig sits in its trimmed hover for the present charge and
/// temperatures. Each step re-trims (common hover speed at the design gap from the load tables at each patch's plate
/// temperature, so the falling conductivity of a hot plate raises the hover speed; each motor carries its rotor's load
/// torque: I = Kv Q / phi + I0, M. Drela, "First-Order DC Electric Motor Model", MIT, 2007; the bus of
/// <see cref="DriveBus"/> gives the duties, bus voltage and pack current) and advances charge drawn and temperatures by
/// Heun's method (explicit trapezoidal rule) over the lumped nodes (<see cref="WindingThermalNode"/>,
/// <see cref="PlatePatchThermalNode"/>; F. P. Incropera et al., "Fundamentals of Heat and Mass Transfer", 5.2).</para>
/// <para>The first limit inside a step is located by bisection on the state interpolated linearly across the step, so a
/// draw at constant current ends at exactly capacity x usable fraction / current.</para>
/// <para>Thread safety: <see cref="Run"/> allocates its own buffers; runs may share one <see cref="SimulationRig"/>.
/// Cost: about 30 us per step on the six-station demo rig (a trim is a Brent root of the total lift plus one bus solve).</para>
/// </remarks>
public static class EnduranceSimulator
{
    /// <summary>Runs an endurance simulation from a state of charge, with windings at ambient and the plate at the rig's
    /// plate temperature.</summary>
    /// <param name="rig">The prepared rig.</param>
    /// <param name="socFraction">State of charge at the start, 0..1.</param>
    /// <param name="options">Settings, or null for <see cref="EnduranceOptions.Default"/>.</param>
    /// <returns>Runtime, first limit and traces.</returns>
    /// <exception cref="ArgumentNullException">The rig is null.</exception>
    /// <exception cref="ArgumentOutOfRangeException">A value is out of range.</exception>
    public static EnduranceResult Run(SimulationRig rig, double socFraction = 1.0, EnduranceOptions? options = null)
    {
        Preconditions.NotNull(rig, nameof(rig));
        Preconditions.InRange(socFraction, 0, 1, nameof(socFraction));
        options ??= EnduranceOptions.Default;
        Preconditions.Positive(options.StepS, nameof(options.StepS));
        Preconditions.Positive(options.MaxDurationS, nameof(options.MaxDurationS));
        Preconditions.InRange(options.LimitBisections, 1, 200, nameof(options.LimitBisections));

        var march = new March(rig, socFraction);
        int n = rig.StationCount;
        int dim = 1 + 2 * n;
        var s0 = new double[dim];
        s0[0] = 0;
        for (int j = 0; j < n; j++)
        {
            s0[1 + j] = rig.Rig.AmbientC;
            s0[1 + n + j] = rig.Rig.PlateTemperatureC;
        }
        var trace = new TraceBuilder(n);
        var start = march.Evaluate(s0);
        double startSpeed = start.Speed, startCurrent = start.PackCurrent;
        double peakWinding = s0.Skip(1).Take(n).Max(), peakPlate = s0.Skip(1 + n).Max();
        var (limit, station) = march.Violation(s0, start);
        double t = 0;
        int steps = 0;
        var k0 = new double[dim];
        var k1 = new double[dim];
        var s1 = new double[dim];
        var sMid = new double[dim];
        var point = start;
        if (options.RecordTrace)
        {
            trace.Add(t, s0, point, march);
        }
        while (limit is null)
        {
            double h = Math.Min(options.StepS, options.MaxDurationS - t);
            if (h <= 0)
            {
                limit = EnduranceLimit.TimeLimit;
                break;
            }
            // Heun: predictor with the rates at the start, corrector with the mean of start and end rates.
            march.Rates(s0, point, k0);
            for (int i = 0; i < dim; i++)
            {
                s1[i] = s0[i] + h * k0[i];
            }
            var predicted = march.Evaluate(s1);
            if (predicted.Trimmed)
            {
                march.Rates(s1, predicted, k1);
                for (int i = 0; i < dim; i++)
                {
                    s1[i] = s0[i] + 0.5 * h * (k0[i] + k1[i]);
                }
            }
            var end = march.Evaluate(s1);
            var (endLimit, endStation) = march.Violation(s1, end);
            steps++;
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
                    var (midLimit, midStation) = march.Violation(sMid, march.Evaluate(sMid));
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
                for (int i = 0; i < dim; i++)
                {
                    s1[i] = s0[i] + hi * (s1[i] - s0[i]);
                }
                t += hi * h;
                end = march.Evaluate(s1);
            }
            else
            {
                t += h;
            }
            Array.Copy(s1, s0, dim);
            point = end;
            for (int j = 0; j < n; j++)
            {
                peakWinding = Math.Max(peakWinding, s0[1 + j]);
                peakPlate = Math.Max(peakPlate, s0[1 + n + j]);
            }
            if (options.RecordTrace)
            {
                trace.Add(t, s0, point, march);
            }
        }
        return new EnduranceResult(
            t,
            limit.Value,
            march.Describe(limit.Value, station, options.MaxDurationS),
            station,
            startSpeed,
            startCurrent,
            march.Soc(s0),
            point.Trimmed ? point.BusVoltage : 0.0,
            point.Trimmed ? point.PackCurrent : 0.0,
            peakWinding,
            peakPlate,
            steps,
            options.RecordTrace ? trace.Build() : null);
    }

    // The trimmed hover at one state: [charge drawn C, winding temperatures, plate temperatures].
    private sealed class HoverPoint(int n)
    {
        public bool Trimmed;
        public double Speed;
        public double BusVoltage;
        public double PackCurrent;
        public double YawTorque;
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
        private readonly double[] _plateTemps;
        private readonly DriveInput[] _inputs;
        private readonly DrivePoint[] _points;

        public March(SimulationRig rig, double soc0)
        {
            _rig = rig;
            _r = rig.Rig;
            _n = rig.StationCount;
            _soc0 = soc0;
            _capacityC = rig.Packs.CapacityAh * 3600.0;
            _plateTemps = new double[_n];
            _inputs = new DriveInput[_n];
            _points = new DrivePoint[_n];
        }

        public double Soc(double[] s) => _soc0 - s[0] / _capacityC;

        public double DesignGapM => _r.DesignGapM;

        public double WeightN => _rig.WeightN;

        public HoverPoint Evaluate(double[] s)
        {
            var p = new HoverPoint(_n);
            for (int j = 0; j < _n; j++)
            {
                _plateTemps[j] = s[1 + _n + j];
            }
            double? speed = _rig.CommonHoverSpeed(_plateTemps, out _);
            if (speed is not { } w)
            {
                return p;
            }
            p.Speed = w;
            for (int j = 0; j < _n; j++)
            {
                var drive = _rig.Drivetrains[j];
                double tw = s[1 + j];
                var load = _rig.Loads[j].Evaluate(w, _r.DesignGapM, _plateTemps[j], _r.AmbientC);
                double current = drive.Motor.CurrentForTorqueA(load.TotalTorqueNm, drive.FluxFactorAt(tw));
                _inputs[j] = new DriveInput(drive, DriveCommand.MotorCurrent(current), w, tw, tw, false);
                p.PlateHeat[j] = load.EddyTorqueNm * w;
            }
            var bus = DriveBus.Solve(BusSource.FromPack(_rig.Packs, Math.Clamp(Soc(s), 0, 1)), _inputs, _points);
            if (bus.Status != BusStatus.Solved)
            {
                return p;
            }
            p.Trimmed = true;
            for (int j = 0; j < _n; j++)
            {
                var dp = _points[j];
                if (dp.Regime is not (DriveRegime.Regulating))
                {
                    p.Trimmed = false;
                }
                p.Current[j] = dp.MotorCurrentA;
                p.WindingHeat[j] = dp.CopperLossW + dp.NoLoadLossW;
                p.YawTorque -= _r.Stations[j].Spin.Sign() * dp.TorqueNm;
            }
            p.BusVoltage = bus.BusVoltageV;
            p.PackCurrent = bus.PackCurrentA;
            return p;
        }

        public void Rates(double[] s, HoverPoint p, double[] ds)
        {
            ds[0] = p.PackCurrent;
            for (int j = 0; j < _n; j++)
            {
                ds[1 + j] = _rig.Windings[j] is { } wn ? wn.RateKPerS(p.WindingHeat[j], s[1 + j], _r.AmbientC) : 0.0;
                ds[1 + _n + j] = _rig.PlatePatches[j].RateKPerS(p.PlateHeat[j], s[1 + _n + j], _r.AmbientC);
            }
        }

        // The first limit broken at this state, in the order of the enum, with its station; (null, null) when none.
        public (EnduranceLimit?, int?) Violation(double[] s, HoverPoint p)
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
            for (int j = 0; j < _n; j++)
            {
                if (s[1 + _n + j] >= _r.Limits.PlateTempC)
                {
                    return (EnduranceLimit.PlateTemperature, j);
                }
            }
            return (null, null);
        }

        public string Describe(EnduranceLimit limit, int? station, double maxDurationS)
        {
            var inv = System.Globalization.CultureInfo.InvariantCulture;
            string At(double v, string unit) => v.ToString("0.#", inv) + " " + unit;
            var packs = _rig.Packs;
            return limit switch
            {
                EnduranceLimit.TimeLimit => $"none: the run reached its time limit of {At(maxDurationS, "s")}",
                EnduranceLimit.PackCutoff => $"pack cutoff voltage ({At(packs.CellsSeries * _r.Limits.CellCutoffV, "V")}: {packs.CellsSeries} cells x {At(_r.Limits.CellCutoffV, "V")})",
                EnduranceLimit.UsableCapacity => $"usable pack capacity ({At(100 * _r.Limits.UsableCapacityFraction, "%")} of {At(packs.CapacityAh, "A h")})",
                EnduranceLimit.TrimLost => "the hover trim no longer exists (the rotors or controllers can no longer hold the design gap)",
                EnduranceLimit.WindingTemperature => $"winding temperature of station {station} ({At(_rig.Drivetrains[station!.Value].Motor.MaxWindingTempC ?? 0, "C")})",
                EnduranceLimit.MotorCurrent => $"motor current of station {station} above its continuous {At(_rig.Drivetrains[station!.Value].Motor.MaxCurrentA, "A")}",
                EnduranceLimit.ControllerCurrent => $"controller current of station {station} above its continuous {At(_rig.Drivetrains[station!.Value].Controller.ContinuousCurrentA, "A")}",
                EnduranceLimit.PackCurrent => $"pack current above its continuous {At(packs.ContinuousCurrentA, "A")}",
                EnduranceLimit.PlateTemperature => $"plate temperature under station {station} ({At(_r.Limits.PlateTempC, "C")} limit)",
                _ => limit.ToString(),
            };
        }
    }

    private sealed class TraceBuilder(int n)
    {
        private readonly List<double> _t = [], _gap = [], _lift = [], _v = [], _i = [], _soc = [], _yaw = [], _zero = [];
        private readonly List<double>[] _speed = Lists(n), _current = Lists(n), _winding = Lists(n), _plate = Lists(n);

        public void Add(double t, double[] s, HoverPoint p, March march)
        {
            _t.Add(t);
            for (int j = 0; j < n; j++)
            {
                _speed[j].Add(p.Speed);
                _current[j].Add(p.Current[j]);
                _winding[j].Add(s[1 + j]);
                _plate[j].Add(s[1 + n + j]);
            }
            _gap.Add(p.Trimmed ? march.DesignGapM : 0);
            _lift.Add(p.Trimmed ? march.WeightN : 0);
            _v.Add(p.BusVoltage);
            _i.Add(p.PackCurrent);
            _soc.Add(march.Soc(s));
            _yaw.Add(p.YawTorque);
            _zero.Add(0);
        }

        public SpinupTrace Build() => new(
            _t.ToArray(), Freeze(_speed), Freeze(_current), Freeze(_winding), Freeze(_plate),
            _gap.ToArray(), _lift.ToArray(), _v.ToArray(), _i.ToArray(), _soc.ToArray(), _yaw.ToArray(), _zero.ToArray(), _zero.ToArray());

        private static List<double>[] Lists(int count) => Enumerable.Range(0, count).Select(_ => new List<double>()).ToArray();

        private static IReadOnlyList<IReadOnlyList<double>> Freeze(List<double>[] lists) => lists.Select(l => (IReadOnlyList<double>)l.ToArray()).ToArray();
    }
}

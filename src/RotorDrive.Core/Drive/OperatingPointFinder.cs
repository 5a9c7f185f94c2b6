using MathNet.Numerics.RootFinding;
using RotorDrive.Core.Loads;

namespace RotorDrive.Core.Drive;

/// <summary>Finds every steady operating point of one rotor on its drivetrain: each shaft speed where the motor's torque
/// equals the load's, with its stability and its margins to every limit.</summary>
/// <remarks>
/// <para>A magnet rotor's eddy drag rises to a peak and falls (J. R. Reitz, J. Appl. Phys. 41, 2067, 1970), so a
/// current-limited motor can meet it up to three times: a stable point below the drag peak, an unstable one above it and
/// a stable one at high speed. The search never reports only one when there are more.</para>
/// <para>Method: the torque balance f(omega) = Q_motor - Q_load (Q_motor from <see cref="DriveBus"/> with this rotor's
/// own pack sag, Drela's first-order motor) is sampled from rest to the search top, the speed above which the motor
/// cannot drive (back-EMF above d x open-circuit voltage, plus 5 %), so every crossing lies inside. Each sign change is
/// refined with MathNet's Brent solver (R. P. Brent, "Algorithms for Minimization without Derivatives", 1973). A local
/// minimum of |f| between samples that keep their sign is probed by successive parabolic steps to find two close
/// crossings (a drag peak grazing the current limit). Stability is the sign of df/d omega at the crossing: negative
/// (motor torque falls below the load as speed rises) is stable. When the motor cannot start the rotor
/// (f &lt;= 0 just above rest) the rotor stays at rest: a stable at-rest point.</para>
/// <para>Speed hold: at the commanded speed the controller needs the current Kv Q_load / phi + I0; if the current limit
/// and the duty allow it the speed is held (a stable held point). Below the commanded speed the controller saturates
/// (max duty, current limited), so the saturated drive's crossings below that speed are equilibria too: a rotor started
/// from rest stalls at the first stable one.</para>
/// </remarks>
public static class OperatingPointFinder
{
    private const double SearchMargin = 1.05;
    private const double RestFraction = 1e-9;

    /// <summary>Finds every equilibrium of a rotor at a throttle.</summary>
    /// <param name="drive">The station's drive (drivetrain, packs, rotor, load, limits).</param>
    /// <param name="throttle">Open-loop duty or speed to hold.</param>
    /// <param name="conditions">Gap, temperatures, state of charge, braking.</param>
    /// <param name="options">Numerical settings, or null for the defaults.</param>
    /// <returns>All equilibria (slowest first) with stability and margins, and the compatibility findings.</returns>
    /// <exception cref="ArgumentNullException">The drive or conditions are null.</exception>
    /// <exception cref="ArgumentOutOfRangeException">A condition or option is out of range.</exception>
    public static OperatingPointResult Find(
        StationDrive drive,
        ThrottleCommand throttle,
        OperatingConditions conditions,
        OperatingPointOptions? options = null)
    {
        Preconditions.NotNull(drive, nameof(drive));
        Preconditions.NotNull(conditions, nameof(conditions));
        options ??= OperatingPointOptions.Default;
        Validate(conditions, options);
        var findings = DriveCompatibility.Check(drive);
        var source = BusSource.FromPack(drive.Packs, conditions.SocFraction);
        var drivetrain = drive.Drivetrain;
        var balance = new TorqueBalance(drive, conditions, source);
        var points = new List<OperatingPoint>(3);
        double maxDuty = drivetrain.MaxDuty;
        bool? holdMet = null;
        DriveRegime? stoppedBy = null;
        double top;

        if (throttle.Kind == ThrottleKind.Duty)
        {
            Preconditions.InRange(throttle.Value, 0, 1, "duty");
            balance.Command = DriveCommand.Duty(throttle.Value);
            top = SearchMargin * drivetrain.FreeSpeedRadPerS(source.OpenCircuitVoltageV, Math.Min(throttle.Value, maxDuty), conditions.MotorMagnetTempC);
            SearchCrossings(balance, top, points, options);
        }
        else
        {
            double target = Preconditions.Positive(throttle.Value, "hold speed");
            balance.Command = DriveCommand.Duty(maxDuty);
            top = Math.Min(target, SearchMargin * drivetrain.FreeSpeedRadPerS(source.OpenCircuitVoltageV, maxDuty, conditions.MotorMagnetTempC));
            SearchCrossings(balance, top, points, options);

            var loadAtTarget = balance.LoadAt(target);
            double flux = drivetrain.FluxFactorAt(conditions.MotorMagnetTempC);
            balance.Command = DriveCommand.MotorCurrent(drivetrain.Motor.CurrentForTorqueA(loadAtTarget.TotalTorqueNm, flux));
            var held = balance.Detail(target, EquilibriumKind.Held, stable: true, slope: null);
            if (held.Drive.Regime is DriveRegime.Regulating or DriveRegime.Freewheel)
            {
                holdMet = true;
                double tolerance = 1e-6 * target;
                points.RemoveAll(p => Math.Abs(p.SpeedRadPerS - target) <= tolerance);
                points.Add(held);
            }
            else
            {
                holdMet = false;
                // Back-EMF above the bus at the commanded speed means the duty ran out before the speed was reached.
                stoppedBy = held.Drive.Regime == DriveRegime.Rectifying ? DriveRegime.MaxDuty : held.Drive.Regime;
            }
        }

        var status = points.Count > 0 ? OperatingStatus.Found : OperatingStatus.NoEquilibrium;
        return new OperatingPointResult(status, throttle, points, findings, holdMet, stoppedBy, source.OpenCircuitVoltageV, top, balance.Evaluations);
    }

    /// <summary>The operating points over a range of duties from 0 to 1, e.g. for a table of the point reached from rest.</summary>
    /// <param name="drive">The station's drive.</param>
    /// <param name="conditions">Gap, temperatures, state of charge, braking.</param>
    /// <param name="steps">Number of duties, at least 2, evenly spaced from 0 to 1 inclusive.</param>
    /// <param name="options">Numerical settings, or null for the defaults.</param>
    /// <returns>One result per duty, in increasing duty.</returns>
    /// <exception cref="ArgumentNullException">The drive or conditions are null.</exception>
    /// <exception cref="ArgumentOutOfRangeException">Fewer than 2 steps, or a condition or option is out of range.</exception>
    public static IReadOnlyList<OperatingPointResult> SweepDuty(
        StationDrive drive,
        OperatingConditions conditions,
        int steps = 21,
        OperatingPointOptions? options = null)
    {
        Preconditions.AtLeast(steps, 2, nameof(steps));
        var results = new OperatingPointResult[steps];
        for (int i = 0; i < steps; i++)
        {
            results[i] = Find(drive, ThrottleCommand.Duty(i / (double)(steps - 1)), conditions, options);
        }
        return results;
    }

    private static void Validate(OperatingConditions c, OperatingPointOptions o)
    {
        Preconditions.Positive(c.GapM, nameof(c.GapM));
        Preconditions.Finite(c.PlateTempC, nameof(c.PlateTempC));
        Preconditions.Finite(c.RotorMagnetTempC, nameof(c.RotorMagnetTempC));
        Preconditions.Finite(c.WindingTempC, nameof(c.WindingTempC));
        Preconditions.Finite(c.MotorMagnetTempC, nameof(c.MotorMagnetTempC));
        Preconditions.InRange(c.SocFraction, 0, 1, nameof(c.SocFraction));
        Preconditions.AtLeast(o.ScanPoints, 4, nameof(o.ScanPoints));
        Preconditions.InRange(o.RelativeAccuracy, 1e-15, 1e-3, nameof(o.RelativeAccuracy));
        Preconditions.AtLeast(o.MaxIterations, 1, nameof(o.MaxIterations));
        Preconditions.AtLeast(o.TangencyProbes, 0, nameof(o.TangencyProbes));
        Preconditions.InRange(o.SlopeStepRelative, 1e-12, 1e-2, nameof(o.SlopeStepRelative));
    }

    private static void SearchCrossings(TorqueBalance balance, double top, List<OperatingPoint> points, OperatingPointOptions options)
    {
        if (!(top > 0))
        {
            points.Add(balance.Detail(0, EquilibriumKind.AtRest, stable: true, slope: null));
            return;
        }
        int n = options.ScanPoints;
        Span<double> xs = stackalloc double[n];
        Span<double> fs = stackalloc double[n];
        double scale = 0;
        for (int i = 0; i < n; i++)
        {
            xs[i] = i == 0 ? RestFraction * top : top * i / (n - 1);
            fs[i] = balance.F(xs[i]);
            scale = Math.Max(scale, Math.Abs(fs[i]));
        }
        if (fs[0] <= 0)
        {
            points.Add(balance.Detail(0, EquilibriumKind.AtRest, stable: true, slope: null));
        }
        if (scale == 0)
        {
            return;
        }
        balance.Top = top;
        balance.Scale = scale;
        var brackets = new List<Bracket>(4);
        for (int i = 0; i + 1 < n; i++)
        {
            if (Positive(fs[i]) != Positive(fs[i + 1]))
            {
                brackets.Add(new Bracket(xs[i], fs[i], xs[i + 1], fs[i + 1]));
            }
        }
        for (int i = 1; i + 1 < n; i++)
        {
            bool sameSign = Positive(fs[i - 1]) == Positive(fs[i]) && Positive(fs[i]) == Positive(fs[i + 1]);
            if (sameSign && Math.Abs(fs[i]) < Math.Abs(fs[i - 1]) && Math.Abs(fs[i]) <= Math.Abs(fs[i + 1]))
            {
                ProbeTangency(balance, xs[i - 1], fs[i - 1], xs[i], fs[i], xs[i + 1], fs[i + 1], options.TangencyProbes, brackets);
            }
        }

        var roots = new List<(double Speed, bool Stable)>(brackets.Count);
        Func<double, double> g = balance.Normalized;
        foreach (var b in brackets)
        {
            balance.Cache(b.Lo / top, b.FLo / scale, b.Hi / top, b.FHi / scale);
            double x = Brent.TryFindRoot(g, b.Lo / top, b.Hi / top, options.RelativeAccuracy, options.MaxIterations, out double root)
                ? root
                : FalsePosition(b) / top;
            roots.Add((x * top, Positive(b.FLo)));
        }
        roots.Sort((p, q) => p.Speed.CompareTo(q.Speed));
        double merge = 10 * options.RelativeAccuracy * top;
        for (int k = 0; k < roots.Count; k++)
        {
            var (speed, stable) = roots[k];
            // Two crossings at one speed are a tangency: stable from one side only, so not stable.
            if (k + 1 < roots.Count && roots[k + 1].Speed - speed <= merge)
            {
                stable = false;
                k++;
            }
            double h = options.SlopeStepRelative * top;
            var point = balance.Detail(speed, EquilibriumKind.Crossing, stable, slope: null);
            double f0 = point.Drive.TorqueNm - point.Load.TotalTorqueNm;
            double slope = (balance.F(speed + h) - f0) / h;
            points.Add(point with { StabilitySlopeNmPerRadPerS = slope });
        }
    }

    // Successive parabolic steps toward a local minimum of |f|; when f changes sign there, two crossings are bracketed.
    private static void ProbeTangency(TorqueBalance balance, double a, double fa, double b, double fb, double c, double fc, int probes, List<Bracket> brackets)
    {
        double left = a, fLeft = fa, right = c, fRight = fc;
        for (int k = 0; k < probes; k++)
        {
            double num = (b - a) * (b - a) * (fb - fc) - (b - c) * (b - c) * (fb - fa);
            double den = (b - a) * (fb - fc) - (b - c) * (fb - fa);
            if (den == 0)
            {
                return;
            }
            double u = b - 0.5 * num / den;
            if (!(u > left && u < right) || u == b)
            {
                return;
            }
            double fu = balance.F(u);
            if (Positive(fu) != Positive(fb))
            {
                brackets.Add(new Bracket(left, fLeft, u, fu));
                brackets.Add(new Bracket(u, fu, right, fRight));
                return;
            }
            if (Math.Abs(fu) < Math.Abs(fb))
            {
                if (u < b)
                {
                    c = b;
                    fc = fb;
                }
                else
                {
                    a = b;
                    fa = fb;
                }
                b = u;
                fb = fu;
            }
            else if (u < b)
            {
                a = u;
                fa = fu;
            }
            else
            {
                c = u;
                fc = fu;
            }
        }
    }

    // Fallback when Brent stops on its iteration limit: the secant through the bracket's ends (always inside it).
    private static double FalsePosition(Bracket b) => b.Lo + (b.Hi - b.Lo) * b.FLo / (b.FLo - b.FHi);

    private static bool Positive(double f) => f > 0;

    private readonly record struct Bracket(double Lo, double FLo, double Hi, double FHi);

    // The torque balance of one rotor at one command; counts its evaluations and caches Brent's two starting ends.
    private sealed class TorqueBalance(StationDrive drive, OperatingConditions conditions, BusSource source)
    {
        private readonly IRotorLoad _load = drive.Load;
        private double _x1 = double.NaN, _g1, _x2 = double.NaN, _g2;

        public DriveCommand Command { get; set; }

        public double Top { get; set; }

        public double Scale { get; set; }

        public int Evaluations { get; private set; }

        public LoadPoint LoadAt(double speed)
            => _load.Evaluate(speed, conditions.GapM, conditions.PlateTempC, conditions.RotorMagnetTempC);

        public double F(double speed)
        {
            Evaluations++;
            var input = new DriveInput(drive.Drivetrain, Command, speed, conditions.WindingTempC, conditions.MotorMagnetTempC, conditions.Braking);
            DriveBus.Solve(source, in input, out var point);
            return point.TorqueNm - LoadAt(speed).TotalTorqueNm;
        }

        public void Cache(double x1, double g1, double x2, double g2)
        {
            _x1 = x1;
            _g1 = g1;
            _x2 = x2;
            _g2 = g2;
        }

        public double Normalized(double x)
        {
            if (x == _x1)
            {
                return _g1;
            }
            if (x == _x2)
            {
                return _g2;
            }
            return F(x * Top) / Scale;
        }

        public OperatingPoint Detail(double speed, EquilibriumKind kind, bool stable, double? slope)
        {
            Evaluations++;
            var input = new DriveInput(drive.Drivetrain, Command, speed, conditions.WindingTempC, conditions.MotorMagnetTempC, conditions.Braking);
            var bus = DriveBus.Solve(source, in input, out var point);
            var load = LoadAt(speed);
            var station = DriveMargins.ForStation(drive.Drivetrain, drive.Rotor, point);
            var pack = DriveMargins.ForPack(drive.Packs, bus.PackCurrentA, bus.BusVoltageV, drive.Limits.CellCutoffV);
            var margins = new LimitMargin[station.Length + pack.Length + 1];
            station.CopyTo(margins, 0);
            pack.CopyTo(margins, station.Length);
            margins[^1] = new LimitMargin(DriveLimit.DutyHeadroom, point.Duty, drive.Limits.MaxDuty);
            return new OperatingPoint(kind, speed, stable, slope, point, load, bus.PackCurrentA, margins);
        }
    }
}

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
/// cannot drive (back-EMF above d x open-circuit voltage, plus 5 %), so every crossing lies inside. The samples are: one
/// just above rest (10^-9 of the top); a quadratic grid top (i/(n-1))^2; below its first sample a geometric ladder (ratio
/// <see cref="OperatingPointOptions.LowSpeedRatio"/>, down to 10^-7 of the top at most), because the thin-sheet drag
/// s/(1+s^2) = 1/(2 cosh ln s) is a bump of fixed width in ln(speed) wherever its peak lies (a rotor over a thin, poor
/// conductor peaks far below the motor's free speed) — the ladder stops once the load is proportional to speed over a
/// step (to 1 %), since the drag departs from linear by s^2 and below that point nothing but one sign change can hide;
/// and the motor curve's current-limit corner. Where the load torque peaks between samples, one more sample
/// goes to the vertex of the parabola through the three loads in ln(speed): with the motor's torque flat there, that is
/// where the net torque dips lowest. Each sign change between neighbouring samples is refined with MathNet's Brent
/// solver (R. P. Brent, "Algorithms for Minimization without Derivatives", 1973). A local minimum of |f| between
/// samples that keep their sign is probed by Brent's safeguarded parabolic minimisation in ln(speed) for two close
/// crossings (a drag peak grazing the current limit). Stability is the sign of df/d omega at the crossing: negative
/// (motor torque falls below the load as speed rises) is stable. When the motor cannot start the rotor (f &lt;= 0 just
/// above rest: its starting torque does not exceed the bearing's breakaway and the drag there) the rotor stays at rest:
/// a stable at-rest point, reported first.</para>
/// <para>Speed hold: at the commanded speed the controller needs the current Kv Q_load / phi + I0; if the current limit
/// and the duty allow it the speed is held (a stable held point). Below the commanded speed the controller saturates
/// (max duty, current limited), so the saturated drive's crossings below that speed are equilibria too: a rotor started
/// from rest stalls at the first stable one.</para>
/// </remarks>
public static class OperatingPointFinder
{
    private const double SearchMargin = 1.05;
    private const double RestFraction = 1e-9;
    // The ladder's lowest sample lies above this fraction of the search top: a drag peak lower still (a thousandth of a
    // rad/s for a 10 000 rad/s top) is beyond any plate, and a single crossing there still shows as a sign change
    // between the rest sample and the ladder.
    private const double LadderFloorFraction = 1e-7;
    // The ladder stops descending once the load is proportional to speed to this relative tolerance over one step.
    private const double ProportionalTolerance = 0.01;
    private const double GoldenSection = 0.3819660112501051;
    private const int StackSamples = 256;

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
            var held = balance.Detail(target, EquilibriumKind.Held, stable: true);
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
        Preconditions.InRange(o.LowSpeedRatio, 1.5, 1000, nameof(o.LowSpeedRatio));
    }

    private static void SearchCrossings(TorqueBalance balance, double top, List<OperatingPoint> points, OperatingPointOptions options)
    {
        if (!(top > 0))
        {
            points.Add(balance.Detail(0, EquilibriumKind.AtRest, stable: true));
            return;
        }
        // Buffer layout: [rest, ladder (filled downward) | grid (quadratic + corner) | load-peak samples].
        int ladderRoom = LadderCapacity(options);
        int gridRoom = options.ScanPoints;
        int capacity = 2 + ladderRoom + gridRoom + (2 + ladderRoom + gridRoom) / 2;
        Span<double> xs = capacity <= StackSamples ? stackalloc double[capacity] : new double[capacity];
        Span<double> fs = capacity <= StackSamples ? stackalloc double[capacity] : new double[capacity];
        Span<double> qs = capacity <= StackSamples ? stackalloc double[capacity] : new double[capacity];
        int gridAt = 1 + ladderRoom;
        double corner = balance.CornerSpeed();
        int gridCount = FillGrid(xs[gridAt..], top, corner, options);
        double scale = 0;
        for (int i = gridAt; i < gridAt + gridCount; i++)
        {
            fs[i] = balance.F(xs[i]);
            qs[i] = balance.LastLoadTorqueNm;
            scale = Math.Max(scale, Math.Abs(fs[i]));
        }
        double rest = RestFraction * top;
        double fRest = balance.F(rest), qRest = balance.LastLoadTorqueNm;
        scale = Math.Max(scale, Math.Abs(fRest));
        // The geometric ladder below the grid's first sample, descending only while the load is not yet proportional to
        // speed (after its value at rest) over the last step: thin-sheet drag s / (1 + s^2) departs from s by s^2, so a
        // proportional step means its peak lies well above, and below it f is linear (one sign change at most).
        int at = gridAt - 1;
        double floor = LadderFloorFraction * top;
        for (double x = xs[gridAt] / options.LowSpeedRatio; x >= floor && at >= 1; x /= options.LowSpeedRatio)
        {
            xs[at] = x;
            fs[at] = balance.F(x);
            qs[at] = balance.LastLoadTorqueNm;
            scale = Math.Max(scale, Math.Abs(fs[at]));
            bool proportional = Math.Abs((qs[at] - qRest) * (xs[at + 1] / x) - (qs[at + 1] - qRest)) <= ProportionalTolerance * Math.Abs(qs[at + 1] - qRest);
            at--;
            if (proportional)
            {
                break;
            }
        }
        xs[at] = rest;
        fs[at] = fRest;
        qs[at] = qRest;
        xs = xs[at..];
        fs = fs[at..];
        qs = qs[at..];
        int m = gridAt + gridCount - at;
        if (corner > rest && corner < xs[gridAt - at] && xs[..m].BinarySearch(corner) < 0)
        {
            // The current-limit corner below the grid (the grid placed it when above its first sample).
            xs[m] = corner;
            fs[m] = balance.F(corner);
            qs[m] = balance.LastLoadTorqueNm;
            scale = Math.Max(scale, Math.Abs(fs[m]));
            SortIn(xs, fs, qs, m, m + 1);
            m++;
        }
        m = SamplePeaks(balance, xs, fs, qs, m);
        xs = xs[..m];
        fs = fs[..m];
        if (fs[0] <= 0)
        {
            // The motor's starting torque does not exceed the load's just above rest: the rotor never starts.
            points.Add(balance.Detail(0, EquilibriumKind.AtRest, stable: true));
        }
        if (scale == 0)
        {
            return;
        }
        balance.Top = top;
        balance.Scale = scale;
        // At most one sign-change bracket per sample interval, and two per probed interior sample.
        Span<Bracket> brackets = 3 * m <= StackSamples ? stackalloc Bracket[3 * m] : new Bracket[3 * m];
        int count = 0;
        for (int i = 0; i + 1 < m; i++)
        {
            if (Positive(fs[i]) != Positive(fs[i + 1]))
            {
                brackets[count++] = new Bracket(xs[i], fs[i], xs[i + 1], fs[i + 1]);
            }
        }
        for (int i = 1; i + 1 < m; i++)
        {
            bool sameSign = Positive(fs[i - 1]) == Positive(fs[i]) && Positive(fs[i]) == Positive(fs[i + 1]);
            if (sameSign && Math.Abs(fs[i]) < Math.Abs(fs[i - 1]) && Math.Abs(fs[i]) <= Math.Abs(fs[i + 1]))
            {
                count += ProbeDip(balance, xs[i - 1], fs[i - 1], xs[i], fs[i], xs[i + 1], fs[i + 1], options.TangencyProbes, brackets[count..]);
            }
        }
        if (count == 0)
        {
            return;
        }

        var found = new OperatingPoint[count];
        Func<double, double> g = balance.Normalized;
        double h = options.SlopeStepRelative * top;
        for (int k = 0; k < count; k++)
        {
            var b = brackets[k];
            balance.Cache(b.Lo / top, b.FLo / scale, b.Hi / top, b.FHi / scale);
            double x = Brent.TryFindRoot(g, b.Lo / top, b.Hi / top, options.RelativeAccuracy, options.MaxIterations, out double root)
                ? root
                : FalsePosition(b) / top;
            // Positive below the crossing means the net torque turns decelerating as speed rises: stable.
            found[k] = balance.Detail(x * top, EquilibriumKind.Crossing, stable: Positive(b.FLo), slopeStep: h);
        }
        Array.Sort(found, static (p, q) => p.SpeedRadPerS.CompareTo(q.SpeedRadPerS));
        double merge = 10 * options.RelativeAccuracy * top;
        for (int k = 0; k < count; k++)
        {
            // Two crossings at one speed are a tangency: stable from one side only, so not stable.
            if (k + 1 < count && found[k + 1].SpeedRadPerS - found[k].SpeedRadPerS <= merge)
            {
                points.Add(found[k] with { Stable = false });
                k++;
                continue;
            }
            points.Add(found[k]);
        }
    }

    // Most ladder samples the scan can take: from the grid's first sample down to LadderFloorFraction x top.
    private static int LadderCapacity(OperatingPointOptions o)
    {
        double first = 1.0 / ((o.ScanPoints - 1.0) * (o.ScanPoints - 1.0));
        return Math.Max(0, (int)Math.Ceiling(Math.Log(first / LadderFloorFraction) / Math.Log(o.LowSpeedRatio)));
    }

    // The grid's speeds, increasing: the quadratic grid top (i / (n - 1))^2 for i = 1 .. n - 1 and the motor's current-limit
    // corner, so that no interval straddles that kink. (Below the grid, the rest sample and the geometric ladder resolve a
    // drag peak far below the search top: the thin-sheet drag s / (1 + s^2) = 1 / (2 cosh ln s) is a bump of fixed width
    // in ln s whatever its peak speed, Reitz 1970.)
    private static int FillGrid(Span<double> xs, double top, double corner, OperatingPointOptions o)
    {
        int n = o.ScanPoints;
        int m = 0;
        for (int i = 1; i < n; i++)
        {
            double u = i / (n - 1.0);
            xs[m++] = i == n - 1 ? top : top * u * u;
        }
        if (corner > xs[0] && corner < top)
        {
            int at = xs[..m].BinarySearch(corner);
            if (at < 0)
            {
                at = ~at;
                xs[at..m].CopyTo(xs[(at + 1)..]);
                xs[at] = corner;
                m++;
            }
        }
        return m;
    }

    // The load's own peaks between samples (a drag peak, Reitz 1970): where the load torque has a local maximum among the
    // samples, one more sample goes to the vertex of the parabola through its three loads in ln(speed). With the motor's
    // torque flat there (current limit), that is where the net torque dips lowest, so a pair of crossings hidden beside
    // a third in one scan interval becomes two sign changes. Returns the new sample count; samples stay sorted.
    private static int SamplePeaks(TorqueBalance balance, Span<double> xs, Span<double> fs, Span<double> qs, int m)
    {
        int scanned = m;
        for (int i = 1; i + 1 < scanned; i++)
        {
            if (!(qs[i] > qs[i - 1] && qs[i] >= qs[i + 1]))
            {
                continue;
            }
            double a = Math.Log(xs[i - 1]), b = Math.Log(xs[i]), c = Math.Log(xs[i + 1]);
            double num = (b - a) * (b - a) * (qs[i] - qs[i + 1]) - (b - c) * (b - c) * (qs[i] - qs[i - 1]);
            double den = (b - a) * (qs[i] - qs[i + 1]) - (b - c) * (qs[i] - qs[i - 1]);
            double u = den != 0 ? b - 0.5 * num / den : double.NaN;
            double margin = 1e-3 * (c - a);
            if (!(u > a + margin && u < c - margin) || Math.Abs(u - b) < margin)
            {
                continue;
            }
            xs[m] = Math.Exp(u);
            fs[m] = balance.F(xs[m]);
            qs[m] = balance.LastLoadTorqueNm;
            m++;
        }
        SortIn(xs, fs, qs, scanned, m);
        return m;
    }

    // Insertion sort of the samples from index 'sorted' on into the sorted ones before them.
    private static void SortIn(Span<double> xs, Span<double> fs, Span<double> qs, int sorted, int m)
    {
        for (int k = sorted; k < m; k++)
        {
            double x = xs[k], f = fs[k], q = qs[k];
            int j = k - 1;
            while (j >= 0 && xs[j] > x)
            {
                xs[j + 1] = xs[j];
                fs[j + 1] = fs[j];
                qs[j + 1] = qs[j];
                j--;
            }
            xs[j + 1] = x;
            fs[j + 1] = f;
            qs[j + 1] = q;
        }
    }

    // A dip of |f| at sample b between a and c (same sign at all three): minimises sign(f) f over (a, c) by Brent's
    // method for a minimum (parabolic steps safeguarded by golden sections; Brent 1973, ch. 5) in ln(speed), where a drag
    // peak is a symmetric bump. Stops at the first sample of the other sign (two crossings bracketed) or when the probes
    // are spent or the dip is located to rounding.
    private static int ProbeDip(TorqueBalance balance, double xa, double fa, double xb, double fb, double xc, double fc, int probes, Span<Bracket> brackets)
    {
        bool sign = Positive(fb);
        double s = sign ? 1 : -1;
        double a = Math.Log(xa), b = Math.Log(xb), c = Math.Log(xc);
        double ga = s * fa, gb = s * fb, gc = s * fc;
        for (int k = 0; k < probes; k++)
        {
            double tolerance = 1e-10 * Math.Max(1, Math.Abs(b));
            if (c - a <= 4 * tolerance)
            {
                return 0;
            }
            double num = (b - a) * (b - a) * (gb - gc) - (b - c) * (b - c) * (gb - ga);
            double den = (b - a) * (gb - gc) - (b - c) * (gb - ga);
            double u = den != 0 ? b - 0.5 * num / den : double.NaN;
            if (!(u > a + tolerance && u < c - tolerance) || Math.Abs(u - b) < tolerance)
            {
                u = c - b > b - a ? b + GoldenSection * (c - b) : b - GoldenSection * (b - a);
            }
            double xu = Math.Exp(u);
            double fu = balance.F(xu);
            if (Positive(fu) != sign)
            {
                brackets[0] = new Bracket(xa, fa, xu, fu);
                brackets[1] = new Bracket(xu, fu, xc, fc);
                return 2;
            }
            double gu = s * fu;
            if (gu < gb)
            {
                if (u < b)
                {
                    (c, gc) = (b, gb);
                }
                else
                {
                    (a, ga) = (b, gb);
                }
                (b, gb) = (u, gu);
            }
            else if (u < b)
            {
                (a, ga) = (u, gu);
            }
            else
            {
                (c, gc) = (u, gu);
            }
        }
        return 0;
    }

    // Fallback when Brent stops on its iteration limit: the secant through the bracket's ends (always inside it).
    private static double FalsePosition(Bracket b) => b.Lo + (b.Hi - b.Lo) * b.FLo / (b.FLo - b.FHi);

    private static bool Positive(double f) => f > 0;

    private readonly record struct Bracket(double Lo, double FLo, double Hi, double FHi);


    // The torque balance of one rotor at one command; counts its evaluations and caches Brent's two starting ends.
    private sealed class TorqueBalance(StationDrive drive, OperatingConditions conditions, BusSource source)
    {
        private readonly IRotorLoad _load = drive.Load;
        private DriveStation _station;
        private DriveCommand _command;
        private double _x1 = double.NaN, _g1, _x2 = double.NaN, _g2;

        // The last two evaluations: Brent's returned root is usually the point it evaluated last, and the one before lies
        // just across the root, so their secant is the stability slope at no extra cost.
        private double _lastSpeed = double.NaN, _lastF, _previousSpeed = double.NaN, _previousF;
        private BusSolution _lastBus;
        private DrivePoint _lastPoint;
        private LoadPoint _lastLoad;

        public DriveCommand Command
        {
            get => _command;
            set
            {
                _command = value;
                _lastSpeed = double.NaN;
                _previousSpeed = double.NaN;
                _station = DriveStation.Prepare(new DriveInput(drive.Drivetrain, value, 0, conditions.WindingTempC, conditions.MotorMagnetTempC, conditions.Braking));
            }
        }

        public double Top { get; set; }

        // Speed where the commanded duty first drives the current limit, with the pack sagging under d I_lim + I_idle:
        // d (Voc - R_bank (d I_lim + I_idle)) - I_lim R_t = E; 0 when there is none (current command, zero duty).
        public double CornerSpeed()
        {
            if (_station.IsCurrent || _station.Duty <= 0)
            {
                return 0;
            }
            double d = _station.Duty;
            double busAtCorner = source.OpenCircuitVoltageV - source.ResistanceOhm * (d * _station.Limit + _station.Idle);
            double backEmf = d * busAtCorner - _station.Limit * _station.Rt;
            return backEmf > 0 ? backEmf * _station.Kv / _station.Flux : 0;
        }

        public double Scale { get; set; }

        public int Evaluations { get; private set; }

        public double LastLoadTorqueNm => _lastLoad.TotalTorqueNm;

        public LoadPoint LoadAt(double speed)
            => _load.Evaluate(speed, conditions.GapM, conditions.PlateTempC, conditions.RotorMagnetTempC);

        public double F(double speed)
        {
            Evaluations++;
            _station.SetSpeed(speed);
            (_previousSpeed, _previousF) = (_lastSpeed, _lastF);
            _lastBus = DriveBus.SolveSingle(source, ref _station, out _lastPoint, double.NaN, DriveBusOptions.Default);
            _lastLoad = LoadAt(speed);
            _lastSpeed = speed;
            _lastF = _lastPoint.TorqueNm - _lastLoad.TotalTorqueNm;
            return _lastF;
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

        // The full record of an equilibrium; with a slope step, also the forward-difference stability slope.
        public OperatingPoint Detail(double speed, EquilibriumKind kind, bool stable, double slopeStep = 0)
        {
            if (speed != _lastSpeed)
            {
                F(speed);
            }
            var (bus, point, load) = (_lastBus, _lastPoint, _lastLoad);
            double? slope = null;
            if (slopeStep > 0)
            {
                double f0 = _lastF, dx = _previousSpeed - speed;
                // The secant through Brent's last two points when they are close but not at rounding distance; else a
                // forward difference.
                slope = Math.Abs(dx) >= 1e-5 * slopeStep && Math.Abs(dx) <= 1e3 * slopeStep
                    ? (_previousF - f0) / dx
                    : (F(speed + slopeStep) - f0) / slopeStep;
            }
            var margins = new LimitMargin[DriveMargins.StationCount + DriveMargins.PackCount + 1];
            DriveMargins.FillStation(margins, drive.Drivetrain, drive.Rotor, point);
            DriveMargins.FillPack(margins.AsSpan(DriveMargins.StationCount), drive.Packs, bus.PackCurrentA, bus.BusVoltageV, drive.Limits.CellCutoffV);
            margins[^1] = new LimitMargin(DriveLimit.DutyHeadroom, point.Duty, drive.Limits.MaxDuty);
            return new OperatingPoint(kind, speed, stable, slope, point, load, bus.PackCurrentA, margins);
        }
    }
}

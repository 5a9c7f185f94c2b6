namespace RotorDrive.Core.Drive;

/// <summary>Solves the DC bus that feeds N speed controllers from one pack: bus voltage, each motor's applied duty,
/// voltage and current after limiting, each controller's bus current and the pack current.</summary>
/// <remarks>
/// <para>Model. Pack: V = Voc - R_bank I_pack (Thevenin). Controller j (averaged switch): motor voltage d V - I R_on,
/// bus current d I + I_idle. Motor j (M. Drela, "First-Order DC Electric Motor Model", MIT, 2007):
/// I = (V_m - E)/R(T), E = phi omega / Kv. With loop resistance R_t = R(T) + R_on, every rule a controller applies makes
/// its motor current either duty-driven, I = (delta V - E)/R_t (commanded duty, max duty, zero duty, rectifying), or a
/// constant, I = alpha (current limit, braking limit, freewheel at 0, commanded current). Its bus current is then
/// delta (delta V - E)/R_t + I_idle (linear in V) or (alpha R_t + E) alpha / V + I_idle (a constant-power term).
/// For fixed rules, Kirchhoff's law V = Voc - R_bank sum(I_bus) is the quadratic
/// (1 + R_bank B) V^2 - (Voc - R_bank A) V + R_bank C = 0, solved in closed form.</para>
/// <para>Method. Active set: take the rules at a trial voltage (the hint, else Voc), solve the quadratic for its larger
/// root, re-read the rules there, repeat until they agree (usually 1 to 3 passes). The accepted root is proven the
/// highest solution when R_bank sum(C+) &lt; V^2, which makes the residual strictly increasing above it (C+ is each
/// station's largest constant-power coefficient); that highest root is the stable operating point of a source feeding
/// constant-power loads. If the passes do not settle or the proof fails, an exhaustive scan sorts every station's limit
/// switches and solves each interval's quadratic from the top down, so the highest solution is always the one
/// returned. Allocation-free up to 32 stations (stack buffers); beyond that two small arrays are allocated.</para>
/// </remarks>
public static class DriveBus
{
    private const int StackStations = 32;
    private const int BreakpointsPerStation = 5;

    /// <summary>Solves the bus with default options, starting from the open-circuit voltage.</summary>
    /// <param name="source">The pack as a Thevenin source.</param>
    /// <param name="inputs">One entry per controller on the bus.</param>
    /// <param name="points">Receives one result per input; at least as long as <paramref name="inputs"/>.</param>
    /// <returns>Bus voltage, pack current, status and passes; per-station results are in <paramref name="points"/>.</returns>
    /// <exception cref="ArgumentException">The output span is too short, or an input has no drivetrain.</exception>
    /// <exception cref="ArgumentOutOfRangeException">A value is not finite or out of its physical range.</exception>
    public static BusSolution Solve(BusSource source, ReadOnlySpan<DriveInput> inputs, Span<DrivePoint> points)
        => Solve(source, inputs, points, double.NaN, DriveBusOptions.Default);

    /// <summary>Solves the bus for one controller on its own pack.</summary>
    /// <param name="source">The pack as a Thevenin source.</param>
    /// <param name="input">The controller's input.</param>
    /// <param name="point">The controller's result.</param>
    /// <returns>Bus voltage, pack current, status and passes.</returns>
    /// <exception cref="ArgumentException">The input has no drivetrain.</exception>
    /// <exception cref="ArgumentOutOfRangeException">A value is not finite or out of its physical range.</exception>
    public static BusSolution Solve(BusSource source, in DriveInput input, out DrivePoint point)
    {
        CheckSource(source);
        var station = DriveStation.Prepare(input);
        return SolveSingle(source, ref station, out point, double.NaN, DriveBusOptions.Default);
    }

    /// <summary>Solves the bus starting from a voltage hint (e.g. the previous time step's bus voltage).</summary>
    /// <param name="source">The pack as a Thevenin source.</param>
    /// <param name="inputs">One entry per controller on the bus.</param>
    /// <param name="points">Receives one result per input; at least as long as <paramref name="inputs"/>.</param>
    /// <param name="busVoltageHintV">Starting voltage, V; NaN or not positive starts from the open-circuit voltage.
    /// The hint changes only the work done, never the solution returned.</param>
    /// <param name="options">Numerical settings.</param>
    /// <returns>Bus voltage, pack current, status and passes; per-station results are in <paramref name="points"/>.</returns>
    /// <exception cref="ArgumentException">The output span is too short, or an input has no drivetrain.</exception>
    /// <exception cref="ArgumentNullException">The options are null.</exception>
    /// <exception cref="ArgumentOutOfRangeException">A value is not finite or out of its physical range.</exception>
    public static BusSolution Solve(
        BusSource source,
        ReadOnlySpan<DriveInput> inputs,
        Span<DrivePoint> points,
        double busVoltageHintV,
        DriveBusOptions options)
    {
        Preconditions.NotNull(options, nameof(options));
        CheckSource(source);
        double voc = source.OpenCircuitVoltageV, rp = source.ResistanceOhm;
        int n = inputs.Length;
        if (points.Length < n)
        {
            throw new ArgumentException($"points must hold at least {n} entries; got {points.Length}.", nameof(points));
        }
        if (n == 1)
        {
            var station = DriveStation.Prepare(inputs[0]);
            return SolveSingle(source, ref station, out points[0], busVoltageHintV, options);
        }
        Span<DriveStation> terms = n <= StackStations ? stackalloc DriveStation[n] : new DriveStation[n];
        double cPlus = 0;
        for (int j = 0; j < n; j++)
        {
            terms[j] = DriveStation.Prepare(inputs[j]);
            cPlus += terms[j].CPlus;
        }

        double v = double.IsFinite(busVoltageHintV) && busVoltageHintV > 0 ? busVoltageHintV : voc;
        Sums(terms, v, out double a, out double b, out double c);
        int passes = 0;
        while (passes < options.MaxActiveSetPasses)
        {
            passes++;
            if (!Roots(1 + rp * b, voc - rp * a, rp * c, out double root, out _) || root <= 0)
            {
                break;
            }
            Sums(terms, root, out double a2, out double b2, out double c2);
            bool sameRules = a2 == a && b2 == b && c2 == c;
            if (sameRules || Math.Abs(root - v) <= options.RelativeVoltageTolerance * root)
            {
                // Residual strictly increasing above the root => no higher solution exists.
                if (rp * cPlus < root * root)
                {
                    return Finish(source, terms, points, root, passes, scanned: false);
                }
                break;
            }
            v = root;
            a = a2;
            b = b2;
            c = c2;
        }
        return Scan(source, terms, points, passes);
    }

    // One prepared station on its own pack: the operating-point search calls this in its inner loop. Same method as
    // the N-station solve without its loops.
    internal static BusSolution SolveSingle(BusSource source, ref DriveStation station, out DrivePoint point, double busVoltageHintV, DriveBusOptions options)
    {
        double voc = source.OpenCircuitVoltageV, rp = source.ResistanceOhm;
        double v = double.IsFinite(busVoltageHintV) && busVoltageHintV > 0 ? busVoltageHintV : voc;
        Single(ref station, v, out double a, out double b, out double c);
        for (int pass = 1; pass <= options.MaxActiveSetPasses; pass++)
        {
            if (!Roots(1 + rp * b, voc - rp * a, rp * c, out double root, out _) || root <= 0)
            {
                break;
            }
            Single(ref station, root, out double a2, out double b2, out double c2);
            if ((a2 == a && b2 == b && c2 == c) || Math.Abs(root - v) <= options.RelativeVoltageTolerance * root)
            {
                if (rp * station.CPlus < root * root)
                {
                    point = station.PointAt(root);
                    var status = root < 0.5 * voc ? BusStatus.Collapsed : BusStatus.Solved;
                    return new BusSolution(status, root, point.BusCurrentA, voc, pass, Scanned: false);
                }
                break;
            }
            v = root;
            a = a2;
            b = b2;
            c = c2;
        }
        Span<DrivePoint> one = stackalloc DrivePoint[1];
        var solution = Scan(source, new Span<DriveStation>(ref station), one, options.MaxActiveSetPasses);
        point = one[0];
        return solution;
    }

    private static void CheckSource(BusSource source)
    {
        if (!(source.OpenCircuitVoltageV > 0) || !double.IsFinite(source.OpenCircuitVoltageV))
        {
            Preconditions.Positive(source.OpenCircuitVoltageV, "open-circuit voltage");
        }
        if (!(source.ResistanceOhm >= 0) || !double.IsFinite(source.ResistanceOhm))
        {
            Preconditions.NonNegative(source.ResistanceOhm, "pack resistance");
        }
    }

    /// <summary>Evaluates one drivetrain at a known bus voltage (an ideal bus, no pack sag).</summary>
    /// <param name="busVoltageV">Bus voltage, V, greater than 0.</param>
    /// <param name="input">The controller's input.</param>
    /// <returns>The drivetrain's state at that bus voltage.</returns>
    /// <exception cref="ArgumentException">The input has no drivetrain.</exception>
    /// <exception cref="ArgumentOutOfRangeException">A value is not finite or out of its physical range.</exception>
    public static DrivePoint Evaluate(double busVoltageV, in DriveInput input)
    {
        Preconditions.Positive(busVoltageV, nameof(busVoltageV));
        var terms = DriveStation.Prepare(input);
        return terms.PointAt(busVoltageV);
    }

    private static BusSolution Scan(BusSource source, Span<DriveStation> terms, Span<DrivePoint> points, int passes)
    {
        double voc = source.OpenCircuitVoltageV, rp = source.ResistanceOhm;
        int n = terms.Length;
        int capacity = n * BreakpointsPerStation;
        Span<double> breaks = n <= StackStations ? stackalloc double[capacity] : new double[capacity];
        int count = 0;
        for (int j = 0; j < n; j++)
        {
            count += terms[j].Breakpoints(breaks[count..]);
        }
        var sorted = breaks[..count];
        sorted.Sort();

        double hi = double.PositiveInfinity;
        for (int k = count - 1; k >= -1; k--)
        {
            double lo = k >= 0 ? sorted[k] : 0.0;
            if (lo >= hi)
            {
                continue;
            }
            passes++;
            double probe = double.IsPositiveInfinity(hi) ? 2 * lo + 1 : 0.5 * (lo + hi);
            Sums(terms, probe, out double a, out double b, out double c);
            if (Roots(1 + rp * b, voc - rp * a, rp * c, out double r1, out double r2))
            {
                double eps = 1e-12 * Math.Max(1.0, double.IsPositiveInfinity(hi) ? lo : hi);
                if (r1 > 0 && r1 >= lo - eps && r1 <= hi + eps)
                {
                    return Finish(source, terms, points, r1, passes, scanned: true);
                }
                if (r2 > 0 && r2 >= lo - eps && r2 <= hi + eps)
                {
                    return Finish(source, terms, points, r2, passes, scanned: true);
                }
            }
            hi = lo;
        }
        for (int j = 0; j < n; j++)
        {
            points[j] = default;
        }
        return new BusSolution(BusStatus.NoSolution, 0, 0, voc, passes, Scanned: true);
    }

    private static BusSolution Finish(BusSource source, Span<DriveStation> terms, Span<DrivePoint> points, double v, int passes, bool scanned)
    {
        double packCurrent = 0;
        for (int j = 0; j < terms.Length; j++)
        {
            var p = terms[j].PointAt(v);
            points[j] = p;
            packCurrent += p.BusCurrentA;
        }
        var status = v < 0.5 * source.OpenCircuitVoltageV ? BusStatus.Collapsed : BusStatus.Solved;
        return new BusSolution(status, v, packCurrent, source.OpenCircuitVoltageV, passes, scanned);
    }

    // Coefficients of sum(I_bus) = A + B V + C / V for the rules in force at voltage v.
    private static void Sums(Span<DriveStation> terms, double v, out double a, out double b, out double c)
    {
        a = 0;
        b = 0;
        c = 0;
        for (int j = 0; j < terms.Length; j++)
        {
            Single(ref terms[j], v, out double aj, out double bj, out double cj);
            a += aj;
            b += bj;
            c += cj;
        }
    }

    // One station's share of A, B and C at voltage v.
    private static void Single(ref DriveStation t, double v, out double a, out double b, out double c)
    {
        t.RuleAt(v, out double value, out bool driven);
        if (driven)
        {
            a = t.Idle - value * t.E / t.Rt;
            b = value * value / t.Rt;
            c = 0;
        }
        else
        {
            a = t.Idle;
            b = 0;
            c = (value * t.Rt + t.E) * value;
        }
    }

    // Real roots of a2 V^2 - p V + q = 0 (a2 > 0), larger first; cancellation-free (Vieta for the smaller magnitude).
    private static bool Roots(double a2, double p, double q, out double r1, out double r2)
    {
        if (q == 0)
        {
            r1 = Math.Max(p / a2, 0);
            r2 = Math.Min(p / a2, 0);
            return true;
        }
        double disc = p * p - 4 * a2 * q;
        if (disc < 0 || !double.IsFinite(disc))
        {
            r1 = r2 = double.NaN;
            return false;
        }
        double s = Math.Sqrt(disc);
        double big = (p >= 0 ? p + s : p - s) / (2 * a2);
        double other = q / (a2 * big);
        r1 = Math.Max(big, other);
        r2 = Math.Min(big, other);
        return true;
    }
}

using MathNet.Numerics.RootFinding;

namespace RotorDrive.Core.Craft;

/// <summary>Yaw balance: residual yaw torque with equal duties, the differential duty that cancels it, the yaw
/// authority of the trim, and the yaw caused by small mismatches between paired rotors.</summary>
/// <remarks>The reaction of each rotor on the frame equals its shaft torque signed by its spin (Newton's third law;
/// steady speed, so no J d(omega)/dt term). Equal duty and differential duty are 1-D Brent roots (lift = weight, yaw =
/// 0) over <see cref="CommonDutyHover.SpeedsAt"/>; the authority is a bisection on the commanded yaw torque of
/// <see cref="HoverTrim.Solve(RigModel, double, double, HoverOptions?)"/> while every limit holds. Thread-safe.</remarks>
public static class YawBalance
{
    /// <summary>Analyses the rig's yaw balance at its design gap.</summary>
    /// <param name="model">The rig model.</param>
    /// <param name="options">Numerical settings; defaults when null.</param>
    public static YawResult Analyse(RigModel model, HoverOptions? options = null)
    {
        Preconditions.NotNull(model, nameof(model));
        options ??= HoverOptions.Default;
        var findings = new List<string>();
        var split = new DutySplit(model, options);
        double maxDuty = model.Limits.MaxDuty;
        bool cwGroup = model.Stations.Any(s => s.Spin == SpinDirection.Clockwise), ccwGroup = model.Stations.Any(s => s.Spin == SpinDirection.CounterClockwise);

        double? equal = null, residual = null, accel = null, delta = null, cwDuty = null, ccwDuty = null;
        YawSensitivity? sensitivity = null;
        if (split.Excess(maxDuty, maxDuty) < 0)
        {
            findings.Add($"no equal duty up to the limit {maxDuty:0.00} carries the weight at the design gap");
        }
        else
        {
            double d = Brent.FindRoot(x => split.Excess(x, x), 1e-4, maxDuty, 1e-12, 200);
            equal = d;
            double yaw = split.YawAt(d, d);
            residual = yaw;
            accel = yaw / model.YawInertiaKgM2;
            if (!cwGroup || !ccwGroup)
            {
                findings.Add("all rotors spin the same way: no differential duty can cancel their reaction");
            }
            else
            {
                if (split.Cancelling(d, yaw) is { } found)
                {
                    (delta, cwDuty, ccwDuty) = found;
                }
                else
                {
                    findings.Add("no differential duty within the duty limit cancels the residual yaw torque while carrying the weight");
                }
                int a = model.Stations.Select((s, i) => (s, i)).First(p => p.s.Spin == SpinDirection.Clockwise).i;
                int b = model.Stations.Select((s, i) => (s, i)).First(p => p.s.Spin == SpinDirection.CounterClockwise).i;
                sensitivity = Sensitivity(model, split.Duties(d, d), model.DesignGapM, yaw, a, b, options);
            }
        }

        double positive = Authority(model, model.DesignGapM, +1, model.Limits.YawTorqueNm, options, out string? positiveLimit);
        double negative = Authority(model, model.DesignGapM, -1, model.Limits.YawTorqueNm, options, out string? negativeLimit);
        if (positive == 0 && negative == 0)
        {
            findings.Add("the trimmed hover itself breaks a limit or has no balance: no yaw authority");
        }
        return new YawResult(equal, residual, accel, delta, cwDuty, ccwDuty, positive, negative, model.Limits.YawTorqueNm,
            positive <= negative ? positiveLimit : negativeLimit, sensitivity, findings);
    }

    // The craft at one duty for the clockwise group and one for the counter-clockwise group, at the design gap: its lift
    // beyond the weight, its yaw torque, and the differential duty that cancels the yaw while carrying the weight.
    private sealed class DutySplit(RigModel model, HoverOptions options)
    {
        private readonly double _maxDuty = model.Limits.MaxDuty;

        public double[] Duties(double cwDuty, double ccwDuty)
        {
            var d = new double[model.Stations.Count];
            for (int i = 0; i < d.Length; i++)
            {
                d[i] = Math.Clamp(model.Stations[i].Spin == SpinDirection.Clockwise ? cwDuty : ccwDuty, 0, 1);
            }
            return d;
        }

        public double Excess(double cwDuty, double ccwDuty)
            => CommonDutyHover.SpeedsAt(model, Duties(cwDuty, ccwDuty), model.DesignGapM, options).TotalLiftN - model.WeightN;

        public double YawAt(double cwDuty, double ccwDuty)
            => CommonDutyHover.SpeedsAt(model, Duties(cwDuty, ccwDuty), model.DesignGapM, options).YawTorqueNm;

        // The differential duty (cw minus ccw) and the two duties that cancel the yaw at equal duty d, or null when none
        // within the duty limit does. Walks out from zero both ways until the yaw changes sign, then Brent in the last
        // step: which way depends on the regime (above the drag peak a faster rotor has less shaft torque, below more).
        public (double Delta, double Cw, double Ccw)? Cancelling(double d, double yaw)
        {
            if (yaw == 0)
            {
                return (0, d, d);
            }
            double span = 2 * Math.Min(d, _maxDuty - d);
            Span<double> prev = [0.0, 0.0];
            Span<double> fPrev = [yaw, yaw];
            Span<bool> open = [true, true];
            for (int k = 1; k <= 40; k++)
            {
                for (int side = 0; side < 2; side++)
                {
                    if (!open[side])
                    {
                        continue;
                    }
                    double x = (side == 0 ? 1 : -1) * span * k / 40.0;
                    double f = Yaw(x);
                    if (double.IsNaN(f))
                    {
                        open[side] = false;
                        continue;
                    }
                    if (Math.Sign(f) != Math.Sign(fPrev[side]))
                    {
                        double root = Brent.FindRoot(Yaw, Math.Min(prev[side], x), Math.Max(prev[side], x), 1e-12, 200);
                        double c = Common(root);
                        return (root, c + root / 2, c - root / 2);
                    }
                    prev[side] = x;
                    fPrev[side] = f;
                }
            }
            return null;
        }

        // For a split delta, the common part that still carries the weight (NaN when none does), then the yaw there.
        private double Common(double dd)
        {
            double lo = Math.Max(1e-4, Math.Abs(dd) / 2 + 1e-4), hi = _maxDuty - Math.Abs(dd) / 2;
            if (!(hi > lo) || Excess(hi + dd / 2, hi - dd / 2) < 0 || Excess(lo + dd / 2, lo - dd / 2) > 0)
            {
                return double.NaN;
            }
            return Brent.FindRoot(x => Excess(x + dd / 2, x - dd / 2), lo, hi, 1e-12, 200);
        }

        private double Yaw(double dd)
        {
            double c = Common(dd);
            return double.IsNaN(c) ? double.NaN : YawAt(c + dd / 2, c - dd / 2);
        }
    }

    /// <summary>The equal-duty yaw residual alone: the common duty that carries the weight at the design gap (Brent, to
    /// 1e-12 in duty, as <see cref="Analyse"/>) and the net yaw torque there.</summary>
    /// <remarks>The same root as <see cref="Analyse"/>'s <see cref="YawResult.EqualDuty"/> (the total lift rises with the
    /// common duty), found with fewer equal-duty solves (<see cref="CommonDutyHover.SpeedsAt"/>): from a guess (by default
    /// the mean duty that holds every rotor at the one speed carrying the weight, on the shared bus), a secant step to a
    /// point 1 % away gives a narrow bracket for Brent; the whole duty range is searched when the bracket misses. Each
    /// duty's state is solved once (Brent's endpoint and final evaluations reuse it). A Monte Carlo sample needs only this
    /// part of the yaw analysis.</remarks>
    /// <param name="model">The rig model.</param>
    /// <param name="guessDuty">A duty near the root, in (0, 1], or null for the common-speed estimate.</param>
    /// <param name="options">Numerical settings; defaults when null.</param>
    /// <exception cref="ArgumentOutOfRangeException">The guess is outside (0, 1].</exception>
    public static EqualDutyYaw EqualDutyResidual(RigModel model, double? guessDuty = null, HoverOptions? options = null)
    {
        Preconditions.NotNull(model, nameof(model));
        options ??= HoverOptions.Default;
        int n = model.Stations.Count;
        double gap = model.DesignGapM, weight = model.WeightN, maxDuty = model.Limits.MaxDuty;
        var solved = new List<(double Duty, EqualDutyState State)>();
        EqualDutyState At(double d)
        {
            foreach (var (duty, state) in solved)
            {
                if (duty == d)
                {
                    return state;
                }
            }
            var s = CommonDutyHover.SpeedsAt(model, Enumerable.Repeat(Math.Clamp(d, 0, 1), n).ToArray(), gap, options);
            solved.Add((d, s));
            return s;
        }
        double Excess(double d) => At(d).TotalLiftN - weight;

        double lo = 1e-4, hi = maxDuty;
        bool narrow = false;
        if (guessDuty is { } given)
        {
            Preconditions.InRange(given, double.Epsilon, 1, nameof(guessDuty));
        }
        if ((guessDuty ?? CommonSpeedDuty(model, gap)) is { } g && g > lo && g < hi)
        {
            double h = g + 0.01 * g <= hi ? 0.01 * g : -0.01 * g;
            double f0 = Excess(g), f1 = Excess(g + h);
            double root = f1 != f0 ? g - f0 * h / (f1 - f0) : g;
            // The secant's error is second order in its distance from the guess; a tenth of that distance covers it.
            double width = Math.Max(0.1 * Math.Abs(root - g), 1e-6);
            double a = Math.Max(lo, root - width), b = Math.Min(hi, root + width);
            if (double.IsFinite(root) && a < b && Excess(a) < 0 && Excess(b) > 0)
            {
                (lo, hi, narrow) = (a, b, true);
            }
        }
        if (!narrow && Excess(maxDuty) < 0)
        {
            return new EqualDutyYaw(null, null, solved.Count);
        }
        double equal = Brent.FindRoot(Excess, lo, hi, 1e-12, 200);
        return new EqualDutyYaw(equal, At(equal).YawTorqueNm, solved.Count);
    }

    // The mean duty that holds every station at the one speed carrying the weight (motor current for its load torque,
    // duties from the shared bus), or null when no speed up to the slowest rated speed carries it.
    private static double? CommonSpeedDuty(RigModel model, double gapM)
    {
        var st = model.Stations;
        double rated = st.Min(s => s.Rotor.MaxSpeedRadPerS);
        double Lift(double w)
        {
            double sum = -model.WeightN;
            foreach (var s in st)
            {
                sum += s.LoadAt(w, gapM).LiftN;
            }
            return sum;
        }
        if (!(Lift(rated) > 0) || !Brent.TryFindRoot(Lift, 1e-6 * rated, rated, 1e-9 * rated, 200, out double w0))
        {
            return null;
        }
        var inputs = new Drive.DriveInput[st.Count];
        var points = new Drive.DrivePoint[st.Count];
        for (int i = 0; i < st.Count; i++)
        {
            var s = st[i];
            double current = s.Drivetrain.Motor.CurrentForTorqueA(s.LoadAt(w0, gapM).TotalTorqueNm, s.FluxFactor);
            inputs[i] = s.Input(Drive.DriveCommand.MotorCurrent(current), w0);
        }
        Drive.DriveBus.Solve(model.Source, inputs, points);
        double mean = points.Average(p => p.Duty);
        return double.IsFinite(mean) ? mean : null;
    }

    private static YawSensitivity Sensitivity(RigModel model, double[] duties, double gap, double nominal, int a, int b, HoverOptions options)
    {
        var s = model.Stations[a];
        var motor = s.Drivetrain.Motor;
        var kv = model.WithParts(a, motor with { KvRadPerSPerV = motor.KvRadPerSPerV * 1.01 }, s.Drivetrain.Controller);
        var gapped = model.WithConditions(a, s.Conditions with { GapOffsetM = s.Conditions.GapOffsetM + 0.001 });
        var warm = model.WithConditions(a, s.Conditions with { PlateTempC = s.Conditions.PlateTempC + 10 });
        double Yaw(RigModel m) => CommonDutyHover.SpeedsAt(m, duties, gap, options).YawTorqueNm - nominal;
        return new YawSensitivity(a, b, Yaw(kv), Yaw(gapped), Yaw(warm));
    }

    // Largest |yaw torque| in one direction for which the trim hovers within every limit (doubling, then bisection), and
    // the limit that bounds it: the first finding of the failed trim just beyond the edge.
    private static double Authority(RigModel model, double gap, int sign, double limit, HoverOptions options, out string? limitedBy)
    {
        HoverResult? last = null;
        bool Holds(double t)
        {
            var r = HoverTrim.Solve(model, gap, sign * t, options);
            if (r.Status != HoverStatus.Hovering)
            {
                last = r;
                return false;
            }
            return true;
        }
        limitedBy = null;
        if (!Holds(0))
        {
            limitedBy = last?.Findings.FirstOrDefault()?.Limit;
            return 0;
        }
        double lo = 0, hi = Math.Max(limit, 1e-3);
        int doublings = 0;
        while (Holds(hi))
        {
            lo = hi;
            hi *= 2;
            if (++doublings > 30)
            {
                return lo;
            }
        }
        for (int k = 0; k < 40 && hi - lo > 1e-4 * Math.Max(limit, hi); k++)
        {
            double mid = 0.5 * (lo + hi);
            if (Holds(mid))
            {
                lo = mid;
            }
            else
            {
                hi = mid;
            }
        }
        // The limit met at the edge: every failed probe becomes the new hi, so `last` is the trim just beyond the
        // authority found (within the bisection's tolerance). The doubling's first failure can lie far beyond the edge,
        // where other limits have failed too (issue 14 item 4).
        limitedBy = last?.Findings.FirstOrDefault()?.Limit;
        return lo;
    }
}

using MathNet.Numerics.RootFinding;
using RotorDrive.Core.Drive;

namespace RotorDrive.Core.Craft;

/// <summary>The reverse hover question: with every station at given duties (no trim), where do the rotors settle, and
/// at which gap does their total lift carry the weight.</summary>
/// <remarks>Each rotor takes its highest stable equilibrium at its duty (scan down from the free speed, then Brent),
/// the bus voltage is the root of V = Voc - R_pack sum(I_bus(V)) (Brent), and the gap is the root of total lift(gap) =
/// weight (Brent, R. P. Brent, Algorithms for Minimization without Derivatives, 1973, via MathNet). The drive
/// equations are the drive module's (M. Drela, First-Order DC Electric Motor Model, MIT 2007). Thread-safe.</remarks>
public static class CommonDutyHover
{
    /// <summary>The speeds every station settles at with the given duties at a gap, on the shared bus.</summary>
    /// <param name="model">The rig model.</param>
    /// <param name="duties">One duty per station, 0..1.</param>
    /// <param name="gapM">Rig gap, m (&gt; 0).</param>
    /// <param name="options">Numerical settings; defaults when null.</param>
    public static EqualDutyState SpeedsAt(RigModel model, IReadOnlyList<double> duties, double gapM, HoverOptions? options = null)
    {
        Preconditions.NotNull(model, nameof(model));
        Preconditions.NotNull(duties, nameof(duties));
        Preconditions.Positive(gapM, nameof(gapM));
        options ??= HoverOptions.Default;
        options.Validate();
        int n = model.Stations.Count;
        if (duties.Count != n)
        {
            throw new ArgumentException($"Expected {n} duties (one per station); got {duties.Count}.", nameof(duties));
        }
        foreach (double d in duties)
        {
            Preconditions.InRange(d, 0, 1, nameof(duties));
        }
        var speeds = new double[n];
        var busCurrents = new double[n];
        double voc = model.Source.OpenCircuitVoltageV, rp = model.Source.ResistanceOhm;

        double Mismatch(double v)
        {
            double total = 0;
            for (int i = 0; i < n; i++)
            {
                speeds[i] = TopEquilibrium(model.Stations[i], duties[i], v, gapM, options, out busCurrents[i]);
                total += busCurrents[i];
            }
            return v - (voc - rp * total);
        }

        bool converged;
        double busV;
        if (rp == 0 || Mismatch(voc) == 0)
        {
            busV = voc;
            converged = true;
        }
        else
        {
            converged = Brent.TryFindRoot(Mismatch, 0.05 * voc, voc, 1e-10 * voc, 200, out busV);
            if (!converged)
            {
                busV = 0.05 * voc;
            }
        }
        Mismatch(busV);
        var lifts = new double[n];
        var reactions = new double[n];
        double pack = 0;
        for (int i = 0; i < n; i++)
        {
            var s = model.Stations[i];
            var load = s.LoadAt(speeds[i], gapM);
            lifts[i] = load.LiftN;
            reactions[i] = s.Spin.Sign() * load.TotalTorqueNm;
            pack += busCurrents[i];
        }
        return new EqualDutyState(converged, speeds, lifts, reactions, busV, pack);
    }

    /// <summary>The gap at which the craft hovers with every station at one common duty, and the full hover state there
    /// (pitch, roll and yaw are not trimmed: their residuals show how the craft would tilt and turn).</summary>
    /// <param name="model">The rig model.</param>
    /// <param name="duty">The common duty, 0..1.</param>
    /// <param name="options">Numerical settings; defaults when null.</param>
    public static HoverResult Solve(RigModel model, double duty, HoverOptions? options = null)
    {
        Preconditions.NotNull(model, nameof(model));
        Preconditions.InRange(duty, 0, 1, nameof(duty));
        return GapFor(model, Enumerable.Repeat(duty, model.Stations.Count).ToArray(), HoverMode.CommonDuty,
            System.FormattableString.Invariant($"at duty {duty:0.000}"), options);
    }

    /// <summary>A guided sled with a duty set on every station (<see cref="Station.Duty"/>): the gap at which those duties'
    /// total lift carries the weight (Brent on lift(gap) - weight between half the landed gap and three times the design
    /// gap) and the state there (<see cref="HoverMode.GuidedSetDuties"/>; the pitch and roll residuals and the yaw torque are what
    /// the rails carry). When the duties lift less than the weight even at the smallest gap, or more at the largest, the
    /// result holds no state and one "lift" finding says which; when the gap found lies below the landed gap (the gear
    /// holds the sled there, so that state cannot exist), none either, with one "landed_gap" finding.</summary>
    /// <param name="model">The rig model.</param>
    /// <param name="duties">One duty per station, 0..1.</param>
    /// <param name="options">Numerical settings; defaults when null.</param>
    /// <exception cref="ArgumentException">The number of duties differs from the number of stations.</exception>
    public static HoverResult SolveDuties(RigModel model, IReadOnlyList<double> duties, HoverOptions? options = null)
    {
        Preconditions.NotNull(model, nameof(model));
        Preconditions.NotNull(duties, nameof(duties));
        return GapFor(model, duties.ToArray(), HoverMode.GuidedSetDuties, "at the stations' set duties", options);
    }

    // The gap where these duties' total lift equals the weight, and the state there; no state when none in the range.
    private static HoverResult GapFor(RigModel model, double[] duties, HoverMode mode, string what, HoverOptions? options)
    {
        options ??= HoverOptions.Default;
        double weight = model.WeightN;
        double lo = 0.5 * model.Rig.LandedGapM, hi = 3.0 * model.DesignGapM;
        int evaluations = 0;
        double Excess(double g)
        {
            evaluations++;
            return SpeedsAt(model, duties, g, options).TotalLiftN - weight;
        }
        var inv = System.Globalization.CultureInfo.InvariantCulture;
        double atLo = Excess(lo);
        if (atLo < 0)
        {
            return NoGap(model, mode, lo, string.Create(inv, $"{what} the rotors lift only {atLo + weight:0} N even at {lo * 1000:0.0} mm (half the landed gap), less than the weight ({weight:0} N)"), evaluations);
        }
        double atHi = Excess(hi);
        if (atHi > 0)
        {
            return NoGap(model, mode, hi, string.Create(inv, $"{what} the rotors still lift {atHi + weight:0} N at {hi * 1000:0.0} mm (3 x the design gap), more than the weight ({weight:0} N): the craft would rise beyond the searched range"), evaluations);
        }
        double gap = Brent.FindRoot(Excess, lo, hi, 1e-10 * hi, 200);
        double landed = model.Rig.LandedGapM;
        if (gap < landed)
        {
            // The gear stops the craft at its landed gap: the state at the root cannot exist.
            return NoGap(model, mode, gap, string.Create(inv, $"{what} the rotors carry the weight only at {gap * 1000:0.00} mm, below the landed gap ({landed * 1000:0.0} mm): the craft stays on its gear"), evaluations, "landed_gap");
        }
        var state = SpeedsAt(model, duties, gap, options);
        return HoverTrim.Describe(model, mode, gap, state.SpeedsRadPerS.ToArray(), evaluations);
    }

    /// <summary>A guided sled at a fixed gap: the one common duty at which the rotors' total lift equals the weight
    /// (bisection on the duty, <see cref="SpeedsAt"/>'s lift), and the hover state there with its margins and findings
    /// (<see cref="HoverMode.Guided"/>; the pitch and roll residuals and the yaw torque are what the rails carry).</summary>
    /// <remarks>The duty is searched in [0, top], top = the smaller of the rig's max_duty and every controller's maximum
    /// duty, so no duty above max_duty is ever returned. Each rotor's top equilibrium speed rises with its duty (the
    /// motor torque at a speed rises with the applied voltage), so the total lift is monotone in the duty on a stiff bus;
    /// with pack sag the bisection still needs only the sign change between 0 and top. When even top does not lift the
    /// weight the result holds no state and one "duty_headroom" finding names that limit.</remarks>
    /// <param name="model">The rig model.</param>
    /// <param name="gapM">Rig gap, m (&gt; 0).</param>
    /// <param name="options">Numerical settings; defaults when null.</param>
    public static HoverResult SolveAtGap(RigModel model, double gapM, HoverOptions? options = null)
    {
        Preconditions.NotNull(model, nameof(model));
        Preconditions.Positive(gapM, nameof(gapM));
        options ??= HoverOptions.Default;
        int n = model.Stations.Count;
        double weight = model.WeightN;
        double top = model.Stations.Select(s => s.Drivetrain.MaxDuty).Append(model.Limits.MaxDuty).Min();
        int evaluations = 0;
        EqualDutyState At(double duty)
        {
            evaluations++;
            return SpeedsAt(model, Enumerable.Repeat(duty, n).ToArray(), gapM, options);
        }
        var atTop = At(top);
        if (atTop.TotalLiftN < weight)
        {
            string limit = top < model.Limits.MaxDuty ? "the controllers' maximum duty" : "the rig's max_duty";
            return new HoverResult(HoverMode.Guided, HoverStatus.NoBalance, gapM, model.MassKg, weight, [], double.NaN, double.NaN,
                double.NaN, double.NaN, double.NaN, double.NaN, double.NaN, double.NaN, [],
                [new HoverFinding(DriveLimit.DutyHeadroom.Key(), null, System.FormattableString.Invariant(
                    $"no hover at {gapM * 1000:0.00} mm: even at {limit} {top:0.000} on every station the rotors lift only {atTop.TotalLiftN:0.0} N, less than the weight ({weight:0.0} N)"))],
                evaluations);
        }
        // Bisection: lift(lo) < weight <= lift(hi); the duty is found to 1e-12 (about 40 halvings).
        double lo = 0, hi = top;
        var state = atTop;
        while (hi - lo > 1e-12)
        {
            double mid = 0.5 * (lo + hi);
            var s = At(mid);
            if (s.TotalLiftN < weight)
            {
                lo = mid;
            }
            else
            {
                hi = mid;
                state = s;
            }
        }
        var result = HoverTrim.Describe(model, HoverMode.Guided, gapM, state.SpeedsRadPerS.ToArray(), evaluations);
        if (result.Balanced && Math.Abs(result.ForceResidualRatio) > LiftTolerance)
        {
            // A rotor's top equilibrium jumped between two duties 1e-12 apart: no duty carries exactly the weight.
            result = result with
            {
                Status = HoverStatus.LimitExceeded,
                Findings = [.. result.Findings, new HoverFinding("lift", null, System.FormattableString.Invariant(
                    $"no common duty lifts exactly the weight at {gapM * 1000:0.00} mm: the lift jumps to {result.ForceResidualRatio * 100:+0.0;-0.0} % of it at duty {hi:0.000} (a rotor leaves a lower equilibrium)"))],
            };
        }
        return result;
    }

    // Relative lift mismatch beyond which a guided hover's bisection has met a jump, not a root.
    private const double LiftTolerance = 1e-6;

    private static HoverResult NoGap(RigModel model, HoverMode mode, double gapM, string message, int evaluations, string criterion = "lift")
        => new(mode, HoverStatus.NoBalance, gapM, model.MassKg, model.WeightN, [], double.NaN, double.NaN,
            double.NaN, double.NaN, double.NaN, double.NaN, double.NaN, double.NaN, [], [new HoverFinding(criterion, null, message)], evaluations);

    // The highest speed where motor torque at this duty and bus voltage meets the load torque (stable from above: the
    // motor's torque falls below the load's beyond it); 0 when the rotor cannot leave rest.
    internal static double TopEquilibrium(CraftStation station, double duty, double busV, double gapM, HoverOptions options, out double busCurrentA)
    {
        var command = DriveCommand.Duty(duty);
        double F(double w)
            => DriveBus.Evaluate(busV, station.Input(command, w)).TorqueNm - station.LoadAt(w, gapM).TotalTorqueNm;
        double free = Math.Min(duty, station.Drivetrain.MaxDuty) * busV * station.Drivetrain.Motor.KvRadPerSPerV / station.FluxFactor;
        double speed = 0;
        if (free > 0)
        {
            int m = options.ScanPoints;
            double above = free, fAbove = F(free);
            for (int k = 1; k <= m; k++)
            {
                double w = free * (1 - k / (double)m);
                double f = k == m ? F(0) : F(w);
                if (f > 0 && fAbove <= 0)
                {
                    speed = Brent.TryFindRoot(F, w, above, 1e-12 * free, 200, out double root) ? root : w;
                    break;
                }
                above = w;
                fAbove = f;
            }
        }
        busCurrentA = DriveBus.Evaluate(busV, station.Input(command, speed)).BusCurrentA;
        return speed;
    }
}

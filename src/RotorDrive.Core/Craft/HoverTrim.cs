using MathNet.Numerics.RootFinding;
using RotorDrive.Core.Drive;
using RotorDrive.Core.Numerics;
using static System.FormattableString;

namespace RotorDrive.Core.Craft;

/// <summary>Trimmed hover: per-station speeds and duties that hold the craft level at a given gap with total lift =
/// weight, zero pitch and roll moment about the centre of gravity and a commanded (normally zero) net yaw torque.</summary>
/// <remarks>At a fixed gap each rotor's lift and shaft torque depend only on its own speed and conditions, so the balance
/// is solved in speed space: Newton's method on the four constraints with a central-difference Jacobian (J. Nocedal &amp;
/// S. J. Wright, Numerical Optimization, 2nd ed. 2006, ch. 11 and 18). Four stations give a square system. With more,
/// each step solves the equality-constrained least-norm problem min sum (w_i - mean w)^2 subject to the linearised
/// constraints (KKT system, Nocedal &amp; Wright eq. 16.4, solved by Gaussian elimination with partial pivoting): the speeds, not the duties, are spread as
/// little as possible, because lift, torque and plate heating are functions of speed, so equal speeds mean equal
/// loading and wear and the solution is independent of the drivetrain (the same trim serves every candidate motor in a
/// ranking). Each station's duty then follows from the drive equations on the shared bus (<see cref="DriveBus"/> with
/// the motor current that gives the shaft torque, M. Drela, First-Order DC Electric Motor Model, MIT 2007), and the
/// equilibrium is checked for stability at that duty. The speed solve is shared with the catalog ranking, which warm-starts
/// it from its previous candidate: Newton's fixed point does not depend on the start, so the ranking's speeds are the
/// hover's. Thread-safe; allocates only small arrays.</remarks>
public static partial class HoverTrim
{
    private const double DiffStep = 1e-6;
    private const double CurvatureStep = 1e-4;

    // Newton stops once the constraints hold and the last step moved no speed by more than this fraction of the scale
    // speed; that step is applied, and Newton's convergence then leaves the speeds within about its square (relative) of
    // the least-spread trim.
    internal const double StepTolerance = 1e-7;

    /// <summary>Trims the craft at its design gap with zero net yaw torque.</summary>
    /// <param name="model">The rig model.</param>
    /// <param name="options">Numerical settings; defaults when null.</param>
    public static HoverResult Solve(RigModel model, HoverOptions? options = null)
        => Solve(model, Preconditions.NotNull(model, nameof(model)).DesignGapM, 0.0, options);

    /// <summary>Trims the craft at a gap with a commanded net yaw torque (0 to hold heading; non-zero to turn).</summary>
    /// <param name="model">The rig model.</param>
    /// <param name="gapM">Rig gap, m (&gt; 0).</param>
    /// <param name="yawTorqueNm">Net yaw torque of the rotor reactions on the frame, N m (positive counter-clockwise seen
    /// from above).</param>
    /// <param name="options">Numerical settings; defaults when null.</param>
    public static HoverResult Solve(RigModel model, double gapM, double yawTorqueNm, HoverOptions? options = null)
    {
        Preconditions.NotNull(model, nameof(model));
        Preconditions.Positive(gapM, nameof(gapM));
        Preconditions.Finite(yawTorqueNm, nameof(yawTorqueNm));
        options ??= HoverOptions.Default;
        options.Validate();
        int n = model.Stations.Count;
        if (n < 4)
        {
            return Failed(model, gapM, HoverStatus.TooFewStations, new HoverFinding("stations", null,
                $"a trim needs at least four stations to balance force, pitch, roll and yaw; the rig has {n}"), 0);
        }
        var speeds = new double[n];
        var outcome = SolveSpeeds(model.Stations, gapM, model.WeightN, model.CgXM, model.CgYM, yawTorqueNm, speeds, warm: false,
            options, new HoverTrimWorkspace(n), out int iterations);
        return outcome switch
        {
            SpeedSolve.Converged => Describe(model, HoverMode.Trimmed, gapM, speeds, iterations),
            SpeedSolve.TooHeavy => Failed(model, gapM, HoverStatus.NoBalance, new HoverFinding(DriveLimit.RotorMaxSpeed.Key(), null,
                $"even at {options.SpeedSearchFactor:0.#} x their rated speed the rotors lift less than the weight ({model.WeightN:0} N) at this gap"), 0),
            _ => Failed(model, gapM, HoverStatus.NoBalance, new HoverFinding("convergence", null,
                $"no speeds balance force, pitch, roll and yaw together within {options.MaxIterations} iterations (the centre of gravity may lie outside the stations, or the yaw demand is too large)"), iterations),
        };
    }

    /// <summary>How a speed solve ended.</summary>
    internal enum SpeedSolve
    {
        Converged,
        TooHeavy,
        NoConvergence,
    }

    /// <summary>The trim in speed space alone: the speeds that balance force, pitch, roll and yaw at a gap for a weight and
    /// centre of gravity, with the least spread about their mean. Every trim goes through here: the public <c>Solve</c> overloads
    /// and the catalog ranking (whose candidates differ only in mass and centre of
    /// gravity, so it warm-starts each from the last).</summary>
    /// <remarks>Cold: all stations start at the common speed whose lifts carry the weight (Brent, MathNet). Warm: from the
    /// given speeds; should Newton fail from there, the cold start is tried, so a warm solve returns what a cold one would.
    /// Newton's fixed point does not depend on the start (see the comment on <c>Newton</c>), so both agree to the convergence
    /// tolerance. Allocates nothing beyond the workspace.</remarks>
    /// <param name="stations">The stations (position, spin, load and conditions are used; the drivetrain is not).</param>
    /// <param name="gapM">Rig gap, m.</param>
    /// <param name="weightN">Weight, N.</param>
    /// <param name="cgXM">Centre of gravity x, m.</param>
    /// <param name="cgYM">Centre of gravity y, m.</param>
    /// <param name="yawTorqueNm">Commanded net yaw torque, N m.</param>
    /// <param name="speeds">Receives the trimmed speeds, rad/s.</param>
    /// <param name="warm">Start from the workspace's last trim, carried to the new weight, centre of gravity and yaw
    /// demand by one tangent step; cold when the workspace holds none.</param>
    /// <param name="options">Numerical settings (validated by the caller).</param>
    /// <param name="workspace">Scratch for this station count; remembers the last trim for the next warm start.</param>
    /// <param name="iterations">Newton iterations of the successful attempt.</param>
    internal static SpeedSolve SolveSpeeds(IReadOnlyList<CraftStation> stations, double gapM, double weightN, double cgXM, double cgYM,
        double yawTorqueNm, double[] speeds, bool warm, HoverOptions options, HoverTrimWorkspace workspace, out int iterations)
    {
        int n = stations.Count;
        var ws = workspace;
        bool continued = warm && ws.Solved;
        ws.Solved = false;
        double rated = double.PositiveInfinity, top = 0;
        foreach (var s in stations)
        {
            rated = Math.Min(rated, s.Rotor.MaxSpeedRadPerS);
            top = Math.Max(top, s.Rotor.MaxSpeedRadPerS * options.SpeedSearchFactor);
        }
        if (continued && Predict(stations, weightN, cgXM, cgYM, yawTorqueNm, speeds, ws, out double mean)
            && Newton(stations, gapM, weightN, cgXM, cgYM, yawTorqueNm, speeds, mean, warmMultipliers: true, options, ws, out iterations))
        {
            // Beyond the search limit the cold solve would have declared the craft too heavy: let it decide.
            bool within = true;
            for (int i = 0; i < n; i++)
            {
                within &= speeds[i] <= top;
            }
            if (within)
            {
                return SpeedSolve.Converged;
            }
            ws.Solved = false;
        }
        double Excess(double w)
        {
            double sum = 0;
            foreach (var s in stations)
            {
                sum += s.LoadAt(w, gapM).LiftN;
            }
            return sum - weightN;
        }
        // Bracket within the rated speed first: the load tables cover it, beyond it the direct model is much slower.
        double bracket = rated;
        if (Excess(bracket) < 0)
        {
            bracket = top;
            if (Excess(top) < 0)
            {
                iterations = 0;
                return SpeedSolve.TooHeavy;
            }
        }
        // The common speed is only a starting point for Newton: a loose tolerance suffices.
        double w0 = Brent.FindRoot(Excess, 1e-6 * bracket, bracket, 1e-6 * bracket, 200);
        Array.Fill(speeds, w0, 0, n);
        return Newton(stations, gapM, weightN, cgXM, cgYM, yawTorqueNm, speeds, w0, warmMultipliers: false, options, ws, out iterations)
            ? SpeedSolve.Converged
            : SpeedSolve.NoConvergence;
    }

    // The continuation's predictor (E. L. Allgower & K. Georg, Introduction to Numerical Continuation Methods, 1990, ch. 2):
    // the last trim's KKT system, whose rows hold the constraints' speed derivatives, taken with the constraints' change
    // under the new weight, centre of gravity and yaw demand (d lift-balance / dW = -1, d pitch / d cg_x = -W,
    // d roll / d cg_y = -W, d yaw / d demand = -1, each scaled as in the last solve) gives the first-order change of the
    // speeds and the multipliers. Newton then starts a step's square away from its fixed point. False when the step
    // is unusable (a speed not positive).
    private static bool Predict(IReadOnlyList<CraftStation> st, double weightN, double cgXM, double cgYM, double yawTorqueNm,
        double[] speeds, HoverTrimWorkspace ws, out double mean)
    {
        int n = st.Count;
        int size = n + 4;
        double w0 = ws.SolvedW0;
        var kkt = ws.Kkt.AsSpan(0, size * size);
        var rhs = ws.Rhs.AsSpan(0, size);
        ws.LastKkt.AsSpan(0, size * size).CopyTo(kkt);
        double um = 0;
        for (int i = 0; i < n; i++)
        {
            um += ws.SolvedSpeeds[i] / w0;
        }
        um /= n;
        for (int i = 0; i < n; i++)
        {
            rhs[i] = -(ws.SolvedSpeeds[i] / w0 - um);
        }
        double w = ws.SolvedWeightN;
        rhs[n] = (weightN - w) * ws.SolvedScale[0];
        rhs[n + 1] = w * (cgXM - ws.SolvedCgXM) * ws.SolvedScale[1];
        rhs[n + 2] = w * (cgYM - ws.SolvedCgYM) * ws.SolvedScale[2];
        rhs[n + 3] = (yawTorqueNm - ws.SolvedYawNm) * ws.SolvedScale[3];
        mean = 0;
        if (!DenseSolve.Solve(kkt, rhs, size))
        {
            return false;
        }
        for (int i = 0; i < n; i++)
        {
            speeds[i] = ws.SolvedSpeeds[i] + rhs[i] * w0;
            if (!(speeds[i] > 0) || !double.IsFinite(speeds[i]))
            {
                return false;
            }
            mean += speeds[i];
        }
        mean /= n;
        for (int k = 0; k < 4; k++)
        {
            // Scale-free multipliers (lambda x constraint scale x w0^2 does not depend on the scaling; see Newton).
            ws.Mu[k] = rhs[n + k] * ws.SolvedScale[k] * w0 * w0;
        }
        return true;
    }

    /// <summary>The largest payload with which the craft still trims and every limit holds, by bisection on the payload
    /// between 0 and the model's payload.</summary>
    /// <param name="model">The rig model (its payload is the upper end of the search).</param>
    /// <param name="options">Numerical settings; defaults when null.</param>
    /// <returns>The payload, kg, within <see cref="HoverOptions.PayloadToleranceKg"/> below the true limit; the model's
    /// own payload if it hovers; null when even the empty craft does not.</returns>
    public static double? MaxPayloadKg(RigModel model, HoverOptions? options = null)
        => MaxPayloadKg(model, Preconditions.NotNull(model, nameof(model)).DesignGapM, options);

    /// <summary>The largest payload with which the craft still trims at a gap with every limit holding (bisection on the
    /// payload between 0 and the model's payload).</summary>
    /// <param name="model">The rig model (its payload is the upper end of the search).</param>
    /// <param name="gapM">Rig gap, m.</param>
    /// <param name="options">Numerical settings; defaults when null.</param>
    /// <returns>The payload, kg; the model's own payload if it hovers; null when even the empty craft does not.</returns>
    public static double? MaxPayloadKg(RigModel model, double gapM, HoverOptions? options = null)
    {
        Preconditions.NotNull(model, nameof(model));
        options ??= HoverOptions.Default;
        bool Hovers(double p) => Solve(model.WithPayload(p), gapM, 0.0, options).Status == HoverStatus.Hovering;
        double hi = model.PayloadKg;
        if (Hovers(hi))
        {
            return hi;
        }
        if (!Hovers(0))
        {
            return null;
        }
        double lo = 0;
        while (hi - lo > options.PayloadToleranceKg)
        {
            double mid = 0.5 * (lo + hi);
            if (Hovers(mid))
            {
                lo = mid;
            }
            else
            {
                hi = mid;
            }
        }
        return lo;
    }

    // SQP on the four constraints (see the class remarks). Unknowns u = w / w0 for scaling only: at a fixed point the step
    // vanishes, so P u + J^T lambda = 0 and c = 0 with the Jacobian J taken at that point — the first-order conditions of
    // the least-spread trim, which do not involve w0 or the start. Every accepted step is applied, the last (small) one
    // included, so the result lies within about the square of StepTolerance of that point, whatever the start.
    // Multipliers: lambda_k x scale_k x w0^2 is what the stationarity condition fixes (the centring term is (P w) / w0 and the
    // constraint gradients carry scale_k x w0), so warm multipliers are carried in that form (workspace Mu).
    private static bool Newton(IReadOnlyList<CraftStation> st, double gapM, double weight, double cgX, double cgY, double yawTarget,
        double[] speeds, double w0, bool warmMultipliers, HoverOptions options, HoverTrimWorkspace ws, out int iterations)
    {
        int n = st.Count;
        int size = n + 4;
        var sys = new TrimConstraints(st, gapM, weight, cgX, cgY, yawTarget, ws);
        if (!sys.Start(speeds))
        {
            iterations = 0;
            return false;
        }
        var multipliers = ws.Multipliers;
        for (int k = 0; k < 4; k++)
        {
            multipliers[k] = warmMultipliers ? ws.Mu[k] / (ws.Scale[k] * w0 * w0) : 0.0;
        }
        var trial = ws.Trial;
        var rhs = ws.Rhs.AsSpan(0, size);

        // The loads at the start are in the workspace already.
        double merit = sys.Scaled();
        for (iterations = 1; iterations <= options.MaxIterations; iterations++)
        {
            if (!double.IsFinite(merit))
            {
                return false;
            }
            var kkt = ws.Kkt.AsSpan(0, size * size);
            sys.Assemble(speeds, w0, multipliers, kkt, rhs);
            kkt.CopyTo(ws.LastKkt);
            if (!DenseSolve.Solve(kkt, rhs, size))
            {
                return false;
            }
            for (int k = 0; k < 4; k++)
            {
                multipliers[k] = rhs[n + k];
            }
            double largest = 0;
            for (int i = 0; i < n; i++)
            {
                largest = Math.Max(largest, Math.Abs(rhs[i]));
            }
            if (!double.IsFinite(largest))
            {
                return false;
            }
            if (merit <= options.Tolerance && largest <= StepTolerance)
            {
                // Already balanced: take the last, tiny step too (it settles the spread), and stop.
                for (int i = 0; i < n; i++)
                {
                    speeds[i] += rhs[i] * w0;
                }
                Remember(ws, st.Count, speeds, w0, weight, cgX, cgY, yawTarget);
                return true;
            }
            double newMerit = LineSearch(sys, n, speeds, rhs, w0, merit, options.Tolerance, trial, out double alpha);
            if (!double.IsFinite(newMerit))
            {
                return false;
            }
            // The trial's loads are the ones in the workspace now (the last evaluated).
            Array.Copy(trial, speeds, n);
            merit = newMerit;
            if (merit <= options.Tolerance && largest * alpha <= StepTolerance)
            {
                Remember(ws, st.Count, speeds, w0, weight, cgX, cgY, yawTarget);
                return true;
            }
        }
        if (merit <= options.Tolerance)
        {
            Remember(ws, st.Count, speeds, w0, weight, cgX, cgY, yawTarget);
            return true;
        }
        return false;
    }

    // Backtracking along the step (halving up to 30 times) until the largest scaled residual falls enough; trial holds
    // the last speeds tried and the workspace their loads. Returns the new merit and the step fraction taken.
    private static double LineSearch(in TrimConstraints sys, int n, double[] speeds, ReadOnlySpan<double> step, double w0, double merit,
        double tolerance, double[] trial, out double alpha)
    {
        alpha = 1;
        double newMerit = double.PositiveInfinity;
        for (int tries = 0; tries < 30; tries++)
        {
            for (int i = 0; i < n; i++)
            {
                trial[i] = speeds[i] + alpha * step[i] * w0;
            }
            newMerit = sys.Residuals(trial);
            if (newMerit <= Math.Max((1 - 1e-4 * alpha) * merit, 0.5 * tolerance))
            {
                break;
            }
            alpha *= 0.5;
        }
        return newMerit;
    }

    // Keeps what the next warm start's predictor needs: the trim, its parameters, scaling and multipliers (LastKkt holds
    // the last KKT matrix already).
    private static void Remember(HoverTrimWorkspace ws, int n, double[] speeds, double w0, double weight, double cgX, double cgY, double yaw)
    {
        Array.Copy(speeds, ws.SolvedSpeeds, n);
        ws.SolvedW0 = w0;
        ws.SolvedWeightN = weight;
        ws.SolvedCgXM = cgX;
        ws.SolvedCgYM = cgY;
        ws.SolvedYawNm = yaw;
        for (int k = 0; k < 4; k++)
        {
            ws.SolvedScale[k] = ws.Scale[k];
            ws.Mu[k] = ws.Multipliers[k] * ws.Scale[k] * w0 * w0;
        }
        ws.Solved = true;
    }

    // A balance the drivetrain cannot hold: say which stations fall short and what full duty gives instead (a state that
    // exists, but is not a hover), and report no operating state.
    private static HoverResult BeyondDrivetrain(RigModel model, HoverMode mode, double gapM, double[] speeds, double[] required,
        DrivePoint[] points, BusSolution bus, int iterations)
    {
        var st = model.Stations;
        var findings = new List<HoverFinding>();
        if (bus.Status != BusStatus.Solved)
        {
            findings.Add(new HoverFinding(DriveLimit.PackCutoffVoltage.Key(), null,
                Invariant($"the pack cannot supply the current this balance draws: its voltage collapses ({bus.Status})")));
        }
        for (int i = 0; i < st.Count; i++)
        {
            var s = st[i];
            var dt = s.Drivetrain;
            // Against the pack's open-circuit voltage (no bus voltage under load is higher), the duty is a lower bound.
            double voc = model.Source.OpenCircuitVoltageV;
            double duty = dt.DutyFor(required[i], speeds[i], voc, s.Conditions.WindingTempC, s.FluxFactor);
            if (bus.Status == BusStatus.Solved && points[i].Regime == DriveRegime.Regulating)
            {
                continue;
            }
            string needs = Invariant($"station {i + 1}: the balance needs {Units.RadPerSToRpm(speeds[i]):0} rpm with {required[i]:0.0} A of motor current");
            findings.Add(required[i] > dt.CurrentLimitA
                ? new HoverFinding("controller_current_limit", i, Invariant($"{needs}, above the controller's limit of {dt.CurrentLimitA:0.0} A"))
                : new HoverFinding(DriveLimit.DutyHeadroom.Key(), i, duty > dt.MaxDuty
                    ? Invariant($"{needs}, which takes duty {duty:0.000} even at the pack's open-circuit {voc:0.0} V; the controller gives at most {dt.MaxDuty:0.000}")
                    : Invariant($"{needs}, which takes more than the controller's duty of {dt.MaxDuty:0.000} once the pack sags under the total current")));
        }
        var full = CommonDutyHover.SpeedsAt(model, Enumerable.Repeat(1.0, st.Count).ToArray(), gapM);
        findings.Add(new HoverFinding("drivetrain", null, Invariant(
            $"no hover at {gapM * 1000:0.00} mm: the drivetrain cannot hold this balance. Closest it comes (not a hover): at full duty on every station the rotors lift {full.TotalLiftN:0} N in all (weight {model.WeightN:0} N) at up to {full.SpeedsRadPerS.Max(Units.RadPerSToRpm):0} rpm, without balancing pitch and roll")));
        return new HoverResult(mode, HoverStatus.BeyondDrivetrain, gapM, model.MassKg, model.WeightN, [], double.NaN, double.NaN,
            double.NaN, double.NaN, double.NaN, double.NaN, double.NaN, double.NaN, [], findings, iterations);
    }

    private static HoverResult Failed(RigModel model, double gapM, HoverStatus status, HoverFinding finding, int iterations)
        => new(HoverMode.Trimmed, status, gapM, model.MassKg, model.WeightN, [], double.NaN, double.NaN, double.NaN, double.NaN,
            double.NaN, double.NaN, double.NaN, double.NaN, [], [finding], iterations);

    // Everything about the state "these speeds at this gap": loads, the duties on the shared bus, stability, margins.
    internal static HoverResult Describe(RigModel model, HoverMode mode, double gapM, double[] speeds, int iterations)
    {
        var st = model.Stations;
        int n = st.Count;
        var loads = new Loads.LoadPoint[n];
        var inputs = new DriveInput[n];
        var required = new double[n];
        double weight = model.WeightN, totalLift = 0, pitch = 0, roll = 0, yaw = 0, plate = 0, arm = 1e-3;
        for (int i = 0; i < n; i++)
        {
            var s = st[i];
            loads[i] = s.LoadAt(speeds[i], gapM);
            required[i] = s.Drivetrain.Motor.CurrentForTorqueA(loads[i].TotalTorqueNm, s.FluxFactor);
            inputs[i] = s.Input(DriveCommand.MotorCurrent(required[i]), speeds[i]);
            totalLift += loads[i].LiftN;
            pitch += loads[i].LiftN * (s.XM - model.CgXM);
            roll += loads[i].LiftN * (s.YM - model.CgYM);
            yaw += s.Spin.Sign() * loads[i].TotalTorqueNm;
            plate += loads[i].EddyPowerW;
            arm = Math.Max(arm, Math.Max(Math.Abs(s.XM - model.CgXM), Math.Abs(s.YM - model.CgYM)));
        }
        var points = new DrivePoint[n];
        var bus = DriveBus.Solve(model.Source, inputs, points, double.NaN, DriveBusOptions.Default);
        var findings = new List<HoverFinding>();
        if (bus.Status != BusStatus.Solved)
        {
            findings.Add(new HoverFinding(DriveLimit.PackCutoffVoltage.Key(), null,
                $"the pack cannot supply {bus.PackCurrentA:0} A: its voltage collapses ({bus.Status})"));
        }
        double v = bus.BusVoltageV > 0 ? bus.BusVoltageV : model.Source.OpenCircuitVoltageV;
        if (bus.Status != BusStatus.Solved || points.Any(p => p.Regime != DriveRegime.Regulating))
        {
            // The balance needs torques the drivetrain cannot make at these speeds: no such state exists.
            return BeyondDrivetrain(model, mode, gapM, speeds, required, points, bus, iterations);
        }
        var stations = new HoverStation[n];
        for (int i = 0; i < n; i++)
        {
            stations[i] = DescribeStation(model, i, gapM, speeds[i], required[i], loads[i], points[i], v, findings);
        }
        double packCurrent = 0;
        for (int i = 0; i < n; i++)
        {
            packCurrent += stations[i].BusCurrentA;
        }
        var packMargins = DriveMargins.ForPack(model.Packs, packCurrent, v, model.Limits.CellCutoffV);
        foreach (var m in packMargins)
        {
            if (m.Exceeded)
            {
                findings.Add(new HoverFinding(m.Limit.Key(), null,
                    $"pack: {m.Sentence()}"));
            }
        }
        double dg = 1e-4 * gapM, up = 0, down = 0;
        for (int i = 0; i < n; i++)
        {
            up += st[i].LoadAt(speeds[i], gapM + dg).LiftN;
            down += st[i].LoadAt(speeds[i], gapM - dg).LiftN;
        }
        double stiffness = -(up - down) / (2 * dg);
        var status = findings.Count == 0 ? HoverStatus.Hovering : HoverStatus.LimitExceeded;
        return new HoverResult(mode, status, gapM, model.MassKg, weight, stations, v, packCurrent, plate, stiffness,
            (totalLift - weight) / weight, pitch / (weight * arm), roll / (weight * arm), yaw, packMargins, findings, iterations);
    }

    // One station of a balanced hover: duty, margins, stability (finite-difference slope of motor minus load torque),
    // and its findings.
    private static HoverStation DescribeStation(RigModel model, int i, double gapM, double speed, double required, Loads.LoadPoint load,
        DrivePoint point, double v, List<HoverFinding> findings)
    {
        var s = model.Stations[i];
        var dt = s.Drivetrain;
        double requiredDuty = dt.DutyFor(required, speed, v, s.Conditions.WindingTempC, s.FluxFactor);
        var margins = new List<LimitMargin>(DriveMargins.ForStation(dt, s.Rotor, point))
        {
            new(DriveLimit.DutyHeadroom, requiredDuty, model.Limits.MaxDuty),
        };
        double duty = Math.Clamp(requiredDuty, 0, 1);
        double h = DiffStep * Math.Max(speed, 1e-3);
        double motorUp = DriveBus.Evaluate(v, s.Input(DriveCommand.Duty(duty), speed + h)).TorqueNm;
        double motorHere = DriveBus.Evaluate(v, s.Input(DriveCommand.Duty(duty), speed)).TorqueNm;
        double loadUp = s.LoadAt(speed + h, gapM).TotalTorqueNm;
        double slope = (motorUp - motorHere) / h - (loadUp - load.TotalTorqueNm) / h;
        bool stable = slope < 0;
        var station = new HoverStation(i, s.Spin, requiredDuty, speed, load.LiftN, load.TotalTorqueNm,
            s.Spin.Sign() * load.TotalTorqueNm, point.MotorCurrentA, point.BusCurrentA, load.EddyPowerW,
            v * point.BusCurrentA, point.Regime, stable, slope, margins);
        foreach (var m in margins)
        {
            if (m.Exceeded)
            {
                findings.Add(new HoverFinding(m.Limit.Key(), i,
                    $"station {i + 1}: {m.Sentence()}"));
            }
        }
        if (!stable)
        {
            findings.Add(new HoverFinding("stability", i,
                $"station {i + 1}: {Units.RadPerSToRpm(speed):0} rpm is not a stable equilibrium at duty {requiredDuty:0.000} (load torque rises faster than the motor's)"));
        }
        return station;
    }
}

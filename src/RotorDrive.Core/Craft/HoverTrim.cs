using MathNet.Numerics.LinearAlgebra;
using MathNet.Numerics.RootFinding;
using RotorDrive.Core.Drive;

namespace RotorDrive.Core.Craft;

/// <summary>Trimmed hover: per-station speeds and duties that hold the craft level at a given gap with total lift =
/// weight, zero pitch and roll moment about the centre of gravity and a commanded (normally zero) net yaw torque.</summary>
/// <remarks>At a fixed gap each rotor's lift and shaft torque depend only on its own speed and conditions, so the balance
/// is solved in speed space: Newton's method on the four constraints with a forward-difference Jacobian (J. Nocedal &amp;
/// S. J. Wright, Numerical Optimization, 2nd ed. 2006, ch. 11 and 18). Four stations give a square system. With more,
/// each step solves the equality-constrained least-norm problem min sum (w_i - mean w)^2 subject to the linearised
/// constraints (KKT system, Nocedal &amp; Wright eq. 16.4) with MathNet's LU: the speeds, not the duties, are spread as
/// little as possible, because lift, torque and plate heating are functions of speed, so equal speeds mean equal
/// loading and wear and the solution is independent of the drivetrain (the same trim serves every candidate motor in a
/// ranking). Each station's duty then follows from the drive equations on the shared bus (<see cref="DriveBus"/> with
/// the motor current that gives the shaft torque, M. Drela, First-Order DC Electric Motor Model, MIT 2007), and the
/// equilibrium is checked for stability at that duty. Thread-safe; allocates only small arrays.</remarks>
public static class HoverTrim
{
    private const double DiffStep = 1e-6;
    private const double CurvatureStep = 1e-4;

    // Newton stops once the constraints hold and the last step moved no speed by more than this fraction: the least-norm
    // objective is then optimal to about this relative accuracy.
    private const double StepTolerance = 1e-7;

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
        double weight = model.WeightN;
        double rated = double.PositiveInfinity, top = 0;
        foreach (var s in model.Stations)
        {
            rated = Math.Min(rated, s.Rotor.MaxSpeedRadPerS);
            top = Math.Max(top, s.Rotor.MaxSpeedRadPerS * options.SpeedSearchFactor);
        }
        double Mean(double w)
        {
            double sum = 0;
            foreach (var s in model.Stations)
            {
                sum += s.LoadAt(w, gapM).LiftN;
            }
            return sum - weight;
        }
        // Bracket within the rated speed first: the load tables cover it, beyond it the direct model is much slower.
        double bracket = rated;
        if (Mean(bracket) < 0)
        {
            bracket = top;
            if (Mean(top) < 0)
            {
                return Failed(model, gapM, HoverStatus.NoBalance, new HoverFinding(DriveLimit.RotorMaxSpeed.Key(), null,
                    $"even at {options.SpeedSearchFactor:0.#} x their rated speed the rotors lift less than the weight ({weight:0} N) at this gap"), 0);
            }
        }
        // The common speed is only a starting point for Newton: a loose tolerance suffices.
        double w0 = Brent.FindRoot(Mean, 1e-6 * bracket, bracket, 1e-6 * bracket, 200);
        var speeds = new double[n];
        Array.Fill(speeds, w0);
        if (!Newton(model, gapM, yawTorqueNm, speeds, w0, options, out int iterations))
        {
            return Failed(model, gapM, HoverStatus.NoBalance, new HoverFinding("convergence", null,
                $"no speeds balance force, pitch, roll and yaw together within {options.MaxIterations} iterations (the centre of gravity may lie outside the stations, or the yaw demand is too large)"), iterations);
        }
        return Describe(model, HoverMode.Trimmed, gapM, speeds, iterations);
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

    private static bool Newton(RigModel model, double gapM, double yawTarget, double[] speeds, double w0, HoverOptions options, out int iterations)
    {
        var st = model.Stations;
        int n = st.Count;
        double weight = model.WeightN;
        double arm = 0;
        foreach (var s in st)
        {
            arm = Math.Max(arm, Math.Max(Math.Abs(s.XM - model.CgXM), Math.Abs(s.YM - model.CgYM)));
        }
        arm = Math.Max(arm, 1e-3);
        double torqueScale = 0;
        foreach (var s in st)
        {
            torqueScale += Math.Abs(s.LoadAt(w0, gapM).TotalTorqueNm);
        }
        torqueScale = Math.Max(torqueScale, Math.Max(Math.Abs(yawTarget), 1e-6 * weight * arm));
        var scale = new[] { 1 / weight, 1 / (weight * arm), 1 / (weight * arm), 1 / torqueScale };

        var lift = new double[n];
        var torque = new double[n];
        var dLift = new double[n];
        var dTorque = new double[n];
        var d2Lift = new double[n];
        var d2Torque = new double[n];
        var multipliers = new double[4];
        var c = new double[4];
        var trial = new double[n];
        var kkt = Matrix<double>.Build.Dense(n + 4, n + 4);
        var rhs = Vector<double>.Build.Dense(n + 4);

        double Residuals(double[] w, double[] l, double[] q)
        {
            double f = -weight, pitch = 0, roll = 0, yaw = -yawTarget;
            for (int i = 0; i < n; i++)
            {
                if (!(w[i] > 0))
                {
                    return double.PositiveInfinity;
                }
                var p = st[i].LoadAt(w[i], gapM);
                l[i] = p.LiftN;
                q[i] = p.TotalTorqueNm;
                f += p.LiftN;
                pitch += p.LiftN * (st[i].XM - model.CgXM);
                roll += p.LiftN * (st[i].YM - model.CgYM);
                yaw += st[i].Spin.Sign() * p.TotalTorqueNm;
            }
            c[0] = f * scale[0];
            c[1] = pitch * scale[1];
            c[2] = roll * scale[2];
            c[3] = yaw * scale[3];
            return Math.Max(Math.Max(Math.Abs(c[0]), Math.Abs(c[1])), Math.Max(Math.Abs(c[2]), Math.Abs(c[3])));
        }

        double merit = Residuals(speeds, lift, torque);
        for (iterations = 1; iterations <= options.MaxIterations; iterations++)
        {
            for (int i = 0; i < n; i++)
            {
                // Central differences: slopes for the Jacobian, curvatures for the Lagrangian's Hessian.
                double h = CurvatureStep * speeds[i];
                var up = st[i].LoadAt(speeds[i] + h, gapM);
                var down = st[i].LoadAt(speeds[i] - h, gapM);
                dLift[i] = (up.LiftN - down.LiftN) / (2 * h) * w0;
                dTorque[i] = (up.TotalTorqueNm - down.TotalTorqueNm) / (2 * h) * w0;
                d2Lift[i] = (up.LiftN - 2 * lift[i] + down.LiftN) / (h * h) * w0 * w0;
                d2Torque[i] = (up.TotalTorqueNm - 2 * torque[i] + down.TotalTorqueNm) / (h * h) * w0 * w0;
            }
            // Unknowns u = w / w0: [P J^T; J 0] [du; lambda] = [-P u; -c], P = I - 11^T/n (centring).
            kkt.Clear();
            double mean = 0;
            for (int i = 0; i < n; i++)
            {
                mean += speeds[i] / w0;
            }
            mean /= n;
            for (int i = 0; i < n; i++)
            {
                double dx = st[i].XM - model.CgXM, dy = st[i].YM - model.CgYM;
                for (int j = 0; j < n; j++)
                {
                    kkt[i, j] = -1.0 / n;
                }
                // Hessian of the Lagrangian: the centring projector plus the multipliers times each constraint's curvature
                // (diagonal: every constraint is a sum of one-speed functions). Without the curvature SQP is only linear.
                kkt[i, i] += 1.0 + multipliers[0] * d2Lift[i] * scale[0] + multipliers[1] * d2Lift[i] * dx * scale[1]
                    + multipliers[2] * d2Lift[i] * dy * scale[2] + multipliers[3] * st[i].Spin.Sign() * d2Torque[i] * scale[3];
                double j0 = dLift[i] * scale[0], j1 = dLift[i] * dx * scale[1], j2 = dLift[i] * dy * scale[2];
                double j3 = st[i].Spin.Sign() * dTorque[i] * scale[3];
                kkt[n, i] = kkt[i, n] = j0;
                kkt[n + 1, i] = kkt[i, n + 1] = j1;
                kkt[n + 2, i] = kkt[i, n + 2] = j2;
                kkt[n + 3, i] = kkt[i, n + 3] = j3;
                rhs[i] = -(speeds[i] / w0 - mean);
            }
            for (int k = 0; k < 4; k++)
            {
                rhs[n + k] = -c[k];
            }
            var step = kkt.LU().Solve(rhs);
            for (int k = 0; k < 4; k++)
            {
                multipliers[k] = step[n + k];
            }
            double largest = 0;
            for (int i = 0; i < n; i++)
            {
                largest = Math.Max(largest, Math.Abs(step[i]));
            }
            if (!double.IsFinite(largest))
            {
                return false;
            }
            if (merit <= options.Tolerance && largest <= StepTolerance)
            {
                return true;
            }
            double alpha = 1;
            double newMerit = double.PositiveInfinity;
            for (int tries = 0; tries < 30; tries++)
            {
                for (int i = 0; i < n; i++)
                {
                    trial[i] = speeds[i] + alpha * step[i] * w0;
                }
                newMerit = Residuals(trial, lift, torque);
                if (newMerit <= Math.Max((1 - 1e-4 * alpha) * merit, 0.5 * options.Tolerance))
                {
                    break;
                }
                alpha *= 0.5;
            }
            if (!double.IsFinite(newMerit))
            {
                return false;
            }
            Array.Copy(trial, speeds, n);
            merit = Residuals(speeds, lift, torque);
            if (merit <= options.Tolerance && largest * alpha <= StepTolerance)
            {
                return true;
            }
        }
        return merit <= options.Tolerance;
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
        var stations = new HoverStation[n];
        for (int i = 0; i < n; i++)
        {
            var s = st[i];
            var dt = s.Drivetrain;
            var point = points[i];
            double backEmf = s.FluxFactor * speeds[i] / dt.Motor.KvRadPerSPerV;
            double loop = dt.LoopResistanceAt(s.Conditions.WindingTempC);
            double requiredDuty = (required[i] * loop + backEmf) / v;
            bool free = point.Regime is DriveRegime.Regulating;
            if (!free)
            {
                // The controller cannot deliver the torque: report the state it would need.
                point = point with { MotorCurrentA = required[i], Duty = requiredDuty, BusCurrentA = requiredDuty * required[i] + dt.Controller.IdleCurrentA };
            }
            var margins = new List<LimitMargin>(DriveMargins.ForStation(dt, s.Rotor, point))
            {
                new(DriveLimit.DutyHeadroom, requiredDuty, model.Limits.MaxDuty),
            };
            double duty = Math.Clamp(requiredDuty, 0, 1);
            double h = DiffStep * Math.Max(speeds[i], 1e-3);
            double motorUp = DriveBus.Evaluate(v, s.Input(DriveCommand.Duty(duty), speeds[i] + h)).TorqueNm;
            double motorHere = DriveBus.Evaluate(v, s.Input(DriveCommand.Duty(duty), speeds[i])).TorqueNm;
            double loadUp = s.LoadAt(speeds[i] + h, gapM).TotalTorqueNm;
            double slope = (motorUp - motorHere) / h - (loadUp - loads[i].TotalTorqueNm) / h;
            bool stable = slope < 0;
            stations[i] = new HoverStation(i, s.Spin, requiredDuty, speeds[i], loads[i].LiftN, loads[i].TotalTorqueNm,
                s.Spin.Sign() * loads[i].TotalTorqueNm, point.MotorCurrentA, point.BusCurrentA, loads[i].EddyPowerW,
                v * point.BusCurrentA, point.Regime, stable, slope, margins);
            foreach (var m in margins)
            {
                if (m.Exceeded)
                {
                    findings.Add(new HoverFinding(m.Limit.Key(), i,
                        $"station {i}: {m.Limit.Describe()} {m.Value:0.###} {m.Limit.Unit()} exceeds the allowed {m.Allowed:0.###} {m.Limit.Unit()}"));
                }
            }
            // Where the controller cannot deliver the torque at all, the failing limit says so; stability is moot.
            if (!stable && free)
            {
                findings.Add(new HoverFinding("stability", i,
                    $"station {i}: {Units.RadPerSToRpm(speeds[i]):0} rpm is not a stable equilibrium at duty {requiredDuty:0.000} (load torque rises faster than the motor's)"));
            }
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
                    $"pack: {m.Limit.Describe()} {m.Value:0.###} {m.Limit.Unit()} is beyond the allowed {m.Allowed:0.###} {m.Limit.Unit()}"));
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
}

using MathNet.Numerics.RootFinding;
using RotorDrive.Core.Craft;
using RotorDrive.Core.Loads;

namespace RotorDrive.Core.Studies.Ranking;

/// <summary>The trimmed hover of a rig at its design gap for a given drivetrain mass per station and pack mass: speeds
/// and shaft torques per station. Used by the ranking, where only the masses change between combinations.</summary>
/// <remarks>
/// <para>Unknowns: the station speeds. Constraints (k of them): total lift = weight; pitch and roll moments of the lifts
/// about the centre of gravity = 0; yaw: sum of sign(spin) x shaft torque = 0 (a rotor's reaction on the frame is its
/// shaft torque against its spin). k = 4 with four or more stations, 3 (no yaw) with three, 1 (lift only) with fewer.
/// With more stations than constraints the trim is under-determined; the Gauss-Newton step through the Moore-Penrose
/// pseudo-inverse (A. Ben-Israel, "A Newton-Raphson method for the solution of systems of equations", J. Math. Anal. Appl.
/// 15, 1966) picks the solution nearest the equal-speed reference, i.e. the smallest speed spread.</para>
/// <para>Which solution: the one nearest (in speeds) to the reference, the common speed at which the stations' lifts sum
/// to the weight (Brent's method, MathNet; tabulated over the study's weights and interpolated, so it is a fixed function
/// of the weight). Each step goes to the nearest point of the linearised constraints,
/// omega' = omega_ref - J^T (J J^T)^-1 (F - J (omega - omega_ref)), whose fixed point is the first-order condition of
/// that nearest point. Warm start: the previous solution and Jacobian (chord steps), with the Jacobian refreshed by central
/// differences at every step once the force residual is below 1e-6 of the weight. Converged when the force residual is
/// within 1e-11 of the weight, moments within 1e-11 weight x station radius, yaw within 1e-11 of the summed torque
/// magnitudes, and the next step below 1e-9 of the fastest speed (the finite-difference Jacobian defines the nearest point no better).</para>
/// </remarks>
internal sealed class RankTrim
{
    private const double Tolerance = 1e-11;
    private const int MaxIterations = 60;
    private const int ChordIterations = 6;
    private const double StepTolerance = 1e-9;
    private const int ReferencePoints = 257;
    private readonly IRotorLoad[] _loads;
    private readonly double[] _x;
    private readonly double[] _y;
    private readonly double[] _sign;
    private readonly double[] _rotorMass;
    private readonly double[] _maxSpeed;
    private readonly double _bodyMass;
    private readonly double _bodyCgX;
    private readonly double _bodyCgY;
    private readonly double _gap;
    private readonly double _plateT;
    private readonly double _magnetT;
    private readonly double _radius;
    private readonly double _refWeightMin;
    private readonly double _refWeightStep;
    private readonly double[] _refSpeed;

    public RankTrim(Rig rig, IReadOnlyList<IRotorLoad> loads, double minMassKg, double maxMassKg)
    {
        int n = rig.Stations.Count;
        StationCount = n;
        _loads = loads.ToArray();
        _x = rig.Stations.Select(s => s.XM).ToArray();
        _y = rig.Stations.Select(s => s.YM).ToArray();
        _sign = rig.Stations.Select(s => (double)s.Spin.Sign()).ToArray();
        _rotorMass = rig.Stations.Select(s => s.Rotor.RotorMassKg).ToArray();
        _maxSpeed = rig.Stations.Select(s => s.Rotor.MaxSpeedRadPerS).ToArray();
        _bodyMass = rig.Body.EmptyMassKg + rig.Body.PayloadKg;
        _bodyCgX = rig.Body.CgXM;
        _bodyCgY = rig.Body.CgYM;
        _gap = rig.DesignGapM;
        _plateT = rig.PlateTemperatureC;
        _magnetT = rig.AmbientC;
        _radius = Math.Max(1e-3, rig.Stations.Max(s => Math.Sqrt(s.XM * s.XM + s.YM * s.YM)));
        Constraints = n >= 4 ? 4 : n == 3 ? 3 : 1;
        // Reference speeds over the weights this study can meet (a deterministic function of the weight, so that every
        // path to a trim targets the same point): the common speed carrying the weight, linear between the nodes.
        _refWeightMin = 0.99 * minMassKg * Units.StandardGravity;
        double top = 1.01 * Math.Max(maxMassKg, minMassKg * 1.001) * Units.StandardGravity;
        _refWeightStep = (top - _refWeightMin) / (ReferencePoints - 1);
        _refSpeed = new double[ReferencePoints];
        Span<double> common = stackalloc double[n];
        for (int j = 0; j < ReferencePoints; j++)
        {
            _refSpeed[j] = CommonStart(_refWeightMin + j * _refWeightStep, common) ? common[0] : double.NaN;
        }
    }

    // The reference speeds at a weight; false when no common speed up to 1.2 x the lowest rated speed carries it.
    private bool Reference(double weight, Span<double> into)
    {
        double u = (weight - _refWeightMin) / _refWeightStep;
        int j = (int)Math.Floor(u);
        if (j >= 0 && j < ReferencePoints - 1 && double.IsFinite(_refSpeed[j]) && double.IsFinite(_refSpeed[j + 1]))
        {
            double t = u - j;
            into.Fill(_refSpeed[j] + t * (_refSpeed[j + 1] - _refSpeed[j]));
            return true;
        }
        return CommonStart(weight, into);
    }

    public int StationCount { get; }

    public int Constraints { get; }

    public IReadOnlyList<double> MaxSpeedRadPerS => _maxSpeed;

    /// <summary>Total mass and centre of gravity with a drivetrain mass per station and a total pack mass (packs at the
    /// body's centre of gravity, like <see cref="Rig.CentreOfGravity"/>).</summary>
    public (double MassKg, double CgX, double CgY) MassAndCg(double drivetrainKg, double packsKg)
    {
        double m = _bodyMass + packsKg, mx = m * _bodyCgX, my = m * _bodyCgY;
        for (int i = 0; i < _x.Length; i++)
        {
            double ms = _rotorMass[i] + drivetrainKg;
            m += ms;
            mx += ms * _x[i];
            my += ms * _y[i];
        }
        return (m, mx / m, my / m);
    }

    /// <summary>Solves the trim into <paramref name="state"/>; returns false when no trim exists within 1.2 x the rotors'
    /// rated speeds (or the iteration fails). Speeds above the rated speed but within that bound are returned (true) for
    /// the caller to reject with numbers.</summary>
    /// <remarks>The solution is the point of the constraint set nearest to the reference speeds (the common speed whose
    /// lifts carry the weight, read from a table over the weight): whatever the start, the iteration's fixed point satisfies
    /// F = 0 with omega - omega_ref in the row space of the Jacobian there, the first-order condition of that nearest
    /// point, so warm-started and fresh solves agree to the tolerance.</remarks>
    public bool Solve(double massKg, double cgX, double cgY, RankTrimState state, bool fresh, bool centralDifferences)
    {
        int n = StationCount;
        double weight = massKg * Units.StandardGravity;
        state.Weight = weight;
        Span<double> reference = stackalloc double[n];
        if (!Reference(weight, reference))
        {
            state.HasSolution = false;
            state.HasJacobian = false;
            return false;
        }
        if (fresh || !state.HasSolution)
        {
            reference.CopyTo(state.Speeds);
            state.HasJacobian = false;
        }
        int k = Constraints;
        Span<double> f = stackalloc double[4];
        Span<double> a = stackalloc double[16];
        Span<double> lambda = stackalloc double[4];
        Span<double> next = stackalloc double[n];
        int sinceRefresh = 0;
        bool polish = fresh;
        for (int it = 0; it < MaxIterations; it++)
        {
            Residuals(state, weight, cgX, cgY, f);
            double sumQ = 0, top = 0;
            for (int i = 0; i < n; i++)
            {
                sumQ += Math.Abs(state.Torques[i]);
                top = Math.Max(top, state.Speeds[i]);
            }
            bool small = Math.Abs(f[0]) <= Tolerance * weight
                && (k < 3 || (Math.Abs(f[1]) <= Tolerance * weight * _radius && Math.Abs(f[2]) <= Tolerance * weight * _radius))
                && (k < 4 || Math.Abs(f[3]) <= Tolerance * Math.Max(sumQ, 1e-12));
            // Close to the solution the Jacobian is refreshed (central differences) every step, so the fixed point is the
            // nearest point for the Jacobian at the solution, not for a stale one.
            polish |= Math.Abs(f[0]) <= 1e-6 * weight;
            if (!state.HasJacobian || polish || sinceRefresh >= ChordIterations)
            {
                Jacobian(state, cgX, cgY, polish || centralDifferences);
                state.HasJacobian = true;
                sinceRefresh = 0;
            }
            sinceRefresh++;
            // Nearest point of the linearised constraints: omega' = omega_ref - J^T (J J^T)^-1 (F - J (omega - omega_ref)).
            for (int r = 0; r < k; r++)
            {
                double rhs = f[r];
                for (int c = 0; c < k; c++)
                {
                    double sum = 0;
                    for (int i = 0; i < n; i++)
                    {
                        sum += state.Jacobian[r * n + i] * state.Jacobian[c * n + i];
                    }
                    a[r * 4 + c] = sum;
                }
                for (int i = 0; i < n; i++)
                {
                    rhs -= state.Jacobian[r * n + i] * (state.Speeds[i] - reference[i]);
                }
                lambda[r] = rhs;
            }
            if (!SolveSmall(a, lambda, k))
            {
                state.HasSolution = false;
                return false;
            }
            double largestStep = 0;
            for (int i = 0; i < n; i++)
            {
                double correction = 0;
                for (int r = 0; r < k; r++)
                {
                    correction += state.Jacobian[r * n + i] * lambda[r];
                }
                next[i] = reference[i] - correction;
                largestStep = Math.Max(largestStep, Math.Abs(next[i] - state.Speeds[i]));
            }
            bool done = small && polish && largestStep <= StepTolerance * top;
            if (!done)
            {
                for (int i = 0; i < n; i++)
                {
                    // Keep the iterate where the load is defined and physical; a trim beyond 1.2 x rated speed fails below.
                    state.Speeds[i] = Math.Clamp(next[i], 0.01 * _maxSpeed[i], 1.25 * _maxSpeed[i]);
                }
            }
            if (small && polish && largestStep <= StepTolerance * top)
            {
                // The speeds were left as they are (their residuals are the ones in state): the step was negligible.
                state.Iterations = it;
                state.HasSolution = true;
                for (int i = 0; i < n; i++)
                {
                    if (state.Speeds[i] > 1.2 * _maxSpeed[i])
                    {
                        state.HasSolution = false;
                        return false;
                    }
                }
                return true;
            }
        }
        state.HasSolution = false;
        state.HasJacobian = false;
        return false;
    }

    // Lifts, torques and eddy power at the current speeds, and the constraint residuals.
    private void Residuals(RankTrimState state, double weight, double cgX, double cgY, Span<double> f)
    {
        double lift = 0, pitch = 0, roll = 0, yaw = 0;
        for (int i = 0; i < StationCount; i++)
        {
            var p = _loads[i].Evaluate(state.Speeds[i], _gap, _plateT, _magnetT);
            state.Lifts[i] = p.LiftN;
            state.Torques[i] = p.TotalTorqueNm;
            state.EddyPowers[i] = p.EddyPowerW;
            lift += p.LiftN;
            pitch += p.LiftN * (_x[i] - cgX);
            roll += p.LiftN * (_y[i] - cgY);
            yaw += _sign[i] * p.TotalTorqueNm;
        }
        f[0] = lift - weight;
        f[1] = pitch;
        f[2] = roll;
        f[3] = yaw;
    }

    // Finite-difference derivatives of each station's lift and torque in its own speed (the Jacobian is 4 x n with one
    // entry per station in each row).
    private void Jacobian(RankTrimState state, double cgX, double cgY, bool central)
    {
        int n = StationCount;
        for (int i = 0; i < n; i++)
        {
            double w = state.Speeds[i];
            double h = 1e-6 * Math.Max(w, 1.0);
            var up = _loads[i].Evaluate(w + h, _gap, _plateT, _magnetT);
            double dLift, dTorque;
            if (central)
            {
                var down = _loads[i].Evaluate(w - h, _gap, _plateT, _magnetT);
                dLift = (up.LiftN - down.LiftN) / (2 * h);
                dTorque = (up.TotalTorqueNm - down.TotalTorqueNm) / (2 * h);
            }
            else
            {
                dLift = (up.LiftN - state.Lifts[i]) / h;
                dTorque = (up.TotalTorqueNm - state.Torques[i]) / h;
            }
            state.Jacobian[i] = dLift;
            if (Constraints >= 3)
            {
                state.Jacobian[n + i] = dLift * (_x[i] - cgX);
                state.Jacobian[2 * n + i] = dLift * (_y[i] - cgY);
            }
            if (Constraints >= 4)
            {
                state.Jacobian[3 * n + i] = _sign[i] * dTorque;
            }
        }
    }

    // The common speed at which the lifts sum to the weight (Brent, MathNet); false when even the slowest-rated rotor's
    // rated speed x 1.2 does not lift it.
    private bool CommonStart(double weight, Span<double> speeds)
    {
        double top = 1.2 * _maxSpeed.Min();
        double Excess(double w)
        {
            double lift = 0;
            for (int i = 0; i < StationCount; i++)
            {
                lift += _loads[i].Evaluate(w, _gap, _plateT, _magnetT).LiftN;
            }
            return lift - weight;
        }
        if (Excess(top) < 0)
        {
            return false;
        }
        if (!Brent.TryFindRoot(Excess, 1e-6 * top, top, 1e-10 * top, 200, out double common))
        {
            return false;
        }
        for (int i = 0; i < StationCount; i++)
        {
            speeds[i] = common;
        }
        return true;
    }

    // Gaussian elimination with partial pivoting on a k x k system stored with row stride 4; false when singular.
    private static bool SolveSmall(Span<double> a, Span<double> b, int k)
    {
        for (int col = 0; col < k; col++)
        {
            int pivot = col;
            for (int r = col + 1; r < k; r++)
            {
                if (Math.Abs(a[r * 4 + col]) > Math.Abs(a[pivot * 4 + col]))
                {
                    pivot = r;
                }
            }
            if (!(Math.Abs(a[pivot * 4 + col]) > 0))
            {
                return false;
            }
            if (pivot != col)
            {
                for (int c = 0; c < k; c++)
                {
                    (a[col * 4 + c], a[pivot * 4 + c]) = (a[pivot * 4 + c], a[col * 4 + c]);
                }
                (b[col], b[pivot]) = (b[pivot], b[col]);
            }
            for (int r = col + 1; r < k; r++)
            {
                double factor = a[r * 4 + col] / a[col * 4 + col];
                for (int c = col; c < k; c++)
                {
                    a[r * 4 + c] -= factor * a[col * 4 + c];
                }
                b[r] -= factor * b[col];
            }
        }
        for (int r = k - 1; r >= 0; r--)
        {
            double s = b[r];
            for (int c = r + 1; c < k; c++)
            {
                s -= a[r * 4 + c] * b[c];
            }
            b[r] = s / a[r * 4 + r];
        }
        return true;
    }
}

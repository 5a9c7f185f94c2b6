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
/// With more stations than constraints the trim is under-determined; Newton's least-norm step
/// d omega = -J^T (J J^T)^-1 F (the Moore-Penrose pseudo-inverse step, Ben-Israel 1966) from equal speeds picks the
/// solution nearest the equal-speed start, i.e. the smallest speed spread.</para>
/// <para>Start: the common speed at which the stations' lifts sum to the weight (Brent's method, MathNet). Warm start:
/// the previous solution and Jacobian (chord iterations), refreshed when progress is slow. Converged when the force
/// residual is within 1e-11 of the weight, moments within 1e-11 weight x station radius and yaw within 1e-11 of the
/// summed torque magnitudes.</para>
/// </remarks>
internal sealed class RankTrim
{
    private const double Tolerance = 1e-11;
    private const int MaxIterations = 60;
    private const int ChordIterations = 6;
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

    public RankTrim(Rig rig, IReadOnlyList<IRotorLoad> loads)
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
    public bool Solve(double massKg, double cgX, double cgY, RankTrimState state, bool fresh, bool centralDifferences)
    {
        int n = StationCount;
        double weight = massKg * Units.StandardGravity;
        state.Weight = weight;
        if (fresh || !state.HasSolution)
        {
            if (!CommonStart(weight, state.Speeds))
            {
                state.HasSolution = false;
                state.HasJacobian = false;
                return false;
            }
            state.HasJacobian = false;
        }
        int k = Constraints;
        Span<double> f = stackalloc double[4];
        Span<double> a = stackalloc double[16];
        Span<double> lambda = stackalloc double[4];
        int sinceRefresh = 0;
        for (int it = 0; it < MaxIterations; it++)
        {
            Residuals(state, weight, cgX, cgY, f);
            double sumQ = 0;
            for (int i = 0; i < n; i++)
            {
                sumQ += Math.Abs(state.Torques[i]);
            }
            if (Math.Abs(f[0]) <= Tolerance * weight
                && (k < 3 || (Math.Abs(f[1]) <= Tolerance * weight * _radius && Math.Abs(f[2]) <= Tolerance * weight * _radius))
                && (k < 4 || Math.Abs(f[3]) <= Tolerance * Math.Max(sumQ, 1e-12)))
            {
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
            if (!state.HasJacobian || fresh || sinceRefresh >= ChordIterations)
            {
                Jacobian(state, cgX, cgY, centralDifferences);
                state.HasJacobian = true;
                sinceRefresh = 0;
            }
            sinceRefresh++;
            // Least-norm step: (J J^T) lambda = F, d omega = -J^T lambda.
            for (int r = 0; r < k; r++)
            {
                for (int c = 0; c < k; c++)
                {
                    double s = 0;
                    for (int i = 0; i < n; i++)
                    {
                        s += state.Jacobian[r * n + i] * state.Jacobian[c * n + i];
                    }
                    a[r * 4 + c] = s;
                }
                lambda[r] = f[r];
            }
            if (!SolveSmall(a, lambda, k))
            {
                state.HasSolution = false;
                return false;
            }
            for (int i = 0; i < n; i++)
            {
                double step = 0;
                for (int r = 0; r < k; r++)
                {
                    step += state.Jacobian[r * n + i] * lambda[r];
                }
                double next = state.Speeds[i] - step;
                // Keep the iterate where the load is defined and physical; a trim beyond 1.2 x rated speed is a failure.
                state.Speeds[i] = Math.Clamp(next, 0.01 * _maxSpeed[i], 1.25 * _maxSpeed[i]);
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
    private bool CommonStart(double weight, double[] speeds)
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

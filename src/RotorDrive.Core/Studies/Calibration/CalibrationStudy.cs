using MathNet.Numerics;
using MathNet.Numerics.LinearAlgebra;
using MathNet.Numerics.Optimization;
using RotorDrive.Core.Loads;

namespace RotorDrive.Core.Studies.Calibration;

/// <summary>Fits the load model of one rotor to bench data: steady torque (and lift) points or a spin-down trace.</summary>
/// <remarks>
/// <para>Model: the load model with a <see cref="LoadCalibration"/> (../DESIGN.md §4.9): conductivity factor and field
/// factor on the eddy part, windage unchanged, bearing drag T0 + c omega. Steady points fit the two factors to torque
/// (and lift where measured); the bearing terms stay at the rotor row's values. A spin-down fits the two factors, both
/// bearing terms and the starting speed to the measured speeds by integrating J d(omega)/dt = -(eddy + windage +
/// bearing) through the sample times (<see cref="SpinDownIntegrator"/>): the data are never differentiated.</para>
/// <para>Fit: nonlinear least squares by MathNet's Levenberg-Marquardt minimiser (K. Levenberg, Q. Appl. Math. 2, 1944;
/// D. W. Marquardt, J. SIAM 11, 1963) over the log of each factor and the bearing terms scaled to the data. Torque and
/// lift are weighted by the inverse of their own residual scatter, estimated from a first pass (feasible weighted least
/// squares). Covariance: s^2 (J^T J)^-1 with s^2 the residual variance per degree of freedom, mapped to the quantities
/// by the delta method; intervals from Student's t with n - p degrees of freedom (D. M. Bates and D. G. Watts,
/// Nonlinear Regression Analysis and Its Applications, 1988, §2.3), taken in log space for the factors so they stay
/// positive.</para>
/// <para>Refusal: a factor outside its plausible range (<see cref="CalibrationOptions"/>) is refused with its likely
/// cause (a torque or lift column in another unit, the rotor's inertia), a clearly negative bearing term too, and so
/// are systematic residuals: a Wald-Wolfowitz runs test on the residual signs (A. Wald and J. Wolfowitz, Ann. Math.
/// Stat. 11, 147-162, 1940) below <see cref="CalibrationOptions.RunsZLimit"/>.</para>
/// </remarks>
public static partial class CalibrationStudy
{
    private const int Quantities = 4;

    /// <summary>The key of a quantity in files and JSON.</summary>
    /// <param name="parameter">The quantity.</param>
    public static string KeyOf(CalibrationParameter parameter) => parameter switch
    {
        CalibrationParameter.ConductivityFactor => "conductivity_factor",
        CalibrationParameter.FieldFactor => "field_factor",
        CalibrationParameter.BearingDrag => "bearing_drag_nm",
        _ => "bearing_damping_nm_per_krpm",
    };

    /// <summary>Fits the calibration.</summary>
    /// <param name="request">Rotor, plate, conditions and bench data.</param>
    /// <returns>The fit; <see cref="CalibrationResult.Accepted"/> is false (with the reason) when it must not be used.</returns>
    /// <exception cref="ArgumentNullException">The request or a part of it is null.</exception>
    /// <exception cref="ArgumentException">The request holds both or neither kind of data, or data out of range.</exception>
    public static CalibrationResult Run(CalibrationRequest request)
    {
        Validate(request);
        request = UpToRest(request);
        var options = request.Options;
        var problem = new CalibrationProblem(request);
        var (measured, series) = problem.Measured();
        int n = measured.Length;
        var map = StartingMap(request);
        int p = map.Free.Count;
        if (n <= p + 1)
        {
            return Refused(request, problem, map, map.Physical(map.Start()), measured, series, Enumerable.Repeat(1.0, n).ToArray(),
                CalibrationRefusal.TooFewPoints, $"{n} measured values cannot fit {p} parameters with any check left; measure at least {p + 2}.");
        }
        if (request.Trace is null && !options.Fixed.Contains(CalibrationParameter.FieldFactor))
        {
            map = WithFieldFactorFromTorque(request, problem, map);
        }

        // Series scales: first the measured values' own size, then (torque with lift) each series' residual scatter.
        var scale = SeriesScales(measured, series, null, p);
        Vector<double> theta;
        int iterations;
        try
        {
            (theta, iterations) = Minimise(problem, map, measured, scale, map.Start(), options.MaxIterations);
            if (series.Contains("lift"))
            {
                var model = new double[n];
                problem.Predict(map.Physical(theta), model);
                scale = SeriesScales(measured, series, model, p);
                (theta, iterations) = Minimise(problem, map, measured, scale, theta, options.MaxIterations);
            }
        }
        catch (Exception e) when (e is NonConvergenceException or MaximumIterationsException or ArithmeticException)
        {
            return Refused(request, problem, map, map.Physical(map.Start()), measured, series, scale, CalibrationRefusal.NotConverged,
                $"the least-squares fit did not converge ({e.Message}); check that the data belong to this rotor and plate and are in the documented units.");
        }
        double[] phys = map.Physical(theta);
        if (phys.Any(v => !double.IsFinite(v)))
        {
            return Refused(request, problem, map, map.Physical(map.Start()), measured, series, scale, CalibrationRefusal.NotConverged,
                "the least-squares fit ran away to non-finite values; check that the data belong to this rotor and plate and are in the documented units.");
        }
        return Assemble(request, problem, map, theta, measured, series, scale, iterations);
    }

    // Once the tachometer reads 0 the rotor is at rest: later samples carry no information on the drag, and counting them
    // as degrees of freedom would shrink the residual variance and the intervals.
    private static CalibrationRequest UpToRest(CalibrationRequest request)
        => request.Trace is { } full && FirstRest(full) is int rest && rest + 1 < full.Count
            ? request with { Trace = full.Take(rest + 1).ToArray() }
            : request;

    // The free parameters (the two factors unless held; with a spin-down also the bearing terms unless held, and the start
    // speed), the start at the rotor row's values and the scales the bearing terms and start speed are fitted in.
    private static ParameterMap StartingMap(CalibrationRequest request)
    {
        var options = request.Options;
        bool spin = request.Trace is not null;
        var rotor = request.Rotor;
        var free = new List<int>();
        foreach (var q in new[] { CalibrationParameter.ConductivityFactor, CalibrationParameter.FieldFactor })
        {
            if (!options.Fixed.Contains(q))
            {
                free.Add((int)q);
            }
        }
        if (spin)
        {
            foreach (var q in new[] { CalibrationParameter.BearingDrag, CalibrationParameter.BearingDamping })
            {
                if (!options.Fixed.Contains(q))
                {
                    free.Add((int)q);
                }
            }
            free.Add(CalibrationProblem.StartSpeed);
        }

        double startSpeed = spin ? request.Trace![0].SpeedRadPerS : 0.0;
        double speedRef = Math.Max(1e-9, spin ? request.Trace!.Max(s => s.SpeedRadPerS) : request.Points!.Max(p => p.SpeedRadPerS));
        double torqueRef = spin
            ? rotor.InertiaKgM2 * speedRef / Math.Max(1e-9, request.Trace![^1].TimeS - request.Trace[0].TimeS)
            : Math.Max(1e-12, request.Points!.Max(p => Math.Abs(p.TorqueNm)));
        var start = new[] { 1.0, 1.0, rotor.BearingDragNm, rotor.BearingDampingNmPerRadPerS, startSpeed };
        return new ParameterMap(free, start, torqueRef, speedRef);
    }

    // Steady points: start the field factor at the torque's least-squares scale over the uncorrected eddy torque, so a
    // fit that starts far off (a torque column in another unit) still lands in the right basin.
    private static ParameterMap WithFieldFactorFromTorque(CalibrationRequest request, CalibrationProblem problem, ParameterMap map)
    {
        var start = map.StartPhysical.ToArray();
        double sxy = 0, sxx = 0;
        foreach (var p in request.Points!)
        {
            double m = problem.Eddy(1, 1, p.SpeedRadPerS, p.GapM, p.PlateTempC ?? request.PlateTempC).TorqueNm;
            double y = p.TorqueNm - problem.Windage(p.SpeedRadPerS) - BearingDrag.TorqueUnchecked(p.SpeedRadPerS, start[2], start[3]);
            sxy += m * y;
            sxx += m * m;
        }
        if (sxx > 0 && sxy > 0)
        {
            start[1] = Math.Sqrt(sxy / sxx);
            return new ParameterMap(map.Free, start, map.TorqueRef, map.SpeedRef);
        }
        return map;
    }

    private static int? FirstRest(IReadOnlyList<SpinDownSample> trace)
    {
        for (int i = 0; i < trace.Count; i++)
        {
            if (trace[i].SpeedRadPerS == 0)
            {
                return i;
            }
        }
        return null;
    }

    private static void Validate(CalibrationRequest request)
    {
        Preconditions.NotNull(request, nameof(request));
        Preconditions.NotNull(request.Rotor, "rotor");
        Preconditions.NotNull(request.Plate, "plate");
        Preconditions.NotNull(request.Load, "load options");
        Preconditions.NotNull(request.Options, "calibration options");
        Preconditions.Finite(request.PlateTempC, nameof(request.PlateTempC));
        Preconditions.Finite(request.MagnetTempC, nameof(request.MagnetTempC));
        Preconditions.Positive(request.Rotor.InertiaKgM2, "rotor inertia");
        var o = request.Options;
        Preconditions.InRange(o.ConfidenceLevel, 0.5, 0.9999, "confidence level");
        Preconditions.Positive(o.RelativeHalfWidthLimit, "relative half-width limit");
        Preconditions.InRange(o.CorrelationLimit, 0.5, 1.0, "correlation limit");
        Preconditions.AtLeast(o.MaxIterations, 1, "max iterations");
        if ((request.Points is null) == (request.Trace is null))
        {
            throw new ArgumentException("give either steady points or a spin-down trace, not both or neither.", nameof(request));
        }
        if (request.Points is { } points)
        {
            if (points.Count == 0)
            {
                throw new ArgumentException("no steady points.", nameof(request));
            }
            foreach (var p in points)
            {
                Preconditions.NotNull(p, "bench point");
                Preconditions.NonNegative(p.SpeedRadPerS, "bench point speed");
                Preconditions.NonNegative(p.GapM, "bench point gap");
                Preconditions.Finite(p.TorqueNm, "bench point torque");
                if (p.LiftN is { } lift)
                {
                    Preconditions.Finite(lift, "bench point lift");
                }
                if (p.PlateTempC is { } t)
                {
                    Preconditions.Finite(t, "bench point plate temperature");
                }
            }
        }
        if (request.Trace is { } trace)
        {
            if (trace.Count == 0)
            {
                throw new ArgumentException("no spin-down samples.", nameof(request));
            }
            for (int i = 0; i < trace.Count; i++)
            {
                Preconditions.NotNull(trace[i], "spin-down sample");
                Preconditions.Finite(trace[i].TimeS, "spin-down time");
                Preconditions.NonNegative(trace[i].SpeedRadPerS, "spin-down speed");
                Preconditions.NonNegative(trace[i].GapM, "spin-down gap");
                if (i > 0 && !(trace[i].TimeS > trace[i - 1].TimeS))
                {
                    throw new ArgumentException($"spin-down times must increase; sample {i} at {trace[i].TimeS} s follows {trace[i - 1].TimeS} s.", nameof(request));
                }
            }
        }
    }

    private static (Vector<double> Theta, int Iterations) Minimise(CalibrationProblem problem, ParameterMap map, double[] measured,
        double[] scale, Vector<double> start, int maxIterations)
    {
        int n = measured.Length;
        var x = Vector<double>.Build.Dense(n, i => i);
        var y = Vector<double>.Build.Dense(n, i => measured[i] / scale[i]);
        Vector<double> Model(Vector<double> theta, Vector<double> _) => Vector<double>.Build.Dense(Weighted(problem, map, theta, scale));
        Matrix<double> Jacobian(Vector<double> theta, Vector<double> _) => WeightedJacobian(problem, map, theta, scale);
        var objective = ObjectiveFunction.NonlinearModel(Model, Jacobian, x, y, null);
        var minimiser = new LevenbergMarquardtMinimizer(maximumIterations: maxIterations);
        var result = minimiser.FindMinimum(objective, start);
        return (result.MinimizingPoint, result.Iterations);
    }

    private static double[] Weighted(CalibrationProblem problem, ParameterMap map, Vector<double> theta, double[] scale)
    {
        var values = new double[scale.Length];
        problem.Predict(map.Physical(theta), values);
        for (int i = 0; i < values.Length; i++)
        {
            values[i] /= scale[i];
        }
        return values;
    }

    // Central differences in the internal parameters; the model is smooth in them (table interpolation is C1 and the
    // spin-down sub-steps are fixed), so a step of 1e-5 leaves truncation and rounding both near 1e-10 of the value.
    private static Matrix<double> WeightedJacobian(CalibrationProblem problem, ParameterMap map, Vector<double> theta, double[] scale)
    {
        var jacobian = Matrix<double>.Build.Dense(scale.Length, theta.Count);
        for (int j = 0; j < theta.Count; j++)
        {
            double h = 1e-5 * Math.Max(1.0, Math.Abs(theta[j]));
            var plus = theta.Clone();
            var minus = theta.Clone();
            plus[j] += h;
            minus[j] -= h;
            var fp = Weighted(problem, map, plus, scale);
            var fm = Weighted(problem, map, minus, scale);
            for (int i = 0; i < scale.Length; i++)
            {
                jacobian[i, j] = (fp[i] - fm[i]) / (2 * h);
            }
        }
        return jacobian;
    }

    // Each value's weight scale: with no model yet, the RMS of its series' measured values; with a model, the series'
    // residual RMS corrected for the parameters it used (its share of n - p).
    private static double[] SeriesScales(double[] measured, string[] series, double[]? model, int parameters)
    {
        int n = measured.Length;
        var scale = new double[n];
        foreach (string s in series.Distinct())
        {
            var index = Enumerable.Range(0, n).Where(i => series[i] == s).ToArray();
            double rmsMeasured = Math.Sqrt(index.Average(i => measured[i] * measured[i]));
            double value = rmsMeasured;
            if (model is not null)
            {
                double rss = index.Sum(i => (measured[i] - model[i]) * (measured[i] - model[i]));
                double dof = Math.Max(1.0, index.Length * (1.0 - (double)parameters / n));
                value = Math.Sqrt(rss / dof);
            }
            value = Math.Max(value, 1e-9 * Math.Max(rmsMeasured, 1e-300));
            if (!(value > 0) || !double.IsFinite(value))
            {
                value = 1.0;
            }
            foreach (int i in index)
            {
                scale[i] = value;
            }
        }
        return scale;
    }
}

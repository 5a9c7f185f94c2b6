using RotorDrive.Core.Loads;

namespace RotorDrive.Core.Studies.Calibration;

/// <summary>The least-squares problem of one calibration: the model's prediction of every measured value for a set of
/// physical parameters (conductivity factor, field factor, bearing drag, bearing damping, spin-down start speed).</summary>
/// <remarks>The eddy part comes from a precomputed table of the uncorrected model over (sigma omega, gap)
/// (<see cref="TabulatedRotorLoad"/>): the conductivity factor moves the query along sigma omega and the field factor
/// scales the result by its square, exactly as <see cref="PhysicsRotorLoad"/> applies a <see cref="LoadCalibration"/>,
/// so the fitted model and the calibrated load every analysis uses are the same function.</remarks>
internal sealed class CalibrationProblem
{
    /// <summary>Index of the spin-down start speed in the physical parameter vector.</summary>
    public const int StartSpeed = 4;

    private readonly CalibrationRequest _request;
    private readonly TabulatedRotorLoad _table;
    private readonly PhysicsRotorLoad _direct;
    private readonly double _remanenceScale;
    private readonly double[] _times = [];
    private readonly int[] _subSteps = [];

    public CalibrationProblem(CalibrationRequest request)
    {
        _request = request;
        var load = request.Load with { Calibration = null };
        var options = request.Options;
        double maxSpeed, minGap, maxGap, minTemp = request.PlateTempC, maxTemp = request.PlateTempC;
        if (request.Trace is { } trace)
        {
            maxSpeed = trace.Max(s => s.SpeedRadPerS);
            minGap = trace.Min(s => s.GapM);
            maxGap = trace.Max(s => s.GapM);
            _times = trace.Select(s => s.TimeS).ToArray();
        }
        else
        {
            var points = request.Points!;
            maxSpeed = points.Max(p => p.SpeedRadPerS);
            minGap = points.Min(p => p.GapM);
            maxGap = points.Max(p => p.GapM);
            foreach (var p in points)
            {
                double t = p.PlateTempC ?? request.PlateTempC;
                minTemp = Math.Min(minTemp, t);
                maxTemp = Math.Max(maxTemp, t);
            }
        }
        // Cover the speeds a fit may ask for (conductivity factors up to twice the plausible top) and the data's gaps.
        double topSpeed = Math.Max(maxSpeed, 1.0) * 2.0 * options.ConductivityFactorRange.Max;
        var range = new LoadTableRange(topSpeed, 0.5 * minGap, 1.5 * maxGap + 1e-4, minTemp, maxTemp, SpeedDecades: 8);
        _direct = new PhysicsRotorLoad(request.Rotor, request.Plate, load);
        _table = RotorLoadTable.Build(_direct, range);
        _remanenceScale = PhysicsRotorLoad.RemanenceScale(request.Rotor, request.MagnetTempC);
        if (request.Trace is not null)
        {
            _subSteps = SubSteps();
        }
    }

    /// <summary>The uncorrected table the fit reads.</summary>
    public TabulatedRotorLoad Table => _table;

    /// <summary>Measured values fitted: torque points then lift points, or the spin-down samples.</summary>
    public int Count => _request.Trace?.Count ?? (_request.Points!.Count + _request.Points!.Count(p => p.LiftN is not null));

    /// <summary>Eddy lift and torque at a speed (at least 0), gap and plate temperature for given factors, N and N m.</summary>
    public (double LiftN, double TorqueNm) Eddy(double conductivityFactor, double fieldFactor, double speedRadPerS, double gapM, double plateTempC)
    {
        double sigma = PhysicsRotorLoad.PlateConductivity(_direct.Plate.Material, plateTempC) * conductivityFactor;
        var (lift, torque) = _table.EddyAtSigmaOmega(sigma * speedRadPerS, gapM);
        double scale = _remanenceScale * fieldFactor * fieldFactor;
        return (lift * scale, torque * scale);
    }

    /// <summary>Windage torque at a speed, N m.</summary>
    public double Windage(double speedRadPerS)
        => DiscWindage.TorqueUnchecked(speedRadPerS, _direct.WindageRadiusM, _direct.Options.Air.DensityKgM3, _direct.Options.Air.KinematicViscosityM2PerS);

    /// <summary>Total drag torque of a coasting rotor for the physical parameters p, N m.</summary>
    public double DragTorque(ReadOnlySpan<double> p, double speedRadPerS, double gapM)
        => Eddy(p[0], p[1], speedRadPerS, gapM, _request.PlateTempC).TorqueNm + Windage(speedRadPerS)
            + BearingDrag.TorqueUnchecked(speedRadPerS, p[2], p[3]);

    /// <summary>The model's value of every measured value for physical parameters p, in the order of <see cref="Measured"/>.</summary>
    public void Predict(double[] p, Span<double> values)
    {
        if (_request.Trace is { } trace)
        {
            double Torque(double speed, double fraction, int interval)
            {
                double gap = trace[interval].GapM + fraction * (trace[interval + 1].GapM - trace[interval].GapM);
                return DragTorque(p, speed, gap);
            }
            SpinDownIntegrator.Integrate(_request.Rotor.InertiaKgM2, Torque, p[StartSpeed], _times, _subSteps, values);
            return;
        }
        var points = _request.Points!;
        int n = points.Count, k = n;
        for (int i = 0; i < n; i++)
        {
            var pt = points[i];
            var (lift, torque) = Eddy(p[0], p[1], pt.SpeedRadPerS, pt.GapM, pt.PlateTempC ?? _request.PlateTempC);
            values[i] = torque + Windage(pt.SpeedRadPerS) + BearingDrag.TorqueUnchecked(pt.SpeedRadPerS, p[2], p[3]);
            if (pt.LiftN is not null)
            {
                values[k++] = lift;
            }
        }
    }

    /// <summary>The measured values, in the order of <see cref="Predict"/>, with each value's series ("torque", "lift", "speed").</summary>
    public (double[] Values, string[] Series) Measured()
    {
        if (_request.Trace is { } trace)
        {
            return (trace.Select(s => s.SpeedRadPerS).ToArray(), trace.Select(_ => "speed").ToArray());
        }
        var points = _request.Points!;
        var values = points.Select(p => p.TorqueNm).Concat(points.Where(p => p.LiftN is not null).Select(p => p.LiftN!.Value)).ToArray();
        var series = points.Select(_ => "torque").Concat(points.Where(p => p.LiftN is not null).Select(_ => "lift")).ToArray();
        return (values, series);
    }

    // Sub-steps per interval: the fastest decay rate the fit may meet is about twice the drag torque over speed divided
    // by the inertia, with the field factor at the top of its plausible range doubled; steps of a fifth of its inverse keep
    // the RK4 error far below the measurement noise (local error ~ (h k)^5 / 120).
    private int[] SubSteps()
    {
        var trace = _request.Trace!;
        double top = 2.0 * _request.Options.FieldFactorRange.Max;
        double rate = 0;
        foreach (var s in trace)
        {
            if (s.SpeedRadPerS > 0)
            {
                // Only the speed-dependent drag sets the step: a constant (Coulomb) torque is not stiff.
                double torque = Eddy(1.0, top, s.SpeedRadPerS, s.GapM, _request.PlateTempC).TorqueNm + Windage(s.SpeedRadPerS);
                double slope = 2.0 * torque / s.SpeedRadPerS + _request.Rotor.BearingDampingNmPerRadPerS;
                rate = Math.Max(rate, slope / _request.Rotor.InertiaKgM2);
            }
        }
        double hMax = rate > 0 ? 0.2 / rate : double.PositiveInfinity;
        var steps = new int[Math.Max(0, trace.Count - 1)];
        for (int i = 0; i < steps.Length; i++)
        {
            double dt = trace[i + 1].TimeS - trace[i].TimeS;
            steps[i] = (int)Math.Clamp(Math.Ceiling(dt / hMax), 2, 1000);
        }
        return steps;
    }
}

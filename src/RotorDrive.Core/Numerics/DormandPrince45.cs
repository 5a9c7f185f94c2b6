using System.Collections.Immutable;

namespace RotorDrive.Core.Numerics;

/// <summary>Adaptive explicit Runge-Kutta 5(4) integrator of Dormand and Prince with step-size control, first-same-as-
/// last stages, a continuous extension (dense output), event location and observers; allocation-free per step.</summary>
/// <remarks>
/// <para>Method: J. R. Dormand and P. J. Prince, "A family of embedded Runge-Kutta formulae", J. Comput. Appl. Math. 6,
/// 19-26, 1980. The fifth-order solution is propagated (local extrapolation) and the embedded fourth-order one only
/// estimates the error. Step-size control, starting step and continuous extension as in E. Hairer, S. P. Norsett and
/// G. Wanner, "Solving Ordinary Differential Equations I", 2nd ed., Springer 1993, II.4-II.6 (code DOPRI5).</para>
/// <para>An instance owns work arrays for one dimension, allocated once in the constructor, and is not thread-safe:
/// use one instance per thread. The step loop allocates nothing; each call allocates only its result record.
/// Integration runs forward in time. A discontinuity in the right-hand side (landing-gear contact, a controller mode
/// change) is handled by stopping at an event (<see cref="IOdeEvents"/>) and calling again from the returned state
/// with the other right-hand side.</para>
/// </remarks>
public sealed partial class DormandPrince45
{
    private readonly int _dimension;
    private double[] _y, _y1, _k1, _k7;
    private readonly double[] _k2, _k3, _k4, _k5, _k6, _yStage;
    private readonly double[] _r1, _r2, _r3, _r4, _r5, _yInterp;
    private double[] _gPrev = [], _gNew = [], _gMid = [];
    private double _denseStart, _denseStep;

    /// <summary>Creates an integrator for systems of a given dimension.</summary>
    /// <param name="dimension">Number of state components, at least 1.</param>
    /// <param name="options">Settings; null for <see cref="DormandPrince45Options.Default"/>.</param>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="dimension"/> is less than 1.</exception>
    public DormandPrince45(int dimension, DormandPrince45Options? options = null)
    {
        _dimension = Preconditions.AtLeast(dimension, 1, nameof(dimension));
        Options = options ?? DormandPrince45Options.Default;
        _y = new double[dimension];
        _y1 = new double[dimension];
        _k1 = new double[dimension];
        _k2 = new double[dimension];
        _k3 = new double[dimension];
        _k4 = new double[dimension];
        _k5 = new double[dimension];
        _k6 = new double[dimension];
        _k7 = new double[dimension];
        _yStage = new double[dimension];
        _r1 = new double[dimension];
        _r2 = new double[dimension];
        _r3 = new double[dimension];
        _r4 = new double[dimension];
        _r5 = new double[dimension];
        _yInterp = new double[dimension];
    }

    /// <summary>Number of state components this instance integrates.</summary>
    public int Dimension => _dimension;

    /// <summary>The settings in force.</summary>
    public DormandPrince45Options Options { get; }

    /// <summary>Integrates y' = f(t, y) from <paramref name="startS"/> until <paramref name="endS"/> or an event.</summary>
    /// <typeparam name="TSystem">The system type; a struct is specialised by the JIT (no interface call per stage).</typeparam>
    /// <param name="system">The right-hand side.</param>
    /// <param name="startS">Start time, s.</param>
    /// <param name="state">Initial state on entry; the state at the stop time on return.</param>
    /// <param name="endS">End time, s, not before <paramref name="startS"/>.</param>
    /// <param name="events">Event functions that stop the integration when they change sign, or null.</param>
    /// <param name="observer">Receives the start, every accepted step or output-grid point, and the stop, or null.</param>
    /// <returns>The stop time, state, status (<see cref="OdeStatus"/>) and work counts.</returns>
    /// <exception cref="ArgumentException">The state has the wrong length or a non-finite component, or the times
    /// are not finite or out of order.</exception>
    public OdeResult Integrate<TSystem>(
        TSystem system,
        double startS,
        Span<double> state,
        double endS,
        IOdeEvents? events = null,
        IOdeObserver? observer = null)
        where TSystem : IOdeSystem
    {
        CheckArguments(startS, state, endS);
        var o = Options;
        state.CopyTo(_y);
        double t = startS;
        observer?.Observe(t, _y, ObservationKind.Start);
        if (endS == startS)
        {
            observer?.Observe(t, _y, ObservationKind.Stop);
            return Finish(OdeStatus.Completed, t, state, null, 0, 0, 0, 0);
        }

        int eventCount = events?.Count ?? 0;
        EnsureEventBuffers(eventCount);
        if (eventCount > 0)
        {
            events!.Evaluate(t, _y, _gPrev.AsSpan(0, eventCount));
        }
        bool dense = eventCount > 0 || (observer is not null && o.OutputIntervalS is not null);
        long gridIndex = 0;
        if (o.OutputIntervalS is { } interval)
        {
            gridIndex = (long)Math.Floor(t / interval) + 1;
            while (gridIndex * interval <= t)
            {
                gridIndex++;
            }
        }

        system.Derivatives(t, _y, _k1);
        int evaluations = 1;
        double span = endS - startS;
        double hMax = Math.Min(o.MaxStepS ?? span, span);
        bool fixedStep = o.FixedStepS is not null;
        double h = fixedStep ? o.FixedStepS!.Value : o.InitialStepS ?? InitialStep(system, t, hMax, ref evaluations);
        h = Math.Min(h, hMax);

        double facc1 = 1.0 / o.MinStepRatio, facc2 = 1.0 / o.MaxStepRatio;
        double expo1 = 0.2 - 0.75 * o.StabilizationBeta;
        double facOld = 1e-4;
        bool lastRejected = false, lastNonFinite = false;
        int accepted = 0, rejected = 0;

        while (true)
        {
            if (accepted + rejected >= o.MaxSteps)
            {
                return Stop(OdeStatus.MaxStepsExceeded, t, state, observer, accepted, rejected, evaluations, h);
            }
            if (!fixedStep && h < Math.Max(o.MinStepS, 16 * Math.Abs(t) * DoubleRoundingUnit))
            {
                var why = lastNonFinite ? OdeStatus.NonFinite : OdeStatus.StepTooSmall;
                return Stop(why, t, state, observer, accepted, rejected, evaluations, h);
            }

            bool last = t + 1.01 * h >= endS;
            double hStep = last ? endS - t : h;
            Stages(system, t, hStep);
            evaluations += 6;
            bool finite = AllFinite(_y1) && AllFinite(_k7);
            double err = fixedStep || !finite ? 0 : ErrorNorm(hStep, o.RelativeTolerance, o.AbsoluteTolerance);

            if (!finite)
            {
                lastNonFinite = true;
                if (fixedStep)
                {
                    return Stop(OdeStatus.NonFinite, t, state, observer, accepted, rejected, evaluations, h);
                }
                rejected++;
                lastRejected = true;
                h = hStep * o.MinStepRatio;
                continue;
            }

            double fac11 = Math.Pow(err, expo1);
            if (err > 1)
            {
                rejected++;
                lastRejected = true;
                lastNonFinite = false;
                h = hStep / Math.Min(facc1, fac11 / o.SafetyFactor);
                continue;
            }

            // Accepted.
            double hNew;
            if (fixedStep)
            {
                hNew = h;
            }
            else
            {
                double fac = Math.Max(facc2, Math.Min(facc1, fac11 / Math.Pow(facOld, o.StabilizationBeta) / o.SafetyFactor));
                facOld = Math.Max(err, 1e-4);
                hNew = Math.Min(hStep / fac, hMax);
                if (lastRejected)
                {
                    hNew = Math.Min(hNew, hStep);
                }
                if (last && hStep < h)
                {
                    // A last step shortened to land on the end time says little about the next step size.
                    hNew = Math.Max(hNew, h);
                }
            }
            lastRejected = false;
            lastNonFinite = false;
            accepted++;

            double tNew = last ? endS : t + hStep;
            if (dense)
            {
                PrepareDense(t, hStep);
            }

            int hit = -1;
            double tStop = tNew;
            if (eventCount > 0)
            {
                events!.Evaluate(tNew, _y1, _gNew.AsSpan(0, eventCount));
                hit = LocateEvent(events, eventCount, t, tNew, out tStop);
                if (hit >= 0)
                {
                    // The state at the located crossing becomes the current state; the continuous extension (r1..r5)
                    // still serves the grid points before it.
                    _yInterp.CopyTo(_y, 0);
                }
            }

            if (observer is not null && o.OutputIntervalS is { } dt)
            {
                bool terminal = hit >= 0 || last;
                while (true)
                {
                    double tg = gridIndex * dt;
                    if (tg > tStop || (terminal && tg >= tStop))
                    {
                        break;
                    }
                    Interpolate(tg, _yInterp);
                    observer.Observe(tg, _yInterp, ObservationKind.Grid);
                    gridIndex++;
                }
            }

            if (hit >= 0)
            {
                observer?.Observe(tStop, _y, ObservationKind.Stop);
                return Finish(OdeStatus.EventHit, tStop, state, hit, accepted, rejected, evaluations, hNew);
            }

            (_y, _y1) = (_y1, _y);
            (_k1, _k7) = (_k7, _k1);
            t = tNew;
            if (last)
            {
                observer?.Observe(t, _y, ObservationKind.Stop);
                return Finish(OdeStatus.Completed, t, state, null, accepted, rejected, evaluations, hNew);
            }
            if (observer is not null && o.OutputIntervalS is null)
            {
                observer.Observe(t, _y, ObservationKind.Step);
            }
            h = hNew;
        }
    }

    /// <summary>Integrates y' = f(t, y) given as a delegate; see <see cref="Integrate{TSystem}"/>.</summary>
    /// <param name="derivatives">The right-hand side.</param>
    /// <param name="startS">Start time, s.</param>
    /// <param name="state">Initial state on entry; the state at the stop time on return.</param>
    /// <param name="endS">End time, s, not before <paramref name="startS"/>.</param>
    /// <param name="events">Event functions, or null.</param>
    /// <param name="observer">Observer, or null.</param>
    /// <returns>The stop time, state, status and work counts.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="derivatives"/> is null.</exception>
    /// <exception cref="ArgumentException">See <see cref="Integrate{TSystem}"/>.</exception>
    public OdeResult Integrate(
        OdeDerivatives derivatives,
        double startS,
        Span<double> state,
        double endS,
        IOdeEvents? events = null,
        IOdeObserver? observer = null)
        => Integrate(new DelegateSystem(Preconditions.NotNull(derivatives, nameof(derivatives))), startS, state, endS, events, observer);

    // Unit roundoff of IEEE double (2^-53).
    private const double DoubleRoundingUnit = 1.1102230246251565e-16;

    private void CheckArguments(double startS, Span<double> state, double endS)
    {
        if (state.Length != _dimension)
        {
            throw new ArgumentException($"state has {state.Length} components; this integrator was made for {_dimension}.", nameof(state));
        }
        Preconditions.Finite(startS, nameof(startS));
        Preconditions.Finite(endS, nameof(endS));
        if (endS < startS)
        {
            throw new ArgumentException($"endS ({endS}) must not be before startS ({startS}); integration runs forward.", nameof(endS));
        }
        for (int i = 0; i < state.Length; i++)
        {
            if (!double.IsFinite(state[i]))
            {
                throw new ArgumentException($"state[{i}] must be finite; got {state[i]}.", nameof(state));
            }
        }
    }

    private void EnsureEventBuffers(int count)
    {
        if (_gPrev.Length < count)
        {
            _gPrev = new double[count];
            _gNew = new double[count];
            _gMid = new double[count];
        }
    }

    private static bool AllFinite(double[] values)
    {
        foreach (double v in values)
        {
            if (!double.IsFinite(v))
            {
                return false;
            }
        }
        return true;
    }

    /// <summary>Starting step (Hairer, Norsett &amp; Wanner 1993, II.4): h0 = 0.01 |y|/|f|, refined by an estimate of
    /// the second derivative so that h^5 max(|f|, |f'|) = 0.01; bounded by 100 h0 and hMax.</summary>
    private double InitialStep<TSystem>(TSystem system, double t, double hMax, ref int evaluations) where TSystem : IOdeSystem
    {
        double rtol = Options.RelativeTolerance, atol = Options.AbsoluteTolerance;
        int n = _dimension;
        double dny = 0, dnf = 0;
        for (int i = 0; i < n; i++)
        {
            double sc = atol + rtol * Math.Abs(_y[i]);
            dny += (_y[i] / sc) * (_y[i] / sc);
            dnf += (_k1[i] / sc) * (_k1[i] / sc);
        }
        dny = Math.Sqrt(dny / n);
        dnf = Math.Sqrt(dnf / n);
        double h0 = dny < 1e-5 || dnf < 1e-5 ? 1e-6 : 0.01 * dny / dnf;
        h0 = Math.Min(h0, hMax);
        for (int i = 0; i < n; i++)
        {
            _yStage[i] = _y[i] + h0 * _k1[i];
        }
        system.Derivatives(t + h0, _yStage, _k2);
        evaluations++;
        double der2 = 0;
        for (int i = 0; i < n; i++)
        {
            double sc = atol + rtol * Math.Abs(_y[i]);
            double d = (_k2[i] - _k1[i]) / sc;
            der2 += d * d;
        }
        der2 = Math.Sqrt(der2 / n) / h0;
        double der12 = Math.Max(Math.Abs(der2), dnf);
        double h1 = der12 <= 1e-15 ? Math.Max(1e-6, h0 * 1e-3) : Math.Pow(0.01 / der12, 0.2);
        double h = Math.Min(Math.Min(100 * h0, h1), hMax);
        return double.IsFinite(h) && h > 0 ? h : h0;
    }

    private OdeResult Stop(OdeStatus status, double t, Span<double> state, IOdeObserver? observer, int accepted, int rejected, int evaluations, double h)
    {
        observer?.Observe(t, _y, ObservationKind.Stop);
        return Finish(status, t, state, null, accepted, rejected, evaluations, h);
    }

    private OdeResult Finish(OdeStatus status, double t, Span<double> state, int? eventIndex, int accepted, int rejected, int evaluations, double nextStep)
    {
        _y.CopyTo(state);
        return new OdeResult(status, t, ImmutableArray.Create(_y), eventIndex, accepted, rejected, evaluations, nextStep);
    }

    private readonly struct DelegateSystem(OdeDerivatives function) : IOdeSystem
    {
        public void Derivatives(double timeS, ReadOnlySpan<double> state, Span<double> derivatives) => function(timeS, state, derivatives);
    }
}

namespace RotorDrive.Core.Numerics;

/// <summary>Settings of the <see cref="DormandPrince45"/> integrator; every value is checked when set.</summary>
/// <remarks>Step-size control follows E. Hairer, S. P. Norsett and G. Wanner, "Solving Ordinary Differential
/// Equations I", 2nd ed., Springer 1993, section II.4 and the DOPRI5 code described there: the error of step h is
/// err = sqrt(mean_i((e_i / sc_i)^2)) with sc_i = atol + rtol max(|y_i|, |y1_i|), a step is accepted when err &lt;= 1,
/// and the next step is h / fac with fac = err^(0.2 - 0.75 beta) / errOld^beta / safety, bounded to
/// [1 / <see cref="MaxStepRatio"/>, 1 / <see cref="MinStepRatio"/>] (PI control, beta = 0.04). Each state component
/// should be scaled so that <see cref="AbsoluteTolerance"/> is a meaningful absolute error for it.</remarks>
public sealed record DormandPrince45Options
{
    /// <summary>The default settings.</summary>
    public static DormandPrince45Options Default { get; } = new();

    /// <summary>Relative error tolerance per step, dimensionless; default 1e-6; range (0, 0.1].</summary>
    /// <exception cref="ArgumentOutOfRangeException">Outside the range.</exception>
    public double RelativeTolerance
    {
        get;
        init => field = Preconditions.InRange(Preconditions.Positive(value, nameof(RelativeTolerance)), 0, 0.1, nameof(RelativeTolerance));
    } = 1e-6;

    /// <summary>Absolute error tolerance per step, in each state component's unit; default 1e-9; must be &gt; 0.</summary>
    /// <exception cref="ArgumentOutOfRangeException">Not finite or not positive.</exception>
    public double AbsoluteTolerance
    {
        get;
        init => field = Preconditions.Positive(value, nameof(AbsoluteTolerance));
    } = 1e-9;

    /// <summary>First step size, s; null (default) lets the integrator estimate it (Hairer et al. 1993, II.4,
    /// "starting step size"), which costs one extra evaluation.</summary>
    /// <exception cref="ArgumentOutOfRangeException">Not finite or not positive.</exception>
    public double? InitialStepS
    {
        get;
        init => field = value is { } v ? Preconditions.Positive(v, nameof(InitialStepS)) : null;
    }

    /// <summary>Smallest step the error control may ask for before giving up with
    /// <see cref="OdeStatus.StepTooSmall"/>, s; default 1e-12. A limit of 16 rounding units of |t| applies as well.</summary>
    /// <exception cref="ArgumentOutOfRangeException">Not finite or negative.</exception>
    public double MinStepS
    {
        get;
        init => field = Preconditions.NonNegative(value, nameof(MinStepS));
    } = 1e-12;

    /// <summary>Largest step, s; null (default) allows the whole interval. Bound it so that no event can cross and
    /// cross back within one step.</summary>
    /// <exception cref="ArgumentOutOfRangeException">Not finite or not positive.</exception>
    public double? MaxStepS
    {
        get;
        init => field = value is { } v ? Preconditions.Positive(v, nameof(MaxStepS)) : null;
    }

    /// <summary>Budget of attempted steps (accepted plus rejected) per integration; default 100000.</summary>
    /// <exception cref="ArgumentOutOfRangeException">Less than 1.</exception>
    public int MaxSteps
    {
        get;
        init => field = Preconditions.AtLeast(value, 1, nameof(MaxSteps));
    } = 100_000;

    /// <summary>When set, every step has this size (the last one is shortened to land on the end time) and no error
    /// control is done: used to measure the order of the method. Null (default) selects adaptive steps.</summary>
    /// <exception cref="ArgumentOutOfRangeException">Not finite or not positive.</exception>
    public double? FixedStepS
    {
        get;
        init => field = value is { } v ? Preconditions.Positive(v, nameof(FixedStepS)) : null;
    }

    /// <summary>Width of the time bracket to which an event is located by bisection, s; default 1e-10. The located
    /// time is the bracket's right end, just past the crossing, so a restart does not fire the same event again.</summary>
    /// <exception cref="ArgumentOutOfRangeException">Not finite or not positive.</exception>
    public double EventToleranceS
    {
        get;
        init => field = Preconditions.Positive(value, nameof(EventToleranceS));
    } = 1e-10;

    /// <summary>When set, the observer receives the solution at every multiple k x interval of time (k integer)
    /// inside the integration, interpolated with the continuous extension, instead of at every accepted step.
    /// Null (default) reports accepted steps.</summary>
    /// <exception cref="ArgumentOutOfRangeException">Not finite or not positive.</exception>
    public double? OutputIntervalS
    {
        get;
        init => field = value is { } v ? Preconditions.Positive(v, nameof(OutputIntervalS)) : null;
    }

    /// <summary>Safety factor on the step-size proposal, dimensionless; default 0.9 (Hairer et al. 1993); range [0.5, 1).</summary>
    /// <exception cref="ArgumentOutOfRangeException">Outside the range.</exception>
    public double SafetyFactor
    {
        get;
        init => field = Preconditions.InRange(value, 0.5, 0.999, nameof(SafetyFactor));
    } = 0.9;

    /// <summary>Smallest ratio new step / old step, dimensionless; default 0.2 (Hairer et al. 1993); range [0.01, 1).</summary>
    /// <exception cref="ArgumentOutOfRangeException">Outside the range.</exception>
    public double MinStepRatio
    {
        get;
        init => field = Preconditions.InRange(value, 0.01, 0.999, nameof(MinStepRatio));
    } = 0.2;

    /// <summary>Largest ratio new step / old step, dimensionless; default 10 (Hairer et al. 1993); range (1, 100].</summary>
    /// <exception cref="ArgumentOutOfRangeException">Outside the range.</exception>
    public double MaxStepRatio
    {
        get;
        init => field = Preconditions.InRange(value, 1.001, 100, nameof(MaxStepRatio));
    } = 10.0;

    /// <summary>Exponent beta of the PI step-size stabilisation, dimensionless; default 0.04 (Hairer et al. 1993,
    /// DOPRI5); 0 gives the classic controller; range [0, 0.1].</summary>
    /// <exception cref="ArgumentOutOfRangeException">Outside the range.</exception>
    public double StabilizationBeta
    {
        get;
        init => field = Preconditions.InRange(value, 0, 0.1, nameof(StabilizationBeta));
    } = 0.04;

    /// <summary>Settings for fixed steps of a given size (no error control), for order studies.</summary>
    /// <param name="stepS">Step size, s, &gt; 0.</param>
    /// <exception cref="ArgumentOutOfRangeException">Not finite or not positive.</exception>
    public static DormandPrince45Options FixedStep(double stepS) => new() { FixedStepS = stepS };
}

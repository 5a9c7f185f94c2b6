namespace RotorDrive.Core.Studies.Calibration;

/// <summary>Settings of a calibration fit.</summary>
/// <remarks>Plausible ranges: a field factor above about 1.3 asks for magnets stronger than their remanence allows (the
/// model's Halbach fundamental is already the ideal array's), and one below 0.3 or a conductivity factor outside
/// 0.2..5 is further from the model than end effects and material scatter explain (common practice, no source). A
/// fit outside them is refused with its likely cause rather than used.</remarks>
public sealed record CalibrationOptions
{
    /// <summary>The defaults.</summary>
    public static CalibrationOptions Default { get; } = new();

    /// <summary>Two-sided confidence level of the intervals, in (0.5, 1) (default 0.95).</summary>
    public double ConfidenceLevel { get; init; } = 0.95;

    /// <summary>Plausible conductivity factors (default 0.2..5).</summary>
    public (double Min, double Max) ConductivityFactorRange { get; init; } = (0.2, 5.0);

    /// <summary>Plausible field factors (default 0.3..1.3).</summary>
    public (double Min, double Max) FieldFactorRange { get; init; } = (0.3, 1.3);

    /// <summary>A parameter whose interval half-width exceeds this share of its value is undetermined (default 0.5).</summary>
    public double RelativeHalfWidthLimit { get; init; } = 0.5;

    /// <summary>Two parameters whose correlation exceeds this in magnitude cannot be told apart (default 0.99).</summary>
    public double CorrelationLimit { get; init; } = 0.99;

    /// <summary>Runs-test statistic below which the residuals are systematic and the fit is refused (default -4).</summary>
    public double RunsZLimit { get; init; } = -4.0;

    /// <summary>Levenberg-Marquardt iteration limit per pass (default 200).</summary>
    public int MaxIterations { get; init; } = 200;

    /// <summary>Parameters held at their start values instead of fitted (default none).</summary>
    public IReadOnlySet<CalibrationParameter> Fixed { get; init; } = new HashSet<CalibrationParameter>();
}

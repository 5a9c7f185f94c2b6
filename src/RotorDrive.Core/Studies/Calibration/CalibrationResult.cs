namespace RotorDrive.Core.Studies.Calibration;

/// <summary>The outcome of a calibration: the fitted quantities with their intervals and covariance, the residuals, the
/// fit quality, and either the calibration to use or the reason it was refused.</summary>
/// <param name="Kind">Which kind of bench data was fitted.</param>
/// <param name="RotorId">The rotor design's id.</param>
/// <param name="Estimates">The four quantities, in <see cref="CalibrationParameter"/> order.</param>
/// <param name="Covariance">4 x 4 covariance of the quantities in <see cref="CalibrationParameter"/> order and their SI
/// units (rows and columns of quantities not fitted are zero).</param>
/// <param name="Residuals">Every measured value against the fitted model.</param>
/// <param name="Quality">Fit quality.</param>
/// <param name="Refusal">Why the fit was refused, or <see cref="CalibrationRefusal.None"/>.</param>
/// <param name="RefusalDetail">The refusal in words, naming the likely cause and what to check; null when not refused.</param>
/// <param name="ConfidenceLevelFraction">Two-sided confidence level of the intervals.</param>
public sealed record CalibrationResult(
    CalibrationKind Kind,
    string RotorId,
    IReadOnlyList<CalibrationEstimate> Estimates,
    double[][] Covariance,
    IReadOnlyList<CalibrationResidual> Residuals,
    CalibrationQuality Quality,
    CalibrationRefusal Refusal,
    string? RefusalDetail,
    double ConfidenceLevelFraction)
{
    /// <summary>True when the fit is usable.</summary>
    public bool Accepted => Refusal == CalibrationRefusal.None;

    /// <summary>The estimate of one quantity.</summary>
    public CalibrationEstimate this[CalibrationParameter parameter] => Estimates[(int)parameter];

    /// <summary>The load calibration to apply (fitted bearing terms replace the rotor row's; unfitted ones keep it).</summary>
    public Loads.LoadCalibration ToLoadCalibration()
        => new(
            this[CalibrationParameter.ConductivityFactor].Value,
            this[CalibrationParameter.FieldFactor].Value,
            this[CalibrationParameter.BearingDrag].Fitted ? Math.Max(0, this[CalibrationParameter.BearingDrag].Value) : null,
            this[CalibrationParameter.BearingDamping].Fitted ? Math.Max(0, this[CalibrationParameter.BearingDamping].Value) : null);
}

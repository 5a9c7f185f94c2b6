namespace RotorDrive.Core.Studies.Calibration;

/// <summary>One fitted quantity: its value, standard error and confidence interval, and whether the data determine it.</summary>
/// <remarks>Units: the factors are dimensionless; <see cref="CalibrationParameter.BearingDrag"/> is in N m and
/// <see cref="CalibrationParameter.BearingDamping"/> in N m per rad/s (SI). A quantity not fitted (held at the rotor
/// row's value) has <see cref="Fitted"/> false and NaN standard error and limits.</remarks>
/// <param name="Parameter">Which quantity.</param>
/// <param name="Value">The estimate (or the held value when not fitted).</param>
/// <param name="StandardError">Standard error from the fit's covariance, or NaN when not fitted.</param>
/// <param name="Lower">Lower limit of the confidence interval, or NaN when not fitted.</param>
/// <param name="Upper">Upper limit of the confidence interval, or NaN when not fitted.</param>
/// <param name="Fitted">True when the data were fitted for it; false when held at the rotor row's value.</param>
/// <param name="Undetermined">True when the data cannot determine it (see <see cref="Why"/>).</param>
/// <param name="Why">Why it is undetermined, or null.</param>
public sealed record CalibrationEstimate(
    CalibrationParameter Parameter,
    double Value,
    double StandardError,
    double Lower,
    double Upper,
    bool Fitted,
    bool Undetermined,
    string? Why)
{
    /// <summary>The quantity's key in files and JSON: conductivity_factor, field_factor, bearing_drag_nm,
    /// bearing_damping_nm_per_krpm.</summary>
    public string Key => CalibrationStudy.KeyOf(Parameter);
}

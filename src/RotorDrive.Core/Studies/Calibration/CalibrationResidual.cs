namespace RotorDrive.Core.Studies.Calibration;

/// <summary>One measured value against the fitted model.</summary>
/// <param name="Index">0-based index of the point or sample in the bench data.</param>
/// <param name="Series">"torque" (N m), "lift" (N) or "speed" (rad/s): what was measured.</param>
/// <param name="SpeedRadPerS">Shaft speed of a steady point, or the measured speed of a spin-down sample, rad/s.</param>
/// <param name="GapM">Air gap, m.</param>
/// <param name="TimeS">Time of a spin-down sample, s, or NaN for a steady point.</param>
/// <param name="Measured">The measured value, in the series' unit.</param>
/// <param name="Model">The fitted model's value, in the series' unit.</param>
public sealed record CalibrationResidual(int Index, string Series, double SpeedRadPerS, double GapM, double TimeS, double Measured, double Model)
{
    /// <summary>Measured minus model, in the series' unit.</summary>
    public double Residual => Measured - Model;
}

namespace RotorDrive.Core.Simulation;

/// <summary>One station's findings from a spin-up or stop run.</summary>
/// <param name="Index">Station index (0-based).</param>
/// <param name="FinalSpeedRadPerS">Speed at the end of the run, rad/s.</param>
/// <param name="Motor">The motor's current exposure (continuous = its max continuous current; no burst duration in the
/// catalog).</param>
/// <param name="Controller">The controller's current exposure (continuous and burst current, burst duration).</param>
/// <param name="CurrentLimitA">The controller's current limit in force, A.</param>
/// <param name="DragPeakSpeedRadPerS">Speed of the total load torque peak at the landed gap, rad/s.</param>
/// <param name="DragPeakTorqueNm">Total load torque at that peak, N m.</param>
/// <param name="Stalled">True when the rotor ended below its drag-peak speed with the motor at its current limit.</param>
/// <param name="PassingCurrentA">Motor current whose torque just equals the drag peak: I = Q_peak Kv / phi + I0, A
/// (Drela 2007, inverted; phi at the motor's temperature at the end of the run).</param>
/// <param name="SuggestedCurrentLimitA">Passing current plus the options' margin, A: a current limit that passes the peak.</param>
/// <param name="PeakWindingTempC">Highest winding temperature, C.</param>
/// <param name="PeakPlateTempC">Highest plate patch temperature under this rotor, C.</param>
public sealed record StationSpinup(
    int Index,
    double FinalSpeedRadPerS,
    CurrentExposure Motor,
    CurrentExposure Controller,
    double CurrentLimitA,
    double DragPeakSpeedRadPerS,
    double DragPeakTorqueNm,
    bool Stalled,
    double PassingCurrentA,
    double SuggestedCurrentLimitA,
    double PeakWindingTempC,
    double PeakPlateTempC)
{
    /// <summary>Final speed, rpm.</summary>
    public double FinalSpeedRpm => Units.RadPerSToRpm(FinalSpeedRadPerS);
}

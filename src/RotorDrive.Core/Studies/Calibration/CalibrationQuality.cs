namespace RotorDrive.Core.Studies.Calibration;

/// <summary>How well the fitted model follows the bench data.</summary>
/// <param name="Points">Measured values fitted (torque and lift values count separately).</param>
/// <param name="Parameters">Free parameters (including a spin-down's starting speed).</param>
/// <param name="DegreesOfFreedom">Points minus parameters.</param>
/// <param name="RmsTorqueNm">Root-mean-square torque residual, N m, or NaN when no torque was fitted.</param>
/// <param name="RmsLiftN">Root-mean-square lift residual, N, or NaN when no lift was fitted.</param>
/// <param name="RmsSpeedRadPerS">Root-mean-square speed residual of a spin-down, rad/s, or NaN.</param>
/// <param name="RSquared">Share of the data's variance the model explains (1 - RSS/TSS, weighted), 0..1.</param>
/// <param name="RunsZ">Wald-Wolfowitz runs-test statistic of the residual signs (near 0 for noise; strongly negative
/// for systematic residuals).</param>
/// <param name="Iterations">Levenberg-Marquardt iterations of the final pass.</param>
/// <param name="InitialSpeedRadPerS">Fitted starting speed of a spin-down, rad/s, or NaN.</param>
/// <param name="DragPeakSpeedRadPerS">Speed of the fitted model's drag peak at the data's (median) gap, rad/s, or NaN.</param>
public sealed record CalibrationQuality(
    int Points,
    int Parameters,
    int DegreesOfFreedom,
    double RmsTorqueNm,
    double RmsLiftN,
    double RmsSpeedRadPerS,
    double RSquared,
    double RunsZ,
    int Iterations,
    double InitialSpeedRadPerS,
    double DragPeakSpeedRadPerS);

namespace RotorDrive.Core.Studies.Stress;

/// <summary>Settings of the built-in stress evaluator (<see cref="RigStressModel"/>).</summary>
/// <param name="RampTimeS">Time over which the common duty ramps from 0 to limits.max_duty at the start of the spin-up,
/// s, at least 0; default 1 (common practice, no source).</param>
/// <param name="RelativeTolerance">Relative error tolerance of the spin-up integration per step; default 1e-4.</param>
/// <param name="AbsoluteToleranceRadPerS">Absolute error tolerance on rotor speeds, rad/s; default 1e-3.</param>
/// <param name="MaxStepS">Largest integration step, s; default 0.05 (so peaks and lift-off are resolved).</param>
public sealed record StressModelOptions(
    double RampTimeS = 1.0,
    double RelativeTolerance = 1e-4,
    double AbsoluteToleranceRadPerS = 1e-3,
    double MaxStepS = 0.05)
{
    /// <summary>The defaults.</summary>
    public static StressModelOptions Default { get; } = new();
}

using RotorDrive.Core.Craft;
using RotorDrive.Core.Simulation;

namespace RotorDrive.Core.Studies.Stress;

/// <summary>Settings of the built-in stress evaluation (<see cref="RigStressModel"/>): the spin-up's throttle ramp and
/// integrator settings.</summary>
/// <param name="RampTimeS">Time over which each station's duty ramps from 0 to its trimmed-hover duty at the start of the
/// spin-up, s, at least 0; default 2 (the spin-up command's default ramp).</param>
/// <param name="RelativeTolerance">Relative error tolerance of the spin-up integration per step; default 1e-4 (looser
/// than a single spin-up's 1e-6: lift-off times and peak currents then agree with a 1e-6 run to about 1e-4 relative,
/// far inside any part spread, at a third of the cost).</param>
/// <param name="AbsoluteToleranceRadPerS">Absolute error tolerance of the spin-up integration in its state units (rad/s,
/// mm, C, ...); default 1e-3.</param>
/// <param name="MaxStepS">Largest integration step, s; default 0.05 (below a heave period, so lift-off is resolved).</param>
/// <param name="OutputIntervalS">Grid on which peaks, the minimum voltage and the trace are read, s; default 0.01.</param>
public sealed record StressModelOptions(
    double RampTimeS = 2.0,
    double RelativeTolerance = 1e-4,
    double AbsoluteToleranceRadPerS = 1e-3,
    double MaxStepS = 0.05,
    double OutputIntervalS = 0.01)
{
    /// <summary>The defaults.</summary>
    public static StressModelOptions Default { get; } = new();

    /// <summary>Numerical settings of the trims and the equal-duty yaw state: <see cref="HoverOptions.Default"/> with 16
    /// scan points for a rotor's top equilibrium instead of 48 (the scan from free speed then brackets the equilibrium in
    /// steps of 1/16 of the free speed before Brent refines it; on the demo rig the equal-duty residuals agree with the
    /// 48-point scan to 1e-12 at half the cost; an equilibrium pair closer than a step apart could be missed).</summary>
    public HoverOptions Hover { get; init; } = HoverOptions.Default with { ScanPoints = 16 };

    /// <summary>The spin-up settings these options give: the integrator tolerances above, ending at lift-off
    /// (<see cref="SpinupOptions.StopAtLiftoff"/>), with or without the trace.</summary>
    /// <param name="recordTrace">True to keep the time traces.</param>
    public SpinupOptions Spinup(bool recordTrace) => SpinupOptions.Default with
    {
        RelativeTolerance = RelativeTolerance,
        AbsoluteTolerance = AbsoluteToleranceRadPerS,
        MaxStepS = MaxStepS,
        OutputIntervalS = OutputIntervalS,
        RecordTrace = recordTrace,
        StopAtLiftoff = true,
    };
}

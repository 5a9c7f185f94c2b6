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

    /// <summary>Numerical settings of the trims (the sample's hover, the yaw checks); <see cref="HoverOptions.Default"/>.</summary>
    public HoverOptions Hover { get; init; } = HoverOptions.Default;

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

using RotorDrive.Core.Numerics;

namespace RotorDrive.Core.Simulation;

/// <summary>Numerical and reporting settings of a spin-up or stop run; every default is documented.</summary>
/// <param name="RelativeTolerance">Integrator relative tolerance per step; default 1e-6 (results then agree with a
/// 1e-9 run to about 1e-5 relative).</param>
/// <param name="AbsoluteTolerance">Integrator absolute tolerance per step, in state units (rad/s, mm, mm/s, C, K, rad,
/// J); default 1e-6.</param>
/// <param name="MaxStepS">Largest step, s; default 0.05 (well below a heave period, so no touch-down and lift-off pass within one step).</param>
/// <param name="OutputIntervalS">Time between trace samples, s; default 0.01. Peaks, minimum voltage and the times above
/// continuous ratings are read on this grid (interpolated with the integrator's continuous extension), so they do
/// not depend on the step sizes the error control chose.</param>
/// <param name="HoldBandwidthRadPerS">Speed-hold loop bandwidth, rad/s; default 20. The controller commands
/// I = I0 + (Kv/phi) (Q_load(omega) + J d(omega_ref)/dt + J b (omega_ref - omega)), which makes the speed error decay
/// as e^(-b t) until the current limit is reached (a proportional speed loop with load feed-forward).</param>
/// <param name="SpeedSettleFraction">Steady hover: every speed within this fraction of its final value; default 0.01.</param>
/// <param name="GapSettleM">Steady hover: gap within this distance of its final value, m; default 0.25e-3.</param>
/// <param name="SettleWindowS">Steady hover must last at least this long before the run ends, s; default 0.5.</param>
/// <param name="StallCurrentMargin">Margin on the current that just balances the drag peak, for the suggested current
/// limit; default 0.1 (10 %, so the excess torque accelerates the rotor through the peak; common practice, no source).</param>
/// <param name="RecordTrace">True (default) returns the time traces; false keeps only the findings (Monte Carlo).</param>
/// <param name="StopAtLiftoff">True ends the run at lift-off (status <see cref="OdeStatus.EventHit"/>, end time = lift-off
/// time): the spin-up a stress study needs before the trim takes over; default false.</param>
public sealed record SpinupOptions(
    double RelativeTolerance = 1e-6,
    double AbsoluteTolerance = 1e-6,
    double MaxStepS = 0.05,
    double OutputIntervalS = 0.01,
    double HoldBandwidthRadPerS = 20,
    double SpeedSettleFraction = 0.01,
    double GapSettleM = 0.25e-3,
    double SettleWindowS = 0.5,
    double StallCurrentMargin = 0.1,
    bool RecordTrace = true,
    bool StopAtLiftoff = false)
{
    /// <summary>The defaults.</summary>
    public static SpinupOptions Default { get; } = new();
}

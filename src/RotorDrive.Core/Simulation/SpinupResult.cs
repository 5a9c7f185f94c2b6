using RotorDrive.Core.Numerics;

namespace RotorDrive.Core.Simulation;

/// <summary>The findings of a spin-up or stop run.</summary>
/// <param name="Status">How the integration ended (<see cref="OdeStatus.Completed"/> when the whole duration ran).</param>
/// <param name="EndTimeS">Time reached, s.</param>
/// <param name="LiftoffTimeS">First time total lift exceeded the weight on the gear, s; null when it never did.</param>
/// <param name="HoverTimeS">Time from which every speed and the gap stayed settled (see <see cref="SpinupOptions"/>)
/// to the end, airborne; null when the run did not settle in hover.</param>
/// <param name="TouchdownTimeS">First touch-down after being airborne, s; null when none.</param>
/// <param name="TouchdownSpeedMPerS">Sink speed at that touch-down, m/s; null when none.</param>
/// <param name="Stations">Per-station findings.</param>
/// <param name="Pack">The pack's current exposure (continuous and burst current from its C-ratings).</param>
/// <param name="MinBusVoltageV">Lowest bus voltage, V.</param>
/// <param name="MaxBusVoltageV">Highest bus voltage, V (rises while regenerating).</param>
/// <param name="CutoffVoltageV">Pack cutoff: cells in series x the rig's cell cutoff voltage, V.</param>
/// <param name="PeakRegenCurrentA">Largest current pushed back into the pack, A (0 when none).</param>
/// <param name="PeakYawTorqueNm">Largest reaction yaw torque magnitude on the frame, N m.</param>
/// <param name="PeakYawRateRadPerS">Largest yaw rate magnitude, rad/s.</param>
/// <param name="FinalYawAngleRad">Accumulated yaw angle at the end, rad.</param>
/// <param name="FinalSocFraction">State of charge at the end, 0..1.</param>
/// <param name="BusCollapsed">True when the bus had no stable solution at some sample (pack cannot feed the load).</param>
/// <param name="Energy">The energy ledger.</param>
/// <param name="Trace">Time traces, or null when not recorded.</param>
/// <param name="StepsAccepted">Integrator steps accepted.</param>
/// <param name="Evaluations">Right-hand-side evaluations.</param>
public sealed record SpinupResult(
    OdeStatus Status,
    double EndTimeS,
    double? LiftoffTimeS,
    double? HoverTimeS,
    double? TouchdownTimeS,
    double? TouchdownSpeedMPerS,
    IReadOnlyList<StationSpinup> Stations,
    CurrentExposure Pack,
    double MinBusVoltageV,
    double MaxBusVoltageV,
    double CutoffVoltageV,
    double PeakRegenCurrentA,
    double PeakYawTorqueNm,
    double PeakYawRateRadPerS,
    double FinalYawAngleRad,
    double FinalSocFraction,
    bool BusCollapsed,
    EnergyLedger Energy,
    SpinupTrace? Trace,
    int StepsAccepted,
    int Evaluations)
{
    /// <summary>Indices of stalled stations (empty when none).</summary>
    public IReadOnlyList<int> StalledStations => Stations.Where(s => s.Stalled).Select(s => s.Index).ToArray();

    /// <summary>The largest motor current of any station during the run, A.</summary>
    public double PeakMotorCurrentA => Stations.Max(s => s.Motor.PeakA);

    /// <summary>The highest final speed of any station, rpm.</summary>
    public double MaxFinalSpeedRpm => Stations.Max(s => s.FinalSpeedRpm);

    /// <summary>True when the pack sagged below its cutoff voltage.</summary>
    public bool BelowCutoff => MinBusVoltageV < CutoffVoltageV;
}

using RotorDrive.Core.Drive;

namespace RotorDrive.Core.Craft;

/// <summary>A whole-craft hover state: per-station duties, speeds, loads and margins, and the rig's totals.</summary>
/// <param name="Mode">Trimmed (fixed gap) or common duty (gap solved).</param>
/// <param name="Status">How the solve ended.</param>
/// <param name="GapM">Rig gap, m.</param>
/// <param name="MassKg">Craft mass, kg.</param>
/// <param name="WeightN">Weight, N.</param>
/// <param name="Stations">Per station, in rig order (empty when no balance was found).</param>
/// <param name="BusVoltageV">Pack terminal voltage, V.</param>
/// <param name="PackCurrentA">Pack current, A.</param>
/// <param name="PlatePowerW">Eddy power into the plate, all rotors, W.</param>
/// <param name="HeaveStiffnessNPerM">-d(total lift)/d gap at the stations' speeds, N/m.</param>
/// <param name="ForceResidualRatio">(total lift - weight) / weight.</param>
/// <param name="PitchResidualRatio">Moment about the y axis through the centre of gravity / (weight x largest arm).</param>
/// <param name="RollResidualRatio">Moment about the x axis through the centre of gravity / (weight x largest arm).</param>
/// <param name="YawTorqueNm">Net yaw torque of the rotor reactions on the frame, N m.</param>
/// <param name="PackMargins">Margins to the pack's current and cut-off limits.</param>
/// <param name="Findings">Failing limits, unstable stations, or why there is no balance.</param>
/// <param name="Iterations">Newton (trim) or Brent (gap) iterations.</param>
public sealed record HoverResult(
    HoverMode Mode,
    HoverStatus Status,
    double GapM,
    double MassKg,
    double WeightN,
    IReadOnlyList<HoverStation> Stations,
    double BusVoltageV,
    double PackCurrentA,
    double PlatePowerW,
    double HeaveStiffnessNPerM,
    double ForceResidualRatio,
    double PitchResidualRatio,
    double RollResidualRatio,
    double YawTorqueNm,
    IReadOnlyList<LimitMargin> PackMargins,
    IReadOnlyList<HoverFinding> Findings,
    int Iterations)
{
    /// <summary>Whether the state balances the craft (any status but <see cref="HoverStatus.NoBalance"/>, <see cref="HoverStatus.BeyondDrivetrain"/> and
    /// <see cref="HoverStatus.TooFewStations"/>).</summary>
    public bool Balanced => Status is HoverStatus.Hovering or HoverStatus.LimitExceeded;

    /// <summary>Electrical power from the pack, W.</summary>
    public double ElectricalPowerW => BusVoltageV * PackCurrentA;

    /// <summary>Lift-specific power of the rig, W per N of weight carried (the designer's figure of merit).</summary>
    public double LiftSpecificPowerWPerN => WeightN > 0 ? ElectricalPowerW / WeightN : double.PositiveInfinity;

    /// <summary>Heave natural frequency sqrt(k/m) / 2 pi, Hz (undamped; 0 when the stiffness is not positive).</summary>
    public double HeaveFrequencyHz => HeaveStiffnessNPerM > 0 ? Math.Sqrt(HeaveStiffnessNPerM / MassKg) / (2 * Math.PI) : 0.0;
}

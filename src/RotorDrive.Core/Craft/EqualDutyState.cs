namespace RotorDrive.Core.Craft;

/// <summary>Where every rotor settles when each station holds a fixed duty at a gap, all on the shared bus.</summary>
/// <param name="Converged">Whether a bus voltage consistent with the stations' currents was found.</param>
/// <param name="SpeedsRadPerS">Each station's highest stable equilibrium speed, rad/s (0 when it stalls at rest).</param>
/// <param name="LiftsN">Each station's lift, N.</param>
/// <param name="ReactionTorquesNm">Each station's yaw reaction on the frame (shaft torque x spin sign), N m.</param>
/// <param name="BusVoltageV">Pack terminal voltage, V.</param>
/// <param name="PackCurrentA">Pack current, A.</param>
public sealed record EqualDutyState(
    bool Converged,
    IReadOnlyList<double> SpeedsRadPerS,
    IReadOnlyList<double> LiftsN,
    IReadOnlyList<double> ReactionTorquesNm,
    double BusVoltageV,
    double PackCurrentA)
{
    /// <summary>Total lift, N.</summary>
    public double TotalLiftN => LiftsN.Sum();

    /// <summary>Net yaw torque of the rotor reactions, N m.</summary>
    public double YawTorqueNm => ReactionTorquesNm.Sum();
}

namespace RotorDrive.Core.Loads;

/// <summary>The load a rotor puts on its shaft at one speed, gap and plate temperature.</summary>
/// <remarks>Torques carry the sign of the speed (they oppose rotation); lift is the same for either direction.</remarks>
/// <param name="LiftN">Eddy-current lift on the rotor, N.</param>
/// <param name="EddyTorqueNm">Eddy-current drag torque, N m.</param>
/// <param name="WindageTorqueNm">Aerodynamic drag torque of the spinning disc, N m.</param>
/// <param name="BearingTorqueNm">Bearing drag torque, N m.</param>
/// <param name="EddyPowerW">Power dissipated in the plate by eddy currents, W (= eddy torque x speed).</param>
public readonly record struct LoadPoint(
    double LiftN,
    double EddyTorqueNm,
    double WindageTorqueNm,
    double BearingTorqueNm,
    double EddyPowerW)
{
    /// <summary>Total torque the motor must supply at steady speed, N m.</summary>
    public double TotalTorqueNm => EddyTorqueNm + WindageTorqueNm + BearingTorqueNm;
}

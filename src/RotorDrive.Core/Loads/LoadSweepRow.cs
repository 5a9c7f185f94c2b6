namespace RotorDrive.Core.Loads;

/// <summary>One speed of a load sweep: lift, the parts of the shaft torque and the plate loss.</summary>
/// <param name="SpeedRadPerS">Shaft speed, rad/s.</param>
/// <param name="LiftN">Eddy lift, N.</param>
/// <param name="EddyTorqueNm">Eddy drag torque, N m.</param>
/// <param name="WindageTorqueNm">Windage torque, N m.</param>
/// <param name="BearingTorqueNm">Bearing drag torque, N m.</param>
/// <param name="TotalTorqueNm">Total shaft torque at steady speed, N m.</param>
/// <param name="EddyPowerW">Power dissipated in the plate, W.</param>
public sealed record LoadSweepRow(
    double SpeedRadPerS,
    double LiftN,
    double EddyTorqueNm,
    double WindageTorqueNm,
    double BearingTorqueNm,
    double TotalTorqueNm,
    double EddyPowerW)
{
    /// <summary>Shaft speed, rpm.</summary>
    public double SpeedRpm => Units.RadPerSToRpm(SpeedRadPerS);
}

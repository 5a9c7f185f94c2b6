using RotorDrive.Core.Drive;

namespace RotorDrive.Core.Craft;

/// <summary>The limits a team sets for its rig; analyses report margins to each.</summary>
/// <param name="YawTorqueNm">Largest residual yaw torque tolerated with equal throttles, N m.</param>
/// <param name="PlateTempC">Largest plate temperature, C.</param>
/// <param name="CellCutoffV">Loaded cell voltage at which the pack is considered empty, V.</param>
/// <param name="UsableCapacityFraction">Fraction of the pack capacity the team allows itself to use, 0..1.</param>
/// <param name="MaxDuty">Largest controller duty a trim may use, leaving headroom for control, 0..1.</param>
/// <param name="LiftoffTimeS">Longest acceptable time from start to lift-off, s.</param>
public sealed record RigLimits(
    double YawTorqueNm,
    double PlateTempC,
    double CellCutoffV,
    double UsableCapacityFraction,
    double MaxDuty,
    double LiftoffTimeS)
{
    /// <summary>The limits one station's steady operation is checked against (cell cutoff and duty headroom).</summary>
    public StationLimits Station => new(CellCutoffV, MaxDuty);
}

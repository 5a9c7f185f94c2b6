using RotorDrive.Core.Drive;

namespace RotorDrive.Files.Catalogs;

/// <summary>One row of controllers.csv, in the file's units.</summary>
public sealed record ControllerRow(
    string Id,
    double ContinuousCurrentA,
    double BurstCurrentA,
    double BurstDurationS,
    int MinCells,
    int MaxCells,
    double OnResistanceMohm,
    double IdleCurrentA,
    double MaxErpm,
    double MassG,
    bool Reversible)
{
    /// <summary>The controller in SI units (mOhm to ohm, g to kg).</summary>
    public SpeedController ToController() => new(
        Id,
        ContinuousCurrentA,
        BurstCurrentA,
        BurstDurationS,
        MinCells,
        MaxCells,
        OnResistanceMohm / 1000.0,
        IdleCurrentA,
        MaxErpm,
        MassG / 1000.0,
        Reversible);
}

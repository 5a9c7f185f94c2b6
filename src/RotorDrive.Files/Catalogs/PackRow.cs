using RotorDrive.Core.Drive;

namespace RotorDrive.Files.Catalogs;

/// <summary>One row of packs.csv, in the file's units.</summary>
public sealed record PackRow(
    string Id,
    string Chemistry,
    int CellsSeries,
    int CellsParallel,
    double CellCapacityMah,
    double ContinuousC,
    double BurstC,
    double CellResistanceMohm,
    double MassG)
{
    /// <summary>The pack in SI units (mAh to A h, mOhm to ohm, g to kg).</summary>
    public BatteryPack ToPack() => new(
        Id,
        Chemistry,
        CellsSeries,
        CellsParallel,
        CellCapacityMah / 1000.0,
        ContinuousC,
        BurstC,
        CellResistanceMohm / 1000.0,
        MassG / 1000.0);
}

namespace RotorDrive.Core.Drive;

/// <summary>A battery pack of identical cells in series and parallel, in SI units.</summary>
/// <param name="Id">Catalog id.</param>
/// <param name="Chemistry">Chemistry name; selects the open-circuit voltage curve.</param>
/// <param name="CellsSeries">Cells in series S.</param>
/// <param name="CellsParallel">Cells in parallel P.</param>
/// <param name="CellCapacityAh">Capacity of one cell, A h.</param>
/// <param name="ContinuousC">Continuous discharge rating, C (current = C x pack capacity in A h).</param>
/// <param name="BurstC">Burst discharge rating, C.</param>
/// <param name="CellResistanceOhm">Internal resistance of one cell, ohm.</param>
/// <param name="MassKg">Pack mass, kg.</param>
public sealed record BatteryPack(
    string Id,
    string Chemistry,
    int CellsSeries,
    int CellsParallel,
    double CellCapacityAh,
    double ContinuousC,
    double BurstC,
    double CellResistanceOhm,
    double MassKg)
{
    /// <summary>Pack capacity, A h (P x cell capacity).</summary>
    public double CapacityAh => CellsParallel * CellCapacityAh;

    /// <summary>Pack internal resistance, ohm (S x R_cell / P).</summary>
    public double ResistanceOhm => CellsSeries * CellResistanceOhm / CellsParallel;

    /// <summary>Continuous current rating, A: the C-rate times the capacity in A h.</summary>
    public double ContinuousCurrentA => ContinuousC * CapacityAh;

    /// <summary>Burst current rating, A.</summary>
    public double BurstCurrentA => BurstC * CapacityAh;

    /// <summary>C-rate of a discharge current: current divided by the capacity in A h, 1/h.</summary>
    /// <remarks>Definition of the C-rate: currents as multiples of the reference current It = rated capacity / 1 h, so
    /// 1 C discharges the rated capacity in one hour (IEC 61434, guide to designation of current in secondary cell
    /// standards).</remarks>
    /// <param name="currentA">Discharge current, A (negative while charging).</param>
    public double CRate(double currentA) => currentA / CapacityAh;
}

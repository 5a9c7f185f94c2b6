namespace RotorDrive.Core.Drive;

/// <summary>The packs that feed the rig's single bus: Count identical packs in parallel.</summary>
/// <param name="Pack">The pack type.</param>
/// <param name="Count">Number of identical packs connected in parallel.</param>
/// <param name="Curve">Open-circuit voltage curve for the pack's chemistry.</param>
public sealed record PackBank(BatteryPack Pack, int Count, CellCurve Curve)
{
    /// <summary>Series cell count of the bus.</summary>
    public int CellsSeries => Pack.CellsSeries;

    /// <summary>Bank capacity, A h.</summary>
    public double CapacityAh => Count * Pack.CapacityAh;

    /// <summary>Bank internal resistance, ohm.</summary>
    public double ResistanceOhm => Pack.ResistanceOhm / Count;

    /// <summary>Bank continuous current rating, A.</summary>
    public double ContinuousCurrentA => Count * Pack.ContinuousCurrentA;

    /// <summary>Bank burst current rating, A.</summary>
    public double BurstCurrentA => Count * Pack.BurstCurrentA;

    /// <summary>Bank mass, kg.</summary>
    public double MassKg => Count * Pack.MassKg;

    /// <summary>Open-circuit bus voltage at a state of charge (0..1), V.</summary>
    public double OpenCircuitVoltageAt(double socFraction) => CellsSeries * Curve.OcvAt(socFraction);
}

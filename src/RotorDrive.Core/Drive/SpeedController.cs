namespace RotorDrive.Core.Drive;

/// <summary>A brushless speed controller (ESC), described by averaged-switch ratings, in SI units.</summary>
/// <param name="Id">Catalog id.</param>
/// <param name="ContinuousCurrentA">Continuous phase current rating, A.</param>
/// <param name="BurstCurrentA">Burst phase current rating, A (also the hardware current limit).</param>
/// <param name="BurstDurationS">How long the burst current may last, s.</param>
/// <param name="MinCells">Smallest supported series cell count.</param>
/// <param name="MaxCells">Largest supported series cell count.</param>
/// <param name="OnResistanceOhm">Effective on-resistance in the motor current path, ohm.</param>
/// <param name="IdleCurrentA">The controller's own supply current, A.</param>
/// <param name="MaxErpm">Largest electrical rpm it can commutate.</param>
/// <param name="MassKg">Mass, kg.</param>
/// <param name="Reversible">True when it can run either spin direction.</param>
public sealed record SpeedController(
    string Id,
    double ContinuousCurrentA,
    double BurstCurrentA,
    double BurstDurationS,
    int MinCells,
    int MaxCells,
    double OnResistanceOhm,
    double IdleCurrentA,
    double MaxErpm,
    double MassKg,
    bool Reversible)
{
    /// <summary>True when a pack of this many series cells is within the controller's rated range.</summary>
    /// <param name="cellsSeries">Series cell count of the pack.</param>
    public bool AcceptsCells(int cellsSeries) => cellsSeries >= MinCells && cellsSeries <= MaxCells;

    /// <summary>Largest shaft speed the controller can commutate for a motor with the given pole pairs, rad/s.</summary>
    /// <remarks>Electrical rpm = mechanical rpm x motor pole pairs, so the shaft limit is MaxErpm / pole pairs.</remarks>
    /// <param name="motorPolePairs">Motor pole pairs, at least 1.</param>
    /// <exception cref="ArgumentOutOfRangeException">Fewer than one pole pair.</exception>
    public double MaxShaftSpeedRadPerS(int motorPolePairs)
        => Units.RpmToRadPerS(MaxErpm / Preconditions.AtLeast(motorPolePairs, 1, nameof(motorPolePairs)));
}

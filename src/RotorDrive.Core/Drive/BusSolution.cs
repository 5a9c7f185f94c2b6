namespace RotorDrive.Core.Drive;

/// <summary>The result of one bus solve: bus voltage, pack current, how it ended and how much work it took.</summary>
/// <remarks>Per-station results are written to the caller's span. Kirchhoff: BusVoltageV = OpenCircuitVoltageV -
/// PackCurrentA x R_bank, and PackCurrentA = sum of the stations' bus currents.</remarks>
/// <param name="Status">How the solve ended; with <see cref="BusStatus.NoSolution"/> the other values are 0.</param>
/// <param name="BusVoltageV">Bus (pack terminal) voltage, V.</param>
/// <param name="PackCurrentA">Current delivered by the pack, A (negative while regenerating).</param>
/// <param name="OpenCircuitVoltageV">Pack open-circuit voltage used, V.</param>
/// <param name="Iterations">Active-set passes made (each a closed-form quadratic solve).</param>
/// <param name="Scanned">True when the fast active-set passes did not settle and the exhaustive interval scan decided.</param>
public readonly record struct BusSolution(
    BusStatus Status,
    double BusVoltageV,
    double PackCurrentA,
    double OpenCircuitVoltageV,
    int Iterations,
    bool Scanned)
{
    /// <summary>Power delivered by the pack at its terminals, W.</summary>
    public double PackPowerW => BusVoltageV * PackCurrentA;
}

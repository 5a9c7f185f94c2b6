namespace RotorDrive.Core.Loads;

/// <summary>A rotor's load over a list of speeds at one gap and temperature, with its drag peak.</summary>
/// <param name="RotorId">The rotor design's id.</param>
/// <param name="GapM">Air gap, m.</param>
/// <param name="PlateTempC">Plate temperature, C.</param>
/// <param name="MagnetTempC">Magnet temperature, C.</param>
/// <param name="EndEffectCorrection">Whether the Russell-Norsworthy finite-width correction was applied.</param>
/// <param name="Rows">One row per speed, in the order asked for.</param>
/// <param name="DragPeak">The speed and value of the largest eddy torque.</param>
public sealed record LoadSweepResult(
    string RotorId,
    double GapM,
    double PlateTempC,
    double MagnetTempC,
    bool EndEffectCorrection,
    IReadOnlyList<LoadSweepRow> Rows,
    DragPeak DragPeak);

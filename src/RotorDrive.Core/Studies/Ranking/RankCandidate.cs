namespace RotorDrive.Core.Studies.Ranking;

/// <summary>One drivetrain choice for the whole rig: the same motor and controller at every station, and a number of
/// identical packs in parallel on the bus.</summary>
/// <param name="MotorIndex">Index into the catalog's motors.</param>
/// <param name="ControllerIndex">Index into the catalog's controllers.</param>
/// <param name="PackIndex">Index into the catalog's packs.</param>
/// <param name="PackCount">Identical packs in parallel, at least 1.</param>
public readonly record struct RankCandidate(int MotorIndex, int ControllerIndex, int PackIndex, int PackCount);

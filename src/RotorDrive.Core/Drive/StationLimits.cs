namespace RotorDrive.Core.Drive;

/// <summary>The team's limits that one rotor's steady operation is checked against.</summary>
/// <param name="CellCutoffV">Loaded cell voltage at which the pack is considered empty, V.</param>
/// <param name="MaxDuty">Largest controller duty allowed, leaving headroom for control, 0..1.</param>
public sealed record StationLimits(double CellCutoffV, double MaxDuty);

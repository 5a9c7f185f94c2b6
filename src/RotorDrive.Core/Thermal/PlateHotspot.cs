namespace RotorDrive.Core.Thermal;

/// <summary>The hottest point of a plate temperature field.</summary>
/// <param name="XM">Position x on the plate, m (rig file coordinates: the craft's origin starts at 0).</param>
/// <param name="YM">Position y on the plate, m.</param>
/// <param name="TemperatureC">Temperature there, C.</param>
public sealed record PlateHotspot(double XM, double YM, double TemperatureC);

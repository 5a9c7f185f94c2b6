namespace RotorDrive.Core.Magnetics;

/// <summary>The plate a rig hovers over: a material and a thickness; assumed wide compared with the rotors.</summary>
/// <param name="Material">The plate material.</param>
/// <param name="ThicknessM">Plate thickness d, m.</param>
public sealed record Plate(PlateMaterial Material, double ThicknessM);

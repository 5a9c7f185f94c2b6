namespace RotorDrive.Tui.Text;

/// <summary>One station as the layout sketch draws it.</summary>
/// <param name="Index">The station's index in the rig file (shown 1-based).</param>
/// <param name="XMm">Axis position forward, mm.</param>
/// <param name="YMm">Axis position left, mm.</param>
/// <param name="Clockwise">True for clockwise seen from above; false for counter-clockwise; null when unknown.</param>
/// <param name="RadiusMm">Outer magnet radius, mm, or null when the rotor is not known.</param>
public sealed record SketchStation(int Index, double XMm, double YMm, bool? Clockwise, double? RadiusMm);

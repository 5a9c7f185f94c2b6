namespace RotorDrive.Core.Magnetics;

/// <summary>The plate a rig hovers over: a material and a thickness, optionally laid on steel; assumed wide compared with
/// the rotors.</summary>
/// <param name="Material">The plate material.</param>
/// <param name="ThicknessM">Plate thickness d, m.</param>
public sealed record Plate(PlateMaterial Material, double ThicknessM)
{
    /// <summary>Thickness of a steel layer directly under the conducting plate, m (0, the default, for none). The steel is
    /// treated as infinitely permeable and non-conducting (tangential H = 0 at the plate's bottom face), so only its presence
    /// matters, not its thickness. With steel under it the plate attracts the magnets at standstill and low speed.</summary>
    public double BackIronM { get; init; }

    /// <summary>Whether the plate lies on steel.</summary>
    public bool HasBackIron => BackIronM > 0;
}

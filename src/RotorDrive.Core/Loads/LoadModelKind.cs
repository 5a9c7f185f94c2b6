namespace RotorDrive.Core.Loads;

/// <summary>Which eddy-current load model a rotor load uses.</summary>
public enum LoadModelKind
{
    /// <summary>The three-dimensional ring model: the array's harmonics as cylindrical harmonics over a wide plate, each the
    /// layer problem (Magnetics.AnnularSpectrum; ../DESIGN.md §4.7; the default).</summary>
    ThreeDimensional,

    /// <summary>The first-generation two-dimensional strip model with the Russell-Norsworthy width factor (../DESIGN.md §4.3).</summary>
    TwoDimensional,
}

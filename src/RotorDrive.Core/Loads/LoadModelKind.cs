namespace RotorDrive.Core.Loads;

/// <summary>Which eddy-current load model a rotor load uses.</summary>
public enum LoadModelKind
{
    /// <summary>The three-dimensional model: radial strips, each a finite-width band solved by a double Fourier series, with
    /// the array's harmonics (../DESIGN.md §4.7; the default).</summary>
    ThreeDimensional,

    /// <summary>The first-generation two-dimensional strip model with the Russell-Norsworthy width factor (../DESIGN.md §4.3).</summary>
    TwoDimensional,
}

namespace RotorDrive.Core.Simulation;

/// <summary>How an endurance run modelled the plate: the sheet's properties and the grid of its temperature field.</summary>
/// <param name="ConductivityWPerMK">Thermal conductivity used, W/(m K).</param>
/// <param name="ConductivityEstimated">True when it came from the Wiedemann-Franz law, false when from the catalog.</param>
/// <param name="LossWPerM2K">Face loss coefficient, both faces with linearised radiation, W/(m^2 K).</param>
/// <param name="DiffusivityM2PerS">Thermal diffusivity, m^2/s.</param>
/// <param name="GridCount">Grid points per side.</param>
/// <param name="GridSpacingM">Grid spacing, m.</param>
/// <param name="DomainM">Side of the (periodic) domain, m.</param>
/// <param name="HorizonS">Run time the domain was sized for, s: its margin holds several diffusion lengths for it.</param>
public sealed record PlateFieldSetup(
    double ConductivityWPerMK,
    bool ConductivityEstimated,
    double LossWPerM2K,
    double DiffusivityM2PerS,
    int GridCount,
    double GridSpacingM,
    double DomainM,
    double HorizonS);

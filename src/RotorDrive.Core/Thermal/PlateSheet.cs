namespace RotorDrive.Core.Thermal;

/// <summary>A plate as a thermal sheet: thickness, conductivity, heat capacity and the loss coefficient of its
/// faces.</summary>
/// <remarks>The sheet equation rho c d dT/dt = k d lap(T) + q - H (T - T_a) (the fin or thin-plate equation:
/// H. S. Carslaw &amp; J. C. Jaeger, "Conduction of Heat in Solids", 2nd ed., 1959, the thin plate losing heat from its
/// faces, ch. 10 (chapter from memory), written per unit area). It holds when the through-thickness diffusion time d^2/alpha is short against
/// the times of interest and the Biot number H d / k is small (both true for metal floor plates of millimetres: 1.6 s
/// and 1e-3 for 12 mm aluminium); it does not resolve the first second of a heat pulse or a plate of poor
/// conductor.</remarks>
/// <param name="ThicknessM">Thickness d, m, &gt; 0.</param>
/// <param name="ConductivityWPerMK">Thermal conductivity k, W/(m K), &gt; 0.</param>
/// <param name="DensityKgM3">Density rho, kg/m^3, &gt; 0.</param>
/// <param name="SpecificHeatJPerKgK">Specific heat c, J/(kg K), &gt; 0.</param>
/// <param name="LossWPerM2K">Face loss coefficient H (both faces together), W/(m^2 K), &gt;= 0.</param>
public sealed record PlateSheet(double ThicknessM, double ConductivityWPerMK, double DensityKgM3, double SpecificHeatJPerKgK, double LossWPerM2K)
{
    /// <summary>Heat capacity per area rho c d, J/(m^2 K).</summary>
    public double HeatCapacityJPerM2K => DensityKgM3 * SpecificHeatJPerKgK * ThicknessM;

    /// <summary>Thermal diffusivity alpha = k / (rho c), m^2/s.</summary>
    public double DiffusivityM2PerS => ConductivityWPerMK / (DensityKgM3 * SpecificHeatJPerKgK);

    /// <summary>Decay rate of a uniform excess by face loss, H / (rho c d), 1/s.</summary>
    public double LossRatePerS => LossWPerM2K / HeatCapacityJPerM2K;

    /// <summary>Loss length sqrt(k d / H), m (infinite without loss): the distance over which the steady field of a
    /// source decays, as K0(r / length) (Carslaw &amp; Jaeger 1959).</summary>
    public double LossLengthM => LossWPerM2K > 0 ? Math.Sqrt(ConductivityWPerMK * ThicknessM / LossWPerM2K) : double.PositiveInfinity;

    /// <summary>Through-thickness diffusion time d^2 / alpha, s: the 2-D sheet model holds for times well above it.</summary>
    public double ThroughThicknessTimeS => ThicknessM * ThicknessM / DiffusivityM2PerS;
}

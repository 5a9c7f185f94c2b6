namespace RotorDrive.Core.Magnetics;

/// <summary>A non-magnetic conducting plate material, in SI units.</summary>
/// <param name="Id">Catalog id.</param>
/// <param name="ConductivitySPerM">Electrical conductivity at 20 C, S/m.</param>
/// <param name="TempCoeffPerK">Temperature coefficient of resistivity at 20 C, 1/K (annealed copper 0.00393, IEC 60028).</param>
/// <param name="DensityKgM3">Density, kg/m^3.</param>
/// <param name="SpecificHeatJPerKgK">Specific heat, J/(kg K).</param>
public sealed record PlateMaterial(
    string Id,
    double ConductivitySPerM,
    double TempCoeffPerK,
    double DensityKgM3,
    double SpecificHeatJPerKgK)
{
    /// <summary>The Lorenz number L0 = (pi^2 / 3) (k_B / e)^2 = 2.44e-8 W ohm / K^2 (Sommerfeld value of the
    /// Wiedemann-Franz law: C. Kittel, "Introduction to Solid State Physics", 8th ed., 2005, ch. 6, eq. 6.58).</summary>
    public const double LorenzNumberWOhmPerK2 = 2.44e-8;

    /// <summary>Thermal conductivity from the catalog, W/(m K), or null to estimate it from the electrical conductivity
    /// (<see cref="ThermalConductivityAt"/>).</summary>
    public double? ThermalConductivityWPerMK { get; init; }

    /// <summary>Thermal conductivity at a temperature, W/(m K): the catalog value when given, else the Wiedemann-Franz law
    /// k = L0 sigma(T) T with T in kelvin (Kittel 2005, ch. 6; about 5 to 8 % above handbook values for pure copper and
    /// aluminium at room temperature, less for alloys, because the lattice and impurity terms differ).</summary>
    /// <param name="tempC">Temperature, C.</param>
    public double ThermalConductivityAt(double tempC)
        => ThermalConductivityWPerMK ?? LorenzNumberWOhmPerK2 * ConductivityAt(tempC) * (tempC + 273.15);

    /// <summary>Conductivity at a temperature: sigma(T) = sigma20 / (1 + alpha (T - 20)) (IEC 60028 form for copper).</summary>
    public double ConductivityAt(double tempC) => ConductivitySPerM / (1 + TempCoeffPerK * (tempC - 20.0));
}

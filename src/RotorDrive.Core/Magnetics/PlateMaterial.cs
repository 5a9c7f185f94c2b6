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
    /// <summary>Conductivity at a temperature: sigma(T) = sigma20 / (1 + alpha (T - 20)) (IEC 60028 form for copper).</summary>
    public double ConductivityAt(double tempC) => ConductivitySPerM / (1 + TempCoeffPerK * (tempC - 20.0));
}

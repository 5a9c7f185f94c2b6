using RotorDrive.Core.Magnetics;

namespace RotorDrive.Files.Catalogs;

/// <summary>One row of plates.csv (plate materials), in the file's units.</summary>
public sealed record PlateRow(
    string Id,
    double ConductivityMsPerM,
    double TempCoeffPerK,
    double DensityKgM3,
    double SpecificHeatJPerKgK)
{
    /// <summary>Thermal conductivity, W/(m K), or null (optional column; the Wiedemann-Franz estimate is used).</summary>
    public double? ThermalConductivityWPerMK { get; init; }

    /// <summary>The material in SI units (MS/m to S/m).</summary>
    public PlateMaterial ToMaterial() => new(Id, ConductivityMsPerM * 1e6, TempCoeffPerK, DensityKgM3, SpecificHeatJPerKgK)
    {
        ThermalConductivityWPerMK = ThermalConductivityWPerMK,
    };
}

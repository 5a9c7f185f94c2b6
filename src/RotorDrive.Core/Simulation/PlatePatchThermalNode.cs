using RotorDrive.Core.Magnetics;

namespace RotorDrive.Core.Simulation;

/// <summary>One-node lumped thermal model of the plate patch under a rotor: the plate material under the magnet annulus
/// heated by the eddy-current power and cooled by convection from its faces.</summary>
/// <remarks>
/// <para>m c dT/dt = P - h A (T - T_ambient) (lumped capacitance method: F. P. Incropera et al., "Fundamentals of Heat
/// and Mass Transfer", section 5.2; Newton's law of cooling). m = density x patch area x thickness; A = patch area x
/// cooled faces.</para>
/// <para>Modelling choices: the patch is the annulus swept by the magnets, pi (ro^2 - ri^2), multiplied by a spreading
/// factor (&gt;= 1) that crudely stands for heat conducted sideways into the surrounding plate; 1 keeps only the
/// annulus and is the conservative (hottest) choice. Both faces convect by default; a plate lying on a floor cools
/// mainly from its top face (use 1 cooled face). Lateral conduction out of the patch, radiation, and the temperature
/// gradient through the thickness are neglected (valid for a Biot number h d / k well below 0.1, true for metal plates
/// of millimetres in still or moving air).</para>
/// </remarks>
public sealed record PlatePatchThermalNode
{
    /// <summary>Creates a node from its mass, specific heat, convecting area and convection coefficient.</summary>
    /// <param name="massKg">Patch mass m, kg, &gt; 0.</param>
    /// <param name="specificHeatJPerKgK">Specific heat c, J/(kg K), &gt; 0.</param>
    /// <param name="cooledAreaM2">Convecting area A (all cooled faces together), m^2, &gt; 0.</param>
    /// <param name="convectionWPerM2K">Heat transfer coefficient h, W/(m^2 K), &gt; 0.</param>
    /// <exception cref="ArgumentOutOfRangeException">A value is not finite or not positive.</exception>
    public PlatePatchThermalNode(double massKg, double specificHeatJPerKgK, double cooledAreaM2, double convectionWPerM2K)
    {
        MassKg = Preconditions.Positive(massKg, nameof(massKg));
        SpecificHeatJPerKgK = Preconditions.Positive(specificHeatJPerKgK, nameof(specificHeatJPerKgK));
        CooledAreaM2 = Preconditions.Positive(cooledAreaM2, nameof(cooledAreaM2));
        ConvectionWPerM2K = Preconditions.Positive(convectionWPerM2K, nameof(convectionWPerM2K));
    }

    /// <summary>Patch mass m, kg.</summary>
    public double MassKg { get; }

    /// <summary>Specific heat c, J/(kg K).</summary>
    public double SpecificHeatJPerKgK { get; }

    /// <summary>Convecting area A over all cooled faces, m^2.</summary>
    public double CooledAreaM2 { get; }

    /// <summary>Heat transfer coefficient h, W/(m^2 K).</summary>
    public double ConvectionWPerM2K { get; }

    /// <summary>Heat capacity m c, J/K.</summary>
    public double HeatCapacityJPerK => MassKg * SpecificHeatJPerKgK;

    /// <summary>Thermal time constant m c / (h A), s.</summary>
    public double TimeConstantS => HeatCapacityJPerK / (ConvectionWPerM2K * CooledAreaM2);

    /// <summary>The patch under a rotor's magnet annulus in a plate.</summary>
    /// <param name="rotor">The rotor (inner and outer magnet radius).</param>
    /// <param name="plate">The plate (material density and specific heat, thickness).</param>
    /// <param name="convectionWPerM2K">Heat transfer coefficient from plate to air, W/(m^2 K), &gt; 0 (the rig's
    /// <c>PlateConvectionWPerM2K</c>).</param>
    /// <param name="spreadingFactor">Patch area / annulus area, &gt;= 1; default 1 (annulus only, hottest).</param>
    /// <param name="cooledFaces">Faces that convect, 1 or 2; default 2.</param>
    /// <exception cref="ArgumentNullException">A reference is null.</exception>
    /// <exception cref="ArgumentOutOfRangeException">A value is out of range.</exception>
    public static PlatePatchThermalNode UnderRotor(RotorDesign rotor, Plate plate, double convectionWPerM2K, double spreadingFactor = 1.0, int cooledFaces = 2)
    {
        Preconditions.NotNull(rotor, nameof(rotor));
        Preconditions.NotNull(plate, nameof(plate));
        Preconditions.InRange(spreadingFactor, 1.0, 100.0, nameof(spreadingFactor));
        if (cooledFaces is not (1 or 2))
        {
            throw new ArgumentOutOfRangeException(nameof(cooledFaces), cooledFaces, $"cooledFaces must be 1 or 2; got {cooledFaces}.");
        }
        double ri = Preconditions.NonNegative(rotor.InnerRadiusM, nameof(rotor.InnerRadiusM));
        double ro = Preconditions.Positive(rotor.OuterRadiusM, nameof(rotor.OuterRadiusM));
        if (ro <= ri)
        {
            throw new ArgumentOutOfRangeException(nameof(rotor), $"rotor outer radius {ro} m must exceed inner radius {ri} m.");
        }
        double areaM2 = Math.PI * (ro * ro - ri * ri) * spreadingFactor;
        double thicknessM = Preconditions.Positive(plate.ThicknessM, nameof(plate.ThicknessM));
        double massKg = Preconditions.Positive(plate.Material.DensityKgM3, nameof(plate.Material.DensityKgM3)) * areaM2 * thicknessM;
        return new PlatePatchThermalNode(massKg, plate.Material.SpecificHeatJPerKgK, areaM2 * cooledFaces, convectionWPerM2K);
    }

    /// <summary>Rate of change of the patch temperature, K/s: (P - h A (T - T_ambient)) / (m c).</summary>
    /// <param name="heatW">Heat input P (eddy-current power into this patch), W.</param>
    /// <param name="plateTempC">Patch temperature T, C.</param>
    /// <param name="ambientC">Ambient air temperature, C.</param>
    public double RateKPerS(double heatW, double plateTempC, double ambientC)
        => (heatW - ConvectionWPerM2K * CooledAreaM2 * (plateTempC - ambientC)) / HeatCapacityJPerK;

    /// <summary>Steady-state patch temperature under a constant heat input, C: T_ambient + P / (h A).</summary>
    /// <param name="heatW">Heat input P, W.</param>
    /// <param name="ambientC">Ambient air temperature, C.</param>
    public double SteadyStateC(double heatW, double ambientC) => ambientC + heatW / (ConvectionWPerM2K * CooledAreaM2);

    /// <summary>Patch temperature after a time under a constant heat input (closed form of the one-node model), C.</summary>
    /// <param name="startC">Temperature at the start, C.</param>
    /// <param name="heatW">Constant heat input P, W.</param>
    /// <param name="ambientC">Ambient air temperature, C.</param>
    /// <param name="elapsedS">Elapsed time, s, &gt;= 0.</param>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="elapsedS"/> is negative or not finite.</exception>
    public double TemperatureAfterC(double startC, double heatW, double ambientC, double elapsedS)
        => FirstOrderLag.Approach(startC, SteadyStateC(heatW, ambientC), TimeConstantS, Preconditions.NonNegative(elapsedS, nameof(elapsedS)));
}

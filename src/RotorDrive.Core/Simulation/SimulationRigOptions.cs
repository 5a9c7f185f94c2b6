using RotorDrive.Core.Craft;

namespace RotorDrive.Core.Simulation;

/// <summary>Settings for preparing a <see cref="SimulationRig"/> from a <see cref="RigModel"/>.</summary>
/// <param name="HeaveDampingNsPerM">A physical heave damper coefficient, N s/m (&gt;= 0), or null (default) to derive it
/// from the rig's heave damping ratio and the trimmed hover's heave stiffness.</param>
/// <param name="PlateSpreadingFactor">Plate patch area / magnet annulus area (&gt;= 1), or null (default) for the rig's
/// <see cref="Rig.PlateSpreadingFactor"/>; see <see cref="PlatePatchThermalNode.UnderRotor"/>.</param>
/// <param name="Hover">Numerical settings of the trimmed hover (<see cref="HoverTrim"/>), or null for its defaults.</param>
public sealed record SimulationRigOptions(double? HeaveDampingNsPerM = null, double? PlateSpreadingFactor = null, HoverOptions? Hover = null)
{
    /// <summary>The defaults.</summary>
    public static SimulationRigOptions Default { get; } = new();
}

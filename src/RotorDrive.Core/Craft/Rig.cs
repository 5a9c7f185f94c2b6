using RotorDrive.Core.Magnetics;

namespace RotorDrive.Core.Craft;

/// <summary>A whole eddy-current levitation rig: plate, craft, stations, packs, gaps, environment and limits.</summary>
/// <param name="Name">The rig's name.</param>
/// <param name="Plate">The plate the rig hovers over.</param>
/// <param name="PlateTemperatureC">Plate temperature at the start, C.</param>
/// <param name="AmbientC">Ambient air temperature, C (also the starting magnet and winding temperature).</param>
/// <param name="Body">Structure and payload.</param>
/// <param name="DesignGapM">Design hover air gap between magnet face and plate, m.</param>
/// <param name="LandedGapM">Air gap when resting on the landing gear, m.</param>
/// <param name="Stations">The rotor stations.</param>
/// <param name="Packs">The packs on the bus, or null when none is assigned yet.</param>
/// <param name="Limits">The team's limits.</param>
/// <param name="GearYawFrictionNm">Yaw torque the landing gear's friction holds before lift-off, N m.</param>
/// <param name="PlateConvectionWPerM2K">Heat transfer coefficient from plate to air (both faces), W/(m^2 K).</param>
public sealed record Rig(
    string Name,
    Plate Plate,
    double PlateTemperatureC,
    double AmbientC,
    CraftBody Body,
    double DesignGapM,
    double LandedGapM,
    IReadOnlyList<Station> Stations,
    PackBank? Packs,
    RigLimits Limits,
    double GearYawFrictionNm,
    double PlateConvectionWPerM2K)
{
    /// <summary>Area of the plate patch that takes a rotor's eddy heat / the magnet annulus area under it, at least 1
    /// (rig file <c>plate.spreading_factor</c>; default 1: the heat stays in the annulus, the hottest assumption). Used
    /// by the lumped plate node of the time simulations.</summary>
    public double PlateSpreadingFactor { get; init; } = 1.0;

    /// <summary>The eddy-current load model the analyses use for this rig (rig file <c>load_model</c>: "3d", the default, or
    /// "2d" for the first-generation model, e.g. to compare).</summary>
    public Loads.LoadModelKind LoadModel { get; init; } = Loads.LoadModelKind.ThreeDimensional;

    /// <summary>Load model settings for this rig: the given settings (or the defaults) with the rig's load model.</summary>
    /// <param name="options">Settings to start from, or null for the defaults.</param>
    public Loads.LoadModelOptions LoadOptions(Loads.LoadModelOptions? options = null)
        => (options ?? Loads.LoadModelOptions.Default) with { Model = LoadModel };

    /// <summary>Total mass: structure, payload, rotors, assigned motors and controllers, and packs, kg.</summary>
    public double TotalMassKg =>
        Body.EmptyMassKg + Body.PayloadKg
        + Stations.Sum(s => s.Rotor.RotorMassKg + (s.Motor?.MassKg ?? 0) + (s.Controller?.MassKg ?? 0))
        + (Packs?.MassKg ?? 0);

    /// <summary>Centre of gravity (x, y) of the whole craft, m: structure, payload and packs at the body's centre of
    /// gravity, each station's rotor, motor and controller on its axis.</summary>
    public (double XM, double YM) CentreOfGravity()
    {
        double bodyMass = Body.EmptyMassKg + Body.PayloadKg + (Packs?.MassKg ?? 0);
        double m = bodyMass, mx = bodyMass * Body.CgXM, my = bodyMass * Body.CgYM;
        foreach (var s in Stations)
        {
            double ms = s.Rotor.RotorMassKg + (s.Motor?.MassKg ?? 0) + (s.Controller?.MassKg ?? 0);
            m += ms;
            mx += ms * s.XM;
            my += ms * s.YM;
        }
        return (mx / m, my / m);
    }
}

using RotorDrive.Core.Drive;
using RotorDrive.Core.Loads;
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

    /// <summary>The load-table range analyses of this rig need for one rotor: 0 to its rated speed, gaps from half the
    /// landed gap to three times the design gap, plate temperatures from -20 C (or colder if the rig starts colder) to
    /// the rig's plate limit.</summary>
    /// <param name="rotor">The rotor design (rated speed).</param>
    /// <exception cref="ArgumentNullException">The rotor is null.</exception>
    public LoadTableRange LoadTableRangeFor(RotorDesign rotor)
    {
        Preconditions.NotNull(rotor, nameof(rotor));
        double cold = Math.Min(LoadTableRange.DefaultColdPlateC, Math.Min(PlateTemperatureC, AmbientC));
        double hot = Math.Max(Limits.PlateTempC, Math.Max(PlateTemperatureC, AmbientC));
        return new LoadTableRange(rotor.MaxSpeedRadPerS, 0.5 * LandedGapM, 3.0 * DesignGapM, cold, hot);
    }

    /// <summary>How the plate's faces lose heat (rig file <c>plate.convection_top_w_per_m2k</c>,
    /// <c>plate.convection_bottom_w_per_m2k</c>, <c>plate.emissivity</c>), or null for
    /// <see cref="PlateConvectionWPerM2K"/> on both faces and no radiation. Used by the plate field of the endurance
    /// run.</summary>
    public Thermal.PlateCooling? PlateCooling { get; init; }

    /// <summary>The plate's face cooling in effect: <see cref="PlateCooling"/>, or both faces at
    /// <see cref="PlateConvectionWPerM2K"/>.</summary>
    public Thermal.PlateCooling EffectivePlateCooling => PlateCooling ?? Thermal.PlateCooling.BothFaces(PlateConvectionWPerM2K);

    /// <summary>The route the craft follows during an endurance run (rig file <c>route</c>), or null to hover in place
    /// at the rig origin.</summary>
    public CraftRoute? Route { get; init; }

    /// <summary>Bench calibrations by rotor design id (rig file <c>calibrations</c>); empty when none. Every analysis builds
    /// a calibrated rotor's load with its factors (<see cref="LoadOptionsFor"/>).</summary>
    public IReadOnlyDictionary<string, RotorCalibration> Calibrations { get; init; } = new Dictionary<string, RotorCalibration>();

    /// <summary>The calibration of a rotor design, or null when it has none.</summary>
    /// <param name="rotor">The rotor design.</param>
    public RotorCalibration? CalibrationOf(RotorDesign rotor)
        => rotor is not null && Calibrations.TryGetValue(rotor.Id, out var c) ? c : null;

    /// <summary>The eddy-current load model the analyses use for this rig (rig file <c>load_model</c>: "3d", the default, or
    /// "2d" for the first-generation model, e.g. to compare).</summary>
    public LoadModelKind LoadModel { get; init; } = LoadModelKind.ThreeDimensional;

    /// <summary>How the rig is held (rig file <c>mount</c>; default <see cref="MountKind.Free"/>): a free craft, a guided
    /// sled or a bench of stands; <see cref="MountFit"/> says which analysis fits which, <see cref="SteadyState"/> gives the
    /// state each holds.</summary>
    public MountKind Mount { get; init; } = MountKind.Free;

    /// <summary>The gap every rotor starts a spin-up at, m: the landed gap, or on a bench (<see cref="MountKind.Bench"/>)
    /// the stands' fixed gap, the design gap.</summary>
    public double StartGapM => Mount == MountKind.Bench ? DesignGapM : LandedGapM;

    /// <summary>This bench rig with its stands at another gap and every station at one duty (the command line's
    /// <c>--gap-mm</c> and <c>--duty</c>); either left as it is when null. The landed gap is lowered to the new gap when
    /// it lies above it (a bench never lands).</summary>
    /// <param name="gapM">The stands' gap, m (&gt; 0), or null.</param>
    /// <param name="duty">Every station's duty, 0..1, or null.</param>
    /// <exception cref="ArgumentOutOfRangeException">A value is out of range.</exception>
    public Rig OnStands(double? gapM, double? duty)
    {
        var rig = this;
        if (gapM is { } g)
        {
            Preconditions.Positive(g, nameof(gapM));
            rig = rig with { DesignGapM = g, LandedGapM = Math.Min(LandedGapM, g) };
        }
        if (duty is { } d)
        {
            Preconditions.InRange(d, 0, 1, nameof(duty));
            rig = rig with { Stations = Stations.Select(s => s with { Duty = d }).ToArray() };
        }
        return rig;
    }

    /// <summary>The load model settings for a rotor of this rig: the given settings with the rig's load model and the
    /// rotor's calibration, if any.</summary>
    /// <param name="rotor">The rotor design.</param>
    /// <param name="options">Base settings, or null for <see cref="LoadModelOptions.Default"/>.</param>
    public LoadModelOptions LoadOptionsFor(RotorDesign rotor, LoadModelOptions? options = null)
    {
        options = (options ?? LoadModelOptions.Default) with { Model = LoadModel };
        return CalibrationOf(rotor) is { } c ? options with { Calibration = c.Factors } : options;
    }

    /// <summary>Total mass: structure, payload, rotors, assigned motors and controllers, and packs, kg.</summary>
    public double TotalMassKg =>
        Body.EmptyMassKg + Body.PayloadKg
        + Stations.Sum(s => s.Rotor.RotorMassKg + (s.Motor?.MassKg ?? 0) + (s.Controller?.MassKg ?? 0))
        + (Packs?.MassKg ?? 0);

    /// <summary>Mass of the rotors, kg (part of <see cref="TotalMassKg"/>).</summary>
    public double RotorsMassKg => Stations.Sum(s => s.Rotor.RotorMassKg);

    /// <summary>Mass of the assigned motors, kg (part of <see cref="TotalMassKg"/>).</summary>
    public double MotorsMassKg => Stations.Sum(s => s.Motor?.MassKg ?? 0);

    /// <summary>Mass of the assigned controllers, kg (part of <see cref="TotalMassKg"/>).</summary>
    public double ControllersMassKg => Stations.Sum(s => s.Controller?.MassKg ?? 0);

    /// <summary>Weight of the whole craft (<see cref="TotalMassKg"/> under standard gravity 9.80665 m/s^2, ISO 80000-3), N.</summary>
    public double WeightN => TotalMassKg * Units.StandardGravity;

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

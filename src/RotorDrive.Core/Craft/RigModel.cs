using RotorDrive.Core.Drive;
using RotorDrive.Core.Loads;
using RotorDrive.Core.Magnetics;

namespace RotorDrive.Core.Craft;

/// <summary>A rig prepared for whole-craft analyses (trimmed hover, yaw, spin-up, ranking, stress tests): one load table
/// per distinct (rotor design, plate) pair, the stations with their drivetrains and local conditions, mass, centre of
/// gravity, yaw inertia and the pack bank.</summary>
/// <remarks>Immutable and thread-safe: the load tables are built once and shared by every variant. Build once with
/// <see cref="Build(Rig, RigModelOptions?)"/> (cost: one table per distinct rotor, a few ms each), then derive cheap
/// variants with <see cref="WithPayload"/>, <see cref="WithParts(int, Motor, SpeedController)"/>, <see cref="WithConditions"/>,
/// <see cref="WithStation"/>, <see cref="WithPacks"/> and <see cref="WithSoc"/>: they copy the station list (O(n)) and
/// recompute mass and centre of gravity, never a table. Masses: structure + payload + packs at the body's centre of
/// gravity, each station's rotor, motor and controller at its axis (as <see cref="Rig.CentreOfGravity"/>).</remarks>
public sealed class RigModel
{
    private RigModel(Rig rig, IReadOnlyList<CraftStation> stations, PackBank packs, double payloadKg, double socFraction, RigModelOptions options)
    {
        Rig = rig;
        Stations = stations;
        Packs = packs;
        PayloadKg = payloadKg;
        SocFraction = socFraction;
        Options = options;
        Source = BusSource.FromPack(packs, socFraction);
        double bodyMass = rig.Body.EmptyMassKg + payloadKg + packs.MassKg;
        double m = bodyMass, mx = bodyMass * rig.Body.CgXM, my = bodyMass * rig.Body.CgYM;
        foreach (var s in stations)
        {
            double ms = s.MassKg;
            m += ms;
            mx += ms * s.XM;
            my += ms * s.YM;
        }
        MassKg = m;
        CgXM = mx / m;
        CgYM = my / m;
    }

    /// <summary>The rig this model was built from.</summary>
    public Rig Rig { get; }

    /// <summary>The stations, in the rig's order.</summary>
    public IReadOnlyList<CraftStation> Stations { get; }

    /// <summary>The pack bank every controller shares.</summary>
    public PackBank Packs { get; }

    /// <summary>The bank as a bus source at <see cref="SocFraction"/>: open-circuit voltage and resistance.</summary>
    public BusSource Source { get; }

    /// <summary>Payload, kg.</summary>
    public double PayloadKg { get; }

    /// <summary>Pack state of charge, 0..1.</summary>
    public double SocFraction { get; }

    /// <summary>The options the model was built with.</summary>
    public RigModelOptions Options { get; }

    /// <summary>Total craft mass including drivetrain, rotors and packs, kg.</summary>
    public double MassKg { get; }

    /// <summary>Weight, N (standard gravity 9.80665 m/s^2, ISO 80000-3).</summary>
    public double WeightN => MassKg * Units.StandardGravity;

    /// <summary>Centre of gravity, x, m.</summary>
    public double CgXM { get; }

    /// <summary>Centre of gravity, y, m.</summary>
    public double CgYM { get; }

    /// <summary>Yaw moment of inertia of the whole craft, kg m^2 (from the rig).</summary>
    public double YawInertiaKgM2 => Rig.Body.YawInertiaKgM2;

    /// <summary>The design gap, m.</summary>
    public double DesignGapM => Rig.DesignGapM;

    /// <summary>The rig's limits.</summary>
    public RigLimits Limits => Rig.Limits;

    /// <summary>Why a rig cannot be modelled: one message per station without motor or controller, and one when no pack
    /// is assigned; empty when it can.</summary>
    /// <param name="rig">The rig.</param>
    public static IReadOnlyList<string> MissingParts(Rig rig)
    {
        Preconditions.NotNull(rig, nameof(rig));
        var problems = new List<string>();
        for (int i = 0; i < rig.Stations.Count; i++)
        {
            var s = rig.Stations[i];
            if (s.Motor is null)
            {
                problems.Add($"station {i} has no motor assigned (stations[{i}].motor)");
            }
            if (s.Controller is null)
            {
                problems.Add($"station {i} has no controller assigned (stations[{i}].controller)");
            }
        }
        if (rig.Packs is null)
        {
            problems.Add("the rig has no pack assigned (pack.id)");
        }
        if (rig.Stations.Count == 0)
        {
            problems.Add("the rig has no stations");
        }
        return problems;
    }

    /// <summary>Builds the model: one precomputed load table (<see cref="RotorLoadTable"/>) per distinct rotor design over
    /// the rig's plate, shared by every station with that rotor.</summary>
    /// <param name="rig">A rig whose every station has a motor and a controller, and which has a pack.</param>
    /// <param name="options">Settings; <see cref="RigModelOptions.Default"/> when null.</param>
    /// <exception cref="ArgumentException">A part is missing (see <see cref="MissingParts"/>).</exception>
    public static RigModel Build(Rig rig, RigModelOptions? options = null)
    {
        Preconditions.NotNull(rig, nameof(rig));
        options ??= RigModelOptions.Default;
        var tables = new Dictionary<RotorDesign, IRotorLoad>();
        var loads = new IRotorLoad[rig.Stations.Count];
        for (int i = 0; i < loads.Length; i++)
        {
            var rotor = rig.Stations[i].Rotor;
            if (!tables.TryGetValue(rotor, out var table))
            {
                table = RotorLoadTable.Build(rotor, rig.Plate, LoadTableRange.ForRig(rig, rotor), rig.LoadOptions(options.Load));
                tables.Add(rotor, table);
            }
            loads[i] = table;
        }
        return Build(rig, loads, options);
    }

    /// <summary>Builds the model with given rotor loads, one per station (a calibrated or analytic load, or tables
    /// shared with another model).</summary>
    /// <param name="rig">A rig whose every station has a motor and a controller, and which has a pack.</param>
    /// <param name="loads">One load per station, in station order.</param>
    /// <param name="options">Settings; <see cref="RigModelOptions.Default"/> when null.</param>
    /// <exception cref="ArgumentException">A part is missing, or the loads do not match the stations.</exception>
    public static RigModel Build(Rig rig, IReadOnlyList<IRotorLoad> loads, RigModelOptions? options = null)
    {
        Preconditions.NotNull(rig, nameof(rig));
        Preconditions.NotNull(loads, nameof(loads));
        options ??= RigModelOptions.Default;
        var missing = MissingParts(rig);
        if (missing.Count > 0)
        {
            throw new ArgumentException("The rig cannot be analysed: " + string.Join("; ", missing) + ".", nameof(rig));
        }
        if (loads.Count != rig.Stations.Count)
        {
            throw new ArgumentException($"Expected {rig.Stations.Count} loads (one per station); got {loads.Count}.", nameof(loads));
        }
        Preconditions.InRange(options.SocFraction, 0, 1, nameof(options.SocFraction));
        var driveOptions = DriveOptions.Default with { MaxDuty = rig.Limits.MaxDuty };
        var nominal = StationConditions.Nominal(rig);
        var stations = new CraftStation[rig.Stations.Count];
        for (int i = 0; i < stations.Length; i++)
        {
            var s = rig.Stations[i];
            stations[i] = new CraftStation(s.XM, s.YM, s.Spin, s.Rotor, new Drivetrain(s.Motor!, s.Controller!, driveOptions),
                Preconditions.NotNull(loads[i], "loads[" + i + "]"), nominal);
        }
        return new RigModel(rig, stations, rig.Packs!, rig.Body.PayloadKg, options.SocFraction, options);
    }

    /// <summary>The same model with another payload (mass and centre of gravity recomputed; payload sits at the body's
    /// centre of gravity).</summary>
    /// <param name="payloadKg">Payload, kg (&gt;= 0).</param>
    public RigModel WithPayload(double payloadKg)
        => new(Rig, Stations, Packs, Preconditions.NonNegative(payloadKg, nameof(payloadKg)), SocFraction, Options);

    /// <summary>The same model with another pack state of charge.</summary>
    /// <param name="socFraction">State of charge, 0..1.</param>
    public RigModel WithSoc(double socFraction)
        => new(Rig, Stations, Packs, PayloadKg, Preconditions.InRange(socFraction, 0, 1, nameof(socFraction)), Options);

    /// <summary>The same model with another pack bank (mass recomputed).</summary>
    /// <param name="packs">The bank.</param>
    public RigModel WithPacks(PackBank packs)
        => new(Rig, Stations, Preconditions.NotNull(packs, nameof(packs)), PayloadKg, SocFraction, Options);

    /// <summary>The same model with one station replaced (e.g. a perturbed load or position).</summary>
    /// <param name="index">Station index, 0-based.</param>
    /// <param name="station">The replacement.</param>
    public RigModel WithStation(int index, CraftStation station)
    {
        Preconditions.NotNull(station, nameof(station));
        if (index < 0 || index >= Stations.Count)
        {
            throw new ArgumentOutOfRangeException(nameof(index), index, $"index must lie in [0, {Stations.Count - 1}]; got {index}.");
        }
        var copy = Stations.ToArray();
        copy[index] = station;
        return new RigModel(Rig, copy, Packs, PayloadKg, SocFraction, Options);
    }

    /// <summary>The same model with one station's motor and controller replaced (a catalog alternative or a tolerance
    /// draw); the drive options (max duty) are kept.</summary>
    /// <param name="index">Station index, 0-based.</param>
    /// <param name="motor">The motor.</param>
    /// <param name="controller">The controller.</param>
    public RigModel WithParts(int index, Motor motor, SpeedController controller)
    {
        var s = Stations[CheckIndex(index)];
        return WithStation(index, s with { Drivetrain = new Drivetrain(motor, controller, s.Drivetrain.Options) });
    }

    /// <summary>The same model with every station's motor and controller replaced (a ranking candidate).</summary>
    /// <param name="motor">The motor.</param>
    /// <param name="controller">The controller.</param>
    public RigModel WithParts(Motor motor, SpeedController controller)
    {
        var copy = new CraftStation[Stations.Count];
        for (int i = 0; i < copy.Length; i++)
        {
            copy[i] = Stations[i] with { Drivetrain = new Drivetrain(motor, controller, Stations[i].Drivetrain.Options) };
        }
        return new RigModel(Rig, copy, Packs, PayloadKg, SocFraction, Options);
    }

    /// <summary>The same model with one station's local conditions replaced.</summary>
    /// <param name="index">Station index, 0-based.</param>
    /// <param name="conditions">Gap offset and temperatures.</param>
    public RigModel WithConditions(int index, StationConditions conditions)
        => WithStation(CheckIndex(index), Stations[index] with { Conditions = Preconditions.NotNull(conditions, nameof(conditions)) });

    /// <summary>The same model with every station's local conditions replaced at once (one copy of the station list: a
    /// time simulation's present temperatures).</summary>
    /// <param name="conditions">One set of conditions per station, in station order.</param>
    /// <exception cref="ArgumentException">The count differs from the station count.</exception>
    public RigModel WithStationConditions(IReadOnlyList<StationConditions> conditions)
    {
        Preconditions.NotNull(conditions, nameof(conditions));
        if (conditions.Count != Stations.Count)
        {
            throw new ArgumentException($"Expected {Stations.Count} station conditions (one per station); got {conditions.Count}.", nameof(conditions));
        }
        var copy = new CraftStation[Stations.Count];
        for (int i = 0; i < copy.Length; i++)
        {
            copy[i] = Stations[i] with { Conditions = Preconditions.NotNull(conditions[i], "conditions[" + i + "]") };
        }
        return new RigModel(Rig, copy, Packs, PayloadKg, SocFraction, Options);
    }

    /// <summary>The same model with the centre of gravity of structure and payload moved (a misplaced payload, a tolerance
    /// draw): mass unchanged, centre of gravity recomputed.</summary>
    /// <param name="dxM">Shift along x, m.</param>
    /// <param name="dyM">Shift along y, m.</param>
    public RigModel WithCentreOfGravityOffset(double dxM, double dyM)
    {
        Preconditions.Finite(dxM, nameof(dxM));
        Preconditions.Finite(dyM, nameof(dyM));
        var body = Rig.Body with { CgXM = Rig.Body.CgXM + dxM, CgYM = Rig.Body.CgYM + dyM };
        return new RigModel(Rig with { Body = body }, Stations, Packs, PayloadKg, SocFraction, Options);
    }

    private int CheckIndex(int index)
    {
        if (index < 0 || index >= Stations.Count)
        {
            throw new ArgumentOutOfRangeException(nameof(index), index, $"index must lie in [0, {Stations.Count - 1}]; got {index}.");
        }
        return index;
    }
}

using RotorDrive.Core.Craft;
using RotorDrive.Core.Drive;
using RotorDrive.Core.Loads;

namespace RotorDrive.Core.Simulation;

/// <summary>What a transient or endurance run needs from a rig, prepared once from a <see cref="RigModel"/>: the model's
/// stations (shared load tables, drivetrains, local conditions), mass, pack bank and state of charge, plus the thermal
/// nodes, the drag peaks at each station's landed gap, the trimmed hover (<see cref="HoverTrim"/>) and the heave
/// damping.</summary>
/// <remarks>
/// <para>Build with <see cref="FromModel"/> from any model variant (<see cref="RigModel.WithParts(int, Motor, SpeedController)"/>,
/// <see cref="RigModel.WithConditions"/>, <see cref="RigModel.WithPayload"/>, <see cref="RigModel.WithPacks"/>,
/// <see cref="RigModel.WithSoc"/>, <see cref="RigModel.WithStation"/>), or with <see cref="Build"/> from a rig in one line.
/// Station j sits at the rig gap plus its <see cref="StationConditions.GapOffsetM"/> (on the gear: landed gap + offset),
/// its plate patch and winding start at the station's plate and winding temperatures, its rotor magnets stay at the
/// station's rotor-magnet temperature, and its motor magnets start at the station's motor-magnet temperature and rise
/// with the winding (conservative: hot magnets give less torque per amp).</para>
/// <para>Cost once the model exists: one trimmed hover (about 0.1 ms on the six-station demo rig) and one drag-peak
/// search per distinct (load, landed gap, temperatures); <see cref="With"/> reuses this rig's peaks as starting
/// brackets, so a perturbed variant's peaks cost a few dozen load evaluations each. Immutable and thread-safe; every
/// run allocates its own work buffers.</para>
/// <para>Heave damping: c = 2 zeta sqrt(k m) with zeta the rig's heave damping ratio and k = -dL/dg the trimmed hover's
/// heave stiffness (viscous damping written through its ratio to critical: W. T. Thomson, "Theory of Vibration with
/// Applications", ch. 2). Without a trim, k is taken at the full-throttle speeds of <see cref="HoverSpeedsRadPerS"/>.</para>
/// <para>Rotor inertia is the rotor row's moment of inertia; the motor's own rotor inertia is not in the catalogs and is
/// neglected.</para>
/// </remarks>
public sealed class SimulationRig
{
    // The drag-peak scan around a known peak of the same load: a factor of 3 either way in speed, 12 points.
    private const double HintSpan = 3.0;
    private static readonly DragPeakOptions HintedScan = DragPeakOptions.Default with { ScanPoints = 12 };

    private readonly CraftStation[] _stations;
    private readonly IRotorLoad[] _loads;
    private readonly Drivetrain[] _drives;
    private readonly WindingThermalNode?[] _windings;
    private readonly PlatePatchThermalNode[] _plates;
    private readonly DragPeak[] _peaks;
    private readonly double[] _hoverSpeeds;

    // parentPeaks: the landed drag peaks of the rig this one is a variant of (same stations, same order), the starting
    // points of the drag-peak searches; null for a fresh rig.
    private SimulationRig(RigModel model, SimulationRigOptions options, IReadOnlyList<DragPeak>? parentPeaks)
    {
        Model = model;
        Options = options;
        var rig = model.Rig;
        int n = CheckModel(model);
        double spreading = options.PlateSpreadingFactor ?? rig.PlateSpreadingFactor;
        _stations = model.Stations.ToArray();
        _loads = new IRotorLoad[n];
        _drives = new Drivetrain[n];
        _windings = new WindingThermalNode?[n];
        _plates = new PlatePatchThermalNode[n];
        _peaks = new DragPeak[n];
        var search = new LandedPeakSearch(parentPeaks is not null && parentPeaks.Count == n ? parentPeaks : null);
        for (int j = 0; j < n; j++)
        {
            var s = _stations[j];
            double landed = CheckStationGaps(model, s, j);
            _loads[j] = s.Load;
            _drives[j] = s.Drivetrain;
            _windings[j] = WindingThermalNode.FromMotor(s.Drivetrain.Motor);
            _plates[j] = PlatePatchThermalNode.UnderRotor(s.Rotor, rig.Plate, rig.PlateConvectionWPerM2K, spreading);
            _peaks[j] = search.PeakAt(j, s, landed);
        }
        Hover = SteadyState.Solve(model, options.Hover);
        (_hoverSpeeds, double stiffness) = Hover.Balanced ? TrimmedSpeeds(Hover, n) : FullThrottleSpeeds(model, _stations);
        double damping = options.HeaveDampingNsPerM ?? 2 * rig.Body.HeaveDampingRatio * Math.Sqrt(Math.Max(stiffness, 0) * model.MassKg);
        HeaveDampingNsPerM = Preconditions.NonNegative(damping, nameof(options.HeaveDampingNsPerM));
    }

    // The rig-wide ranges a transient run relies on; returns the station count.
    private static int CheckModel(RigModel model)
    {
        var rig = model.Rig;
        int n = model.Stations.Count;
        if (n == 0)
        {
            throw new ArgumentException("the rig has no stations: a transient run needs at least one.", nameof(model));
        }
        Preconditions.Positive(rig.LandedGapM, "landed gap");
        Preconditions.Positive(rig.DesignGapM, "design gap");
        Preconditions.Positive(model.YawInertiaKgM2, "yaw inertia");
        Preconditions.NonNegative(rig.GearYawFrictionNm, "gear yaw friction");
        return n;
    }

    // Station j's rotor inertia and its gaps on the gear and at the design gap; returns its landed gap, m.
    private static double CheckStationGaps(RigModel model, CraftStation s, int j)
    {
        var rig = model.Rig;
        Preconditions.Positive(s.Rotor.InertiaKgM2, $"rotor inertia of station {j}");
        double landed = rig.StartGapM + s.Conditions.GapOffsetM;
        double design = rig.DesignGapM + s.Conditions.GapOffsetM;
        if (!(landed > 0) || !(design > 0))
        {
            throw new ArgumentOutOfRangeException(nameof(model), s.Conditions.GapOffsetM,
                $"station {j + 1}: the gap offset {s.Conditions.GapOffsetM * 1000:0.###} mm leaves no air gap on the gear or at the design gap.");
        }
        return landed;
    }

    // The trimmed hover's station speeds and heave stiffness.
    private static (double[] Speeds, double StiffnessNPerM) TrimmedSpeeds(HoverResult hover, int n)
    {
        var speeds = new double[n];
        for (int j = 0; j < n; j++)
        {
            speeds[j] = hover.Stations[j].SpeedRadPerS;
        }
        return (speeds, hover.HeaveStiffnessNPerM);
    }

    // No trim: every rotor at full throttle (its rated speed, or its motor's free speed at the max duty on the
    // open-circuit voltage if lower); the stiffness there by a central difference in the rig gap.
    private static (double[] Speeds, double StiffnessNPerM) FullThrottleSpeeds(RigModel model, CraftStation[] stations)
    {
        int n = stations.Length;
        var speeds = new double[n];
        double g = model.Rig.DesignGapM, dg = 1e-4 * g, up = 0, down = 0;
        for (int j = 0; j < n; j++)
        {
            var s = stations[j];
            double free = s.Drivetrain.FreeSpeedRadPerS(model.Source.OpenCircuitVoltageV, s.Drivetrain.MaxDuty, s.Conditions.MotorMagnetTempC);
            speeds[j] = Math.Min(s.Rotor.MaxSpeedRadPerS, free);
            up += stations[j].LoadAt(speeds[j], g + dg).LiftN;
            down += stations[j].LoadAt(speeds[j], g - dg).LiftN;
        }
        return (speeds, -(up - down) / (2 * dg));
    }

    // The landed drag peaks of one rig, station by station: a station that shares load, landed gap, temperatures and top
    // speed with an earlier one shares its peak; otherwise the search starts next to the same station's peak in the
    // parent rig (a tolerance sample wraps its loads, so only the station tells which peak it varies), else next to a
    // peak of the same load found here.
    private sealed class LandedPeakSearch(IReadOnlyList<DragPeak>? parentPeaks)
    {
        private readonly Dictionary<IRotorLoad, double> _loadHints = new(ReferenceEqualityComparer.Instance);
        private readonly List<(IRotorLoad Load, double Gap, double PlateC, double MagnetC, double Top, DragPeak Peak)> _found = [];

        public DragPeak PeakAt(int j, CraftStation s, double landed)
        {
            foreach (var f in _found)
            {
                if (ReferenceEquals(f.Load, s.Load) && f.Gap == landed && f.PlateC == s.Conditions.PlateTempC
                    && f.MagnetC == s.Conditions.RotorMagnetTempC && f.Top == s.Rotor.MaxSpeedRadPerS)
                {
                    return f.Peak;
                }
            }
            double? hint = parentPeaks?[j] is { Status: DragPeakStatus.Converged } parent ? parent.SpeedRadPerS
                : _loadHints.TryGetValue(s.Load, out double h) ? h : null;
            var peak = TotalTorquePeak(s.Load, landed, s.Conditions.PlateTempC, s.Conditions.RotorMagnetTempC, s.Rotor.MaxSpeedRadPerS, hint);
            _found.Add((s.Load, landed, s.Conditions.PlateTempC, s.Conditions.RotorMagnetTempC, s.Rotor.MaxSpeedRadPerS, peak));
            if (peak.Status is DragPeakStatus.Converged)
            {
                _loadHints.TryAdd(s.Load, peak.SpeedRadPerS);
            }
            return peak;
        }
    }

    /// <summary>Prepares a model for time simulations.</summary>
    /// <param name="model">The rig model (any variant); its stations, mass, pack bank and state of charge are used as they
    /// are.</param>
    /// <param name="options">Settings; <see cref="SimulationRigOptions.Default"/> when null.</param>
    /// <exception cref="ArgumentNullException">The model is null.</exception>
    /// <exception cref="ArgumentException">The model has no stations.</exception>
    /// <exception cref="ArgumentOutOfRangeException">A gap, inertia or friction is out of its physical range, or a gap
    /// offset closes a station's gap.</exception>
    public static SimulationRig FromModel(RigModel model, SimulationRigOptions? options = null)
    {
        Preconditions.NotNull(model, nameof(model));
        options ??= SimulationRigOptions.Default;
        if (options.PlateSpreadingFactor is { } f)
        {
            Preconditions.InRange(f, 1.0, 100.0, nameof(options.PlateSpreadingFactor));
        }
        return new SimulationRig(model, options, null);
    }

    /// <summary>Builds the rig model (<see cref="RigModel.Build(Rig, RigModelOptions?)"/>: one load table per distinct
    /// rotor design) and prepares it: the one-line convenience for callers that hold a <see cref="Craft.Rig"/>.</summary>
    /// <param name="rig">A rig whose every station has a motor and a controller, and which has a pack.</param>
    /// <param name="modelOptions">Model settings (state of charge, load model), or null for the defaults.</param>
    /// <param name="options">Simulation settings, or null for the defaults.</param>
    /// <exception cref="ArgumentException">A part is missing (see <see cref="RigModel.MissingParts"/>).</exception>
    public static SimulationRig Build(Rig rig, RigModelOptions? modelOptions = null, SimulationRigOptions? options = null)
        => FromModel(RigModel.Build(Preconditions.NotNull(rig, nameof(rig)), modelOptions), options);

    /// <summary>Prepares a variant of the model with this rig's options, starting each station's drag-peak search next to
    /// the peak this rig found at the same station (a tolerance sample, a candidate drivetrain); the search falls back to
    /// the full one when the peak has moved outside a factor of 3.</summary>
    /// <param name="model">The variant; normally derived from <see cref="Model"/>.</param>
    public SimulationRig With(RigModel model) => new(Preconditions.NotNull(model, nameof(model)), Options, _peaks);

    /// <summary>The rig model this was prepared from.</summary>
    public RigModel Model { get; }

    /// <summary>The settings used.</summary>
    public SimulationRigOptions Options { get; }

    /// <summary>The rig.</summary>
    public Rig Rig => Model.Rig;

    /// <summary>Number of rotor stations.</summary>
    public int StationCount => _stations.Length;

    /// <summary>The model's stations (load, drivetrain, conditions).</summary>
    public IReadOnlyList<CraftStation> Stations => _stations;

    /// <summary>Load per station.</summary>
    public IReadOnlyList<IRotorLoad> Loads => _loads;

    /// <summary>Drivetrain per station (max duty from the rig's limits).</summary>
    public IReadOnlyList<Drivetrain> Drivetrains => _drives;

    /// <summary>Winding thermal node per station, or null where the motor row lacks thermal data.</summary>
    public IReadOnlyList<WindingThermalNode?> Windings => _windings;

    /// <summary>Plate patch thermal node per station.</summary>
    public IReadOnlyList<PlatePatchThermalNode> PlatePatches => _plates;

    /// <summary>Plate patch area / magnet annulus area used for the plate nodes (&gt;= 1).</summary>
    public double PlateSpreadingFactor => Options.PlateSpreadingFactor ?? Rig.PlateSpreadingFactor;

    /// <summary>Peak of the total load torque (eddy + windage + bearing) per station at its landed gap (rig landed gap +
    /// offset), plate temperature and rotor-magnet temperature: the torque its motor must pass during spin-up.</summary>
    public IReadOnlyList<DragPeak> LandedDragPeaks => _peaks;

    /// <summary>The pack bank.</summary>
    public PackBank Packs => Model.Packs;

    /// <summary>The model's pack state of charge, 0..1 (the default start of every run).</summary>
    public double SocFraction => Model.SocFraction;

    /// <summary>Total craft mass, kg (body, payload, rotors, drivetrains, packs).</summary>
    public double MassKg => Model.MassKg;

    /// <summary>Craft weight, N.</summary>
    public double WeightN => Model.WeightN;

    /// <summary>Heave damping coefficient, N s/m.</summary>
    public double HeaveDampingNsPerM { get; }

    /// <summary>The trimmed hover at the design gap (<see cref="HoverTrim.Solve(RigModel, HoverOptions?)"/> of the
    /// model).</summary>
    public HoverResult Hover { get; }

    /// <summary>True when the trimmed hover balances the craft.</summary>
    public bool HoverExists => Hover.Balanced;

    /// <summary>Per station: the trimmed hover speed, rad/s, or when no trim exists the full-throttle speed (the rotor's
    /// rated speed, or its motor's free speed at the max duty on the pack's open-circuit voltage if lower). A stop run
    /// starts here.</summary>
    public IReadOnlyList<double> HoverSpeedsRadPerS => _hoverSpeeds;

    /// <summary>The throttle per station that holds the trimmed hover: the trimmed speeds (speed hold) or the duties the
    /// controllers need for them on the shared bus at a state of charge (duty), clamped to the rig's max duty.</summary>
    /// <remarks>Duties come from <see cref="HoverTrim.Solve(RigModel, HoverOptions?)"/> on the model at that state of
    /// charge (speeds do not depend on it). Without a trim: the full-throttle speeds of <see cref="HoverSpeedsRadPerS"/>,
    /// or the max duty.</remarks>
    /// <param name="mode">Controller mode.</param>
    /// <param name="socFraction">Pack state of charge, 0..1, or null for the model's.</param>
    /// <exception cref="ArgumentOutOfRangeException">The state of charge is outside [0, 1].</exception>
    public IReadOnlyList<double> HoverThrottle(ControllerMode mode, double? socFraction = null)
    {
        double soc = Preconditions.InRange(socFraction ?? SocFraction, 0, 1, nameof(socFraction));
        int n = _stations.Length;
        if (mode == ControllerMode.SpeedHold)
        {
            return _hoverSpeeds.ToArray();
        }
        var hover = soc == SocFraction ? Hover : SteadyState.Solve(Model.WithSoc(soc), Options.Hover);
        var targets = new double[n];
        double max = Rig.Limits.MaxDuty;
        for (int j = 0; j < n; j++)
        {
            targets[j] = hover.Balanced ? Math.Clamp(hover.Stations[j].Duty, 0.0, max) : max;
        }
        return targets;
    }

    /// <summary>Station j's air gap on the landing gear: rig landed gap + its offset, m.</summary>
    /// <param name="station">Station index, 0-based.</param>
    public double LandedGapM(int station) => Rig.StartGapM + _stations[station].Conditions.GapOffsetM;

    // The peak of the total shaft torque at a gap. With a hint (a peak of the same load elsewhere), a short scan of a
    // factor of 3 either side of it; otherwise (or when that scan does not bracket an interior peak) the full search:
    // the eddy peak first, then the total below 3x the eddy peak so that windage rising at top speed is not taken for it.
    private static DragPeak TotalTorquePeak(IRotorLoad load, double gapM, double plateTempC, double magnetTempC, double maxSpeedRadPerS, double? hint)
    {
        var total = new TotalTorqueView(load);
        if (hint is { } h && h > 0)
        {
            double top = Math.Min(maxSpeedRadPerS, HintSpan * h);
            double fraction = h / HintSpan / top;
            if (fraction <= 0.5)
            {
                var near = DragPeakFinder.Find(total, gapM, plateTempC, magnetTempC, top, HintedScan with { LowestSpeedFraction = fraction });
                if (near.Status is DragPeakStatus.Converged && near.SpeedRadPerS > 1.2 * h / HintSpan && near.SpeedRadPerS < top / 1.2)
                {
                    return near;
                }
            }
        }
        DragPeak eddy = DragPeakFinder.Find(load, gapM, plateTempC, magnetTempC, maxSpeedRadPerS);
        if (eddy.Status is DragPeakStatus.NoDrag)
        {
            return eddy;
        }
        double limit = Math.Min(maxSpeedRadPerS, 3 * eddy.SpeedRadPerS);
        return DragPeakFinder.Find(total, gapM, plateTempC, magnetTempC, limit);
    }

    // Presents a load's total torque as its eddy torque, so the drag-peak finder locates the peak of the total.
    private sealed class TotalTorqueView(IRotorLoad inner) : IRotorLoad
    {
        public LoadPoint Evaluate(double speedRadPerS, double gapM, double plateTempC, double magnetTempC)
        {
            var p = inner.Evaluate(speedRadPerS, gapM, plateTempC, magnetTempC);
            return p with { EddyTorqueNm = p.TotalTorqueNm, WindageTorqueNm = 0, BearingTorqueNm = 0 };
        }
    }
}

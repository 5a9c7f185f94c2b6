using MathNet.Numerics.RootFinding;
using RotorDrive.Core.Craft;
using RotorDrive.Core.Drive;
using RotorDrive.Core.Loads;

namespace RotorDrive.Core.Simulation;

/// <summary>Everything a transient or endurance run needs from a rig, prepared once: one load per station (a shared
/// precomputed table per distinct rotor design), drivetrains, pack bank, thermal nodes, mass, heave damping, drag peaks
/// at the landed gap and the common-speed hover.</summary>
/// <remarks>
/// <para>Immutable after construction and safe to share between threads; every run allocates its own work buffers.
/// Building the tables dominates the cost (milliseconds per distinct rotor design); build once per rig and reuse it for
/// every run (ranking, Monte Carlo).</para>
/// <para>Heave damping: c = 2 zeta sqrt(k m) with zeta the rig's heave damping ratio and k = -dL/dg the heave stiffness
/// at the design gap and hover speed (viscous damping written through its ratio to critical: W. T. Thomson,
/// "Theory of Vibration with Applications", ch. 2). A physical damper coefficient can be given instead.</para>
/// <para>Rotor inertia is the rotor row's moment of inertia; the motor's own rotor inertia is not in the catalogs and is
/// neglected.</para>
/// </remarks>
public sealed class SimulationRig
{
    private readonly IRotorLoad[] _loads;
    private readonly Drivetrain[] _drives;
    private readonly WindingThermalNode?[] _windings;
    private readonly PlatePatchThermalNode[] _plates;
    private readonly DragPeak[] _peaks;

    /// <summary>Prepares a rig with the given loads (one per station; stations that share a rotor design may share a
    /// load object), e.g. the shared tables of a craft analysis.</summary>
    /// <param name="rig">The rig; every station needs a motor and a controller, and the rig a pack bank.</param>
    /// <param name="loads">One load per station.</param>
    /// <param name="heaveDampingNsPerM">A physical heave damper coefficient, N s/m, or null to derive it from the rig's
    /// heave damping ratio.</param>
    /// <param name="plateSpreadingFactor">Plate patch area / magnet annulus area, at least 1 (see
    /// <see cref="PlatePatchThermalNode.UnderRotor"/>); default 1, the hottest (annulus-only) assumption.</param>
    /// <exception cref="ArgumentNullException">A reference is null.</exception>
    /// <exception cref="ArgumentException">A station lacks a motor or controller, the rig has no pack, or the load count
    /// differs from the station count.</exception>
    /// <exception cref="ArgumentOutOfRangeException">A value is out of its physical range.</exception>
    public SimulationRig(Rig rig, IReadOnlyList<IRotorLoad> loads, double? heaveDampingNsPerM = null, double plateSpreadingFactor = 1.0)
    {
        Rig = Preconditions.NotNull(rig, nameof(rig));
        Preconditions.NotNull(loads, nameof(loads));
        int n = rig.Stations.Count;
        if (n == 0 || loads.Count != n)
        {
            throw new ArgumentException($"one load per station is needed ({n} stations, {loads.Count} loads).", nameof(loads));
        }
        Packs = rig.Packs ?? throw new ArgumentException("the rig has no pack: a transient run needs one.", nameof(rig));
        Preconditions.Positive(rig.LandedGapM, "landed gap");
        Preconditions.Positive(rig.DesignGapM, "design gap");
        Preconditions.Positive(rig.Body.YawInertiaKgM2, "yaw inertia");
        Preconditions.NonNegative(rig.GearYawFrictionNm, "gear yaw friction");
        _loads = new IRotorLoad[n];
        _drives = new Drivetrain[n];
        _windings = new WindingThermalNode?[n];
        _plates = new PlatePatchThermalNode[n];
        _peaks = new DragPeak[n];
        var options = new DriveOptions(MaxDuty: rig.Limits.MaxDuty);
        var peakCache = new Dictionary<IRotorLoad, DragPeak>(ReferenceEqualityComparer.Instance);
        for (int j = 0; j < n; j++)
        {
            Station s = rig.Stations[j];
            if (s.Motor is null || s.Controller is null)
            {
                throw new ArgumentException($"station {j} has no {(s.Motor is null ? "motor" : "controller")} assigned.", nameof(rig));
            }
            Preconditions.Positive(s.Rotor.InertiaKgM2, $"rotor inertia of station {j}");
            _loads[j] = Preconditions.NotNull(loads[j], $"load of station {j}");
            _drives[j] = new Drivetrain(s.Motor, s.Controller, options);
            _windings[j] = WindingThermalNode.FromMotor(s.Motor);
            _plates[j] = PlatePatchThermalNode.UnderRotor(s.Rotor, rig.Plate, rig.PlateConvectionWPerM2K, plateSpreadingFactor);
            if (!peakCache.TryGetValue(_loads[j], out DragPeak? peak))
            {
                peak = TotalTorquePeak(_loads[j], rig.LandedGapM, rig.PlateTemperatureC, rig.AmbientC, s.Rotor.MaxSpeedRadPerS);
                peakCache[_loads[j]] = peak;
            }
            _peaks[j] = peak;
        }
        MassKg = rig.TotalMassKg;
        WeightN = MassKg * Units.StandardGravity;
        Hover = SolveHover();
        double damping = heaveDampingNsPerM ?? 2 * rig.Body.HeaveDampingRatio * Math.Sqrt(Math.Max(Hover.StiffnessNPerM, 0) * MassKg);
        HeaveDampingNsPerM = Preconditions.NonNegative(damping, nameof(heaveDampingNsPerM));
    }

    /// <summary>Prepares a rig, building one precomputed load table per distinct rotor design over the rig's range
    /// (<see cref="LoadTableRange.ForRig"/>).</summary>
    /// <param name="rig">The rig.</param>
    /// <param name="loadOptions">Load model settings, or null for the defaults.</param>
    /// <param name="heaveDampingNsPerM">A physical heave damper coefficient, N s/m, or null for the rig's damping ratio.</param>
    /// <param name="plateSpreadingFactor">Plate patch area / magnet annulus area, at least 1; default 1.</param>
    /// <exception cref="ArgumentNullException">The rig is null.</exception>
    /// <exception cref="ArgumentException">See the constructor.</exception>
    public static SimulationRig Build(Rig rig, LoadModelOptions? loadOptions = null, double? heaveDampingNsPerM = null, double plateSpreadingFactor = 1.0)
    {
        Preconditions.NotNull(rig, nameof(rig));
        var tables = new Dictionary<string, IRotorLoad>(StringComparer.Ordinal);
        var loads = new IRotorLoad[rig.Stations.Count];
        for (int j = 0; j < loads.Length; j++)
        {
            var rotor = rig.Stations[j].Rotor;
            if (!tables.TryGetValue(rotor.Id, out IRotorLoad? load))
            {
                load = RotorLoadTable.Build(rotor, rig.Plate, LoadTableRange.ForRig(rig, rotor), loadOptions);
                tables[rotor.Id] = load;
            }
            loads[j] = load;
        }
        return new SimulationRig(rig, loads, heaveDampingNsPerM, plateSpreadingFactor);
    }

    /// <summary>The rig.</summary>
    public Rig Rig { get; }

    /// <summary>Number of rotor stations.</summary>
    public int StationCount => _loads.Length;

    /// <summary>Load per station.</summary>
    public IReadOnlyList<IRotorLoad> Loads => _loads;

    /// <summary>Drivetrain per station (max duty from the rig's limits).</summary>
    public IReadOnlyList<Drivetrain> Drivetrains => _drives;

    /// <summary>Winding thermal node per station, or null where the motor row lacks thermal data.</summary>
    public IReadOnlyList<WindingThermalNode?> Windings => _windings;

    /// <summary>Plate patch thermal node per station.</summary>
    public IReadOnlyList<PlatePatchThermalNode> PlatePatches => _plates;

    /// <summary>Peak of the total load torque (eddy + windage + bearing) at the landed gap per station, at the rig's plate
    /// temperature with the magnets at ambient: the torque the motor must pass during spin-up.</summary>
    public IReadOnlyList<DragPeak> LandedDragPeaks => _peaks;

    /// <summary>The pack bank.</summary>
    public PackBank Packs { get; }

    /// <summary>Total craft mass, kg (body, payload, rotors, drivetrains, packs).</summary>
    public double MassKg { get; }

    /// <summary>Craft weight, N.</summary>
    public double WeightN { get; }

    /// <summary>Heave damping coefficient, N s/m.</summary>
    public double HeaveDampingNsPerM { get; }

    /// <summary>Common-speed hover at the design gap, rig plate temperature, magnets at ambient.</summary>
    public HoverEstimate Hover { get; }

    /// <summary>Total lift of all rotors at one common speed, N.</summary>
    /// <param name="speedRadPerS">Common speed, rad/s.</param>
    /// <param name="gapM">Air gap, m.</param>
    /// <param name="plateTempsC">Plate patch temperature per station, C, or null for the rig's plate temperature.</param>
    public double TotalLiftN(double speedRadPerS, double gapM, IReadOnlyList<double>? plateTempsC = null)
    {
        double lift = 0;
        for (int j = 0; j < _loads.Length; j++)
        {
            double tp = plateTempsC?[j] ?? Rig.PlateTemperatureC;
            lift += _loads[j].Evaluate(speedRadPerS, gapM, tp, Rig.AmbientC).LiftN;
        }
        return lift;
    }

    /// <summary>The common speed at which the rotors carry the weight at the design gap, rad/s, or null when the rated
    /// speed of the slowest-rated rotor is not enough.</summary>
    /// <param name="plateTempsC">Plate patch temperature per station, C, or null for the rig's plate temperature.</param>
    /// <param name="iterations">Lift evaluations made.</param>
    public double? CommonHoverSpeed(IReadOnlyList<double>? plateTempsC, out int iterations)
    {
        int count = 0;
        double top = MaxCommonSpeed();
        double F(double w)
        {
            count++;
            return TotalLiftN(w, Rig.DesignGapM, plateTempsC) - WeightN;
        }
        double? result = null;
        if (F(top) >= 0 && Brent.TryFindRoot(F, 1e-3 * top, top, 1e-10 * top, 200, out double root))
        {
            result = root;
        }
        iterations = count;
        return result;
    }

    /// <summary>The throttle per station that holds the common hover: the hover speed (speed hold) or the duty the
    /// controllers settle at (duty), from a bus solve with each motor carrying its rotor's load torque at that speed.</summary>
    /// <remarks>Duties depend on the pack's state of charge (its voltage) and are clamped to the rig's max duty; the load is
    /// evaluated at the rig's plate temperature with everything at ambient.</remarks>
    /// <param name="mode">Controller mode.</param>
    /// <param name="socFraction">Pack state of charge, 0..1.</param>
    /// <exception cref="ArgumentOutOfRangeException">The state of charge is outside [0, 1].</exception>
    public IReadOnlyList<double> HoverThrottle(ControllerMode mode, double socFraction)
    {
        Preconditions.InRange(socFraction, 0, 1, nameof(socFraction));
        int n = _loads.Length;
        var targets = new double[n];
        double w = Hover.SpeedRadPerS;
        if (mode == ControllerMode.SpeedHold)
        {
            Array.Fill(targets, w);
            return targets;
        }
        var inputs = new DriveInput[n];
        var points = new DrivePoint[n];
        double t = Rig.AmbientC;
        for (int j = 0; j < n; j++)
        {
            double torque = _loads[j].Evaluate(w, Rig.DesignGapM, Rig.PlateTemperatureC, t).TotalTorqueNm;
            double current = _drives[j].Motor.CurrentForTorqueA(torque, _drives[j].FluxFactorAt(t));
            inputs[j] = new DriveInput(_drives[j], DriveCommand.MotorCurrent(current), w, t, t, false);
        }
        DriveBus.Solve(BusSource.FromPack(Packs, socFraction), inputs, points);
        for (int j = 0; j < n; j++)
        {
            targets[j] = Math.Clamp(points[j].Duty, 0.0, Rig.Limits.MaxDuty);
        }
        return targets;
    }

    private double MaxCommonSpeed()
    {
        double top = double.MaxValue;
        foreach (var s in Rig.Stations)
        {
            top = Math.Min(top, s.Rotor.MaxSpeedRadPerS);
        }
        return top;
    }

    private HoverEstimate SolveHover()
    {
        double? speed = CommonHoverSpeed(null, out int iterations);
        double w = speed ?? MaxCommonSpeed();
        double g = Rig.DesignGapM, dg = 1e-3 * g;
        // Central difference of the total lift in the gap (the load tables are smooth cubic Hermite surfaces).
        double stiffness = -(TotalLiftN(w, g + dg) - TotalLiftN(w, g - dg)) / (2 * dg);
        return new HoverEstimate(speed is not null, w, TotalLiftN(w, g), WeightN, stiffness, iterations);
    }

    // The peak of the total shaft torque at the landed gap, searched below 3x the eddy peak so that windage rising at
    // top speed is not taken for the drag peak.
    private static DragPeak TotalTorquePeak(IRotorLoad load, double gapM, double plateTempC, double magnetTempC, double maxSpeedRadPerS)
    {
        DragPeak eddy = DragPeakFinder.Find(load, gapM, plateTempC, magnetTempC, maxSpeedRadPerS);
        if (eddy.Status is DragPeakStatus.NoDrag)
        {
            return eddy;
        }
        double top = Math.Min(maxSpeedRadPerS, 3 * eddy.SpeedRadPerS);
        return DragPeakFinder.Find(new TotalTorqueView(load), gapM, plateTempC, magnetTempC, top);
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

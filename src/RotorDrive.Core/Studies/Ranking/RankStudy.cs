using RotorDrive.Core.Craft;
using RotorDrive.Core.Drive;
using RotorDrive.Core.Loads;
using RotorDrive.Core.Magnetics;
using RotorDrive.Core.Safety;

namespace RotorDrive.Core.Studies.Ranking;

/// <summary>Ranks every motor x controller x pack (x pack count) from a catalog for a rig: the same motor and controller
/// at every station, the drivetrain's and packs' mass fed back into the craft, every rejection explained.</summary>
/// <remarks>
/// <para>Per combination: (1) static checks: the pack's cell count within the controller's range; a one-way controller
/// is a caution (or a rejection with <see cref="RankOptions.RequireReversible"/>). (2) Trimmed hover at the design gap
/// by the very speed solve of <see cref="HoverTrim"/> (least speed spread about the mean, KKT, Newton in speed space) on
/// the rig's <see cref="RigModel"/>, with the craft's mass and centre of gravity including this drivetrain and packs
/// (as <see cref="RigModel.WithParts(Motor, SpeedController)"/> and <see cref="RigModel.WithPacks"/> compute them). At a
/// fixed gap the speeds and shaft torques depend only on mass and centre of gravity, not on the motor, so the drivetrain
/// enters after the trim through the first-order motor model (M. Drela, "First-Order DC Electric Motor Model", MIT,
/// 2007): current I = Kv Q / phi + I0, back-EMF E = phi omega / Kv, and the averaged controller on the shared pack bus
/// (V = Voc - R_bank I_pack, duty d = (I R_loop + E) / V), the same equations <see cref="DriveBus"/> solves for
/// <see cref="HoverTrim.Solve(RigModel, HoverOptions)"/>. (3) Limits at hover: rotor rated speed, controller eRPM at the
/// hover speed, the retaining rings' hoop stress at the hover speeds (the hover review's rule, <see cref="RotorSafety"/>),
/// duty against the team's limit on a full pack, motor current and power, controller continuous current,
/// pack continuous current over the run. (4) Runtime: the pack is drawn down in equal charge steps over the usable
/// capacity (midpoint rule in charge: dt = dQ / I_pack), re-solving the bus at each state of charge, until the usable
/// capacity, the cutoff voltage or the duty limit ends it; temperatures stay at the rig's start values (no thermal drift:
/// the shortlist gets the full endurance simulation). (5) Spin-up through the drag peak, the quick filter: all rotors on
/// the landing gear at their drag-peak speed at the landed gap, full allowed duty, the controller's current limit, the
/// pack sagging under all of them (<see cref="DriveBus"/>); the motor torque must exceed the load torque there. At a
/// fixed duty and current limit the motor's torque does not rise with speed while the load torque rises up to its peak,
/// so passing the peak passes every lower speed too.</para>
/// <para>Speed: the sweep runs over chunks of one motor each, in parallel. Within a chunk the controllers, packs and
/// pack counts are visited in order of craft mass (the same order for every motor, since the motor adds the same mass
/// to all), and each trim is warm-started from the previous one; the trim's fixed point does not depend on its start, so
/// this changes the work, not the answer. Drag peaks are found once per station. Results are placed by index and reduced
/// in index order, so they do not depend on the thread count. <see cref="EvaluateDirect"/> is the straightforward path
/// (the candidate's <see cref="RigModel"/> variant through <see cref="HoverTrim.Solve(RigModel, HoverOptions)"/>, drag
/// peaks searched again, every bus state through <see cref="DriveBus"/>, margins through <see cref="DriveMargins"/>);
/// the tests check that both give the same ranking and figures.</para>
/// <para>Temperatures: plate at the rig's start temperature, magnets and windings at ambient. Thread-safe after
/// creation.</para>
/// </remarks>
public sealed partial class RankStudy
{
    private readonly Rig _rig;
    private readonly PartsCatalog _catalog;
    private readonly RankOptions _options;
    private readonly RankWeights _weights;
    private readonly RigModel _model;
    private readonly HoverOptions _hoverOptions;
    private readonly double[] _maxSpeed;
    private readonly double[] _ringSpeed;
    private readonly (int Controller, int Pack, int Count)[] _massOrder;
    private readonly int _maxPackCount;
    private readonly CellCurve[] _packCurves;
    private readonly double[][] _ocvGrid;
    private readonly DragPeak[] _peaks;
    private readonly double[] _peakLoadTorqueNm;
    private readonly int[] _motorOrder;
    private readonly int[] _controllerOrder;
    private readonly int[] _packOrder;

    private RankStudy(Rig rig, PartsCatalog catalog, RankOptions options, RigModel model)
    {
        _rig = rig;
        _catalog = catalog;
        _options = options;
        _weights = options.Weights ?? RankWeights.Default;
        _model = model;
        Loads = model.Stations.Select(s => s.Load).ToArray();
        _maxPackCount = options.MaxPackCount ?? rig.Packs?.Count ?? 1;
        _hoverOptions = HoverOptions.Default;
        _maxSpeed = rig.Stations.Select(s => s.Rotor.MaxSpeedRadPerS).ToArray();
        _ringSpeed = model.Stations.Select(s => RingSpeedRadPerS(s.Rotor, model.Options.Safety)).ToArray();
        _packCurves = PackCurves(catalog);
        _ocvGrid = new double[catalog.Packs.Count][];
        for (int p = 0; p < catalog.Packs.Count; p++)
        {
            _ocvGrid[p] = OcvGrid(_packCurves[p]);
        }
        int n = rig.Stations.Count;
        _peaks = new DragPeak[n];
        _peakLoadTorqueNm = new double[n];
        for (int i = 0; i < n; i++)
        {
            (_peaks[i], _peakLoadTorqueNm[i]) = FindPeak(i);
        }
        _motorOrder = OrdinalRanks(catalog.Motors.Select(m => m.Id).ToArray());
        _controllerOrder = OrdinalRanks(catalog.Controllers.Select(c => c.Id).ToArray());
        _packOrder = OrdinalRanks(catalog.Packs.Select(p => p.Id).ToArray());
        int stations = rig.Stations.Count;
        var order = new List<(int, int, int)>(catalog.Controllers.Count * catalog.Packs.Count * _maxPackCount);
        for (int c = 0; c < catalog.Controllers.Count; c++)
        {
            for (int p = 0; p < catalog.Packs.Count; p++)
            {
                for (int k = 1; k <= _maxPackCount; k++)
                {
                    order.Add((c, p, k));
                }
            }
        }
        double Added((int C, int P, int K) t) => stations * catalog.Controllers[t.C].MassKg + t.K * catalog.Packs[t.P].MassKg;
        _massOrder = order.OrderBy(Added).ThenBy(t => t.Item1).ThenBy(t => t.Item2).ThenBy(t => t.Item3).ToArray();
    }

    /// <summary>Prepares a ranking: builds one load table per station rotor (or takes the given loads), finds each
    /// station's drag peak at the landed gap, and reads the packs' voltage curves.</summary>
    /// <param name="rig">The rig (stations, body, gaps, limits); its assigned parts are only used to show their rank.</param>
    /// <param name="catalog">The parts to combine.</param>
    /// <param name="options">Settings, or null for <see cref="RankOptions.Default"/>.</param>
    /// <param name="stationLoads">One rotor load per station, or null to build the load tables analyses use
    /// (<see cref="RotorLoadTable"/> over <see cref="Rig.LoadTableRangeFor"/>, one per distinct rotor design).</param>
    /// <returns>The prepared study.</returns>
    /// <exception cref="ArgumentNullException">The rig or the catalog is null.</exception>
    /// <exception cref="ArgumentException">The loads do not match the stations, or a pack's chemistry has no curve.</exception>
    /// <exception cref="ArgumentOutOfRangeException">An option is out of range.</exception>
    public static RankStudy Create(Rig rig, PartsCatalog catalog, RankOptions? options = null, IReadOnlyList<IRotorLoad>? stationLoads = null)
    {
        Preconditions.NotNull(rig, nameof(rig));
        Preconditions.NotNull(catalog, nameof(catalog));
        options ??= RankOptions.Default;
        Preconditions.InRange(options.Top, 1, 1000, nameof(options.Top));
        Preconditions.InRange(options.RuntimeSteps, 4, 4096, nameof(options.RuntimeSteps));
        if (options.MaxPackCount is { } maxCount)
        {
            Preconditions.InRange(maxCount, 1, 64, nameof(options.MaxPackCount));
        }
        if (options.MaxDegreeOfParallelism == 0 || options.MaxDegreeOfParallelism < -1)
        {
            throw new ArgumentOutOfRangeException(nameof(options), options.MaxDegreeOfParallelism, "MaxDegreeOfParallelism must be -1 (all cores) or at least 1.");
        }
        var weights = options.Weights ?? RankWeights.Default;
        Preconditions.NonNegative(weights.Runtime, "runtime weight");
        Preconditions.NonNegative(weights.Mass, "mass weight");
        Preconditions.NonNegative(weights.Margin, "margin weight");
        Preconditions.Positive(weights.Total, "sum of the weights");
        if (rig.Stations.Count < 4)
        {
            throw new ArgumentException($"A trimmed hover needs at least four stations to balance force, pitch, roll and yaw; the rig has {rig.Stations.Count}.", nameof(rig));
        }
        if (catalog.Motors.Count == 0 || catalog.Controllers.Count == 0 || catalog.Packs.Count == 0)
        {
            throw new ArgumentException("The catalog needs at least one motor, one controller and one pack to rank.", nameof(catalog));
        }
        // The rig as analyses see it (RigModel: the same load tables as the hover command builds); its stations' parts
        // are placeholders, the first of the catalog, replaced per candidate.
        var curves = PackCurves(catalog);
        var placeholder = rig with
        {
            Stations = rig.Stations.Select(s => s with { Motor = catalog.Motors[0], Controller = catalog.Controllers[0] }).ToArray(),
            Packs = new PackBank(catalog.Packs[0], 1, curves[0]),
        };
        RigModel model;
        if (stationLoads is null)
        {
            model = RigModel.Build(placeholder);
        }
        else
        {
            if (stationLoads.Count != rig.Stations.Count || stationLoads.Any(l => l is null))
            {
                throw new ArgumentException($"Give one rotor load per station ({rig.Stations.Count}); got {stationLoads.Count}.", nameof(stationLoads));
            }
            model = RigModel.Build(placeholder, stationLoads);
        }
        return new RankStudy(rig, catalog, options, model);
    }

    /// <summary>The rig.</summary>
    public Rig Rig => _rig;

    /// <summary>The catalog.</summary>
    public PartsCatalog Catalog => _catalog;

    /// <summary>The settings.</summary>
    public RankOptions Options => _options;

    /// <summary>The rig model of the study (its stations' parts are placeholders; see <see cref="ModelFor"/>).</summary>
    public RigModel Model => _model;

    /// <summary>The rig model of one candidate: every station with its motor and controller, its packs on the bus — the
    /// model on which <see cref="HoverTrim.Solve(RigModel, HoverOptions)"/> gives the hover this ranking reports.</summary>
    /// <param name="candidate">The combination.</param>
    /// <exception cref="ArgumentOutOfRangeException">An index is out of range.</exception>
    public RigModel ModelFor(RankCandidate candidate)
    {
        CheckCandidate(candidate);
        return _model
            .WithParts(_catalog.Motors[candidate.MotorIndex], _catalog.Controllers[candidate.ControllerIndex])
            .WithPacks(new PackBank(_catalog.Packs[candidate.PackIndex], candidate.PackCount, _packCurves[candidate.PackIndex]));
    }

    /// <summary>The rotor load of each station.</summary>
    public IReadOnlyList<IRotorLoad> Loads { get; }

    /// <summary>The drag peak of each station at the landed gap (plate at its start temperature, magnets at ambient).</summary>
    public IReadOnlyList<DragPeak> DragPeaks => _peaks;

    /// <summary>Largest pack count tried.</summary>
    public int MaxPackCount => _maxPackCount;

    /// <summary>Number of combinations: motors x controllers x packs x pack counts.</summary>
    public long CombinationCount => (long)_catalog.Motors.Count * _catalog.Controllers.Count * _catalog.Packs.Count * _maxPackCount;

    /// <summary>The rig's own drivetrain as a candidate: every station with the same motor and controller, and a pack
    /// named; null otherwise (or when its pack count is above <see cref="MaxPackCount"/>).</summary>
    public RankCandidate? AssignedCandidate => CandidateOf(_rig);

    /// <summary>The drivetrain a rig carries as a candidate of this study's sweep: every station with the same motor and
    /// controller from this catalog, and a pack from it; null otherwise (or when its pack count is above
    /// <see cref="MaxPackCount"/>). Lets a caller place a rig edited after the run (a pick applied) in the ranking.</summary>
    /// <param name="rig">A rig, typically this study's rig with other parts assigned.</param>
    /// <exception cref="ArgumentNullException">The rig is null.</exception>
    public RankCandidate? CandidateOf(Rig rig)
    {
        Preconditions.NotNull(rig, nameof(rig));
        if (rig.Stations.Count == 0)
        {
            return null;
        }
        var first = rig.Stations[0];
        if (first.Motor is null || first.Controller is null || rig.Packs is null || rig.Packs.Count > _maxPackCount)
        {
            return null;
        }
        if (rig.Stations.Any(s => !Equals(s.Motor, first.Motor) || !Equals(s.Controller, first.Controller)))
        {
            return null;
        }
        int m = IndexOf(_catalog.Motors, first.Motor);
        int c = IndexOf(_catalog.Controllers, first.Controller);
        int p = IndexOf(_catalog.Packs, rig.Packs.Pack);
        return m < 0 || c < 0 || p < 0 ? null : new RankCandidate(m, c, p, rig.Packs.Count);
    }

    private static int IndexOf<T>(IReadOnlyList<T> list, T item)
    {
        for (int i = 0; i < list.Count; i++)
        {
            if (Equals(list[i], item))
            {
                return i;
            }
        }
        return -1;
    }

    /// <summary>Flat index of a candidate in the sweep (motor outermost, then controller, pack, pack count).</summary>
    /// <param name="candidate">The candidate.</param>
    public long IndexOf(RankCandidate candidate)
        => (((long)candidate.MotorIndex * _catalog.Controllers.Count + candidate.ControllerIndex) * _catalog.Packs.Count + candidate.PackIndex) * _maxPackCount + candidate.PackCount - 1;

    /// <summary>The candidate at a flat index of the sweep.</summary>
    /// <param name="index">0 to <see cref="CombinationCount"/> - 1.</param>
    public RankCandidate CandidateAt(long index)
    {
        int count = (int)(index % _maxPackCount) + 1;
        index /= _maxPackCount;
        int p = (int)(index % _catalog.Packs.Count);
        index /= _catalog.Packs.Count;
        int c = (int)(index % _catalog.Controllers.Count);
        int m = (int)(index / _catalog.Controllers.Count);
        return new RankCandidate(m, c, p, count);
    }

    private void CheckCandidate(RankCandidate c)
    {
        Preconditions.InRange(c.MotorIndex, 0, _catalog.Motors.Count - 1, "motor index");
        Preconditions.InRange(c.ControllerIndex, 0, _catalog.Controllers.Count - 1, "controller index");
        Preconditions.InRange(c.PackIndex, 0, _catalog.Packs.Count - 1, "pack index");
        Preconditions.InRange(c.PackCount, 1, 64, "pack count");
    }

    // States of charge of the runtime steps: the midpoint and the end of each of K equal charge steps.
    private double SocAt(int half) => 1.0 - half * 0.5 * _rig.Limits.UsableCapacityFraction / _options.RuntimeSteps;

    private double[] OcvGrid(CellCurve curve)
    {
        int halves = 2 * _options.RuntimeSteps + 1;
        var grid = new double[halves];
        for (int h = 0; h < halves; h++)
        {
            grid[h] = curve.OcvAt(Math.Max(0.0, SocAt(h)));
        }
        return grid;
    }

    // The speed at which a rotor's retaining ring reaches its allowable hoop stress, by the hover review's own check
    // (RotorSafety.Assess, stress = k omega^2, so omega_allow = omega sqrt(allowable / stress) from any speed): a trimmed
    // speed above it is the review's retainer_stress failure. Infinite when the rotor row lacks the ring's data (the
    // review then has nothing to fail either).
    private static double RingSpeedRadPerS(RotorDesign rotor, RotorSafetyOptions safety)
        => RotorSafety.Assess(rotor, rotor.MaxSpeedRadPerS, safety).SpeedAtAllowableRadPerS ?? double.PositiveInfinity;

    // The hover review's retainer rule at one station and speed (RotorSafety.Assess, margin below zero), for the direct
    // evaluation (the review assesses only the rotors that turn); the fast kernel compares the speed with RingSpeedRadPerS instead.
    private bool RingOverAllowable(int station, double speedRadPerS)
        => speedRadPerS > 0 && RotorSafety.Assess(_model.Stations[station].Rotor, speedRadPerS, _model.Options.Safety).MarginFraction is < 0;

    private (DragPeak Peak, double LoadTorqueNm) FindPeak(int station)
    {
        var rotor = _rig.Stations[station].Rotor;
        var load = Loads[station];
        var peak = DragPeakFinder.Find(load, _rig.LandedGapM, _rig.PlateTemperatureC, _rig.AmbientC, rotor.MaxSpeedRadPerS);
        double torque = peak.Status == DragPeakStatus.NoDrag
            ? 0.0
            : load.Evaluate(peak.SpeedRadPerS, _rig.LandedGapM, _rig.PlateTemperatureC, _rig.AmbientC).TotalTorqueNm;
        return (peak, torque);
    }

    // Craft mass and centre of gravity with this drivetrain at every station and these packs: the arithmetic of
    // RigModel's constructor, in its order, so that the trim sees the very numbers the candidate's model variant has.
    private (double MassKg, double CgXM, double CgYM) MassAndCg(double drivetrainKg, double packsKg)
    {
        var body = _rig.Body;
        double bodyMass = body.EmptyMassKg + body.PayloadKg + packsKg;
        double m = bodyMass, mx = bodyMass * body.CgXM, my = bodyMass * body.CgYM;
        foreach (var s in _model.Stations)
        {
            double ms = s.Rotor.RotorMassKg + drivetrainKg;
            m += ms;
            mx += ms * s.XM;
            my += ms * s.YM;
        }
        return (m, mx / m, my / m);
    }

    private static CellCurve[] PackCurves(PartsCatalog catalog)
    {
        var curves = new CellCurve[catalog.Packs.Count];
        for (int p = 0; p < curves.Length; p++)
        {
            var pack = catalog.Packs[p];
            curves[p] = catalog.CurveFor(pack.Chemistry)
                ?? throw new ArgumentException($"The catalog has no open-circuit voltage curve for pack {pack.Id}'s chemistry '{pack.Chemistry}'.", nameof(catalog));
        }
        return curves;
    }

    private static int[] OrdinalRanks(string[] ids)
    {
        var order = Enumerable.Range(0, ids.Length).OrderBy(i => ids[i], StringComparer.Ordinal).ThenBy(i => i).ToArray();
        var ranks = new int[ids.Length];
        for (int r = 0; r < order.Length; r++)
        {
            ranks[order[r]] = r;
        }
        return ranks;
    }
}

using RotorDrive.Core.Craft;
using RotorDrive.Core.Drive;
using RotorDrive.Core.Loads;
using RotorDrive.Core.Magnetics;
using RotorDrive.Core.Simulation;

namespace RotorDrive.Core.Studies.Stress;

/// <summary>The built-in stress model of a rig: every sample is a variant of the nominal <see cref="RigModel"/> with its
/// drawn parts, run through the same analyses as the spinup, hover and yaw commands.</summary>
/// <remarks>
/// <para>A sample's variant (<see cref="Variant"/>): per station, the motor with its drawn Kv, winding resistance and
/// no-load current and the controller's drawn current limit (<see cref="DriveOptions.CurrentLimitScale"/>), the drawn gap
/// offset, plate temperature and ambient (windings and magnets) in its <see cref="StationConditions"/>, and its load
/// wrapped for the drawn remanence, plate conductivity and plate thickness over the shared tables; for the rig, the
/// drawn payload, centre-of-gravity offset, state of charge and pack resistance. Quantities that keep their nominal
/// value leave the nominal model untouched, so with no spread a sample is the nominal model itself.</para>
/// <para>Load tables: the nominal model's (one per rotor design). The plate thickness changes the plate's response
/// itself, so when it varies two more tables per rotor are built at plus and minus a step h (three standard deviations of
/// a normal spread, the larger bound of a uniform one, at most half the thickness) over the nominal table's range, and
/// a sample's loads are interpolated between the three (see the load wrapper's three-point Lagrange rule).</para>
/// <para>Thread safety: the model is immutable; <see cref="CreateEvaluator"/> gives each worker its own evaluator.</para>
/// </remarks>
public sealed class RigStressModel : IStressModel
{
    private readonly Dictionary<IRotorLoad, (TabulatedRotorLoad Thinner, TabulatedRotorLoad Thicker)> _thicknessTables = new(ReferenceEqualityComparer.Instance);
    private readonly bool _wrapsLoads;

    /// <summary>Builds the nominal rig model (<see cref="RigModel.Build(Rig, RigModelOptions?)"/>) and the stress model on it.</summary>
    /// <param name="rig">The nominal rig; every station needs a motor and a controller, and the rig a pack.</param>
    /// <param name="tolerances">The spreads.</param>
    /// <param name="options">Settings; null for <see cref="StressModelOptions.Default"/>.</param>
    /// <exception cref="ArgumentNullException">An argument is null.</exception>
    /// <exception cref="ArgumentException">A drivetrain part is missing, or a spread breaks <see cref="StressSpreadRule"/>.</exception>
    /// <exception cref="ArgumentOutOfRangeException">An option is out of range.</exception>
    public RigStressModel(Rig rig, StressTolerances tolerances, StressModelOptions? options = null)
        : this(RigModel.Build(Preconditions.NotNull(rig, nameof(rig))), tolerances, options)
    {
    }

    /// <summary>Builds the stress model on a prepared nominal model (for example the one the hover command uses).</summary>
    /// <param name="nominal">The nominal rig model; its stations' loads must be precomputed tables when the plate or the
    /// magnets vary.</param>
    /// <param name="tolerances">The spreads.</param>
    /// <param name="options">Settings; null for <see cref="StressModelOptions.Default"/>.</param>
    /// <exception cref="ArgumentNullException">An argument is null.</exception>
    /// <exception cref="ArgumentException">A spread breaks <see cref="StressSpreadRule"/>, or the plate or magnets vary over
    /// a load that is not a precomputed table.</exception>
    /// <exception cref="ArgumentOutOfRangeException">An option is out of range.</exception>
    public RigStressModel(RigModel nominal, StressTolerances tolerances, StressModelOptions? options = null)
    {
        Nominal = Preconditions.NotNull(nominal, nameof(nominal));
        Preconditions.NotNull(tolerances, nameof(tolerances));
        Rig = nominal.Rig;
        Options = options ?? StressModelOptions.Default;
        Preconditions.NonNegative(Options.RampTimeS, nameof(Options.RampTimeS));
        Preconditions.InRange(Options.RelativeTolerance, 1e-10, 0.1, nameof(Options.RelativeTolerance));
        Preconditions.Positive(Options.AbsoluteToleranceRadPerS, nameof(Options.AbsoluteToleranceRadPerS));
        Preconditions.Positive(Options.MaxStepS, nameof(Options.MaxStepS));
        Preconditions.Positive(Options.OutputIntervalS, nameof(Options.OutputIntervalS));
        var broken = StressSpreadRule.Check(Rig, tolerances);
        if (broken.Count > 0)
        {
            var v = broken[0];
            throw new ArgumentException($"the spread of {v.Quantity.Key()} can make the {v.Checked} {(v.ZeroAllowed ? "negative" : "zero or negative")} "
                + $"(it reaches {v.LowestSi:G6} {v.Quantity.SiUnit()} from {v.NominalSi:G6}); see StressSpreadRule.", nameof(tolerances));
        }
        _wrapsLoads = tolerances.Of(StressQuantity.PlateThickness).Shape != ToleranceShape.None
            || tolerances.Of(StressQuantity.PlateConductivity).Shape != ToleranceShape.None
            || tolerances.Of(StressQuantity.MagnetRemanence).Shape != ToleranceShape.None;
        ThicknessStepM = SpreadStep(tolerances.Of(StressQuantity.PlateThickness), Rig.Plate.ThicknessM);
        foreach (var station in nominal.Stations)
        {
            if (!_wrapsLoads)
            {
                break;
            }
            if (station.Load is not TabulatedRotorLoad table)
            {
                throw new ArgumentException("the plate or the magnets vary, which the stress model applies over precomputed load tables; "
                    + $"station loads of type {station.Load.GetType().Name} cannot be varied.", nameof(nominal));
            }
            if (ThicknessStepM > 0 && !_thicknessTables.ContainsKey(table))
            {
                var plate = table.Direct.Plate;
                var load = table.Direct.Options;
                _thicknessTables[table] = (
                    RotorLoadTable.Build(table.Direct.Rotor, plate with { ThicknessM = plate.ThicknessM - ThicknessStepM }, table.Range, load),
                    RotorLoadTable.Build(table.Direct.Rotor, plate with { ThicknessM = plate.ThicknessM + ThicknessStepM }, table.Range, load));
            }
        }
        Simulation = SimulationRig.FromModel(nominal, new SimulationRigOptions(Hover: Options.Hover));
    }

    /// <summary>The nominal rig.</summary>
    public Rig Rig { get; }

    /// <summary>The rig's pack bank (nominal).</summary>
    public PackBank Packs => Nominal.Packs;

    /// <summary>The nominal rig model every sample is a variant of.</summary>
    public RigModel Nominal { get; }

    /// <summary>The nominal model prepared for time simulations; each sample's is derived from it
    /// (<see cref="SimulationRig.With"/>).</summary>
    public SimulationRig Simulation { get; }

    /// <summary>The settings.</summary>
    public StressModelOptions Options { get; }

    /// <summary>Thickness step h between the three tables, m; 0 when the thickness does not vary (one table).</summary>
    public double ThicknessStepM { get; }

    /// <summary>A new evaluator for one worker thread.</summary>
    public IStressEvaluator CreateEvaluator() => new RigStressEvaluator(this);

    /// <summary>The rig model of a sample: the nominal model with the sample's drawn parts (see the remarks).</summary>
    /// <param name="parts">The sample's parts (<see cref="StressSampler.Draw"/>).</param>
    /// <exception cref="ArgumentNullException"><paramref name="parts"/> is null.</exception>
    /// <exception cref="ArgumentException">The parts have another station count than the rig.</exception>
    public RigModel Variant(StressParts parts)
    {
        Preconditions.NotNull(parts, nameof(parts));
        var model = Nominal;
        if (parts.Stations.Count != model.Stations.Count)
        {
            throw new ArgumentException($"the parts have {parts.Stations.Count} stations; the rig has {model.Stations.Count}.", nameof(parts));
        }
        var plate = Rig.Plate;
        bool plateVaries = parts.PlateThicknessM != plate.ThicknessM || parts.PlateConductivitySPerM != plate.Material.ConductivitySPerM;
        for (int i = 0; i < model.Stations.Count; i++)
        {
            var s = model.Stations[i];
            var p = parts.Stations[i];
            var station = s;
            var dt = s.Drivetrain;
            var motor = dt.Motor;
            double limitScale = p.CurrentLimitA / dt.Controller.BurstCurrentA;
            if (p.KvRadPerSPerV != motor.KvRadPerSPerV || p.ResistanceOhm != motor.ResistanceOhm || p.NoLoadCurrentA != motor.NoLoadCurrentA
                || limitScale != dt.Options.CurrentLimitScale)
            {
                motor = motor with { KvRadPerSPerV = p.KvRadPerSPerV, ResistanceOhm = p.ResistanceOhm, NoLoadCurrentA = p.NoLoadCurrentA };
                station = station with { Drivetrain = new Drivetrain(motor, dt.Controller, dt.Options with { CurrentLimitScale = limitScale }) };
            }
            var conditions = new StationConditions(p.GapOffsetM, parts.PlateTempC, parts.AmbientC, parts.AmbientC, parts.AmbientC);
            if (conditions != s.Conditions)
            {
                station = station with { Conditions = conditions };
            }
            if ((plateVaries || p.RemanenceT != s.Rotor.RemanenceT) && s.Load is TabulatedRotorLoad table)
            {
                var extra = _thicknessTables.TryGetValue(table, out var pair) ? pair : default;
                station = station with
                {
                    Load = new SpreadRotorLoad(table, extra.Thinner, extra.Thicker, ThicknessStepM, parts.PlateThicknessM, parts.PlateConductivitySPerM, p.RemanenceT),
                };
            }
            if (!ReferenceEquals(station, s))
            {
                model = model.WithStation(i, station);
            }
        }
        if (parts.PayloadKg != model.PayloadKg)
        {
            model = model.WithPayload(parts.PayloadKg);
        }
        if (parts.CgOffsetXM != 0 || parts.CgOffsetYM != 0)
        {
            model = model.WithCentreOfGravityOffset(parts.CgOffsetXM, parts.CgOffsetYM);
        }
        if (parts.SocFraction != model.SocFraction)
        {
            model = model.WithSoc(parts.SocFraction);
        }
        if (parts.PackResistanceOhm != model.Packs.ResistanceOhm)
        {
            // Bank resistance = cells in series x cell resistance / cells in parallel / packs in parallel.
            var bank = model.Packs;
            double cell = parts.PackResistanceOhm * bank.Count * bank.Pack.CellsParallel / bank.Pack.CellsSeries;
            model = model.WithPacks(bank with { Pack = bank.Pack with { CellResistanceOhm = cell } });
        }
        return model;
    }

    private static double SpreadStep(Tolerance t, double nominal)
    {
        double unit = t.Scale == ToleranceScale.Percent ? nominal / 100.0 : 1.0;
        double step = t.Shape switch
        {
            ToleranceShape.Normal => 3 * t.StandardDeviation * unit,
            ToleranceShape.Uniform => Math.Max(Math.Abs(t.Lower), Math.Abs(t.Upper)) * unit,
            _ => 0,
        };
        // Keep the thinnest table above zero thickness.
        return Math.Min(step, 0.5 * nominal);
    }
}

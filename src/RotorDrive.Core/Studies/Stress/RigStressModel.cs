using RotorDrive.Core.Craft;
using RotorDrive.Core.Loads;
using RotorDrive.Core.Magnetics;

namespace RotorDrive.Core.Studies.Stress;

/// <summary>The built-in stress model of a rig: load tables built once and shared by every worker's evaluator, which
/// runs a spin-up at the landed gap and a trimmed hover at the design gap for each sample's parts.</summary>
/// <remarks>
/// <para>Load tables: one table per rotor design over the rig's plate (<see cref="RotorLoadTable"/>), covering the
/// drawn conductivities and temperatures through its sigma omega axis (forces depend on sigma and omega only through
/// their product; ../DESIGN.md §4.3) and the drawn remanence through the (Br/Br20)^2 scaling of the layer model. The plate
/// thickness changes the plate's response itself, so when it varies three tables are built, at the nominal thickness and
/// at plus and minus a spread step h (three standard deviations of a normal spread, the half-width of a uniform one),
/// and a sample's loads are interpolated between them by the three-point Lagrange formula in thickness (error of order
/// h^3 times the third thickness derivative; M. Abramowitz and I. A. Stegun, "Handbook of Mathematical Functions", 1964,
/// 25.2.11).</para>
/// <para>Thread safety: the model is immutable; <see cref="CreateEvaluator"/> gives each worker its own evaluator.</para>
/// </remarks>
public sealed class RigStressModel : IStressModel
{
    private readonly Dictionary<RotorDesign, TabulatedRotorLoad[]> _tables = new(ReferenceEqualityComparer.Instance);

    /// <summary>Builds the load tables for a rig and its tolerances.</summary>
    /// <param name="rig">The nominal rig; every station needs a motor and a controller, and the rig a pack.</param>
    /// <param name="tolerances">The spreads (the plate thickness spread decides how many tables are built).</param>
    /// <param name="options">Settings; null for <see cref="StressModelOptions.Default"/>.</param>
    /// <exception cref="ArgumentNullException">The rig or tolerances are null.</exception>
    /// <exception cref="ArgumentException">A drivetrain part is missing.</exception>
    /// <exception cref="ArgumentOutOfRangeException">An option is out of range.</exception>
    public RigStressModel(Rig rig, StressTolerances tolerances, StressModelOptions? options = null)
    {
        Rig = Preconditions.NotNull(rig, nameof(rig));
        Preconditions.NotNull(tolerances, nameof(tolerances));
        Packs = StressSampler.RequireParts(rig);
        Options = options ?? StressModelOptions.Default;
        Preconditions.NonNegative(Options.RampTimeS, nameof(Options.RampTimeS));
        Preconditions.InRange(Options.RelativeTolerance, 1e-10, 0.1, nameof(Options.RelativeTolerance));
        Preconditions.Positive(Options.AbsoluteToleranceRadPerS, nameof(Options.AbsoluteToleranceRadPerS));
        Preconditions.Positive(Options.MaxStepS, nameof(Options.MaxStepS));

        ThicknessStepM = SpreadStep(tolerances.Of(StressQuantity.PlateThickness), rig.Plate.ThicknessM);
        var thicknesses = ThicknessStepM > 0
            ? new[] { rig.Plate.ThicknessM - ThicknessStepM, rig.Plate.ThicknessM, rig.Plate.ThicknessM + ThicknessStepM }
            : new[] { rig.Plate.ThicknessM };
        double freeSpeed = rig.Stations.Max(s => s.Motor!.KvRadPerSPerV * 1.25) * Packs.OpenCircuitVoltageAt(1.0);
        foreach (var station in rig.Stations)
        {
            var rotor = station.Rotor;
            if (_tables.ContainsKey(rotor))
            {
                continue;
            }
            var range = Range(rig, rotor, freeSpeed);
            _tables[rotor] = thicknesses.Select(d => RotorLoadTable.Build(rotor, new Plate(rig.Plate.Material, d), range)).ToArray();
        }
    }

    /// <summary>The nominal rig.</summary>
    public Rig Rig { get; }

    /// <summary>The rig's pack bank.</summary>
    public PackBank Packs { get; }

    /// <summary>The settings.</summary>
    public StressModelOptions Options { get; }

    /// <summary>Thickness step h between the three tables, m; 0 when the thickness does not vary (one table).</summary>
    public double ThicknessStepM { get; }

    /// <summary>A new evaluator for one worker thread.</summary>
    public IStressEvaluator CreateEvaluator() => new RigStressEvaluator(this);

    /// <summary>The tables of a rotor design: one, or three at thickness - h, nominal, + h.</summary>
    internal TabulatedRotorLoad[] TablesFor(RotorDesign rotor) => _tables[rotor];

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

    // The rig's range, widened: speeds to the drivetrain's free speed on a charged pack (with Kv spread), gaps to cover
    // gap offsets, and a colder plate so that conductivity spreads of up to +25 % stay inside the table.
    private static LoadTableRange Range(Rig rig, RotorDesign rotor, double freeSpeed)
    {
        var range = LoadTableRange.ForRig(rig, rotor);
        double alpha = rig.Plate.Material.TempCoeffPerK;
        double cold = alpha > 0 ? Math.Min(range.MinPlateTempC, 20 - 0.2 / alpha) : range.MinPlateTempC;
        return range with
        {
            MaxSpeedRadPerS = Math.Max(range.MaxSpeedRadPerS, freeSpeed),
            MinGapM = 0.25 * rig.LandedGapM,
            MinPlateTempC = cold,
        };
    }
}

namespace RotorDrive.Core.Studies.Stress;

/// <summary>The tolerance of every quantity a stress test varies, in SI units for absolute spreads; quantities not
/// listed do not vary.</summary>
/// <remarks>Immutable and thread-safe. Absolute spreads are in the quantity's SI unit (<see cref="StressQuantities.SiUnit"/>):
/// metres for gap and centre-of-gravity offsets and plate thickness, kelvin for temperatures, a fraction for the state of
/// charge; percent spreads are relative to each part's nominal value.</remarks>
public sealed record StressTolerances
{
    private readonly Dictionary<StressQuantity, Tolerance> _map;

    /// <summary>Creates the set.</summary>
    /// <param name="tolerances">Tolerance per quantity; absent quantities do not vary.</param>
    /// <exception cref="ArgumentNullException">The map or one of its tolerances is null.</exception>
    /// <exception cref="ArgumentException">A percent spread is given for a quantity that takes only absolute spreads.</exception>
    public StressTolerances(IReadOnlyDictionary<StressQuantity, Tolerance> tolerances)
    {
        Preconditions.NotNull(tolerances, nameof(tolerances));
        _map = new Dictionary<StressQuantity, Tolerance>();
        foreach (var (quantity, tolerance) in tolerances)
        {
            Preconditions.NotNull(tolerance, nameof(tolerances));
            if (quantity.IsAbsoluteOnly() && tolerance.Shape != ToleranceShape.None && tolerance.Scale == ToleranceScale.Percent)
            {
                throw new ArgumentException($"{quantity.Key()} takes only absolute spreads.", nameof(tolerances));
            }
            _map[quantity] = tolerance;
        }
    }

    /// <summary>No quantity varies: every sample equals the nominal rig.</summary>
    public static StressTolerances None { get; } = new(new Dictionary<StressQuantity, Tolerance>());

    /// <summary>The tolerance of a quantity, <see cref="Tolerance.None"/> when it does not vary.</summary>
    /// <param name="quantity">The quantity.</param>
    public Tolerance Of(StressQuantity quantity) => _map.TryGetValue(quantity, out var t) ? t : Tolerance.None;

    /// <summary>The quantities that vary (a tolerance with a shape other than none), in draw order.</summary>
    public IReadOnlyList<StressQuantity> Varied => StressQuantities.All.Where(q => Of(q).Shape != ToleranceShape.None).ToArray();

    /// <summary>A copy with one quantity's tolerance replaced (used by editors and tests).</summary>
    /// <param name="quantity">The quantity.</param>
    /// <param name="tolerance">Its new tolerance.</param>
    public StressTolerances With(StressQuantity quantity, Tolerance tolerance)
    {
        var copy = new Dictionary<StressQuantity, Tolerance>(_map) { [quantity] = Preconditions.NotNull(tolerance, nameof(tolerance)) };
        return new StressTolerances(copy);
    }

    /// <inheritdoc/>
    public bool Equals(StressTolerances? other)
        => other is not null && StressQuantities.All.All(q => Of(q) == other.Of(q));

    /// <inheritdoc/>
    public override int GetHashCode() => _map.Count;
}

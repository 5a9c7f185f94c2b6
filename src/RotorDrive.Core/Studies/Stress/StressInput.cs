namespace RotorDrive.Core.Studies.Stress;

/// <summary>One drawn input of a stress study: a quantity, at a station for per-station quantities.</summary>
/// <param name="Quantity">The quantity.</param>
/// <param name="Station">The station index for a per-station quantity, or null for a rig-wide one.</param>
public sealed record StressInput(StressQuantity Quantity, int? Station)
{
    /// <summary>A stable name, e.g. "motor_kv[2]" (stations counted from 1) or "payload".</summary>
    public string Name => Station is { } s ? $"{Quantity.Key()}[{s + 1}]" : Quantity.Key();

    /// <summary>The input's value in a sample, in SI units.</summary>
    /// <param name="parts">The sample's parts.</param>
    public double ValueIn(StressParts parts) => parts.Value(Quantity, Station ?? 0);

    /// <summary>The inputs that vary under a set of tolerances, in draw order.</summary>
    /// <param name="tolerances">The tolerances.</param>
    /// <param name="stations">Number of stations.</param>
    public static IReadOnlyList<StressInput> Varied(StressTolerances tolerances, int stations)
    {
        Preconditions.NotNull(tolerances, nameof(tolerances));
        var list = new List<StressInput>();
        for (int s = 0; s < stations; s++)
        {
            foreach (var q in StressQuantities.PerStation)
            {
                if (tolerances.Of(q).Shape != ToleranceShape.None)
                {
                    list.Add(new StressInput(q, s));
                }
            }
        }
        foreach (var q in StressQuantities.RigWide)
        {
            if (tolerances.Of(q).Shape != ToleranceShape.None)
            {
                list.Add(new StressInput(q, null));
            }
        }
        return list;
    }
}

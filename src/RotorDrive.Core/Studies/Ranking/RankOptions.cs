namespace RotorDrive.Core.Studies.Ranking;

/// <summary>Settings of a catalog ranking.</summary>
/// <param name="Objective">What to rank by (default <see cref="RankObjective.Runtime"/>).</param>
/// <param name="Weights">Score weights, used by <see cref="RankObjective.Score"/> and reported always; null for
/// <see cref="RankWeights.Default"/>.</param>
/// <param name="Top">The shortlist: how many of the best combinations to evaluate fully and simulate (spin-up and
/// endurance), 1..1000 (default 10).</param>
/// <param name="MaxPackCount">Largest number of identical packs in parallel to try (1 up to this); null takes the rig's
/// <c>pack.count</c>, or 1 when the rig names no pack.</param>
/// <param name="RequireReversible">True rejects controllers that are not reversible. Default false: a fixed spin
/// direction is set by the motor wiring (swap two phases), so a one-way controller turns either rotor of a
/// counter-rotating pair; what it cannot do is reverse-brake a spinning rotor, which is then only a caution.</param>
/// <param name="MaxDegreeOfParallelism">Worker threads, -1 for all cores (default). Results do not depend on it.</param>
/// <param name="RuntimeSteps">Equal charge steps over the usable capacity in the runtime estimate, 4..4096 (default 32).</param>
public sealed record RankOptions(
    RankObjective Objective = RankObjective.Runtime,
    RankWeights? Weights = null,
    int Top = 10,
    int? MaxPackCount = null,
    bool RequireReversible = false,
    int MaxDegreeOfParallelism = -1,
    int RuntimeSteps = 32)
{
    /// <summary>The defaults.</summary>
    public static RankOptions Default { get; } = new();
}

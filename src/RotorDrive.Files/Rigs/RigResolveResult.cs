using RotorDrive.Core.Craft;
using RotorDrive.Core.Studies.Stress;

namespace RotorDrive.Files.Rigs;

/// <summary>A rig document turned into the Core <see cref="Core.Craft.Rig"/>, or the problems that prevented it.</summary>
/// <param name="Rig">The rig in SI units; null whenever <paramref name="Problems"/> is not empty.</param>
/// <param name="Problems">Every problem found (missing keys, values out of range, unknown ids).</param>
public sealed record RigResolveResult(Rig? Rig, IReadOnlyList<InputProblem> Problems)
{
    /// <summary>The part spreads of the "tolerances" section in SI units; <see cref="StressTolerances.None"/> when the
    /// section is absent or has problems.</summary>
    public StressTolerances Tolerances { get; init; } = StressTolerances.None;
}

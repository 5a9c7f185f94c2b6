namespace RotorDrive.Core.Studies.Ranking;

/// <summary>Everything the ranking found for one combination: its parts, its figures, why it fails, and cautions.</summary>
/// <param name="Candidate">The combination.</param>
/// <param name="MotorId">Motor id.</param>
/// <param name="ControllerId">Controller id.</param>
/// <param name="PackId">Pack id.</param>
/// <param name="Figures">Hover figures, or null when no trim was reached (cells out of range, rotors too slow).</param>
/// <param name="Rejections">Every reason the combination cannot fly the rig; empty when it passes.</param>
/// <param name="Cautions">Findings that do not reject (e.g. a controller that cannot reverse-brake).</param>
public sealed record RankEvaluation(
    RankCandidate Candidate,
    string MotorId,
    string ControllerId,
    string PackId,
    RankFigures? Figures,
    IReadOnlyList<RankRejection> Rejections,
    IReadOnlyList<RankRejection> Cautions)
{
    /// <summary>The full spin-up and endurance simulations, when the combination was shortlisted; otherwise null.</summary>
    public RankSimulation? Simulation { get; init; }

    /// <summary>True when no reason rejects the combination.</summary>
    public bool Accepted => Rejections.Count == 0;

    /// <summary>"motor + controller + count x pack", for tables.</summary>
    public string Label => $"{MotorId} + {ControllerId} + {Candidate.PackCount} x {PackId}";
}

namespace RotorDrive.Core.Studies.Ranking;

/// <summary>Weights of the ranking score: each figure is scaled to 0..1 over the combinations that pass (0 the worst,
/// 1 the best) and the score is the weighted sum divided by the sum of the weights.</summary>
/// <remarks>Min-max normalisation of the criteria followed by a weighted sum (the simple additive weighting method of
/// multi-criteria decision making). Defaults: runtime 0.5, mass 0.25, current margin 0.25 (a choice, no source).</remarks>
/// <param name="Runtime">Weight of the hover time, at least 0.</param>
/// <param name="Mass">Weight of the (low) total mass, at least 0.</param>
/// <param name="Margin">Weight of the worst-case current margin, at least 0.</param>
public sealed record RankWeights(double Runtime = 0.5, double Mass = 0.25, double Margin = 0.25)
{
    /// <summary>The defaults.</summary>
    public static RankWeights Default { get; } = new();

    /// <summary>Sum of the weights.</summary>
    public double Total => Runtime + Mass + Margin;
}

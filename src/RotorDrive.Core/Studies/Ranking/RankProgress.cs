namespace RotorDrive.Core.Studies.Ranking;

/// <summary>How far a ranking sweep has come.</summary>
/// <param name="Done">Combinations evaluated so far.</param>
/// <param name="Total">Combinations in the sweep.</param>
public readonly record struct RankProgress(long Done, long Total)
{
    /// <summary>Fraction done, 0..1.</summary>
    public double Fraction => Total == 0 ? 1.0 : (double)Done / Total;
}

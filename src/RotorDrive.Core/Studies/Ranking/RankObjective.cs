namespace RotorDrive.Core.Studies.Ranking;

/// <summary>What a catalog ranking puts first.</summary>
public enum RankObjective
{
    /// <summary>Longest hover time on the usable pack capacity.</summary>
    Runtime,

    /// <summary>Lowest total craft mass (structure, payload, rotors, drivetrain and packs).</summary>
    Mass,

    /// <summary>Largest worst-case current margin (motor, controller and pack currents against their continuous ratings).</summary>
    Margin,

    /// <summary>A weighted score of runtime, mass and current margin (see <see cref="RankWeights"/>).</summary>
    Score,
}

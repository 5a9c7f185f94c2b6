namespace RotorDrive.Core.Simulation;

/// <summary>The common-speed hover at the design gap that the spin-up and endurance runs aim for: every rotor at one
/// speed, total lift equal to the craft's weight.</summary>
/// <remarks>A stand-in for the full trimmed hover (force, pitch, roll and yaw balance) of the craft analysis: with one
/// rotor design on every station it is the level hover when the centre of gravity sits at the stations' centroid.</remarks>
/// <param name="Exists">True when the rotors can carry the weight at the design gap below their rated speed.</param>
/// <param name="SpeedRadPerS">Common hover speed, rad/s (the rated speed when no hover exists).</param>
/// <param name="LiftN">Total lift at that speed, N.</param>
/// <param name="WeightN">Craft weight, N.</param>
/// <param name="StiffnessNPerM">Heave stiffness -dL/dg at the design gap and hover speed, N/m.</param>
/// <param name="Iterations">Root-finder evaluations.</param>
public sealed record HoverEstimate(bool Exists, double SpeedRadPerS, double LiftN, double WeightN, double StiffnessNPerM, int Iterations)
{
    /// <summary>Hover speed, rpm.</summary>
    public double SpeedRpm => Units.RadPerSToRpm(SpeedRadPerS);
}

namespace RotorDrive.Core.Loads;

/// <summary>The speed at which a rotor's eddy drag torque is largest at one gap and plate temperature, and that torque.</summary>
/// <remarks>Below this speed the drag rises with speed, above it the drag falls while the lift keeps rising: a motor must
/// push the rotor through it during spin-up.</remarks>
/// <param name="SpeedRadPerS">Speed of the largest eddy torque, rad/s.</param>
/// <param name="TorqueNm">Eddy torque there, N m.</param>
/// <param name="GapM">Air gap searched at, m.</param>
/// <param name="PlateTempC">Plate temperature searched at, C.</param>
/// <param name="Iterations">Load evaluations used (scan plus refinement).</param>
/// <param name="Status">How the search ended.</param>
public sealed record DragPeak(double SpeedRadPerS, double TorqueNm, double GapM, double PlateTempC, int Iterations, DragPeakStatus Status)
{
    /// <summary>Speed of the largest eddy torque, rpm.</summary>
    public double SpeedRpm => Units.RadPerSToRpm(SpeedRadPerS);
}

using System.Numerics;

namespace RotorDrive.Core.Magnetics;

/// <summary>Time-averaged eddy-current pressures between a travelling field and a conducting plate.</summary>
/// <remarks>Lift P_L = -(Bs^2/mu0) Re R pushes source and plate apart; drag P_D = -(Bs^2/mu0) Im R acts on the source
/// against its motion relative to the plate (../DESIGN.md §4.2, Reitz 1970). A perfect conductor (R = -1) gives
/// P_L = Bs^2/mu0 and P_D = 0. DragPa carries the sign of the electrical speed (Im R is odd in it), so
/// its magnitude is (Bs^2/mu0)|Im R| and reversing the motion reverses it; lift is even. The power dissipated in the
/// plate per unit area is P_D times the slip speed.</remarks>
/// <param name="LiftPa">Lift pressure on the source, Pa.</param>
/// <param name="DragPa">Drag pressure on the source, Pa, with the sign of the source's motion relative to the plate.</param>
public readonly record struct EddyPressure(double LiftPa, double DragPa)
{
    /// <summary>Pressures from the source field's amplitude at the plate surface and the plate's reflection coefficient.</summary>
    /// <param name="surfaceFieldT">Amplitude Bs of the source harmonic at the plate's top surface, T.</param>
    /// <param name="reflection">The plate's reflection coefficient R (see <see cref="PlateResponse"/>).</param>
    /// <exception cref="ArgumentOutOfRangeException">The field is NaN, infinite or negative.</exception>
    public static EddyPressure FromReflection(double surfaceFieldT, Complex reflection)
    {
        Preconditions.NonNegative(surfaceFieldT, nameof(surfaceFieldT));
        double magneticPressure = surfaceFieldT * surfaceFieldT / Units.Mu0;
        return new EddyPressure(-magneticPressure * reflection.Real, -magneticPressure * reflection.Imaginary);
    }
}

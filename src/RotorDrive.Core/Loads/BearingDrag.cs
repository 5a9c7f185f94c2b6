namespace RotorDrive.Core.Loads;

/// <summary>Bearing drag torque: a constant (Coulomb) part with the sign of the speed plus a viscous part.</summary>
/// <remarks>Torque = T0 sign(omega) + c omega, with T0 and c from the rotor's catalog row (common practice, no source).
/// At rest the constant part is taken as 0 (breakaway friction is not modelled).</remarks>
public static class BearingDrag
{
    /// <summary>Bearing drag torque at a signed speed, N m, with the sign of the speed.</summary>
    /// <param name="speedRadPerS">Shaft speed, rad/s (signed).</param>
    /// <param name="constantNm">Constant drag T0, N m, at least 0.</param>
    /// <param name="viscousNmPerRadPerS">Viscous coefficient c, N m per rad/s, at least 0.</param>
    /// <exception cref="ArgumentOutOfRangeException">An argument is NaN, infinite or negative.</exception>
    public static double TorqueNm(double speedRadPerS, double constantNm, double viscousNmPerRadPerS)
    {
        Preconditions.Finite(speedRadPerS, nameof(speedRadPerS));
        Preconditions.NonNegative(constantNm, nameof(constantNm));
        Preconditions.NonNegative(viscousNmPerRadPerS, nameof(viscousNmPerRadPerS));
        return TorqueUnchecked(speedRadPerS, constantNm, viscousNmPerRadPerS);
    }

    internal static double TorqueUnchecked(double speedRadPerS, double constantNm, double viscousNmPerRadPerS)
        => constantNm * Math.Sign(speedRadPerS) + viscousNmPerRadPerS * speedRadPerS;
}

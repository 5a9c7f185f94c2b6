namespace RotorDrive.Core.Loads;

/// <summary>Moments of inertia of simple rotor shapes about the spin axis.</summary>
public static class RotorInertia
{
    /// <summary>Inertia of a uniform annulus (thick-walled ring), m (ri^2 + ro^2) / 2, kg m^2.</summary>
    /// <remarks>Standard result for a hollow cylinder about its axis (any mechanics handbook, e.g. Meriam and Kraige,
    /// Engineering Mechanics: Dynamics, table of mass moments of inertia).</remarks>
    /// <param name="massKg">Mass, kg, at least 0.</param>
    /// <param name="innerRadiusM">Inner radius, m, at least 0.</param>
    /// <param name="outerRadiusM">Outer radius, m, at least the inner radius.</param>
    /// <exception cref="ArgumentOutOfRangeException">An argument is NaN, infinite or out of range.</exception>
    public static double AnnulusKgM2(double massKg, double innerRadiusM, double outerRadiusM)
    {
        Preconditions.NonNegative(massKg, nameof(massKg));
        Preconditions.NonNegative(innerRadiusM, nameof(innerRadiusM));
        Preconditions.InRange(outerRadiusM, innerRadiusM, double.MaxValue, nameof(outerRadiusM));
        return 0.5 * massKg * (innerRadiusM * innerRadiusM + outerRadiusM * outerRadiusM);
    }
}

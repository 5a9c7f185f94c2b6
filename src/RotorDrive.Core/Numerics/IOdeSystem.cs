namespace RotorDrive.Core.Numerics;

/// <summary>A system of first-order ordinary differential equations y' = f(t, y), written into a caller's buffer.</summary>
/// <remarks>Implementations must not keep the spans beyond the call and must not allocate in <see cref="Derivatives"/>
/// if the integration is to stay allocation-free. A struct implementation is specialised by the JIT when passed to
/// <see cref="DormandPrince45.Integrate{TSystem}"/>, which removes the interface call from the inner loop.</remarks>
public interface IOdeSystem
{
    /// <summary>Evaluates the right-hand side f(t, y).</summary>
    /// <param name="timeS">Independent variable t, s.</param>
    /// <param name="state">The state y (length = the integrator's dimension).</param>
    /// <param name="derivatives">Receives dy/dt, same length as <paramref name="state"/>.</param>
    void Derivatives(double timeS, ReadOnlySpan<double> state, Span<double> derivatives);
}

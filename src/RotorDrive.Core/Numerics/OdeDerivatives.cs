namespace RotorDrive.Core.Numerics;

/// <summary>The right-hand side y' = f(t, y) of an ODE system as a delegate, for callers that prefer a lambda to an
/// <see cref="IOdeSystem"/> implementation.</summary>
/// <param name="timeS">Independent variable t, s.</param>
/// <param name="state">The state y.</param>
/// <param name="derivatives">Receives dy/dt, same length as <paramref name="state"/>.</param>
public delegate void OdeDerivatives(double timeS, ReadOnlySpan<double> state, Span<double> derivatives);

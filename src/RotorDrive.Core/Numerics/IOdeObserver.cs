namespace RotorDrive.Core.Numerics;

/// <summary>Receives points of the solution while an integration runs (for time traces).</summary>
/// <remarks>The state span is the integrator's own buffer: copy what you keep before returning.</remarks>
public interface IOdeObserver
{
    /// <summary>Called at the start, at accepted steps or output-grid times, and at the stop.</summary>
    /// <param name="timeS">Independent variable t, s.</param>
    /// <param name="state">The state y at <paramref name="timeS"/>.</param>
    /// <param name="kind">Why this point is reported.</param>
    void Observe(double timeS, ReadOnlySpan<double> state, ObservationKind kind);
}

namespace RotorDrive.Core.Numerics;

/// <summary>Event functions g_i(t, y) whose sign change stops an integration (lift-off, touch-down, a limit reached).</summary>
/// <remarks>The integrator evaluates all functions once per accepted step; when one changes sign in the direction
/// asked for, it locates the crossing on the step's continuous extension by bisection and stops there, so the caller
/// can switch the right-hand side (a discontinuity such as landing-gear contact) and restart. A boolean condition can
/// be written as g = condition ? 1 : -1: bisection needs only the sign. A crossing that goes out and back within one
/// step is not seen; bound the step (<see cref="DormandPrince45Options.MaxStepS"/>) if that can happen. A NaN value
/// never counts as a crossing.</remarks>
public interface IOdeEvents
{
    /// <summary>Number of event functions (0 or more).</summary>
    int Count { get; }

    /// <summary>Evaluates every event function at (t, y).</summary>
    /// <param name="timeS">Independent variable t, s.</param>
    /// <param name="state">The state y.</param>
    /// <param name="values">Receives g_i(t, y), length <see cref="Count"/>.</param>
    void Evaluate(double timeS, ReadOnlySpan<double> state, Span<double> values);

    /// <summary>The direction of sign change that counts as an event for function <paramref name="index"/>.</summary>
    /// <param name="index">Event function index, 0 to <see cref="Count"/> - 1.</param>
    EventDirection Direction(int index);
}

using RotorDrive.Core.Numerics;
using RotorDrive.Core.Simulation;

namespace RotorDrive.Core.Tests.Numerics;

/// <summary>Event functions g_i = y[component_i], each with its direction.</summary>
internal sealed class ComponentEvents(params (int Component, EventDirection Direction)[] functions) : IOdeEvents
{
    public int Count => functions.Length;

    public void Evaluate(double timeS, ReadOnlySpan<double> state, Span<double> values)
    {
        for (int i = 0; i < functions.Length; i++)
        {
            values[i] = state[functions[i].Component];
        }
    }

    public EventDirection Direction(int index) => functions[index].Direction;
}

/// <summary>One boolean condition written as g = condition ? 1 : -1, firing when it becomes true.</summary>
internal sealed class PredicateEvents(Func<double, double[], bool> condition) : IOdeEvents
{
    public int Count => 1;

    public void Evaluate(double timeS, ReadOnlySpan<double> state, Span<double> values) => values[0] = condition(timeS, state.ToArray()) ? 1 : -1;

    public EventDirection Direction(int index) => EventDirection.Rising;
}

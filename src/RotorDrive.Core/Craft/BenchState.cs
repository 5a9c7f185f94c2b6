namespace RotorDrive.Core.Craft;

/// <summary>A bench of stands: every rotor held at one fixed gap, each station at its duty, all fed by the rig's pack;
/// no weight to carry (<see cref="HoverMode.Bench"/>).</summary>
/// <remarks>Each rotor takes its highest stable equilibrium at its duty on the shared bus
/// (<see cref="CommonDutyHover.SpeedsAt"/>); the state is then described with the drive equations (M. Drela, First-Order
/// DC Electric Motor Model, MIT 2007) like every hover state. A station's duty is its set duty
/// (<see cref="Station.Duty"/>) or, absent, the rig's max duty (as <c>operate</c>). Thread-safe.</remarks>
public static class BenchState
{
    /// <summary>The stations' steady state at a gap.</summary>
    /// <param name="model">The rig model.</param>
    /// <param name="gapM">The stands' gap, m (&gt; 0).</param>
    /// <param name="options">Numerical settings; defaults when null.</param>
    /// <exception cref="ArgumentNullException">The model is null.</exception>
    /// <exception cref="ArgumentOutOfRangeException">The gap is not positive.</exception>
    public static HoverResult Solve(RigModel model, double gapM, HoverOptions? options = null)
    {
        Preconditions.NotNull(model, nameof(model));
        Preconditions.Positive(gapM, nameof(gapM));
        var duties = Duties(model);
        var state = CommonDutyHover.SpeedsAt(model, duties, gapM, options);
        // Nothing to balance on a bench: the residuals against the weight are left as computed and never judged.
        return HoverTrim.Describe(model, HoverMode.Bench, gapM, state.SpeedsRadPerS.ToArray(), 0);
    }

    /// <summary>Each station's duty on the bench: its set duty, or the rig's max duty.</summary>
    /// <param name="model">The rig model.</param>
    public static double[] Duties(RigModel model)
    {
        Preconditions.NotNull(model, nameof(model));
        return model.Rig.Stations.Select(s => s.Duty ?? model.Limits.MaxDuty).ToArray();
    }
}

namespace RotorDrive.Core.Craft;

/// <summary>The steady state a rig holds, by its mount: the one state every time simulation starts from and aims for
/// (spin-up target, endurance's state at every instant) and the guided <c>hover</c> answer.</summary>
/// <remarks>Free craft: <see cref="HoverTrim.Solve(RigModel, double, double, HoverOptions?)"/> at the design gap with zero
/// yaw torque. Guided sled: with a set duty on every station (<see cref="Station.Duty"/>), the gap where those duties lift
/// the weight (<see cref="CommonDutyHover.SolveDuties"/>); otherwise the common duty that lifts it at the design gap
/// (<see cref="CommonDutyHover.SolveAtGap"/>). Bench: each station at its duty at the design gap
/// (<see cref="BenchState.Solve"/>). Thread-safe.</remarks>
public static class SteadyState
{
    /// <summary>The rig's steady state.</summary>
    /// <param name="model">The rig model (its state of charge and station conditions as they are).</param>
    /// <param name="options">Numerical settings; defaults when null.</param>
    /// <exception cref="ArgumentNullException">The model is null.</exception>
    public static HoverResult Solve(RigModel model, HoverOptions? options = null)
    {
        Preconditions.NotNull(model, nameof(model));
        return model.Rig.Mount switch
        {
            MountKind.Guided when SetDuties(model.Rig) is { } duties => CommonDutyHover.SolveDuties(model, duties, options),
            MountKind.Guided => CommonDutyHover.SolveAtGap(model, model.DesignGapM, options),
            MountKind.Bench => BenchState.Solve(model, model.DesignGapM, options),
            _ => HoverTrim.Solve(model, model.DesignGapM, 0.0, options),
        };
    }

    /// <summary>The duties the user set on every station (<see cref="Station.Duty"/>), or null when any station has none.</summary>
    /// <param name="rig">The rig.</param>
    public static IReadOnlyList<double>? SetDuties(Rig rig)
    {
        Preconditions.NotNull(rig, nameof(rig));
        return rig.Stations.Count > 0 && rig.Stations.All(s => s.Duty is not null) ? rig.Stations.Select(s => s.Duty!.Value).ToArray() : null;
    }

    /// <summary>The state in words, for the interfaces' headings: "trimmed hover", "guided hover at one common duty",
    /// "guided hover at the stations' set duties" or "each station at its duty on its stand".</summary>
    /// <param name="rig">The rig.</param>
    public static string Words(Rig rig)
    {
        Preconditions.NotNull(rig, nameof(rig));
        return rig.Mount switch
        {
            MountKind.Guided when SetDuties(rig) is not null => "guided hover at the stations' set duties",
            MountKind.Guided => "guided hover at one common duty",
            MountKind.Bench => "each station at its duty on its stand",
            _ => "trimmed hover",
        };
    }
}

namespace RotorDrive.Core.Simulation;

/// <summary>How an endurance run's end is judged (the rule the <c>endurance</c> command and the workbench share).</summary>
public static class EnduranceLimits
{
    /// <summary>Whether a run that ended at this limit passes: the pack ended the hover (its usable charge spent or its
    /// voltage at the cutoff) or the run reached its time limit, rather than a winding, plate, current or trim limit
    /// coming first. The pack is what a designer sizes for runtime; anything else ending the hover first is a fault of
    /// the design.</summary>
    /// <param name="limit">The limit that ended the run.</param>
    public static bool Passes(this EnduranceLimit limit)
        => limit is EnduranceLimit.UsableCapacity or EnduranceLimit.PackCutoff or EnduranceLimit.TimeLimit;

    /// <summary>Whether the run passes: it hovered for some time and ended at a limit that <see cref="Passes(EnduranceLimit)"/>.</summary>
    /// <param name="result">The run.</param>
    /// <exception cref="ArgumentNullException"><paramref name="result"/> is null.</exception>
    public static bool Passes(this EnduranceResult result)
        => Preconditions.NotNull(result, nameof(result)).RuntimeS > 0 && result.FirstLimit.Passes();

    /// <summary>What ended a run, in one or two words for tables and verdicts ("pack empty", "plate temp"); the full
    /// sentence with the limit's value is <see cref="EnduranceResult.FirstLimitText"/>.</summary>
    /// <param name="limit">The limit that ended the run.</param>
    public static string Words(this EnduranceLimit limit) => limit switch
    {
        EnduranceLimit.TimeLimit => "time limit",
        EnduranceLimit.PackCutoff => "pack cutoff",
        EnduranceLimit.UsableCapacity => "pack empty",
        EnduranceLimit.TrimLost => "lost trim",
        EnduranceLimit.WindingTemperature => "winding temp",
        EnduranceLimit.MotorCurrent => "motor current",
        EnduranceLimit.ControllerCurrent => "ctrl current",
        EnduranceLimit.PackCurrent => "pack current",
        EnduranceLimit.PlateTemperature => "plate temp",
        _ => limit.ToString().ToLowerInvariant(),
    };
}

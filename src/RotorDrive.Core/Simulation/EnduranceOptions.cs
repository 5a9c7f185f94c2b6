namespace RotorDrive.Core.Simulation;

/// <summary>Settings of an endurance run.</summary>
/// <param name="StepS">Time step of the quasi-static march, s; default 5 (well below the winding and plate thermal time
/// constants of minutes; halving it changes the demo runtime by less than 0.1 %).</param>
/// <param name="MaxDurationS">Longest simulated time, s; default 7200.</param>
/// <param name="LimitBisections">Bisections that locate the first limit inside the step where it is reached; default 48.</param>
/// <param name="RecordTrace">True (default) returns one trace sample per step.</param>
public sealed record EnduranceOptions(double StepS = 5.0, double MaxDurationS = 7200.0, int LimitBisections = 48, bool RecordTrace = true)
{
    /// <summary>The defaults.</summary>
    public static EnduranceOptions Default { get; } = new();
}

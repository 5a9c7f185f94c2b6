namespace RotorDrive.Core.Simulation;

/// <summary>Settings of an endurance run.</summary>
/// <param name="StepS">Time step of the quasi-static march, s; default 5 (well below the winding and plate thermal time
/// constants of minutes; halving it changes the demo runtime by less than 0.1 %).</param>
/// <param name="MaxDurationS">Longest simulated time, s; default 7200.</param>
/// <param name="LimitBisections">Bisections that locate the first limit inside the step where it is reached; default 48.</param>
/// <param name="RecordTrace">True (default) returns one trace sample per step.</param>
/// <param name="StopAtPlateLimit">True (default) ends the run when the hottest point of the plate reaches the rig's
/// limit; false runs on and only records when it did (<see cref="EnduranceResult.PlateLimitTimeS"/>), as the plate sweep
/// does to give the pack-limited time too.</param>
/// <param name="PlateCellM">Largest spacing of the plate grid, m, or null (default) for a third of the narrowest magnet
/// annulus.</param>
/// <param name="PlateMarginLengths">Margin round the area the rotors cover, in diffusion lengths sqrt(4 alpha t) for the
/// horizon (or 2.5 x as many loss lengths when shorter); default 2.</param>
/// <param name="PlateHorizonS">Run time the plate domain is sized for, s, or null (default) for 1.5 x the usable charge
/// over the starting pack current, within [60 s, <paramref name="MaxDurationS"/>].</param>
/// <param name="PlateMaxGrid">Largest number of plate grid points per side (a power of two); default 256.</param>
public sealed record EnduranceOptions(
    double StepS = 5.0,
    double MaxDurationS = 7200.0,
    int LimitBisections = 48,
    bool RecordTrace = true,
    bool StopAtPlateLimit = true,
    double? PlateCellM = null,
    double PlateMarginLengths = 2.0,
    double? PlateHorizonS = null,
    int PlateMaxGrid = 256)
{
    /// <summary>The defaults.</summary>
    public static EnduranceOptions Default { get; } = new();
}

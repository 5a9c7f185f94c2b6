namespace RotorDrive.Core.Simulation;

/// <summary>One floor of a plate sweep: a material at a thickness, and how long the rig hovers in place over it.</summary>
/// <param name="MaterialId">Plate material id.</param>
/// <param name="ThicknessM">Plate thickness, m.</param>
/// <param name="HoverExists">True when a trimmed hover exists over this plate at the start.</param>
/// <param name="HoverPowerW">Electrical power of the trimmed hover at the start, W (0 without a hover).</param>
/// <param name="PlatePowerW">Eddy power into the plate at the start, W.</param>
/// <param name="PlateLimitTimeS">When the plate's hottest point reaches the rig's limit, s, or null when it does not within
/// the run.</param>
/// <param name="RuntimeS">How long the run lasted with the plate limit set aside, s: the pack-limited time, unless another
/// limit (winding, current, trim) came first.</param>
/// <param name="EndedBy">The limit that ended that run.</param>
/// <param name="PeakPlateTempC">Hottest plate temperature during that run, C.</param>
public sealed record PlateSweepRow(
    string MaterialId,
    double ThicknessM,
    bool HoverExists,
    double HoverPowerW,
    double PlatePowerW,
    double? PlateLimitTimeS,
    double RuntimeS,
    EnduranceLimit EndedBy,
    double PeakPlateTempC)
{
    /// <summary>True when the plate reaches its limit before the run's end: this floor cuts the hover short.</summary>
    public bool PlateCutsHover => !HoverExists || (PlateLimitTimeS is { } t && t < RuntimeS);

    /// <summary>Whether this floor passes: the craft hovers, the plate does not cut the hover short, and the pack ends it
    /// (<see cref="EnduranceLimits.Passes(EnduranceLimit)"/>).</summary>
    public bool Passes => HoverExists && EndedBy.Passes() && !PlateCutsHover;

    /// <summary>Hover time in place: the earlier of the plate limit and the run's end, s.</summary>
    public double HoverTimeS => HoverExists ? Math.Min(PlateLimitTimeS ?? double.PositiveInfinity, RuntimeS) : 0.0;
}

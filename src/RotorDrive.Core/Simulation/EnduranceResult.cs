namespace RotorDrive.Core.Simulation;

/// <summary>The outcome of an endurance run: how long the rig hovered and which limit ended it.</summary>
/// <param name="RuntimeS">Hover time until the first limit, s.</param>
/// <param name="FirstLimit">The limit reached first.</param>
/// <param name="FirstLimitText">That limit in words, with the station and the value where it applies.</param>
/// <param name="LimitStation">The station the limit belongs to, or null for rig-wide limits.</param>
/// <param name="StartHover">The trimmed hover at the start (<see cref="Craft.HoverTrim"/> of the rig model at the start
/// state of charge): per-station speeds, duties and currents.</param>
/// <param name="StartPackCurrentA">Pack current at the start, A.</param>
/// <param name="FinalSocFraction">State of charge at the end, 0..1.</param>
/// <param name="FinalBusVoltageV">Bus voltage at the end, V (0 when no trim existed there).</param>
/// <param name="FinalPackCurrentA">Pack current at the end, A (0 when no trim existed there).</param>
/// <param name="PeakWindingTempC">Highest winding temperature, C.</param>
/// <param name="PeakPlateTempC">Highest temperature anywhere on the plate during the run, C.</param>
/// <param name="Steps">Quasi-static steps taken.</param>
/// <param name="Trace">One sample per step (yaw rate and angle are zero: the trim holds the yaw; the plate temperature per
/// station is the mean over its magnet annulus), or null.</param>
public sealed record EnduranceResult(
    double RuntimeS,
    EnduranceLimit FirstLimit,
    string FirstLimitText,
    int? LimitStation,
    Craft.HoverResult StartHover,
    double StartPackCurrentA,
    double FinalSocFraction,
    double FinalBusVoltageV,
    double FinalPackCurrentA,
    double PeakWindingTempC,
    double PeakPlateTempC,
    int Steps,
    SpinupTrace? Trace)
{
    /// <summary>The hottest point of the plate at the end of the run.</summary>
    public Thermal.PlateHotspot? PlateHotspot { get; init; }

    /// <summary>The plate's temperature field at the end of the run.</summary>
    public Thermal.PlateTemperatureMap? PlateMap { get; init; }

    /// <summary>The hottest temperature on the plate at each trace sample, C (null without a trace).</summary>
    public IReadOnlyList<double>? PlatePeakTraceC { get; init; }

    /// <summary>The craft origin's position at each trace sample, m (null without a trace).</summary>
    public IReadOnlyList<(double XM, double YM)>? CraftPositionTraceM { get; init; }

    /// <summary>When the hottest point of the plate first reached the rig's limit, s, or null when it never did.</summary>
    public double? PlateLimitTimeS { get; init; }

    /// <summary>The plate model used (conductivity, loss, grid).</summary>
    public PlateFieldSetup? PlateSetup { get; init; }
}

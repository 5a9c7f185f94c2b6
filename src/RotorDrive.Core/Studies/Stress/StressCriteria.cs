namespace RotorDrive.Core.Studies.Stress;

/// <summary>Keys and words for <see cref="StressCriterion"/> values.</summary>
public static class StressCriteria
{
    /// <summary>Every criterion in report order.</summary>
    public static IReadOnlyList<StressCriterion> All { get; } = Enum.GetValues<StressCriterion>();

    /// <summary>A stable snake_case key, e.g. "pack_voltage".</summary>
    /// <param name="criterion">The criterion.</param>
    public static string Key(this StressCriterion criterion) => criterion switch
    {
        StressCriterion.Liftoff => "liftoff",
        StressCriterion.Stall => "stall",
        StressCriterion.Currents => "currents",
        StressCriterion.PackVoltage => "pack_voltage",
        StressCriterion.Trim => "trim",
        StressCriterion.Yaw => "yaw",
        StressCriterion.Retainer => "retainer",
        _ => throw new ArgumentOutOfRangeException(nameof(criterion), criterion, "Unknown criterion."),
    };

    /// <summary>What failing the criterion means, in words.</summary>
    /// <param name="criterion">The criterion.</param>
    public static string Describe(this StressCriterion criterion) => criterion switch
    {
        StressCriterion.Liftoff => "no lift-off within the time limit",
        StressCriterion.Stall => "a rotor stalled below its drag peak",
        StressCriterion.Currents => "a current beyond its burst allowance",
        StressCriterion.PackVoltage => "pack voltage below cutoff",
        StressCriterion.Trim => "no trimmed hover within limits",
        StressCriterion.Yaw => "equal-duty yaw residual over the tolerance, or no trim authority for it",
        StressCriterion.Retainer => "retaining ring over its allowable stress",
        _ => throw new ArgumentOutOfRangeException(nameof(criterion), criterion, "Unknown criterion."),
    };
}

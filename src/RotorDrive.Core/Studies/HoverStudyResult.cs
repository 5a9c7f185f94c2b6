using RotorDrive.Core.Craft;
using RotorDrive.Core.Drive;

namespace RotorDrive.Core.Studies;

/// <summary>The outcome of a hover study (<see cref="HoverStudy.Run"/>).</summary>
/// <param name="Request">What was run.</param>
/// <param name="Model">The rig model analysed (with the payload asked for).</param>
/// <param name="Review">The hover state, its rotor safety and cautions, every failing limit and the verdict.</param>
/// <param name="PayloadCapacityKg">The largest payload that hovers within every limit at the gap, kg, or null when it
/// was not asked for or even the empty craft does not.</param>
/// <param name="Yaw">The yaw balance, or null when not asked for (or the rig is guided).</param>
/// <param name="Rails">For a guided rig's hover state, what its rails carry; null otherwise.</param>
public sealed record HoverStudyResult(
    HoverStudyRequest Request,
    RigModel Model,
    HoverReview Review,
    double? PayloadCapacityKg,
    YawResult? Yaw,
    RailLoads? Rails = null)
{
    /// <summary>Whether the craft hovers within every limit (<see cref="HoverReview.Pass"/>).</summary>
    public bool HoverPasses => Review.Pass;

    /// <summary>Whether the yaw balance passes, or null when it was not analysed.</summary>
    public bool? YawPasses => Yaw?.Pass;

    /// <summary>Whether everything analysed passes.</summary>
    public bool Passes => HoverPasses && YawPasses != false;

    /// <summary>Whether the payload capacity (when searched) covers the model's payload; null when not searched. A
    /// capacity of null (even the empty craft fails) does not.</summary>
    public bool? CarriesPayload => !Request.PayloadCapacity ? null : PayloadCapacityKg is { } cap && cap + PayloadToleranceKg >= Model.PayloadKg;

    /// <summary>Every failed criterion as a key: each hover finding's limit (<see cref="HoverFinding.Limit"/>), then the
    /// yaw balance's (<see cref="YawResult.FailedCriteria"/>); empty when everything analysed passes.</summary>
    public IReadOnlyList<string> FailedCriteria => [.. Review.Findings.Select(f => f.Limit).Distinct(), .. Yaw?.FailedCriteria ?? []];

    /// <summary>The limit closest to binding in the hover: the smallest margin over every station's and the pack's
    /// limits, or null when the craft has no balance.</summary>
    public string? LimitingConstraint
    {
        get
        {
            var margins = Review.Hover.Stations.SelectMany(s => s.Margins).Concat(Review.Hover.PackMargins).ToList();
            return Review.Hover.Balanced && margins.Count > 0 ? margins.MinBy(m => m.MarginFraction).Limit.Key() : null;
        }
    }

    // The payload search stops within HoverOptions.PayloadToleranceKg; below this a capacity equals the payload.
    private const double PayloadToleranceKg = 1e-9;
}

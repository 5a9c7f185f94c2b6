using static System.FormattableString;

namespace RotorDrive.Core.Craft;

/// <summary>A hover state with everything it is judged by: the rotor safety checks and cautions, every failing limit
/// (drive, pack, stability and retaining ring), the verdict, and for a failing trim the largest payload that does
/// hover. The <c>hover</c> command and the workbench's hover sheet both show this.</summary>
/// <param name="Hover">The hover state.</param>
/// <param name="Safety">Rotor safety at hover and at rated speed, and the cautions.</param>
/// <param name="Findings">The hover's own findings followed by one "retainer_stress" finding per station whose
/// retaining ring is over its allowable stress at hover speed and one "cells_out_of_controller_range" finding per
/// station whose controller is not rated for the pack's cell count.</param>
/// <param name="MaxPayloadKg">For a trim that does not hover within every limit: the largest payload that does
/// (<see cref="HoverTrim.MaxPayloadKg(RigModel, double, HoverOptions?)"/>), or null when even the empty craft does
/// not; null as well when the trim hovers or the state is not a trim.</param>
public sealed record HoverReview(HoverResult Hover, HoverSafetyReport Safety, IReadOnlyList<HoverFinding> Findings, double? MaxPayloadKg)
{
    /// <summary>The finding key for a retaining ring over its allowable hoop stress.</summary>
    public const string RetainerStressKey = "retainer_stress";

    /// <summary>The finding key for a pack whose cell count a station's controller is not rated for.</summary>
    public const string CellsOutOfRangeKey = "cells_out_of_controller_range";

    /// <summary>Pass: the craft hovers with every limit holding, no retaining ring is over its allowable stress nor any
    /// rotor above its rated speed, and every controller is rated for the pack's cell count.</summary>
    public bool Pass => Hover.Status == HoverStatus.Hovering && !Safety.Fails && !Findings.Any(f => f.Limit == CellsOutOfRangeKey);

    /// <summary>Trims the craft at a gap with zero net yaw torque (<see cref="HoverTrim.Solve(RigModel, double, double,
    /// HoverOptions?)"/>) and reviews the result.</summary>
    /// <param name="model">The rig model.</param>
    /// <param name="gapM">Rig gap, m (&gt; 0).</param>
    /// <param name="options">Numerical settings; defaults when null.</param>
    public static HoverReview Trimmed(RigModel model, double gapM, HoverOptions? options = null)
        => Of(model, HoverTrim.Solve(model, gapM, 0.0, options), options);

    /// <summary>The largest payload with which the craft trims at a gap with every limit holding, whatever the model's
    /// own payload: <see cref="HoverTrim.MaxPayloadKg(RigModel, double, HoverOptions?)"/> searched up to the payload
    /// whose weight all rotors together could carry at their rated speeds (no trim hovers beyond it, since a rotor
    /// above its rated speed fails the rotor_max_speed limit).</summary>
    /// <param name="model">The rig model.</param>
    /// <param name="gapM">Rig gap, m (&gt; 0).</param>
    /// <param name="options">Numerical settings; defaults when null (the payload is found to within
    /// <see cref="HoverOptions.PayloadToleranceKg"/>).</param>
    /// <returns>The payload, kg, or null when even the empty craft does not hover within every limit.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="model"/> is null.</exception>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="gapM"/> is not positive.</exception>
    public static double? PayloadCapacityKg(RigModel model, double gapM, HoverOptions? options = null)
    {
        Preconditions.NotNull(model, nameof(model));
        Preconditions.Positive(gapM, nameof(gapM));
        double liftAtRatedN = 0;
        foreach (var s in model.Stations)
        {
            liftAtRatedN += s.LoadAt(s.Rotor.MaxSpeedRadPerS, gapM).LiftN;
        }
        double emptyKg = model.MassKg - model.PayloadKg;
        double upperKg = liftAtRatedN / Units.StandardGravity - emptyKg;
        return upperKg > 0 ? HoverTrim.MaxPayloadKg(model.WithPayload(upperKg), gapM, options) : null;
    }

    /// <summary>Reviews a hover state: rotor safety (<see cref="HoverSafety.Assess"/>), retainer findings, and for a
    /// trim that fails, the largest payload that hovers (bisection, several trims).</summary>
    /// <param name="model">The rig model the state was solved for.</param>
    /// <param name="hover">The hover state (a trim or a common-duty hover).</param>
    /// <param name="options">Numerical settings for the payload search; defaults when null.</param>
    /// <exception cref="ArgumentNullException">An argument is null.</exception>
    public static HoverReview Of(RigModel model, HoverResult hover, HoverOptions? options = null)
    {
        Preconditions.NotNull(model, nameof(model));
        Preconditions.NotNull(hover, nameof(hover));
        var safety = HoverSafety.Assess(model, hover);
        var findings = new List<HoverFinding>(hover.Findings);
        // HoverSafety assesses the stations that turn, in station order: pair them up again.
        var turning = hover.Stations.Where(s => s.SpeedRadPerS > 0).ToList();
        for (int k = 0; k < turning.Count && k < safety.AtHover.Count; k++)
        {
            var r = safety.AtHover[k];
            if (r.MarginFraction is < 0)
            {
                findings.Add(new HoverFinding(RetainerStressKey, turning[k].Index, Invariant(
                    $"station {turning[k].Index + 1}: the retaining ring of rotor {r.RotorId} carries {r.HoopStressPa!.Value / 1e6:0.0} MPa at {Units.RadPerSToRpm(r.SpeedRadPerS):0} rpm, above its allowable {r.AllowablePa!.Value / 1e6:0.0} MPa")));
            }
        }
        // A pack the controllers are not rated for fails whatever the trim (ranking refuses it before trimming).
        int cells = model.Packs.CellsSeries;
        for (int i = 0; i < model.Stations.Count; i++)
        {
            var controller = model.Stations[i].Drivetrain.Controller;
            if (!controller.AcceptsCells(cells))
            {
                findings.Add(new HoverFinding(CellsOutOfRangeKey, i, Invariant(
                    $"station {i + 1}: pack {model.Packs.Pack.Id} has {cells} cells in series; controller {controller.Id} is rated for {controller.MinCells} to {controller.MaxCells}")));
            }
        }
        double? maxPayload = hover.Mode == HoverMode.Trimmed && hover.Status is HoverStatus.LimitExceeded or HoverStatus.NoBalance or HoverStatus.BeyondDrivetrain
            ? HoverTrim.MaxPayloadKg(model, hover.GapM, options)
            : null;
        return new HoverReview(hover, safety, findings, maxPayload);
    }
}

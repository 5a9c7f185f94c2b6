using RotorDrive.Core.Craft;
using RotorDrive.Core.Safety;
using RotorDrive.Core.Tests.Drive;
using RotorDrive.Core.Tests.Support;
using Xunit;

namespace RotorDrive.Core.Tests.Craft;

public sealed class HoverReviewTests
{
    // A ring rated far below what it carries: the trim itself holds every drive limit, but each station's ring is over its
    // allowable, so the review names every station and fails. The ring's own share of the stress is the thin rotating
    // ring's rho omega^2 r_m^2 (S. P. Timoshenko & J. N. Goodier, Theory of Elasticity, 3rd ed., 1970) at the station's
    // hover speed.
    [Fact]
    public void Review_NamesEveryStationWhoseRetainingRingIsOverItsAllowable_AndFails()
    {
        const double t = 0.004;
        var rotor = CraftRigs.Rotor(maxRpm: 6000, retainerM: t, outerM: 0.15 - t / 2) with { RetainerAllowablePa = 1e5 };
        var options = RigModelOptions.Default with { Safety = new RotorSafetyOptions { RetainerDensityKgM3 = 2700 } };
        var model = CraftRigs.Model(CraftRigs.Circle(4, rotor: rotor), options);

        var review = HoverReview.Trimmed(model, model.DesignGapM);

        Assert.Equal(HoverStatus.Hovering, review.Hover.Status);
        Assert.False(review.Pass);
        Assert.Null(review.MaxPayloadKg);
        var retainer = review.Findings.Where(f => f.Limit == HoverReview.RetainerStressKey).ToList();
        Assert.Equal([0, 1, 2, 3], retainer.Select(f => f.Station!.Value).Order());
        for (int i = 0; i < 4; i++)
        {
            double w = review.Hover.Stations[i].SpeedRadPerS;
            RelAssert.Close(2700 * Math.Pow(w * 0.15, 2), review.Safety.AtHover[i].RingOwnStressPa!.Value, 1e-9, what: $"ring stress, station {i}");
        }
    }

    // The same rig rated generously passes with nothing to report; over-loaded, the review carries the payload search's
    // answer (the bisection of HoverTrim.MaxPayloadKg, itself checked by re-solving in HoverTrimTests).
    [Fact]
    public void Review_OfAFailingTrim_CarriesTheLargestPayloadThatHovers_AndOfAPassingOneNothing()
    {
        var fine = HoverReview.Trimmed(CraftRigs.Model(CraftRigs.Circle(4)), CraftRigs.Gap);
        Assert.True(fine.Pass);
        Assert.Empty(fine.Findings);
        Assert.Null(fine.MaxPayloadKg);

        var model = CraftRigs.Model(CraftRigs.Circle(4, payloadKg: 9.5));
        var heavy = HoverReview.Trimmed(model, CraftRigs.Gap);
        Assert.False(heavy.Pass);
        Assert.Contains(heavy.Findings, f => f.Limit == "duty_headroom");
        Assert.Equal(HoverTrim.MaxPayloadKg(model), heavy.MaxPayloadKg);
    }

    // The capacity is a bisection bracket, checked by re-solving: the trim at the capacity hovers, two tolerances more
    // does not; it does not depend on the payload the model happens to carry (the light and heavy rigs agree, and agree
    // with HoverTrim's own search below the heavy rig's payload, both within the bisection tolerance).
    [Fact]
    public void PayloadCapacity_Hovers_TwoTolerancesMoreDoesNot_WhateverThePayloadCarried()
    {
        double tol = HoverOptions.Default.PayloadToleranceKg;
        var light = CraftRigs.Model(CraftRigs.Circle(4, payloadKg: 1));
        var heavy = CraftRigs.Model(CraftRigs.Circle(4, payloadKg: 9.5));
        double capacity = HoverReview.PayloadCapacityKg(light, CraftRigs.Gap)!.Value;
        Assert.Equal(HoverStatus.Hovering, HoverTrim.Solve(light.WithPayload(capacity)).Status);
        Assert.NotEqual(HoverStatus.Hovering, HoverTrim.Solve(light.WithPayload(capacity + 2 * tol)).Status);
        Assert.InRange(HoverReview.PayloadCapacityKg(heavy, CraftRigs.Gap)!.Value, capacity - tol, capacity + tol);
        Assert.InRange(HoverTrim.MaxPayloadKg(heavy)!.Value, capacity - tol, capacity + tol);
    }
}

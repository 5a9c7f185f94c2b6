using FsCheck;
using FsCheck.Fluent;
using RotorDrive.Core.Studies.Ranking;
using static RotorDrive.Core.Tests.Studies.Ranking.RankingFixtures;

namespace RotorDrive.Core.Tests.Studies.Ranking;

public class RankPayloadPropertyTests
{
    // Raising the payload can only reject more combinations, while the hover sits below the design-gap drag peak: there
    // more lift needs more speed and more shaft torque (thin-sheet law, Reitz 1970: torque 2 Q_peak s / (1 + s^2) rises for
    // s < 1), so every current, power, duty and speed the checks compare grows with the weight and the bus voltage falls,
    // while the landed-gap drag-peak check does not depend on the mass. (Above the drag peak the shaft torque falls with
    // speed: a heavier craft then needs less motor current, and the law does not hold for the current limits.)
    [FsCheck.Xunit.Property(MaxTest = 25)]
    public Property RaisingPayload_OnlyRejectsMoreCombinations_BelowTheDragPeak()
    {
        var payloads =
            from a in Gen.Choose(0, 200)
            from b in Gen.Choose(0, 200)
            select (Low: Math.Min(a, b) / 10.0, High: Math.Max(a, b) / 10.0);
        return Prop.ForAll(payloads.ToArbitrary(), pair =>
        {
            var low = Accepted(pair.Low);
            var high = Accepted(pair.High);
            return high.IsSubsetOf(low).Label($"accepted at {pair.High} kg but not at {pair.Low} kg: {string.Join(", ", high.Except(low))}");
        });
    }

    [Xunit.Fact]
    public void PayloadRange_OfTheProperty_DoesRejectMore()
    {
        // Guards the property above against passing vacuously: across its payload range some combinations drop out.
        Xunit.Assert.True(Accepted(20).Count < Accepted(0).Count);
    }

    private static HashSet<RankCandidate> Accepted(double payloadKg)
    {
        // L_max 400 N: with at most ~46 kg each station needs s < 0.65, below the peak at s = 1.
        var load = new SyntheticLoad(400, 2, 200, 30, DesignGapM);
        var rig = SquareRig(18, payloadKg, cgXM: 0.04, cgYM: -0.03);
        var study = RankStudy.Create(rig, RankStudyTests.MixedCatalog(), new RankOptions(Top: 1, MaxPackCount: 2, MaxDegreeOfParallelism: 1), FourOf(load));
        // What the checks every combination gets accept (the screening; the shortlist's spin-up and endurance simulations
        // depend on rank position, not on the payload law, and are not run here: FastSweep_EqualsTheStraightforwardEvaluation
        // holds this per-combination evaluation equal to the full run's acceptance).
        var accepted = new HashSet<RankCandidate>();
        for (long index = 0; index < study.CombinationCount; index++)
        {
            var candidate = study.CandidateAt(index);
            if (study.Evaluate(candidate).Accepted)
            {
                accepted.Add(candidate);
            }
        }
        return accepted;
    }
}

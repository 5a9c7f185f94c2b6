using RotorDrive.Core.Craft;
using RotorDrive.Core.Drive;
using RotorDrive.Core.Studies.Ranking;
using Xunit;
using static RotorDrive.Core.Tests.Studies.Ranking.RankingFixtures;

namespace RotorDrive.Core.Tests.Studies.Ranking;

public class RankPlacementTests
{
    // Thin-sheet load (Reitz 1970), as in RankStudyTests.
    private static readonly SyntheticLoad HandLoad = new(100, 2, 200, 30, DesignGapM);

    private static readonly Motor[] Motors = [Motor("A", 100, 40), Motor("B", 80, 25), Motor("C", 120, 24)];

    private static RankStudy Study(Rig rig)
        => RankStudy.Create(rig, Catalog(Motors, [Controller("esc-60", 60, 80)], [Pack("flat-12s", "flat")]),
            new RankOptions(Objective: RankObjective.Margin, MaxPackCount: 1), FourOf(HandLoad));

    private static Rig WithParts(Rig rig, Motor motor, SpeedController controller, PackBank packs)
        => rig with { Stations = rig.Stations.Select(s => s with { Motor = motor, Controller = controller }).ToList(), Packs = packs };

    [Fact]
    public void RankOf_IsThePlaceInTheOrder_AndNullForARejectedCombination()
    {
        // The ranking law: the k-th entry of the order has rank k. Motor C draws 25.0 A against its 24 A rating and is
        // rejected (worked by hand in RankStudyTests from Drela 2007 and Reitz 1970), so it has no rank.
        var study = Study(SquareRig(20, 0));
        var result = study.Run();
        for (int i = 0; i < result.Ordered.Count; i++)
        {
            Assert.Equal(i + 1, result.RankOf(result.Ordered[i]));
        }
        Assert.Null(result.RankOf(new RankCandidate(2, 0, 0, 1)));
    }

    [Fact]
    public void CandidateOf_PlacesARigEditedAfterTheRun_LikeTheRunPlacesItsOwnRig()
    {
        var study = Study(SquareRig(20, 0));
        var result = study.Run();
        var catalog = study.Catalog;
        var bank = new PackBank(catalog.Packs[0], 1, FlatCurve);
        // Motor B on every station: the same candidate and rank as a run on that rig reports for its own drivetrain.
        var edited = WithParts(study.Rig, catalog.Motors[1], catalog.Controllers[0], bank);
        var candidate = study.CandidateOf(edited);
        Assert.Equal(new RankCandidate(1, 0, 0, 1), candidate);
        var rerun = Study(edited).Run();
        Assert.Equal(rerun.AssignedCandidate, candidate);
        Assert.Equal(rerun.AssignedRank, result.RankOf(candidate!.Value));
        // Mixed motors, or more packs than the sweep tries: no single candidate.
        var mixed = edited with { Stations = edited.Stations.Select((s, i) => i == 0 ? s with { Motor = catalog.Motors[0] } : s).ToList() };
        Assert.Null(study.CandidateOf(mixed));
        Assert.Null(study.CandidateOf(edited with { Packs = new PackBank(catalog.Packs[0], 2, FlatCurve) }));
    }
}

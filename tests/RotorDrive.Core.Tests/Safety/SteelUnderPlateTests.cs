using RotorDrive.Core.Craft;
using RotorDrive.Core.Magnetics;
using RotorDrive.Core.Safety;
using RotorDrive.Core.Tests.Craft;
using RotorDrive.Core.Tests.Support;
using Xunit;

namespace RotorDrive.Core.Tests.Safety;

public class SteelUnderPlateTests
{
    private static Rig OnSteel(Rig rig) => rig with { Plate = rig.Plate with { BackIronM = 0.01 } };

    // Method of images for a plane boundary (K. J. Binns, P. J. Lawrenson and C. W. Trowbridge, "The Analytical and
    // Numerical Solution of Electric and Magnetic Fields", 1992, from memory): an infinitely permeable plane images a
    // magnet with the same sign, a perfect conductor with the opposite sign, so the steel d below the plate's top pulls the
    // stopped rotor at gap g exactly as hard as a perfectly conducting plate (a plate in air at very high speed, R -> -1)
    // pushes it at gap g + d. Checked against the direct 3-D model of a plate in air at 1e7 rad/s (R + 1 ~ 1e-3).
    [Fact]
    public void StandstillPull_EqualsThePerfectConductorLift_AtTheGapPlusThePlateThickness()
    {
        Rig rig = OnSteel(CraftRigs.Circle(4));
        SteelAttraction pull = PlateAttraction.AtStandstill(RigModel.Build(rig))!;
        double d = rig.Plate.ThicknessM;
        double perfect = RotorEddyModel.ThreeDimensional(rig.Stations[0].Rotor, rig.Plate with { BackIronM = 0 })
            .Evaluate(rig.Plate.Material.ConductivitySPerM, 1e7, rig.LandedGapM + d).LiftN;
        RelAssert.Close(4 * perfect, pull.PullDownN, 0.01, "standstill pull of four rotors");
        Assert.Equal(rig.LandedGapM, pull.GapM);
    }

    [Fact]
    public void PlateInAir_HasNoAttraction_AndNoSteelCaution()
    {
        var model = RigModel.Build(CraftRigs.Circle(4));
        Assert.Null(PlateAttraction.AtStandstill(model));
        Assert.DoesNotContain(HoverSafety.Assess(model, HoverTrim.Solve(model)).Cautions, c => c.Topic == CautionTopic.SteelUnderPlate);
    }

    // The caution the hover review shows (and spinup, load, report and the workbench through the same rule): a warning
    // naming the landed-gap pull and the mechanical stop.
    [Fact]
    public void HoverCautions_OnASteelBackedPlate_WarnOfThePull_WithItsFigure()
    {
        var model = RigModel.Build(OnSteel(CraftRigs.Circle(4)));
        SteelAttraction pull = PlateAttraction.AtStandstill(model)!;
        Caution steel = HoverSafety.Assess(model, HoverTrim.Solve(model)).Cautions.Single(c => c.Topic == CautionTopic.SteelUnderPlate);
        Assert.Equal(CautionLevel.Warning, steel.Level);
        Assert.Contains("mechanical stop", steel.Text);
        Assert.Contains($"{pull.PullDownN:0} N at the landed gap of 5 mm", steel.Reason);
    }
}

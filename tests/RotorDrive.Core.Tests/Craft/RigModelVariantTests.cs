using RotorDrive.Core.Craft;
using RotorDrive.Core.Tests.Magnetics;
using Xunit;
using RotorDrive.Core.Tests.Support;

namespace RotorDrive.Core.Tests.Craft;

public class RigModelVariantTests
{
    [Theory]
    // Statics: moving a mass m_b by d moves the centre of gravity of the whole M by (m_b / M) d (first moment of mass;
    // any statics text, e.g. J. L. Meriam and L. G. Kraige, "Engineering Mechanics: Statics", ch. 5).
    [InlineData(0.02, 0.0)]
    [InlineData(-0.013, 0.041)]
    public void CentreOfGravityOffset_MovesTheCraftsCentreByTheBodysMassShare(double dx, double dy)
    {
        var model = CraftRigs.Model(CraftRigs.Circle(6, cgXM: 0.01, cgYM: -0.005));
        var moved = model.WithCentreOfGravityOffset(dx, dy);
        double share = (model.Rig.Body.EmptyMassKg + model.PayloadKg + model.Packs.MassKg) / model.MassKg;
        RelAssert.Close(model.CgXM + share * dx, moved.CgXM, 1e-12, "cg x");
        RelAssert.Close(model.CgYM + share * dy, moved.CgYM, 1e-12, "cg y");
        Assert.Equal(model.MassKg, moved.MassKg);
        // Later variants keep the offset.
        Assert.Equal(moved.CgXM, moved.WithSoc(0.5).CgXM);
    }

    [Fact]
    public void EqualDutyResidual_IsTheYawAnalysesResidual_FromItsOwnEstimateOrAGuess()
    {
        // One faster motor: at equal duties its rotor runs faster than its partners, so the reactions do not cancel.
        var rectangle = CraftRigs.Model(CraftRigs.Rectangle(0.3, 0.2, 0.03, -0.02));
        var model = rectangle.WithParts(0, CraftRigs.Motor(kvRpmPerV: 104), CraftRigs.Controller);
        var full = YawBalance.Analyse(model);
        var searched = YawBalance.EqualDutyResidual(model);
        var guessed = YawBalance.EqualDutyResidual(model, full.EqualDuty!.Value * 1.05);
        Assert.True(Math.Abs(full.ResidualTorqueNm!.Value) > 1e-4);
        // Same Brent root (1e-12 in duty) of the same lift balance: the residuals agree to rounding of the root.
        RelAssert.Close(full.EqualDuty.Value, searched.EqualDuty!.Value, 1e-10, "equal duty");
        RelAssert.Close(full.ResidualTorqueNm.Value, searched.ResidualTorqueNm!.Value, 1e-9, "residual");
        RelAssert.Close(full.ResidualTorqueNm.Value, guessed.ResidualTorqueNm!.Value, 1e-9, "residual from a guess");
        Assert.InRange(searched.Evaluations, 3, 12);
    }
}

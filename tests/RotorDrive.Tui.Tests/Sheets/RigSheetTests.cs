using System.Globalization;
using Terminal.Gui.Input;
using RotorDrive.Files;
using RotorDrive.Tui.Sheets;
using RotorDrive.Tui.Tests.Support;
using Xunit;

namespace RotorDrive.Tui.Tests.Sheets;

public class RigSheetTests
{
    private static RotorDrive.Core.Craft.Rig DemoRig()
    {
        var loaded = RigLoader.Load(Repo.DemoRig);
        Assert.True(loaded.IsClean, string.Join("\n", loaded.Problems));
        return loaded.Rig!;
    }

    [Fact]
    public void RigSheet_OpensOnTheDemoRig_ShowingCoreTotals()
    {
        using var bench = new Bench();
        var rig = DemoRig();
        string screen = bench.Screen;
        Assert.Null(bench.OpenFailure);
        Assert.Contains(rig.Name, screen);
        // Total mass and weight as Core's Rig computes them.
        Assert.Contains($"Mass {rig.TotalMassKg.ToString("F1", CultureInfo.InvariantCulture)} kg", screen);
        Assert.Contains("All values valid.", screen);
    }

    [Fact]
    public void TheTestRig_ShowsTheDefaultOfEveryBlankLimit_AsTheResolverUsesIt()
    {
        using var bench = new Bench(columns: 120, rigPath: "/lab/test-rig.json");
        Assert.Null(bench.OpenFailure);
        var sheet = Assert.IsType<RigSheet>(bench.Window.CurrentSheet);
        var limits = bench.Context.Session.Rig!.Limits;
        // The test rig sets only yaw torque and plate temperature; the others are blank and the rig runs on the defaults
        // (RigDefaults, the values RigResolver puts in their place).
        (string Path, double InUse)[] blanks =
        [
            ("$.limits.cell_cutoff_v", limits.CellCutoffV),
            ("$.limits.usable_capacity_pct", limits.UsableCapacityFraction * 100),
            ("$.limits.max_duty", limits.MaxDuty),
            ("$.limits.liftoff_time_s", limits.LiftoffTimeS),
        ];
        foreach (var (path, inUse) in blanks)
        {
            var field = sheet.Fields.Single(f => f.Spec.JsonPath == path);
            Assert.Equal("", field.Field.Text);
            Assert.StartsWith($"blank: default {inUse.ToString("R", CultureInfo.InvariantCulture)}", field.Message.Text);
        }
        var yaw = sheet.Fields.Single(f => f.Spec.JsonPath == "$.limits.yaw_torque_nm");
        Assert.Equal("", yaw.Message.Text);
        // A value typed in takes the place of the note.
        var duty = sheet.Fields.Single(f => f.Spec.JsonPath == "$.limits.max_duty");
        duty.Field.SetFocus();
        bench.Type("0.9");
        Assert.Equal("", duty.Message.Text);
    }

    [Fact]
    public void EditingTheDesignGap_UpdatesTheRig()
    {
        using var bench = new Bench();
        var sheet = Assert.IsType<RigSheet>(bench.Window.CurrentSheet);
        var gap = sheet.Fields.Single(f => f.Spec.JsonPath == "$.gap.design_mm");
        gap.Field.SetFocus();
        gap.Field.Text = "";
        bench.Type("12.5");
        Assert.Equal(0.0125, bench.Context.Session.Rig!.DesignGapM, 12);
        Assert.True(bench.Context.Session.IsDirty);
        Assert.Contains("* unsaved", bench.Screen);
    }

    [Fact]
    public void ABadValue_ShowsItsMessageBesideTheField_AndKeepsTheTypedText()
    {
        using var bench = new Bench(columns: 120);
        var sheet = Assert.IsType<RigSheet>(bench.Window.CurrentSheet);
        var thickness = sheet.Fields.Single(f => f.Spec.JsonPath == "$.plate.thickness_mm");
        thickness.Field.SetFocus();
        thickness.Field.Text = "";
        bench.Type("8,5");
        Assert.Equal("8,5", thickness.Field.Text);
        Assert.Contains("not a number", thickness.CurrentMessage);
        Assert.Contains("! '8,5' is not a number", bench.Screen);
        // The document keeps the last valid value; the rig still resolves from it.
        Assert.Equal(8.0, bench.Context.Session.Document!.Plate!.ThicknessMm);
        Assert.True(bench.Context.Session.IsDirty);

        bench.Press(Key.Tab);
        Assert.Equal("8,5", thickness.Field.Text);
    }

    [Fact]
    public void AValueOutOfRange_ShowsTheResolversMessage_AndTheRigWaitsForAValidValue()
    {
        using var bench = new Bench(columns: 120);
        var sheet = Assert.IsType<RigSheet>(bench.Window.CurrentSheet);
        var landed = sheet.Fields.Single(f => f.Spec.JsonPath == "$.gap.landed_mm");
        landed.Field.SetFocus();
        landed.Field.Text = "";
        bench.Type("14");
        // The landed gap may not exceed the design gap (10 mm in the demo rig): RigResolver's own message.
        Assert.Equal(RotorDrive.Files.Messages.LandedAboveDesign(14, 10), landed.CurrentMessage);
        Assert.Null(bench.Context.Session.Rig);
        Assert.Equal("14", landed.Field.Text);
        Assert.Contains("Totals appear once every value is valid.", bench.Screen);
    }

    [Fact]
    public void F4_PicksAPackFromTheCatalog()
    {
        using var bench = new Bench();
        var sheet = Assert.IsType<RigSheet>(bench.Window.CurrentSheet);
        var pack = sheet.Fields.Single(f => f.Spec.JsonPath == "$.pack.id");
        var other = bench.Context.Session.Catalog!.Packs.First(p => p.Id != bench.Context.Session.Rig!.Packs!.Pack.Id);
        pack.Field.SetFocus();
        bench.Prompts.Answers.Enqueue(other.Id);
        bench.Press(Key.F4);
        Assert.Equal(other.Id, bench.Context.Session.Rig!.Packs!.Pack.Id);
        Assert.Contains(other.Id, bench.Screen);
    }
}

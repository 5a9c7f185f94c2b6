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
    public void FieldRows_AreDrawnBesideTheirFields_ByTheSheet_AndScrollWithThem()
    {
        // Issue 15 item 1: the Rig sheet was about 170 views (a label, a field, a unit and a message per value), and a
        // sheet switch during a long run spent most of its time drawing them. Labels, units and messages are now drawn by
        // the sheet on each field's row; only the fields are views. Each must still sit on its field's row, also after
        // scrolling (80 x 24 shows part of the sheet), and a problem must show beside its field.
        using var bench = new Bench(80, 24);
        bench.Window.ShowSheet("Rig");
        var sheet = Assert.IsType<RigSheet>(bench.Window.CurrentSheet);
        int views = 0;
        void Count(Terminal.Gui.ViewBase.View v) { views++; foreach (var sub in v.SubViews) { Count(sub); } }
        Count(sheet);
        // The sheet, its three summary lines and six headings, and per field the text field with its completion popup.
        Assert.InRange(views, 2 * sheet.Fields.Count, 2 * sheet.Fields.Count + 12);
        Assert.Contains(bench.Screen.Split('\n'), line => line.Contains(" thickness        12            mm", StringComparison.Ordinal));

        var last = sheet.Fields[^1];
        last.Field.SetFocus();
        string scrolled = bench.Screen;
        Assert.DoesNotContain(" thickness ", scrolled, StringComparison.Ordinal);
        Assert.Contains(scrolled.Split('\n'), line => line.Contains($" {last.Spec.Label}", StringComparison.Ordinal)
            && line.Contains(last.Field.Text, StringComparison.Ordinal));

        var thickness = sheet.Fields.Single(f => f.Spec.Label == "thickness");
        thickness.Field.SetFocus();
        thickness.Field.Text = "-3";
        string marked = bench.Screen;
        Assert.True(thickness.Message.IsError);
        Assert.Contains(marked.Split('\n'), line => line.Contains(" thickness        -3", StringComparison.Ordinal) && line.Contains("! ", StringComparison.Ordinal));

        // A required value left blank says so in words, not with the file's JSON key (issue 15 item 4).
        thickness.Field.Text = "";
        Assert.Equal("a value is required", thickness.CurrentMessage);
        Assert.DoesNotContain("thickness_mm", bench.Screen, StringComparison.Ordinal);
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

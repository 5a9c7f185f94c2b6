using Terminal.Gui.Input;
using RotorDrive.Tui.Sheets;
using RotorDrive.Tui.Tests.Support;
using Xunit;

namespace RotorDrive.Tui.Tests.Shell;

public class MainWindowTests
{
    private static void EditDesignGap(Bench bench, string text)
    {
        var sheet = Assert.IsType<RigSheet>(bench.Window.CurrentSheet);
        var gap = sheet.Fields.Single(f => f.Spec.JsonPath == "$.gap.design_mm");
        gap.Field.SetFocus();
        gap.Field.Text = "";
        bench.Type(text);
    }

    [Fact]
    public void StatusLine_ShowsRigName_AndKeyHints()
    {
        using var bench = new Bench(columns: 80, rows: 24);
        string screen = bench.Screen;
        Assert.Contains("Lab carrier H6", screen);
        Assert.Contains("F1 Help", screen);
        Assert.Contains("F10 Quit", screen);
        Assert.DoesNotContain("* unsaved", screen);
    }

    [Fact]
    public void Quit_WithoutEdits_StopsWithoutAsking()
    {
        using var bench = new Bench();
        bench.Press(Key.F10);
        Assert.Empty(bench.Prompts.Asked);
        Assert.True(bench.Window.StopRequested);
    }

    [Fact]
    public void Quit_WithUnsavedEdits_Asks_AndCancelKeepsTheWorkbenchOpen()
    {
        using var bench = new Bench();
        EditDesignGap(bench, "11");
        bench.Prompts.Answers.Enqueue("Cancel");
        bench.Press(Key.F10);
        Assert.Single(bench.Prompts.Asked);
        Assert.Contains("unsaved edits", bench.Prompts.Asked[0]);
        Assert.False(bench.Window.StopRequested);
        Assert.True(bench.Context.Session.IsDirty);
        Assert.Empty(bench.Files.Writes);
    }

    [Fact]
    public void Quit_WithUnsavedEdits_SaveAnswer_SavesWithABackup_ThenStops()
    {
        using var bench = new Bench();
        string original = bench.Files["/lab/demo-rig.json"];
        EditDesignGap(bench, "11");
        bench.Prompts.Answers.Enqueue("Save");
        bench.Press(Key.F10);
        Assert.True(bench.Window.StopRequested);
        Assert.Equal(original, bench.Files["/lab/demo-rig.json.bak"]);
        Assert.Contains("\"design_mm\": 11", bench.Files["/lab/demo-rig.json"]);
    }

    [Fact]
    public void Quit_WithUnsavedEdits_DiscardAnswer_StopsWithoutWriting()
    {
        using var bench = new Bench();
        EditDesignGap(bench, "11");
        bench.Prompts.Answers.Enqueue("Discard");
        bench.Press(Key.F10);
        Assert.True(bench.Window.StopRequested);
        Assert.Empty(bench.Files.Writes);
    }

    [Fact]
    public void Save_KeepsThePreviousFileAsBak_AndClearsTheUnsavedMark()
    {
        using var bench = new Bench();
        string original = bench.Files["/lab/demo-rig.json"];
        EditDesignGap(bench, "9.5");
        bench.Press(Key.F2);
        Assert.Equal(original, bench.Files["/lab/demo-rig.json.bak"]);
        Assert.Equal(["/lab/demo-rig.json"], bench.Files.Writes);
        Assert.False(bench.Context.Session.IsDirty);
        Assert.Contains("Saved /lab/demo-rig.json at 10:00:00", bench.Window.StatusText);
        // The saved file reads back as the edited rig.
        var reread = new RotorDrive.Tui.Session.RigSession(bench.Files);
        Assert.Null(reread.Open("/lab/demo-rig.json"));
        Assert.Equal(0.0095, reread.Rig!.DesignGapM, 12);
        // The rig file's comments (the rig file allows // comments) are kept through the load, edit and save.
        string saved = bench.Files["/lab/demo-rig.json"];
        var comments = original.Split('\n').Select(l => l.Trim()).Where(l => l.StartsWith("//", StringComparison.Ordinal)).ToList();
        Assert.NotEmpty(comments);
        Assert.All(comments, c => Assert.Contains(c, saved));
    }

    [Fact]
    public void SaveAs_OntoAnotherExistingFile_AsksFirst_AndCancelWritesNothing()
    {
        using var bench = new Bench();
        bench.Files["/lab/other.json"] = "{}";
        bench.Prompts.Answers.Enqueue("/lab/other.json");
        bench.Prompts.Answers.Enqueue("Cancel");
        bench.Press(Key.F12);
        Assert.Contains(bench.Prompts.Asked, q => q.StartsWith("Replace file?", StringComparison.Ordinal));
        Assert.Equal("{}", bench.Files["/lab/other.json"]);
        Assert.Empty(bench.Files.Writes);
    }

    [Fact]
    public void SaveAs_IntoAnotherFolder_RewritesCatalogPaths_SoTheCopyStillOpens()
    {
        using var bench = new Bench();
        bench.Prompts.Answers.Enqueue("/lab/copies/rig2.json");
        bench.Press(Key.F12);
        Assert.Equal(["/lab/copies/rig2.json"], bench.Files.Writes);
        Assert.Contains("\"motors\": \"../motors.csv\"", bench.Files["/lab/copies/rig2.json"]);
        var reread = new RotorDrive.Tui.Session.RigSession(bench.Files);
        Assert.Null(reread.Open("/lab/copies/rig2.json"));
        Assert.NotNull(reread.Rig);
    }

    [Fact]
    public void Open_WithUnsavedEdits_AsksFirst()
    {
        using var bench = new Bench();
        EditDesignGap(bench, "11");
        bench.Prompts.Answers.Enqueue("Cancel");
        bench.Press(Key.F3);
        Assert.Single(bench.Prompts.Asked);
        Assert.Equal(0.011, bench.Context.Session.Rig!.DesignGapM, 12);
    }

    [Fact]
    public void AltDigit_And_CtrlPageDown_MoveBetweenSheets()
    {
        using var bench = new Bench();
        bench.Press(Key.D2.WithAlt);
        Assert.Equal("Stations", bench.Window.CurrentSheet.SheetName);
        bench.Press(Key.PageDown.WithCtrl);
        Assert.Equal(bench.Window.Sheets[2].SheetName, bench.Window.CurrentSheet.SheetName);
        bench.Press(Key.PageUp.WithCtrl);
        Assert.Equal("Stations", bench.Window.CurrentSheet.SheetName);
        bench.Press(Key.F1);
        Assert.Equal("Help", bench.Window.CurrentSheet.SheetName);
    }

    [Fact]
    public void EverySheetHasAKey_ListedInTheSheetListAndOnHelp_AndPlainKeysWorkOutsideFields()
    {
        using var bench = new Bench(columns: 80, rows: 24);
        var keys = bench.Window.SheetKeys;
        Assert.Equal(bench.Window.Sheets.Count, keys.Count);
        Assert.Equal("?", keys[^1]);
        Assert.Equal("Help", bench.Window.Sheets[^1].SheetName);
        Assert.Equal(keys.Count, keys.Distinct().Count());
        Assert.All(keys, k => Assert.NotEqual("", k));
        string screen = bench.Screen;
        Assert.Contains("5 Hover & yaw", screen);
        Assert.Contains("? Help", screen);

        Assert.IsNotType<Terminal.Gui.Views.TextField>(bench.Window.MostFocused);
        bench.Press(new Key('6'));
        Assert.Equal("Spin-up", bench.Window.CurrentSheet.SheetName);
        // The sheet list keeps the focus (the Spin-up sheet's first field does not swallow the next key).
        Assert.IsNotType<Terminal.Gui.Views.TextField>(bench.Window.MostFocused);
        bench.Press(new Key('5'));
        Assert.Equal("Hover & yaw", bench.Window.CurrentSheet.SheetName);
        bench.Press(new Key('?'));
        Assert.Equal("Help", bench.Window.CurrentSheet.SheetName);
        string help = HelpSheet.Compose(bench.Window.Sheets.Select((s, i) => (keys[i], s.SheetName)).ToList());
        Assert.Contains("  5                 Hover & yaw", help);
        Assert.Contains("  ?                 Help (also F1)", help);
        bench.Press(Key.D1.WithAlt);
        Assert.Equal("Rig", bench.Window.CurrentSheet.SheetName);
    }

    [Fact]
    public void DigitsTypedInAField_StayText_AndDoNotSwitchSheets()
    {
        using var bench = new Bench();
        EditDesignGap(bench, "9");
        Assert.Equal("Rig", bench.Window.CurrentSheet.SheetName);
        Assert.Equal(0.009, bench.Context.Session.Rig!.DesignGapM, 12);
    }

    // At 80 x 24 the key-hint line of every sheet fits on the screen (nothing cut off at the right edge).
    [Fact]
    public void KeyHints_FitOn80Columns_OnEverySheet()
    {
        using var bench = new Bench(columns: 80, rows: 24);
        for (int i = 0; i < bench.Window.Sheets.Count; i++)
        {
            bench.Window.ShowSheet(i);
            string[] rows = bench.Screen.Split('\n');
            string hints = rows.Last(r => r.Contains("F10 Quit", StringComparison.Ordinal)).TrimEnd();
            Assert.True(hints.Length <= 80, $"{bench.Window.Sheets[i].SheetName}: {hints}");
            Assert.EndsWith("F10 Quit", hints);
            if (bench.Window.Sheets[i].KeyHints.Length > 0)
            {
                Assert.Contains(bench.Window.Sheets[i].KeyHints, hints);
            }
        }
    }
}

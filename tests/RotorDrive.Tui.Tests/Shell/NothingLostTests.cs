using Terminal.Gui.Input;
using RotorDrive.Tui.Sheets;
using RotorDrive.Tui.Tests.Support;
using Xunit;

namespace RotorDrive.Tui.Tests.Shell;

public class NothingLostTests
{
    internal static StressSheet StartLongStressRun(Bench bench)
    {
        bench.Window.ShowSheet("Stress");
        var sheet = Assert.IsType<StressSheet>(bench.Window.CurrentSheet);
        sheet.SamplesField.SetFocus();
        sheet.SamplesField.Text = "";
        bench.Type("200000");
        bench.Press(Key.F5);
        return sheet;
    }

    private static async Task WaitForSamples(StressSheet sheet, int count)
    {
        var deadline = DateTime.UtcNow.AddSeconds(120);
        while (sheet.SamplesDone < count && DateTime.UtcNow < deadline)
        {
            await Task.Delay(20);
        }
        Assert.True(sheet.SamplesDone >= count, "the run started");
    }

    [Fact]
    public void Esc_InTheWindow_NeverQuits_AndSaysWhichKeysDo()
    {
        using var bench = new Bench();
        bench.Press(Key.Esc);
        Assert.False(bench.Window.StopRequested);
        Assert.Empty(bench.Prompts.Asked);
        Assert.Contains("F10 or Ctrl+Q quits", bench.Window.StatusText);
    }

    [Fact]
    public void Esc_InAFieldHoldingTextThatIsNotAValue_PutsTheRigsValueBack_AndDoesNotQuit()
    {
        using var bench = new Bench();
        var sheet = Assert.IsType<RigSheet>(bench.Window.CurrentSheet);
        var gap = sheet.Fields.Single(f => f.Spec.JsonPath == "$.gap.design_mm");
        gap.Field.SetFocus();
        bench.Press(Key.End);
        bench.Type("x");
        Assert.Equal("10x", gap.Field.Text);
        Assert.Contains("$.gap.design_mm", bench.Context.Session.UntypedFields.Keys);
        Assert.NotEqual("", gap.CurrentMessage);

        bench.Press(Key.Esc);
        Assert.False(bench.Window.StopRequested);
        Assert.Empty(bench.Context.Session.UntypedFields);
        Assert.Equal("10", gap.Field.Text);
        Assert.Equal("", gap.CurrentMessage);
        Assert.Equal(0.010, bench.Context.Session.Rig!.DesignGapM, 12);
    }

    [Fact]
    public async Task Quit_DuringALongRun_Asks_AndCancelKeepsTheRunGoing()
    {
        using var bench = new Bench(120, 40);
        var sheet = StartLongStressRun(bench);
        await WaitForSamples(sheet, 1);
        bench.Prompts.Answers.Enqueue("Cancel");
        bench.Press(Key.Q.WithCtrl);
        Assert.Contains(bench.Prompts.Asked, a => a.StartsWith("Quit: Quitting loses the stress run in progress", StringComparison.Ordinal));
        Assert.False(bench.Window.StopRequested);
        Assert.True(bench.Context.Work.IsActive("stress test"));

        bench.Prompts.Answers.Enqueue("Quit");
        bench.Press(Key.F10);
        Assert.True(bench.Window.StopRequested);
        await bench.SettleAsync();
    }

    [Fact]
    public async Task DuringALongRun_SheetKeysAndTyping_GoToTheFieldWithFocus_NotToTheSamplesField()
    {
        using var bench = new Bench(120, 40);
        var stress = StartLongStressRun(bench);
        await WaitForSamples(stress, 1);
        bench.Press(Key.D1.WithAlt);
        var rig = Assert.IsType<RigSheet>(bench.Window.CurrentSheet);
        var gap = rig.Fields.Single(f => f.Spec.JsonPath == "$.gap.design_mm");
        gap.Field.SetFocus();
        gap.Field.Text = "";
        bench.Type("11");
        Assert.Equal("11", gap.Field.Text);
        Assert.Equal("200000", stress.SamplesField.Text);

        // F8 stops the run at once (the sheet says so before the worker has summed up), and keeps what finished.
        bench.Press(Key.D9.WithAlt);
        bench.Press(Key.F8);
        Assert.Contains("Stopped.", bench.Window.StatusText);
        // While the worker returns, the status line does not also say the run is going.
        Assert.DoesNotContain("stress test...", bench.Window.StatusText);
        await bench.SettleAsync();
        Assert.True(stress.Result!.Partial);
        Assert.True(stress.Result.Samples >= 1);
    }

    [Fact]
    public void SaveAs_OntoTheOpenFile_AsksFirst_AndKeepsABackup()
    {
        using var bench = new Bench();
        string original = bench.Files["/lab/demo-rig.json"];
        bench.Prompts.Answers.Enqueue("/lab/demo-rig.json");
        bench.Prompts.Answers.Enqueue("Cancel");
        bench.Press(Key.F12);
        Assert.Contains(bench.Prompts.Asked, a => a.StartsWith("Save over the open file?", StringComparison.Ordinal));
        Assert.Empty(bench.Files.Writes);

        bench.Prompts.Answers.Enqueue("/lab/demo-rig.json");
        bench.Prompts.Answers.Enqueue("Save");
        bench.Press(Key.F12);
        Assert.Equal(original, bench.Files["/lab/demo-rig.json.bak"]);
    }

    [Fact]
    public void Stopped_IsNotShown_OnceTheRigIsEdited()
    {
        using var bench = new Bench();
        bench.Press(Key.F8);
        Assert.Contains("Nothing is running.", bench.Window.StatusText);
        var rig = Assert.IsType<RigSheet>(bench.Window.CurrentSheet);
        var gap = rig.Fields.Single(f => f.Spec.JsonPath == "$.gap.design_mm");
        gap.Field.SetFocus();
        gap.Field.Text = "";
        bench.Type("11");
        Assert.DoesNotContain("Nothing is running.", bench.Window.StatusText);
    }

    [Fact]
    public async Task TheWorstSampleHint_NamesTheFile_OnlyWhenItHoldsTheRigAsRun()
    {
        using var bench = new Bench(120, 40);
        bench.Window.ShowSheet("Rig");
        var rig = Assert.IsType<RigSheet>(bench.Window.CurrentSheet);
        var gap = rig.Fields.Single(f => f.Spec.JsonPath == "$.gap.design_mm");
        gap.Field.SetFocus();
        gap.Field.Text = "";
        bench.Type("11");
        bench.Window.ShowSheet("Stress");
        var sheet = Assert.IsType<StressSheet>(bench.Window.CurrentSheet);
        sheet.SamplesField.SetFocus();
        sheet.SamplesField.Text = "";
        bench.Type("8");
        bench.Press(Key.F5);
        await bench.SettleAsync();
        Assert.Contains(sheet.ResultLines, l => l.Contains("The rig as run is not the saved file", StringComparison.Ordinal));
        Assert.DoesNotContain(sheet.ResultLines, l => l.Contains("rotordrive stress", StringComparison.Ordinal));

        bench.Press(Key.F2);
        bench.Window.ShowSheet("Stress");
        Assert.Contains(sheet.ResultLines, l => l.Contains("rotordrive stress /lab/demo-rig.json --seed 1 --sample", StringComparison.Ordinal));
    }

    [Fact]
    public void Underscores_InPathsAndFileNames_AreShownAsWritten()
    {
        using var bench = new Bench(120, 40);
        bench.Prompts.Answers.Enqueue("/lab/my_rig_copy.json");
        bench.Press(Key.F12);
        Assert.Contains("Saved as /lab/my_rig_copy.json", bench.Screen);
    }

    [Fact]
    public void ATerminalOf70By20_SaysItIsTooSmall_AndTheSheetsComeBackWhenEnlarged()
    {
        using var bench = new Bench(70, 20);
        Assert.True(bench.Window.TooSmall);
        string screen = bench.Screen;
        Assert.Contains("The terminal is 70 x 20 characters; the", screen);
        Assert.DoesNotContain("Sheets", screen);
        bench.App.Driver!.SetScreenSize(80, 24);
        bench.Draw();
        Assert.False(bench.Window.TooSmall);
        Assert.Contains("Sheets", bench.Screen);
    }
}

using System.Globalization;
using Terminal.Gui.Input;
using RotorDrive.Core.Studies.Stress;
using RotorDrive.Files;
using RotorDrive.Files.Rigs;
using RotorDrive.Tui.Sheets;
using RotorDrive.Tui.Tests.Support;
using Xunit;

namespace RotorDrive.Tui.Tests.Sheets;

public class StressSheetTests
{
    private static StressSheet Open(Bench bench)
    {
        bench.Window.ShowSheet("Stress");
        return Assert.IsType<StressSheet>(bench.Window.CurrentSheet);
    }

    private static void Retype(Bench bench, Terminal.Gui.Views.TextField field, string text)
    {
        field.SetFocus();
        field.Text = "";
        bench.Type(text);
    }

    private static FieldBinding Field(StressSheet sheet, string key) => sheet.Fields.Single(f => f.Spec.JsonPath == "$.tolerances." + key);

    [Fact]
    public async Task StressSheet_RunsCoresStudy_AndShowsItsFailureRatesPercentilesAndHistogram()
    {
        using var bench = new Bench(120, 40);
        var sheet = Open(bench);
        // The demo rig's own spreads, as the stress command reads them.
        Assert.Equal("normal 2%", Field(sheet, "motor_kv_rpm_per_v").Field.Text);
        Assert.Equal("uniform -16% 0%", Field(sheet, "controller_current_limit_a").Field.Text);
        Retype(bench, sheet.SamplesField, "24");
        Retype(bench, sheet.SeedField, "3");
        bench.Press(Key.F5);
        await bench.SettleAsync();

        var session = bench.Context.Session;
        var loaded = RigLoader.Load(Repo.DemoRig);
        Assert.Equal(loaded.Tolerances, session.Tolerances);
        var expected = StressStudy.Run(new RigStressModel(session.Rig!, session.Tolerances), session.Tolerances, new StressStudyOptions(24, 3));
        var shown = sheet.Result!;
        Assert.False(shown.Partial);
        Assert.Equal(expected.FailureRate, shown.FailureRate);
        Assert.Equal(expected.Criteria, shown.Criteria);
        Assert.Equal(expected.Percentiles, shown.Percentiles);
        Assert.Equal(expected.WorstSample, shown.WorstSample);
        var lines = sheet.ResultLines;
        foreach (var c in expected.Criteria)
        {
            Assert.Contains(lines, l => l.StartsWith($"  {c.Key.Replace('_', ' '),-13} {c.Rate.Count,7} ", StringComparison.Ordinal)
                && l.Contains((c.Rate.UpperFraction * 100).ToString("F2", System.Globalization.CultureInfo.InvariantCulture) + " %"));
        }
        var speed = expected.Percentiles.Single(p => p.Key == "hover_speed_rpm").Summary!;
        Assert.Contains(lines, l => l.StartsWith("  hover speed, rpm", StringComparison.Ordinal) && l.Contains(speed.P50Si.ToString("F0", System.Globalization.CultureInfo.InvariantCulture)));
        Assert.Contains(lines, l => l.StartsWith("Histogram of hover speed, rpm", StringComparison.Ordinal));
        Assert.Contains(lines, l => l.StartsWith($"Worst sample: {expected.WorstSample}", StringComparison.Ordinal));
        Assert.Contains("24 samples, seed 3", sheet.StateText);

        bench.Press(Key.F7);
        Assert.Equal("hover_current_a", sheet.HistogramFigure);
        Assert.Contains(sheet.ResultLines, l => l.StartsWith("Histogram of hover current, A", StringComparison.Ordinal));
    }

    [Fact]
    public async Task AtEightyColumns_EveryResultLineFits_AndDriversAreNamedInWords()
    {
        using var bench = new Bench(80, 24);
        var sheet = Open(bench);
        Retype(bench, sheet.SamplesField, "24");
        Retype(bench, sheet.SeedField, "3");
        bench.Press(Key.F5);
        await bench.SettleAsync();
        bench.Draw();
        Assert.NotNull(sheet.Result);
        // The result list is 60 columns wide at 80 (18 for the sheet list, 2 for the frames); a line must end inside it.
        Assert.All(sheet.ResultLines, l => Assert.True(l.Length < 60, $"{l.Length}: {l}"));
        int drivers = sheet.ResultLines.ToList().FindIndex(l => l.StartsWith("Top drivers", StringComparison.Ordinal));
        Assert.True(drivers >= 0);
        Assert.All(sheet.ResultLines.Skip(drivers + 1).TakeWhile(l => l.StartsWith("  ", StringComparison.Ordinal)),
            l => Assert.DoesNotContain("_", l));
    }

    [Fact]
    public void ABadTolerance_ShowsItsMessageBesideTheField_AndKeepsTheTypedText()
    {
        using var bench = new Bench(120, 40);
        var sheet = Open(bench);
        var kv = Field(sheet, "motor_kv_rpm_per_v");
        Retype(bench, kv.Field, "normal 2,5%");
        Assert.Equal("normal 2,5%", kv.Field.Text);
        Assert.Equal("'2,5' is not a number (use a dot for decimals, e.g. 2.5)", kv.CurrentMessage);
        Assert.Contains("! '2,5' is not a number", bench.Screen);
        // The document keeps the last text that read as a spread ("normal 2" on the way, 2 rpm/V); the rig still resolves.
        Assert.Equal(2, bench.Context.Session.Document!.Tolerances!.Entries["motor_kv_rpm_per_v"].NormalSd);
        Assert.NotNull(bench.Context.Session.Rig);

        // A number out of the resolver's range: its own message, beside the field, text kept.
        var gap = Field(sheet, "gap_offset_mm");
        Retype(bench, gap.Field, "normal 2%");
        var copy = bench.Context.Session.Document!.Clone();
        var problems = new List<InputProblem>();
        RigResolver.ResolveTolerances(copy, "rig.json", null, problems);
        var expected = problems.Single(p => p.Field.StartsWith("$.tolerances.gap_offset_mm", StringComparison.Ordinal));
        Assert.Equal(expected.Message, gap.CurrentMessage);
        Assert.Equal("normal 2%", gap.Field.Text);
        Assert.Null(bench.Context.Session.Rig);
        bench.Press(Key.Tab);
        Assert.Equal("normal 2%", gap.Field.Text);
    }

    [Fact]
    public void AToleranceEdit_IsARigEdit_SavedWithTheRig()
    {
        using var bench = new Bench(120, 40);
        var sheet = Open(bench);
        Retype(bench, Field(sheet, "payload_kg").Field, "uniform -5 10");
        Retype(bench, Field(sheet, "cg_x_mm").Field, "");
        Assert.True(bench.Context.Session.IsDirty);
        Assert.Contains("* unsaved", bench.Screen);
        Assert.Empty(bench.Files.Writes);

        bench.Press(Key.F2);
        var saved = RigDocumentReader.Read(bench.Files["/lab/demo-rig.json"], "/lab/demo-rig.json");
        Assert.Empty(saved.Problems);
        var entries = saved.Document!.Tolerances!.Entries;
        Assert.Equal([-5.0, 10.0], entries["payload_kg"].Uniform!);
        Assert.False(entries.ContainsKey("cg_x_mm"));
        Assert.False(bench.Context.Session.IsDirty);
    }

    [Fact]
    public async Task StoppingARun_ShowsTheSamplesFinishedAsPartial_AndTheSheetStaysUsable()
    {
        using var bench = new Bench(120, 40);
        var sheet = Open(bench);
        Retype(bench, sheet.SamplesField, "200000");
        bench.Press(Key.F5);
        var deadline = DateTime.UtcNow.AddSeconds(120);
        while (sheet.SamplesDone < 3 && DateTime.UtcNow < deadline)
        {
            await Task.Delay(50);
        }
        Assert.True(sheet.SamplesDone >= 3, "the run started");
        bench.Press(Key.F8);
        await bench.SettleAsync();
        var partial = sheet.Result!;
        Assert.True(partial.Partial);
        Assert.InRange(partial.Samples, 3, 199_999);
        Assert.Equal(200_000, partial.RequestedSamples);
        Assert.StartsWith($"PARTIAL: stopped after {partial.Samples.ToString("N0", CultureInfo.InvariantCulture)} of 200,000 samples", sheet.StateText);
        Assert.StartsWith("PARTIAL: ", sheet.ResultLines[0]);
        // The figures showed at once and the drivers followed (F8 never waits for them); they are the drivers the
        // aggregation gives on the same samples.
        Assert.False(partial.DriversPending);
        var aggregated = StressStudy.Aggregate(partial.SampleResults, partial.RequestedSamples, partial.Seed, partial.Inputs);
        Assert.Equal(aggregated.Drivers, partial.Drivers);
        Assert.DoesNotContain(sheet.ResultLines, l => l.Contains("computing...", StringComparison.Ordinal));

        Retype(bench, sheet.SamplesField, "6");
        bench.Press(Key.F5);
        await bench.SettleAsync();
        Assert.False(sheet.Result!.Partial);
        Assert.Equal(6, sheet.Result.Samples);
    }

    [Fact]
    public void BadSamples_ShowTheirMessage_AndNoRunStarts()
    {
        using var bench = new Bench(120, 40);
        var sheet = Open(bench);
        Retype(bench, sheet.SamplesField, "12k");
        Assert.Equal("! samples: a whole number 1..1,000,000", sheet.RunMessage);
        bench.Press(Key.F5);
        Assert.False(bench.Context.Work.IsActive("stress test"));
        Assert.Equal("12k", sheet.SamplesField.Text);
    }
}

using System.Drawing;
using System.Globalization;
using Terminal.Gui.Input;
using Terminal.Gui.Views;
using RotorDrive.Core.Simulation;
using RotorDrive.Core.Studies.Ranking;
using RotorDrive.Tui.Sheets;
using RotorDrive.Tui.Tests.Support;
using RotorDrive.Tui.Text;
using Xunit;

namespace RotorDrive.Tui.Tests.Sheets;

public class ShortlistSheetTests
{
    private static async Task<(Bench Bench, ShortlistSheet Sheet)> OpenAsync(int columns = 120, int rows = 36)
    {
        var bench = new Bench(columns, rows, files: SmallCatalogs.Files());
        bench.Window.ShowSheet("Shortlist");
        await bench.SettleAsync();
        return (bench, Assert.IsType<ShortlistSheet>(bench.Window.CurrentSheet));
    }

    // The same ranking straight from Core, with the sheet's settings: the rig's pack count (2) as the largest tried.
    private static (RankStudy Study, RankResult Result) CoreRanking(Bench bench, RankObjective objective)
    {
        var session = bench.Context.Session;
        var study = RankStudy.Create(session.Rig!, session.Catalog!, new RankOptions(Objective: objective, Top: ShortlistSheet.TopCount, MaxPackCount: 2));
        return (study, study.Run());
    }

    [Fact]
    public async Task ShortlistSheet_OnTheDemoRig_ShowsCoresRanking_WithTheParetoSetAndTheRigsOwnRank()
    {
        var (bench, sheet) = await OpenAsync();
        using (bench)
        {
            var (study, expected) = CoreRanking(bench, RankObjective.Runtime);
            Assert.NotNull(sheet.Result);
            Assert.Equal(expected.Ordered, sheet.Result!.Ordered);
            Assert.Equal(72, expected.TotalCombinations);
            var table = Assert.IsType<TextTableSource>(sheet.Table.Table);
            Assert.Equal(expected.Top.Count, table.Rows);
            for (int i = 1; i < expected.Top.Count; i++)
            {
                var entry = expected.Top[i];
                var row = table.Row(i);
                Assert.Equal(entry.Rank.ToString(CultureInfo.InvariantCulture), row[0]);
                Assert.Equal(entry.InParetoSet ? "P" : "", row[1]);
                // The hover time is the endurance run's, with its ending; the quick pack-only figure is labelled so.
                var sim = entry.Evaluation.Simulation!;
                Assert.Equal((sim.EnduranceRuntimeS / 60).ToString("F1", CultureInfo.InvariantCulture), row[2]);
                Assert.Equal(sim.EnduranceLimit.Words(), row[3]);
                Assert.Equal((entry.Evaluation.Figures!.RuntimeS / 60).ToString("F1", CultureInfo.InvariantCulture), row[4]);
                Assert.Equal(entry.Evaluation.MotorId, row[7]);
                Assert.Equal(entry.Evaluation.ControllerId, row[8]);
                Assert.Equal($"{entry.Evaluation.Candidate.PackCount} x {entry.Evaluation.PackId}", row[9]);
            }
            // The rig's own drivetrain (or1050-kv90 + sc120-12s + 2 x lp12s-20ah) where Core places it.
            var own = study.AssignedCandidate!.Value;
            Assert.Equal(expected.AssignedRank, expected.RankOf(own));
            string where = expected.AssignedRank is { } rank ? $"rank {rank}" : "! rejected";
            Assert.StartsWith($"Rig: {where}", sheet.AssignedText);
            Assert.EndsWith($": {expected.Assigned!.Label}", sheet.AssignedText);
            foreach (var count in expected.RejectionCounts.Where(c => c.Count > 0))
            {
                Assert.Contains(sheet.DetailLines, l => l.EndsWith(count.Kind.Describe(), StringComparison.Ordinal) && l.Contains(count.Count.ToString("N0", CultureInfo.InvariantCulture)));
            }
            string screen = bench.Screen;
            Assert.Contains("72 tried", screen);
            Assert.Contains("rank by runtime", screen);
        }
    }

    [Fact]
    public async Task TheRigsOwnRow_IsPinned_WithItsEndurance_AndTheHeaderAndRankColumnStayWhileScrolling()
    {
        var (bench, sheet) = await OpenAsync(80, 24);
        using (bench)
        {
            var (study, expected) = CoreRanking(bench, RankObjective.Runtime);
            var own = study.AssignedCandidate!.Value;
            // The pinned row carries the rig's rank and the endurance run Core gives its drivetrain (pack, windings and
            // plate together), whether or not it is on the shortlist.
            var row = sheet.RigRow!;
            Assert.Equal($"rig {expected.RankOf(own)}", row[0]);
            var sim = study.Simulate(own);
            Assert.Equal((sim.EnduranceRuntimeS / 60).ToString("F1", CultureInfo.InvariantCulture), row[2]);
            Assert.Equal(sim.EnduranceLimit.Words(), row[3]);
            Assert.Equal((study.Evaluate(own).Figures!.RuntimeS / 60).ToString("F1", CultureInfo.InvariantCulture), row[4]);
            Assert.True(bench.Screen.Contains($"rig {expected.RankOf(own)}"), bench.Screen);
            // At 80 columns the rig line leaves the parts to the pinned row rather than being cut off.
            Assert.Contains(sheet.AssignedText, bench.Screen);

            // Rows scroll under a header that stays; the pinned row stays too.
            sheet.Table.SetFocus();
            for (int i = 1; i < expected.Top.Count; i++)
            {
                bench.Press(Key.CursorDown);
            }
            await bench.SettleAsync();
            string screen = bench.Screen;
            Assert.Contains("hover min", screen);
            Assert.Contains($"rig {expected.RankOf(own)}", screen);
            Assert.Equal(expected.Top.Count - 1, sheet.Table.Value!.SelectedCell.Y);
            Assert.True(sheet.Table.HasFocus);

            // Sideways the rank column stays and the others move under it.
            bench.Press(Key.CursorRight);
            bench.Press(Key.CursorRight);
            await bench.SettleAsync();
            Assert.Equal(["rank", "ends by", "pack-only min"], sheet.ShownColumns.Take(3));
            Assert.Equal(expected.Top.Count - 1, sheet.Table.Value!.SelectedCell.Y);
            screen = bench.Screen;
            Assert.Contains("rank", screen);
            Assert.DoesNotContain("hover min", screen);
            bench.Press(Key.CursorLeft);
            await bench.SettleAsync();
            Assert.Equal(["rank", "hover min"], sheet.ShownColumns.Take(2));
        }
    }

    [Fact]
    public async Task WhyNot_ListsEveryCombinationOfTheMotor_WithCoresReasons()
    {
        var (bench, sheet) = await OpenAsync();
        using (bench)
        {
            sheet.WhyNotField.Text = "or150-kv300";
            await bench.SettleAsync();
            var (study, _) = CoreRanking(bench, RankObjective.Runtime);
            var expected = study.ExplainMotor(0);
            Assert.Equal(expected.Count, sheet.Explained!.Count);
            Assert.Contains(sheet.DetailLines, l => l.StartsWith($"Why not or150-kv300: {expected.Count} combinations with it, {expected.Count(e => e.Accepted)} accepted", StringComparison.Ordinal));
            foreach (var e in expected.Where(e => !e.Accepted))
            {
                Assert.Contains($"  {e.ControllerId} + {e.Candidate.PackCount} x {e.PackId}: ! {string.Join("; ", e.Rejections.Select(r => r.Message))}", sheet.DetailLines);
            }
        }
    }

    [Fact]
    public async Task ApplyingAPick_PutsItsPartsOnEveryStation_MarksTheRigUnsaved_AndWritesNothing()
    {
        var (bench, sheet) = await OpenAsync();
        using (bench)
        {
            var result = sheet.Result!;
            int row = result.Top.Select((t, i) => (t, i)).First(x => x.t.Evaluation.MotorId != "or1050-kv90" || x.t.Evaluation.PackId != "lp12s-20ah").i;
            var pick = result.Top[row].Evaluation;
            sheet.Table.SetFocus();
            sheet.Table.Value = new TableSelection(new Point(0, row));
            bench.Prompts.Answers.Enqueue("Apply");
            bench.Press(Key.Enter);

            var session = bench.Context.Session;
            Assert.Contains(bench.Prompts.Asked, a => a.StartsWith("Apply shortlist pick", StringComparison.Ordinal));
            Assert.All(session.Rig!.Stations, s =>
            {
                Assert.Equal(pick.MotorId, s.Motor!.Id);
                Assert.Equal(pick.ControllerId, s.Controller!.Id);
            });
            Assert.Equal(pick.PackId, session.Rig!.Packs!.Pack.Id);
            Assert.Equal(pick.Candidate.PackCount, session.Rig.Packs.Count);
            Assert.True(session.IsDirty);
            Assert.Empty(bench.Files.Writes);
            Assert.Contains("* unsaved", bench.Screen);
            // The ranking does not depend on the parts assigned: the rig is placed again without another run.
            await bench.SettleAsync();
            Assert.Same(result, sheet.Result);
            Assert.StartsWith($"Rig: rank {result.Top[row].Rank}", sheet.AssignedText);
            Assert.EndsWith($": {pick.Label}", sheet.AssignedText);
            Assert.Equal($"rig {result.Top[row].Rank}", sheet.RigRow![0]);
            // Other sheets see the new parts.
            bench.Window.ShowSheet("Stations");
            Assert.Contains(pick.MotorId, bench.Screen);
        }
    }

    [Fact]
    public async Task CancellingThePick_LeavesTheRigAlone()
    {
        var (bench, sheet) = await OpenAsync();
        using (bench)
        {
            sheet.Table.SetFocus();
            sheet.Table.Value = new TableSelection(new Point(0, 1));
            bench.Prompts.Answers.Enqueue("Cancel");
            bench.Press(Key.Enter);
            Assert.False(bench.Context.Session.IsDirty);
            Assert.All(bench.Context.Session.Rig!.Stations, s => Assert.Equal("or1050-kv90", s.Motor!.Id));
        }
    }

    [Fact]
    public async Task F7_RanksByTheNextObjective_AsCoreDoes()
    {
        var (bench, sheet) = await OpenAsync();
        using (bench)
        {
            bench.Press(Key.F7);
            await bench.SettleAsync();
            Assert.Equal(RankObjective.Mass, sheet.Objective);
            var (_, expected) = CoreRanking(bench, RankObjective.Mass);
            Assert.Equal(RankObjective.Mass, sheet.Result!.Objective);
            Assert.Equal(expected.Ordered, sheet.Result.Ordered);
            Assert.Contains("rank by mass", bench.Screen);
        }
    }

    [Fact]
    public async Task StoppingTheRanking_LeavesTheSheetUsable_AndF5RanksAgain()
    {
        using var bench = new Bench(120, 36, files: SmallCatalogs.Files());
        bench.Window.ShowSheet("Shortlist");
        var sheet = Assert.IsType<ShortlistSheet>(bench.Window.CurrentSheet);
        // The ranking waits for the edit debounce; F8 stops it before it starts.
        Assert.StartsWith("Ranking", sheet.StateText);
        bench.Press(Key.F8);
        await bench.SettleAsync();
        Assert.Null(sheet.Result);
        Assert.Equal("Stopped before the ranking finished; F5 ranks again.", sheet.StateText);

        bench.Press(Key.F5);
        await bench.SettleAsync();
        Assert.NotNull(sheet.Result);
        Assert.Contains("72 tried", sheet.StateText);
    }

    [Fact]
    public async Task ABadPackCount_ShowsItsMessage_AndKeepsTheLastRanking()
    {
        var (bench, sheet) = await OpenAsync();
        using (bench)
        {
            var before = sheet.Result;
            sheet.PacksField.SetFocus();
            sheet.PacksField.Text = "";
            bench.Type("0");
            await bench.SettleAsync();
            Assert.Equal("0", sheet.PacksField.Text);
            Assert.Contains("! '0': give a whole number 1..16", bench.Screen);
            Assert.Same(before, sheet.Result);
        }
    }
}

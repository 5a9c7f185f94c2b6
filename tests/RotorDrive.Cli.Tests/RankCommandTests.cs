using System.Text.Json;
using RotorDrive.Core;
using RotorDrive.Core.Studies.Ranking;
using RotorDrive.Core.Tests.Support;
using RotorDrive.Files;
using Xunit;

namespace RotorDrive.Cli.Tests;

public sealed class RankCommandTests : IDisposable
{
    private readonly string _folder = Path.Combine(Path.GetTempPath(), "rotordrive-rank-" + Guid.NewGuid().ToString("N"));

    public RankCommandTests() => Directory.CreateDirectory(_folder);

    public void Dispose() => Directory.Delete(_folder, recursive: true);

    [Fact]
    public async Task Rank_Json_OnTheDemoRig_ListsTheBest_TheRejections_AndTheRigsOwnDrivetrain()
    {
        var (code, output, error) = await CliRunner.RunAsync("rank", RepoPaths.DemoRig, "--top", "5", "--json");
        Assert.Equal(ExitCodes.Ok, code);
        Assert.DoesNotContain("ranking:", error); // no progress lines with --json
        using var doc = JsonDocument.Parse(output);
        var root = doc.RootElement;
        long total = root.GetProperty("combinations").GetInt64();
        Assert.Equal(total, root.GetProperty("accepted").GetInt64() + root.GetProperty("rejected").GetInt64());
        var top = root.GetProperty("top").EnumerateArray().ToArray();
        Assert.Equal(5, top.Length);
        for (int i = 1; i < top.Length; i++)
        {
            Assert.True(top[i].GetProperty("runtime_s").GetDouble() <= top[i - 1].GetProperty("runtime_s").GetDouble());
        }
        Assert.True(top[0].GetProperty("pareto").GetBoolean(), "the runtime winner cannot be dominated");
        Assert.Contains(root.GetProperty("rejections").EnumerateArray(), r => r.GetProperty("reason").GetString() == "drag_peak" && r.GetProperty("count").GetInt64() > 0);
        var assigned = root.GetProperty("assigned");
        Assert.Equal("or1050-kv90", assigned.GetProperty("motor").GetString());
        Assert.Equal(JsonValueKind.Number, assigned.GetProperty("rank").ValueKind);
    }

    // The check at the command line: the ranking's winner, assigned to the demo rig, hovers under `rotordrive
    // hover` with the figures the ranking reported. Both trim through HoverTrim's speed solve (the ranking warm-started,
    // the hover from its common speed); agreement to 1e-9 relative (the trim's step tolerance squared is ~1e-14; JSON
    // numbers are written round-trip).
    [Fact]
    public async Task Rank_Winner_EqualsHover_OfTheRigWithThatDrivetrain()
    {
        const double Agreement = 1e-9;
        var (code, output, error) = await CliRunner.RunAsync("rank", RepoPaths.DemoRig, "--top", "1", "--json");
        Assert.True(code == ExitCodes.Ok, error);
        using var ranked = JsonDocument.Parse(output);
        var winner = ranked.RootElement.GetProperty("top")[0];
        string motor = winner.GetProperty("motor").GetString()!;
        string controller = winner.GetProperty("controller").GetString()!;
        string pack = winner.GetProperty("pack").GetString()!;
        int count = winner.GetProperty("pack_count").GetInt32();

        // The demo rig with the winner assigned, its catalogs referred to by absolute path.
        string text = File.ReadAllText(RepoPaths.DemoRig)
            .Replace("\"motor\": \"or1050-kv90\", \"controller\": \"sc120-12s\"", $"\"motor\": \"{motor}\", \"controller\": \"{controller}\"")
            .Replace("\"pack\": { \"id\": \"lp12s-20ah\", \"count\": 2 }", $"\"pack\": {{ \"id\": \"{pack}\", \"count\": {count} }}");
        foreach (string file in new[] { "motors.csv", "controllers.csv", "packs.csv", "cell_curves.csv", "rotors.csv", "plates.csv" })
        {
            text = text.Replace($"\"{file}\"", JsonSerializer.Serialize(Path.Combine(RepoPaths.Catalogs, file)));
        }
        string rigPath = Path.Combine(_folder, "winner-rig.json");
        File.WriteAllText(rigPath, text);
        var hover = await CliRunner.RunAsync("hover", rigPath, "--json");
        Assert.True(hover.ExitCode is ExitCodes.Ok or ExitCodes.LimitFindings, hover.Error);
        using var hovered = JsonDocument.Parse(hover.Output);
        var h = hovered.RootElement;
        Assert.Equal("trimmed", h.GetProperty("mode").GetString());

        RelAssert.Close(h.GetProperty("mass_kg").GetDouble(), winner.GetProperty("total_mass_kg").GetDouble(), 1e-14);
        RelAssert.Close(h.GetProperty("pack_current_a").GetDouble(), winner.GetProperty("pack_current_a").GetDouble(), Agreement);
        RelAssert.Close(h.GetProperty("pack_voltage_v").GetDouble(), winner.GetProperty("bus_voltage_v").GetDouble(), Agreement);
        RelAssert.Close(h.GetProperty("lift_specific_power_w_per_n").GetDouble(), winner.GetProperty("lift_specific_power_w_per_n").GetDouble(), Agreement);
        var hs = h.GetProperty("stations").EnumerateArray().ToArray();
        var rs = winner.GetProperty("stations").EnumerateArray().ToArray();
        Assert.Equal(6, rs.Length);
        Assert.Equal(hs.Length, rs.Length);
        for (int i = 0; i < hs.Length; i++)
        {
            RelAssert.Close(hs[i].GetProperty("speed_rpm").GetDouble(), rs[i].GetProperty("speed_rpm").GetDouble(), Agreement);
            RelAssert.Close(hs[i].GetProperty("motor_current_a").GetDouble(), rs[i].GetProperty("motor_current_a").GetDouble(), Agreement);
            RelAssert.Close(hs[i].GetProperty("duty").GetDouble(), rs[i].GetProperty("duty").GetDouble(), Agreement);
        }
    }

    [Fact]
    public async Task Rank_Text_ShowsProgressOnStderr_ParetoMarks_AndWhyNot()
    {
        var (code, output, error) = await CliRunner.RunAsync("rank", RepoPaths.DemoRig, "--by", "mass", "--why-not", "or150-kv300");
        Assert.Equal(ExitCodes.Ok, code);
        Assert.Contains("ranking:", error);
        Assert.Contains("ranked by mass", output);
        Assert.Contains("Pareto set:", output);
        Assert.Contains("Rejections by reason", output);
        Assert.Contains("Why not or150-kv300", output);
        Assert.Contains("The rig's own drivetrain, or1050-kv90 + sc120-12s + 2 x lp12s-20ah", output);
    }

    // When one limit other than the pack ends every shortlisted endurance run (on the demo rig the plate patch, whose heat
    // depends on the trimmed speeds and so on the craft's mass, hardly on the drivetrain), the text says that this limit,
    // not the drivetrain, sets the hover time; the note is derived from the same simulations the JSON reports.
    [Fact]
    public async Task Rank_Text_SaysWhenOneNonPackLimitEndsEveryShortlistedEndurance()
    {
        var (_, json, _) = await CliRunner.RunAsync("rank", RepoPaths.DemoRig, "--top", "3", "--json");
        using var doc = JsonDocument.Parse(json);
        var limits = doc.RootElement.GetProperty("top").EnumerateArray()
            .Select(t => t.GetProperty("simulation").GetProperty("endurance_limit").GetString()).Distinct().ToArray();
        var (code, text, _) = await CliRunner.RunAsync("rank", RepoPaths.DemoRig, "--top", "3");
        Assert.Equal(ExitCodes.Ok, code);
        bool oneNonPack = limits.Length == 1 && limits[0] is not ("usable_capacity" or "pack_cutoff" or "time_limit");
        Assert.Equal(oneNonPack, text.Contains("Note: every shortlisted combination's endurance ends on", StringComparison.Ordinal));
        if (oneNonPack)
        {
            Assert.Contains($"ends on {limits[0]!.Replace('_', ' ')} after", text);
        }
    }

    [Fact]
    public async Task Rank_Csv_IsWritten_AndNotOverwrittenWithoutForce()
    {
        string csv = Path.Combine(_folder, "ranking.csv");
        var first = await CliRunner.RunAsync("rank", RepoPaths.DemoRig, "--csv", csv, "--json");
        Assert.Equal(ExitCodes.Ok, first.ExitCode);
        string[] lines = File.ReadAllLines(csv);
        Assert.StartsWith("rank,pareto,motor,controller,pack,pack_count", lines[0]);
        using var doc = JsonDocument.Parse(first.Output);
        Assert.Equal(doc.RootElement.GetProperty("accepted").GetInt64() + 1, lines.Length);

        File.WriteAllText(csv, "mine");
        var refused = await CliRunner.RunAsync("rank", RepoPaths.DemoRig, "--csv", csv);
        Assert.Equal(ExitCodes.BadInput, refused.ExitCode);
        Assert.Contains("--force", refused.Error);
        Assert.Equal("mine", File.ReadAllText(csv));

        var forced = await CliRunner.RunAsync("rank", RepoPaths.DemoRig, "--csv", csv, "--force", "--json");
        Assert.Equal(ExitCodes.Ok, forced.ExitCode);
        Assert.NotEqual("mine", File.ReadAllText(csv));
    }

    [Fact]
    public async Task Rank_UnknownMotorForWhyNot_IsBadInput()
    {
        var (code, _, error) = await CliRunner.RunAsync("rank", RepoPaths.DemoRig, "--why-not", "no-such-motor");
        Assert.Equal(ExitCodes.BadInput, code);
        Assert.Contains("no motor 'no-such-motor'", error);
    }

    [Fact]
    public async Task Rank_BadTopOrObjective_IsBadInput()
    {
        Assert.Equal(ExitCodes.BadInput, (await CliRunner.RunAsync("rank", RepoPaths.DemoRig, "--top", "0")).ExitCode);
        Assert.Equal(ExitCodes.BadInput, (await CliRunner.RunAsync("rank", RepoPaths.DemoRig, "--by", "speed")).ExitCode);
    }

    // The six-station demo rig with its real load tables: the fast sweep equals the straightforward per-combination
    // evaluation (fresh trim, drag peaks searched again, DriveBus and DriveMargins) on a sub-catalog around the rig's own
    // parts, and the ranking does not depend on the thread count.
    [Fact]
    public void DemoSubCatalog_FastSweepEqualsStraightforwardEvaluation_AndIgnoresThreadCount()
    {
        var loaded = RigLoader.Load(RepoPaths.DemoRig);
        var rig = loaded.Rig!;
        var full = loaded.Catalog!;
        var catalog = full with
        {
            Motors = full.Motors.Where(m => m.Id.StartsWith("or1050", StringComparison.Ordinal) || m.Id.StartsWith("or1200-kv70", StringComparison.Ordinal)).ToArray(),
            Controllers = full.Controllers.Where(c => c.Id.Contains("12s", StringComparison.Ordinal) || c.Id == "sc45-6s").ToArray(),
            Packs = full.Packs.Where(p => p.Id.StartsWith("lp12s", StringComparison.Ordinal) || p.Id.StartsWith("li12s", StringComparison.Ordinal) || p.Id == "lp6s-5ah").ToArray(),
        };
        var one = RankStudy.Create(rig, catalog, new RankOptions(MaxDegreeOfParallelism: 1));
        var two = RankStudy.Create(rig, catalog, new RankOptions(MaxDegreeOfParallelism: 2));
        var a = one.Run();
        var b = two.Run();
        Assert.Equal(a.Ordered, b.Ordered);
        Assert.Equal(a.Scores, b.Scores);
        Assert.Equal(a.ParetoRanks, b.ParetoRanks);
        Assert.Equal(a.RejectionCounts, b.RejectionCounts);
        Assert.True(a.AcceptedCount > 5 && a.RejectedCount > 5);

        var accepted = a.Ordered.ToHashSet();
        var direct = new List<RankEvaluation>();
        for (long i = 0; i < one.CombinationCount; i++)
        {
            var candidate = one.CandidateAt(i);
            var d = one.EvaluateDirect(candidate);
            var f = one.Evaluate(candidate);
            Assert.Equal(d.Rejections.Select(r => r.Kind), f.Rejections.Select(r => r.Kind));
            Assert.Equal(d.Accepted, accepted.Contains(candidate));
            if (d.Accepted)
            {
                direct.Add(d);
                RelAssert.Close(d.Figures!.RuntimeS, f.Figures!.RuntimeS, 1e-7);
                RelAssert.Close(d.Figures.TotalMassKg, f.Figures.TotalMassKg, 1e-12);
                RelAssert.Close(d.Figures.CurrentMarginFraction!.Value, f.Figures.CurrentMarginFraction!.Value, 1e-6);
                RelAssert.Close(d.Figures.MaxSpeedRpm, f.Figures.MaxSpeedRpm, 1e-8);
                RelAssert.Close(d.Figures.PackCurrentA, f.Figures.PackCurrentA, 1e-7);
            }
        }
        // Same order as sorting the straightforward results by runtime, ties by ids.
        var expected = direct.OrderByDescending(e => e.Figures!.RuntimeS).ThenBy(e => e.MotorId, StringComparer.Ordinal)
            .ThenBy(e => e.ControllerId, StringComparer.Ordinal).ThenBy(e => e.PackId, StringComparer.Ordinal).ThenBy(e => e.Candidate.PackCount)
            .Select(e => e.Candidate).ToList();
        Assert.Equal(expected, a.Ordered);
    }
}

using System.Globalization;
using System.Text.Json;
using FsCheck;
using FsCheck.Fluent;
using RotorDrive.Cli;
using RotorDrive.Core.Craft;
using RotorDrive.Core.Studies;
using RotorDrive.Core.Studies.Ranking;
using RotorDrive.Core.Studies.Stress;
using RotorDrive.Files;
using RotorDrive.Tui.Session;
using RotorDrive.Tui.Sheets;
using RotorDrive.Tui.Tests.Support;
using Xunit;

namespace RotorDrive.Tui.Tests.Consistency;

/// <summary>One rig, one answer (issue 13): the trimmed hover's verdict and key figures are the same study result
/// whether asked from the command line (<c>hover --json</c>), the workbench's Hover &amp; yaw sheet, ranking's evaluation of
/// the rig's own drivetrain, or the stress test's nominal sample (no part varied). Exact equality, not closeness: every
/// path must run the one trim on the one rig model.</summary>
public sealed class OneAnswerTests : IDisposable
{
    private static readonly CultureInfo Ci = CultureInfo.InvariantCulture;
    private static readonly Lazy<PartsCatalog> Catalog = new(() => RigLoader.Load(Repo.DemoRig).Catalog!);
    private readonly string _folder = Directory.CreateTempSubdirectory("rotordrive-one-answer-").FullName;

    public void Dispose() => Directory.Delete(_folder, recursive: true);

    [Theory]
    [InlineData("demo-rig.json")]
    [InlineData("test-rig.json")]
    public async Task TheShippedRigs_GetOneAnswerEverywhere(string file)
        => await AssertOneAnswer(Path.Combine(Repo.CatalogsFolder, file));

    // A guided sled (issue 14 item 7): the demo rig on rails, at its payload (hovers at one common duty) and far too heavy
    // for max_duty (no state): the command line and the sheet run the one guided study.
    [Theory]
    [InlineData(25)]
    [InlineData(900)]
    public async Task AGuidedRig_GetsOneAnswerEverywhere(double payloadKg)
    {
        string text = await File.ReadAllTextAsync(Repo.DemoRig);
        foreach (string catalog in new[] { "motors", "controllers", "packs", "cell_curves", "rotors", "plates" })
        {
            text = text.Replace($"\"{catalog}.csv\"", JsonSerializer.Serialize(Path.Combine(Repo.CatalogsFolder, catalog + ".csv")), StringComparison.Ordinal);
        }
        text = text.Replace("\"payload_kg\": 25,", FormattableString.Invariant($"\"payload_kg\": {payloadKg},"), StringComparison.Ordinal)
            .Replace("\"stations\": [", "\"mount\": \"guided\", \"stations\": [", StringComparison.Ordinal);
        string path = Path.Combine(_folder, "guided-rig.json");
        await File.WriteAllTextAsync(path, text);
        await AssertOneAnswer(path, "guided, payload " + payloadKg.ToString(Ci));

        // The sheet says what a guided rig gets: the rails' loads, never a yaw trim or a payload search it cannot have.
        var figures = HoverYawSheet.Compute(RigLoader.Load(path).Rig!, new RigModelCache(), CancellationToken.None, null);
        string sheetText = HoverYawSheet.Compose(figures);
        Assert.Contains("RAILS (guided rig", sheetText, StringComparison.Ordinal);
        Assert.DoesNotContain("YAW   (", sheetText, StringComparison.Ordinal);
        Assert.DoesNotContain("max payload", sheetText, StringComparison.Ordinal);
        Assert.Contains("Guided rig: one common duty", HoverYawSheet.DescribeVerdict(figures), StringComparison.Ordinal);
        Assert.Equal(payloadKg < 100, figures.Study!.Rails is not null);
    }

    // A bench rig has no hover: the sheet says so and computes no trim (the hover command refuses it with exit 2).
    [Fact]
    public async Task ABenchRig_GetsNoTrimOnTheSheet()
    {
        string text = await File.ReadAllTextAsync(Repo.DemoRig);
        foreach (string catalog in new[] { "motors", "controllers", "packs", "cell_curves", "rotors", "plates" })
        {
            text = text.Replace($"\"{catalog}.csv\"", JsonSerializer.Serialize(Path.Combine(Repo.CatalogsFolder, catalog + ".csv")), StringComparison.Ordinal);
        }
        string path = Path.Combine(_folder, "bench-rig.json");
        await File.WriteAllTextAsync(path, text.Replace("\"stations\": [", "\"mount\": \"bench\", \"stations\": [", StringComparison.Ordinal));
        var figures = HoverYawSheet.Compute(RigLoader.Load(path).Rig!, new RigModelCache(), CancellationToken.None, null);
        Assert.Null(figures.Study);
        Assert.Contains(RotorDrive.Files.Messages.NotForMount("hover", "bench"), figures.NotForMount, StringComparison.Ordinal);
    }

    // Random valid rigs: the demo's hexagon of counter-rotating pairs with random parts from the demo catalogs, payload,
    // centre of gravity, gap, plate, pack count and max duty. Many do not hover within every limit; the answer must
    // still be the same everywhere. The 2-D load model keeps the table builds fast.
    [Fact]
    public async Task RandomValidRigs_GetOneAnswerEverywhere()
    {
        var cases = Gen.Sample(RigCases(), 200, new Rnd(20261203UL, 0x9E3779B97F4A7C15UL), 10);
        Assert.Equal(200, cases.Length);
        int index = 0;
        foreach (var rigCase in cases)
        {
            string path = Path.Combine(_folder, $"rig-{index++}.json");
            await File.WriteAllTextAsync(path, rigCase.Json(Repo.CatalogsFolder));
            await AssertOneAnswer(path, rigCase.ToString());
        }
    }

    private static async Task AssertOneAnswer(string rigPath, string? what = null)
    {
        var loaded = RigLoader.Load(rigPath);
        Assert.True(loaded.IsClean, string.Join("; ", loaded.Problems.Select(p => p.ToString())) + " " + what);
        var rig = loaded.Rig!;

        // The workbench's sheet.
        var sheet = HoverYawSheet.Compute(rig, new RigModelCache(), CancellationToken.None, null).Study!;
        var hover = sheet.Review.Hover;

        // The command line's JSON.
        using var output = new StringWriter();
        using var error = new StringWriter();
        int code = await CliApp.RunAsync(["hover", rigPath, "--json"], output, error);
        Assert.True(code is ExitCodes.Ok or ExitCodes.LimitFindings, error + " " + what);
        using var json = JsonDocument.Parse(output.ToString());
        var root = json.RootElement;
        Assert.Equal(sheet.HoverPasses, root.GetProperty("pass").GetBoolean());
        Assert.Equal(sheet.HoverPasses ? ExitCodes.Ok : ExitCodes.LimitFindings, code);
        Assert.Equal(sheet.FailedCriteria.Where(k => !k.StartsWith("yaw_", StringComparison.Ordinal)), root.GetProperty("failed_criteria").EnumerateArray().Select(e => e.GetString()));
        var stations = root.GetProperty("stations").EnumerateArray().ToArray();
        Assert.Equal(hover.Stations.Count, stations.Length);
        for (int i = 0; i < stations.Length; i++)
        {
            Assert.Equal(hover.Stations[i].SpeedRpm, stations[i].GetProperty("speed_rpm").GetDouble());
            Assert.Equal(hover.Stations[i].MotorCurrentA, stations[i].GetProperty("motor_current_a").GetDouble());
            Assert.Equal(hover.Stations[i].Duty, stations[i].GetProperty("duty").GetDouble());
        }
        if (hover.Balanced)
        {
            Assert.Equal(hover.PackCurrentA, root.GetProperty("pack_current_a").GetDouble());
        }

        // A guided rig: the rails' loads are the sheet's; no trim, so nothing for ranking or stress to agree with.
        Assert.Equal(rig.Mount == MountKind.Guided ? HoverMode.Guided : HoverMode.Trimmed, hover.Mode);
        if (sheet.Rails is { } rails)
        {
            var r = root.GetProperty("rails");
            Assert.Equal(rails.PitchMomentNm, r.GetProperty("pitch_moment_nm").GetDouble());
            Assert.Equal(rails.RollMomentNm, r.GetProperty("roll_moment_nm").GetDouble());
            Assert.Equal(rails.YawTorqueNm, r.GetProperty("yaw_torque_nm").GetDouble());
        }
        else
        {
            Assert.Equal(JsonValueKind.Null, root.GetProperty("rails").ValueKind);
        }
        if (RigModel.MissingParts(rig).Count > 0 || rig.Stations.Count < 4 || rig.Mount != MountKind.Free)
        {
            return;
        }

        // Ranking's evaluation of the rig's own drivetrain: the same trimmed speeds and total mass.
        var rank = RankStudy.Create(rig, loaded.Catalog!, new RankOptions());
        var own = rank.EvaluateDirect(rank.AssignedCandidate!.Value);
        Assert.Equal(sheet.Model.MassKg, rank.ModelFor(rank.AssignedCandidate!.Value).MassKg);
        // Ranking refuses a pack whose cell count the controller does not accept before it trims; otherwise it trims
        // the same speeds.
        bool refusedBeforeTrim = own.Rejections.Any(r => r.Kind == RankRejectionKind.CellsOutOfControllerRange);
        Assert.True(!refusedBeforeTrim || !sheet.HoverPasses, "the hover passes with a pack the controllers do not accept " + what);
        if (hover.Balanced && !refusedBeforeTrim)
        {
            Assert.True(own.Figures is { StationSpeedsRadPerS.Count: > 0 }, $"the hover study trimmed a rig ranking could not (ranking: {string.Join(", ", own.Rejections.Select(r => r.Kind))}) " + what);
            Assert.Equal(hover.Stations.Select(s => s.SpeedRadPerS), own.Figures!.StationSpeedsRadPerS);
        }
        // Ranking accepts only what hovers within every limit, the retaining rings included (and then some: spin-up,
        // runtime); a ring the hover review fails is ranking's retainer_stress rejection.
        var hoverFailures = sheet.Review.Findings.Select(f => f.Limit).ToList();
        bool hoverPasses = sheet.Review.Hover.Status == HoverStatus.Hovering && hoverFailures.Count == 0;
        Assert.True(!own.Accepted || hoverPasses, $"ranking accepts a drivetrain whose hover fails: {string.Join(", ", hoverFailures)} " + what);
        bool ringFails = sheet.Review.Findings.Any(f => f.Limit == HoverReview.RetainerStressKey);
        bool ringRejected = own.Rejections.Any(r => r.Kind == RankRejectionKind.RetainerStress);
        if (hover.Balanced && !refusedBeforeTrim)
        {
            Assert.True(ringFails == ringRejected, $"the hover review and ranking disagree on the retaining ring (hover: {ringFails}, rank: {ringRejected}) " + what);
        }

        // The stress test's nominal sample: no part varied, so its hover is the study's.
        var nominal = StressStudy.RunSample(new RigStressModel(sheet.Model, StressTolerances.None), StressTolerances.None, 1, 0).Outcome;
        Assert.Equal(hover.Status == HoverStatus.Hovering ? null : hover.Findings.FirstOrDefault()?.Limit ?? hover.Status.ToString(), nominal.TrimLimit);
        if (hover.Balanced)
        {
            Assert.Equal(hover.Stations.Max(s => s.SpeedRpm), nominal.HoverSpeedRpm);
            Assert.Equal(hover.Stations.Max(s => s.MotorCurrentA), nominal.HoverCurrentA);
            Assert.Equal(hover.BusVoltageV, nominal.HoverPackVoltageV);
        }
    }

    private static Gen<RigCase> RigCases() =>
        from motor in Gen.Choose(0, Catalog.Value.Motors.Count - 1)
        from controller in Gen.Choose(0, Catalog.Value.Controllers.Count - 1)
        from pack in Gen.Choose(0, Catalog.Value.Packs.Count - 1)
        from packCount in Gen.Choose(1, 3)
        from rotor in Gen.Choose(0, Catalog.Value.Rotors.Count - 1)
        from plate in Gen.Choose(0, Catalog.Value.Plates.Count - 1)
        from thicknessMm in Gen.Choose(4, 16)
        from payloadKg in Gen.Choose(0, 40)
        from cgX in Gen.Choose(-30, 30)
        from cgY in Gen.Choose(-30, 30)
        from gapTenthsMm in Gen.Choose(80, 140)
        from maxDutyPct in Gen.Choose(85, 100)
        select new RigCase(motor, controller, pack, packCount, rotor, plate, thicknessMm, payloadKg, cgX, cgY, gapTenthsMm / 10.0, maxDutyPct / 100.0);

    private sealed record RigCase(int Motor, int Controller, int Pack, int PackCount, int Rotor, int Plate, int ThicknessMm,
        int PayloadKg, int CgXMm, int CgYMm, double GapMm, double MaxDuty)
    {
        public string Json(string catalogs)
        {
            var c = Catalog.Value;
            string File(string name) => JsonSerializer.Serialize(Path.Combine(catalogs, name));
            string N(double v) => v.ToString("R", Ci);
            var positions = new[] { (450.0, 0.0), (225.0, 389.7), (-225.0, 389.7), (-450.0, 0.0), (-225.0, -389.7), (225.0, -389.7) };
            var stations = positions.Select((p, i) => $$"""
                { "x_mm": {{N(p.Item1)}}, "y_mm": {{N(p.Item2)}}, "spin": "{{(i % 2 == 0 ? "cw" : "ccw")}}", "rotor": "{{c.Rotors[Rotor].Id}}", "motor": "{{c.Motors[Motor].Id}}", "controller": "{{c.Controllers[Controller].Id}}" }
                """);
            return $$"""
                {
                  "name": "random consistency rig (invented)",
                  "catalogs": { "motors": {{File("motors.csv")}}, "controllers": {{File("controllers.csv")}}, "packs": {{File("packs.csv")}},
                    "cell_curves": {{File("cell_curves.csv")}}, "rotors": {{File("rotors.csv")}}, "plates": {{File("plates.csv")}} },
                  "plate": { "material": "{{c.Plates[Plate].Id}}", "thickness_mm": {{ThicknessMm}}, "temperature_c": 22 },
                  "craft": { "empty_mass_kg": 38, "payload_kg": {{PayloadKg}}, "cg_x_mm": {{CgXMm}}, "cg_y_mm": {{CgYMm}}, "yaw_inertia_kg_m2": 12 },
                  "gap": { "design_mm": {{N(GapMm)}}, "landed_mm": {{N(Math.Round(0.65 * GapMm, 2))}} },
                  "ambient_c": 22,
                  "load_model": "2d",
                  "stations": [ {{string.Join(",\n", stations)}} ],
                  "pack": { "id": "{{c.Packs[Pack].Id}}", "count": {{PackCount}} },
                  "limits": { "yaw_torque_nm": 2, "plate_temp_c": 60, "cell_cutoff_v": 3.3, "usable_capacity_pct": 80, "max_duty": {{N(MaxDuty)}}, "liftoff_time_s": 6 }
                }
                """;
        }
    }
}

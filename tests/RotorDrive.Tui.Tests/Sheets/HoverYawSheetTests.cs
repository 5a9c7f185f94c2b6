using System.Globalization;
using RotorDrive.Core.Craft;
using RotorDrive.Tui.Sheets;
using RotorDrive.Tui.Tests.Support;
using Xunit;

namespace RotorDrive.Tui.Tests.Sheets;

public class HoverYawSheetTests
{
    private static string F(double v, int decimals) => v.ToString("F" + decimals, CultureInfo.InvariantCulture);

    private static async Task<HoverYawSheet> OpenAsync(Bench bench)
    {
        bench.Window.ShowSheet("Hover & yaw");
        await bench.SettleAsync();
        return Assert.IsType<HoverYawSheet>(bench.Window.CurrentSheet);
    }

    private static void EditRigField(Bench bench, string jsonPath, string text)
    {
        bench.Window.ShowSheet("Rig");
        var sheet = Assert.IsType<RigSheet>(bench.Window.CurrentSheet);
        var field = sheet.Fields.Single(f => f.Spec.JsonPath == jsonPath);
        field.Field.SetFocus();
        field.Field.Text = "";
        bench.Type(text);
    }

    // The same figures straight from Core, by the calls the hover and yaw commands make.
    [Fact]
    public async Task HoverSheet_OpensOnTheDemoRig_ShowingCoresTrimAndYaw()
    {
        using var bench = new Bench(columns: 120, rows: 40);
        var sheet = await OpenAsync(bench);
        var rig = bench.Context.Session.Rig!;
        var model = RigModel.Build(rig);
        var review = HoverReview.Trimmed(model, rig.DesignGapM);
        var yaw = YawBalance.Analyse(model);
        var h = review.Hover;

        Assert.NotNull(sheet.Shown);
        Assert.StartsWith("Hovers within every limit at 10.00 mm.", sheet.Verdict);
        string[] lines = sheet.SheetText.Split('\n');
        foreach (var s in h.Stations)
        {
            string row = Assert.Single(lines, l => l.StartsWith($"{s.Index + 1,3}  {(s.Spin == SpinDirection.Clockwise ? "cw " : "ccw")}", StringComparison.Ordinal));
            string[] cells = row.Split(' ', StringSplitOptions.RemoveEmptyEntries);
            Assert.Equal([F(s.SpeedRpm, 0), F(s.Duty, 3), F(s.MotorCurrentA, 1), F(s.BusCurrentA, 1), F(s.LiftSpecificPowerWPerN, 2), "ok"], cells[2..]);
        }
        Assert.Contains($"pack {F(h.PackCurrentA, 1)} A at {F(h.BusVoltageV, 2)} V: {F(h.ElectricalPowerW, 0)} W electrical, {F(h.LiftSpecificPowerWPerN, 2)} W/N", sheet.SheetText);
        Assert.Contains($"heave stiffness {F(h.HeaveStiffnessNPerM / 1000, 1)} N/mm, natural frequency {F(h.HeaveFrequencyHz, 2)} Hz", sheet.SheetText);
        Assert.Contains($"max payload within every limit {F(HoverReview.PayloadCapacityKg(model, rig.DesignGapM)!.Value, 1)} kg", sheet.SheetText);
        Assert.Contains($"equal duty {F(yaw.EqualDuty!.Value, 4)} leaves {F(yaw.ResidualTorqueNm!.Value, 3)} N m", sheet.SheetText);
        Assert.Contains($"authority {F(yaw.AuthorityNm, 2)} N m (ccw {F(yaw.AuthorityPositiveNm, 2)}, cw {F(yaw.AuthorityNegativeNm, 2)})", sheet.SheetText);
        Assert.Contains($"bounded by {yaw.AuthorityLimitedBy!.Replace('_', ' ')}", sheet.SheetText);
        // The burst verdict and margin are Core's, worded as on every sheet: the station with the smallest margin at hover,
        // and each rotor design at its rated speed.
        var worst = review.Safety.AtHover.MinBy(r => r.MarginFraction)!;
        Assert.Contains(RotorDrive.Core.Safety.RotorSafetyText.Line(worst, "hover"), sheet.SheetText);
        Assert.Contains(RotorDrive.Core.Safety.RotorSafetyText.Line(review.Safety.AtMaxRpm[0], "rated"), sheet.SheetText);
        // The first screen shows the verdict and the station table.
        Assert.Contains("STATIONS", bench.Screen);
    }

    [Fact]
    public async Task HoverSheet_ShowsEveryCaution_AndDefersToCodesAndLicensedPractice()
    {
        using var bench = new Bench();
        var sheet = await OpenAsync(bench);
        foreach (string words in new[] { "Strong magnets", "pacemaker", "Rotor burst", "Lithium packs", "Hot surfaces", "local codes", "licensed practitioners" })
        {
            Assert.Contains(words, sheet.SheetText);
        }
        // The demo's retainer margin at rated speed is below the burst threshold: that caution is raised to a warning.
        Assert.Contains("WARNING Rotor burst", sheet.SheetText);
    }

    [Fact]
    public async Task EditingTheGapOnTheRigSheet_RecomputesTheHover()
    {
        using var bench = new Bench();
        var sheet = await OpenAsync(bench);
        double before = sheet.Shown!.Review!.Hover.Stations[0].SpeedRadPerS;
        // Under the 3-D load model the demo drivetrain has little room above its 10 mm design gap, so the edit lowers it.
        EditRigField(bench, "$.gap.design_mm", "9.5");
        await OpenAsync(bench);
        var hover = sheet.Shown!.Review!.Hover;
        Assert.Equal(0.0095, hover.GapM, 12);
        var expected = HoverTrim.Solve(RigModel.Build(bench.Context.Session.Rig!));
        Assert.Equal(expected.Stations[0].SpeedRadPerS, hover.Stations[0].SpeedRadPerS, 9);
        Assert.True(hover.Stations[0].SpeedRadPerS < before, "a smaller gap needs a slower rotor for the same lift");
        Assert.Contains("at 9.50 mm", sheet.Verdict);
    }

    [Fact]
    public async Task AFailingLimit_CarriesItsTextMark_AndTheLegend()
    {
        // At 5 mm (landing gear lowered to 4 mm so the rig stays valid) the rotors turn below their drag peak and the motors draw more than their rating: a state that exists,
        // with limits exceeded (a payload beyond the drivetrain gives no state at all; see the next test).
        using var bench = new Bench(columns: 120, rows: 40);
        EditRigField(bench, "$.gap.landed_mm", "4");
        EditRigField(bench, "$.gap.design_mm", "5");
        var sheet = await OpenAsync(bench);
        var review = sheet.Shown!.Review!;
        Assert.False(review.Pass);
        Assert.StartsWith("!! over:", sheet.Verdict);
        Assert.Contains("!! over = the limit is exceeded", sheet.SheetText);
        // Every exceeded station margin shows as a marked cell, and every finding is listed with the mark.
        foreach (var s in review.Hover.Stations)
        {
            foreach (var m in s.Margins.Where(m => m.Exceeded))
            {
                Assert.Contains("!!" + F(m.MarginFraction * 100, 0), sheet.SheetText);
            }
            // The station table, on the first screen, marks every station with an exceeded limit too.
            int over = s.Margins.Count(m => m.Exceeded);
            string row = sheet.SheetText.Split('\n').Single(l => l.StartsWith($"{s.Index + 1,3}  ", StringComparison.Ordinal));
            Assert.Equal(over > 0, row.Contains($"!! {over} over", StringComparison.Ordinal));
        }
        Assert.NotEmpty(review.Findings);
        Assert.Contains("LIMITS THAT FAIL", sheet.SheetText);
        Assert.Equal(review.Findings.Count, sheet.SheetText.Split('\n').Count(l => l.StartsWith("  !! station ", StringComparison.Ordinal) || l.StartsWith("  !! pack", StringComparison.Ordinal)));
        Assert.Contains(HoverReview.PayloadCapacityKg(RigModel.Build(bench.Context.Session.Rig!), 0.005) is { } cap
            ? $"max payload within every limit {F(cap, 1)} kg (carries 25.0)"
            : "max payload: even the empty craft does not hover within every limit", sheet.SheetText);
        Assert.Contains("!!", bench.Screen);
    }

    // A payload the drivetrain cannot hold (issue 14 item 2): the sheet says there is no hover and shows no station state.
    [Fact]
    public async Task APayloadBeyondTheDrivetrain_ShowsNoHoverState()
    {
        using var bench = new Bench(columns: 120, rows: 40);
        EditRigField(bench, "$.craft.payload_kg", "40");
        var sheet = await OpenAsync(bench);
        var review = sheet.Shown!.Review!;
        Assert.Equal(HoverStatus.BeyondDrivetrain, review.Hover.Status);
        Assert.Empty(review.Hover.Stations);
        Assert.StartsWith("!! No hover:", sheet.Verdict);
        Assert.Contains($"max payload within every limit {F(HoverReview.PayloadCapacityKg(RigModel.Build(bench.Context.Session.Rig!), 0.010)!.Value, 1)} kg (carries 40.0)", sheet.SheetText);
    }

    // A design gap below the landed gap is a rig problem (as `rotordrive check` says): no result sheet computes, each says why.
    [Fact]
    public async Task WithARigThatHasProblems_TheResultSheetsSaySo_AndShowNoFigures()
    {
        using var bench = new Bench();
        EditRigField(bench, "$.gap.design_mm", "5");
        Assert.Null(bench.Context.Session.Rig);
        var hover = await OpenAsync(bench);
        Assert.Null(hover.Shown);
        Assert.StartsWith("! The rig has problems", hover.Verdict);
        bench.Window.ShowSheet("Spin-up");
        await bench.SettleAsync();
        var spinup = Assert.IsType<SpinupSheet>(bench.Window.CurrentSheet);
        Assert.Null(spinup.Shown);
        Assert.StartsWith("! The rig has problems", spinup.Panel.Readout);
        bench.Window.ShowSheet("Endurance");
        await bench.SettleAsync();
        var endurance = Assert.IsType<EnduranceSheet>(bench.Window.CurrentSheet);
        Assert.Null(endurance.Shown);
        Assert.StartsWith("! The rig has problems", endurance.Panel.Readout);
    }
}

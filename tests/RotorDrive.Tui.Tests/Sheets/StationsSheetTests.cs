using RotorDrive.Core;
using Terminal.Gui.Input;
using RotorDrive.Core.Craft;
using RotorDrive.Tui.Sheets;
using RotorDrive.Tui.Tests.Support;
using Xunit;

namespace RotorDrive.Tui.Tests.Sheets;

public class StationsSheetTests
{
    [Fact]
    public void StationsSheet_DrawsEveryStationWithItsSpin_AndTheCentreOfGravity()
    {
        using var bench = new Bench();
        bench.Window.ShowSheet("Stations");
        var rig = bench.Context.Session.Rig!;
        var sheet = Assert.IsType<StationsSheet>(bench.Window.CurrentSheet);
        string sketch = sheet.SketchText;
        for (int i = 0; i < rig.Stations.Count; i++)
        {
            string arrow = rig.Stations[i].Spin == SpinDirection.Clockwise ? "↻" : "↺";
            Assert.Contains($"{i + 1}{arrow}", sketch);
        }
        Assert.Contains("+", sketch);
        Assert.Contains("↺ ccw from above", bench.Screen);
    }

    [Fact]
    public void F7_SpellsTheSpinInLetters_SoItIsNotArrowsOnly()
    {
        using var bench = new Bench();
        bench.Window.ShowSheet("Stations");
        var sheet = Assert.IsType<StationsSheet>(bench.Window.CurrentSheet);
        bench.Press(Key.F7);
        Assert.Contains("1cw", sheet.SketchText);
        Assert.Contains("2ccw", sheet.SketchText);
    }

    [Fact]
    public void TheSelectedStation_HasAHeading_IsBracketedInTheSketch_AndF7KeepsIt()
    {
        using var bench = new Bench(80, 24);
        bench.Window.ShowSheet("Stations");
        var sheet = Assert.IsType<StationsSheet>(bench.Window.CurrentSheet);
        sheet.SelectStation(2);
        bench.Draw();
        Assert.Equal("Station 3 of 6", sheet.Heading);
        Assert.Contains("Station 3 of 6", bench.Screen);
        Assert.Contains("[3↻]", sheet.SketchText);
        Assert.DoesNotContain("[1↻]", sheet.SketchText);
        bench.Press(Key.F7);
        bench.Draw();
        Assert.Equal("Station 3 of 6", sheet.Heading);
        Assert.Contains("[3cw]", sheet.SketchText);
        Assert.Contains(sheet.Fields, f => f.Spec.JsonPath == "$.stations[2].motor");
        // The heading and the legend fit the sheet at 80 columns, and so does the whole burst check, and every station of
        // the sketch is on the screen.
        Assert.True(sheet.LegendText.Length <= 58, sheet.LegendText);
        string screen = bench.Screen;
        Assert.All(sheet.SafetyText.Split('\n'), l => Assert.Contains(l.Trim(), screen));
        Assert.EndsWith("m/s", sheet.SafetyText);
        for (int i = 1; i <= 6; i++)
        {
            Assert.Contains($"{i}c", screen);
        }
    }

    [Fact]
    public void ChoosingAMotorForAStation_UpdatesThatStationOnly()
    {
        using var bench = new Bench();
        bench.Window.ShowSheet("Stations");
        var sheet = Assert.IsType<StationsSheet>(bench.Window.CurrentSheet);
        sheet.SelectStation(2);
        var motor = sheet.Fields.Single(f => f.Spec.JsonPath == "$.stations[2].motor");
        string newId = bench.Context.Session.Catalog!.Motors.First(m => m.Id != bench.Context.Session.Rig!.Stations[2].Motor!.Id).Id;
        motor.Field.SetFocus();
        bench.Prompts.Answers.Enqueue(newId);
        bench.Press(Key.F4);
        // The picker shows a one-line summary of each motor beside its id (Kv, current, power, mass).
        var details = bench.Prompts.LastDetails!;
        var motors = bench.Context.Session.Catalog!.Motors;
        Assert.Equal(motors.Count, details.Count);
        Assert.StartsWith($"Kv {Units.RadPerSToRpm(motors[0].KvRadPerSPerV):F0}, {motors[0].MaxCurrentA:F0} A", details[0]);
        Assert.EndsWith($"{motors[0].MassKg * 1000:F0} g", details[0]);
        var rig = bench.Context.Session.Rig!;
        Assert.Equal(newId, rig.Stations[2].Motor!.Id);
        Assert.NotEqual(newId, rig.Stations[1].Motor!.Id);
    }

    [Fact]
    public void AnUnknownRotorId_IsListedAsAProblem_WithTheFieldsMessage()
    {
        using var bench = new Bench(columns: 120);
        bench.Window.ShowSheet("Stations");
        var sheet = Assert.IsType<StationsSheet>(bench.Window.CurrentSheet);
        var rotor = sheet.Fields.Single(f => f.Spec.JsonPath == "$.stations[0].rotor");
        rotor.Field.SetFocus();
        rotor.Field.Text = "no-such-rotor";
        Assert.Null(bench.Context.Session.Rig);
        Assert.Contains("no-such-rotor", rotor.CurrentMessage);
        // The problem names the field in words, as the editor labels it, not by its rig-file key.
        Assert.Contains("station 1, rotor:", bench.Screen);
        Assert.DoesNotContain("$.stations", bench.Screen);
        Assert.Equal("no-such-rotor", rotor.Field.Text);
    }

    [Fact]
    public void SelectedStation_ShowsItsRotorsBurstCheck_FromCore()
    {
        using var bench = new Bench(columns: 120);
        bench.Window.ShowSheet("Stations");
        var rotor = bench.Context.Session.Rig!.Stations[0].Rotor;
        var expected = RotorDrive.Core.Safety.RotorSafety.AtRatedSpeed(rotor);
        string screen = bench.Screen;
        Assert.Contains($"rim {expected.RimSpeedMPerS:F0} m/s", screen);
        var sheet = Assert.IsType<StationsSheet>(bench.Window.CurrentSheet);
        Assert.Equal(RotorDrive.Core.Safety.RotorSafetyText.Line(expected, "rated"), System.Text.RegularExpressions.Regex.Replace(sheet.SafetyText, @"\s+", " "));
        Assert.StartsWith(expected.Passes == true ? "passes burst check" : "! ", RotorDrive.Core.Safety.RotorSafetyText.Line(expected, "rated"));
    }

    [Fact]
    public void AFailedBurstCheck_IsListedWithTheProblems_AndCounted_NeverBesideNoProblems()
    {
        using var bench = new Bench(columns: 120, rows: 40);
        bench.Window.ShowSheet("Stations");
        var sheet = Assert.IsType<StationsSheet>(bench.Window.CurrentSheet);
        var rotor = sheet.Fields.Single(f => f.Spec.JsonPath == "$.stations[0].rotor");
        rotor.Field.SetFocus();
        rotor.Field.Text = "";
        bench.Type("hx150-p6");
        var session = bench.Context.Session;
        Assert.NotNull(session.Rig);
        // The demo catalog's hx150-p6 (invented) has a thin 90 MPa ring: Core's check at its rated speed fails.
        var failed = Assert.Single(session.FailedBurstChecks);
        Assert.Equal(false, failed.Passes);
        string line = RotorDrive.Core.Safety.RotorSafetyText.Line(failed, "rated");
        Assert.StartsWith("! FAILS burst check: rotor hx150-p6", line);
        Assert.Contains(line, sheet.ProblemLines);
        Assert.DoesNotContain("No problems in the rig or its catalogs.", sheet.ProblemLines);
        Assert.Contains($"! {session.Problems.Count + 1} problem(s)", bench.Window.StatusText);
    }
}

using System.Globalization;
using Terminal.Gui.Input;
using RotorDrive.Core.Simulation;
using RotorDrive.Tui.Sheets;
using RotorDrive.Tui.Tests.Support;
using Xunit;

namespace RotorDrive.Tui.Tests.Sheets;

public class SpinupSheetTests
{
    private static string F(double v, int decimals) => v.ToString("F" + decimals, CultureInfo.InvariantCulture);

    private static async Task<SpinupSheet> OpenAsync(Bench bench)
    {
        bench.Window.ShowSheet("Spin-up");
        await bench.SettleAsync();
        return Assert.IsType<SpinupSheet>(bench.Window.CurrentSheet);
    }

    private static void Retype(Bench bench, Terminal.Gui.Views.TextField field, string text)
    {
        field.SetFocus();
        field.Text = "";
        bench.Type(text);
    }

    // The same study straight from Core, as the spinup command runs it with its defaults (duty mode, 2 s ramp, full pack).
    [Fact]
    public async Task SpinupSheet_OpensOnTheDemoRig_ShowingCoresStudy_WithTimeTraceCharts()
    {
        using var bench = new Bench(columns: 120, rows: 40);
        var sheet = await OpenAsync(bench);
        var expected = SpinupStudy.Run(SimulationRig.Build(bench.Context.Session.Rig!), new SpinupStudyRequest(ControllerMode.Duty, 2.0, 1.0));
        var shown = sheet.Shown!.Study!;
        Assert.Equal(expected.Spinup.LiftoffTimeS, shown.Spinup.LiftoffTimeS);
        Assert.Equal(expected.Spinup.HoverTimeS, shown.Spinup.HoverTimeS);

        string readout = sheet.Panel.Readout;
        Assert.Contains($"lift-off {F(expected.Spinup.LiftoffTimeS!.Value, 2)} s (limit 6.0 s), steady hover {F(expected.Spinup.HoverTimeS!.Value, 2)} s", readout);
        var worst = expected.Spinup.Stations.MaxBy(s => s.Motor.PeakA / s.CurrentLimitA)!;
        Assert.Contains($"peak motor {F(worst.Motor.PeakA, 1)} A (limit {F(worst.CurrentLimitA, 0)} A); pack {F(expected.Spinup.Pack.PeakA, 0)} A", readout);
        Assert.Contains("passes", readout);
        // The demo's braked landing lifts the bus above the controllers' rating: the caution is on the sheet.
        Assert.NotEmpty(expected.Cautions);
        Assert.Contains($"caution: landing regen lifts bus to {F(expected.LandingBraking.MaxBusVoltageV, 1)} V (rated {F(expected.ControllerMaxVoltageV, 1)} V)", readout);
        Assert.Contains(expected.Cautions[0], sheet.Panel.Details);
        // The burst check is Core's, worded as on Stations, Hover & yaw and the hover command; the demo rotor's 33 % margin
        // at rated speed is under the burst caution's 50 %, so the caution is a warning here as it is there.
        var rated = RotorDrive.Core.Craft.HoverSafety.AtRatedSpeed(bench.Context.Session.Rig!.Stations.Select(s => s.Rotor));
        Assert.Contains(RotorDrive.Core.Safety.RotorSafetyText.Line(rated[0], "rated"), sheet.Panel.Details);
        Assert.Contains("WARNING Rotor burst", sheet.Panel.Details);

        // Four chart pages (speeds, currents, pack voltage, gap) and the figures page; F7 turns them.
        Assert.Equal(["speed, rpm", "motor current, A", "pack voltage, V", "gap, mm"], sheet.Panel.Pages.Select(p => p.YLabel));
        Assert.Contains("1..6 stations", sheet.Panel.Chart.LegendText);
        var speeds = sheet.Panel.Pages[0].Lines;
        Assert.Equal(expected.Spinup.Stations[0].FinalSpeedRpm, speeds[0].Points[^1].Y, 6);
        for (int k = 1; k <= 4; k++)
        {
            bench.Press(Key.F7);
        }
        Assert.True(sheet.Panel.ShowingDetails);
        Assert.Contains("FIGURES", bench.Screen);
        bench.Press(Key.F7);
        Assert.Equal(0, sheet.Panel.PageIndex);
    }

    [Fact]
    public async Task RampAndMode_AreAdjustableOnTheSheet_AndRecompute()
    {
        using var bench = new Bench();
        var sheet = await OpenAsync(bench);
        Retype(bench, sheet.RampField, "4");
        Retype(bench, sheet.ModeField, "hold");
        await bench.SettleAsync();
        var shown = sheet.Shown!.Study!;
        Assert.Equal(4.0, shown.Request.RampS);
        Assert.Equal(ControllerMode.SpeedHold, shown.Request.Mode);
        var expected = SpinupStudy.Run(SimulationRig.Build(bench.Context.Session.Rig!), new SpinupStudyRequest(ControllerMode.SpeedHold, 4.0, 1.0));
        Assert.Equal(expected.Spinup.LiftoffTimeS, shown.Spinup.LiftoffTimeS);
        Assert.Contains("speed hold mode, ramp 4.0 s", sheet.Panel.Details);
    }

    [Fact]
    public async Task ABadMode_IsNamedInWords_AndTheTypedTextStays()
    {
        using var bench = new Bench();
        var sheet = await OpenAsync(bench);
        Retype(bench, sheet.ModeField, "fast");
        await bench.SettleAsync();
        Assert.Equal("fast", sheet.ModeField.Text);
        Assert.Contains("! mode must be duty or hold", sheet.Panel.Problems);
        Assert.Contains("mode must be duty or hold", bench.Screen);
    }

    // A 70 A controller on station 1 cannot pass the drag peak of the demo's rotor at the landed gap: the sheet marks the
    // station and names the current limit that would pass, as Core's stall analysis gives it.
    [Fact]
    public async Task AStalledStation_IsMarked_WithTheCurrentLimitThatWouldPass()
    {
        using var bench = new Bench(columns: 120, rows: 40);
        bench.Window.ShowSheet("Stations");
        var stations = Assert.IsType<StationsSheet>(bench.Window.CurrentSheet);
        var controller = stations.Fields.Single(f => f.Spec.JsonPath == "$.stations[0].controller");
        Retype(bench, controller.Field, "sc50-12s");
        var sheet = await OpenAsync(bench);
        var study = sheet.Shown!.Study!;
        var stalled = Assert.Single(study.Spinup.Stations, s => s.Stalled);
        Assert.Equal(0, stalled.Index);
        Assert.StartsWith("!! fails", sheet.Panel.Readout.Split('\n')[2]);
        Assert.Contains("!! STALLED", sheet.Panel.Details);
        Assert.Contains($"!! station 1 stalls below its drag peak: its controller limits the current to {F(stalled.CurrentLimitA, 0)} A, "
            + $"{F(stalled.PassingCurrentA, 0)} A just balances the peak; a current limit of {F(stalled.SuggestedCurrentLimitA, 0)} A would pass it", sheet.Panel.Details);
    }

    [Fact]
    public async Task F8_StopsTheRun_AndItsResultIsDropped()
    {
        using var bench = new Bench();
        bench.Window.ShowSheet("Spin-up");
        var sheet = Assert.IsType<SpinupSheet>(bench.Window.CurrentSheet);
        Assert.Contains("spin-up", bench.Window.StatusText);
        bench.Press(Key.F8);
        await bench.SettleAsync();
        Assert.Null(sheet.Shown);
        Assert.Contains("Stopped.", bench.Window.StatusText);
        Assert.StartsWith("Stopped before it finished", sheet.Panel.Readout);
        bench.Press(Key.F5);
        await bench.SettleAsync();
        Assert.NotNull(sheet.Shown);
    }
}

using System.Text.RegularExpressions;
using Xunit;

namespace RotorDrive.Cli.Tests;

// Issue 17 item 2: with steel under the plate every command that shows cautions reports the standstill pull and the
// mechanical-stop caution, from one Core rule (PlateAttraction + Cautions.SteelUnderPlate), so hover and spinup give the
// same figure for the rig.
public sealed partial class SteelUnderPlateCautionTests : IDisposable
{
    private readonly string _folder = Directory.CreateTempSubdirectory("rotordrive-steel-").FullName;

    public SteelUnderPlateCautionTests()
    {
        foreach (var file in Directory.GetFiles(RepoPaths.Catalogs))
        {
            File.Copy(file, Path.Combine(_folder, Path.GetFileName(file)));
        }
        string path = Path.Combine(_folder, "demo-rig.json");
        string text = File.ReadAllText(path);
        const string plate = "\"thickness_mm\": 12,";
        Assert.Contains(plate, text);
        File.WriteAllText(path, text.Replace(plate, plate + " \"back_iron_mm\": 10,", StringComparison.Ordinal));
    }

    public void Dispose() => Directory.Delete(_folder, recursive: true);

    private string Rig => Path.Combine(_folder, "demo-rig.json");

    [Fact]
    public async Task HoverSpinupAndLoad_OnASteelBackedPlate_ShowTheStandstillPullAndTheMechanicalStopCaution()
    {
        var hover = await CliRunner.RunAsync("hover", Rig);
        var spinup = await CliRunner.RunAsync("spinup", Rig);
        var load = await CliRunner.RunAsync("load", Rig);
        foreach (var (name, run) in new[] { ("hover", hover), ("spinup", spinup), ("load", load) })
        {
            Assert.True(run.ExitCode is ExitCodes.Ok or ExitCodes.LimitFindings, name + ": " + run.Error);
            Assert.Contains("mechanical stop", run.Output);
            Assert.Contains("teel under the plate", run.Output);
        }
        string hoverPull = CraftPull().Match(hover.Output).Value;
        Assert.NotEmpty(hoverPull);
        Assert.Contains(hoverPull, spinup.Output);
        Assert.Matches(RotorPull(), load.Output);
    }

    [GeneratedRegex(@"pull the craft down with \d+ N at the landed gap of [\d.]+ mm")]
    private static partial Regex CraftPull();

    [GeneratedRegex(@"the rotor is pulled down with \d+ N at a [\d.]+ mm gap")]
    private static partial Regex RotorPull();
}

using System.Text.Json;
using RotorDrive.Files;
using Xunit;

namespace RotorDrive.Cli.Tests;

public sealed class CheckCommandTests : IDisposable
{
    private readonly string _folder = Directory.CreateTempSubdirectory("rotordrive-cli-").FullName;

    public CheckCommandTests()
    {
        foreach (var file in Directory.GetFiles(RepoPaths.Catalogs))
        {
            File.Copy(file, Path.Combine(_folder, Path.GetFileName(file)));
        }
    }

    public void Dispose() => Directory.Delete(_folder, recursive: true);

    private string PathOf(string name) => Path.Combine(_folder, name);

    private void Edit(string name, string from, string to)
    {
        string text = File.ReadAllText(PathOf(name));
        Assert.Contains(from, text);
        int at = text.IndexOf(from, StringComparison.Ordinal);
        File.WriteAllText(PathOf(name), text[..at] + to + text[(at + from.Length)..]);
    }

    [Fact]
    public async Task Check_OnTheDemoRig_SummarisesItAndExitsOk()
    {
        var (code, output, error) = await CliRunner.RunAsync("check", RepoPaths.DemoRig);
        Assert.Equal(ExitCodes.Ok, code);
        Assert.Equal("", error);
        Assert.Contains("Rig: Lab carrier H6 (invented demo)", output);
        Assert.Contains("motors         44", output);
        Assert.Contains("spin balance     3 cw, 3 ccw (balanced)", output);
        Assert.Contains("No problems found.", output);
        Assert.Contains("Caution:", output);
    }

    [Fact]
    public async Task Check_WithJson_WritesSnakeCaseKeysWithUnits()
    {
        var (code, output, _) = await CliRunner.RunAsync("check", RepoPaths.DemoRig, "--json");
        Assert.Equal(ExitCodes.Ok, code);
        using var doc = JsonDocument.Parse(output);
        var root = doc.RootElement;
        Assert.True(root.GetProperty("ok").GetBoolean());
        var rig = root.GetProperty("rig");
        Assert.Equal(6, rig.GetProperty("station_count").GetInt32());
        Assert.Equal(3, rig.GetProperty("cw_count").GetInt32());
        Assert.True(rig.GetProperty("spin_balanced").GetBoolean());
        Assert.Equal(12.0, rig.GetProperty("plate_thickness_mm").GetDouble(), 12);
        // Total mass = structure + payload + rotors + motors + controllers + packs.
        double parts = new[] { "structure_mass_kg", "payload_mass_kg", "rotors_mass_kg", "motors_mass_kg", "controllers_mass_kg", "packs_mass_kg" }
            .Sum(k => rig.GetProperty(k).GetDouble());
        Assert.Equal(parts, rig.GetProperty("total_mass_kg").GetDouble(), 9);
        Assert.Equal(450.0, rig.GetProperty("stations")[0].GetProperty("x_mm").GetDouble(), 9);
        Assert.Equal(44, root.GetProperty("catalogs")[0].GetProperty("count").GetInt32());
        Assert.Equal(0, root.GetProperty("problems").GetArrayLength());
    }

    [Fact]
    public async Task Check_OnARigWithAHeaderTypoAndABadNumber_NamesFileLineAndColumn_AndExitsWithBadInput()
    {
        Edit("motors.csv", "max_current_a", "max_curent_a");
        Edit("motors.csv", "or250-kv220,220,0.0838", "or250-kv220,220,0,0838");
        Edit("packs.csv", "lp12s-16ah,lipo,12,2,8000,25", "lp12s-16ah,lipo,12,2,8000,2x5");
        var (code, output, error) = await CliRunner.RunAsync("check", PathOf("demo-rig.json"));

        Assert.Equal(ExitCodes.BadInput, code);
        string motors = PathOf("motors.csv");
        string packs = PathOf("packs.csv");
        string[] lines = error.ReplaceLineEndings("\n").TrimEnd('\n').Split('\n');
        Assert.Equal(
            [
                new InputProblem(motors, 1, 0, "max_current_a", Messages.MissingColumn("max_current_a")).ToString(),
                new InputProblem(motors, 1, 6, "max_curent_a", Messages.UnknownColumn("max_curent_a", "max_current_a")).ToString(),
                new InputProblem(motors, 5, 0, "", Messages.FieldCount(12, 13)).ToString(),
                new InputProblem(packs, 10, 6, "continuous_c", Messages.NotANumber("2x5")).ToString(),
                "4 problems in the input; nothing was computed.",
            ],
            lines);
        Assert.DoesNotContain("   at ", error);
        Assert.Contains("4 problem(s) found; they are listed on stderr.", output);
    }

    [Fact]
    public async Task Check_OnARigFileWithAnUnknownKeyAndAWrongType_ReportsBoth()
    {
        Edit("demo-rig.json", "\"payload_kg\": 25", "\"payload_kgs\": 25");
        Edit("demo-rig.json", "\"ambient_c\": 22", "\"ambient_c\": \"warm\"");
        string rig = PathOf("demo-rig.json");
        var (code, _, error) = await CliRunner.RunAsync("check", rig, "--json");
        Assert.Equal(ExitCodes.BadInput, code);
        Assert.Contains($"{rig}:17:5: $.craft.payload_kgs: {Messages.UnknownKey("payload_kgs", "payload_kg")}", error);
        Assert.Contains($"{rig}:23:16: $.ambient_c: {Messages.WrongType("a number", "a string")}", error);
        Assert.Contains($"{rig}:15:12: $.craft.payload_kg: {Messages.MissingKey("payload_kg")}", error);
    }

    [Fact]
    public async Task Check_WithJson_OnBadInput_StillWritesAValidDocumentListingTheProblems()
    {
        Edit("plates.csv", "al-6061-t6,24.4", "al-6061-t6,NaN");
        var (code, output, _) = await CliRunner.RunAsync("check", PathOf("demo-rig.json"), "--json");
        Assert.Equal(ExitCodes.BadInput, code);
        using var doc = JsonDocument.Parse(output);
        Assert.False(doc.RootElement.GetProperty("ok").GetBoolean());
        Assert.Equal(JsonValueKind.Null, doc.RootElement.GetProperty("rig").ValueKind);
        var problem = doc.RootElement.GetProperty("problems")[0];
        Assert.Equal(4, problem.GetProperty("line").GetInt32());
        Assert.Equal(2, problem.GetProperty("column").GetInt32());
        Assert.Equal(Messages.NotFinite("NaN"), problem.GetProperty("message").GetString());
    }

    [Fact]
    public async Task Check_OnAMissingRigFile_ReportsItAndExitsWithBadInput()
    {
        string path = PathOf("no-such-rig.json");
        var (code, _, error) = await CliRunner.RunAsync("check", path);
        Assert.Equal(ExitCodes.BadInput, code);
        Assert.Contains($"{path}:0:0: {Messages.FileNotFound()}", error);
        Assert.DoesNotContain("   at ", error);
    }

    [Fact]
    public async Task Check_WithoutItsArgument_ExitsWithBadInput()
    {
        var (code, output, error) = await CliRunner.RunAsync("check");
        Assert.Equal(ExitCodes.BadInput, code);
        Assert.StartsWith("rotordrive: ", error);
        Assert.Equal("", output);
    }

    [Fact]
    public async Task UnknownCommand_ExitsWithBadInput()
    {
        var (code, _, error) = await CliRunner.RunAsync("chekc", RepoPaths.DemoRig);
        Assert.Equal(ExitCodes.BadInput, code);
        Assert.Contains("rotordrive:", error);
    }
}

using System.Text.Json;
using RotorDrive.Files;
using RotorDrive.Files.Rigs;
using Xunit;

namespace RotorDrive.Cli.Tests;

public class SchemaCommandTests
{
    [Fact]
    public async Task SchemaRig_PrintsTheGeneratedJsonSchema_OnStdout()
    {
        var (code, output, error) = await CliRunner.RunAsync("schema", "rig");
        Assert.Equal(ExitCodes.Ok, code);
        Assert.Equal("", error);
        Assert.Equal(RigJsonSchema.Generate(), output);
        // JSON Schema draft 2020-12 (json-schema.org, "JSON Schema Core", 2022, section 8.1.1): the dialect URI in "$schema".
        Assert.Equal(RigJsonSchema.Dialect, JsonDocument.Parse(output).RootElement.GetProperty("$schema").GetString());
    }

    [Fact]
    public async Task SchemaRig_WithOutput_WritesTheFile_AndRefusesToReplaceItWithoutForce()
    {
        string folder = Directory.CreateTempSubdirectory("rotordrive-schema-").FullName;
        try
        {
            string path = Path.Combine(folder, "rig.schema.json");
            var first = await CliRunner.RunAsync("schema", "rig", "-o", path);
            Assert.Equal((ExitCodes.Ok, ""), (first.ExitCode, first.Output));
            Assert.Equal(RigJsonSchema.Generate(), File.ReadAllText(path));
            var again = await CliRunner.RunAsync("schema", "rig", "-o", path);
            Assert.Equal(ExitCodes.BadInput, again.ExitCode);
            Assert.Contains(Messages.FileExists(), again.Error);
            var forced = await CliRunner.RunAsync("schema", "rig", "-o", path, "--force");
            Assert.Equal(ExitCodes.Ok, forced.ExitCode);
        }
        finally
        {
            Directory.Delete(folder, recursive: true);
        }
    }

    [Fact]
    public async Task Schema_OfAnUnknownFileKind_IsBadInput()
    {
        var (code, _, error) = await CliRunner.RunAsync("schema", "motors");
        Assert.Equal(ExitCodes.BadInput, code);
        Assert.Contains("motors", error);
    }

    [Theory]
    [InlineData("load", "--gap-mm", "0.05")]
    [InlineData("operate", "--gap-mm", "250")]
    [InlineData("hover", "--payload-kg", "20000")]
    [InlineData("load", "--plate-temp-c", "-41")]
    public async Task OptionsThatMirrorARigKey_RefuseWhatTheRigFileRefuses_WithItsRule(string command, string option, string value)
    {
        var key = option switch
        {
            "--gap-mm" => RigSchema.GapDesignMm,
            "--payload-kg" => RigSchema.CraftPayloadKg,
            _ => RigSchema.PlateTemperatureC,
        };
        var (code, output, error) = await CliRunner.RunAsync(command, RepoPaths.DemoRig, option, value);
        Assert.Equal(ExitCodes.BadInput, code);
        Assert.Equal("", output);
        Assert.Contains($"{option} {key.Rule!.Check(double.Parse(value, System.Globalization.CultureInfo.InvariantCulture))}", error);
    }
}

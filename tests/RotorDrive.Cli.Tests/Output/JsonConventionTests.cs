using System.Globalization;
using System.Text.Json;
using System.Text.RegularExpressions;
using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;
using RotorDrive.Cli.Output;
using RotorDrive.Files.Exports;
using Xunit;

namespace RotorDrive.Cli.Tests.Output;

public partial class JsonConventionTests
{
    // Members whose value is a word from a fixed list (an enum or a limit name), never free text.
    private static readonly HashSet<string> WordKeys =
    [
        "status", "regime", "assessments", "level", "topic", "mode", "kind", "limit", "ended_by", "ends_by", "runtime_limit",
        "endurance_limit", "severity", "first_limit_kind", "authority_limited_by", "refusal",
    ];

    [Theory]
    [InlineData("Regulating", "regulating")]
    [InlineData("LimitExceeded", "limit_exceeded")]
    [InlineData("usable capacity", "usable_capacity")]
    [InlineData("plate_temperature", "plate_temperature")]
    [InlineData("pack-cutoff", "pack_cutoff")]
    public void JsonNames_SpellEnumsAndWordsTheWayTheKeysAre(string text, string expected)
        => Assert.Equal(expected, JsonNames.Of(text));

    [Fact]
    public void JsonNames_OfAnEnum_IsTheSerializersSpelling()
    {
        // The serializer's own enum naming (System.Text.Json JsonStringEnumConverter with SnakeCaseLower) is the reference.
        string serialized = JsonSerializer.Serialize(DayOfWeek.Wednesday, JsonOutput.Options);
        Assert.Equal($"\"{JsonNames.Of(DayOfWeek.Wednesday)}\"", serialized);
    }

    [Theory]
    [InlineData("hover")]
    [InlineData("operate")]
    [InlineData("yaw")]
    [InlineData("spinup")]
    [InlineData("endurance")]
    public async Task EveryWordValuedMember_IsSnakeCase(string command)
    {
        var (_, output, _) = await CliRunner.RunAtAsync(DateTimeOffset.UnixEpoch, TimeSpan.FromMinutes(3), command, RepoPaths.DemoRig, "--json");
        var words = new List<(string Key, string Value)>();
        Collect(JsonDocument.Parse(output).RootElement, null, words);
        Assert.NotEmpty(words);
        Assert.All(words, w => Assert.Matches(SnakeCase(), w.Value));
    }

    [Theory]
    [InlineData("load")]
    [InlineData("operate")]
    [InlineData("hover")]
    [InlineData("yaw")]
    [InlineData("spinup")]
    [InlineData("endurance")]
    [InlineData("rank")]
    [InlineData("stress")]
    public async Task WithBadInput_EveryJsonCommand_PrintsAProblemsDocument(string command)
    {
        string missing = Path.Combine(Path.GetTempPath(), "rotordrive-no-such-rig.json");
        var (code, output, error) = await CliRunner.RunAsync(command, missing, "--json");
        Assert.Equal(ExitCodes.BadInput, code);
        Assert.Contains("not found", error);
        var root = JsonDocument.Parse(output).RootElement;
        Assert.Equal(command, root.GetProperty("command").GetString());
        Assert.False(root.GetProperty("ok").GetBoolean());
        Assert.Equal(ExitCodes.BadInput, root.GetProperty("exit_code").GetInt32());
        var problem = Assert.Single(root.GetProperty("problems").EnumerateArray());
        Assert.Equal(missing, problem.GetProperty("file").GetString());
        foreach (string key in new[] { "line", "column", "field", "message" })
        {
            Assert.True(problem.TryGetProperty(key, out _), key);
        }
    }

    [Fact]
    public async Task ABadOptionValue_WithJson_IsAProblemNamingTheOption()
    {
        var (code, output, _) = await CliRunner.RunAsync("hover", RepoPaths.DemoRig, "--gap-mm", "abc", "--json");
        Assert.Equal(ExitCodes.BadInput, code);
        var problem = Assert.Single(JsonDocument.Parse(output).RootElement.GetProperty("problems").EnumerateArray());
        Assert.Equal("--gap-mm", problem.GetProperty("field").GetString());
    }

    [Theory]
    [InlineData(50.400000000000006, "50.4")]
    [InlineData(1.24345E-14, "0")]
    [InlineData(-3e-13, "0")]
    [InlineData(0.1 + 0.2, "0.3")]
    [InlineData(1234567.25, "1234567.25")]
    [InlineData(double.NaN, "")]
    public void CsvNumbers_HaveNoFloatNoise(double value, string expected)
        => Assert.Equal(expected, CsvNumber.Format(value));

    [Property(MaxTest = 500)]
    public Property CsvNumbers_KeepFifteenSignificantDigits(double value)
    {
        // IEEE 754-2019, 5.12.2: 15 significant decimal digits are within half a unit in the 15th digit, a relative
        // error of at most 5e-15.
        // (Within 15 digits of double.MaxValue the rounded text lies above it and reads back as infinity; no rig figure
        // comes near 1e300.)
        bool testable = double.IsFinite(value) && Math.Abs(value) >= CsvNumber.ZeroBelow && Math.Abs(value) < 1e300;
        double back = testable ? double.Parse(CsvNumber.Format(value), CultureInfo.InvariantCulture) : value;
        return (!testable || Math.Abs(back - value) <= 5e-15 * Math.Abs(value)).ToProperty();
    }

    private static void Collect(JsonElement element, string? key, List<(string, string)> words)
    {
        switch (element.ValueKind)
        {
            case JsonValueKind.Object:
                foreach (var p in element.EnumerateObject())
                {
                    Collect(p.Value, p.Name, words);
                }
                break;
            case JsonValueKind.Array:
                foreach (var item in element.EnumerateArray())
                {
                    Collect(item, key, words);
                }
                break;
            case JsonValueKind.String when key is not null && WordKeys.Contains(key):
                words.Add((key, element.GetString()!));
                break;
        }
    }

    [GeneratedRegex("^[a-z0-9]+(_[a-z0-9]+)*$")]
    private static partial Regex SnakeCase();
}

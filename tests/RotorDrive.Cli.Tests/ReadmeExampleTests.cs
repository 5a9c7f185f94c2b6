using System.Globalization;
using System.Text.Json;
using System.Text.RegularExpressions;
using Xunit;

namespace RotorDrive.Cli.Tests;

/// <summary>The README's JSON examples are the tool's output today: each block after a line
/// <c>&lt;!-- example: ARGS --&gt;</c> is the output of <c>rotordrive ARGS</c> on the demo rig, abridged (arrays cut,
/// numbers rounded). Refresh them with <c>tools/readme-examples.py</c>.</summary>
public partial class ReadmeExampleTests
{
    public static TheoryData<string> Examples()
    {
        var data = new TheoryData<string>();
        foreach (Match m in Example().Matches(Readme()))
        {
            data.Add(m.Groups[1].Value);
        }
        return data;
    }

    [Fact]
    public void TheReadme_HasTheExamples()
        => Assert.True(Example().Matches(Readme()).Count >= 4);

    [Theory]
    [MemberData(nameof(Examples))]
    public async Task Example_IsWhatTheToolPrints(string args)
    {
        var match = Example().Matches(Readme()).First(m => m.Groups[1].Value == args);
        var example = JsonDocument.Parse(match.Groups[2].Value).RootElement;
        string[] argv = args.Split(' ').Select(a => a.StartsWith("catalogs/", StringComparison.Ordinal) ? Path.Combine(RepoPaths.Root, a) : a).ToArray();
        var (code, output, error) = await CliRunner.RunAtAsync(DateTimeOffset.UnixEpoch, TimeSpan.FromMinutes(5), argv);
        Assert.True(code is ExitCodes.Ok or ExitCodes.LimitFindings, error);
        AssertShown(example, JsonDocument.Parse(output).RootElement, "$");
    }

    // Every value the example shows is in the output: keys and strings exactly (a relative path as the end of the
    // output's path), numbers to the digits shown, arrays as the first entries of the output's.
    private static void AssertShown(JsonElement shown, JsonElement actual, string path)
    {
        switch (shown.ValueKind)
        {
            case JsonValueKind.Object:
                Assert.Equal(JsonValueKind.Object, actual.ValueKind);
                foreach (var p in shown.EnumerateObject())
                {
                    Assert.True(actual.TryGetProperty(p.Name, out var member), $"{path}.{p.Name} is not in the output");
                    AssertShown(p.Value, member, $"{path}.{p.Name}");
                }
                break;
            case JsonValueKind.Array:
                Assert.Equal(JsonValueKind.Array, actual.ValueKind);
                var items = actual.EnumerateArray().ToList();
                int i = 0;
                foreach (var item in shown.EnumerateArray())
                {
                    Assert.True(i < items.Count, $"{path}[{i}] is not in the output");
                    AssertShown(item, items[i], $"{path}[{i}]");
                    i++;
                }
                break;
            case JsonValueKind.Number:
                Assert.Equal(JsonValueKind.Number, actual.ValueKind);
                string text = shown.GetRawText();
                int dot = text.IndexOf('.', StringComparison.Ordinal);
                int decimals = dot < 0 || text.Contains('e', StringComparison.OrdinalIgnoreCase) ? 0 : text.Length - dot - 1;
                double tolerance = 0.5 * Math.Pow(10, -decimals) * (1 + 1e-9);
                double expected = double.Parse(text, CultureInfo.InvariantCulture);
                Assert.True(Math.Abs(actual.GetDouble() - expected) <= tolerance, $"{path}: the README shows {text}, the tool prints {actual.GetRawText()}");
                break;
            case JsonValueKind.String:
                string value = actual.GetString() ?? "";
                string want = shown.GetString()!;
                Assert.True(value == want || (want.StartsWith("catalogs/", StringComparison.Ordinal) && value.EndsWith(want, StringComparison.Ordinal)),
                    $"{path}: the README shows '{want}', the tool prints '{value}'");
                break;
            default:
                Assert.Equal(shown.ValueKind, actual.ValueKind);
                break;
        }
    }

    private static string Readme() => File.ReadAllText(Path.Combine(RepoPaths.Root, "README.md")).ReplaceLineEndings("\n");

    [GeneratedRegex("<!-- example: (.+?) -->\\n```json\\n(.*?)\\n```", RegexOptions.Singleline)]
    private static partial Regex Example();
}

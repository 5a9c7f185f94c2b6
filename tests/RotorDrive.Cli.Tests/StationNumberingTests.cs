using System.Text.Json;
using Xunit;

namespace RotorDrive.Cli.Tests;

/// <summary>Stations are counted from 1 in every option, table, JSON document and CSV header, and a station's name from
/// the rig (<c>stations[].name</c>) appears beside its number.</summary>
public sealed class StationNumberingTests : IDisposable
{
    private readonly string _folder = Directory.CreateTempSubdirectory("rotordrive-stations-").FullName;
    private readonly string _rig;

    public StationNumberingTests()
    {
        // The demo rig with its first two stations named and its catalogs named by absolute path.
        string text = File.ReadAllText(RepoPaths.DemoRig);
        foreach (string catalog in new[] { "motors", "controllers", "packs", "cell_curves", "rotors", "plates" })
        {
            text = text.Replace($"\"{catalog}.csv\"", JsonSerializer.Serialize(Path.Combine(RepoPaths.Catalogs, catalog + ".csv")), StringComparison.Ordinal);
        }
        text = ReplaceFirst(text, "{ \"x_mm\": 450, \"y_mm\": 0,", "{ \"name\": \"front\", \"x_mm\": 450, \"y_mm\": 0,");
        text = ReplaceFirst(text, "{ \"x_mm\": 225,", "{ \"name\": \"front left\", \"x_mm\": 225,");
        text = text.Replace("\"$schema\": \"rig.schema.json\",", "", StringComparison.Ordinal);
        _rig = Path.Combine(_folder, "named-rig.json");
        File.WriteAllText(_rig, text);
    }

    public void Dispose() => Directory.Delete(_folder, recursive: true);

    [Fact]
    public async Task Operate_TakesAStationByName_AndReportsItsNumberFromOne()
    {
        var (code, output, error) = await CliRunner.RunAsync("operate", _rig, "--station", "Front Left", "--json");
        Assert.True(code is ExitCodes.Ok or ExitCodes.LimitFindings, error);
        var root = JsonDocument.Parse(output).RootElement;
        Assert.Equal(2, root.GetProperty("station").GetInt32());
        Assert.Equal("front left", root.GetProperty("station_name").GetString());
        var (_, text, _) = await CliRunner.RunAsync("operate", _rig, "--station", "2");
        Assert.Contains("Station 2 (front left)", text);
    }

    [Fact]
    public async Task Station_ByAnUnknownName_IsBadInput_ListingTheNames()
    {
        var (code, _, error) = await CliRunner.RunAsync("load", _rig, "--station", "rear");
        Assert.Equal(ExitCodes.BadInput, code);
        Assert.Contains("--station rear: no station of the rig has that name; named: station 1 (front), station 2 (front left).", error);
    }

    [Theory]
    [InlineData("0")]
    [InlineData("-2")]
    public async Task Station_BelowOne_IsBadInput(string number)
    {
        var (code, _, error) = await CliRunner.RunAsync("operate", _rig, "--station", number);
        Assert.Equal(ExitCodes.BadInput, code);
        Assert.Contains("--station counts from 1", error);
    }

    [Fact]
    public async Task HoverAndCheck_CountStationsFromOne_WithTheirNames()
    {
        var hover = JsonDocument.Parse((await CliRunner.RunAsync("hover", _rig, "--json")).Output).RootElement;
        var first = hover.GetProperty("stations")[0];
        Assert.Equal((1, "front"), (first.GetProperty("station").GetInt32(), first.GetProperty("name").GetString()));
        Assert.Equal(JsonValueKind.Null, hover.GetProperty("stations")[2].GetProperty("name").ValueKind);
        var check = JsonDocument.Parse((await CliRunner.RunAsync("check", _rig, "--json")).Output).RootElement;
        var stations = check.GetProperty("rig").GetProperty("stations");
        Assert.Equal(Enumerable.Range(1, 6), stations.EnumerateArray().Select(s => s.GetProperty("station").GetInt32()));
        var (_, table, _) = await CliRunner.RunAsync("hover", _rig);
        Assert.Contains("2 (front left)", table);
    }

    [Fact]
    public async Task SpinupCsv_HeadersCountStationsFromOne()
    {
        string csv = Path.Combine(_folder, "trace.csv");
        var (code, _, error) = await CliRunner.RunAsync("spinup", _rig, "--csv", csv);
        Assert.True(code is ExitCodes.Ok or ExitCodes.LimitFindings, error);
        string header = File.ReadLines(csv).First();
        Assert.StartsWith("time_s,speed_rpm_1,current_a_1,speed_rpm_2,", header);
        Assert.DoesNotContain("_0,", header);
        Assert.Contains(",plate_temp_c_6,", header);
    }

    private static string ReplaceFirst(string text, string from, string to)
    {
        int at = text.IndexOf(from, StringComparison.Ordinal);
        Assert.True(at >= 0, from);
        return text[..at] + to + text[(at + from.Length)..];
    }
}

using System.Buffers.Binary;
using System.Text.Json;
using System.Xml.Linq;
using Xunit;

namespace RotorDrive.Cli.Tests;

public sealed class PlotOptionTests : IDisposable
{
    private static readonly DateTimeOffset Now = new(2026, 3, 14, 9, 30, 0, TimeSpan.Zero);
    private static readonly TimeSpan Limit = TimeSpan.FromMinutes(3);
    private readonly string _folder = Directory.CreateTempSubdirectory("rotordrive-plot-").FullName;

    public void Dispose() => Directory.Delete(_folder, recursive: true);

    private static int StationCount()
    {
        using var doc = JsonDocument.Parse(File.ReadAllText(RepoPaths.DemoRig), new JsonDocumentOptions { CommentHandling = JsonCommentHandling.Skip, AllowTrailingCommas = true });
        return doc.RootElement.GetProperty("stations").GetArrayLength();
    }

    private static string RigName()
    {
        using var doc = JsonDocument.Parse(File.ReadAllText(RepoPaths.DemoRig), new JsonDocumentOptions { CommentHandling = JsonCommentHandling.Skip, AllowTrailingCommas = true });
        return doc.RootElement.GetProperty("name").GetString()!;
    }

    // Every text element of an SVG (legend entries, titles, axis names, the stamp), trimmed.
    private static List<string> Texts(string path)
    {
        var svg = XDocument.Load(path);
        XNamespace ns = "http://www.w3.org/2000/svg";
        return svg.Descendants(ns + "text").Select(t => t.Value.Trim()).ToList();
    }

    // The legend of each figure names every series once per panel; counting those names counts the series drawn.
    public static TheoryData<string, string[], string[]> Commands() => new()
    {
        { "load", [], ["eddy drag", "windage", "bearing", "total", "lift"] },
        { "operate", [], ["rotor load (total torque)", "stable equilibrium", "unstable equilibrium"] },
        { "spinup", [], ["gap", "design gap", "bus", "pack cutoff", "controller current limit"] },
        { "endurance", [], ["charge", "bus", "pack cutoff", "plate peak (hottest patch)", "plate limit"] },
        { "rank", [], ["the rig's own choice (rank"] },
        { "stress", ["--samples", "40"], ["samples", "limit (margin 0)"] },
    };

    [Theory]
    [MemberData(nameof(Commands))]
    public async Task Plot_Svg_ParsesAsXml_WithTitleAxesLegendAndStamp(string command, string[] extra, string[] legend)
    {
        string file = Path.Combine(_folder, command + ".svg");
        var (code, _, error) = await CliRunner.RunAtAsync(Now, Limit, [command, RepoPaths.DemoRig, .. extra, "--plot", file]);
        Assert.True(code is ExitCodes.Ok or ExitCodes.LimitFindings, error);
        Assert.Contains($"Plot written to {file}.", error);
        var texts = Texts(file);
        foreach (string name in legend)
        {
            Assert.Contains(texts, t => t.StartsWith(name, StringComparison.Ordinal));
        }
        Assert.Contains($"rig: {RigName()} | 2026-03-14 | RotorDrive", texts);
        // Every vertical axis names its unit after a comma ("torque, N m", "samples" for counts).
        Assert.Contains(texts, t => t.Contains(", ", StringComparison.Ordinal) && (t.EndsWith(" rpm", StringComparison.Ordinal) || t.EndsWith(" s", StringComparison.Ordinal)
            || t.EndsWith(" kg", StringComparison.Ordinal) || t.EndsWith(" min", StringComparison.Ordinal) || t.StartsWith("margin", StringComparison.Ordinal)));
    }

    [Fact]
    public async Task Spinup_Svg_DrawsOneSpeedAndOneCurrentLinePerStation()
    {
        string file = Path.Combine(_folder, "spin.svg");
        var (code, _, error) = await CliRunner.RunAtAsync(Now, Limit, "spinup", RepoPaths.DemoRig, "--plot", file);
        Assert.True(code is ExitCodes.Ok or ExitCodes.LimitFindings, error);
        var texts = Texts(file);
        int stations = StationCount();
        for (int j = 1; j <= stations; j++)
        {
            Assert.Equal(2, texts.Count(t => t == $"station {j}"));
        }
        Assert.DoesNotContain(texts, t => t == "station 0");
    }

    [Fact]
    public async Task Stress_Svg_HasOneHistogramPerCriterionWithMargins()
    {
        string file = Path.Combine(_folder, "stress.svg");
        string json = Path.Combine(_folder, "stress.json");
        var (code, output, error) = await CliRunner.RunAtAsync(Now, Limit, "stress", RepoPaths.DemoRig, "--samples", "40", "--json", "--plot", file);
        Assert.True(code is ExitCodes.Ok or ExitCodes.LimitFindings, error);
        using var doc = JsonDocument.Parse(output);
        int criteria = doc.RootElement.GetProperty("criteria").GetArrayLength();
        var texts = Texts(file);
        Assert.Equal(criteria, texts.Count(t => t == "limit (margin 0)"));
        Assert.False(File.Exists(json));
    }

    // PNG: the 8-byte signature and the IHDR chunk's width and height (W3C, Portable Network Graphics Specification,
    // 2nd ed., 2003, sections 5.2 and 11.2.2); text rendering depends on no system font (the font is embedded).
    [Fact]
    public async Task Load_Png_HasThePngSignatureAndTheFigureSize()
    {
        string file = Path.Combine(_folder, "load.png");
        var (code, _, error) = await CliRunner.RunAtAsync(Now, Limit, "load", RepoPaths.DemoRig, "--plot", file);
        Assert.Equal(ExitCodes.Ok, code);
        byte[] png = await File.ReadAllBytesAsync(file);
        Assert.Equal(new byte[] { 137, 80, 78, 71, 13, 10, 26, 10 }, png[..8]);
        Assert.Equal("IHDR", System.Text.Encoding.ASCII.GetString(png, 12, 4));
        Assert.Equal(960, BinaryPrimitives.ReadInt32BigEndian(png.AsSpan(16)));
        Assert.Equal(2 * 340, BinaryPrimitives.ReadInt32BigEndian(png.AsSpan(20)));
        Assert.True(png.Length > 20_000, $"a {png.Length}-byte PNG is too small to hold two charts with text");
        Assert.Contains("Plot written", error);
    }

    [Fact]
    public async Task Plot_RefusesToReplaceAFile_WithoutForce_AndReplacesItWithForce()
    {
        string file = Path.Combine(_folder, "mine.svg");
        await File.WriteAllTextAsync(file, "keep me");
        var (code, _, error) = await CliRunner.RunAtAsync(Now, Limit, "load", RepoPaths.DemoRig, "--plot", file);
        Assert.Equal(ExitCodes.BadInput, code);
        Assert.Contains("already exists", error);
        Assert.Equal("keep me", await File.ReadAllTextAsync(file));
        (code, _, error) = await CliRunner.RunAtAsync(Now, Limit, "load", RepoPaths.DemoRig, "--plot", file, "--force");
        Assert.Equal(ExitCodes.Ok, code);
        Assert.StartsWith("<?xml", await File.ReadAllTextAsync(file));
        Assert.Empty(Directory.GetFiles(_folder, "*.tmp"));
    }

    [Fact]
    public async Task Plot_WithAnUnknownExtension_IsBadInput_BeforeAnyWork()
    {
        string file = Path.Combine(_folder, "plot.pdf");
        var (code, output, error) = await CliRunner.RunAtAsync(Now, Limit, "spinup", RepoPaths.DemoRig, "--plot", file);
        Assert.Equal(ExitCodes.BadInput, code);
        Assert.Contains(".svg or .png", error);
        Assert.Equal("", output);
        Assert.False(File.Exists(file));
    }
}

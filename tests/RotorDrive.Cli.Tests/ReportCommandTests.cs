using System.Security.Cryptography;
using System.Text.RegularExpressions;
using System.Xml.Linq;
using RotorDrive.Files.Reports;
using Xunit;

namespace RotorDrive.Cli.Tests;

public sealed class ReportCommandTests : IDisposable
{
    private static readonly DateTimeOffset Now = new(2026, 3, 14, 9, 30, 0, TimeSpan.Zero);
    private readonly string _folder = Directory.CreateTempSubdirectory("rotordrive-report-").FullName;

    public void Dispose() => Directory.Delete(_folder, recursive: true);

    [Fact]
    public async Task Report_OnTheDemoRig_HasEverySection_InlinePlots_NoNetworkReference_AndInputHashes()
    {
        string file = Path.Combine(_folder, "review.html");
        var (code, _, error) = await CliRunner.RunAtAsync(Now, TimeSpan.FromMinutes(5), "report", RepoPaths.DemoRig, "-o", file, "--stress", "20");
        Assert.True(code is ExitCodes.Ok or ExitCodes.LimitFindings, error);
        string html = await File.ReadAllTextAsync(file);

        int last = -1;
        foreach (string id in RigReportHtml.SectionIds)
        {
            int at = html.IndexOf($"<section id=\"{id}\">", StringComparison.Ordinal);
            Assert.True(at > last, $"section '{id}' missing or out of order");
            last = at;
        }
        // Self-contained: no address of any kind, no external image, script, style sheet or font.
        Assert.DoesNotMatch(new Regex("https?://|src=|href=|url\\((?!#)|@import", RegexOptions.IgnoreCase), html);
        // Spin-up, endurance, ranking and stress plots, each a well-formed SVG element.
        var svgs = Regex.Matches(html, "<svg.*?</svg>", RegexOptions.Singleline);
        Assert.Equal(4, svgs.Count);
        foreach (Match svg in svgs)
        {
            Assert.NotEmpty(XElement.Parse(svg.Value).Descendants("text"));
        }
        Assert.Contains("@media print", html);
        Assert.Contains("page-break-before: always", html);
        // The rig file's SHA-256, computed here with the framework's implementation (FIPS 180-4).
        string hash = Convert.ToHexStringLower(SHA256.HashData(await File.ReadAllBytesAsync(RepoPaths.DemoRig)));
        Assert.Contains(hash, html);
        Assert.Contains("rotordrive report", html);
        Assert.Contains("2026-03-14", html);
        Assert.Contains("pacemaker", html);
        Assert.Contains("local codes", html);
        // The burst caution weighs the rated-speed check as the hover review does: the demo rotor's 33 % margin at its rated
        // 5000 rpm is under the caution's 50 %, so the report warns as `hover` does.
        Assert.Contains("Rotor burst (warning).", html);
        // The load model named is the one the analyses used (the rig's default, 3-D), and stations count from 1 as on
        // every other output (issue 14 item 6): the spin-up and hover tables' first row is station 1, none is station 0.
        Assert.Contains("3-D ring model", html);
        Assert.DoesNotContain("2-D layer model", html);
        Assert.DoesNotContain("<tr><td class=\"n\">0</td>", html);
        Assert.Contains("<tr><td class=\"n\">1</td>", html);
        // The exit code agrees with the failed-limits list.
        bool anyFailed = html.Contains("<ul class=\"failed\">", StringComparison.Ordinal);
        Assert.Equal(anyFailed ? ExitCodes.LimitFindings : ExitCodes.Ok, code);
    }

    [Fact]
    public async Task Report_RefusesToReplaceAFile_WithoutForce()
    {
        string file = Path.Combine(_folder, "review.html");
        await File.WriteAllTextAsync(file, "mine");
        var (code, _, error) = await CliRunner.RunAtAsync(Now, TimeSpan.FromMinutes(1), "report", RepoPaths.DemoRig, "-o", file);
        Assert.Equal(ExitCodes.BadInput, code);
        Assert.Contains("already exists", error);
        Assert.Equal("mine", await File.ReadAllTextAsync(file));
    }
}

using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;
using RotorDrive.Files.Rigs;
using RotorDrive.Tui.Session;
using Xunit;

namespace RotorDrive.Tui.Tests.Session;

public class ToleranceTextTests
{
    [Theory]
    // The rig file's four spreads (README, "Tolerances"), one per form of the text.
    [InlineData("normal 2%", "normal_sd_pct")]
    [InlineData("normal 0.7", "normal_sd")]
    [InlineData("uniform -16% 0%", "uniform_pct")]
    [InlineData("Uniform -0.3 0.3", "uniform")]
    [InlineData("uniform -16 0 %", "uniform_pct")]
    public void EachForm_ReadsAsOneOfTheFilesSpreads(string text, string spread)
    {
        Assert.True(ToleranceText.TryParse(text, out var entry, out string? why), why);
        string found = entry!.NormalSdPct is not null ? "normal_sd_pct" : entry.NormalSd is not null ? "normal_sd"
            : entry.UniformPct is not null ? "uniform_pct" : "uniform";
        Assert.Equal(spread, found);
    }

    [Theory]
    [InlineData("gauss 2", "is not a spread")]
    [InlineData("normal", "normal takes one standard deviation")]
    [InlineData("normal 1 2", "normal takes one standard deviation")]
    [InlineData("uniform 5%", "uniform takes a low and a high bound")]
    [InlineData("normal 2,5%", "'2,5' is not a number")]
    public void TextThatIsNoSpread_SaysWhy(string text, string message)
    {
        Assert.False(ToleranceText.TryParse(text, out _, out string? why));
        Assert.Contains(message, why);
    }

    [Fact]
    public void BlankText_IsNoSpread()
    {
        Assert.True(ToleranceText.TryParse("  ", out var entry, out _));
        Assert.Null(entry);
        Assert.Equal("", ToleranceText.Format(null));
    }

    [Property]
    public void FormatThenParse_GivesTheSameEntry(NormalFloat a, NormalFloat b, byte form)
    {
        double x = a.Get, y = b.Get;
        var entry = (form % 4) switch
        {
            0 => RigToleranceEntry.NormalPercent(x),
            1 => RigToleranceEntry.NormalAbsolute(x),
            2 => RigToleranceEntry.UniformPercent(x, y),
            _ => RigToleranceEntry.UniformAbsolute(x, y),
        };
        Assert.True(ToleranceText.TryParse(ToleranceText.Format(entry), out var back, out string? why), why);
        Assert.Equal(entry.NormalSdPct, back!.NormalSdPct);
        Assert.Equal(entry.NormalSd, back.NormalSd);
        Assert.Equal(entry.UniformPct, back.UniformPct);
        Assert.Equal(entry.Uniform, back.Uniform);
    }
}

using System.Text.Json;
using Xunit;

namespace RotorDrive.Cli.Tests;

public sealed class YawCommandTests
{
    // Identical counter-rotating rotors at one duty and one gap cancel exactly (Newton's third law), so the residual is
    // zero. The demo's trim can command more than its tolerance. The copper test rig's rotors run above the drag peak, where
    // shaft torque falls only slowly with speed, so shedding torque on one group takes much more speed and duty: the
    // duty limit (0.95) bounds its authority below its 1 N m tolerance, and it fails naming that bound.
    [Theory]
    [InlineData("demo-rig.json", true)]
    [InlineData("test-rig.json", false)]
    public async Task Yaw_Json_GivesResidualTrimAuthorityAndSensitivity(string rigFile, bool passes)
    {
        var (code, output, error) = await CliRunner.RunAsync("yaw", Path.Combine(RepoPaths.Catalogs, rigFile), "--json");
        Assert.True(code == (passes ? ExitCodes.Ok : ExitCodes.LimitFindings), error + output);
        using var doc = JsonDocument.Parse(output);
        var yaw = doc.RootElement.GetProperty("yaw");
        Assert.True(Math.Abs(yaw.GetProperty("residual_torque_nm").GetDouble()) < 1e-9);
        Assert.Equal(0.0, yaw.GetProperty("trim_duty_delta").GetDouble(), 12);
        Assert.Equal(passes, yaw.GetProperty("authority_nm").GetDouble() >= yaw.GetProperty("limit_nm").GetDouble());
        Assert.Equal(passes, yaw.GetProperty("pass").GetBoolean());
        if (!passes)
        {
            Assert.Equal("duty_headroom", yaw.GetProperty("authority_limited_by").GetString());
        }
        Assert.InRange(yaw.GetProperty("equal_duty").GetDouble(), 0.05, 0.95);
        var s = doc.RootElement.GetProperty("sensitivity");
        foreach (string key in new[] { "kv1_pct_nm", "gap1_mm_nm", "plate10_k_nm" })
        {
            Assert.True(s.GetProperty(key).ValueKind == JsonValueKind.Number, key);
        }
    }

    [Fact]
    public async Task Yaw_Text_SaysPass()
    {
        var (code, output, _) = await CliRunner.RunAsync("yaw", RepoPaths.DemoRig);
        Assert.Equal(ExitCodes.Ok, code);
        Assert.Contains("residual yaw torque", output);
        Assert.Contains("Result: PASS", output);
    }
}

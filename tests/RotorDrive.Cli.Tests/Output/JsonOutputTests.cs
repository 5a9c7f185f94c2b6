using System.Text.Json;
using RotorDrive.Cli.Output;
using Xunit;

namespace RotorDrive.Cli.Tests.Output;

public class JsonOutputTests
{
    private sealed record Sample(double LiftN, double? DragTorqueNm, float SpeedRpm, double[] GapMm, SampleKind Kind);

    private enum SampleKind
    {
        StableRoot,
    }

    [Fact]
    public void Serialize_UsesSnakeCaseKeys_AndWritesNonFiniteNumbersAsNull()
    {
        string json = JsonOutput.Serialize(new Sample(double.NaN, double.PositiveInfinity, float.NegativeInfinity, [1.5, double.NaN], SampleKind.StableRoot));
        using var doc = JsonDocument.Parse(json);
        var root = doc.RootElement;
        Assert.Equal(JsonValueKind.Null, root.GetProperty("lift_n").ValueKind);
        Assert.Equal(JsonValueKind.Null, root.GetProperty("drag_torque_nm").ValueKind);
        Assert.Equal(JsonValueKind.Null, root.GetProperty("speed_rpm").ValueKind);
        Assert.Equal(1.5, root.GetProperty("gap_mm")[0].GetDouble());
        Assert.Equal(JsonValueKind.Null, root.GetProperty("gap_mm")[1].ValueKind);
        Assert.Equal("stable_root", root.GetProperty("kind").GetString());
        Assert.DoesNotContain("NaN", json);
    }

    [Fact]
    public void Serialize_WritesNumbersInvariantly()
    {
        var previous = Thread.CurrentThread.CurrentCulture;
        try
        {
            // A culture with a decimal comma (the build runs in invariant-globalization mode, so it is made by hand).
            var comma = (System.Globalization.CultureInfo)System.Globalization.CultureInfo.InvariantCulture.Clone();
            comma.NumberFormat.NumberDecimalSeparator = ",";
            Thread.CurrentThread.CurrentCulture = comma;
            string json = JsonOutput.Serialize(new Sample(1234.5, null, 2.25f, [], SampleKind.StableRoot));
            Assert.Contains("\"lift_n\": 1234.5", json);
            Assert.Contains("\"drag_torque_nm\": null", json);
        }
        finally
        {
            Thread.CurrentThread.CurrentCulture = previous;
        }
    }
}

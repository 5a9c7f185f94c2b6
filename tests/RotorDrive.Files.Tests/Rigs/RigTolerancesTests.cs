using RotorDrive.Core.Studies;
using RotorDrive.Core.Studies.Stress;
using RotorDrive.Files.Catalogs;
using RotorDrive.Files.Rigs;
using RotorDrive.Files.Tests.Support;
using Xunit;

namespace RotorDrive.Files.Tests.Rigs;

public class RigTolerancesTests
{
    private const string File = "rig.json";

    private static readonly CatalogLoadResult Catalogs = CatalogLoader.Load(CatalogPaths.InFolder(RepoPaths.Catalogs));

    private static readonly string Demo = System.IO.File.ReadAllText(RepoPaths.DemoRig);

    private static (RigDocumentReadResult Read, RigResolveResult? Resolved) Load(string from, string to)
    {
        int at = Demo.IndexOf(from, StringComparison.Ordinal);
        Assert.True(at >= 0, from);
        string text = Demo[..at] + to + Demo[(at + from.Length)..];
        var read = RigDocumentReader.Read(text, File);
        return (read, read.Document is null ? null : RigResolver.Resolve(read.Document, Catalogs, File, read.Locations));
    }

    private static int LineOf(string text, string snippet) => Array.FindIndex(text.Split('\n'), l => l.Contains(snippet, StringComparison.Ordinal)) + 1;

    [Fact]
    public void DemoRig_TolerancesResolveToSiUnits()
    {
        var (read, resolved) = Load("", "");
        Assert.Empty(read.Problems);
        Assert.Empty(resolved!.Problems);
        var t = resolved.Tolerances;
        // Percent spreads stay in percent of nominal.
        var kv = t.Of(StressQuantity.MotorKv);
        Assert.Equal(ToleranceShape.Normal, kv.Shape);
        Assert.Equal(ToleranceScale.Percent, kv.Scale);
        Assert.Equal(2, kv.StandardDeviation);
        Assert.True(kv.KeepsPositive);
        // Absolute spreads are converted from the key's unit to SI: mm -> m, % points -> fraction, MS/m -> S/m.
        var gap = t.Of(StressQuantity.GapOffset);
        Assert.Equal(ToleranceScale.Absolute, gap.Scale);
        Assert.Equal(0.0007, gap.StandardDeviation, 15);
        var soc = t.Of(StressQuantity.PackStateOfCharge);
        Assert.Equal(ToleranceShape.Uniform, soc.Shape);
        Assert.Equal(-0.5, soc.Lower, 15);
        Assert.Equal(0.0, soc.Upper, 15);
        Assert.Equal(15, t.Varied.Count);
    }

    [Fact]
    public void AbsentSection_MeansNoTolerances()
    {
        var (_, resolved) = Load("\"tolerances\": {", "\"x_unused\": {");
        // The reader reports the unknown key; resolve the document without it.
        var doc = RigDocumentReader.Read(Demo, File).Document!;
        doc.Tolerances = null;
        var again = RigResolver.Resolve(doc, Catalogs, File);
        Assert.Empty(again.Problems);
        Assert.Same(StressTolerances.None, again.Tolerances);
        Assert.NotNull(resolved);
    }

    [Fact]
    public void AbsoluteKeyConversion_KvInRpmPerVoltBecomesRadPerSPerVolt()
    {
        var (_, resolved) = Load("\"motor_kv_rpm_per_v\": { \"normal_sd_pct\": 2 }", "\"motor_kv_rpm_per_v\": { \"uniform\": [-3, 6] }");
        var kv = resolved!.Tolerances.Of(StressQuantity.MotorKv);
        // 1 rpm = 2 pi / 60 rad/s (definition).
        Assert.Equal(-3 * Math.PI / 30, kv.Lower, 14);
        Assert.Equal(6 * Math.PI / 30, kv.Upper, 14);
    }

    [Fact]
    public void UnknownQuantity_IsReportedWithPathLineAndSuggestion()
    {
        string from = "\"motor_kv_rpm_per_v\":";
        string to = "\"motor_kv_rpm_pr_v\":";
        var (read, _) = Load(from, to);
        var problem = Assert.Single(read.Problems);
        Assert.Equal("$.tolerances.motor_kv_rpm_pr_v", problem.Field);
        Assert.Equal(LineOf(Demo, from), problem.Line);
        Assert.Equal(Messages.UnknownKey("motor_kv_rpm_pr_v", "motor_kv_rpm_per_v"), problem.Message);
    }

    [Fact]
    public void EntryWithTwoSpreads_IsReported()
    {
        string from = "\"gap_offset_mm\": { \"normal_sd\": 0.7 }";
        var (read, resolved) = Load(from, "\"gap_offset_mm\": { \"normal_sd\": 0.7, \"uniform\": [-1, 1] }");
        Assert.Empty(read.Problems);
        var problem = Assert.Single(resolved!.Problems);
        Assert.Equal("$.tolerances.gap_offset_mm", problem.Field);
        Assert.Equal(LineOf(Demo, from), problem.Line);
        Assert.Equal(Messages.ToleranceNeedsOneSpread(2), problem.Message);
        Assert.Null(resolved.Rig);
    }

    [Fact]
    public void EntryWithNoSpread_IsReported()
    {
        var (_, resolved) = Load("\"gap_offset_mm\": { \"normal_sd\": 0.7 }", "\"gap_offset_mm\": { }");
        Assert.Equal(Messages.ToleranceNeedsOneSpread(0), Assert.Single(resolved!.Problems).Message);
    }

    [Fact]
    public void PercentSpreadOfAnOffset_IsRejected()
    {
        var (_, resolved) = Load("\"gap_offset_mm\": { \"normal_sd\": 0.7 }", "\"gap_offset_mm\": { \"normal_sd_pct\": 5 }");
        var problem = Assert.Single(resolved!.Problems);
        Assert.Equal("$.tolerances.gap_offset_mm.normal_sd_pct", problem.Field);
        Assert.Equal(Messages.ToleranceAbsoluteOnly("gap_offset_mm"), problem.Message);
    }

    [Fact]
    public void UniformBoundsOutOfOrder_AreRejected()
    {
        var (_, resolved) = Load("\"ambient_c\": { \"uniform\": [-12, 12] }", "\"ambient_c\": { \"uniform\": [12, -12] }");
        var problem = Assert.Single(resolved!.Problems);
        Assert.Equal("$.tolerances.ambient_c.uniform", problem.Field);
        Assert.Equal(Messages.ToleranceBoundsOrder(12, -12), problem.Message);
    }

    [Fact]
    public void UniformNotAPair_IsATypeError()
    {
        string from = "\"ambient_c\": { \"uniform\": [-12, 12] }";
        var (read, _) = Load(from, "\"ambient_c\": { \"uniform\": [-12, 0, 12] }");
        var problem = Assert.Single(read.Problems);
        Assert.Equal("$.tolerances.ambient_c.uniform", problem.Field);
        Assert.Equal(LineOf(Demo, from), problem.Line);
        Assert.Equal(Messages.WrongType("an array of two finite numbers [low, high]", "an array"), problem.Message);
    }

    [Fact]
    public void NegativeStandardDeviation_IsOutOfRange()
    {
        var (_, resolved) = Load("\"payload_kg\": { \"normal_sd\": 4 }", "\"payload_kg\": { \"normal_sd\": -4 }");
        var problem = Assert.Single(resolved!.Problems);
        Assert.Equal("$.tolerances.payload_kg.normal_sd", problem.Field);
        Assert.Equal(Messages.MustBeNonNegative(-4), problem.Message);
    }

    [Fact]
    public void PercentSpreadAboveHalfOfNominal_IsOutOfRange()
    {
        var (_, resolved) = Load("\"motor_kv_rpm_per_v\": { \"normal_sd_pct\": 2 }", "\"motor_kv_rpm_per_v\": { \"normal_sd_pct\": 60 }");
        Assert.Equal(Messages.MustBeBetween(0, 50, 60), Assert.Single(resolved!.Problems).Message);
    }

    [Fact]
    public void UnknownSpreadKey_IsReportedWithSuggestion()
    {
        var (read, _) = Load("\"payload_kg\": { \"normal_sd\": 4 }", "\"payload_kg\": { \"normal_std\": 4 }");
        var problem = read.Problems.First(p => p.Field == "$.tolerances.payload_kg.normal_std");
        Assert.Equal(Messages.UnknownKey("normal_std", "normal_sd"), problem.Message);
    }

    [Fact]
    public void WriteThenRead_KeepsEveryTolerance()
    {
        var doc = RigDocumentReader.Read(Demo, File).Document!;
        var again = RigDocumentReader.Read(RigDocumentWriter.Write(doc), File);
        Assert.Empty(again.Problems);
        var first = RigResolver.Resolve(doc, Catalogs, File).Tolerances;
        var second = RigResolver.Resolve(again.Document!, Catalogs, File).Tolerances;
        Assert.Equal(first, second);
        Assert.Equal(RigToleranceKeys.Keys.Count, again.Document!.Tolerances!.Entries.Count);
    }

    [Fact]
    public void RigLoader_CarriesTheTolerances()
    {
        var loaded = RigLoader.Load(RepoPaths.DemoRig);
        Assert.True(loaded.IsClean);
        Assert.Equal(ToleranceShape.Uniform, loaded.Tolerances.Of(StressQuantity.ControllerCurrentLimit).Shape);
    }
}

using System.Text.Json;
using RotorDrive.Files.Catalogs;
using RotorDrive.Files.Rigs;
using RotorDrive.Files.Tests.Support;
using Xunit;

namespace RotorDrive.Files.Tests.Rigs;

public class RigSchemaTests
{
    private static readonly CatalogLoadResult Catalogs = CatalogLoader.Load(CatalogPaths.InFolder(RepoPaths.Catalogs));

    public static TheoryData<string> NumberKeys()
    {
        var data = new TheoryData<string>();
        foreach (var key in RigSchema.All.Where(k => k.Kind is RigValueKind.Number or RigValueKind.Integer))
        {
            data.Add(key.Name);
        }
        return data;
    }

    public static TheoryData<string> RigFiles() => new() { "demo-rig.json", "test-rig.json", "bench/demo-rig-calibrated.json" };

    [Fact]
    public void CheckedInSchema_IsTheOneTheProgramGenerates()
    {
        // A key added or re-ranged in RigSchema without 'rotordrive schema rig -o catalogs/rig.schema.json --force' fails here.
        string checkedIn = File.ReadAllText(Path.Combine(RepoPaths.Catalogs, RigJsonSchema.FileName)).ReplaceLineEndings("\n");
        Assert.Equal(RigJsonSchema.Generate(), checkedIn);
    }

    [Theory]
    [MemberData(nameof(RigFiles))]
    public void DemoAndTestRigs_NameTheCheckedInSchema_AndReadClean(string file)
    {
        string path = Path.Combine(RepoPaths.Catalogs, file);
        var read = RigDocumentReader.ReadFile(path);
        Assert.Empty(read.Problems);
        string schema = Path.GetFullPath(Path.Combine(Path.GetDirectoryName(path)!, read.Document!.Schema!));
        Assert.Equal(Path.GetFullPath(Path.Combine(RepoPaths.Catalogs, RigJsonSchema.FileName)), schema);
    }

    [Fact]
    public void SchemaKey_IsKeptByTheWriter()
    {
        var read = RigDocumentReader.Read("{ \"$schema\": \"rig.schema.json\", \"name\": \"r\" }", "rig.json");
        Assert.Empty(read.Problems);
        string written = RigDocumentWriter.Write(read.Document!);
        Assert.StartsWith("{\n  \"$schema\": \"rig.schema.json\",\n  \"name\": \"r\"", written);
    }

    [Theory]
    [MemberData(nameof(NumberKeys))]
    public void GeneratedSchema_StatesEachNumberKeysRange_AsTheResolverChecksIt(string name)
    {
        // JSON Schema Validation, draft 2020-12 (A. Wright, H. Andrews, B. Hutton, G. Dennis, 2022), section 6.2:
        // "minimum"/"maximum" are inclusive bounds, "exclusiveMinimum" an exclusive one.
        var key = RigSchema.Find(name);
        var node = SchemaNodeOf(key);
        var rule = key.Rule!;
        double? Get(string keyword) => node.TryGetProperty(keyword, out var v) ? v.GetDouble() : null;
        switch (rule.Kind)
        {
            case RuleKind.Between:
                Assert.Equal((rule.Min, rule.Max), (Get("minimum"), Get("maximum")));
                break;
            case RuleKind.PositiveAtMost:
                Assert.Equal((0.0, rule.Max), (Get("exclusiveMinimum"), Get("maximum")));
                break;
            case RuleKind.NonNegativeAtMost:
                Assert.Equal((0.0, rule.Max), (Get("minimum"), Get("maximum")));
                break;
            case RuleKind.Positive:
                Assert.Equal(0.0, Get("exclusiveMinimum"));
                break;
            case RuleKind.AtLeast:
                Assert.Equal(rule.Min, Get("minimum"));
                break;
            default:
                Assert.Fail($"{name}: rule {rule.Kind} has no schema mapping");
                break;
        }
        Assert.Equal(key.Default, Get("default"));
        Assert.Equal(key.Kind == RigValueKind.Number ? "number" : "integer", node.GetProperty("type").GetString());
    }

    [Theory]
    [MemberData(nameof(NumberKeys))]
    public void Resolver_RejectsAValueJustOutsideEachKeysRange_WithTheSchemasMessage(string name)
    {
        var key = RigSchema.Find(name);
        if (key.Section == "route[]")
        {
            return; // route legs are checked per leg shape; RigResolverTests covers them
        }
        var doc = RigDocumentReader.ReadFile(RepoPaths.DemoRig).Document!;
        double bad = JustOutside(key.Rule!);
        key.StoreIn(doc, key.Kind == RigValueKind.Integer ? (object)(int)bad : bad);
        var result = RigResolver.Resolve(doc, Catalogs, "rig.json");
        Assert.Null(result.Rig);
        var problem = Assert.Single(result.Problems, p => p.Field == key.JsonPath());
        Assert.Equal(key.Rule!.Check(bad), problem.Message);
    }

    [Theory]
    [MemberData(nameof(NumberKeys))]
    public void Resolver_AcceptsEachKeysRangeEnds(string name)
    {
        var key = RigSchema.Find(name);
        Assert.Null(key.Rule!.Check(Inside(key.Rule)));
        var doc = RigDocumentReader.ReadFile(RepoPaths.DemoRig).Document!;
        if (key.Section == "route[]" || key == RigSchema.GapLandedMm || key == RigSchema.GapDesignMm || key == RigSchema.StationDuty)
        {
            return; // these also depend on another key (leg shape, landed <= design, duty: mount and max_duty)
        }
        double value = Inside(key.Rule);
        key.StoreIn(doc, key.Kind == RigValueKind.Integer ? (object)(int)value : value);
        var result = RigResolver.Resolve(doc, Catalogs, "rig.json");
        Assert.DoesNotContain(result.Problems, p => p.Field == key.JsonPath());
    }

    [Fact]
    public void Every_SectionKey_HasItsKeysInTheTable_AndEveryKeyItsSection()
    {
        foreach (var key in RigSchema.All.Where(k => k.Section.Length > 0))
        {
            var owner = RigSchema.Find(key.Section.TrimEnd('[', ']'));
            Assert.Contains(owner.Kind, new[] { RigValueKind.Section, RigValueKind.SectionList });
        }
        Assert.Equal(RigSchema.All.Count, RigSchema.All.Select(k => k.Name).Distinct().Count());
    }

    private static double JustOutside(ValueRule rule) => rule.Kind switch
    {
        RuleKind.Between or RuleKind.AtLeast when rule.Max < int.MaxValue => rule.Max + Math.Max(1, Math.Abs(rule.Max)),
        RuleKind.PositiveAtMost or RuleKind.NonNegativeAtMost => rule.Max * 2,
        RuleKind.Positive => 0,
        _ => rule.Min - 1,
    };

    // A value on the range's upper end when it has one (the resolver must accept the end itself), else a small positive one.
    private static double Inside(ValueRule rule) => rule.Kind switch
    {
        RuleKind.Between or RuleKind.PositiveAtMost or RuleKind.NonNegativeAtMost => rule.Max,
        RuleKind.AtLeast when rule.Max < int.MaxValue => rule.Max,
        RuleKind.AtLeast => rule.Min,
        _ => 1,
    };

    private static JsonElement SchemaNodeOf(RigKey key)
    {
        var node = JsonDocument.Parse(RigJsonSchema.Generate()).RootElement;
        foreach (string part in key.Name.Split('.'))
        {
            bool list = part.EndsWith("[]", StringComparison.Ordinal);
            node = node.GetProperty("properties").GetProperty(list ? part[..^2] : part);
            if (list)
            {
                node = node.GetProperty("items");
            }
        }
        return node;
    }
}

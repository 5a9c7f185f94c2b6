using RotorDrive.Core.Craft;
using RotorDrive.Files.Catalogs;
using RotorDrive.Files.Rigs;
using RotorDrive.Files.Tests.Support;
using Xunit;

namespace RotorDrive.Files.Tests.Rigs;

public class RigResolverTests
{
    private const string File = "rig.json";

    private static readonly CatalogLoadResult Catalogs = CatalogLoader.Load(CatalogPaths.InFolder(RepoPaths.Catalogs));

    private static readonly string Demo = System.IO.File.ReadAllText(RepoPaths.DemoRig);

    /// <summary>Resolves the demo rig text after replacing one snippet (which must occur in it).</summary>
    private static RigResolveResult Resolve(string from = "", string to = "")
    {
        Assert.Contains(from, Demo);
        string text = from.Length == 0 ? Demo : ReplaceFirst(Demo, from, to);
        var read = RigDocumentReader.Read(text, File);
        Assert.Empty(read.Problems);
        return RigResolver.Resolve(read.Document!, Catalogs, File, read.Locations);
    }

    private static string ReplaceFirst(string text, string from, string to)
    {
        int at = text.IndexOf(from, StringComparison.Ordinal);
        return text[..at] + to + text[(at + from.Length)..];
    }

    private static int LineOf(string snippet) => Array.FindIndex(Demo.Split('\n'), l => l.Contains(snippet, StringComparison.Ordinal)) + 1;

    [Fact]
    public void Resolve_BuildsTheDemoRigInSiUnits()
    {
        var result = Resolve();
        Assert.Empty(result.Problems);
        var rig = result.Rig!;
        Assert.Equal("Lab carrier H6 (invented demo)", rig.Name);
        Assert.Equal(0.012, rig.Plate.ThicknessM, 15);
        Assert.Equal(0.010, rig.DesignGapM, 15);
        Assert.Equal(0.0065, rig.LandedGapM, 15);
        Assert.Equal(0.015, rig.Body.CgXM, 15);
        Assert.Equal(6, rig.Stations.Count);
        Assert.Equal(0.45, rig.Stations[0].XM, 15);
        Assert.Equal(SpinDirection.Clockwise, rig.Stations[0].Spin);
        Assert.Equal(SpinDirection.CounterClockwise, rig.Stations[1].Spin);
        Assert.Equal(2, rig.Packs!.Count);
        Assert.Equal("lipo", rig.Packs.Curve.Chemistry);
        Assert.Equal(0.8, rig.Limits.UsableCapacityFraction, 15);
    }

    [Fact]
    public void Resolve_AppliesTheDocumentedDefaults()
    {
        // The demo rig leaves convection, heave damping and gear friction out.
        var rig = Resolve().Rig!;
        Assert.Equal(RigDefaults.ConvectionWPerM2K, rig.PlateConvectionWPerM2K);
        Assert.Equal(RigDefaults.HeaveDampingRatio, rig.Body.HeaveDampingRatio);
        Assert.Equal(RigDefaults.GearYawFrictionNm, rig.GearYawFrictionNm);
        var limits = Resolve("\"cell_cutoff_v\": 3.3,\n    \"usable_capacity_pct\": 80,\n    \"max_duty\": 0.95,\n    \"liftoff_time_s\": 6,", "").Rig!.Limits;
        Assert.Equal(RigDefaults.CellCutoffV, limits.CellCutoffV);
        Assert.Equal(RigDefaults.UsableCapacityPct / 100, limits.UsableCapacityFraction);
        Assert.Equal(RigDefaults.MaxDuty, limits.MaxDuty);
        Assert.Equal(RigDefaults.LiftoffTimeS, limits.LiftoffTimeS);
    }

    // plate.spreading_factor: optional, default 1 (the annulus-only patch); read as given; below 1 (a patch smaller than the
    // annulus the heat enters) is refused with the file, line, column and rule.
    [Fact]
    public void Resolve_ReadsThePlateSpreadingFactor_AndRefusesOneBelowOne()
    {
        Assert.Equal(RigDefaults.PlateSpreadingFactor, Resolve().Rig!.PlateSpreadingFactor);
        Assert.Equal(2.5, Resolve("\"temperature_c\": 22 }", "\"temperature_c\": 22, \"spreading_factor\": 2.5 }").Rig!.PlateSpreadingFactor);
        var bad = Resolve("\"temperature_c\": 22 }", "\"temperature_c\": 22, \"spreading_factor\": 0.5 }");
        Assert.Null(bad.Rig);
        var problem = Assert.Single(bad.Problems);
        Assert.Equal(File, problem.File);
        Assert.Equal(LineOf("\"plate\""), problem.Line);
        Assert.Equal("$.plate.spreading_factor", problem.Field);
        Assert.Equal(Messages.MustBeBetween(1, 100, 0.5), problem.Message);
        Assert.True(problem.Column > 0);
    }

    [Fact]
    public void Resolve_ReportsAMissingRequiredKeyAtItsParentObject()
    {
        var result = Resolve("\"payload_kg\": 25,", "");
        Assert.Equal([new InputProblem(File, LineOf("\"craft\""), 12, "$.craft.payload_kg", Messages.MissingKey("payload_kg"))], result.Problems);
        Assert.Null(result.Rig);
    }

    [Fact]
    public void Resolve_ReportsAMissingSection()
    {
        var result = Resolve("\"gap\": { \"design_mm\": 10, \"landed_mm\": 6.5 },", "");
        Assert.Equal([new InputProblem(File, LineOf("// Invented") + 2, 1, "$.gap", Messages.MissingKey("gap"))], result.Problems);
    }

    [Fact]
    public void Resolve_ReportsAnUnknownSpinDirection()
    {
        var result = Resolve("\"spin\": \"ccw\"", "\"spin\": \"left\"");
        Assert.Equal([new InputProblem(File, LineOf("\"x_mm\": 225, \"y_mm\": 389.7"), 43, "$.stations[1].spin", Messages.BadSpin("left"))], result.Problems);
    }

    [Theory]
    [InlineData("\"motor\": \"or1050-kv90\"", "\"motor\": \"or1050-kv91\"", "$.stations[0].motor", "motor", "or1050-kv91", "motors.csv")]
    [InlineData("\"controller\": \"sc120-12s\"", "\"controller\": \"sc999\"", "$.stations[0].controller", "controller", "sc999", "controllers.csv")]
    [InlineData("\"rotor\": \"hx130-p4\"", "\"rotor\": \"hx140\"", "$.stations[0].rotor", "rotor", "hx140", "rotors.csv")]
    [InlineData("\"material\": \"al-1350\"", "\"material\": \"al-7075\"", "$.plate.material", "plate material", "al-7075", "plates.csv")]
    [InlineData("\"id\": \"lp12s-20ah\"", "\"id\": \"lp13s\"", "$.pack.id", "pack", "lp13s", "packs.csv")]
    public void Resolve_ReportsAnIdMissingFromItsCatalog(string from, string to, string path, string kind, string id, string fileName)
    {
        var result = Resolve(from, to);
        var problem = Assert.Single(result.Problems);
        Assert.Equal(path, problem.Field);
        Assert.Equal(Messages.UnknownId(kind, id, Path.Combine(RepoPaths.Catalogs, fileName)), problem.Message);
        Assert.Equal(LineOf(from), problem.Line);
    }

    [Fact]
    public void Resolve_MatchesIdsIgnoringCase()
        => Assert.Empty(Resolve("\"motor\": \"or1050-kv90\"", "\"motor\": \"OR1050-KV90\"").Problems);

    [Fact]
    public void Resolve_AllowsAStationWithoutMotorAndController()
    {
        var result = Resolve(", \"motor\": \"or1050-kv90\", \"controller\": \"sc120-12s\" }", " }");
        Assert.Empty(result.Problems);
        Assert.Null(result.Rig!.Stations[0].Motor);
        Assert.Null(result.Rig.Stations[0].Controller);
    }

    [Fact]
    public void Resolve_ReportsALandedGapAboveTheDesignGap()
    {
        var result = Resolve("\"landed_mm\": 6.5", "\"landed_mm\": 12");
        Assert.Equal([new InputProblem(File, LineOf("\"landed_mm\""), 42, "$.gap.landed_mm", Messages.LandedAboveDesign(12, 10))], result.Problems);
    }

    [Theory]
    [InlineData("\"thickness_mm\": 12", "\"thickness_mm\": 0", "$.plate.thickness_mm", 0.01, 200, 0.0)]
    [InlineData("\"ambient_c\": 22", "\"ambient_c\": 95", "$.ambient_c", -40, 60, 95.0)]
    [InlineData("\"max_duty\": 0.95", "\"max_duty\": 1.5", "$.limits.max_duty", 0.05, 1, 1.5)]
    [InlineData("\"usable_capacity_pct\": 80", "\"usable_capacity_pct\": 0.8", "$.limits.usable_capacity_pct", 1, 100, 0.8)]
    [InlineData("\"cell_cutoff_v\": 3.3", "\"cell_cutoff_v\": 33", "$.limits.cell_cutoff_v", 1.5, 4.5, 33.0)]
    public void Resolve_ReportsValuesOutsideTheirRange(string from, string to, string path, double min, double max, double value)
    {
        var problem = Assert.Single(Resolve(from, to).Problems);
        Assert.Equal((path, Messages.MustBeBetween(min, max, value)), (problem.Field, problem.Message));
        Assert.Equal(LineOf(from), problem.Line);
    }

    [Theory]
    [InlineData("\"empty_mass_kg\": 38", "\"empty_mass_kg\": -38", "$.craft.empty_mass_kg", -38.0)]
    [InlineData("\"yaw_torque_nm\": 2", "\"yaw_torque_nm\": 0", "$.limits.yaw_torque_nm", 0.0)]
    public void Resolve_ReportsNonPositiveValues(string from, string to, string path, double value)
    {
        var problem = Assert.Single(Resolve(from, to).Problems);
        Assert.Equal((path, Messages.MustBePositive(value)), (problem.Field, problem.Message));
    }

    // Absurd magnitudes (issue 14 item 5: an empty mass of 1e308 kg passed check and ended in "got Infinity", exit 3): each
    // rig number has a physical bound far above any levitation rig (common practice, no source).
    [Theory]
    [InlineData("\"empty_mass_kg\": 38", "\"empty_mass_kg\": 1e308", "$.craft.empty_mass_kg", 1e308, 10000.0)]
    [InlineData("\"payload_kg\": 25", "\"payload_kg\": 1e6", "$.craft.payload_kg", 1e6, 10000.0)]
    [InlineData("\"yaw_inertia_kg_m2\": 12", "\"yaw_inertia_kg_m2\": 1e300", "$.craft.yaw_inertia_kg_m2", 1e300, 100000.0)]
    [InlineData("\"yaw_torque_nm\": 2", "\"yaw_torque_nm\": 1e200", "$.limits.yaw_torque_nm", 1e200, 10000.0)]
    [InlineData("\"count\": 2", "\"count\": 5000", "$.pack.count", 5000.0, 1000.0)]
    public void Resolve_ReportsAbsurdMagnitudes_WithTheirBound(string from, string to, string path, double value, double max)
    {
        var problem = Assert.Single(Resolve(from, to).Problems);
        Assert.Equal((path, Messages.MustBeAtMost(max, value)), (problem.Field, problem.Message));
    }

    [Fact]
    public void Resolve_ReportsAPackCountBelowOne()
    {
        var problem = Assert.Single(Resolve("\"count\": 2", "\"count\": 0").Problems);
        Assert.Equal(("$.pack.count", Messages.MustBeAtLeast(1, 0)), (problem.Field, problem.Message));
    }

    [Fact]
    public void Resolve_ReportsARigWithoutStations()
    {
        int start = Demo.IndexOf("\"stations\": [", StringComparison.Ordinal);
        int end = Demo.IndexOf(']', start);
        var result = Resolve(Demo[start..(end + 1)], "\"stations\": []");
        Assert.Equal([new InputProblem(File, LineOf("\"stations\""), 15, "$.stations", Messages.NoStations())], result.Problems);
    }

    [Fact]
    public void Resolve_ReportsOverlappingRotors()
    {
        // Station 2 moved to 200 mm from station 1: two 130 mm rotors need 260 mm between axes. Stations are counted from 1.
        var result = Resolve("\"x_mm\": 225, \"y_mm\": 389.7", "\"x_mm\": 450, \"y_mm\": 200");
        var problem = Assert.Single(result.Problems);
        Assert.Equal(("$.stations[1]", Messages.StationsOverlap("station 1", 200, 260)), (problem.Field, problem.Message));
        Assert.Contains("station 1:", problem.Message);
    }

    [Fact]
    public void Resolve_GivesEachStationItsName_AndNamesItInMessages()
    {
        var named = Resolve("\"x_mm\": 450, \"y_mm\": 0,", "\"name\": \"front\", \"x_mm\": 450, \"y_mm\": 0,");
        Assert.Empty(named.Problems);
        Assert.Equal("front", named.Rig!.Stations[0].Name);
        Assert.Null(named.Rig.Stations[1].Name);
        Assert.Equal("station 1 (front)", named.Rig.Stations[0].Label(0));
        Assert.Equal("station 2", named.Rig.Stations[1].Label(1));
    }

    [Theory]
    [InlineData("\"\"")]
    [InlineData("\"3\"")]
    [InlineData("\" 2.5 \"")]
    public void Resolve_RejectsAStationNameThatIsEmptyOrANumber(string name)
    {
        var result = Resolve("\"x_mm\": 450, \"y_mm\": 0,", $"\"name\": {name}, \"x_mm\": 450, \"y_mm\": 0,");
        var problem = Assert.Single(result.Problems);
        Assert.Equal(("$.stations[0].name", Messages.BadStationName(name.Trim('"'))), (problem.Field, problem.Message));
    }

    [Fact]
    public void Resolve_RejectsTwoStationsWithTheSameName()
    {
        string once = ReplaceFirst(Demo, "\"x_mm\": 450, \"y_mm\": 0,", "\"name\": \"Front\", \"x_mm\": 450, \"y_mm\": 0,");
        string twice = ReplaceFirst(once, "\"x_mm\": 225, \"y_mm\": 389.7", "\"name\": \"front\", \"x_mm\": 225, \"y_mm\": 389.7");
        var read = RigDocumentReader.Read(twice, File);
        var result = RigResolver.Resolve(read.Document!, Catalogs, File, read.Locations);
        var problem = Assert.Single(result.Problems);
        Assert.Equal(("$.stations[1].name", Messages.DuplicateStationName("front", 1)), (problem.Field, problem.Message));
    }

    [Fact]
    public void Resolve_WithoutCatalogs_StillChecksEverythingElse_AndGivesNoRig()
    {
        var read = RigDocumentReader.Read(Demo.Replace("\"ambient_c\": 22", "\"ambient_c\": 99"), File);
        var result = RigResolver.Resolve(read.Document!, (CatalogLoadResult?)null, File, read.Locations);
        Assert.Null(result.Rig);
        var problem = Assert.Single(result.Problems);
        Assert.Equal("$.ambient_c", problem.Field);
    }

    [Fact]
    public void Resolve_OfADocumentMadeInMemory_HasNoLineNumbers()
    {
        var doc = RigDocumentReader.Read(Demo, File).Document!;
        doc.Craft!.PayloadKg = -1;
        var result = RigResolver.Resolve(doc, Catalogs.Catalog, File);
        Assert.Equal([new InputProblem(File, 0, 0, "$.craft.payload_kg", Messages.MustBeNonNegative(-1))], result.Problems);
    }

    [Theory]
    [InlineData("", RotorDrive.Core.Craft.MountKind.Free)]
    [InlineData("\"mount\": \"bench\",", RotorDrive.Core.Craft.MountKind.Bench)]
    [InlineData("\"mount\": \"Guided\",", RotorDrive.Core.Craft.MountKind.Guided)]
    public void Resolve_ReadsTheMount_FreeByDefault(string key, RotorDrive.Core.Craft.MountKind expected)
    {
        var result = Resolve("\"stations\": [", key + "\"stations\": [");
        Assert.Empty(result.Problems);
        Assert.Equal(expected, result.Rig!.Mount);
    }

    [Fact]
    public void Resolve_RejectsAnUnknownMount()
    {
        var result = Resolve("\"stations\": [", "\"mount\": \"rail\", \"stations\": [");
        var problem = Assert.Single(result.Problems);
        Assert.Equal(("$.mount", Messages.BadMount("rail")), (problem.Field, problem.Message));
    }

    // stations[].duty (issue 14 item 7): a guided rig's duties on every station or on none; none on a free craft; at
    // most limits.max_duty (0.95 in the demo rig); a bench station may have one or not.
    private static string WithDuties(string mount, params double?[] duties)
    {
        string text = ReplaceFirst(Demo, "\"stations\": [", $"\"mount\": \"{mount}\", \"stations\": [");
        string[] lines = text.Split('\n');
        int k = 0;
        for (int i = 0; i < lines.Length && k < duties.Length; i++)
        {
            if (lines[i].Contains("\"rotor\": \"hx130-p4\"", StringComparison.Ordinal))
            {
                if (duties[k] is { } d)
                {
                    lines[i] = lines[i].Replace("\"controller\": \"sc120-12s\" }", $"\"controller\": \"sc120-12s\", \"duty\": {d.ToString(System.Globalization.CultureInfo.InvariantCulture)} }}", StringComparison.Ordinal);
                }
                k++;
            }
        }
        return string.Join('\n', lines);
    }

    private static RigResolveResult ResolveText(string text)
    {
        var read = RigDocumentReader.Read(text, File);
        Assert.Empty(read.Problems);
        return RigResolver.Resolve(read.Document!, Catalogs, File, read.Locations);
    }

    [Fact]
    public void Resolve_ReadsADutyOnEveryStationOfAGuidedRig()
    {
        var result = ResolveText(WithDuties("guided", 0.5, 0.5, 0.6, 0.6, 0.7, 0.7));
        Assert.Empty(result.Problems);
        Assert.Equal([0.5, 0.5, 0.6, 0.6, 0.7, 0.7], result.Rig!.Stations.Select(s => s.Duty!.Value));
    }

    [Fact]
    public void Resolve_RejectsAGuidedRigWithDutiesOnSomeStationsOnly_NamingEachStationWithout()
    {
        var result = ResolveText(WithDuties("guided", null, 0.5, 0.5, 0.5, 0.5, 0.5));
        var problem = Assert.Single(result.Problems);
        Assert.Equal(("$.stations[0]", Messages.GuidedDutiesPartial(2)), (problem.Field, problem.Message));
        Assert.Null(result.Rig);
    }

    [Fact]
    public void Resolve_RejectsADutyOnAFreeCraft()
    {
        var problem = Assert.Single(ResolveText(WithDuties("free", 0.5)).Problems);
        Assert.Equal(("$.stations[0].duty", Messages.DutyOnFreeCraft()), (problem.Field, problem.Message));
    }

    [Fact]
    public void Resolve_RejectsADutyAboveMaxDuty_AndOutsideZeroToOne()
    {
        var above = Assert.Single(ResolveText(WithDuties("bench", 0.97)).Problems);
        Assert.Equal(("$.stations[0].duty", Messages.DutyAboveMax(0.97, 0.95)), (above.Field, above.Message));
        var outside = Assert.Single(ResolveText(WithDuties("bench", 1.5)).Problems);
        Assert.Equal("$.stations[0].duty", outside.Field);
        Assert.Equal(Messages.MustBeBetween(0, 1, 1.5), outside.Message);
    }

    [Fact]
    public void Resolve_AcceptsABenchWithADutyOnSomeStations()
    {
        var result = ResolveText(WithDuties("bench", 0.4));
        Assert.Empty(result.Problems);
        Assert.Equal(0.4, result.Rig!.Stations[0].Duty);
        Assert.Null(result.Rig.Stations[1].Duty);
    }
}

using RotorDrive.Files.Rigs;
using RotorDrive.Files.Tests.Support;
using Xunit;

namespace RotorDrive.Files.Tests.Rigs;

public class RigLoaderTests
{
    [Fact]
    public void Load_ReportsAMissingRigFileAsAProblem()
    {
        string path = Path.Combine(Path.GetTempPath(), "rotordrive-no-such-rig-" + Guid.NewGuid().ToString("N") + ".json");
        var result = RigLoader.Load(path);
        Assert.Null(result.Rig);
        Assert.Null(result.Document);
        Assert.Equal([new InputProblem(path, 0, 0, "", Messages.FileNotFound())], result.Problems);
    }

    [Theory]
    [InlineData("demo-rig.json", 6)]
    [InlineData("test-rig.json", 4)]
    public void Load_ReadsTheShippedRigsCleanly(string name, int stations)
    {
        var result = RigLoader.Load(Path.Combine(RepoPaths.Catalogs, name));
        Assert.Empty(result.Problems);
        Assert.True(result.IsClean);
        Assert.Equal(stations, result.Rig!.Stations.Count);
        Assert.NotNull(result.Catalog);
        Assert.NotNull(result.Document);
        Assert.All(result.Rig.Stations, s => Assert.NotNull(s.Motor));
        // Three (two) counter-rotating pairs: as many clockwise as counter-clockwise rotors.
        Assert.Equal(stations / 2, result.Rig.Stations.Count(s => s.Spin == Core.Craft.SpinDirection.Clockwise));
    }

    [Fact]
    public void Load_ReportsAHeaderTypoAndABadNumberWithTheirFileLineAndColumn()
    {
        using var rig = new TempRig();
        rig.Edit("motors.csv", "resistance_ohm", "resistence_ohm");
        rig.Edit("motors.csv", "or150-kv350,350,", "or150-kv350,3x50,");
        var result = RigLoader.Load(rig.DemoRig);
        string motors = rig.PathOf("motors.csv");
        Assert.Equal(
            [
                new InputProblem(motors, 1, 0, "resistance_ohm", Messages.MissingColumn("resistance_ohm")),
                new InputProblem(motors, 1, 3, "resistence_ohm", Messages.UnknownColumn("resistence_ohm", "resistance_ohm")),
                new InputProblem(motors, 3, 2, "kv_rpm_per_v", Messages.NotANumber("3x50")),
            ],
            result.Problems);
        Assert.Null(result.Rig);
    }

    [Fact]
    public void Load_ReportsEveryBadValueOfACatalog_AndDoesNotBlameTheRigForARejectedRow()
    {
        using var rig = new TempRig();
        rig.Edit("motors.csv", "or1050-kv90,90,0.0214", "or1050-kv90,90,-0.0214");
        rig.Edit("motors.csv", "or150-kv350,350,0.0984", "or150-kv350,350,abc");
        var result = RigLoader.Load(rig.DemoRig);
        string motors = rig.PathOf("motors.csv");
        Assert.Equal(
            [
                new InputProblem(motors, rig.LineOf("motors.csv", "or150-kv350"), 3, "resistance_ohm", Messages.NotANumber("abc")),
                new InputProblem(motors, rig.LineOf("motors.csv", "or1050-kv90"), 3, "resistance_ohm", Messages.MustBePositive(-0.0214)),
            ],
            result.Problems);
        Assert.Null(result.Rig);
        Assert.DoesNotContain(result.Catalog!.Motors, m => m.Id == "or1050-kv90");
    }

    [Fact]
    public void Load_ReportsAMissingCatalogFileNamedByTheRig()
    {
        using var rig = new TempRig();
        rig.Edit("demo-rig.json", "\"plates\": \"plates.csv\"", "\"plates\": \"floors.csv\"");
        var result = RigLoader.Load(rig.DemoRig);
        Assert.Equal([new InputProblem(rig.PathOf("floors.csv"), 0, 0, "", Messages.FileNotFound())], result.Problems);
    }

    [Fact]
    public void Load_ReportsAMissingCatalogKey_AndDoesNotGuessIds()
    {
        using var rig = new TempRig();
        rig.Edit("demo-rig.json", "\"rotors\": \"rotors.csv\",", "");
        var result = RigLoader.Load(rig.DemoRig);
        Assert.Equal([new InputProblem(rig.DemoRig, rig.LineOf("demo-rig.json", "\"catalogs\""), 15, "$.catalogs.rotors", Messages.MissingKey("rotors"))], result.Problems);
        Assert.Null(result.Catalog);
    }

    [Fact]
    public void Load_ReportsAWrongTypeOnce_NotAlsoAsMissing()
    {
        using var rig = new TempRig();
        rig.Edit("demo-rig.json", "\"thickness_mm\": 12", "\"thickness_mm\": \"12 mm\"");
        var result = RigLoader.Load(rig.DemoRig);
        var problem = Assert.Single(result.Problems);
        Assert.Equal(("$.plate.thickness_mm", Messages.WrongType("a number", "a string")), (problem.Field, problem.Message));
    }

    [Fact]
    public void Resolve_ChecksAnEditedDocument_AndSaveWritesItBackWithTheSameKeys()
    {
        using var rig = new TempRig();
        var loaded = RigLoader.Load(rig.DemoRig);
        var edited = loaded.Document!.Clone();
        edited.Craft!.PayloadKg = 30;
        edited.Stations![0].Motor = "or1200-kv80";
        var resolved = RigLoader.Resolve(edited, rig.DemoRig);
        Assert.Empty(resolved.Problems);
        Assert.Equal(30, resolved.Rig!.Body.PayloadKg);
        Assert.Equal(25, loaded.Rig!.Body.PayloadKg);

        Assert.Equal(new InputProblem(rig.DemoRig, 0, 0, "", Messages.FileExists()), RigDocumentWriter.Save(edited, rig.DemoRig, overwrite: false));
        Assert.Null(RigDocumentWriter.Save(edited, rig.DemoRig, overwrite: true));
        var reloaded = RigLoader.Load(rig.DemoRig);
        Assert.Empty(reloaded.Problems);
        Assert.Equal("or1200-kv80", reloaded.Rig!.Stations[0].Motor!.Id);
        Assert.Equal(RigDocumentWriter.Write(edited), RigDocumentWriter.Write(reloaded.Document!));
    }

    [Fact]
    public void Writer_KeepsExactlyTheKeysOfTheFile()
    {
        var text = File.ReadAllText(RepoPaths.TestRig);
        var doc = RigDocumentReader.Read(text, "test-rig.json").Document!;
        string written = RigDocumentWriter.Write(doc);
        var again = RigDocumentReader.Read(written, "again.json");
        Assert.Empty(again.Problems);
        Assert.Equal(written, RigDocumentWriter.Write(again.Document!));
        // Keys present in the file are written; defaults that were left out stay out.
        Assert.Contains("\"convection_w_per_m2k\": 10", written);
        Assert.DoesNotContain("cell_cutoff_v", written);
        Assert.Equal(KeysOf(text), KeysOf(written));
    }

    [Fact]
    public void Writer_OfAFullDocument_WritesExactlyTheDocumentedKeys()
    {
        var doc = new RigDocument
        {
            Name = "n",
            Catalogs = new RigCatalogsSection { Motors = "a", Controllers = "b", Packs = "c", CellCurves = "d", Rotors = "e", Plates = "f" },
            Plate = new RigPlateSection { Material = "m", ThicknessMm = 1, TemperatureC = 2, ConvectionWPerM2K = 3, SpreadingFactor = 1.5, BackIronMm = 2,
                ConvectionTopWPerM2K = 4, ConvectionBottomWPerM2K = 5, Emissivity = 0.1 },
            Craft = new RigCraftSection { EmptyMassKg = 1, PayloadKg = 2, CgXMm = 3, CgYMm = 4, YawInertiaKgM2 = 5, HeaveDampingRatio = 0.1 },
            Gap = new RigGapSection { DesignMm = 10, LandedMm = 5 },
            AmbientC = 20,
            GearYawFrictionNm = 1,
            LoadModel = "3d",
            Mount = "free",
            Stations = [new RigStationSection { Name = "front", XMm = 1, YMm = 2, Spin = "cw", Rotor = "r", Motor = "m", Controller = "c", Duty = 0.4 }],
            Pack = new RigPackSection { Id = "p", Count = 2 },
            Limits = new RigLimitsSection { YawTorqueNm = 1, PlateTempC = 2, CellCutoffV = 3, UsableCapacityPct = 4, MaxDuty = 0.5, LiftoffTimeS = 6 },
            Tolerances = new RigTolerancesSection(),
            Calibrations = new Dictionary<string, string> { ["r"] = "r-calibration.csv" },
            Route = [new RigRouteLegSection { XMm = 1000, YMm = 0, SpeedMPerS = 0.2 }, new RigRouteLegSection { DwellS = 10 }],
        };
        doc.Tolerances.Entries["motor_kv_rpm_per_v"] = RigToleranceEntry.NormalPercent(2);
        doc.Tolerances.Entries["gap_offset_mm"] = RigToleranceEntry.NormalAbsolute(0.5);
        doc.Tolerances.Entries["motor_resistance_ohm"] = RigToleranceEntry.UniformPercent(-5, 5);
        doc.Tolerances.Entries["ambient_c"] = RigToleranceEntry.UniformAbsolute(-5, 5);
        var expected = RigSchema.All.Where(k => k != RigSchema.SchemaRef).Select(k => k.Key)
            .Concat(["motor_kv_rpm_per_v", "gap_offset_mm", "motor_resistance_ohm", "ambient_c", "r"]).Concat(RigToleranceKeys.EntryKeys).Order().ToList();
        string written = RigDocumentWriter.Write(doc);
        Assert.Equal(expected, KeysOf(written));
        Assert.Empty(RigDocumentReader.Read(written, "w.json").Problems);
    }

    private static List<string> KeysOf(string json)
        => System.Text.RegularExpressions.Regex.Matches(json, "\"([a-z_0-9]+)\"\\s*:").Select(m => m.Groups[1].Value).Order().ToList();
}

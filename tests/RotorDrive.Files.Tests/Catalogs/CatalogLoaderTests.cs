using RotorDrive.Files.Catalogs;
using RotorDrive.Files.Tests.Support;
using Xunit;

namespace RotorDrive.Files.Tests.Catalogs;

public class CatalogLoaderTests
{
    private static CatalogTexts DemoTexts()
    {
        string Read(string name) => File.ReadAllText(Path.Combine(RepoPaths.Catalogs, name));
        return new CatalogTexts(Read("motors.csv"), Read("controllers.csv"), Read("packs.csv"), Read("cell_curves.csv"), Read("rotors.csv"), Read("plates.csv"));
    }

    private static readonly CatalogPaths Names = new("motors.csv", "controllers.csv", "packs.csv", "cell_curves.csv", "rotors.csv", "plates.csv");

    [Fact]
    public void Load_ReadsTheDemoCatalogsWithoutProblems_AndMeetsTheirMinimumSizes()
    {
        var result = CatalogLoader.Load(CatalogPaths.InFolder(RepoPaths.Catalogs));
        Assert.Empty(result.Problems);
        Assert.True(result.Catalog.Motors.Count >= 40);
        Assert.True(result.Catalog.Controllers.Count >= 15);
        Assert.True(result.Catalog.Packs.Count >= 20);
        Assert.True(result.Catalog.Rotors.Count >= 3);
        Assert.True(result.Catalog.Plates.Count >= 3);
        Assert.Equal(["lipo", "liion", "lifepo4"], result.Catalog.CellCurves.Select(c => c.Chemistry));
    }

    [Fact]
    public void Load_ReportsAPackWhoseChemistryHasNoCurve()
    {
        var texts = DemoTexts();
        texts = texts with { Packs = texts.Packs.Replace("lp6s-5ah,lipo,", "lp6s-5ah,nicd,") };
        var result = CatalogLoader.FromTexts(texts, Names);
        Assert.Equal([new InputProblem("packs.csv", 2, 2, "chemistry", Messages.NoCurveForChemistry("nicd", "cell_curves.csv"))], result.Problems);
        Assert.DoesNotContain(result.Catalog.Packs, p => p.Id == "lp6s-5ah");
        Assert.True(result.IsRejected(PartKind.Pack, "lp6s-5ah"));
    }

    [Fact]
    public void Load_DoesNotBlamePacksForACurveThatWasItselfRejected()
    {
        var texts = DemoTexts();
        texts = texts with { CellCurves = texts.CellCurves.Replace("lifepo4,50,3.28", "lifepo4,50,abc") };
        var result = CatalogLoader.FromTexts(texts, Names);
        Assert.Equal([new InputProblem("cell_curves.csv", 41, 3, "ocv_v", Messages.NotANumber("abc"))], result.Problems);
        Assert.DoesNotContain(result.Catalog.Packs, p => p.Chemistry == "lifepo4");
    }

    [Fact]
    public void Load_ReportsAMissingCatalogFile_AndStillReadsTheOthers()
    {
        using var rig = new TempRig();
        File.Delete(rig.PathOf("controllers.csv"));
        var result = CatalogLoader.Load(CatalogPaths.InFolder(rig.Folder));
        Assert.Equal([new InputProblem(rig.PathOf("controllers.csv"), 0, 0, "", Messages.FileNotFound())], result.Problems);
        Assert.Empty(result.Catalog.Controllers);
        Assert.NotEmpty(result.Catalog.Motors);
    }
}

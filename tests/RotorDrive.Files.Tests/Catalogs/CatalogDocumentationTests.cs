using RotorDrive.Files.Catalogs;
using RotorDrive.Files.Rigs;
using RotorDrive.Files.Tests.Support;
using Xunit;

namespace RotorDrive.Files.Tests.Catalogs;

/// <summary>The READMEs document every column and key the readers accept.</summary>
public class CatalogDocumentationTests
{
    public static TheoryData<string, string> Columns()
    {
        var data = new TheoryData<string, string>();
        void Add<T>(CatalogFormat<T> format) where T : notnull
        {
            foreach (var c in format.Columns)
            {
                data.Add(format.FileName, c.Name);
            }
        }
        Add(CatalogFormats.Motors);
        Add(CatalogFormats.Controllers);
        Add(CatalogFormats.Packs);
        Add(CatalogFormats.CellCurves);
        Add(CatalogFormats.Rotors);
        Add(CatalogFormats.Plates);
        return data;
    }

    [Theory]
    [MemberData(nameof(Columns))]
    public void CatalogReadme_DocumentsEveryColumnInItsFilesSection(string file, string column)
    {
        string readme = File.ReadAllText(Path.Combine(RepoPaths.Catalogs, "README.md"));
        int section = readme.IndexOf("## " + file, StringComparison.Ordinal);
        Assert.True(section >= 0, $"no section for {file}");
        int next = readme.IndexOf("\n## ", section + 1, StringComparison.Ordinal);
        string body = next < 0 ? readme[section..] : readme[section..next];
        Assert.Contains($"| `{column}` |", body);
    }

    [Fact]
    public void Readme_DocumentsEveryRigKey()
    {
        string readme = File.ReadAllText(Path.Combine(RepoPaths.Root, "README.md"));
        var keys = RigKeys.Top.Concat(RigKeys.Catalogs).Concat(RigKeys.Plate).Concat(RigKeys.Craft).Concat(RigKeys.Gap)
            .Concat(RigKeys.Station).Concat(RigKeys.Pack).Concat(RigKeys.Limits)
            .Concat(RigToleranceKeys.Keys).Concat(RigToleranceKeys.EntryKeys);
        Assert.All(keys, key => Assert.True(readme.Contains("`" + key, StringComparison.Ordinal) || readme.Contains("." + key, StringComparison.Ordinal), key));
    }
}

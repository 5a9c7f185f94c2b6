using FsCheck;
using FsCheck.Fluent;
using RotorDrive.Files.Catalogs;
using RotorDrive.Files.Rigs;
using RotorDrive.Files.Tests.Support;
using Xunit;

namespace RotorDrive.Files.Tests.Rigs;

public class RigPropertyTests
{
    [Fact]
    public void DamagedRigText_NeverCrashesTheReaderOrResolver()
    {
        string valid = File.ReadAllText(RepoPaths.DemoRig);
        var catalogs = CatalogLoader.Load(CatalogPaths.InFolder(RepoPaths.Catalogs));
        int cases = 0;
        var property = Prop.ForAll(CatalogGenerators.Damaged(valid).ToArbitrary(), text =>
        {
            cases++;
            var read = RigDocumentReader.Read(text, "rig.json");
            if (read.Document is { } doc)
            {
                var resolved = RigResolver.Resolve(doc, catalogs, "rig.json", read.Locations);
                Assert.True(resolved.Rig is null || resolved.Problems.Count == 0);
                // A document read from any text can be written and read back.
                Assert.NotNull(RigDocumentReader.Read(RigDocumentWriter.Write(doc), "w.json").Document);
            }
            else
            {
                Assert.NotEmpty(read.Problems);
            }
            Assert.All(read.Problems, p => Assert.True(p.Line >= 0 && p.Column >= 0 && p.Message.Length > 0));
            return true;
        });
        Check.One(Config.QuickThrowOnFailure.WithMaxTest(10_000).WithQuietOnSuccess(true), property);
        Assert.True(cases >= 10_000);
    }
}

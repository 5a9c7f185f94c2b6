using Xunit;

namespace RotorDrive.Files.Tests;

public sealed class AtomicFileTests : IDisposable
{
    private readonly string _folder = Directory.CreateTempSubdirectory("rotordrive-atomic-").FullName;

    public void Dispose() => Directory.Delete(_folder, recursive: true);

    [Fact]
    public void WriteAllText_RefusesToReplaceAnExistingFile_UnlessAsked()
    {
        string path = Path.Combine(_folder, "out.json");
        File.WriteAllText(path, "original");
        var problem = AtomicFile.WriteAllText(path, "new", overwrite: false);
        Assert.Equal(new InputProblem(path, 0, 0, "", Messages.FileExists()), problem);
        Assert.Equal("original", File.ReadAllText(path));

        Assert.Null(AtomicFile.WriteAllText(path, "new", overwrite: true));
        Assert.Equal("new", File.ReadAllText(path));
        Assert.Single(Directory.GetFiles(_folder));
    }

    [Fact]
    public void WriteAllText_ReportsAMissingFolder()
    {
        string path = Path.Combine(_folder, "nowhere", "out.json");
        var problem = AtomicFile.WriteAllText(path, "x", overwrite: false);
        Assert.Equal(new InputProblem(path, 0, 0, "", Messages.FileNotWritten("the folder does not exist")), problem);
    }
}

using Xunit;

namespace RotorDrive.Files.Tests;

public class TextFilesTests
{
    [Fact]
    public void TryRead_ReportsAFolderGivenInsteadOfAFile()
    {
        var problems = new List<InputProblem>();
        string folder = Path.GetTempPath();
        Assert.Null(TextFiles.TryRead(folder, problems));
        Assert.Equal([new InputProblem(folder, 0, 0, "", Messages.FileUnreadable("it is a folder, not a file"))], problems);
    }

    [Fact]
    public void TryRead_ReportsAMissingFolderAsFileNotFound()
    {
        var problems = new List<InputProblem>();
        string path = Path.Combine(Path.GetTempPath(), "rotordrive-" + Guid.NewGuid().ToString("N"), "rig.json");
        Assert.Null(TextFiles.TryRead(path, problems));
        Assert.Equal([new InputProblem(path, 0, 0, "", Messages.FileNotFound())], problems);
    }
}

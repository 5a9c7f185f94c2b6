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
        Assert.Equal([new InputProblem(path, 0, 0, "", Messages.FileNotFound())], result.Problems);
    }
}

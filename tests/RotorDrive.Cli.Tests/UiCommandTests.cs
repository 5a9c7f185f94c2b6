using Xunit;

namespace RotorDrive.Cli.Tests;

public class UiCommandTests
{
    [Fact]
    public async Task Ui_OnAMissingRigFile_ReportsItWithoutTakingOverTheTerminal()
    {
        string path = Path.Combine(Path.GetTempPath(), "rotordrive-no-such-rig-" + Guid.NewGuid().ToString("N") + ".json");
        var (code, output, error) = await CliRunner.RunAsync("ui", path);
        Assert.Equal(ExitCodes.BadInput, code);
        Assert.Equal("", output);
        Assert.Contains("rotordrive ui: cannot open the rig:", error);
        Assert.Contains(path, error);
    }

    [Fact]
    public void FindDemoRig_LooksInTheCurrentFolderFirst_ThenAboveTheProgram()
    {
        string root = Directory.CreateTempSubdirectory("rotordrive-ui-").FullName;
        try
        {
            Directory.CreateDirectory(Path.Combine(root, "catalogs"));
            File.WriteAllText(Path.Combine(root, "catalogs", "demo-rig.json"), "{}");
            string deep = Directory.CreateDirectory(Path.Combine(root, "src", "bin", "Debug")).FullName;
            Assert.Equal(Path.Combine("catalogs", "demo-rig.json"), RotorDrive.Tui.Workbench.FindDemoRig(root, deep));
            string elsewhere = Directory.CreateTempSubdirectory("rotordrive-cwd-").FullName;
            Assert.Equal(Path.Combine(root, "catalogs", "demo-rig.json"), RotorDrive.Tui.Workbench.FindDemoRig(elsewhere, deep));
            Directory.Delete(elsewhere);
        }
        finally
        {
            Directory.Delete(root, recursive: true);
        }
    }
}

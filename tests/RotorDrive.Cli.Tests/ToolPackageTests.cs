using System.Diagnostics;
using Xunit;

namespace RotorDrive.Cli.Tests;

/// <summary>The command line as users install it: packed as a .NET tool, installed to a tool folder, run on the demo files
/// it carries.</summary>
public sealed class ToolPackageTests : IDisposable
{
#if DEBUG
    private const string Configuration = "Debug";
#else
    private const string Configuration = "Release";
#endif
    private static readonly TimeSpan Limit = TimeSpan.FromMinutes(8);
    private readonly string _folder = Directory.CreateTempSubdirectory("rotordrive-tool-").FullName;

    public void Dispose() => Directory.Delete(_folder, recursive: true);

    private static async Task<(int Code, string Output)> RunAsync(string file, IEnumerable<string> args, IDictionary<string, string>? environment = null)
    {
        var start = new ProcessStartInfo(file) { RedirectStandardOutput = true, RedirectStandardError = true, UseShellExecute = false };
        foreach (string a in args)
        {
            start.ArgumentList.Add(a);
        }
        foreach (var (key, value) in environment ?? new Dictionary<string, string>())
        {
            start.Environment[key] = value;
        }
        using var process = Process.Start(start)!;
        var stdout = process.StandardOutput.ReadToEndAsync();
        var stderr = process.StandardError.ReadToEndAsync();
        using var cancel = new CancellationTokenSource(Limit);
        await process.WaitForExitAsync(cancel.Token);
        return (process.ExitCode, await stdout + await stderr);
    }

    [Fact]
    public async Task Pack_MakesAToolPackage_WhoseInstalledCommand_ChecksTheDemoItCopies()
    {
        string project = Path.Combine(RepoPaths.Root, "src", "RotorDrive.Cli", "RotorDrive.Cli.csproj");
        string feed = Path.Combine(_folder, "nupkg");
        // The test project builds the command line first, so packing reuses that build.
        var (code, log) = await RunAsync("dotnet", ["pack", project, "-c", Configuration, "--no-build", "-o", feed, "-nologo"]);
        Assert.True(code == 0, log);
        Assert.Single(Directory.GetFiles(feed, "RotorDrive.*.nupkg"));

        // Only the fresh package: a config with this one source, and a package cache of its own (never a stale copy).
        string config = Path.Combine(_folder, "nuget.config");
        await File.WriteAllTextAsync(config,
            $"<?xml version=\"1.0\" encoding=\"utf-8\"?><configuration><packageSources><clear /><add key=\"here\" value=\"{feed}\" /></packageSources></configuration>");
        string tools = Path.Combine(_folder, "tools");
        var isolated = new Dictionary<string, string> { ["NUGET_PACKAGES"] = Path.Combine(_folder, "packages") };
        (code, log) = await RunAsync("dotnet", ["tool", "install", "--tool-path", tools, "--configfile", config, "RotorDrive"], isolated);
        Assert.True(code == 0, log);

        string rotordrive = Path.Combine(tools, OperatingSystem.IsWindows() ? "rotordrive.exe" : "rotordrive");
        (code, log) = await RunAsync(rotordrive, ["--version"]);
        Assert.Equal(0, code);
        Assert.Equal(ReportVersion(), log.Trim());

        string demo = Path.Combine(_folder, "demo");
        (code, log) = await RunAsync(rotordrive, ["demo", demo]);
        Assert.True(code == 0, log);
        foreach (string file in Directory.GetFiles(RepoPaths.Catalogs))
        {
            Assert.Equal(await File.ReadAllTextAsync(file), await File.ReadAllTextAsync(Path.Combine(demo, Path.GetFileName(file))));
        }
        (code, log) = await RunAsync(rotordrive, ["check", Path.Combine(demo, "demo-rig.json")]);
        Assert.True(code == 0, log);
        Assert.Contains("No problems found.", log);

        // A second copy into the same folder is refused and changes nothing.
        (code, log) = await RunAsync(rotordrive, ["demo", demo]);
        Assert.Equal(2, code);
        Assert.Contains("already exists", log);
    }

    private static string ReportVersion() => Commands.ReportCommand.ToolVersion();
}

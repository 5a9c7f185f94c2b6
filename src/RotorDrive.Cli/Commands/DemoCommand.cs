using System.CommandLine;
using System.Reflection;
using RotorDrive.Files;

namespace RotorDrive.Cli.Commands;

/// <summary><c>rotordrive demo DIR [--force]</c>: copies the invented demo catalogs and rigs (built into the program)
/// to a folder, so an installed tool can be tried without the source: <c>rotordrive check DIR/demo-rig.json</c>.</summary>
public static class DemoCommand
{
    /// <summary>Prefix of the demo files' resource names in this assembly.</summary>
    public const string ResourcePrefix = "demo/";

    /// <summary>Builds the subcommand.</summary>
    public static Command Create()
    {
        var folder = new Argument<string>("dir") { Description = "The folder to copy the demo files into (made if missing)." };
        var force = CommonOptions.Force();
        var command = new Command("demo", "Copy the invented demo catalogs and rig files to a folder (refuses to replace existing files without --force).");
        command.Arguments.Add(folder);
        command.Options.Add(force);
        command.SetAction(parse => Run(parse.GetValue(folder)!, parse.GetValue(force), parse.InvocationConfiguration.Output, parse.InvocationConfiguration.Error));
        return command;
    }

    /// <summary>The demo files built into the program: file name and content.</summary>
    public static IReadOnlyList<(string Name, byte[] Content)> Files()
    {
        var assembly = Assembly.GetExecutingAssembly();
        return assembly.GetManifestResourceNames()
            .Where(n => n.StartsWith(ResourcePrefix, StringComparison.Ordinal))
            .Order(StringComparer.Ordinal)
            .Select(n =>
            {
                using var stream = assembly.GetManifestResourceStream(n)!;
                using var copy = new MemoryStream();
                stream.CopyTo(copy);
                return (n[ResourcePrefix.Length..], copy.ToArray());
            })
            .ToList();
    }

    private static int Run(string folder, bool force, TextWriter output, TextWriter error)
    {
        var files = Files();
        if (files.Count == 0)
        {
            error.WriteLine("rotordrive demo: error: this build carries no demo files (build problem).");
            return ExitCodes.InternalError;
        }
        // Every clash is reported before anything is written, so a refused run changes nothing.
        var clashes = force ? [] : files.Select(f => Path.Combine(folder, f.Name)).Where(File.Exists).ToList();
        if (clashes.Count > 0)
        {
            foreach (var clash in clashes)
            {
                error.WriteLine($"rotordrive demo: error: {clash}: {Messages.FileExists()}");
            }
            return ExitCodes.BadInput;
        }
        try
        {
            Directory.CreateDirectory(folder);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            error.WriteLine($"rotordrive demo: error: {folder}: {Messages.FileNotWritten(e.Message)}");
            return ExitCodes.BadInput;
        }
        foreach (var (name, content) in files)
        {
            if (AtomicFile.WriteAllBytes(Path.Combine(folder, name), content, force) is { } problem)
            {
                Output.ProblemReport.Print([problem], error);
                return ExitCodes.BadInput;
            }
        }
        output.WriteLine($"Copied {files.Count} demo files (invented data) to {folder}: {string.Join(", ", files.Select(f => f.Name))}.");
        output.WriteLine($"Try: rotordrive check {Path.Combine(folder, "demo-rig.json")}");
        return ExitCodes.Ok;
    }
}

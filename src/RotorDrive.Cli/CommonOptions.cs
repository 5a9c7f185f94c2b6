using System.CommandLine;

namespace RotorDrive.Cli;

/// <summary>Factories for the options and arguments several subcommands share. Each call makes a new instance: a
/// System.CommandLine symbol belongs to one command, so there are no static option holders.</summary>
public static class CommonOptions
{
    /// <summary>The rig file argument.</summary>
    public static Argument<string> RigArgument() => new("rig")
    {
        Description = "The rig file (JSON); the catalogs it names are read relative to it.",
    };

    /// <summary>--json: write a JSON document to stdout instead of text tables.</summary>
    public static Option<bool> Json() => new("--json")
    {
        Description = "Write a JSON document (snake_case keys with units) to stdout instead of tables.",
    };

    /// <summary>--force: allow replacing an existing output file.</summary>
    public static Option<bool> Force() => new("--force")
    {
        Description = "Replace the output file if it already exists.",
    };

    /// <summary>The <c>--csv FILE</c> export option; <paramref name="what"/> says what the file holds. Exports are written
    /// atomically and never replace an existing file without <c>--force</c>.</summary>
    public static Option<string?> Csv(string what) => new("--csv")
    {
        Description = $"Write {what} to this CSV file (atomically; refuses to replace an existing file without --force).",
        HelpName = "FILE",
    };

    /// <summary>Checks before any work that a <c>--csv</c> export would not replace an existing file without
    /// <c>--force</c>; prints the error line when it would.</summary>
    /// <param name="command">The command's name, for the message.</param>
    /// <param name="csvPath">The export path, or null when there is none.</param>
    /// <param name="force">True when the user allowed replacing the file.</param>
    /// <param name="error">Where the message goes.</param>
    /// <returns>True when the command must stop (exit code 2).</returns>
    public static bool RefusesExistingCsv(string command, string? csvPath, bool force, TextWriter error)
    {
        if (csvPath is not null && Directory.Exists(csvPath))
        {
            error.WriteLine($"rotordrive {command}: error: {csvPath}: {Files.Messages.PathIsFolder()}");
            return true;
        }
        if (csvPath is null || force || !File.Exists(csvPath))
        {
            return false;
        }
        error.WriteLine($"rotordrive {command}: error: {csvPath}: {Files.Messages.FileExists()}");
        return true;
    }

    /// <summary>The <c>--plot FILE</c> option; <paramref name="what"/> says what the figure shows. The extension picks the
    /// format (.svg or .png); the file is written atomically and never replaces an existing one without <c>--force</c>.</summary>
    public static Option<string?> Plot(string what) => new("--plot")
    {
        Description = $"Draw {what} to this file: .svg or .png by the extension (atomically; refuses to replace an existing file without --force).",
        HelpName = "FILE",
    };

    /// <summary>Checks before any work that a <c>--plot</c> file has a known extension and would not replace an existing
    /// file without <c>--force</c>; prints the error line when it would.</summary>
    /// <param name="command">The command's name, for the message.</param>
    /// <param name="plotPath">The plot path, or null when there is none.</param>
    /// <param name="force">True when the user allowed replacing the file.</param>
    /// <param name="error">Where the message goes.</param>
    /// <returns>True when the command must stop (exit code 2).</returns>
    public static bool RefusesPlot(string command, string? plotPath, bool force, TextWriter error)
    {
        if (plotPath is null)
        {
            return false;
        }
        if (!Directory.Exists(plotPath) && Files.Plots.PlotWriter.FormatOf(plotPath) is null)
        {
            error.WriteLine($"rotordrive {command}: error: {plotPath}: {Files.Messages.PlotExtension()}");
            return true;
        }
        return RefusesExistingCsv(command, plotPath, force, error);
    }

    /// <summary>Writes a figure to the <c>--plot</c> file and says where on the error stream; prints the problem when the
    /// file cannot be written, or when the analysis had nothing to draw.</summary>
    /// <param name="command">The command's name, for the message.</param>
    /// <param name="figure">The figure, or null when there is nothing to draw.</param>
    /// <param name="plotPath">The plot path.</param>
    /// <param name="force">True when the user allowed replacing the file.</param>
    /// <param name="error">Where messages go.</param>
    /// <returns>True when the file was written.</returns>
    public static bool WritePlot(string command, Files.Plots.PlotFigure? figure, string plotPath, bool force, TextWriter error)
    {
        if (figure is null)
        {
            error.WriteLine($"rotordrive {command}: error: {plotPath}: nothing to draw (the analysis kept no curve); no plot was written");
            return false;
        }
        var problem = Files.Plots.PlotWriter.Write(figure, plotPath, force);
        if (problem is not null)
        {
            Output.ProblemReport.Print([problem], error);
            return false;
        }
        error.WriteLine($"Plot written to {plotPath}.");
        return true;
    }

    /// <summary>Today's date from the clock (local time), for the corner stamp of plots and reports.</summary>
    /// <param name="clock">The clock; the system clock when null.</param>
    public static DateOnly Today(TimeProvider? clock) => DateOnly.FromDateTime((clock ?? TimeProvider.System).GetLocalNow().DateTime);
}

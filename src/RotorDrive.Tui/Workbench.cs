using Terminal.Gui.App;
using RotorDrive.Tui.Services;
using RotorDrive.Tui.Session;
using RotorDrive.Tui.Shell;
using RotorDrive.Tui.Work;

namespace RotorDrive.Tui;

/// <summary>Starts the terminal workbench (<c>rotordrive ui</c>).</summary>
public static class Workbench
{
    /// <summary>The demo rig's path inside the repository.</summary>
    public const string DemoRigRelativePath = "catalogs/demo-rig.json";

    /// <summary>How long the workbench waits after the last edit before recomputing.</summary>
    public static TimeSpan Debounce { get; } = TimeSpan.FromMilliseconds(350);

    /// <summary>Finds the demo rig: relative to the current folder, else in the repository that holds the program
    /// (searched upwards from <paramref name="baseDirectory"/>); null when neither exists.</summary>
    public static string? FindDemoRig(string currentDirectory, string baseDirectory)
    {
        string here = Path.Combine(currentDirectory, DemoRigRelativePath);
        if (File.Exists(here))
        {
            return Path.GetRelativePath(currentDirectory, here);
        }
        for (var dir = new DirectoryInfo(baseDirectory); dir is not null; dir = dir.Parent)
        {
            string candidate = Path.Combine(dir.FullName, DemoRigRelativePath);
            if (File.Exists(candidate))
            {
                return candidate;
            }
        }
        return null;
    }

    /// <summary>Builds the workbench window on an initialised application and opens the rig.</summary>
    /// <param name="app">An application already initialised with a driver.</param>
    /// <param name="rigPath">The rig file to open.</param>
    /// <param name="files">File access.</param>
    /// <param name="clock">The wall clock.</param>
    /// <param name="prompts">How questions are asked.</param>
    /// <param name="failure">Why the rig could not be opened, or null.</param>
    /// <returns>The window (not yet running) and its context; the caller disposes the window, then the context's work.</returns>
    public static (MainWindow Window, WorkbenchContext Context) Build(IApplication app, string rigPath, IWorkbenchFiles files,
        IWorkbenchClock clock, IWorkbenchPrompts prompts, out string? failure)
    {
        ArgumentNullException.ThrowIfNull(app);
        var session = new RigSession(files);
        failure = session.Open(rigPath);
        var context = new WorkbenchContext(app, session, files, clock, prompts, new BackgroundWork(app, Debounce));
        var window = new MainWindow(context, SheetSet.Create(context));
        return (window, context);
    }

    /// <summary>Reads the rig file as the workbench would; returns why it cannot be opened, or null.</summary>
    public static string? CheckOpens(string rigPath) => new RigSession(new DiskFiles()).Open(rigPath);

    /// <summary>Runs the workbench in the real terminal until the user quits.</summary>
    /// <param name="rigPath">The rig file to open.</param>
    /// <param name="error">Where a rig that cannot be opened is reported (before the screen is taken over).</param>
    /// <param name="ascii">True to draw charts and the sketch with plain characters and no colour (<see cref="Charts.ChartStyle.Plain"/>).</param>
    /// <returns>0 after a normal quit; 2 when the rig file cannot be opened.</returns>
    public static int Run(string rigPath, TextWriter error, bool ascii = false)
    {
        ArgumentNullException.ThrowIfNull(error);
        if (ascii)
        {
            // The one switch the charts and the station sketch read (ChartStyle.FromEnvironment), for this process only.
            Environment.SetEnvironmentVariable("ROTORDRIVE_ASCII", "1");
        }
        var files = new DiskFiles();
        if (CheckOpens(rigPath) is { } failure)
        {
            error.WriteLine($"rotordrive ui: cannot open the rig: {failure}");
            return 2;
        }
        KeyTiming.SetLoopRate();
        using IApplication app = Application.Create();
        app.Init();
        KeyTiming.ShortenEscapeWait(app);
        var (window, context) = Build(app, rigPath, files, new SystemClock(), new TerminalPrompts(app), out _);
        using (context.Work)
        using (window)
        // ROTORDRIVE_UI_TRACE=FILE logs how the UI thread spends its time (DEVELOPERS.md, "Workbench response").
        using (ResponseTrace.StartIfAsked(app, [window, .. window.Sheets]))
        {
            app.Run(window);
        }
        return 0;
    }
}

using Terminal.Gui.App;
using RotorDrive.Tui.Services;
using RotorDrive.Tui.Session;
using RotorDrive.Tui.Work;

namespace RotorDrive.Tui.Shell;

/// <summary>What every sheet works with: the application, the rig session, the injected services and the background
/// runner.</summary>
public sealed class WorkbenchContext
{
    /// <summary>Creates the context.</summary>
    public WorkbenchContext(IApplication app, RigSession session, IWorkbenchFiles files, IWorkbenchClock clock, IWorkbenchPrompts prompts, BackgroundWork work)
    {
        App = app;
        Session = session;
        Files = files;
        Clock = clock;
        Prompts = prompts;
        Work = work;
    }

    /// <summary>The application instance.</summary>
    public IApplication App { get; }

    /// <summary>The rig being edited.</summary>
    public RigSession Session { get; }

    /// <summary>File access.</summary>
    public IWorkbenchFiles Files { get; }

    /// <summary>The wall clock.</summary>
    public IWorkbenchClock Clock { get; }

    /// <summary>Questions to the user.</summary>
    public IWorkbenchPrompts Prompts { get; }

    /// <summary>Background computations.</summary>
    public BackgroundWork Work { get; }

    /// <summary>The prepared rig model of the rig being edited, shared by the sheets.</summary>
    public RigModelCache Models { get; } = new();

    /// <summary>Raised when a sheet has something to tell the user on the status line.</summary>
    public event EventHandler<string>? Notice;

    /// <summary>Shows a short message on the status line.</summary>
    public void Tell(string message) => Notice?.Invoke(this, message);
}

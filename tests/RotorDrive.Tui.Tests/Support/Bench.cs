using Terminal.Gui.App;
using Terminal.Gui.Drivers;
using Terminal.Gui.Input;
using Terminal.Gui.Testing;
using Terminal.Gui.Time;
using RotorDrive.Tui.Shell;

namespace RotorDrive.Tui.Tests.Support;

/// <summary>The workbench on Terminal.Gui's headless ANSI driver with virtual time: never the real terminal.</summary>
internal sealed class Bench : IDisposable
{
    private readonly SessionToken? _token;
    private bool _disposed;

    public Bench(int columns = 100, int rows = 30, string rigPath = "/lab/demo-rig.json", MemoryFiles? files = null)
    {
        Environment.SetEnvironmentVariable("DisableRealDriverIO", "1");
        Time = new VirtualTimeProvider();
        App = Application.Create(Time);
        // Init installs the application's synchronisation context on this thread; awaits in tests would then wait for
        // a main loop that never runs. Keep the test runner's context.
        var testContext = SynchronizationContext.Current;
        App.Init(DriverRegistry.Names.ANSI);
        SynchronizationContext.SetSynchronizationContext(testContext);
        App.Driver!.SetScreenSize(columns, rows);
        Files = files ?? MemoryFiles.WithDemoCatalogs();
        Prompts = new ScriptedPrompts();
        Clock = new FixedClock(new DateTimeOffset(2026, 12, 1, 10, 0, 0, TimeSpan.Zero));
        (Window, Context) = Workbench.Build(App, rigPath, Files, Clock, Prompts, out string? failure);
        OpenFailure = failure;
        _token = App.Begin(Window);
        Draw();
        SynchronizationContext.SetSynchronizationContext(testContext);
    }

    public IApplication App { get; }

    public VirtualTimeProvider Time { get; }

    public MemoryFiles Files { get; }

    public ScriptedPrompts Prompts { get; }

    public FixedClock Clock { get; }

    public MainWindow Window { get; }

    public WorkbenchContext Context { get; }

    public string? OpenFailure { get; }

    public string Screen
    {
        get
        {
            Draw();
            return App.Driver!.ToString() ?? "";
        }
    }

    public void Draw() => App.LayoutAndDraw(true);

    public void Press(Key key)
    {
        App.InjectKey(key);
        Draw();
    }

    public void Type(string text)
    {
        foreach (char ch in text)
        {
            App.InjectKey(new Key(ch));
        }
        Draw();
    }

    /// <summary>Lets debounce delays pass, waits for the workers, then runs what they queued for the UI thread.</summary>
    public async Task SettleAsync()
    {
        for (int round = 0; round < 5; round++)
        {
            Time.Advance(Workbench.Debounce + TimeSpan.FromMilliseconds(50));
            App.TimedEvents!.RunTimers();
            await Context.Work.WhenWorkersDone().WaitAsync(TimeSpan.FromSeconds(20));
            App.TimedEvents!.RunTimers();
        }
        Draw();
    }

    public void Dispose()
    {
        if (_disposed)
        {
            return;
        }
        _disposed = true;
        if (_token is not null)
        {
            App.End(_token);
        }
        Window.Dispose();
        Context.Work.Dispose();
        App.Dispose();
    }
}

using System.Diagnostics;
using System.Globalization;
using Terminal.Gui.App;
using Terminal.Gui.ViewBase;

namespace RotorDrive.Tui.Work;

/// <summary>A diagnostic log of how the UI thread spends its time (issue 15 item 1), kept only when the environment
/// variable <see cref="Variable"/> names a file. One tab-separated line per event: each key with the time from its
/// arrival to the next finished draw, every draw that took over <see cref="SlowMs"/> ms with the views it drew, every
/// main-loop gap over <see cref="SlowMs"/> ms with the UI thread's time on a processor and waiting for one (Linux
/// schedstat), named UI-thread steps over 5 ms, and with each line the garbage collector's total pause time and counts.</summary>
internal sealed class ResponseTrace : IDisposable
{
    /// <summary>The environment variable that names the log file.</summary>
    public const string Variable = "ROTORDRIVE_UI_TRACE";

    private const double SlowMs = 30;

    private readonly IApplication _app;
    private readonly StreamWriter _log;
    private readonly Stopwatch _clock = Stopwatch.StartNew();
    private readonly Dictionary<string, int> _drawn = new(StringComparer.Ordinal);
    private double _lastIteration;
    private (long RunNs, long WaitNs) _lastSched;
    private double? _keyAt;
    private string _key = "";
    private TimeSpan _pauseAtKey;

    private ResponseTrace(IApplication app, string path)
    {
        _app = app;
        _log = new StreamWriter(path, append: false);
        _app.Iteration += OnIteration;
        _app.Keyboard.KeyDown += OnKey;
        _app.LayoutAndDrawComplete += OnDrawn;
        _log.WriteLine("ms\tevent\tdetail\tgc_pause_ms\tgen0\tgen1\tgen2");
    }

    /// <summary>The log in force, or null.</summary>
    public static ResponseTrace? Current { get; private set; }

    /// <summary>Starts the log when <see cref="Variable"/> is set; null otherwise.</summary>
    /// <param name="app">The running application.</param>
    /// <param name="views">The views whose draws are counted (each with everything under it).</param>
    public static ResponseTrace? StartIfAsked(IApplication app, IEnumerable<View> views)
    {
        if (Environment.GetEnvironmentVariable(Variable) is not { Length: > 0 } path)
        {
            return null;
        }
        var trace = new ResponseTrace(app, path);
        foreach (var view in views)
        {
            trace.Watch(view);
        }
        Current = trace;
        return trace;
    }

    /// <summary>Logs a UI-thread step that began at <paramref name="startTimestamp"/> (<see cref="Stopwatch.GetTimestamp"/>)
    /// when the log is on and the step took over 5 ms.</summary>
    public static void Step(string name, long startTimestamp)
    {
        if (Current is { } trace && Stopwatch.GetElapsedTime(startTimestamp).TotalMilliseconds is var ms and > 5)
        {
            trace.Write("step", string.Create(CultureInfo.InvariantCulture, $"{name} {ms:F1}"));
        }
    }

    /// <inheritdoc/>
    public void Dispose()
    {
        Current = null;
        _app.Iteration -= OnIteration;
        _app.Keyboard.KeyDown -= OnKey;
        _app.LayoutAndDrawComplete -= OnDrawn;
        _log.Dispose();
    }

    private void Watch(View view)
    {
        string name = view.GetType().Name;
        view.DrawComplete += (_, _) => _drawn[name] = _drawn.GetValueOrDefault(name) + 1;
        foreach (var sub in view.SubViews)
        {
            Watch(sub);
        }
    }

    private void OnIteration(object? sender, EventArgs e)
    {
        double now = _clock.Elapsed.TotalMilliseconds;
        var sched = Sched();
        if (_lastIteration > 0 && now - _lastIteration > SlowMs)
        {
            Write("gap", string.Create(CultureInfo.InvariantCulture,
                $"{now - _lastIteration:F1} run {(sched.RunNs - _lastSched.RunNs) / 1e6:F1} wait {(sched.WaitNs - _lastSched.WaitNs) / 1e6:F1}"));
        }
        _lastIteration = now;
        _lastSched = sched;
    }

    private void OnKey(object? sender, Terminal.Gui.Input.Key key)
    {
        _keyAt = _clock.Elapsed.TotalMilliseconds;
        _key = key.ToString();
        _pauseAtKey = GC.GetTotalPauseDuration();
    }

    private void OnDrawn(object? sender, EventArgs e)
    {
        double now = _clock.Elapsed.TotalMilliseconds;
        if (now - _lastIteration > SlowMs)
        {
            Write("draw", string.Create(CultureInfo.InvariantCulture,
                $"{now - _lastIteration:F1} {string.Join(",", _drawn.Select(kv => $"{kv.Key}:{kv.Value}"))}"));
        }
        _drawn.Clear();
        if (_keyAt is { } at)
        {
            Write("key", string.Create(CultureInfo.InvariantCulture,
                $"{_key} {now - at:F1} (gc pause {(GC.GetTotalPauseDuration() - _pauseAtKey).TotalMilliseconds:F1})"));
            _keyAt = null;
        }
    }

    // The calling thread's nanoseconds on a processor and waiting in the run queue; zeros where /proc is not there.
    private static (long RunNs, long WaitNs) Sched()
    {
        try
        {
            string[] parts = File.ReadAllText("/proc/thread-self/schedstat").Split(' ');
            return (long.Parse(parts[0], CultureInfo.InvariantCulture), long.Parse(parts[1], CultureInfo.InvariantCulture));
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException or FormatException or IndexOutOfRangeException)
        {
            return (0, 0);
        }
    }

    private void Write(string what, string detail)
        => _log.WriteLine(string.Create(CultureInfo.InvariantCulture,
            $"{_clock.Elapsed.TotalMilliseconds:F1}\t{what}\t{detail}\t{GC.GetTotalPauseDuration().TotalMilliseconds:F1}\t{GC.CollectionCount(0)}\t{GC.CollectionCount(1)}\t{GC.CollectionCount(2)}"));
}

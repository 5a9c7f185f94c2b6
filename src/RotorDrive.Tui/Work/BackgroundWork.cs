using Terminal.Gui.App;

namespace RotorDrive.Tui.Work;

/// <summary>Runs computations off the UI thread: each named job is debounced (a new request within the delay replaces
/// the pending one), cancellable (a newer request or <see cref="Cancel"/> cancels the running one), reports progress,
/// and hands its result back on the UI thread through the application's invoke mechanism.</summary>
/// <remarks>Workers never call into the UI thread per item: progress is stored by the worker and read by one UI timer
/// every <see cref="ProgressInterval"/> while a job runs, and a job's end is one invoke. Parallel studies started from
/// the workbench use <see cref="WorkerThreads"/>, so one processor stays free for keys and drawing.</remarks>
public sealed class BackgroundWork : IDisposable
{
    /// <summary>How often the UI thread reads the running jobs' progress (at least twice a second, as the issue asks).</summary>
    public static TimeSpan ProgressInterval { get; } = TimeSpan.FromMilliseconds(250);

    /// <summary>Threads a parallel study started from the workbench may use: one fewer than the processors (at least one),
    /// so the UI thread keeps a processor to itself during a long run.</summary>
    public static int WorkerThreads => Math.Max(1, Environment.ProcessorCount - 1);

    private readonly IApplication _app;
    private readonly TimeSpan _debounce;
    private readonly Dictionary<string, Job> _jobs = new(StringComparer.Ordinal);
    private readonly object _gate = new();
    private bool _disposed;
    private object? _progressTimer;
    private int _posts;

    /// <summary>Creates the runner for an application.</summary>
    /// <param name="app">The application whose UI thread receives results.</param>
    /// <param name="debounce">How long to wait after the last request before starting (edits come in bursts).</param>
    public BackgroundWork(IApplication app, TimeSpan debounce)
    {
        _app = app ?? throw new ArgumentNullException(nameof(app));
        _debounce = debounce;
    }

    /// <summary>Raised on the UI thread whenever a job starts, reports progress, ends or is cancelled.</summary>
    public event EventHandler? StateChanged;

    /// <summary>The job currently running or waiting, with its progress (0..1, or null when it reports none).</summary>
    public (string Name, double? Progress)? Current
    {
        get
        {
            lock (_gate)
            {
                var job = _jobs.Values.Where(j => j.Running || j.Pending).OrderByDescending(j => j.Running).FirstOrDefault();
                return job is null ? null : (job.Name, job.Progress);
            }
        }
    }

    /// <summary>True while a job of this name is waiting for its debounce delay or running.</summary>
    /// <param name="name">The job's name.</param>
    public bool IsActive(string name)
    {
        lock (_gate)
        {
            return _jobs.TryGetValue(name, out var job) && (job.Running || job.Pending);
        }
    }

    /// <summary>True while a job of this name was stopped (<see cref="Cancel"/>) but its worker has not returned yet (a
    /// stress run aggregating the samples it finished).</summary>
    /// <param name="name">The job's name.</param>
    public bool IsStopping(string name)
    {
        lock (_gate)
        {
            return _jobs.TryGetValue(name, out var job) && job.Running && job.Token.IsCancellationRequested;
        }
    }

    /// <summary>How many actions the workers have queued for the UI thread so far (one per finished job; tests check that
    /// a long run does not queue one per item).</summary>
    public int Posts => Volatile.Read(ref _posts);

    /// <summary>The last failure message, if the last job of any name threw; cleared when a job completes.</summary>
    public string? LastFailure { get; private set; }

    /// <summary>Requests a computation. <paramref name="work"/> runs on a thread-pool thread and must honour its
    /// cancellation token; <paramref name="done"/> runs on the UI thread with the result unless a newer request or a
    /// cancellation came first.</summary>
    /// <param name="name">The job's name; a new request replaces a pending or running one of the same name.</param>
    /// <param name="work">The computation.</param>
    /// <param name="done">Receives the result on the UI thread.</param>
    /// <param name="immediately">True to start without the debounce delay.</param>
    /// <param name="stopped">Runs on the UI thread when <see cref="Cancel"/> stops this job before it delivered (not when a
    /// newer request of the same name replaces it), so the sheet can say its figures are not current; null for nothing.</param>
    /// <param name="keepWhenCancelled">True for work that, when cancelled, returns what it finished so far (a stress
    /// run): its result still reaches <paramref name="done"/> after <see cref="Cancel"/>, unless a newer request of the
    /// same name replaced it. False (default) drops the result of a cancelled job.</param>
    public void Request<T>(string name, Func<CancellationToken, IProgress<double>, T> work, Action<T> done, bool immediately = false,
        Action? stopped = null, bool keepWhenCancelled = false)
    {
        ArgumentNullException.ThrowIfNull(work);
        ArgumentNullException.ThrowIfNull(done);
        if (_disposed)
        {
            return;
        }
        Job job;
        lock (_gate)
        {
            if (_jobs.TryGetValue(name, out var old))
            {
                old.Cancel();
                if (old.Timeout is not null)
                {
                    _app.RemoveTimeout(old.Timeout);
                }
            }
            job = new Job(name) { Stopped = stopped };
            _jobs[name] = job;
        }
        job.Pending = true;
        void Start()
        {
            job.Timeout = null;
            job.Pending = false;
            if (job.Token.IsCancellationRequested)
            {
                return;
            }
            job.Running = true;
            StartProgressTimer();
            Raise();
            var progress = new Progress(job);
            // A thread of its own, not one of the pool's: a run may last minutes, and the UI's main loop and the terminal
            // reader sleep on timers that complete on pool threads (KeyTiming). A precaution; no stall was measured.
            job.Task = Task.Factory.StartNew(() => work(job.Token, progress), job.Token, TaskCreationOptions.LongRunning, TaskScheduler.Default)
                .ContinueWith(t =>
                {
                    Post(() =>
                    {
                        job.Running = false;
                        bool current;
                        lock (_gate)
                        {
                            current = _jobs.TryGetValue(name, out var latest) && ReferenceEquals(latest, job);
                        }
                        if (t.IsCompletedSuccessfully && (keepWhenCancelled || !job.Token.IsCancellationRequested) && current && !_disposed)
                        {
                            LastFailure = null;
                            job.Delivered = true;
                            done(t.Result);
                        }
                        else if (t.IsFaulted && current)
                        {
                            LastFailure = $"{name}: {t.Exception!.GetBaseException().Message}";
                        }
                        Raise();
                    });
                }, TaskScheduler.Default);
        }
        if (immediately || _debounce <= TimeSpan.Zero)
        {
            Start();
        }
        else
        {
            job.Timeout = _app.AddTimeout(_debounce, () =>
            {
                Start();
                return false;
            });
            Raise();
        }
    }

    /// <summary>Cancels every pending and running job; their results are dropped.</summary>
    public void Cancel()
    {
        var stopped = new List<Action>();
        lock (_gate)
        {
            foreach (var job in _jobs.Values)
            {
                if (!_disposed && !job.Delivered && !job.Token.IsCancellationRequested && (job.Pending || job.Running) && job.Stopped is { } tell)
                {
                    stopped.Add(tell);
                }
                job.Cancel();
                if (job.Timeout is not null)
                {
                    _app.RemoveTimeout(job.Timeout);
                    job.Timeout = null;
                }
                job.Pending = false;
            }
        }
        foreach (var tell in stopped)
        {
            tell();
        }
        Raise();
    }

    /// <summary>Completes when every job started so far has finished on its worker thread (tests await this, then let
    /// the application run its queued invokes).</summary>
    public Task WhenWorkersDone()
    {
        lock (_gate)
        {
            return Task.WhenAll(_jobs.Values.Select(j => j.Task).Where(t => t is not null).Select(t => t!.ContinueWith(_ => { }, TaskScheduler.Default)));
        }
    }

    /// <inheritdoc/>
    public void Dispose()
    {
        if (_disposed)
        {
            return;
        }
        // Disposed first: jobs cancelled by the disposal do not call back into views that are going away.
        _disposed = true;
        Cancel();
        if (_progressTimer is not null)
        {
            _app.RemoveTimeout(_progressTimer);
            _progressTimer = null;
        }
        lock (_gate)
        {
            foreach (var job in _jobs.Values)
            {
                job.Dispose();
            }
        }
    }

    private void Raise() => StateChanged?.Invoke(this, EventArgs.Empty);

    // One UI timer reads the progress the workers stored while any job runs, and stops itself when none does.
    private void StartProgressTimer()
    {
        if (_progressTimer is not null || _disposed)
        {
            return;
        }
        _progressTimer = _app.AddTimeout(ProgressInterval, () =>
        {
            bool running = false;
            lock (_gate)
            {
                foreach (var job in _jobs.Values.Where(j => j.Running))
                {
                    running = true;
                    job.TakeProgress();
                }
            }
            // Every tick while a job runs, so counts a sheet keeps itself (samples done) move too.
            if (running)
            {
                long start = System.Diagnostics.Stopwatch.GetTimestamp();
                Raise();
                ResponseTrace.Step("progress tick", start);
            }
            if (!running || _disposed)
            {
                _progressTimer = null;
                return false;
            }
            return true;
        });
    }

    // Results go back through the application's invoke mechanism: from a worker thread it queues the action for the UI
    // loop's next iteration.
    private void Post(Action action)
    {
        Interlocked.Increment(ref _posts);
        _app.Invoke(action);
    }

    private sealed class Job(string name) : IDisposable
    {
        private readonly CancellationTokenSource _cts = new();

        public string Name { get; } = name;

        public CancellationToken Token => _cts.Token;

        public object? Timeout { get; set; }

        public Task? Task { get; set; }

        public bool Pending { get; set; }

        public bool Running { get; set; }

        public bool Delivered { get; set; }

        public Action? Stopped { get; init; }

        private long _storedBits = BitConverter.DoubleToInt64Bits(double.NaN);
        private long _shownBits = BitConverter.DoubleToInt64Bits(double.NaN);

        // What the UI shows: the stored value as of the last timer tick (NaN bits: none reported yet).
        public double? Progress => BitConverter.Int64BitsToDouble(Interlocked.Read(ref _shownBits)) is var v && double.IsNaN(v) ? null : v;

        // Called from a worker: stores the value only; the UI timer picks it up.
        public void Store(double value) => Interlocked.Exchange(ref _storedBits, BitConverter.DoubleToInt64Bits(value));

        // On the UI thread: makes the stored value the shown one.
        public void TakeProgress() => Interlocked.Exchange(ref _shownBits, Interlocked.Read(ref _storedBits));

        public void Cancel()
        {
            try
            {
                _cts.Cancel();
            }
            catch (ObjectDisposedException)
            {
                // Already finished and disposed: nothing to cancel.
            }
        }

        public void Dispose() => _cts.Dispose();
    }

    // Stores the fraction for the UI timer (whole per cent, so the line does not flicker); never posts to the UI thread.
    private sealed class Progress(Job job) : IProgress<double>
    {
        public void Report(double value) => job.Store(Math.Floor(Math.Clamp(value, 0, 1) * 100) / 100.0);
    }
}

using Terminal.Gui.App;
using Terminal.Gui.Drivers;
using Terminal.Gui.Time;
using RotorDrive.Tui.Work;
using Xunit;

namespace RotorDrive.Tui.Tests.Work;

public sealed class BackgroundWorkTests : IDisposable
{
    private readonly VirtualTimeProvider _time = new();
    private readonly IApplication _app;
    private readonly BackgroundWork _work;

    public BackgroundWorkTests()
    {
        Environment.SetEnvironmentVariable("DisableRealDriverIO", "1");
        _app = Application.Create(_time);
        var testContext = SynchronizationContext.Current;
        _app.Init(DriverRegistry.Names.ANSI);
        SynchronizationContext.SetSynchronizationContext(testContext);
        _work = new BackgroundWork(_app, TimeSpan.FromMilliseconds(300));
    }

    public void Dispose()
    {
        _work.Dispose();
        _app.Dispose();
    }

    private async Task SettleAsync()
    {
        _time.Advance(TimeSpan.FromMilliseconds(400));
        _app.TimedEvents!.RunTimers();
        await _work.WhenWorkersDone().WaitAsync(TimeSpan.FromSeconds(10));
        _app.TimedEvents!.RunTimers();
    }

    [Fact]
    public async Task RequestsInABurst_RunOnlyTheLast_OffTheUiThread_AndDeliverOnIt()
    {
        int uiThread = Environment.CurrentManagedThreadId;
        int runs = 0;
        int? workerThread = null;
        int? deliveredOn = null;
        string? delivered = null;
        for (int i = 0; i < 5; i++)
        {
            string label = "edit " + i;
            _work.Request("load", (_, _) =>
            {
                Interlocked.Increment(ref runs);
                workerThread = Environment.CurrentManagedThreadId;
                return label;
            }, r =>
            {
                delivered = r;
                deliveredOn = Environment.CurrentManagedThreadId;
            });
        }
        Assert.Equal("load", _work.Current?.Name);
        _time.Advance(TimeSpan.FromMilliseconds(400));
        _app.TimedEvents!.RunTimers();
        await _work.WhenWorkersDone().WaitAsync(TimeSpan.FromSeconds(10));
        // The result waits for the application's loop: it is not delivered on the worker thread.
        Assert.Null(delivered);
        int loopThread = Environment.CurrentManagedThreadId;
        _app.TimedEvents!.RunTimers();
        Assert.Equal(1, runs);
        Assert.Equal("edit 4", delivered);
        Assert.Equal(loopThread, deliveredOn);
        Assert.NotEqual(uiThread, workerThread);
        Assert.Null(_work.Current);
    }

    [Fact]
    public async Task Cancel_StopsARunningJob_AndDropsItsResult()
    {
        using var started = new SemaphoreSlim(0);
        bool delivered = false;
        bool sawCancel = false;
        _work.Request("long", (token, _) =>
        {
            started.Release();
            while (!token.IsCancellationRequested)
            {
                Thread.Sleep(1);
            }
            sawCancel = true;
            return 1;
        }, _ => delivered = true, immediately: true);
        Assert.True(await started.WaitAsync(TimeSpan.FromSeconds(10)));
        _work.Cancel();
        await SettleAsync();
        Assert.True(sawCancel);
        Assert.False(delivered);
    }

    [Fact]
    public async Task Progress_IsReported_AndAFailureIsShownInWords()
    {
        var seen = new List<double>();
        _work.StateChanged += (_, _) =>
        {
            if (_work.Current is { Progress: { } p })
            {
                seen.Add(p);
            }
        };
        using var gate = new ManualResetEventSlim(false);
        _work.Request<int>("sweep", (_, progress) =>
        {
            progress.Report(0.5);
            gate.Wait(TimeSpan.FromSeconds(10));
            throw new InvalidOperationException("the solver gave up");
        }, _ => { }, immediately: true);
        for (int i = 0; i < 200 && seen.Count == 0; i++)
        {
            await Task.Delay(10);
            _time.Advance(BackgroundWork.ProgressInterval);
            _app.TimedEvents!.RunTimers();
        }
        gate.Set();
        await SettleAsync();
        Assert.Contains(0.5, seen);
        Assert.Equal("sweep: the solver gave up", _work.LastFailure);
    }

    [Fact]
    public async Task Cancel_TellsAStoppedJob_ButNotOneThatDeliveredOrWasReplaced()
    {
        var told = new List<string>();
        _work.Request("done", (_, _) => 1, _ => { }, immediately: true, stopped: () => told.Add("done"));
        await SettleAsync();
        _work.Request("replaced", (_, _) => 1, _ => { }, stopped: () => told.Add("replaced, old"));
        _work.Request("replaced", (_, _) => 2, _ => { }, stopped: () => told.Add("replaced, new"));
        _work.Cancel();
        Assert.Equal(["replaced, new"], told);
        await SettleAsync();
        Assert.Equal(["replaced, new"], told);
    }

    [Fact]
    public async Task Cancel_OfWorkThatKeepsWhatItFinished_HandsThatOver_AndIsActiveFollowsTheJob()
    {
        using var started = new ManualResetEventSlim();
        int? delivered = null;
        _work.Request("stress", (token, _) =>
        {
            // One piece of work is finished before the test cancels; more may follow until it does.
            int done = 1;
            started.Set();
            while (!token.IsCancellationRequested)
            {
                done++;
                Thread.Sleep(1);
            }
            return done;
        }, r => delivered = r, immediately: true, keepWhenCancelled: true);
        Assert.True(_work.IsActive("stress"));
        Assert.False(_work.IsActive("other"));
        Assert.True(started.Wait(TimeSpan.FromSeconds(10)));
        _work.Cancel();
        await SettleAsync();
        Assert.True(delivered >= 1, "the work's own result reached the UI thread");
        Assert.False(_work.IsActive("stress"));
    }

    [Fact]
    public async Task ALongRun_ReportsProgressThroughOneUiTimer_NotOneInvokePerItem()
    {
        // 50,000 items, each reporting its progress the way the stress study does (once per finished sample).
        const int items = 50_000;
        using var release = new ManualResetEventSlim(false);
        int ticksSeen = 0;
        _work.StateChanged += (_, _) =>
        {
            if (_work.Current is { Progress: { } })
            {
                ticksSeen++;
            }
        };
        _work.Request("stress", (token, progress) =>
        {
            for (int i = 1; i <= items; i++)
            {
                progress.Report((double)i / items);
                if (i == items / 2)
                {
                    release.Wait(TimeSpan.FromSeconds(10));
                }
            }
            return items;
        }, _ => { }, immediately: true);
        // Half way, the UI timer's next tick shows the stored progress.
        for (int i = 0; i < 500 && _work.Current is not { Progress: >= 0.5 }; i++)
        {
            await Task.Delay(5);
            _time.Advance(BackgroundWork.ProgressInterval);
            _app.TimedEvents!.RunTimers();
        }
        Assert.Equal(0.5, _work.Current!.Value.Progress);
        release.Set();
        await SettleAsync();
        Assert.True(ticksSeen >= 1);
        // The whole run queued one action for the UI thread (its result), not one per item or per per cent.
        Assert.Equal(1, _work.Posts);
        Assert.Null(_work.Current);
    }
}

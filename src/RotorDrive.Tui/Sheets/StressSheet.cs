using System.Collections.ObjectModel;
using System.Globalization;
using Terminal.Gui.Input;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;
using RotorDrive.Core.Craft;
using RotorDrive.Core.Numerics;
using RotorDrive.Core.Studies;
using RotorDrive.Core.Studies.Stress;
using RotorDrive.Tui.Session;
using RotorDrive.Tui.Shell;
using RotorDrive.Tui.Text;
using RotorDrive.Tui.Work;

namespace RotorDrive.Tui.Sheets;

/// <summary>The tolerance stress test from Core (<see cref="StressStudy"/>): the rig's part spreads as editable fields
/// (saved with the rig), samples and seed, and after a run (F5, off the UI thread, F8 stops it and keeps the samples
/// finished so far, marked partial) the failure rates with 95 % Wilson intervals, P5/P50/P95 of the reported figures, a
/// text histogram of one figure (F7 changes it), the strongest drivers and the worst sample.</summary>
public sealed class StressSheet : Sheet
{
    /// <summary>Largest number of samples the sheet accepts.</summary>
    public const int MaxSamples = 1_000_000;

    /// <summary>Drivers listed.</summary>
    public const int DriversShown = 8;

    private const string StressJob = "stress test";
    private const string DriversJob = "stress drivers";

    /// <summary>The reported figures in words with their units, by <see cref="StressStudy.FigureKeys"/> key.</summary>
    internal static IReadOnlyDictionary<string, (string Words, int Decimals)> FigureWords { get; } = new Dictionary<string, (string, int)>
    {
        ["hover_speed_rpm"] = ("hover speed, rpm", 0),
        ["hover_current_a"] = ("hover current, A", 1),
        ["hover_pack_voltage_v"] = ("pack voltage in hover, V", 2),
        ["liftoff_time_s"] = ("spin-up to lift-off, s", 2),
        ["yaw_residual_nm"] = ("yaw residual, N m", 3),
    };

    private readonly TextField _samples;
    private readonly TextField _seed;
    private readonly Label _runMessage;
    private readonly Label _state;
    private readonly ProgressBar _progress;
    private readonly Label _hint;
    private readonly FieldList _tolerances;
    private readonly ListView _results;
    private int _wrappedAt = -1;
    private ObservableCollection<string> _resultItems = [];
    private int _figure;
    private int _done;
    private int _requestedSamples;
    private bool _requested;
    private StressRun? _shown;
    private bool _reproducibleShown;

    /// <summary>Creates the sheet.</summary>
    public StressSheet(WorkbenchContext context)
        : base(context, "Stress")
    {
        var defaults = StressStudyOptions.Default;
        Add(new Label { X = 0, Y = 0, Text = "samples" });
        _samples = new TextField { X = 8, Y = 0, Width = 8, Text = defaults.Samples.ToString(CultureInfo.InvariantCulture) };
        Add(new Label { X = 17, Y = 0, Text = "seed" });
        _seed = new TextField { X = 22, Y = 0, Width = 8, Text = defaults.Seed.ToString(CultureInfo.InvariantCulture) };
        _runMessage = new Label { X = 31, Y = 0, Width = Dim.Fill(), Height = 1, Text = "F5 runs" };
        _state = new Label { X = 0, Y = 1, Width = Dim.Fill(21), Height = 1, Text = "" };
        _progress = new ProgressBar { X = Pos.AnchorEnd(20), Y = 1, Width = 20, Height = 1, Visible = false };
        _hint = new Label { X = 0, Y = 2, Width = Dim.Fill(), Height = 1, Text = "" };
        _tolerances = new FieldList(context, "Tolerances (first six drawn per station)", ToleranceFields.All, labelWidth: 16, fieldWidth: 17, unitWidth: 5)
        {
            X = 0,
            Y = 3,
            Width = Dim.Fill(),
            Height = Dim.Percent(40),
        };
        _tolerances.FocusChanged += (_, _) => ShowHint();
        _results = new ListView { X = 0, Y = Pos.Bottom(_tolerances), Width = Dim.Fill(), Height = Dim.Fill() };
        _results.SetSource(_resultItems);
        _results.FrameChanged += (_, _) =>
        {
            if (_shown is not null && _results.Viewport.Width > 0 && Math.Max(40, _results.Viewport.Width) != _wrappedAt)
            {
                ShowResults();
            }
        };
        // The results come before the tolerances in the tab order: one Tab from the seed reaches them.
        Add(_samples, _seed, _results, _runMessage, _state, _progress, _hint, _tolerances);
        _samples.TextChanged += (_, _) => ReadSettings();
        _seed.TextChanged += (_, _) => ReadSettings();
        context.Work.StateChanged += OnWorkChanged;
        ShowHint();
    }

    /// <inheritdoc/>
    public override string KeyHints => "F5 run  F7 histogram";

    /// <summary>The tolerance fields, in the rig file's key order.</summary>
    internal IReadOnlyList<FieldBinding> Fields => _tolerances.Fields;

    /// <summary>The samples field.</summary>
    internal TextField SamplesField => _samples;

    /// <summary>The seed field.</summary>
    internal TextField SeedField => _seed;

    /// <summary>The message beside the samples and seed fields.</summary>
    internal string RunMessage => _runMessage.Text;

    /// <summary>The run state line.</summary>
    internal string StateText => _state.Text;

    /// <summary>The results as listed.</summary>
    internal IReadOnlyList<string> ResultLines => _resultItems;

    /// <summary>The result on show, or null.</summary>
    internal StressResult? Result => _shown?.Result;

    /// <summary>Samples finished by the run in progress (read from any thread).</summary>
    internal int SamplesDone => Volatile.Read(ref _done);

    /// <summary>The histogram's figure key.</summary>
    internal string HistogramFigure => StressStudy.FigureKeys[_figure];

    /// <inheritdoc/>
    public override string? LongRunResults
        => Context.Work.IsActive(StressJob) ? $"the stress run in progress ({N(SamplesDone)} of {N(_requestedSamples)} samples done)"
            : _shown is { Result.Samples: >= LongRunSamples } shown ? $"the stress results ({N(shown.Result.Samples)} samples)"
            : null;

    /// <summary>Samples from which a finished stress run counts as a long run whose results quitting would lose.</summary>
    public const int LongRunSamples = 1000;

    /// <inheritdoc/>
    public override void Refresh()
    {
        _tolerances.Refresh();
        ShowHint();
        if (_shown is { } shown && shown.Result.WorstSample is not null && Reproducible(shown) != _reproducibleShown)
        {
            // Saved or edited since the run: the line on reproducing the worst sample changes.
            ShowResults();
        }
        ShowState();
        if (!Context.Work.IsActive(StressJob) && Context.Session.Rig is { } rig && MountNote.For("stress", rig) is { } note)
        {
            // The stress test samples a free craft's trim: a guided or bench rig gets the command line's refusal instead.
            _state.Text = note;
        }
    }

    /// <inheritdoc/>
    public override bool HandleKey(Key key)
    {
        if (key == Key.F5)
        {
            Run();
            return true;
        }
        if (key == Key.F7)
        {
            _figure = (_figure + 1) % StressStudy.FigureKeys.Count;
            ShowResults();
            // Bring the new histogram into view.
            int at = _resultItems.IndexOf(_resultItems.FirstOrDefault(l => l.StartsWith("Histogram of", StringComparison.Ordinal)) ?? "");
            if (at >= 0)
            {
                _results.SetSelection(at, false);
                _results.Viewport = _results.Viewport with { Y = Math.Max(0, Math.Min(at, _resultItems.Count - _results.Viewport.Height)) };
            }
            return true;
        }
        return false;
    }

    /// <summary>Starts a run with the fields' samples and seed on the rig and tolerances as they are now.</summary>
    internal void Run()
    {
        var session = Context.Session;
        if (ReadSettings() is not { } settings)
        {
            Context.Tell("! Samples and seed must be valid before a run.");
            return;
        }
        if (session.Rig is not { } rig)
        {
            Context.Tell("! The rig has problems (see Stations); the stress test needs a valid rig.");
            return;
        }
        if (MountNote.For("stress", rig) is { } note)
        {
            Context.Tell(note);
            return;
        }
        if (rig.Packs is null || rig.Stations.Any(s => s.Motor is null || s.Controller is null))
        {
            Context.Tell("! The stress test needs a motor and a controller on every station and a pack (Stations and Rig sheets).");
            return;
        }
        var tolerances = session.Tolerances;
        // One processor stays free for the UI thread (keys, drawing) during a long run; results do not depend on threads.
        // A stopped run's figures show at once; its drivers follow (ShowDriversWhenReady), so F8 never waits for them.
        var options = new StressStudyOptions(settings.Samples, settings.Seed, BackgroundWork.WorkerThreads, DriversWhenStopped: false);
        _requested = true;
        _requestedSamples = settings.Samples;
        Volatile.Write(ref _done, 0);
        Context.Work.Request(StressJob, (token, progress) =>
        {
            var model = new RigStressModel(rig, tolerances);
            var counter = new Counter(this, progress, settings.Samples);
            var result = StressStudy.Run(model, tolerances, options, counter, token);
            return new StressRun(rig, tolerances, result);
        }, run =>
        {
            _shown = run;
            ShowResults();
            ShowDriversWhenReady(run);
        }, immediately: true, keepWhenCancelled: true);
        ShowState();
    }

    // The drivers of a stopped run, computed after its other figures are on screen (a fraction of a second; a second F8
    // does not drop them) and shown if that run is still the one on show.
    private void ShowDriversWhenReady(StressRun run)
    {
        if (!run.Result.DriversPending)
        {
            return;
        }
        Context.Work.Request(DriversJob, (_, _) => run with { Result = StressStudy.CompleteDrivers(run.Result) }, completed =>
        {
            if (ReferenceEquals(_shown, run))
            {
                _shown = completed;
                ShowResults();
            }
        }, immediately: true, keepWhenCancelled: true);
    }

    /// <inheritdoc/>
    protected override void Dispose(bool disposing)
    {
        if (disposing)
        {
            Context.Work.StateChanged -= OnWorkChanged;
        }
        base.Dispose(disposing);
    }

    private (int Samples, int Seed)? ReadSettings()
    {
        var problems = new List<string>();
        string s = _samples.Text.Trim(), r = _seed.Text.Trim();
        if (!int.TryParse(s, NumberStyles.Integer, CultureInfo.InvariantCulture, out int samples) || samples < 1 || samples > MaxSamples)
        {
            problems.Add($"samples: a whole number 1..{MaxSamples.ToString("N0", CultureInfo.InvariantCulture)}");
        }
        if (!int.TryParse(r, NumberStyles.Integer, CultureInfo.InvariantCulture, out int seed))
        {
            problems.Add("seed: a whole number");
        }
        _runMessage.Text = problems.Count > 0 ? "! " + string.Join("; ", problems) : "F5 runs";
        _runMessage.SchemeName = problems.Count > 0 ? "Error" : null;
        return problems.Count > 0 ? null : (samples, seed);
    }

    private void OnWorkChanged(object? sender, EventArgs e) => ShowState();

    // The line under the settings: the focused tolerance field's whole message, else how spreads are written.
    private void ShowHint()
    {
        if (_tolerances.FocusedField is { CurrentMessage.Length: > 0 } focused)
        {
            _hint.Text = $"! {focused.Spec.Label}: {focused.CurrentMessage}";
            _hint.SchemeName = "Error";
        }
        else
        {
            _hint.Text = "write: " + ToleranceText.Forms;
            _hint.SchemeName = null;
        }
    }

    private void ShowState()
    {
        bool running = Context.Work.IsActive(StressJob);
        Redraw.Visible(_progress, running);
        Redraw.Width(_state, running ? Dim.Fill(21) : Dim.Fill());
        if (running)
        {
            int done = SamplesDone;
            if (Context.Work.IsStopping(StressJob))
            {
                _state.Text = $"Stopping: summing up the {done} samples finished...";
                return;
            }
            _progress.Fraction = _requestedSamples > 0 ? (float)done / _requestedSamples : 0;
            _state.Text = done == 0 ? "Preparing the load tables... F8 stops" : $"Running: {N(done)} of {N(_requestedSamples)}... F8 stops";
            return;
        }
        if (_shown is not { } shown)
        {
            _state.Text = _requested ? "Stopped before any sample finished; F5 runs again." : "";
            return;
        }
        var r = shown.Result;
        string partial = r.Partial ? $"PARTIAL: stopped after {N(r.Samples)} of {N(r.RequestedSamples)} samples" : $"{N(r.Samples)} samples";
        string stale = !ReferenceEquals(shown.Rig, Context.Session.Rig) ? "; ! the rig changed since: F5 runs again" : "";
        _state.Text = $"{partial}, seed {r.Seed}{stale}";
    }

    private void ShowResults()
    {
        // One new source per change: adding line by line to the bound collection re-measures the list per line. Lines
        // are wrapped to the list's width, so nothing is cut off at 80 columns.
        int width = Math.Max(40, _results.Viewport.Width > 0 ? _results.Viewport.Width : 60);
        _wrappedAt = width;
        _resultItems = new ObservableCollection<string>(ResultText(width).SelectMany(l => l.Length <= width - 1 ? [l] : Wrap.Lines(l, width - 1)));
        _results.SetSource(_resultItems);
        ShowState();
    }

    private List<string> ResultText(int width)
    {
        var lines = new List<string>();
        if (_shown is not { } shown)
        {
            return lines;
        }
        var r = shown.Result;
        lines.Add($"{(r.Partial ? "PARTIAL: " : "")}{N(r.Samples)} of {N(r.RequestedSamples)} samples, seed {r.Seed}, {shown.Tolerances.Varied.Count} varied");
        if (r.FailureRate is not { } overall)
        {
            lines.Add("No sample finished.");
            return lines;
        }
        lines.Add($"Failure rate {Pct(overall.EstimateFraction)} (95 % interval {Pct(overall.LowerFraction)} - {Pct(overall.UpperFraction)})");
        lines.Add($"  {"criterion",-13} {"fails",7} {"rate",8}  95 % interval (Wilson)");
        foreach (var c in r.Criteria)
        {
            lines.Add(CriterionLine(c.Key.Replace('_', ' '), c.Rate));
        }
        lines.Add(CriterionLine("overall", overall));
        lines.Add("");
        lines.Add($"  {"figure",-25} {"P5",9} {"P50",9} {"P95",9}");
        foreach (var f in r.Percentiles)
        {
            var (words, decimals) = FigureWords[f.Key];
            lines.Add(f.Summary is { } s
                ? $"  {words,-25} {F(s.P5Si, decimals),9} {F(s.P50Si, decimals),9} {F(s.P95Si, decimals),9}"
                : $"  {words,-25} {"none",9}");
        }
        lines.Add("");
        string key = StressStudy.FigureKeys[_figure];
        var (figureWords, figureDecimals) = FigureWords[key];
        var values = r.SampleResults.Select(s => StressStudy.FigureValue(s.Outcome, key)).Where(v => v is not null).Select(v => v!.Value).ToList();
        lines.Add($"Histogram of {figureWords}, {values.Count} samples (F7: next)");
        var bins = TextHistogram.Bins(values);
        lines.AddRange(bins.Count == 0 ? ["  no sample has this figure"] : TextHistogram.Render(bins, width - 1, figureDecimals));
        if (r.Percentiles.First(p => p.Key == key).Summary is { } summary)
        {
            lines.Add($"  P5 {F(summary.P5Si, figureDecimals)}  P50 {F(summary.P50Si, figureDecimals)}  P95 {F(summary.P95Si, figureDecimals)}");
        }
        lines.Add("");
        lines.Add("Top drivers (Spearman rho of a drawn value with a margin; + means larger is safer):");
        if (r.DriversPending)
        {
            lines.Add("  computing...");
        }
        foreach (var d in r.Drivers.Take(DriversShown))
        {
            lines.Add($"  {FieldWords.Input(d.Input),-30} {d.Margin.Replace('_', ' '),-13} {d.Rho.ToString("+0.000;-0.000;0.000", CultureInfo.InvariantCulture)}");
        }
        if (r.Drivers.Count == 0 && !r.DriversPending)
        {
            lines.Add("  none (nothing varied, or too few samples)");
        }
        if (r.WorstSample is { } worst && r.SampleResults.FirstOrDefault(s => s.Index == worst) is { } sample)
        {
            var failed = sample.Outcome.FailedCriteria.Select(k => k.Replace('_', ' ')).ToList();
            lines.Add("");
            lines.Add($"Worst sample: {worst}, smallest margin {F(sample.Outcome.MinimumMarginFraction, 3)}, {(failed.Count == 0 ? "fails nothing" : "! fails " + string.Join(", ", failed))}");
            var session = Context.Session;
            // The command reproduces the sample only from a file that holds the rig exactly as run.
            _reproducibleShown = Reproducible(shown);
            lines.Add(_reproducibleShown && session.RigPath is { } path
                ? $"  rotordrive stress {path} --seed {r.Seed} --sample {worst} shows it in full"
                : "  The rig as run is not the saved file: save the rig (F2) and run again (F5) for a command that shows this sample in full.");
        }
        lines.Add("");
        lines.Add("Estimates only: defer to the parts' ratings, local codes and licensed practice (see Help, cautions).");
        return lines;
    }

    private bool Reproducible(StressRun shown)
        => ReferenceEquals(shown.Rig, Context.Session.Rig) && !Context.Session.IsDirty && Context.Session.RigPath is not null;

    private static string CriterionLine(string key, ProportionInterval rate)
        => $"  {key,-13} {rate.Count,7} {Pct(rate.EstimateFraction),8}  {Pct(rate.LowerFraction)} - {Pct(rate.UpperFraction)}";

    private static string Pct(double fraction) => (fraction * 100).ToString("F2", CultureInfo.InvariantCulture) + " %";

    private static string N(long n) => n.ToString("N0", CultureInfo.InvariantCulture);

    private static string F(double v, int decimals) => v.ToString("F" + decimals.ToString(CultureInfo.InvariantCulture), CultureInfo.InvariantCulture);

    private sealed record StressRun(Rig Rig, StressTolerances Tolerances, StressResult Result);

    // Counts finished samples for the sheet and hands the fraction to the background runner's progress.
    private sealed class Counter(StressSheet sheet, IProgress<double> progress, int total) : IProgress<int>
    {
        public void Report(int value)
        {
            int seen = Volatile.Read(ref sheet._done);
            while (value > seen)
            {
                int was = Interlocked.CompareExchange(ref sheet._done, value, seen);
                if (was == seen)
                {
                    break;
                }
                seen = was;
            }
            progress.Report((double)value / total);
        }
    }
}

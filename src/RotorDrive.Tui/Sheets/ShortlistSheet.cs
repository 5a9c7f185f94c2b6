using System.Collections.ObjectModel;
using System.Drawing;
using System.Globalization;
using Terminal.Gui.Input;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;
using RotorDrive.Core;
using RotorDrive.Core.Craft;
using RotorDrive.Core.Simulation;
using RotorDrive.Core.Studies.Ranking;
using RotorDrive.Files.Rigs;
using RotorDrive.Tui.Shell;
using RotorDrive.Tui.Text;
using RotorDrive.Tui.Work;

namespace RotorDrive.Tui.Sheets;

/// <summary>The catalog ranking from Core (<see cref="RankStudy"/>): every motor x controller x pack (x pack count) for
/// the rig, the best combinations with their figures and the Pareto set marked "P", where the rig's own drivetrain
/// ranks, rejections counted by reason, and for one motor why it was turned down. Enter applies the selected row to the
/// rig as an ordinary (unsaved) edit.</summary>
/// <remarks>The ranking runs off the UI thread (progress bar, F8 stops it). It depends on the rig but not on the parts
/// assigned to it, so applying a pick re-places the rig in the ranking without running it again.</remarks>
public sealed class ShortlistSheet : Sheet
{
    /// <summary>How many of the best combinations the table lists.</summary>
    public const int TopCount = 15;

    /// <summary>Largest pack count the sheet accepts.</summary>
    public const int MaxPacks = 16;

    /// <summary>The table's columns.</summary>
    public static IReadOnlyList<string> Columns { get; } = ["rank", "P", "hover min", "ends by", "pack-only min", "mass kg", "margin %", "motor", "controller", "packs", "lift-off s", "score"];

    private const string RankJob = "ranking";
    private const string WhyNotJob = "why not";

    private readonly Label _objectiveLabel;
    private readonly TextField _packs;
    private readonly Label _packsMessage;
    private readonly Label _state;
    private readonly ProgressBar _progress;
    private readonly Label _assigned;
    private readonly TableView _table;
    private readonly TableView _pinned;
    private readonly Label _hint;
    private List<IReadOnlyList<string>> _rows = [];
    private IReadOnlyList<string>? _rigRow;
    private int _firstScrolled = 1;
    private readonly Dictionary<RankCandidate, RankSimulation> _simulated = [];
    private readonly TextField _whyNot;
    private readonly Label _whyNotMessage;
    private readonly ListView _details;
    private ObservableCollection<string> _detailItems = [];
    private List<string> _detailLines = [];
    private int _wrappedAt = -1;
    private readonly Dictionary<RankCandidate, RankEvaluation> _evaluated = [];
    private RankObjective _objective = RankObjective.Runtime;
    private RankKey? _requested;
    private Ranked? _shown;
    private IReadOnlyList<RankEvaluation>? _explained;
    private bool _initialised;
    private bool _quiet;

    /// <summary>Creates the sheet.</summary>
    public ShortlistSheet(WorkbenchContext context)
        : base(context, "Shortlist")
    {
        _objectiveLabel = new Label { X = 0, Y = 0, Width = 26, Height = 1, Text = "" };
        Add(new Label { X = 27, Y = 0, Text = "packs up to" });
        _packs = new TextField { X = 39, Y = 0, Width = 4, Text = "" };
        _packsMessage = new Label { X = 44, Y = 0, Width = Dim.Fill(), Height = 1, Text = "" };
        _state = new Label { X = 0, Y = 1, Width = Dim.Fill(21), Height = 1, Text = "" };
        _progress = new ProgressBar { X = Pos.AnchorEnd(20), Y = 1, Width = 20, Height = 1, Visible = false };
        _assigned = new Label { X = 0, Y = 2, Width = Dim.Fill(), Height = 1, Text = "" };
        // The header stays on screen while the rows scroll, the rank column stays while the other columns scroll sideways
        // (Left/Right move the first scrolled column), and the rig's own drivetrain has a pinned row under the table.
        _table = new SidewaysTable(ScrollColumns) { X = 0, Y = 3, Width = Dim.Fill(), Height = Dim.Percent(40), FullRowSelect = true };
        _table.Style.ShowHorizontalBottomLine = false;
        _table.Style.AlwaysShowHeaders = true;
        _table.Accepting += (_, e) =>
        {
            ApplySelected();
            e.Handled = true;
        };
        _pinned = new TableView { X = 0, Y = Pos.Bottom(_table), Width = Dim.Fill(), Height = 1, CanFocus = false, FullRowSelect = true };
        _pinned.Style.ShowHeaders = false;
        _pinned.Style.ShowHorizontalHeaderOverline = false;
        _pinned.Style.ShowHorizontalHeaderUnderline = false;
        _pinned.Style.ShowHorizontalBottomLine = false;
        _hint = new Label { X = 0, Y = Pos.Bottom(_pinned), Width = Dim.Fill(), Height = 1, Text = "Enter: use the selected row (every station, the pack)" };
        Add(new Label { X = 0, Y = Pos.Bottom(_hint), Text = "why not motor" });
        _whyNot = new TextField { X = 14, Y = Pos.Bottom(_hint), Width = 18, Text = "" };
        _whyNotMessage = new Label { X = 33, Y = Pos.Bottom(_hint), Width = Dim.Fill(), Height = 1, Text = "F4 picks" };
        _details = new ListView { X = 0, Y = Pos.Bottom(_whyNot), Width = Dim.Fill(), Height = Dim.Fill() };
        _details.SetSource(_detailItems);
        _details.FrameChanged += (_, _) =>
        {
            if (_details.Viewport.Width > 0 && _details.Viewport.Width - 1 != _wrappedAt && _detailLines.Count > 0)
            {
                WrapDetails();
            }
        };
        Add(_objectiveLabel, _packs, _packsMessage, _state, _progress, _assigned, _table, _pinned, _hint, _whyNot, _whyNotMessage, _details);

        _packs.TextChanged += (_, _) =>
        {
            if (!_quiet)
            {
                Refresh();
            }
        };
        _whyNot.TextChanged += (_, _) =>
        {
            if (!_quiet)
            {
                RequestWhyNot();
            }
        };
        context.Work.StateChanged += OnWorkChanged;
        ShowObjective();
    }

    /// <inheritdoc/>
    public override string KeyHints => "F7 rank by  Enter apply  F4 pick";

    /// <summary>The ranking on show, or null.</summary>
    internal RankResult? Result => _shown?.Result;

    /// <summary>The study behind <see cref="Result"/>, or null.</summary>
    internal RankStudy? Study => _shown?.Study;

    /// <summary>What is ranked by.</summary>
    internal RankObjective Objective => _objective;

    /// <summary>The table of the best combinations.</summary>
    internal TableView Table => _table;

    /// <summary>The pinned row of the rig's own drivetrain, in the table's columns, or null.</summary>
    internal IReadOnlyList<string>? RigRow => _rigRow;

    /// <summary>The table's columns as shown: the rank column, then the columns from the first scrolled one.</summary>
    internal IReadOnlyList<string> ShownColumns => ((TextTableSource?)_table.Table)?.ColumnNames ?? [];

    /// <summary>The "packs up to" field.</summary>
    internal TextField PacksField => _packs;

    /// <summary>The "why not" motor field.</summary>
    internal TextField WhyNotField => _whyNot;

    /// <summary>The line about the rig's own drivetrain.</summary>
    internal string AssignedText => _assigned.Text;

    /// <summary>The run state line.</summary>
    internal string StateText => _state.Text;

    /// <summary>The rejection counts and the "why not" lines (before wrapping).</summary>
    internal IReadOnlyList<string> DetailLines => _detailLines;

    /// <summary>The "why not" evaluations on show, or null.</summary>
    internal IReadOnlyList<RankEvaluation>? Explained => _explained;

    /// <inheritdoc/>
    public override void Refresh()
    {
        var session = Context.Session;
        if (session.Rig is not { } rig || session.Catalog is not { } catalog || session.Document is not { } document)
        {
            _state.Text = "! The rig has problems (see Stations); the shortlist needs a valid rig.";
            _assigned.Text = "";
            return;
        }
        if (MountNote.For("rank", rig) is { } note)
        {
            // The ranking sizes a free craft's trim: a guided or bench rig gets the command line's refusal instead.
            _state.Text = note;
            _assigned.Text = "";
            return;
        }
        if (!_initialised)
        {
            _initialised = true;
            _quiet = true;
            _packs.Text = (rig.Packs?.Count ?? 1).ToString(CultureInfo.InvariantCulture);
            _whyNot.Text = rig.Stations[0].Motor?.Id ?? "";
            _quiet = false;
        }
        if (catalog.Motors.Count == 0 || catalog.Controllers.Count == 0 || catalog.Packs.Count == 0)
        {
            _state.Text = "! The catalogs need at least one motor, one controller and one pack to rank.";
            return;
        }
        if (ReadPacks() is { } packs)
        {
            var key = new RankKey(Fingerprint(document), catalog, _objective, packs);
            if (key != _requested)
            {
                Run(key, rig, catalog, immediately: Arriving);
            }
        }
        ShowAssigned();
        ShowState();
    }

    /// <inheritdoc/>
    public override bool HandleKey(Key key)
    {
        if (key == Key.F7)
        {
            var all = Enum.GetValues<RankObjective>();
            _objective = all[(Array.IndexOf(all, _objective) + 1) % all.Length];
            ShowObjective();
            Rerun();
            return true;
        }
        if (key == Key.F5)
        {
            Rerun();
            return true;
        }
        if (key == Key.F4 && _whyNot.HasFocus)
        {
            PickMotor();
            return true;
        }
        return false;
    }

    /// <summary>Applies the selected row to the rig (after asking): every station's motor and controller, the pack and
    /// the pack count, as one edit; nothing is written to disk.</summary>
    internal void ApplySelected()
    {
        if (_shown is not { } shown || _table.Value is not { } selection || selection.SelectedCell.Y < 0 || selection.SelectedCell.Y >= shown.Result.Top.Count)
        {
            Context.Tell("Nothing to apply: rank first, then pick a row.");
            return;
        }
        var session = Context.Session;
        if (session.Document is not { Stations: { Count: > 0 } stations })
        {
            return;
        }
        var entry = shown.Result.Top[selection.SelectedCell.Y];
        var e = entry.Evaluation;
        int? answer = Context.Prompts.Ask("Apply shortlist pick",
            $"Put motor {e.MotorId} and controller {e.ControllerId} on all {stations.Count} stations, and {e.Candidate.PackCount} x {e.PackId} on the bus? "
            + "The rig changes in the workbench only; F2 saves it.",
            ["Cancel", "Apply"]);
        if (answer != 1)
        {
            Context.Tell("Not applied.");
            return;
        }
        var paths = new List<string> { "$.pack.id", "$.pack.count" };
        for (int i = 0; i < stations.Count; i++)
        {
            paths.Add($"$.stations[{i}].motor");
            paths.Add($"$.stations[{i}].controller");
        }
        session.EditFields(paths, d =>
        {
            foreach (var s in d.Stations!)
            {
                s.Motor = e.MotorId;
                s.Controller = e.ControllerId;
            }
            d.Pack ??= new RigPackSection();
            d.Pack.Id = e.PackId;
            d.Pack.Count = e.Candidate.PackCount;
        });
        Context.Tell($"Applied rank {entry.Rank}: {e.Label} (unsaved: F2 saves)");
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

    // The rig file without the parts a pick changes (and without tolerances, which the ranking ignores): two rigs with
    // the same fingerprint rank the same.
    private static string Fingerprint(RigDocument document)
    {
        var copy = document.Clone();
        foreach (var s in copy.Stations ?? [])
        {
            s.Motor = null;
            s.Controller = null;
        }
        copy.Pack = null;
        copy.Tolerances = null;
        return RigDocumentWriter.Write(copy);
    }

    private int? ReadPacks()
    {
        string t = _packs.Text.Trim();
        if (int.TryParse(t, NumberStyles.Integer, CultureInfo.InvariantCulture, out int n) && n >= 1 && n <= MaxPacks)
        {
            _packsMessage.Text = "";
            _packsMessage.SchemeName = null;
            return n;
        }
        _packsMessage.Text = $"! '{t}': give a whole number 1..{MaxPacks}";
        _packsMessage.SchemeName = "Error";
        return null;
    }

    private void Rerun()
    {
        var session = Context.Session;
        if (session.Rig is { } rig && MountNote.For("rank", rig) is null && session.Catalog is { } catalog && session.Document is { } document && ReadPacks() is { } packs)
        {
            Run(new RankKey(Fingerprint(document), catalog, _objective, packs), rig, catalog, immediately: true);
        }
        else
        {
            Refresh();
        }
    }

    private void Run(RankKey key, Rig rig, PartsCatalog catalog, bool immediately)
    {
        _requested = key;
        // One processor stays free for the UI thread during the ranking; the ranking does not depend on the threads.
        var options = new RankOptions(Objective: key.Objective, Top: TopCount, MaxPackCount: key.MaxPacks, MaxDegreeOfParallelism: BackgroundWork.WorkerThreads);
        Context.Work.Request(RankJob, (token, progress) =>
        {
            var study = RankStudy.Create(rig, catalog, options);
            var result = study.Run(p => progress.Report(p.Fraction), token);
            // The rig's own drivetrain gets the same endurance run as the shortlist, for its pinned row.
            var own = study.AssignedCandidate is { } c && result.RankOf(c) is not null && result.Top.All(t => t.Evaluation.Candidate != c)
                ? (c, study.Simulate(c))
                : ((RankCandidate, RankSimulation)?)null;
            return new Ranked(key, study, result, own);
        }, ranked =>
        {
            _shown = ranked;
            _evaluated.Clear();
            _simulated.Clear();
            if (ranked.Own is { } own)
            {
                _simulated[own.Candidate] = own.Simulation;
            }
            _explained = null;
            ShowTable();
            ShowAssigned();
            ShowDetails();
            RequestWhyNot();
        }, immediately);
        ShowState();
    }

    private void OnWorkChanged(object? sender, EventArgs e) => ShowState();

    /// <inheritdoc/>
    public override string? LongRunResults => Context.Work.IsActive(RankJob) ? "the ranking in progress" : null;

    private void ShowObjective() => _objectiveLabel.Text = $"rank by {_objective.ToString().ToLowerInvariant()} (F7)";

    private void ShowState()
    {
        bool running = Context.Work.IsActive(RankJob);
        Redraw.Visible(_progress, running);
        Redraw.Width(_state, running ? Dim.Fill(21) : Dim.Fill());
        if (running)
        {
            double fraction = Context.Work.Current is { Name: RankJob, Progress: { } f } ? f : 0;
            _progress.Fraction = (float)fraction;
            // The sweep reports its fraction; the spin-up and endurance runs of the shortlist come after it.
            _state.Text = fraction >= 1 ? "Simulating the shortlist... F8 stops" : $"Ranking {(int)(fraction * 100)} %... F8 stops";
            return;
        }
        if (_shown is not { } shown)
        {
            _state.Text = _requested is null ? "" : "Stopped before the ranking finished; F5 ranks again.";
            return;
        }
        var r = shown.Result;
        string stale = shown.Key != _requested ? " (earlier settings; stopped: F5 ranks again)" : "";
        _state.Text = $"{N(r.TotalCombinations)} tried, {N(r.AcceptedCount)} accepted, {N(r.ParetoRanks.Count)} in the Pareto set (P){stale}";
    }

    private void ShowTable()
    {
        _rows = _shown is { } shown
            ? shown.Result.Top.Select(t => Row(t.Rank.ToString(CultureInfo.InvariantCulture), t.InParetoSet, t.Evaluation, t.Evaluation.Simulation, t.LiftoffTimeS, t.Score)).ToList()
            : [];
        ShowColumns();
        if (_rows.Count > 0)
        {
            _table.Value = new TableSelection(new Point(0, 0));
        }
    }

    // One row of the table: the hover time is the endurance run's (pack, windings and plate together), with what ends
    // it; the quick check's pack-only figure is labelled so.
    private static IReadOnlyList<string> Row(string rank, bool pareto, RankEvaluation e, RankSimulation? sim, double? liftoffS, double? score)
    {
        var f = e.Figures;
        return
        [
            rank, pareto ? "P" : "",
            sim is { } run ? F(run.EnduranceRuntimeS / 60, 1) : "-", sim is { } ending ? ending.EnduranceLimit.Words() : "-",
            f is { } pf ? F(pf.RuntimeS / 60, 1) : "-", f is { } mf ? F(mf.TotalMassKg, 1) : "-",
            f?.CurrentMarginFraction is { } m ? F(m * 100, 0) : "-", e.MotorId, e.ControllerId, $"{e.Candidate.PackCount} x {e.PackId}",
            sim is null ? "-" : liftoffS is { } s ? F(s, 2) : "none", score is { } v ? F(v, 3) : "-",
        ];
    }

    // Shows the rank column and the columns from the first scrolled one, in the table and the pinned rig row, with the
    // same widths in both so the pinned row lines up under the header.
    private void ShowColumns()
    {
        _firstScrolled = Math.Clamp(_firstScrolled, 1, Columns.Count - 1);
        int[] shown = [0, .. Enumerable.Range(_firstScrolled, Columns.Count - _firstScrolled)];
        IReadOnlyList<string> Pick(IReadOnlyList<string> row) => shown.Select(i => row[i]).ToList();
        var all = _rigRow is { } rig ? _rows.Append(rig) : _rows;
        int selected = _table.Value?.SelectedCell.Y ?? 0;
        _table.Table = new TextTableSource(shown.Select(i => Columns[i]).ToList(), _rows.Select(Pick).ToList());
        _pinned.Table = new TextTableSource(shown.Select(i => Columns[i]).ToList(), _rigRow is { } r ? [Pick(r)] : []);
        foreach (var view in new[] { _table, _pinned })
        {
            view.Style.ColumnStyles.Clear();
            for (int k = 0; k < shown.Length; k++)
            {
                int width = all.Select(row => row[shown[k]].Length).Append(Columns[shown[k]].Length).Max();
                view.Style.ColumnStyles[k] = new ColumnStyle { MinWidth = width, MaxWidth = width };
            }
            view.Style.ExpandLastColumn = false;
        }
        if (_rows.Count > 0)
        {
            _table.Value = new TableSelection(new Point(0, Math.Clamp(selected, 0, _rows.Count - 1)));
        }
        _table.Update();
        _pinned.Update();
    }

    private void ScrollColumns(int by)
    {
        _firstScrolled += by;
        ShowColumns();
    }


    private void ShowAssigned()
    {
        if (_shown is not { } shown || Context.Session.Rig is not { } rig)
        {
            _assigned.Text = "";
            _rigRow = null;
            ShowColumns();
            return;
        }
        if (shown.Study.CandidateOf(rig) is not { } candidate)
        {
            _assigned.Text = "Rig: no single drivetrain to place (the same motor and controller everywhere, a pack within the pack count).";
            _rigRow = null;
            ShowColumns();
            return;
        }
        if (!_evaluated.TryGetValue(candidate, out var evaluation))
        {
            evaluation = shown.Study.Evaluate(candidate);
            _evaluated[candidate] = evaluation;
        }
        if (shown.Result.RankOf(candidate) is { } rank)
        {
            bool pareto = shown.Result.ParetoRanks.Contains(rank);
            _assigned.Text = Fit($"Rig: rank {N(rank)}{(pareto ? " P" : "")} of {N(shown.Result.AcceptedCount)}", evaluation.Label);
            var listed = shown.Result.Top.FirstOrDefault(t => t.Evaluation.Candidate == candidate);
            var sim = listed?.Evaluation.Simulation ?? SimulationOf(shown.Study, candidate);
            _rigRow = Row($"rig {rank}", pareto, evaluation, sim, listed?.LiftoffTimeS ?? sim.LiftoffTimeS, listed?.Score);
        }
        else
        {
            string why = evaluation.Rejections.Count > 0 ? evaluation.Rejections[0].Kind.Describe() : "not ranked";
            _assigned.Text = Fit($"Rig: ! rejected: {why}" + (evaluation.Rejections.Count > 1 ? $" (+{evaluation.Rejections.Count - 1} more)" : ""), evaluation.Label);
            _rigRow = Row("rig -", false, evaluation, null, null, null);
        }
        ShowColumns();
    }

    // The rig line with its drivetrain when both fit the sheet's width; otherwise without it (the pinned row names the
    // parts), so the line is never cut off.
    private string Fit(string where, string label)
    {
        string full = $"{where}: {label}";
        int width = Viewport.Width > 0 ? Viewport.Width : int.MaxValue;
        return full.Length <= width ? full : where + " (its row is pinned below the table)";
    }

    // The endurance and spin-up runs of the rig's own drivetrain when it is not on the shortlist: run once per ranking
    // and drivetrain (the ranking's worker runs it for the rig as opened).
    private RankSimulation SimulationOf(RankStudy study, RankCandidate candidate)
    {
        if (!_simulated.TryGetValue(candidate, out var sim))
        {
            sim = study.Simulate(candidate);
            _simulated[candidate] = sim;
        }
        return sim;
    }

    private void RequestWhyNot()
    {
        if (_shown is not { } shown)
        {
            return;
        }
        string id = _whyNot.Text.Trim();
        _explained = null;
        if (id.Length == 0)
        {
            _whyNotMessage.Text = "type or pick (F4) a motor id";
            ShowDetails();
            return;
        }
        var motors = shown.Study.Catalog.Motors;
        int index = -1;
        for (int i = 0; i < motors.Count; i++)
        {
            if (string.Equals(motors[i].Id, id, StringComparison.OrdinalIgnoreCase))
            {
                index = i;
                break;
            }
        }
        if (index < 0)
        {
            _whyNotMessage.Text = $"! no motor '{id}' in the catalog (F4 picks)";
            ShowDetails();
            return;
        }
        _whyNotMessage.Text = "F4 picks";
        var study = shown.Study;
        Context.Work.Request(WhyNotJob, (_, _) => study.ExplainMotor(index), list =>
        {
            if (ReferenceEquals(_shown?.Study, study))
            {
                _explained = list;
                ShowDetails();
            }
        });
    }

    private void ShowDetails()
    {
        var lines = new List<string>();
        if (_shown is { } shown)
        {
            lines.Add("Rejected combinations by reason (one may have several):");
            foreach (var c in shown.Result.RejectionCounts.Where(c => c.Count > 0))
            {
                lines.Add($"  {N(c.Count),8}  {c.Kind.Describe()}");
            }
            if (_explained is { Count: > 0 } explained)
            {
                var accepted = explained.Where(e => e.Accepted).Select(e => shown.Result.RankOf(e.Candidate)).Where(r => r is not null).Select(r => r!.Value).ToList();
                _whyNotMessage.Text = $"{accepted.Count}/{explained.Count} accepted" + (accepted.Count > 0 ? $", best {accepted.Min()}" : "");
                lines.Add("");
                lines.Add($"Why not {explained[0].MotorId}: {explained.Count} combinations with it, {accepted.Count} accepted"
                    + (accepted.Count > 0 ? $" (best rank {accepted.Min()})" : ""));
                foreach (var kind in RankRejectionKinds.All)
                {
                    int n = explained.Count(e => e.Rejections.Any(r => r.Kind == kind));
                    if (n > 0)
                    {
                        lines.Add($"  {N(n),8}  {kind.Describe()}");
                    }
                }
                foreach (var e in explained)
                {
                    string verdict = e.Accepted
                        ? (shown.Result.RankOf(e.Candidate) is { } rank ? $"accepted, rank {N(rank)}" : "accepted")
                        : "! " + string.Join("; ", e.Rejections.Select(r => r.Message));
                    lines.Add($"  {e.ControllerId} + {e.Candidate.PackCount} x {e.PackId}: {verdict}");
                }
            }
        }
        if (_shown is { } listed)
        {
            lines.Add("");
            foreach (string caution in listed.Result.Top.SelectMany(t => t.Evaluation.Cautions).Select(c => c.Message).Distinct())
            {
                lines.Add("Caution: " + caution);
            }
            lines.Add("Estimates only: follow the parts' ratings; lithium packs, strong magnets and spinning rotors are dangerous (Help).");
        }
        _detailLines = lines;
        WrapDetails();
    }

    // Long reasons are wrapped to the list's width so every word can be read without scrolling sideways.
    private void WrapDetails()
    {
        int width = Math.Max(30, (_details.Viewport.Width > 0 ? _details.Viewport.Width : 60) - 1);
        _wrappedAt = width;
        // One new source per change: adding hundreds of "why not" lines one by one to the bound collection makes the list
        // re-measure itself on every line (quadratic, seconds on the UI thread).
        var items = new List<string>();
        foreach (string line in _detailLines)
        {
            items.AddRange(line.Length == 0 ? [""] : Wrap.Lines(line, width));
        }
        _detailItems = new ObservableCollection<string>(items);
        _details.SetSource(_detailItems);
    }

    private void PickMotor()
    {
        if (Context.Session.Catalog is not { } catalog)
        {
            return;
        }
        var ids = catalog.Motors.Select(m => m.Id).ToList();
        string? chosen = Context.Prompts.Choose("Why not: pick a motor", ids, _whyNot.Text, ids.Select(id => PartSummary.Of(catalog, id)).ToList());
        if (chosen is not null)
        {
            _whyNot.Text = chosen;
        }
    }

    private static string N(long n) => n.ToString("N0", CultureInfo.InvariantCulture);

    private static string F(double v, int decimals) => v.ToString("F" + decimals.ToString(CultureInfo.InvariantCulture), CultureInfo.InvariantCulture);

    // A table whose Left and Right keys go to the sheet (which moves the scrolled columns under the fixed rank column)
    // instead of moving a cell cursor in a full-row selection.
    private sealed class SidewaysTable(Action<int> scroll) : TableView
    {
        protected override bool OnKeyDown(Key key)
        {
            if (key == Key.CursorRight || key == Key.CursorLeft)
            {
                scroll(key == Key.CursorRight ? 1 : -1);
                return true;
            }
            return base.OnKeyDown(key);
        }
    }

    private sealed record RankKey(string Document, PartsCatalog Catalog, RankObjective Objective, int MaxPacks);

    private sealed record Ranked(RankKey Key, RankStudy Study, RankResult Result, (RankCandidate Candidate, RankSimulation Simulation)? Own);
}

using System.Collections.ObjectModel;
using Terminal.Gui.Drawing;
using Terminal.Gui.Input;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;
using RotorDrive.Tui.Sheets;
using RotorDrive.Tui.Text;

namespace RotorDrive.Tui.Shell;

/// <summary>The workbench's one window: the list of sheets on the left, the chosen sheet on the right, and below them
/// a status line (rig name, unsaved mark, work in progress) and a line of key hints.</summary>
public sealed class MainWindow : Window
{
    private const int ListWidth = 18;
    private readonly WorkbenchContext _context;
    private readonly List<Sheet> _sheets;
    private readonly List<string> _sheetKeys;
    private readonly ListView _list;
    private readonly FrameView _frame;
    private readonly Label _status;
    private readonly ProgressBar _progress;
    private readonly Label _keys;
    private string _notice = "";
    private int _current = -1;
    private bool _quitAnswered;
    private readonly FrameView _listFrame;
    private readonly Label _tooSmall;
    private string? _lastJob;

    /// <summary>Creates the window with its sheets (the window owns and disposes them).</summary>
    public MainWindow(WorkbenchContext context, IReadOnlyList<Sheet> sheets)
    {
        _context = context;
        _sheets = sheets.ToList();
        int position = 0;
        _sheetKeys = _sheets.Select(s => KeyMap.SheetKey(s is HelpSheet ? -1 : position++, s is HelpSheet)).ToList();
        Title = "RotorDrive";
        BorderStyle = LineStyle.None;
        var listFrame = new FrameView { Title = "Sheets", X = 0, Y = 0, Width = ListWidth, Height = Dim.Fill(2) };
        _list = new ListView { X = 0, Y = 0, Width = Dim.Fill(), Height = Dim.Fill() };
        _list.SetSource(new ObservableCollection<string>(_sheets.Select((s, i) => $"{_sheetKeys[i],1} {s.SheetName}")));
        _list.ValueChanged += (_, _) =>
        {
            if (_list.Value is { } i && i >= 0 && i != _current)
            {
                ShowSheet(i, focusSheet: false);
            }
        };
        _list.Accepting += (_, e) =>
        {
            _sheets[_current].SetFocus();
            e.Handled = true;
        };
        listFrame.Add(_list);
        _frame = new FrameView { X = ListWidth, Y = 0, Width = Dim.Fill(), Height = Dim.Fill(2) };
        _status = new Label { X = 0, Y = Pos.AnchorEnd(2), Width = Dim.Fill(22), Height = 1, Text = "" };
        _progress = new ProgressBar { X = Pos.AnchorEnd(21), Y = Pos.AnchorEnd(2), Width = 20, Height = 1, Visible = false };
        _keys = new Label { X = 0, Y = Pos.AnchorEnd(1), Width = Dim.Fill(), Height = 1, Text = "" };
        Add(listFrame, _frame, _status, _progress, _keys);
        _listFrame = listFrame;
        _tooSmall = new Label { X = 0, Y = 0, Width = Dim.Fill(), Height = Dim.Fill(), Visible = false, Text = "" };
        Add(_tooSmall);
        FrameChanged += (_, _) => CheckSize();

        _context.Session.Changed += (_, _) =>
        {
            // A notice describes the state it was given in ("Not applied.", "Stopped."); an edit ends that state.
            _notice = "";
            RefreshAll();
        };
        _context.Work.StateChanged += (_, _) =>
        {
            string? running = _context.Work.Current?.Name;
            if (running is not null && running != _lastJob)
            {
                // A new run ends what "Stopped." described.
                _notice = "";
            }
            _lastJob = running;
            UpdateStatus();
        };
        _context.Notice += (_, message) =>
        {
            _notice = message;
            UpdateStatus();
        };
        foreach (var help in _sheets.OfType<HelpSheet>())
        {
            help.ListSheets(_sheets.Select((s, i) => (_sheetKeys[i], s.SheetName)).ToList());
        }
        _context.App.Keyboard.KeyDown += OnApplicationKeyDown;
        // Paths, file names and column names hold underscores: show them as written, never as hotkey marks.
        LiteralText.Apply(this);
        foreach (var sheet in _sheets)
        {
            LiteralText.Apply(sheet);
        }
        ShowSheet(0, focusSheet: false);
    }

    /// <summary>Smallest terminal the sheets are laid out for.</summary>
    public static readonly (int Columns, int Rows) MinimumSize = (80, 24);

    /// <summary>True while the terminal is smaller than <see cref="MinimumSize"/> and the window says so instead of drawing
    /// broken sheets.</summary>
    public bool TooSmall => _tooSmall.Visible;

    /// <summary>The key of each sheet in list order (see <see cref="KeyMap.SheetKey"/>).</summary>
    public IReadOnlyList<string> SheetKeys => _sheetKeys;

    /// <summary>The sheets in list order.</summary>
    public IReadOnlyList<Sheet> Sheets => _sheets;

    /// <summary>The sheet on show.</summary>
    public Sheet CurrentSheet => _sheets[_current];

    /// <summary>The status line's text.</summary>
    public string StatusText => _status.Text;

    /// <summary>Shows a sheet by index.</summary>
    public void ShowSheet(int index, bool focusSheet = true)
    {
        long start = System.Diagnostics.Stopwatch.GetTimestamp();
        ShowSheetCore(index, focusSheet);
        Work.ResponseTrace.Step("show sheet", start);
    }

    private void ShowSheetCore(int index, bool focusSheet)
    {
        if (index < 0 || index >= _sheets.Count)
        {
            return;
        }
        if (_current >= 0 && _current != index)
        {
            _frame.Remove(_sheets[_current]);
        }
        if (_current != index)
        {
            _current = index;
            _frame.Add(_sheets[index]);
            _frame.Title = _sheets[index].SheetName;
        }
        if (_list.Value != index)
        {
            _list.SetSelection(index, false);
        }
        _sheets[index].Arrive();
        if (focusSheet)
        {
            _sheets[index].SetFocus();
        }
        UpdateStatus();
    }

    /// <summary>Shows a sheet by name.</summary>
    public void ShowSheet(string name, bool focusSheet = true)
        => ShowSheet(_sheets.FindIndex(s => s.SheetName == name), focusSheet);

    /// <summary>Saves to the current file (F2).</summary>
    public void Save()
    {
        if (!ConfirmUntypedSave())
        {
            return;
        }
        string? failure = _context.Session.Save();
        Tell(failure is null ? $"Saved {_context.Session.RigPath} at {_context.Clock.Now:HH:mm:ss} (previous file kept as .bak)" : "! Not saved: " + failure);
    }

    /// <summary>Saves under another name (F12), asking before replacing a different existing file.</summary>
    public void SaveAs()
    {
        string? path = _context.Prompts.AskPath("Save rig as", _context.Session.RigPath ?? "rig.json");
        if (string.IsNullOrWhiteSpace(path) || !ConfirmUntypedSave())
        {
            return;
        }
        if (_context.Session.RigPath is not null && _context.Files.Exists(path) && !_context.Session.WouldReplaceOtherFile(path))
        {
            int? answer = _context.Prompts.Ask("Save over the open file?", $"{path} is the rig file that is open. Save over it? (the old file is kept as .bak)", ["Cancel", "Save"]);
            if (answer != 1)
            {
                Tell("Not saved.");
                return;
            }
        }
        else if (_context.Session.WouldReplaceOtherFile(path))
        {
            int? answer = _context.Prompts.Ask("Replace file?", $"{path} already exists. Replace it? (the old file is kept as .bak)", ["Cancel", "Replace"]);
            if (answer != 1)
            {
                Tell("Not saved.");
                return;
            }
        }
        string? failure = _context.Session.SaveAs(path);
        Tell(failure is null ? $"Saved as {path} at {_context.Clock.Now:HH:mm:ss}" : "! Not saved: " + failure);
    }

    /// <summary>Opens another rig (F3), asking first about unsaved edits.</summary>
    public void Open()
    {
        if (!ResolveUnsaved("Open another rig"))
        {
            return;
        }
        string? path = _context.Prompts.AskPath("Open rig", _context.Session.RigPath ?? "rig.json");
        if (string.IsNullOrWhiteSpace(path))
        {
            return;
        }
        _context.Work.Cancel();
        string? failure = _context.Session.Open(path);
        Tell(failure is null ? $"Opened {path}" : "! Cannot open: " + failure);
    }

    /// <summary>Quits (F10, Ctrl+Q), asking first about unsaved edits and about results of a long run that would be lost;
    /// true when the window was asked to stop.</summary>
    public bool Quit()
    {
        if (!_quitAnswered && (!ResolveLongRuns() || !ResolveUnsaved("Quit")))
        {
            return false;
        }
        _quitAnswered = true;
        _context.Work.Cancel();
        RequestStop();
        return true;
    }

    /// <inheritdoc/>
    protected override bool OnIsRunningChanging(bool oldIsRunning, bool newIsRunning)
    {
        if (!newIsRunning && oldIsRunning)
        {
            if (!_quitAnswered && !ResolveUnsaved("Quit"))
            {
                return true;
            }
            _quitAnswered = true;
            _context.Work.Cancel();
        }
        return base.OnIsRunningChanging(oldIsRunning, newIsRunning);
    }

    /// <inheritdoc/>
    protected override bool OnKeyDown(Key key)
    {
        if (_sheets[_current].HandleKey(key))
        {
            return true;
        }
        if (key == Key.F1)
        {
            ShowSheet("Help");
        }
        else if (key == Key.F2)
        {
            Save();
        }
        else if (key == Key.F12)
        {
            SaveAs();
        }
        else if (key == Key.F3)
        {
            Open();
        }
        else if (key == Key.F5)
        {
            _sheets[_current].Refresh();
            Tell("Recomputed.");
        }
        else if (key == Key.F8)
        {
            bool any = _context.Work.Current is not null;
            _context.Work.Cancel();
            Tell(any ? "Stopped." : "Nothing is running.");
        }
        else if (key == Key.F10 || key == Key.Q.WithCtrl)
        {
            Quit();
        }
        else if (key == Key.Esc)
        {
            // Esc closes dialogs; in the window itself it never quits (a stray Esc must not lose a long run).
            Tell("Esc does not quit: F10 or Ctrl+Q quits.");
        }
        else if (key == Key.PageDown.WithCtrl)
        {
            ShowSheet((_current + 1) % _sheets.Count);
        }
        else if (key == Key.PageUp.WithCtrl)
        {
            ShowSheet((_current + _sheets.Count - 1) % _sheets.Count);
        }
        else if (key.IsAlt && SheetForKey(key.NoAlt) is { } index)
        {
            ShowSheet(index);
        }
        else
        {
            return base.OnKeyDown(key);
        }
        return true;
    }

    /// <inheritdoc/>
    protected override void Dispose(bool disposing)
    {
        if (disposing)
        {
            _context.App.Keyboard.KeyDown -= OnApplicationKeyDown;
            // Sheets not on show are not sub-views; dispose them here so none is left behind.
            foreach (var sheet in _sheets.Where((_, i) => i != _current))
            {
                sheet.Dispose();
            }
        }
        base.Dispose(disposing);
    }

    // Plain sheet keys (digits, '?') are caught before the focused view sees them, but only when the user is not typing
    // in a field: there they are text.
    private void OnApplicationKeyDown(object? sender, Key key)
    {
        if (key.Handled || key.IsAlt || key.IsCtrl || SheetForKey(key) is not { } index)
        {
            return;
        }
        var focused = MostFocused;
        if (focused is null || focused is TextField || !IsRunningTop())
        {
            return;
        }
        // The sheet list keeps the focus, so the next key jumps again rather than landing in the new sheet's first field;
        // Enter or Tab moves into the sheet.
        ShowSheet(index, focusSheet: false);
        _list.SetFocus();
        key.Handled = true;
    }

    private void CheckSize()
    {
        var size = Frame.Size;
        bool small = size.Width > 0 && size.Height > 0 && (size.Width < MinimumSize.Columns || size.Height < MinimumSize.Rows);
        if (small == _tooSmall.Visible && !small)
        {
            return;
        }
        _tooSmall.Text = small
            ? $"The terminal is {size.Width} x {size.Height} characters; the workbench needs at least {MinimumSize.Columns} x {MinimumSize.Rows}.\n"
                + "Enlarge the window and the sheets come back as they were. F10 or Ctrl+Q quits."
            : "";
        _tooSmall.Visible = small;
        _listFrame.Visible = !small;
        _frame.Visible = !small;
        _status.Visible = !small;
        _keys.Visible = !small;
        if (small)
        {
            _progress.Visible = false;
        }
        else
        {
            UpdateStatus();
        }
    }

    private bool IsRunningTop() => _context.App.TopRunnableView is null || ReferenceEquals(_context.App.TopRunnableView, this);

    private int? SheetForKey(Key key)
    {
        string text = key.AsRune.Value is > 32 and < 127 ? ((char)key.AsRune.Value).ToString() : "";
        int index = text.Length == 0 ? -1 : _sheetKeys.IndexOf(text);
        return index >= 0 ? index : null;
    }

    /// <summary>Before quitting: when a sheet holds results of a long run (or one is running), asks. True to go ahead.</summary>
    private bool ResolveLongRuns()
    {
        var runs = _sheets.Select(s => s.LongRunResults).OfType<string>().ToList();
        if (runs.Count == 0)
        {
            return true;
        }
        int? answer = _context.Prompts.Ask("Quit", $"Quitting loses {string.Join(" and ", runs)}. Quit anyway?", ["Cancel", "Quit"]);
        if (answer == 1)
        {
            return true;
        }
        Tell("Cancelled; nothing was lost.");
        return false;
    }

    /// <summary>Before a step that would drop unsaved edits: save, discard or cancel. True to go ahead.</summary>
    private bool ResolveUnsaved(string what)
    {
        var session = _context.Session;
        if (!session.IsDirty)
        {
            return true;
        }
        string typed = session.UntypedFields.Count > 0 ? $" {session.UntypedFields.Count} field(s) hold text that is not a valid value yet." : "";
        int? answer = _context.Prompts.Ask(what, $"The rig {session.DisplayName} has unsaved edits.{typed} Save them first?",
            ["Cancel", "Save", "Discard"]);
        switch (answer)
        {
            case 1:
                string? failure = session.Save();
                if (failure is not null)
                {
                    Tell("! Not saved: " + failure);
                    return false;
                }
                return true;
            case 2:
                return true;
            default:
                Tell("Cancelled; nothing was lost.");
                return false;
        }
    }

    private bool ConfirmUntypedSave()
    {
        var untyped = _context.Session.UntypedFields;
        if (untyped.Count == 0)
        {
            return true;
        }
        int? answer = _context.Prompts.Ask("Save", $"{untyped.Count} field(s) hold text that is not a valid value ({string.Join(", ", untyped.Keys.Select(FieldWords.Of))}). "
            + "The file will keep their last valid values. Save anyway?", ["Cancel", "Save"]);
        return answer == 1;
    }

    private void Tell(string message)
    {
        _notice = message;
        UpdateStatus();
    }

    private void RefreshAll()
    {
        if (_current >= 0)
        {
            _sheets[_current].Refresh();
        }
        UpdateStatus();
    }

    private void UpdateStatus()
    {
        var session = _context.Session;
        string mark = session.IsDirty ? " * unsaved" : "";
        string problems = session.Problems.Count + session.UntypedFields.Count + session.FailedBurstChecks.Count is var n and > 0 ? $" | ! {n} problem(s)" : "";
        // A job F8 stopped is no longer shown as running while its worker returns: the notice says "Stopped." and the
        // status line must not say "ranking..." beside it.
        var running = _context.Work.Current is { } current && !_context.Work.IsStopping(current.Name) ? current : ((string Name, double? Progress)?)null;
        string work = running is { } job ? $" | {job.Name}..." : "";
        string failure = _context.Work.LastFailure is { } f ? $" | ! {f}" : "";
        string notice = _notice.Length > 0 ? " | " + _notice : "";
        _status.Text = $"{session.DisplayName}{mark}{work}{failure}{notice}{problems}";
        if (running is { Progress: { } fraction })
        {
            Redraw.Visible(_progress, true);
            _progress.Fraction = (float)fraction;
            Redraw.Width(_status, Dim.Fill(22));
        }
        else
        {
            Redraw.Visible(_progress, false);
            Redraw.Width(_status, Dim.Fill());
        }
        string sheetKeys = _current >= 0 && _sheets[_current].KeyHints.Length > 0 ? _sheets[_current].KeyHints + "  " : "";
        if (_current >= 0 && _sheets[_current] is ChartSheet)
        {
            sheetKeys += "F6 chart file  ";
        }
        _keys.Text = $"F1 Help  F2 Save  F3 Open  {sheetKeys}F8 Stop  F10 Quit";
    }
}

using RotorDrive.Core;
using RotorDrive.Core.Craft;
using RotorDrive.Core.Safety;
using RotorDrive.Core.Studies.Stress;
using RotorDrive.Files;
using RotorDrive.Files.Catalogs;
using RotorDrive.Files.Json;
using RotorDrive.Files.Rigs;
using RotorDrive.Tui.Services;

namespace RotorDrive.Tui.Session;

/// <summary>The rig being edited: its file, the editable document, the catalogs it names, the resolved Core rig and
/// every problem; tracks unsaved edits and text the user typed that is not yet a valid value.</summary>
/// <remarks>All file access goes through <see cref="IWorkbenchFiles"/>. Edits re-resolve the rig against the catalogs
/// read when the file was opened (re-open to pick up catalog changes).</remarks>
public sealed class RigSession
{
    // The rig file as read or last saved, whose comments a save carries over.
    private string? _text;
    private readonly IWorkbenchFiles _files;
    private readonly Dictionary<string, string> _untyped = new(StringComparer.Ordinal);
    private readonly HashSet<string> _edited = new(StringComparer.Ordinal);
    private RigSourceMap _locations = RigSourceMap.Empty;
    private IReadOnlyList<InputProblem> _readProblems = [];
    private Rig? _burstFor;
    private IReadOnlyList<RotorSafetyResult> _burst = [];

    /// <summary>Creates an empty session (no rig open).</summary>
    public RigSession(IWorkbenchFiles files)
    {
        _files = files ?? throw new ArgumentNullException(nameof(files));
    }

    /// <summary>Raised on every change of document, resolution, path or saved state.</summary>
    public event EventHandler? Changed;

    /// <summary>The rig file's path (as opened or last saved), or null before anything is opened.</summary>
    public string? RigPath { get; private set; }

    /// <summary>The editable document; null when the file could not be read as a rig document.</summary>
    public RigDocument? Document { get; private set; }

    /// <summary>The catalogs the rig names, with their paths and problems; null when they could not be located.</summary>
    public CatalogLoadResult? Catalogs { get; private set; }

    /// <summary>The resolved rig (SI units); null while any problem remains.</summary>
    public Rig? Rig { get; private set; }

    /// <summary>The part spreads of the rig's "tolerances" section in SI units, as the stress test reads them;
    /// <see cref="StressTolerances.None"/> while the rig has problems or has no such section.</summary>
    public StressTolerances Tolerances { get; private set; } = StressTolerances.None;

    /// <summary>Every problem of the rig document and its catalogs.</summary>
    public IReadOnlyList<InputProblem> Problems { get; private set; } = [];

    /// <summary>Core's burst check of each distinct rotor of the valid rig at its rated speed (<see cref="HoverSafety.AtRatedSpeed"/>,
    /// the same list the hover review reports), empty when the rig is invalid.</summary>
    public IReadOnlyList<RotorSafetyResult> BurstChecks
    {
        get
        {
            if (Rig is not { } rig)
            {
                return [];
            }
            if (!ReferenceEquals(_burstFor, rig))
            {
                _burst = HoverSafety.AtRatedSpeed(rig.Stations.Select(s => s.Rotor));
                _burstFor = rig;
            }
            return _burst;
        }
    }

    /// <summary>The burst checks that fail (counted with the problems in the status line).</summary>
    public IReadOnlyList<RotorSafetyResult> FailedBurstChecks => BurstChecks.Where(b => b.Passes == false).ToList();

    /// <summary>True when the document differs from the file, or a field holds typed text not yet valid.</summary>
    public bool IsDirty { get; private set; }

    /// <summary>How many times the rig was resolved (each edit or open); lets views know their results are stale.</summary>
    public int Revision { get; private set; }

    /// <summary>The catalog parts (valid rows), or null.</summary>
    public PartsCatalog? Catalog => Catalogs?.Catalog;

    /// <summary>Fields holding typed text that could not be read as a value: JSON path to message.</summary>
    public IReadOnlyDictionary<string, string> UntypedFields => _untyped;

    /// <summary>The rig's display name.</summary>
    public string DisplayName => Rig?.Name ?? Document?.Name ?? (RigPath is null ? "(no rig)" : Path.GetFileName(RigPath));

    /// <summary>Opens a rig file, replacing the session's content. Returns null when it was read (even with problems in
    /// its values, which <see cref="Problems"/> lists); otherwise the reason it could not be opened (session unchanged).</summary>
    public string? Open(string path)
    {
        ArgumentNullException.ThrowIfNull(path);
        string? text = _files.TryReadAllText(path, out string? failure);
        if (text is null)
        {
            return $"{path}: {failure}";
        }
        var read = RigDocumentReader.Read(text, path);
        if (read.Document is null)
        {
            return string.Join(Environment.NewLine, read.Problems.Select(p => p.ToString()));
        }
        var pathProblems = new List<InputProblem>();
        var paths = RigResolver.CatalogPathsOf(read.Document, path, read.Locations, pathProblems);
        var catalogProblems = new List<InputProblem>();
        CatalogLoadResult? catalogs = paths is null ? null : LoadCatalogs(paths, catalogProblems);

        RigPath = path;
        _text = text;
        Document = read.Document;
        Catalogs = catalogs;
        _locations = read.Locations;
        _readProblems = read.Problems.Concat(pathProblems).Concat(catalogProblems).ToList();
        _untyped.Clear();
        _edited.Clear();
        IsDirty = false;
        Resolve();
        return null;
    }

    /// <summary>Applies an edit to the document, marks the session unsaved and re-resolves the rig.</summary>
    /// <param name="fieldPath">The JSON path of the edited field (its "typed but invalid" mark is cleared).</param>
    /// <param name="edit">The change.</param>
    /// <param name="refusal">Asked after <paramref name="edit"/>: why the typed text was not stored (null when it was);
    /// a refusal marks the field as holding text that is not a value and leaves the document unchanged.</param>
    public void Edit(string fieldPath, Action<RigDocument> edit, Func<string?>? refusal = null)
    {
        ArgumentNullException.ThrowIfNull(edit);
        if (Document is null)
        {
            return;
        }
        edit(Document);
        if (refusal?.Invoke() is { } why)
        {
            MarkUntyped(fieldPath, why);
            return;
        }
        _untyped.Remove(fieldPath);
        _edited.Add(fieldPath);
        IsDirty = true;
        Resolve();
    }

    /// <summary>Applies one edit that sets several fields at once (a shortlist pick: every station's motor and controller,
    /// the pack and its count), marks the session unsaved and re-resolves the rig once. Text those fields held that was
    /// not a valid value is replaced by the edit.</summary>
    /// <param name="fieldPaths">The JSON paths of every field the edit sets.</param>
    /// <param name="edit">The change.</param>
    public void EditFields(IReadOnlyCollection<string> fieldPaths, Action<RigDocument> edit)
    {
        ArgumentNullException.ThrowIfNull(fieldPaths);
        ArgumentNullException.ThrowIfNull(edit);
        if (Document is null)
        {
            return;
        }
        edit(Document);
        foreach (string path in fieldPaths)
        {
            _untyped.Remove(path);
            _edited.Add(path);
        }
        IsDirty = true;
        Resolve();
    }

    /// <summary>Drops text typed into a field that is not a value (Esc in the field): the field shows the rig's value
    /// again. Nothing happens when the field holds no such text.</summary>
    public void DiscardTyped(string fieldPath)
    {
        if (_untyped.Remove(fieldPath))
        {
            Changed?.Invoke(this, EventArgs.Empty);
        }
    }

    /// <summary>Records that a field holds text that is not a valid value; the document keeps its last valid value.</summary>
    public void MarkUntyped(string fieldPath, string message)
    {
        _untyped[fieldPath] = message;
        IsDirty = true;
        Changed?.Invoke(this, EventArgs.Empty);
    }

    /// <summary>The message for a field: typed text that is not a value, or the rig's problem at that JSON path, or else
    /// the first problem inside it (a tolerance entry's "$.tolerances.KEY.normal_sd_pct" for the field "$.tolerances.KEY").</summary>
    public string? MessageFor(string fieldPath)
    {
        if (_untyped.TryGetValue(fieldPath, out string? typed))
        {
            return typed;
        }
        var problem = Problems.FirstOrDefault(p => string.Equals(p.Field, fieldPath, StringComparison.Ordinal))
            ?? Problems.FirstOrDefault(p => p.Field.StartsWith(fieldPath + ".", StringComparison.Ordinal));
        // A required value left blank: beside its field the file's wording ("required key 'thickness_mm' is missing")
        // names a JSON key the sheet shows in words; say what to do instead.
        if (problem is not null && problem.Field == fieldPath
            && problem.Message == Messages.MissingKey(fieldPath[(fieldPath.LastIndexOf('.') + 1)..]))
        {
            return "a value is required";
        }
        return problem?.Message;
    }

    /// <summary>Saves to the current path: the previous file is kept as PATH.bak, the new one is written atomically.</summary>
    /// <returns>Null on success; otherwise the reason (nothing changed on disk except possibly the backup).</returns>
    public string? Save()
    {
        if (RigPath is null || Document is null)
        {
            return "no rig is open";
        }
        return WriteTo(RigPath);
    }

    /// <summary>Saves under a new path (the caller has asked before replacing a different existing file). Catalog
    /// paths are rewritten relative to the new folder so the saved rig still finds its catalogs.</summary>
    public string? SaveAs(string path)
    {
        ArgumentNullException.ThrowIfNull(path);
        if (Document is null || RigPath is null)
        {
            return "no rig is open";
        }
        if (Document.Catalogs is { } c && Catalogs is { } loaded)
        {
            string folder = Path.GetDirectoryName(_files.FullPath(path)) ?? ".";
            string Rel(string p) => Path.GetRelativePath(folder, _files.FullPath(p));
            var copy = Document.Clone();
            copy.Catalogs = new RigCatalogsSection
            {
                Motors = Rel(loaded.Paths.Motors),
                Controllers = Rel(loaded.Paths.Controllers),
                Packs = Rel(loaded.Paths.Packs),
                CellCurves = Rel(loaded.Paths.CellCurves),
                Rotors = Rel(loaded.Paths.Rotors),
                Plates = Rel(loaded.Paths.Plates),
            };
            string? failure = WriteDocument(copy, path);
            if (failure is null)
            {
                c.Motors = copy.Catalogs.Motors;
                c.Controllers = copy.Catalogs.Controllers;
                c.Packs = copy.Catalogs.Packs;
                c.CellCurves = copy.Catalogs.CellCurves;
                c.Rotors = copy.Catalogs.Rotors;
                c.Plates = copy.Catalogs.Plates;
                Saved(path);
            }
            return failure;
        }
        return WriteTo(path);
    }

    /// <summary>True when saving to <paramref name="path"/> would replace a file other than the rig's own.</summary>
    public bool WouldReplaceOtherFile(string path)
        => _files.Exists(path) && (RigPath is null || !string.Equals(_files.FullPath(path), _files.FullPath(RigPath), StringComparison.Ordinal));

    private string? WriteTo(string path)
    {
        string? failure = WriteDocument(Document!, path);
        if (failure is null)
        {
            Saved(path);
        }
        return failure;
    }

    private string? WriteDocument(RigDocument document, string path)
    {
        if (_files.Exists(path))
        {
            string? backup = _files.Copy(path, path + ".bak");
            if (backup is not null)
            {
                return $"{path}.bak: cannot keep a backup of the previous file ({backup}); nothing was saved";
            }
        }
        // The file's comments go into the new text too: the rig file is the user's, notes and all.
        string text = JsonComments.Carry(_text ?? "", RigDocumentWriter.Write(document));
        string? failure = _files.WriteAllTextAtomic(path, text);
        if (failure is null)
        {
            _text = text;
        }
        return failure is null ? null : $"{path}: {failure}";
    }

    private void Saved(string path)
    {
        RigPath = path;
        IsDirty = _untyped.Count > 0;
        Changed?.Invoke(this, EventArgs.Empty);
    }

    private CatalogLoadResult? LoadCatalogs(CatalogPaths paths, List<InputProblem> problems)
    {
        string Read(string p)
        {
            string? text = _files.TryReadAllText(p, out string? failure);
            if (text is null)
            {
                problems.Add(new InputProblem(p, 0, 0, "", failure ?? Messages.FileNotFound()));
            }
            return text ?? "";
        }
        var texts = new CatalogTexts(Read(paths.Motors), Read(paths.Controllers), Read(paths.Packs),
            Read(paths.CellCurves), Read(paths.Rotors), Read(paths.Plates));
        return problems.Count > 0 ? null : CatalogLoader.FromTexts(texts, paths);
    }

    // Calibration and bench files named by the rig, read through the session's file service like the catalogs.
    private string? ReadText(string path, List<InputProblem> problems)
    {
        string? text = _files.TryReadAllText(path, out string? failure);
        if (text is null)
        {
            problems.Add(new InputProblem(path, 0, 0, "", failure ?? Messages.FileNotFound()));
        }
        return text;
    }

    private void Resolve()
    {
        var resolved = RigResolver.Resolve(Document!, Catalogs, RigPath ?? "rig.json", _locations, ReadText);
        // Type problems found when reading stay until the user edits that field (the reader left the key absent).
        var readFields = _readProblems.Where(p => p.Field.Length > 0 && !WasEdited(p.Field)).Select(p => p.Field).ToHashSet(StringComparer.Ordinal);
        var kept = _readProblems.Where(p => p.Field.Length == 0 || readFields.Contains(p.Field));
        Problems = kept
            .Concat(resolved.Problems.Where(p => !readFields.Contains(p.Field)))
            .Concat(Catalogs?.Problems ?? [])
            .Distinct()
            .ToList();
        Rig = Problems.Count == 0 ? resolved.Rig : null;
        Tolerances = Rig is null ? StressTolerances.None : resolved.Tolerances;
        Revision++;
        Changed?.Invoke(this, EventArgs.Empty);
    }

    private bool WasEdited(string field) => _edited.Contains(field);
}

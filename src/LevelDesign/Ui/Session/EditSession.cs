using LevelDesign.Core.Kinds;
using LevelDesign.Core.Couplers;
using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Elements;
using LevelDesign.Core.Files;

namespace LevelDesign.Ui.Session;

/// <summary>
/// The open device and its history: every accepted edit pushes the previous document on the undo stack
/// (documents are immutable, so the stack is the history), redo is cleared by a new edit, "unsaved" means
/// the current document is not the one last saved or loaded. Knows nothing of the screen.
/// </summary>
public sealed class EditSession
{
    private readonly Stack<DeviceDocument> _undo = new();
    private readonly Stack<DeviceDocument> _redo = new();
    private DeviceDocument? _saved;
    private AutosaveSidecar? _autosave;
    private DiskStamp? _stamp;

    public DeviceDocument? Document { get; private set; }

    /// <summary>The file this session writes to; null for the demo until "save as".</summary>
    public string? Path { get; private set; }

    /// <summary>Errors of a file that failed to load, with the file text for showing the offending lines.</summary>
    public IReadOnlyList<DeviceFileError> LoadErrors { get; private set; } = [];
    public string? LoadedText { get; private set; }

    /// <summary>Autosave text found at start that differs from the file: offered for recovery, not forced.</summary>
    public string? RecoveryText { get; private set; }

    public bool IsDirty => Document is not null && !ReferenceEquals(Document, _saved);

    /// <summary>The file has no write permission (or this user may not write it): Ctrl+S is refused, save as is offered.</summary>
    public bool IsReadOnly => Path is not null && AtomicFile.IsReadOnly(Path);

    /// <summary>Why the last autosave failed (a full disk, permissions); null when the last one succeeded.</summary>
    public string? AutosaveProblem { get; private set; }
    public bool CanUndo => _undo.Count > 0;
    public bool CanRedo => _redo.Count > 0;
    public int UndoDepth => _undo.Count;

    /// <summary>Raised after the current document changed (edit, undo, redo, load, recovery).</summary>
    public event Action? Changed;

    public void OpenDocument(DeviceDocument document, string? path)
    {
        Reset(path);
        Document = _saved = document;
        if (path is not null) LoadedText = DeviceFileText.Read(path, out _);
        CheckRecovery();
        Changed?.Invoke();
    }

    /// <summary>Opens a file; a bad file leaves no document and lists its errors (never throws for bad input).</summary>
    public void OpenFile(string path)
    {
        Reset(path);
        DeviceLoadResult result;
        try { result = DeviceDocument.Load(path); }
        catch (Exception e) when (e is not OutOfMemoryException)
        {
            result = new DeviceLoadResult(null, [new DeviceFileError(path, 0, 0, "", e.Message)]);
        }
        LoadedText = DeviceFileText.Read(path, out _);
        if (result.Ok) Document = _saved = result.Document;
        else LoadErrors = result.Errors.Count > 0 ? result.Errors : [new DeviceFileError(path, 0, 0, "", "the file could not be read")];
        CheckRecovery();
        Changed?.Invoke();
    }

    /// <summary>The first load error that points at a value in the file, which can be fixed in place.</summary>
    public DeviceFileError? FixableError =>
        LoadedText is null ? null : LoadErrors.FirstOrDefault(e => e.Line > 0 && e.Column > 0 && RawValueFix.ValueAt(LoadedText, e.Line, e.Column) is not null);

    /// <summary>
    /// Fixes a file that did not load: replaces the value at the error's place in its text and reads it again. On
    /// success the device opens with the fix unsaved (Ctrl+S writes it, keeping the broken file as .bak); otherwise
    /// the remaining errors are listed against the fixed text. The file on disk is never touched here.
    /// </summary>
    public EditOutcome FixLoadError(DeviceFileError error, string value)
    {
        if (LoadedText is null || Path is null) return EditOutcome.Refused("no file text to fix");
        string? text = RawValueFix.Replace(LoadedText, error.Line, error.Column, value, out string? problem);
        if (text is null) return EditOutcome.Refused(problem!);
        var result = DeviceDocument.Parse(text, Path);
        LoadedText = text;
        if (!result.Ok)
        {
            LoadErrors = result.Errors;
            Changed?.Invoke();
            return EditOutcome.Refused($"{result.Errors.Count} error(s) remain");
        }
        LoadErrors = [];
        Document = result.Document;   // _saved stays unset: the fix is an unsaved change
        Changed?.Invoke();
        return EditOutcome.Ok($"the file now loads; Ctrl+S saves the fix ({System.IO.Path.GetFileName(Path)}.bak keeps the old text)");
    }

    public void OpenDemo()
    {
        Reset(null);
        Document = _saved = DeviceDocument.Demo();
        Changed?.Invoke();
    }

    private void Reset(string? path)
    {
        Path = path;
        _undo.Clear();
        _redo.Clear();
        LoadErrors = [];
        LoadedText = null;
        RecoveryText = null;
        Document = _saved = null;
        _autosave = path is null ? null : new AutosaveSidecar(path);
        _stamp = path is null ? null : DiskStamp.Of(path);
    }

    private void CheckRecovery()
    {
        try { RecoveryText = _autosave?.PendingRecovery(LoadedText); }
        catch (IOException) { RecoveryText = null; }
    }

    /// <summary>Takes the autosaved edits as the current (unsaved) document, on top of the file as loaded.</summary>
    public EditOutcome AcceptRecovery()
    {
        if (RecoveryText is null || Path is null) return EditOutcome.Refused("nothing to recover");
        var result = DeviceDocument.Parse(RecoveryText, Path);
        if (!result.Ok) return EditOutcome.Refused("the autosave does not parse: " + string.Join("; ", result.Errors));
        RecoveryText = null;
        if (Document is not null) _undo.Push(Document);
        LoadErrors = [];
        Document = result.Document;
        Changed?.Invoke();
        return EditOutcome.Ok("recovered unsaved edits from " + _autosave!.Path);
    }

    public void DeclineRecovery()
    {
        RecoveryText = null;
        DeleteAutosave();
    }

    public EditOutcome SetValue(string fieldPath, string text) =>
        Apply(d => (d.WithValue(fieldPath, text.Trim(), out var e), e), $"{fieldPath} = {text.Trim()}");

    /// <summary>Several values as ONE edit (one undo step), e.g. the fitted parameters; refused whole if any value is.</summary>
    public EditOutcome SetValues(IReadOnlyList<(string Field, string Text)> values, string done) =>
        Apply(d =>
        {
            var next = d;
            foreach (var (field, text) in values)
            {
                next = next.WithValue(field, text.Trim(), out var e);
                if (e is not null) return (d, e);
            }
            return (next, null);
        }, done);

    public EditOutcome AddElement(ElementKindInfo kind, string id) =>
        Apply(d => (d.WithElement(id, kind, out var e), e), $"added {kind.InsertName} '{id}' with default values");

    public EditOutcome AddCoupler(CouplerKindInfo kind, string id, string a, string b, string? strength, (string A, string B)? operators = null) =>
        Apply(d => (d.WithCoupler(id, kind, a, b, out var e, strength, operators), e), $"added {kind.Name} coupler '{id}'");

    public EditOutcome AddPoint(string name, IReadOnlyList<(string Bias, string Value)> values) =>
        Apply(d => (d.WithPoint(name, values, out var e), e),
            $"added operating point '{name}' ({string.Join(", ", values.Select(v => $"{v.Bias} = {v.Value}"))})");

    /// <summary>Removes by id with what depends on it (see DeviceDocument.Without); the message lists what went.</summary>
    public EditOutcome Remove(string id)
    {
        var also = Document?.AlsoRemoved(id) ?? [];
        return Apply(d => (d.Without(id, out var e), e), $"removed '{id}'" + (also.Count > 0 ? " with " + string.Join(", ", also) : ""));
    }

    public EditOutcome Rename(string oldId, string newId) =>
        Apply(d => (d.Renamed(oldId, newId, out var e), e), $"renamed '{oldId}' to '{newId}' and every reference to it");

    /// <summary>Runs one document edit; the document methods return themselves and an error when they refuse.</summary>
    private EditOutcome Apply(Func<DeviceDocument, (DeviceDocument Next, DeviceFileError? Error)> edit, string done)
    {
        if (Document is null) return EditOutcome.Refused("no device is open");
        (DeviceDocument Next, DeviceFileError? Error) result;
        try { result = edit(Document); }
        catch (Exception e) when (e is ArgumentException or InvalidOperationException or FormatException) { return EditOutcome.Refused(e.Message); }
        if (result.Error is not null) return EditOutcome.Refused(result.Error.Message);
        if (ReferenceEquals(result.Next, Document)) return EditOutcome.Refused("nothing changed");
        _undo.Push(Document);
        _redo.Clear();
        Document = result.Next;
        WriteAutosave();
        Changed?.Invoke();
        return EditOutcome.Ok(done);
    }

    public EditOutcome Undo()
    {
        if (_undo.Count == 0 || Document is null) return EditOutcome.Refused("nothing to undo");
        _redo.Push(Document);
        Document = _undo.Pop();
        WriteAutosave();
        Changed?.Invoke();
        return EditOutcome.Ok($"undone ({_undo.Count} more)");
    }

    public EditOutcome Redo()
    {
        if (_redo.Count == 0 || Document is null) return EditOutcome.Refused("nothing to redo");
        _undo.Push(Document);
        Document = _redo.Pop();
        WriteAutosave();
        Changed?.Invoke();
        return EditOutcome.Ok($"redone ({_redo.Count} more)");
    }

    /// <summary>True when the file was changed by someone else since it was loaded or last saved here.</summary>
    public bool ChangedOnDisk => Path is not null && _stamp is not null && DiskStamp.Of(Path) != _stamp;

    public EditOutcome Save(string? asPath = null)
    {
        if (Document is null) return EditOutcome.Refused("no device is open");
        string? target = asPath ?? Path;
        if (string.IsNullOrWhiteSpace(target)) return EditOutcome.Refused("this device has no file yet; use save as (Ctrl+W)");
        try { Document.Save(target); }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException or ArgumentException)
        {
            // FileWriteException already names the path
            return EditOutcome.Refused(e is FileWriteException ? e.Message : $"could not save {target}: {e.Message}");
        }
        if (asPath is not null && asPath != Path)
        {
            DeleteAutosave();
            Path = asPath;
            _autosave = new AutosaveSidecar(asPath);
        }
        _saved = Document;
        _stamp = DiskStamp.Of(target);
        DeleteAutosave();
        Changed?.Invoke();
        return EditOutcome.Ok($"saved {target} (previous kept as {System.IO.Path.GetFileName(target)}.bak)");
    }

    /// <summary>A deliberate quit without saving: the autosave is no longer wanted.</summary>
    public void Discard() => DeleteAutosave();

    private void DeleteAutosave()
    {
        try
        {
            _autosave?.Delete();
            AutosaveProblem = null;
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            AutosaveProblem = e.Message;
        }
    }

    private void WriteAutosave()
    {
        if (_autosave is null || Document is null) return;
        try
        {
            if (IsDirty) _autosave.Write(Document.ToText());
            else _autosave.Delete();
            AutosaveProblem = null;
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            // a safety net: a failure must not block editing, but the screen says so (see MainWindow.Report)
            AutosaveProblem = e.Message;
        }
    }
}

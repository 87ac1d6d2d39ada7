using LevelDesign.Core.Kinds;
using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Sweeps;
using LevelDesign.Ui.Compute;
using LevelDesign.Ui.Controllers;
using LevelDesign.Ui.Export;
using LevelDesign.Ui.Session;
using LevelDesign.Ui.Text;
using Terminal.Gui.Drawing;
using Terminal.Gui.Input;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;

namespace LevelDesign.Ui.Views;

/// <summary>
/// The board: device tree and parameter form on the left, one page (states, shifts, spectrum, crossings,
/// help) on the right — at 120×34 and above the spectrum and a page show together — then the status line,
/// the question bar and the key bar. A view over the controllers that hold the state and its policy: the point at
/// the file's biases (<see cref="PointController"/>), sweeps and the point the pages show (<see cref="SweepController"/>),
/// targets and fits (<see cref="TargetsController"/>), files (<see cref="FilesController"/>). All work runs off the UI
/// thread and comes back through the scheduler; a result whose generation is no longer current is dropped.
/// </summary>
public sealed partial class MainWindow : Window
{
    /// <summary>The board column: 30 columns leave the page 46 at 80 columns; wider screens give the form room for "← bias NAME".</summary>
    private int LeftWidth => Frame.Width >= 110 ? 40 : Frame.Width >= 100 ? 34 : 30;

    private readonly EditSession _session;
    private readonly IUiScheduler _scheduler;
    private readonly PointController _point;
    private readonly SweepController _sweeps;
    private readonly TargetsController _targets;
    private readonly FilesController _files;

    private readonly FrameView _boardFrame, _formFrame, _pageFrame, _plotFrame;
    private readonly RowList _board, _form, _page;
    private readonly SpectrumView _spectrum;
    private readonly StatusLine _status;
    private readonly PromptBar _prompt;
    private readonly KeyBar _keyBar;
    private readonly IReadOnlyList<(KeyHint Hint, Key Key, Action? Action)> _windowKeys;

    private IReadOnlyList<BoardNode> _nodes = [];
    private string? _selectAfterEdit;
    private IReadOnlyList<FieldRow> _fields = [];
    private Page _pageShown = Page.States, _pageBeforeHelp = Page.States;
    private bool _showLimits, _wideOff, _allowQuit;

    public MainWindow(EditSession session, IUiScheduler scheduler, ISweepService? sweeps = null, ITargetSolver? targets = null, IPlotExporter? plots = null)
    {
        _session = session;
        _scheduler = scheduler;
        _point = new PointController(scheduler);
        _sweeps = new SweepController(session, scheduler, sweeps ?? new SweepService());
        _targets = new TargetsController(session, scheduler, targets ?? new TargetSearch());
        _files = new FilesController(session, _sweeps, plots);
        if (Palette.Monochrome) SetScheme(Palette.MonochromeScheme());

        _board = new RowList { Width = Dim.Fill(), Height = Dim.Fill() };
        _board.CanSelect = i => i < _nodes.Count && _nodes[i].Kind != BoardNodeKind.Group;
        _boardFrame = new FrameView { Title = "Board", X = 0, Y = 0, Width = LeftWidth, Height = Dim.Percent(45) };
        _boardFrame.Add(_board);

        _form = new RowList { Width = Dim.Fill(), Height = Dim.Fill() };
        _formFrame = new FrameView { Title = "Parameters", X = 0, Y = Pos.Bottom(_boardFrame), Width = LeftWidth, Height = Dim.Fill(3) };
        _formFrame.Add(_form);

        _page = new RowList { Selectable = false, Width = Dim.Fill(), Height = Dim.Fill() };
        _pageFrame = new FrameView { Title = "States", X = LeftWidth, Y = 0, Width = Dim.Fill(), Height = Dim.Fill(3) };
        _pageFrame.Add(_page);

        _spectrum = new SpectrumView { Width = Dim.Fill(), Height = Dim.Fill() };
        _plotFrame = new FrameView { Title = "Spectrum", X = LeftWidth, Y = 0, Width = Dim.Fill(), Height = Dim.Fill(3), Visible = false };
        _plotFrame.Add(_spectrum);

        _crossingList = new RowList { Width = Dim.Fill(), Height = Dim.Fill(), Visible = false };
        _crossingList.CanSelect = i => i >= CrossingsText.HeaderLines && i - CrossingsText.HeaderLines < _sweeps.Crossings.Count;
        _pageFrame.Add(_crossingList);

        _status = new StatusLine { X = 0, Y = Pos.AnchorEnd(3), Width = Dim.Fill() };
        _prompt = new PromptBar { X = 0, Y = Pos.AnchorEnd(6), Width = Dim.Fill() };
        _keyBar = new KeyBar { X = 0, Y = Pos.AnchorEnd(1), Width = Dim.Fill() };
        _windowKeys = WindowKeys();
        _status.RowsChanged += LayoutBottom;
        _prompt.RowsChanged += LayoutBottom;

        // Titles carry file names and ids with '_', which the framework would take as a hotkey marker.
        foreach (View titled in new View[] { this, _boardFrame, _formFrame, _pageFrame, _plotFrame })
            titled.HotKeySpecifier = (System.Text.Rune)0xFFFF;
        Add(_boardFrame, _formFrame, _pageFrame, _plotFrame, _status, _prompt, _keyBar);
        UpdateKeyBar();
        BindBoardKeys();
        BindWindowKeys();

        // the panel holding the focus is drawn with a double line: visible without colour (NO_COLOR) and in any scheme
        foreach (var frame in new[] { _boardFrame, _formFrame, _pageFrame, _plotFrame })
        {
            frame.BorderStyle = LineStyle.Rounded;
            frame.HasFocusChanged += (_, _) => frame.BorderStyle = frame.HasFocus ? LineStyle.Double : LineStyle.Rounded;
        }
        _board.SelectionChanged += _ => ShowFields();
        // Enter on an operating point shows its states; on anything else it goes to the form
        _board.RowActivated += i =>
        {
            if (i < _nodes.Count && _nodes[i].Kind == BoardNodeKind.Point) _sweeps.ShowNamedPoint(_nodes[i].Id, OnNamedPointShown);
            else _form.SetFocus();
        };
        _form.RowActivated += _ => EditField();
        _form.Bind(Key.F2, Command.Edit, () => { EditField(); return true; });
        _point.Changed += () => { ShowFields(); RefreshPage(); UpdateStatus(); };   // the coupler form shows g at the point
        _point.Progressed += UpdateStatus;
        _point.Said += Say;
        _spectrum.CursorMoved += _sweeps.MoveCursor;
        _sweeps.Changed += OnSweepChanged;
        _sweeps.Progressed += OnSweepProgress;
        _sweeps.Said += Say;
        _targets.Changed += UpdateStatus;
        _targets.Said += Say;
        _targets.Offered += AskOffer;
        _crossingList.RowActivated += JumpToCrossing;
        _crossingList.Bind(Key.Esc, Command.Cancel, () => { ShowPage(Page.Spectrum); return true; });
        FrameChanged += (_, _) => { ApplyLayout(); SayIfTooSmall(); };

        _session.Changed += OnDocumentChanged;
        Title = "LevelDesign";
        OnDocumentChanged();
        ApplyLayout();
        SayIfReadOnly();
        _scheduler.Post(OfferRecovery);
        WatchDisk();
    }

    private readonly RowList _crossingList;
    private string? _formItemId;
    private BoardNodeKind _formItemKind;

    /// <summary>The question bar, for tests and for the app to answer start-up offers.</summary>
    public PromptBar Prompt => _prompt;
    public Page CurrentPage => _pageShown;
    public SpectrumView Spectrum => _spectrum;
    public SweepResult? LastSweep => _sweeps.Result;
    /// <summary>The latest computation at the file's biases (null before the first).</summary>
    public PointSnapshot? LastSnapshot => _point.Snapshot;
    public bool IsComputing => _point.IsComputing || _sweeps.IsRunning;
    public bool IsFitting => _targets.IsFitting;
    public bool IsSolving => _targets.IsSolving;

    /// <summary>The latest fit's task (it ends as cancelled after Esc), for tests that check the work really stops.</summary>
    public Task? RunningFit => _targets.RunningFit;
    public bool QuitAllowed => _allowQuit;

    /// <summary>
    /// The keys of the key bar in display order, each with its action; rank 0 is always shown, larger ranks are
    /// left out first on narrow screens (the help page lists them all). "Esc Stop" shows while work can be cancelled.
    /// </summary>
    private IReadOnlyList<(KeyHint Hint, Key Key, Action? Action)> WindowKeys() =>
    [
        // Esc and the Ctrl keys are window commands (bound in BindWindowKeys); the function keys run their action.
        (new KeyHint("Esc", "Esc", "Stop", 1), Key.Esc, null),
        (new KeyHint("F2", "F2", "Edit", 2), Key.F2, EditField),
        (new KeyHint("F3", "F3", "Page", 3), Key.F3, NextPage),
        (new KeyHint("F5", "F5", "Sweep", 6), Key.F5, AskSweep),
        (new KeyHint("F9", "F9", "Target", 8), Key.F9, AskTarget),
        (new KeyHint("Ctrl+S", "^S", "Save", 5), Key.S.WithCtrl, null),
        (new KeyHint("Ctrl+Z", "^Z", "Undo", 7), Key.Z.WithCtrl, null),
        (new KeyHint("Ctrl+Q", "^Q", "Quit", 4), Key.Q.WithCtrl, null),
        (new KeyHint("F4", "F4", "Wide", 10), Key.F4, ToggleWide),
        (new KeyHint("F7", "F7", "Manifold", 11), Key.F7, NextManifold),
        (new KeyHint("F8", "F8", "Export", 9), Key.F8, AskExport),
        (new KeyHint("F1", "F1", "Help", 0, LabelWhenCut: "all keys"), Key.F1, ToggleHelp),
    ];

    /// <summary>True while a sweep, fit or target search runs (Esc stops it).</summary>
    private bool Cancellable => _sweeps.IsRunning || _targets.IsFitting || _targets.IsSolving;

    /// <summary>The key bar for the moment: Esc only while work runs, F1 "Back" on the help page, F2 "Fix" on the errors page.</summary>
    private void UpdateKeyBar() =>
        _keyBar.Hints = _windowKeys.Select(k => k.Hint).Where(h => h.Key != "Esc" || Cancellable).Select(h => h.Key switch
        {
            "F1" when _pageShown == Page.Help => h with { Label = "Back", LabelWhenCut = null },
            "F2" when _pageShown == Page.Errors => h with { Label = "Fix" },
            _ => h,
        }).ToList();

    private void BindWindowKeys()
    {
        // The function keys go through one command that looks up the pressed key (the key bar only displays them).
        var actions = _windowKeys.Where(k => k.Action is not null).ToDictionary(k => k.Key, k => k.Action!);
        AddCommand(Command.Toggle, context =>
        {
            if (context?.Binding is not KeyBinding { Key: { } key } || !actions.TryGetValue(key, out var action)) return false;
            action();
            return true;
        });
        foreach (var key in actions.Keys) KeyBindings.ReplaceCommands(key, Command.Toggle);
        AddCommand(Command.Save, () => { Save(null); return true; });
        AddCommand(Command.SaveAs, () => { AskSaveAs(); return true; });
        AddCommand(Command.Undo, () => { Report(_session.Undo()); return true; });
        AddCommand(Command.Redo, () => { Report(_session.Redo()); return true; });
        AddCommand(Command.Refresh, () => { AskReload(); return true; });
        AddCommand(Command.Quit, () => { RequestQuit(); return true; });
        AddCommand(Command.Cancel, CancelSomething);
        AddCommand(Command.Context, () => { ToggleLimits(); return true; });
        KeyBindings.ReplaceCommands(Key.S.WithCtrl, Command.Save);
        KeyBindings.ReplaceCommands(Key.W.WithCtrl, Command.SaveAs);
        KeyBindings.ReplaceCommands(Key.Z.WithCtrl, Command.Undo);
        KeyBindings.ReplaceCommands(Key.Y.WithCtrl, Command.Redo);
        KeyBindings.ReplaceCommands(Key.L.WithCtrl, Command.Refresh);
        KeyBindings.ReplaceCommands(Key.Q.WithCtrl, Command.Quit);
        KeyBindings.ReplaceCommands(Key.Esc, Command.Cancel);
        // Tab and Shift+Tab cycle board → form → page (the whole window, not Terminal.Gui's per-frame tab order)
        AddCommand(Command.NextTabStop, () => { CycleFocus(+1); return true; });
        AddCommand(Command.PreviousTabStop, () => { CycleFocus(-1); return true; });
        KeyBindings.ReplaceCommands(Key.Tab, Command.NextTabStop);
        KeyBindings.ReplaceCommands(Key.Tab.WithShift, Command.PreviousTabStop);
        // the quantities page: Enter chooses what is plotted, ←/→ move the cursor it shares with the spectrum
        // the matrix-elements page: Enter chooses the operator, ←/→ move the same cursor
        _page.Bind(Key.Enter, Command.Accept, () =>
        {
            if (_pageShown == Page.Quantities) AskQuantities();
            else if (_pageShown == Page.Matrix) AskMatrixOperator();
            else if (_pageShown == Page.Map) AskMapQuantity();
            else return false;
            return true;
        });
        _page.Bind(Key.CursorLeft, Command.Left, () => MoveCursorOnPage(-1));
        _page.Bind(Key.CursorRight, Command.Right, () => MoveCursorOnPage(1));
        // on the map, ↑ and ↓ move the cursor along the second axis instead of scrolling
        _page.ArrowOverride = step => _pageShown == Page.Map && _sweeps.MoveMapCursor(0, -step);
        _page.Bind(Key.L, Command.Context, () => { ToggleLimits(); return true; });
        _page.Bind(Key.L.WithShift, Command.Context, () => { ToggleLimits(); return true; });   // the help writes "L"
    }

    /// <summary>← → on a text page: the map's cursor on the map page, the spectrum's cursor on the pages that share it.</summary>
    private bool MoveCursorOnPage(int step)
    {
        if (_pageShown == Page.Map) return _sweeps.MoveMapCursor(step, 0);
        if (!CursorPage) return false;
        _spectrum.SetCursor(_sweeps.CursorIndex + step);
        return true;
    }

    /// <summary>Text pages on which ← → move the sweep cursor shared with the spectrum.</summary>
    private bool CursorPage => _pageShown is Page.Quantities or Page.Matrix or Page.Compare;

    /// <summary>
    /// Letters no panel uses reach the window here (after the focused view had its turn, so typing in a prompt never
    /// triggers them): a and b mark the comparison's points, p saves the sweep cursor as an operating point.
    /// </summary>
    protected override bool OnKeyDown(Key key)
    {
        if (_prompt.IsOpen || key.IsCtrl || key.IsAlt) return base.OnKeyDown(key);
        switch (key.KeyCode)
        {
            case Terminal.Gui.Drivers.KeyCode.A: Mark('a'); return true;
            case Terminal.Gui.Drivers.KeyCode.B: Mark('b'); return true;
            case Terminal.Gui.Drivers.KeyCode.P: AskSaveCursorAsPoint(); return true;
            default: return base.OnKeyDown(key);
        }
    }

    private void BindBoardKeys()
    {
        _board.Bind(Key.InsertChar, Command.Insert, () => { AskAdd(); return true; });
        _board.Bind(Key.Delete, Command.DeleteCharRight, () => { AskRemove(); return true; });
        _board.Bind(Key.F6, Command.Edit, () => { AskRename(); return true; });
    }

    // ---- layout -------------------------------------------------------------------------------------

    private bool Wide => Frame.Width >= 120 && Frame.Height >= 34;

    /// <summary>Rows under the pages: the status line (facts and a wrapped message) and the key bar.</summary>
    private int RowsBelowPages => _status.Rows + 1;

    /// <summary>Stacks key bar, status line and question bar from the bottom; the pages end above the status line.</summary>
    private void LayoutBottom()
    {
        int below = RowsBelowPages;
        _status.Y = Pos.AnchorEnd(below);
        _prompt.Y = Pos.AnchorEnd(below + _prompt.Rows);
        _formFrame.Height = _pageFrame.Height = Dim.Fill(below);
        if (!(Wide && _pageShown is not (Page.Help or Page.Errors))) _plotFrame.Height = Dim.Fill(below);
    }

    /// <summary>Columns inside the page frame (the board column and the borders taken off).</summary>
    private int PageWidth => Math.Max(20, Viewport.Width - (!_wideOff && _pageShown is not (Page.Help or Page.Errors) ? LeftWidth : 0) - 2);

    /// <summary>Columns for a form row's text (inside the frame, after the "›" marker).</summary>
    private int FormWidth => Math.Max(10, LeftWidth - 3);

    private void ApplyLayout()
    {
        // Help and errors take the whole width, so no line is cut and long lists wrap less.
        bool left = !_wideOff && _pageShown is not (Page.Help or Page.Errors);
        _boardFrame.Visible = _formFrame.Visible = left;
        _boardFrame.Width = _formFrame.Width = LeftWidth;
        int x = left ? LeftWidth : 0;
        bool plotPage = _pageShown == Page.Spectrum;
        if (Wide && _pageShown is not (Page.Help or Page.Errors))
        {
            _plotFrame.Visible = _pageFrame.Visible = true;
            _plotFrame.X = _pageFrame.X = x;
            _plotFrame.Y = 0;
            _plotFrame.Height = Dim.Percent(55);
            _pageFrame.Y = Pos.Bottom(_plotFrame);
        }
        else
        {
            _plotFrame.Visible = plotPage;
            _pageFrame.Visible = !plotPage;
            _plotFrame.X = _pageFrame.X = x;
            _plotFrame.Y = _pageFrame.Y = 0;
        }
        _status.Refit();
        _prompt.Refit();
        LayoutBottom();
        ShowFields();
        UpdateStatus();
        RefreshPage();
    }

    /// <summary>The smallest terminal the layout is made for (a common SSH default).</summary>
    public const int MinimumWidth = 80, MinimumHeight = 24;

    private (int Width, int Height) _sizeWarned;

    /// <summary>Says once per size when the terminal is smaller than the layout is made for (text is then cut).</summary>
    private void SayIfTooSmall()
    {
        var size = (Frame.Width, Frame.Height);
        if (size.Width <= 0 || size.Height <= 0 || size == _sizeWarned) return;
        if (size.Width >= MinimumWidth && size.Height >= MinimumHeight) { _sizeWarned = default; return; }
        _sizeWarned = size;
        Say($"⚠ the terminal is {size.Width}×{size.Height}; the screen is laid out for {MinimumWidth}×{MinimumHeight} or more, so some text is cut", warning: true);
    }

    private void ToggleWide()
    {
        _wideOff = !_wideOff;
        if (_wideOff && (_board.HasFocus || _form.HasFocus)) FocusPage();
        ApplyLayout();
    }

    /// <summary>Which panel has the keyboard: "board", "form", "page" (spectrum, crossings or text page) or "" (a prompt).</summary>
    public string FocusedPanel => _board.HasFocus ? "board" : _form.HasFocus ? "form"
        : _spectrum.HasFocus || _crossingList.HasFocus || _page.HasFocus ? "page" : "";

    /// <summary>Moves focus to the next (or previous) of board, form and page that is on screen.</summary>
    private void CycleFocus(int direction)
    {
        if (_prompt.IsOpen) return;
        var order = new List<View>();
        if (_boardFrame.Visible) { order.Add(_board); order.Add(_form); }
        View page = _plotFrame.Visible && _pageShown == Page.Spectrum ? _spectrum : _crossingList.Visible ? _crossingList : _page;
        order.Add(page);
        int current = order.FindIndex(v => v.HasFocus);
        int next = current < 0 ? 0 : (current + direction + order.Count) % order.Count;
        order[next].SetFocus();
        UpdateKeyBar();
    }

    private void FocusPage()
    {
        if (_plotFrame.Visible && _pageShown == Page.Spectrum) _spectrum.SetFocus();
        else if (_crossingList.Visible) _crossingList.SetFocus();
        else _page.SetFocus();
    }

    private void NextPage()
    {
        var next = _pageShown switch
        {
            Page.States => Page.Shifts,
            Page.Shifts => Page.Spectrum,
            Page.Spectrum => Page.Crossings,
            Page.Crossings => Page.Quantities,
            Page.Quantities => Page.Matrix,
            Page.Matrix => Page.Compare,
            Page.Compare => Page.Map,
            _ => Page.States,
        };
        ShowPage(next);
    }

    public void ShowPage(Page page)
    {
        if (page == Page.Help && _pageShown != Page.Help) _pageBeforeHelp = _pageShown;
        if (page != _pageShown) _page.ScrollToTop();
        _pageShown = page;
        UpdateKeyBar();
        ApplyLayout();
        FocusPage();
    }

    private void ToggleHelp()
    {
        if (_pageShown == Page.Help) ShowPage(_pageBeforeHelp);
        else { _showLimits = false; ShowPage(Page.Help); }
    }

    private void ToggleLimits()
    {
        if (_pageShown != Page.Help) return;
        _showLimits = !_showLimits;
        _page.ScrollToTop();
        RefreshPage();
    }

    private bool? CancelSomething()
    {
        // the result of a cancelled fit or search is dropped when it arrives, so the device stays as it was
        if (_targets.Cancel() || _sweeps.Cancel()) return true;
        if (_pageShown == Page.Help) { ShowPage(_pageBeforeHelp); return true; }
        if (_sweeps.LeavePointView()) return true;
        return true;   // Esc never quits (the framework's default quit key is Esc); Ctrl+Q does, through the guard
    }

    // ---- board and form -------------------------------------------------------------------------

    private void OnDocumentChanged()
    {
        var document = _session.Document;
        Title = "LevelDesign — " + (_session.Path is null ? "demo device" : Path.GetFileName(_session.Path));
        if (document is null)
        {
            _nodes = [];
            _board.SetLines([new TextLine("(no device)")]);
            _form.SetLines([]);
            if (_session.LoadErrors.Count > 0) ShowPage(Page.Errors);
            UpdateStatus();
            return;
        }
        // a new element or coupler is selected; otherwise the selection stays on its item
        string? selectedId = _selectAfterEdit ?? (_board.SelectedIndex < _nodes.Count ? _nodes[_board.SelectedIndex].Id : null);
        _selectAfterEdit = null;
        _nodes = BoardOutline.Nodes(document);
        int found = _nodes.ToList().FindIndex(n => n.Id == selectedId && n.Kind != BoardNodeKind.Group);
        int select = found >= 0 ? found : Math.Min(_board.SelectedIndex, _nodes.Count - 1); // a renamed item keeps its place
        if (selectedId is null) select = Math.Max(0, _nodes.ToList().FindIndex(n => n.Kind == BoardNodeKind.Element));
        _board.SetLines(_nodes.Select(n => new TextLine(new string(' ', 2 * n.Depth) + (n.Kind == BoardNodeKind.Group ? "▾ " : "") + n.Text,
            Heading: n.Kind is BoardNodeKind.Group or BoardNodeKind.Device)).ToList(), select);
        ShowFields();
        if (_pageShown == Page.Errors) ShowPage(Page.States);
        // Saving changes only the unsaved mark, and an operating point, sweep or spread table leaves the device as it
        // was: neither needs a new computation (a map's sweep can take tens of seconds).
        if (_point.Follow(document, out var before)) _sweeps.DeviceChanged();
        else _sweeps.PointsEdited(before, document, OnNamedPointShown);
        UpdateStatus();
    }

    private void ShowFields()
    {
        var document = _session.Document;
        if (document is null || _board.SelectedIndex >= _nodes.Count) { _form.SetLines([]); return; }
        var node = _nodes[_board.SelectedIndex];
        _fields = BoardOutline.Fields(document, node, _point.Snapshot?.Spectrum.Couplers);
        _formFrame.Title = node.Kind switch
        {
            BoardNodeKind.Element => $"Parameters: {node.Id}",
            BoardNodeKind.Coupler => $"Coupler: {node.Id}",
            BoardNodeKind.Bias => $"Bias: {node.Id}",
            BoardNodeKind.Point => $"Point: {node.Id}",
            _ => "Device",
        };
        // Another item starts at its first editable row; the same item (after an edit) keeps the row.
        int first = Math.Max(0, _fields.ToList().FindIndex(f => f.Editable));
        int select = node.Id == _formItemId && node.Kind == _formItemKind ? Math.Min(_form.SelectedIndex, _fields.Count - 1) : first;
        (_formItemId, _formItemKind) = (node.Id, node.Kind);
        _form.SetLines(FormRowText.Build(_fields, FormWidth), Math.Max(0, select));
    }

    private void EditField()
    {
        if (_session.Document is null && _session.FixableError is DeviceFileError error) { AskFix(error); return; }
        if (_session.Document is null) { Say("no device is open", warning: true); return; }
        if (_form.SelectedIndex >= _fields.Count) return;
        var field = _fields[_form.SelectedIndex];
        if (!field.Editable) { Say($"{field.Name} = {field.FullText}: shown for reference, not edited here (· marks read-only rows)"); return; }
        _prompt.Ask($"{field.FieldPath} =   ({field.Hint})", field.StartText, text =>
        {
            var outcome = _session.SetValue(field.FieldPath!, text);
            if (!outcome.Accepted) return $"{field.Name} stays {field.StartText}: {outcome.Message}";
            Say(outcome.Message + (_sweeps.Request is null ? "" : "; the sweep re-runs shortly"));
            return null;
        });
    }

    /// <summary>A file that did not load: offer the first error's value for fixing, then the next, until it loads.</summary>
    private void AskFix(DeviceFileError error)
    {
        string current = RawValueFix.ValueAt(_session.LoadedText!, error.Line, error.Column) ?? "";
        _prompt.Ask($"fix line {error.Line} [{error.Field}]: {error.Message}", current, text =>
        {
            var outcome = _session.FixLoadError(error, text);
            Say(outcome.Message, warning: !outcome.Accepted);
            if (!outcome.Accepted && _session.FixableError is DeviceFileError next) _scheduler.Post(() => AskFix(next));
            return null;
        });
    }

    private string? SelectedItemId(params BoardNodeKind[] kinds) =>
        _board.SelectedIndex < _nodes.Count && kinds.Contains(_nodes[_board.SelectedIndex].Kind) ? _nodes[_board.SelectedIndex].Id : null;

    private void AskAdd()
    {
        // every kind the file format has, from the kinds' own descriptions
        var choices = new Dictionary<char, Action>();
        foreach (var kind in ElementKindCatalog.All) choices[kind.InsertLetter] = () => AskNewElement(kind);
        foreach (var kind in CouplerKindInfo.All) choices[kind.InsertLetter] = () => AskNewCoupler(kind);
        // lines of at most 60 columns, broken between choices (the prompt fits 80×24 and wider)
        _prompt.Choose(TextFit.Packed("add: ", ElementKindCatalog.All.Select(k => $"{k.InsertLetter} {k.InsertName}"), 60)
            + "\n" + TextFit.Packed("couplers: ", CouplerKindInfo.All.Select(k => $"{k.InsertLetter} {k.Name}"), 60), choices);
    }

    private void AskNewElement(ElementKindInfo kind) =>
        _prompt.Ask($"id of the new {kind.InsertName} (default values, marked in the file)",
            _session.Document?.NewElementId(kind.InsertLetter.ToString()) ?? "", id =>
        {
            _selectAfterEdit = id.Trim();
            var outcome = _session.AddElement(kind, id.Trim());
            Report(outcome);
            return outcome.Accepted ? null : outcome.Message;
        });

    private void AskNewCoupler(CouplerKindInfo kind)
    {
        var document = _session.Document;
        if (document is null) { Say("no device is open", warning: true); return; }
        string id = document.NewCouplerId(out string a, out string b);
        string form = kind.NeedsOperators ? "ID ELEMENT_A ELEMENT_B OPERATOR_A OPERATOR_B g" : "ID ELEMENT_A ELEMENT_B g";
        string suggestion = kind.NeedsOperators ? $"{id} {a} {b} n n 10 MHz" : $"{id} {a} {b} 10 MHz";
        _prompt.Ask($"new {kind.Name} coupler: {form}", suggestion, text =>
        {
            int needed = kind.NeedsOperators ? 5 : 3;
            var w = text.Split(' ', needed + 1, StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries);
            if (w.Length < needed) return $"write {form}, e.g. {suggestion} (g may be left out: 10 MHz, marked as a default)";
            _selectAfterEdit = w[0];
            var outcome = _session.AddCoupler(kind, w[0], w[1], w[2], w.Length > needed ? w[needed] : null,
                kind.NeedsOperators ? (w[3], w[4]) : null);
            Report(outcome);
            return outcome.Accepted ? null : outcome.Message;
        });
    }

    private void AskRemove()
    {
        string? id = SelectedItemId(BoardNodeKind.Element, BoardNodeKind.Coupler, BoardNodeKind.Bias);
        if (id is null) { Say("select an element, coupler or bias to remove"); return; }
        var also = _session.Document?.AlsoRemoved(id) ?? [];
        string with = also.Count == 0 ? "" : $" with {string.Join(", ", also)}";
        _prompt.Choose($"remove '{id}'{with}?\ny remove · Esc keep",
            new Dictionary<char, Action> { ['y'] = () => Report(_session.Remove(id)) });
    }

    private void AskRename()
    {
        string? id = SelectedItemId(BoardNodeKind.Element, BoardNodeKind.Coupler, BoardNodeKind.Bias);
        if (id is null) { Say("select an element, coupler or bias to rename"); return; }
        _prompt.Ask($"rename '{id}' to (every reference follows)", id, text =>
        {
            var outcome = _session.Rename(id, text.Trim());
            Report(outcome);
            return outcome.Accepted ? null : outcome.Message;
        });
    }

    // ---- messages -------------------------------------------------------------------------------

    private bool Report(EditOutcome outcome)
    {
        if (outcome.Accepted && _session.AutosaveProblem is string problem)
            Say($"{outcome.Message} · ⚠ autosave failed ({problem}); Ctrl+S saves", warning: true);
        else Say(outcome.Accepted ? outcome.Message : "✗ " + outcome.Message, warning: !outcome.Accepted);
        return outcome.Accepted;
    }

    private void Say(string message, bool warning = false)
    {
        _status.Message = message;
        _status.MessageIsWarning = warning;
        UpdateStatus();
    }

    private void UpdateStatus()
    {
        string file = _session.Path is null ? "demo" : Path.GetFileName(_session.Path);
        string dirty = _session.IsDirty ? " ● unsaved" : "";
        string disk = (_files.DiskChanged ? " ⚠ changed on disk" : "") + (_session.IsReadOnly ? " read-only" : "")
                      + (_session.AutosaveProblem is null ? "" : " ⚠ autosave failed");
        string computed = _point.IsComputing ? (_point.ProgressText.Length > 0 ? "⟳ computing, " + _point.ProgressText : "⟳ computing") : _point.Snapshot is null ? "not computed" : $"at {_point.Snapshot.ComputedAt:HH:mm:ss} ({_point.Snapshot.Elapsed.TotalSeconds:0.00} s)";
        string trunc = _point.Snapshot?.ConvergenceText ?? "…";
        string work = string.Join(" · ", new[] { _sweeps.IsRunning ? _sweeps.ProgressText : "", _targets.IsFitting ? "⟳ fitting" : "", _targets.IsSolving ? "⟳ solving" : "" }.Where(w => w.Length > 0));
        // Ranks: what is left out first on a narrow screen is the largest (the time of the last result, then the eigensolver).
        _status.SetFacts(
        [
            ($"{file}{dirty}{disk}", 0),
            ($"eigen {_point.EigenPath}", 3),
            ($"trunc {trunc}", 2),
            (computed, 4),
            (work.Length > 0 ? work + " (Esc cancels)" : "", 1),
            (Frame.Width is > 0 and < MinimumWidth || Frame.Height is > 0 and < MinimumHeight ? $"⚠ smaller than {MinimumWidth}×{MinimumHeight}" : "", 1),
        ]);
        UpdateKeyBar();
    }
}

using System.Diagnostics;
using LevelDesign.Core.Composite;
using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Presentation;
using LevelDesign.Core.Sweeps;
using LevelDesign.Ui.Compute;
using LevelDesign.Ui.Session;
using LevelDesign.Ui.Text;

namespace LevelDesign.Ui.Controllers;

/// <summary>
/// The sweep on screen and what the state pages show: the last request, its result, series and crossings, the
/// manifold, the spectrum and map cursors, a named point's view, the comparison's marks and the chosen quantities.
/// Decides when an edit makes the sweep stale and re-runs it, and which point the state pages show (the cursor's,
/// else a named point's, else the file's). No screen types: the view asks it and draws.
/// </summary>
public sealed class SweepController
{
    /// <summary>Edits in quick succession re-run the sweep once, after the last of them.</summary>
    public static readonly TimeSpan ResweepPause = TimeSpan.FromMilliseconds(600);

    private readonly EditSession _session;
    private readonly IUiScheduler _scheduler;
    private readonly ISweepService _service;
    private readonly LatestOnly _jobs = new(), _namedPointJobs = new();
    private object? _resweepTimer;
    private string? _mapQuantity;
    private MapGrid? _mapGrid;
    private (SweepResult Sweep, string Quantity, double Threshold)? _mapGridKey;

    public SweepController(EditSession session, IUiScheduler scheduler, ISweepService service)
    {
        _session = session;
        _scheduler = scheduler;
        _service = service;
    }

    /// <summary>The state changed: the view redraws the spectrum and the page.</summary>
    public event Action? Changed;

    /// <summary>A running sweep advanced: the view redraws the status only.</summary>
    public event Action? Progressed;

    /// <summary>A message for the status line (text, warning).</summary>
    public event Action<string, bool>? Said;

    /// <summary>The last sweep asked for; an edit re-runs it.</summary>
    public SweepRequest? Request { get; private set; }
    public SweepResult? Result { get; private set; }
    public SpectrumSeries? Series { get; private set; }
    public IReadOnlyList<CrossingMark> Crossings { get; private set; } = [];

    /// <summary>A finished one-axis sweep whose crossings are still being searched.</summary>
    public bool CrossingsPending { get; private set; }
    public Manifold Manifold { get; private set; } = Manifold.UpToTwo;
    public bool IsRunning { get; private set; }

    /// <summary>The sweep on screen is for the device before the last edit (its re-run is pending or running).</summary>
    public bool IsStale { get; private set; }
    public string ProgressText { get; private set; } = "";

    /// <summary>The spectrum's status text: progress, stale, stopped or cancelled.</summary>
    public string SpectrumStatus { get; private set; } = "no sweep yet: F5 starts one";

    /// <summary>The spectrum cursor's sweep point (one-axis sweeps), kept inside the sweep.</summary>
    public int CursorIndex { get; private set; }

    /// <summary>The map cursor: indices along the first and second axis.</summary>
    public (int I, int J) MapCursor { get; private set; }

    /// <summary>The sweep point under the map cursor, or −1 (no two-axis sweep).</summary>
    public int MapPoint { get; private set; } = -1;

    /// <summary>The sweep point under the cursor, as the state pages show it; null when they show no sweep point.</summary>
    public PointSnapshot? CursorSnapshot { get; private set; }

    /// <summary>A named point shown on the state pages (Enter on it on the board); null once the cursor moves or the file changes.</summary>
    public (string Name, PointSnapshot Snapshot)? PointView { get; private set; }

    public CompareText.Mark? MarkA { get; private set; }
    public CompareText.Mark? MarkB { get; private set; }

    /// <summary>Quantities chosen for the quantities page; null: the default set (every ZZ, purity of single excitations).</summary>
    public IReadOnlyList<string>? QuantityNames { get; private set; }

    private string _summary = "";

    public bool IsMapSweep => Result is { Plan.Axes.Count: 2, Points.Count: > 0 };

    private double Threshold => _session.Document?.PurityThreshold ?? Core.Analysis.Conventions.DefaultPurityThreshold;

    // ---- running ------------------------------------------------------------------------------------

    /// <summary>The text offered by F5: the last request, else one made from the file.</summary>
    public string Suggestion(DeviceDocument document) => Request?.Text ?? SweepRequestParser.Suggest(document);

    /// <summary>Reads an F5 entry and starts it; returns why it was refused, or null.</summary>
    public string? Ask(string text)
    {
        if (_session.Document is not { } document) return "no device is open";
        var request = SweepRequestParser.Parse(text, document, out string? error);
        if (request is null) return error;
        Request = request;
        Start(request);
        return null;
    }

    /// <summary>
    /// The device changed: a sweep on screen is marked stale and the last request re-runs after a pause, so a run of
    /// edits costs one sweep. Nothing happens before the first sweep.
    /// </summary>
    public void DeviceChanged()
    {
        PointView = null;   // a named point's states were for the device before this change
        _namedPointJobs.Cancel();
        if (Request is null) return;
        if (_resweepTimer is not null) _scheduler.Cancel(_resweepTimer);
        if (IsRunning) { _jobs.Cancel(); IsRunning = false; }
        IsStale = Result is not null;
        SpectrumStatus = "stale: re-running after the edit…";
        Progressed?.Invoke();
        _resweepTimer = _scheduler.Delay(ResweepPause, () =>
        {
            _resweepTimer = null;
            if (Request is not null && _session.Document is not null) Start(Request);
        });
    }

    public void Start(SweepRequest request)
    {
        var document = _session.Document;
        if (document is null) return;
        var (generation, token) = _jobs.Begin();
        IsRunning = true;
        CrossingsPending = false;
        int total = Total(request.Axes);
        ProgressText = $"sweeping 0/{total}";
        SpectrumStatus = "⟳ " + ProgressText;
        Progressed?.Invoke();
        var plan = new SweepPlan(request.Axes);
        var progress = new PostingProgress<SweepProgress>(_scheduler, p =>
        {
            if (!_jobs.IsCurrent(generation)) return;
            ProgressText = $"sweeping {p.Done}/{p.Total} {Bar(p.Done, p.Total)}";
            SpectrumStatus = "⟳ " + ProgressText;
            Progressed?.Invoke();
        });
        var clock = Stopwatch.StartNew();
        // a point that fails stops the sweep; the points before it stay on screen, with the reason in the status line
        var options = new SweepOptions { Solver = new DeviceSolver(), KeepPointsOnFailure = true };
        Task.Run(async () =>
        {
            try
            {
                var result = await _service.RunAsync(values => document.Resolve(request.Axes, values), plan, options, progress, token).ConfigureAwait(false);
                _scheduler.Post(() => Apply(generation, result, clock.Elapsed));
                if (result.Completed && request.Axes.Count == 1)
                {
                    // Crossings are refined by extra solves between sweep points, so they follow the sweep.
                    var crossings = CrossingFinder.Find(result, x => document.Resolve(request.Axes, [x]), CrossingOptionsFor(document, result), options.Solver, token);
                    _scheduler.Post(() => ApplyCrossings(generation, result, crossings));
                }
            }
            catch (OperationCanceledException) { }
            catch (Exception e) when (e is not OutOfMemoryException)
            {
                _scheduler.Post(() =>
                {
                    if (!_jobs.IsCurrent(generation)) return;
                    IsRunning = CrossingsPending = false;
                    SpectrumStatus = "sweep failed";
                    Said?.Invoke("✗ sweep failed: " + ProblemText.Describe(e), true);
                    Changed?.Invoke();
                });
            }
        }, CancellationToken.None);
    }

    /// <summary>Esc: stops a running sweep, keeping the points computed so far; false when none runs.</summary>
    public bool Cancel()
    {
        if (!IsRunning) return false;
        _jobs.Cancel();
        IsRunning = false;
        Said?.Invoke("sweep cancelled; the points computed so far stay on screen", false);
        return true;
    }

    /// <summary>The window closes: nothing more is computed or posted.</summary>
    public void Stop()
    {
        if (_resweepTimer is not null) _scheduler.Cancel(_resweepTimer);
        _resweepTimer = null;
        _jobs.Cancel();
        _namedPointJobs.Cancel();
    }

    /// <summary>How the screen searches a finished one-axis sweep for crossings.</summary>
    public static CrossingOptions CrossingOptionsFor(DeviceDocument document, SweepResult sweep) =>
        CrossingSearch.Options(sweep, PointsOnAxis(document, sweep).Select(p => p.Value).ToArray());

    /// <summary>The file's operating points on the swept axis, for the crossings page's nearest-point column.</summary>
    public IReadOnlyList<(string Name, double Value)> CrossingPoints() =>
        _session.Document is { } document && Result is { Plan.Axes.Count: 1 } sweep ? PointsOnAxis(document, sweep) : [];

    // the screen's sweep starts from the file's biases, so a point that does not set the axis sits at the file's value
    private static IReadOnlyList<(string Name, double Value)> PointsOnAxis(DeviceDocument document, SweepResult sweep)
    {
        string axis = sweep.Plan.Axes[0].Path;
        return CrossingSearch.OperatingPoints(document, axis, CrossingSearch.FileValue(document, axis));
    }

    private void ApplyCrossings(int generation, SweepResult sweep, IReadOnlyList<Crossing> crossings)
    {
        if (!_jobs.IsCurrent(generation) || !ReferenceEquals(sweep, Result)) return;
        CrossingsPending = false;
        Crossings = CrossingMark.From(crossings, sweep);
        // the crossing search follows the sweep at once: keep the sweep's own summary in view
        Said?.Invoke($"{_summary} · {crossings.Count} crossing{(crossings.Count == 1 ? "" : "s")} found" + (Crossings.Count > 0 ? ", F3 lists them" : ""), false);
        Changed?.Invoke();
    }

    private static int Total(IReadOnlyList<SweepAxis> axes) => axes.Aggregate(1, (n, a) => n * Math.Max(1, a.Count));

    private static string Bar(int done, int total)
    {
        int filled = total == 0 ? 0 : (int)Math.Round(10.0 * done / total);
        return "[" + new string('#', filled) + new string('.', 10 - filled) + "]";
    }

    /// <summary>A finished (or stopped) sweep replaces the one on screen, unless a newer sweep or an edit superseded it.</summary>
    private void Apply(int generation, SweepResult result, TimeSpan elapsed)
    {
        if (!_jobs.IsCurrent(generation)) return;
        IsRunning = false;
        IsStale = false;
        Result = result;
        Crossings = [];
        CrossingsPending = result.Completed && result.Plan.Axes.Count == 1;
        RebuildSeries();
        int total = Total(result.Plan.Axes);
        SpectrumStatus = result.Completed ? "" : result.Failure is null ? $"cancelled: {result.Points.Count}/{total} points" : $"stopped: {result.Points.Count}/{total} points";
        _summary = result.Completed
            ? $"sweep done: {result.Points.Count} points in {elapsed.TotalSeconds:0.0} s"
            : result.Failure is { } failure
                ? $"✗ sweep stopped: the point at {SweepFiles.FailedAt(_session.Document!, result, failure)} failed ({ProblemText.Describe(failure.Error)}); {result.Points.Count} of {total} points kept"
                : $"sweep cancelled: {result.Points.Count} of {total} points kept";
        Said?.Invoke(_summary, result.Failure is not null);
        if (IsMapSweep) MoveMapCursor(0, 0); else MoveCursor(CursorIndex);
    }

    private void RebuildSeries()
    {
        if (Result is null || Result.Points.Count == 0) { Series = null; Crossings = []; return; }
        if (Result.Plan.Axes.Count != 1)
        {
            Series = null;
            SpectrumStatus = "a two-axis sweep: F3 to its map";
            return;
        }
        Series = SpectrumSeries.From(Result, Manifold);
    }

    /// <summary>F7: the next set of levels the spectrum shows.</summary>
    public void NextManifold()
    {
        Manifold = Manifold.Next();
        RebuildSeries();
        Said?.Invoke("spectrum shows " + Manifold.Describe(), false);
        Changed?.Invoke();
    }

    // ---- cursors and the point shown ------------------------------------------------------------------

    /// <summary>The spectrum cursor moved to a sweep point (kept inside the sweep); the state pages show that point.</summary>
    public void MoveCursor(int index)
    {
        if (Result is not { Points.Count: > 0 } sweep) { CursorSnapshot = null; Changed?.Invoke(); return; }
        CursorIndex = Math.Clamp(index, 0, sweep.Points.Count - 1);
        CursorSnapshot = PointComputer.FromSweepPoint(sweep.Points[CursorIndex], DateTime.Now);
        PointView = null;
        Changed?.Invoke();
    }

    /// <summary>Moves the map cursor by (di, dj) grid steps, kept on the grid; the state pages then show that point.</summary>
    public bool MoveMapCursor(int di, int dj)
    {
        if (!IsMapSweep || Result is not { } sweep) return false;
        var (x, y) = (sweep.Plan.Axes[0], sweep.Plan.Axes[1]);
        MapCursor = (Math.Clamp(MapCursor.I + di, 0, x.Count - 1), Math.Clamp(MapCursor.J + dj, 0, y.Count - 1));
        MapPoint = CurrentMapGrid(sweep).PointAt(MapCursor.I, MapCursor.J);
        CursorSnapshot = MapPoint >= 0 ? PointComputer.FromSweepPoint(sweep.Points[MapPoint], DateTime.Now) : null;
        PointView = null;
        Changed?.Invoke();
        return true;
    }

    /// <summary>The sweep point under the cursor: the map's on a two-axis sweep, the spectrum's otherwise.</summary>
    public int CursorPointIndex => IsMapSweep ? MapPoint : CursorIndex;

    /// <summary>What the state pages show: the cursor's sweep point, else a named point, else the file's biases.</summary>
    public PointSnapshot? Shown(PointSnapshot? file) => CursorSnapshot ?? PointView?.Snapshot ?? file;

    /// <summary>Where the shown point is, for the pages' headers.</summary>
    public string Where()
    {
        if (CursorSnapshot is not null && Result is { } sweep && CursorPointIndex is int index and >= 0 && index < sweep.Points.Count)
        {
            var p = sweep.Points[index];
            string axes = string.Join(", ", sweep.Plan.Axes.Select((a, i) => $"{a.Path} = {AxisText(a.Path, p.AxisValues[i])}"));
            return $"{axes} (point {p.Index + 1}/{sweep.Points.Count}{(IsStale ? ", stale" : "")})";
        }
        if (PointView is var (name, _)) return PointWhere(name);
        return "the biases in the file";
    }

    /// <summary>A bias in its control unit; plain axes as before (4 decimals), so "0.1000" reads as a flux.</summary>
    public string AxisText(string path, double value) => ShownUnit.Of(_session.Document, path).Text(value);

    private string PointWhere(string name)
    {
        var point = _session.Document?.Points.FirstOrDefault(p => p.Name == name);
        return point is null ? $"point {name}" : $"point {name} ({BoardOutline.PointText(_session.Document!, point)})";
    }

    /// <summary>The crossing on row <paramref name="at"/> of the crossings page; the spectrum cursor goes to its nearest point.</summary>
    public CrossingMark? CrossingAt(int at) => at >= 0 && at < Crossings.Count ? Crossings[at] : null;

    // ---- named points -------------------------------------------------------------------------------------

    /// <summary>Computes the device at a named operating point off the UI thread; <paramref name="shown"/> runs once its states are shown.</summary>
    public void ShowNamedPoint(string name, Action shown)
    {
        if (_session.Document is not { } document) return;
        Core.Model.Device device;
        try { device = document.AtPoint(name); }
        catch (ArgumentException e) { Said?.Invoke("✗ " + e.Message, true); return; }
        var (generation, token) = _namedPointJobs.Begin();
        Said?.Invoke($"⟳ computing the states at point {name}…", false);
        Task.Run(() =>
        {
            try
            {
                var snapshot = PointComputer.Compute(device, checkConvergence: false, token);
                _scheduler.Post(() =>
                {
                    if (!_namedPointJobs.IsCurrent(generation) || !ReferenceEquals(document, _session.Document)) return;
                    CursorSnapshot = null;
                    PointView = (name, snapshot);
                    shown();
                    Changed?.Invoke();
                    Said?.Invoke($"states at point {name}: a or b marks it for the comparison page; Esc on the board goes back to the file's biases", false);
                });
            }
            catch (OperationCanceledException) { }
            catch (Exception e) when (e is not OutOfMemoryException)
            {
                _scheduler.Post(() => Said?.Invoke($"✗ cannot compute point {name}: {ProblemText.Describe(e)}", true));
            }
        }, CancellationToken.None);
    }

    /// <summary>Back to the file's biases on the state pages (the named point view ends); false when none was shown.</summary>
    public bool LeavePointView()
    {
        if (PointView is null) return false;
        PointView = null;
        _namedPointJobs.Cancel();
        Changed?.Invoke();
        Said?.Invoke("states at the biases in the file", false);
        return true;
    }

    /// <summary>
    /// The document changed without changing the device (a point, sweep or spread table): a shown named point whose
    /// values were edited is computed again at its new values; a removed one is left.
    /// </summary>
    public void PointsEdited(DeviceDocument? before, DeviceDocument document, Action shown)
    {
        if (PointView is not var (name, _) || SamePoint(before, document, name)) return;
        PointView = null;
        if (document.Points.Any(p => p.Name == name)) ShowNamedPoint(name, shown); else Changed?.Invoke();
    }

    private static bool SamePoint(DeviceDocument? a, DeviceDocument b, string name) =>
        a?.Points.FirstOrDefault(p => p.Name == name)?.BiasValues is { } x && b.Points.FirstOrDefault(p => p.Name == name)?.BiasValues is { } y
        && x.Count == y.Count && x.All(v => y.TryGetValue(v.Key, out double w) && w == v.Value);

    // ---- comparison marks -------------------------------------------------------------------------------

    /// <summary>Marks what the state pages show now as A or B of the comparison; returns what was marked, or null if nothing is shown.</summary>
    public CompareText.Mark? Mark(char which, PointSnapshot? file)
    {
        if (Shown(file) is not { } shown) return null;
        var mark = new CompareText.Mark(Where(), shown.Spectrum, shown.Quantities);
        if (which == 'a') MarkA = mark; else MarkB = mark;
        Changed?.Invoke();
        return mark;
    }

    /// <summary>A, or the file's biases when nothing was marked as A (the everyday idle point).</summary>
    public CompareText.Mark? MarkAOr(PointSnapshot? file) =>
        MarkA ?? (file is not null ? new CompareText.Mark("the biases in the file", file.Spectrum, file.Quantities) : null);

    /// <summary>
    /// p: the cursor's bias values, each in its file unit, for a new operating point; null with the reason when the
    /// cursor is on no sweep point or the sweep moves a value that is not a bias.
    /// </summary>
    public IReadOnlyList<(string Bias, string Value)>? CursorAsPoint(out string refusal, out bool warning)
    {
        (refusal, warning) = ("", false);
        var document = _session.Document;
        if (document is null || Result is not { } sweep || CursorSnapshot is null || CursorPointIndex < 0 || CursorPointIndex >= sweep.Points.Count)
        {
            refusal = "p saves the sweep cursor as an operating point: run a sweep (F5) and move the cursor (← →) first";
            return null;
        }
        var point = sweep.Points[CursorPointIndex];
        var values = new List<(string Bias, string Value)>();
        for (int i = 0; i < sweep.Plan.Axes.Count; i++)
        {
            string path = sweep.Plan.Axes[i].Path;
            if (document.Bias(path) is null)
            {
                (refusal, warning) = ($"the sweep moves {path} directly; an operating point holds bias values, so sweep a bias to save points", true);
                return null;
            }
            values.Add((path, ShownUnit.Of(document, path).Text(point.AxisValues[i], 10)));
        }
        return values;
    }

    // ---- quantities and the map ---------------------------------------------------------------------------

    /// <summary>Chooses the quantities page's curves (comma-separated; empty: the default set); returns why a name was refused, or null.</summary>
    public string? ChooseQuantities(string text)
    {
        if (Result is not { Points.Count: > 0 } sweep) return "run a sweep first (F5)";
        var available = QuantitySeries.Available(sweep);
        var chosen = text.Split(',', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries).ToList();
        var unknown = chosen.FirstOrDefault(c => !available.Contains(c));
        if (unknown is not null) return $"'{unknown}' is not computed along this sweep{EditDistance.Suggestion(unknown, available)}";
        QuantityNames = chosen.Count == 0 ? null : chosen;
        Changed?.Invoke();
        return null;
    }

    /// <summary>The quantity shaded on the map: the chosen one while the sweep has it, else the first ZZ or the first qubit's f01.</summary>
    public string MapQuantity(SweepResult sweep) =>
        _mapQuantity is string chosen && QuantitySeries.Available(sweep).Contains(chosen) ? chosen : MapGrid.DefaultQuantity(sweep);

    public string? ChooseMapQuantity(string text)
    {
        if (!IsMapSweep || Result is not { } sweep) return "run a two-axis sweep first: F5, two axes separated by ';'";
        var available = QuantitySeries.Available(sweep);
        string chosen = text.Trim();
        if (!available.Contains(chosen)) return $"'{chosen}' is not computed along this sweep{EditDistance.Suggestion(chosen, available)}";
        _mapQuantity = chosen;
        Changed?.Invoke();
        return null;
    }

    /// <summary>The grid last laid out, kept while sweep, quantity and threshold stay (a cursor step only redraws).</summary>
    public MapGrid CurrentMapGrid(SweepResult sweep)
    {
        var key = (sweep, MapQuantity(sweep), Threshold);
        if (_mapGrid is null || _mapGridKey is not { } k || !ReferenceEquals(k.Sweep, sweep) || k.Quantity != key.Item2 || k.Threshold != key.Threshold)
            (_mapGrid, _mapGridKey) = (MapGrid.From(sweep, key.Item2, key.Threshold), key);
        return _mapGrid;
    }
}

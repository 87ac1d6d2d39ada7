using LevelDesign.Core.Presentation;
using System.Diagnostics;
using LevelDesign.Core.Composite;
using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Eigen;
using LevelDesign.Core.Model;
using LevelDesign.Core.Sweeps;
using LevelDesign.Ui.Compute;
using LevelDesign.Ui.Text;

namespace LevelDesign.Ui.Views;

public sealed partial class MainWindow
{
    private void StartPointCompute(Device device)
    {
        var (generation, token) = _pointJobs.Begin();
        _pointView = null;   // a named point's states were for the device before this change
        _namedPointJobs.Cancel();
        var coherenceInputs = _session.Document?.Coherence;
        _computing = true;
        _pointProgressText = "";
        // a module's point takes seconds: its iterations are shown, and an edit cancels it between two of them
        var progress = new PostingProgress<SolveProgress>(_scheduler, p =>
        {
            if (!_pointJobs.IsCurrent(generation) || !_computing) return;
            _pointProgressText = $"iteration {p.Iteration}: {p.Converged}/{p.Wanted} states converged";
            UpdateStatus();
        });
        Task.Run(() =>
        {
            try
            {
                string eigen = NativeEigen() ? "native" : "managed";
                var quick = PointComputer.Compute(device, checkConvergence: false, token, progress: progress);
                _scheduler.Post(() => ApplyPoint(generation, quick, eigen, final: false));
                var full = PointComputer.Compute(device, checkConvergence: true, token, coherenceInputs, progress, quick);
                _scheduler.Post(() => ApplyPoint(generation, full, eigen, final: true));
            }
            catch (OperationCanceledException) { }
            catch (Exception e) when (e is not OutOfMemoryException)
            {
                _scheduler.Post(() =>
                {
                    if (!_pointJobs.IsCurrent(generation)) return;
                    _computing = false;
                    _snapshot = null;
                    Say("✗ cannot compute: " + DescribeProblem(e), warning: true);
                    RefreshPage();
                });
            }
        }, CancellationToken.None);
    }

    private void ApplyPoint(int generation, PointSnapshot snapshot, string eigen, bool final)
    {
        if (!_pointJobs.IsCurrent(generation)) return; // stale: a newer edit superseded it
        _snapshot = snapshot;
        _eigenPath = eigen;
        _computing = !final;
        ShowFields();   // the coupler form shows g at the point just computed
        if (final && snapshot.Warnings.Count > 0) Say("⚠ " + string.Join("; ", snapshot.Warnings), warning: true);
        RefreshPage();
        UpdateStatus();
    }

    // ---- sweeps ---------------------------------------------------------------------------------

    private void AskSweep()
    {
        var document = _session.Document;
        if (document is null) { Say("no device is open", warning: true); return; }
        string suggestion = _lastSweep?.Text ?? SweepRequestParser.Suggest(document);
        _prompt.Ask($"sweep: {SweepRequestParser.Syntax}", suggestion, text =>
        {
            var request = SweepRequestParser.Parse(text, _session.Document!, out string? error);
            if (request is null) return error;
            _lastSweep = request;
            StartSweep(request);
            ShowPage(request.Axes.Count == 2 ? Page.Map : Page.Spectrum);
            return null;
        });
    }

    private void ScheduleResweep()
    {
        if (_resweepTimer is not null) _scheduler.Cancel(_resweepTimer);
        if (_sweeping) { _sweepJobs.Cancel(); _sweeping = false; }
        _sweepStale = _sweep is not null;
        _spectrum.Status = "stale: re-running after the edit…";
        _spectrum.SetNeedsDraw();
        _resweepTimer = _scheduler.Delay(ResweepPause, () =>
        {
            _resweepTimer = null;
            if (_lastSweep is not null && _session.Document is not null) StartSweep(_lastSweep);
        });
    }

    public void StartSweep(SweepRequest request)
    {
        var document = _session.Document;
        if (document is null) return;
        var (generation, token) = _sweepJobs.Begin();
        _sweeping = true;
        _crossingsPending = false;
        int total = request.Axes.Aggregate(1, (n, a) => n * Math.Max(1, a.Count));
        _progressText = $"sweeping 0/{total}";
        _spectrum.Status = "⟳ " + _progressText;
        UpdateStatus();
        var plan = new SweepPlan(request.Axes);
        var progress = new PostingProgress<SweepProgress>(_scheduler, p =>
        {
            if (!_sweepJobs.IsCurrent(generation)) return;
            _progressText = $"sweeping {p.Done}/{p.Total} {Bar(p.Done, p.Total)}";
            _spectrum.Status = "⟳ " + _progressText;
            _spectrum.SetNeedsDraw();
            UpdateStatus();
        });
        var clock = Stopwatch.StartNew();
        // a point that fails stops the sweep; the points before it stay on screen, with the reason in the status line
        var options = new SweepOptions { Solver = new DeviceSolver(), KeepPointsOnFailure = true };
        Task.Run(async () =>
        {
            try
            {
                var result = await _sweeps.RunAsync(values => document.Resolve(request.Axes, values), plan, options, progress, token).ConfigureAwait(false);
                _scheduler.Post(() => ApplySweep(generation, result, clock.Elapsed));
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
                    if (!_sweepJobs.IsCurrent(generation)) return;
                    _sweeping = _crossingsPending = false;
                    _spectrum.Status = "sweep failed";
                    Say("✗ sweep failed: " + DescribeProblem(e), warning: true);
                });
            }
        }, CancellationToken.None);
    }

    /// <summary>How the screen searches a finished one-axis sweep for crossings.</summary>
    public static CrossingOptions CrossingOptionsFor(DeviceDocument document, SweepResult sweep)
    {
        string axis = sweep.Plan.Axes[0].Path;
        var points = CrossingSearch.OperatingPoints(document, axis, CrossingSearch.FileValue(document, axis));
        return CrossingSearch.Options(sweep, points.Select(p => p.Value).ToArray());
    }

    /// <summary>The file's operating points on the swept axis, for the crossings page's nearest-point column.</summary>
    private IReadOnlyList<(string Name, double Value)> CrossingPoints()
    {
        if (_session.Document is not { } document || _sweep is not { Plan.Axes.Count: 1 } sweep) return [];
        string axis = sweep.Plan.Axes[0].Path;
        return CrossingSearch.OperatingPoints(document, axis, CrossingSearch.FileValue(document, axis));
    }

    private void ApplyCrossings(int generation, SweepResult sweep, IReadOnlyList<Crossing> crossings)
    {
        if (!_sweepJobs.IsCurrent(generation) || !ReferenceEquals(sweep, _sweep)) return;
        _crossingsPending = false;
        _crossings = CrossingMark.From(crossings, sweep);
        _spectrum.Show(_series, _crossings);
        // the crossing search follows the sweep at once: keep the sweep's own summary in view
        Say($"{_sweepSummary} · {crossings.Count} crossing{(crossings.Count == 1 ? "" : "s")} found" + (_crossings.Count > 0 ? ", F3 lists them" : ""));
        RefreshPage();
    }

    private static string Bar(int done, int total)
    {
        int filled = total == 0 ? 0 : (int)Math.Round(10.0 * done / total);
        return "[" + new string('#', filled) + new string('.', 10 - filled) + "]";
    }

    private void ApplySweep(int generation, SweepResult result, TimeSpan elapsed)
    {
        if (!_sweepJobs.IsCurrent(generation)) return; // a newer sweep or an edit made this one stale
        _sweeping = false;
        _sweepStale = false;
        _sweep = result;
        _crossings = [];
        _crossingsPending = result.Completed && result.Plan.Axes.Count == 1;
        RebuildSeries();
        int total = result.Plan.Axes.Aggregate(1, (n, a) => n * Math.Max(1, a.Count));
        _spectrum.Status = result.Completed ? "" : result.Failure is null ? $"cancelled: {result.Points.Count}/{total} points" : $"stopped: {result.Points.Count}/{total} points";
        _sweepSummary = result.Completed
            ? $"sweep done: {result.Points.Count} points in {elapsed.TotalSeconds:0.0} s"
            : result.Failure is { } failure
                ? $"✗ sweep stopped: the point at {SweepFiles.FailedAt(_session.Document!, result, failure)} failed ({DescribeProblem(failure.Error)}); {result.Points.Count} of {total} points kept"
                : $"sweep cancelled: {result.Points.Count} of {total} points kept";
        Say(_sweepSummary, warning: result.Failure is not null);
        if (IsMapSweep) MoveMapCursor(0, 0); else OnCursorMoved(_spectrum.CursorIndex);
    }

    private void RebuildSeries()
    {
        if (_sweep is null || _sweep.Points.Count == 0) { _series = null; _crossings = []; _spectrum.Show(null, []); return; }
        if (_sweep.Plan.Axes.Count != 1)
        {
            _series = null;
            _spectrum.Show(null, []);
            _spectrum.Status = "a two-axis sweep: F3 to its map";
            RefreshPage();
            return;
        }
        _series = SpectrumSeries.From(_sweep, _manifold);
        string axisPath = _series.AxisName;
        _spectrum.FormatBias = v => AxisText(axisPath, v);
        _spectrum.ManifoldText = _manifold.Describe();
        _spectrum.Show(_series, _crossings);
        RefreshPage();
    }

    private void NextManifold()
    {
        _manifold = _manifold.Next();
        _spectrum.ManifoldText = _manifold.Describe();
        RebuildSeries();
        Say("spectrum shows " + _manifold.Describe());
    }

    private void OnCursorMoved(int index)
    {
        if (_sweep is null || index >= _sweep.Points.Count) { _cursorSnapshot = null; RefreshPage(); return; }
        _cursorSnapshot = PointComputer.FromSweepPoint(_sweep.Points[index], DateTime.Now);
        _pointView = null;
        RefreshPage();
    }

    private string Where()
    {
        if (_cursorSnapshot is not null && _sweep is not null && CursorPointIndex is int index and >= 0 && index < _sweep.Points.Count)
        {
            var p = _sweep.Points[index];
            string axes = string.Join(", ", _sweep.Plan.Axes.Select((a, i) => $"{a.Path} = {AxisText(a.Path, p.AxisValues[i])}"));
            return $"{axes} (point {p.Index + 1}/{_sweep.Points.Count}{(_sweepStale ? ", stale" : "")})";
        }
        if (_pointView is var (name, _)) return PointWhere(name);
        return "the biases in the file";
    }

    /// <summary>A bias in its control unit; plain axes as before (4 decimals), so "0.1000" reads as a flux.</summary>
    private string AxisText(string path, double value) =>
        ShownUnit.Of(_session.Document, path).Text(value);

    /// <summary>The sweep point under the cursor: the map's on a two-axis sweep, the spectrum's otherwise.</summary>
    private int CursorPointIndex => IsMapSweep ? _mapPoint : _spectrum.CursorIndex;

    private PointSnapshot? Shown => _cursorSnapshot ?? _pointView?.Snapshot ?? _snapshot;

    private void RefreshPage()
    {
        _crossingList.Visible = _pageShown == Page.Crossings && _pageFrame.Visible;
        _page.Visible = !_crossingList.Visible;
        var page = _pageShown == Page.Spectrum ? Page.States : _pageShown; // in wide mode the lower page shows states
        _pageFrame.Title = page switch
        {
            Page.States => "States at cursor",
            Page.Shifts => "Shifts at cursor",
            Page.Crossings => "Crossings (Enter: go to)",
            Page.Quantities => "Quantities along the sweep (Enter: choose)",
            Page.Matrix => "Matrix elements (Enter: operator)",
            Page.Compare => "Compare A and B (a, b mark)",
            Page.Map => "Map of a two-axis sweep (Enter: quantity)",
            Page.Help => _showLimits ? "Help: limits of the model" : "Help: keys",
            Page.Errors => "Errors in the device file",
            _ => "",
        };
        var shown = Shown;
        int width = PageWidth;
        switch (page)
        {
            case Page.States:
                _page.SetLines(shown is null ? [new TextLine(_computing ? "⟳ computing…" : "nothing computed yet")] : StatesTableText.Build(shown.Spectrum, Where(), width, _session.Document?.PurityThreshold ?? Core.Analysis.Conventions.DefaultPurityThreshold));
                break;
            case Page.Shifts:
                _page.SetLines(shown is null ? [new TextLine(_computing ? "⟳ computing…" : "nothing computed yet")]
                    : ShiftsText.Build(shown.Quantities, Where(), _snapshot?.Convergence, _snapshot?.Spectrum.Device, _snapshot?.ConvergenceProblem, width,
                        ReferenceEquals(shown, _snapshot) ? _snapshot?.Coherence : null,
                        _session.Document?.PurityThreshold ?? Core.Analysis.Conventions.DefaultPurityThreshold));
                break;
            case Page.Help:
                _page.SetLines(_showLimits ? HelpText.Limits(width) : HelpText.Keys(width));
                break;
            case Page.Errors:
                _page.SetLines(LoadErrorText.Build(_session.LoadErrors, _session.LoadedText, width));
                break;
            case Page.Quantities:
                _page.SetLines(QuantityPage(width));
                break;
            case Page.Matrix:
                _page.SetLines(MatrixPage(width));
                break;
            case Page.Compare:
                _page.SetLines(ComparePage(width));
                break;
            case Page.Map:
                _page.SetLines(MapPage(width));
                break;
            case Page.Crossings:
                _crossingList.SetLines(CrossingsText.Build(_crossings, _sweep, _series?.AxisName, _crossingsPending,
                    v => ShownUnit.Of(_session.Document, _series?.AxisName ?? "").Text(v, 4), width - 1, CrossingPoints()));
                break;
        }
        SetNeedsDraw();
    }

    private void JumpToCrossing(int index)
    {
        int at = index - CrossingsText.HeaderLines;
        if (at < 0 || at >= _crossings.Count) return;
        var mark = _crossings[at];
        _spectrum.SetCursor(mark.PointIndex);
        ShowPage(Page.Spectrum);
        Say($"cursor at the sweep point nearest the crossing {mark.LabelA} ↔ {mark.LabelB} ({_series?.AxisName} = {ShownUnit.Of(_session.Document, _series?.AxisName ?? "").Text(mark.Crossing.Bias)})");
    }

    /// <summary>Quantities chosen for the quantities page; null: the default set (every ZZ, purity of single excitations).</summary>
    private IReadOnlyList<string>? _quantityNames;

    private IReadOnlyList<TextLine> QuantityPage(int width)
    {
        var sweep = _sweep;
        if (sweep is null || sweep.Plan.Axes.Count != 1 || sweep.Points.Count == 0)
            return QuantitiesText.Build([], [], 0, ShownUnit.Plain, "", width, 0, 0);
        string axis = sweep.Plan.Axes[0].Path;
        var names = _quantityNames ?? QuantitySeries.Default(sweep);
        var series = names.Select(n => QuantitySeries.From(sweep, n)).ToList();
        var values = sweep.Points.Select(p => p.AxisValues[0]).ToArray();
        int cursor = Math.Clamp(_spectrum.CursorIndex, 0, values.Length - 1);
        int height = Math.Max(8, _page.Viewport.Height);
        return QuantitiesText.Build(series, values, cursor, ShownUnit.Of(_session.Document, axis), axis, width, height,
            _session.Document?.PurityThreshold ?? Core.Analysis.Conventions.DefaultPurityThreshold);
    }

    private void AskQuantities()
    {
        if (_sweep is not { Points.Count: > 0 } sweep) { Say("run a sweep first (F5)"); return; }
        var available = QuantitySeries.Available(sweep);
        string current = string.Join(", ", _quantityNames ?? QuantitySeries.Default(sweep));
        _prompt.Ask($"plot along the sweep (comma-separated): {string.Join(", ", available.Take(12))}{(available.Count > 12 ? ", …" : "")}", current, text =>
        {
            var chosen = text.Split(',', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries).ToList();
            if (chosen.Count == 0) { _quantityNames = null; RefreshPage(); return null; }
            var unknown = chosen.FirstOrDefault(c => !available.Contains(c));
            if (unknown is not null)
                return $"'{unknown}' is not computed along this sweep{Core.DeviceFiles.EditDistance.Suggestion(unknown, available)}";
            _quantityNames = chosen;
            RefreshPage();
            return null;
        });
    }
}

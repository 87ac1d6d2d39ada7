using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Files;
using LevelDesign.Core.Presentation;
using LevelDesign.Core.Composite;
using LevelDesign.Core.Eigen;
using LevelDesign.Core.Sweeps;
using LevelDesign.Core.Units;
using LevelDesign.Ui.Compute;
using LevelDesign.Ui.Export;
using LevelDesign.Ui.Session;
using LevelDesign.Ui.Text;

namespace LevelDesign.Ui.Views;

public sealed partial class MainWindow
{
    private static readonly TimeSpan DiskCheckInterval = TimeSpan.FromSeconds(2);
    private bool _diskChanged;

    private void Save(string? asPath)
    {
        if (asPath is null && _session.Path is not null && _session.ChangedOnDisk)
        {
            _prompt.Choose($"{Path.GetFileName(_session.Path)} changed on disk since it was loaded.\no overwrite · Esc keep editing (Ctrl+L reloads)",
                new Dictionary<char, Action> { ['o'] = () => SaveNow(null) });
            return;
        }
        if (asPath is null && _session.Path is null) { AskSaveAs(); return; }
        if (asPath is null && _session.IsReadOnly) { OfferSaveAsForReadOnly(); return; }
        SaveNow(asPath);
    }

    /// <summary>Ctrl+S on a read-only file is refused (the file is never replaced behind its permissions); save as is offered.</summary>
    private void OfferSaveAsForReadOnly() =>
        _prompt.Choose($"{Path.GetFileName(_session.Path)} is read-only; it is not replaced.\nw save under another name · Esc keep editing",
            new Dictionary<char, Action> { ['w'] = AskSaveAs });

    /// <summary>Said once when a file opens or reloads: a read-only file can be edited but is saved only under another name.</summary>
    private void SayIfReadOnly()
    {
        if (_session.IsReadOnly) Say($"⚠ {Path.GetFileName(_session.Path)} is read-only: Ctrl+S is refused; Ctrl+W saves under another name", warning: true);
    }

    private bool SaveNow(string? asPath)
    {
        bool ok = Report(_session.Save(asPath));
        _diskChanged = _session.ChangedOnDisk;
        UpdateStatus();
        return ok;
    }

    private void AskSaveAs()
    {
        _prompt.Ask("save as (path)", _session.Path ?? "device.toml", text =>
        {
            string path = text.Trim();
            if (path.Length == 0) return "type a file path";
            var outcome = _session.Save(path);
            Report(outcome);
            return outcome.Accepted ? null : outcome.Message;
        });
    }

    private void AskReload()
    {
        if (_session.Path is null) { Say("the demo device has no file to reload"); return; }
        if (!_session.IsDirty) { Reload(); return; }
        _prompt.Choose("reloading drops your unsaved edits.  r reload · Esc stay", new Dictionary<char, Action> { ['r'] = Reload });
    }

    private void Reload()
    {
        _session.OpenFile(_session.Path!);
        _diskChanged = false;
        Say("reloaded " + _session.Path);
        SayIfReadOnly();
    }

    private void RequestQuit()
    {
        if (!_session.IsDirty) { _allowQuit = true; RequestStop(); return; }
        _prompt.Choose("unsaved changes.  s save and quit · d discard and quit · Esc stay", new Dictionary<char, Action>
        {
            ['s'] = () =>
            {
                if (_session.Path is null) { AskSaveAs(); return; }
                if (_session.IsReadOnly) { OfferSaveAsForReadOnly(); return; }
                if (SaveNow(null)) { _allowQuit = true; RequestStop(); }
            },
            ['d'] = () =>
            {
                _session.Discard();
                _allowQuit = true;
                RequestStop();
            },
        });
    }

    /// <summary>Every way of stopping (Ctrl+Q, the framework's quit key) passes the unsaved-changes guard.</summary>
    protected override bool OnIsRunningChanging(bool oldIsRunning, bool newIsRunning)
    {
        if (!newIsRunning && !_allowQuit && _session.IsDirty)
        {
            RequestQuit();
            return true;
        }
        if (!newIsRunning)
        {
            _sweepJobs.Cancel();
            _pointJobs.Cancel();
            _fitJobs.Cancel();
            _solveJobs.Cancel();
        }
        return base.OnIsRunningChanging(oldIsRunning, newIsRunning);
    }

    private void OfferRecovery()
    {
        if (_session.RecoveryText is null) return;
        _prompt.Choose($"found edits not saved by a session that ended early ({Path.GetFileName(_session.Path)}.autosave).\nr recover · d discard · Esc decide later",
            new Dictionary<char, Action>
            {
                ['r'] = () => Report(_session.AcceptRecovery()),
                ['d'] = () => { _session.DeclineRecovery(); Say("autosave discarded"); },
            });
    }

    private void WatchDisk()
    {
        _scheduler.Delay(DiskCheckInterval, () =>
        {
            bool changed = _session.ChangedOnDisk;
            if (changed && !_diskChanged) Say($"⚠ {Path.GetFileName(_session.Path)} changed on disk since it was loaded (Ctrl+L reloads, Ctrl+S asks before overwriting)", warning: true);
            _diskChanged = changed;
            UpdateStatus();
            WatchDisk();
        });
    }

    // ---- export and targets ---------------------------------------------------------------------

    private void AskExport()
    {
        if (Shown is null && _sweep is null) { Say("nothing to export yet"); return; }
        string folder = _session.Path is null ? "" : Path.GetDirectoryName(Path.GetFullPath(_session.Path)) ?? "";
        string suggestion = Path.Combine(folder, _sweep is null ? "states.csv" : "sweep.csv");
        _prompt.Ask("export to: .csv/.json = the sweep (or states if no sweep), .svg/.png = the spectrum plot", suggestion, text =>
        {
            string path = text.Trim();
            string extension = Path.GetExtension(path).ToLowerInvariant();
            try
            {
                switch (extension)
                {
                    case ".csv" or ".json" when _sweep is not null && _session.Document is { } document:
                        // the same file `leveldesign sweep` writes for this sweep
                        var table = SweepTable.From(_sweep, SweepTable.ReportedCount(_sweep), document.PurityThreshold);
                        AtomicFile.Write(path, extension == ".csv" ? SweepFiles.Csv(document, _sweep, table) : SweepFiles.Json(document, _sweep, table));
                        break;
                    case ".csv" or ".json":
                        // the same file `leveldesign spectrum --csv/--json` writes for this point
                        var spectrum = Shown!.Spectrum;
                        double threshold = _session.Document?.PurityThreshold ?? Core.Analysis.Conventions.DefaultPurityThreshold;
                        AtomicFile.Write(path, extension == ".csv" ? SpectrumFormatter.StatesCsv(spectrum, spectrum.Count)
                            : JsonValues.Write(SpectrumFormatter.Report(spectrum.Device.Name, spectrum, spectrum.Count, null, threshold)) + Environment.NewLine);
                        break;
                    case ".svg" or ".png":
                        if (_sweep is null || _sweep.Plan.Axes.Count != 1) return "run a one-axis sweep first (F5); the plot is its spectrum";
                        if (_plots is null || !_plots.Supports(extension)) return "plot export is not available in this build; use .csv or .json";
                        _plots.Export(_sweep, _crossings.Select(c => c.Crossing).ToList(), $"{_session.Document?.Device.Name}: spectrum along {_sweep.Plan.Axes[0].Path} ({_manifold.Describe()})",
                            path, _session.Document, e => _manifold.Admits(e));
                        break;
                    default:
                        return "end the name with .csv, .json, .svg or .png";
                }
            }
            catch (Exception e) when (e is IOException or UnauthorizedAccessException or ArgumentException or NotSupportedException or InvalidOperationException)
            {
                return "could not write: " + e.Message;
            }
            Say("exported " + path + (extension is ".svg" or ".png" && _crossingsPending ? " (crossings were still being searched, so none are marked)" : ""));
            return null;
        });
    }

    /// <summary>The question of F9, one form per line so both read whole at 80 columns.</summary>
    public const string TargetQuestion = "target: QUANTITY = VALUE by BIAS LOW to HIGH\nor  fit PATH [LOW..HIGH] [PATH ...] to QUANTITY = VALUE [at POINT][, ...]";

    private void AskTarget()
    {
        var document = _session.Document;
        if (document is null) { Say("no device is open", warning: true); return; }
        var bias = document.Biases.FirstOrDefault();
        string range = bias is null ? "qa.flux 0 to 0.5"
            : $"{bias.Name} {ShownUnit.Of(document, bias.Name).Text(bias.Offset)} to {ShownUnit.Of(document, bias.Name).Text(bias.Offset + bias.Period / 2)}";
        string quantity = _snapshot?.Quantities.Named().Keys.FirstOrDefault() ?? "qa.f01";
        _prompt.Ask(TargetQuestion, _lastTarget ?? $"{quantity} = 5 GHz by {range}", text =>
        {
            _lastTarget = text;   // offered again next time, so a search is repeated or adjusted, not retyped
            if (FitRequestParser.IsFit(text)) return StartFit(text, document);
            var request = TargetRequestParser.Parse(text, document, _snapshot?.Quantities.Named().Keys, out string? error);
            if (request is null) return error;
            StartSolve(document, request);
            return null;
        });
    }

    /// <summary>The last F9 entry, offered again.</summary>
    private string? _lastTarget;

    private void StartSolve(Core.DeviceFiles.DeviceDocument document, TargetRequest request)
    {
        var (generation, token) = _solveJobs.Begin();
        _solving = true;
        UpdateStatus();
        Say($"⟳ solving {request.Quantity} = {FrequencyText.Of(request.Quantity, request.GoalGHz)} by {request.Bias} ({request.ScanPoints}-point scan, hybridized steps sampled {TargetSolver.RefinementSamples}× finer, then Brent); Esc cancels");
        Task.Run(async () =>
        {
            try
            {
                var roots = await _targets.FindAllAsync(document, request, token).ConfigureAwait(false);
                _scheduler.Post(() =>
                {
                    if (!_solveJobs.IsCurrent(generation)) return;
                    _solving = false;
                    UpdateStatus();
                    OfferRoots(document, request, roots);
                });
            }
            catch (OperationCanceledException) { }
            catch (Exception e) when (e is not OutOfMemoryException)
            {
                _scheduler.Post(() =>
                {
                    if (!_solveJobs.IsCurrent(generation)) return;
                    _solving = false;
                    UpdateStatus();
                    Say("✗ target not solved: " + DescribeProblem(e), warning: true);
                });
            }
        }, CancellationToken.None);
    }

    /// <summary>Lists every root; a digit applies that one to the device (an ordinary, undoable edit of the bias value).</summary>
    private void OfferRoots(Core.DeviceFiles.DeviceDocument solvedOn, TargetRequest request, IReadOnlyList<TargetRoot> roots)
    {
        string goal = $"{request.Quantity} = {FrequencyText.Of(request.Quantity, request.GoalGHz)}";
        if (roots.Count == 0)
        {
            Say($"✗ {goal} is not reached for {request.Bias} in the range: no sign change on the {request.ScanPoints}-point scan; widen the range or add 'in 81'", warning: true);
            return;
        }
        Say(ReferenceEquals(solvedOn, _session.Document) ? "target search done; a digit applies one of the values listed, Esc leaves the device as it is"
            : "the device changed while solving; the roots are for the device as it was");
        var offers = new Dictionary<char, Action>();
        var parts = new List<string>();
        for (int i = 0; i < roots.Count && i < 9; i++)
        {
            var root = roots[i];
            string at = ShownUnit.Of(solvedOn, request.Bias).Text(root.Bias);
            string note = !root.Refined ? " (jump, not a root)"
                : root.IsHybridized(solvedOn.PurityThreshold) ? $" ! hybridized, purity {root.Purity.ToString("0.00", System.Globalization.CultureInfo.InvariantCulture)}" : "";
            parts.Add($"[{i + 1}] {at}{note}");
            offers[(char)('1' + i)] = () => ApplyRoot(request.Bias, root.Bias);
        }
        string more = roots.Count > 9 ? $" (+{roots.Count - 9} more)" : "";
        _prompt.Choose($"{goal} at {request.Bias} = {string.Join(" · ", parts)}{more}.\ndigit applies · Esc leave", offers,
            onCancel: () => Say("target values left; the device is unchanged"));
    }

    /// <summary>The latest fit's task (it ends as cancelled after Esc), for tests that check the work really stops.</summary>
    public Task? RunningFit { get; private set; }

    /// <summary>
    /// Runs the fit off the UI thread. Esc cancels it: the token reaches Core's fit loop and every full solve (through
    /// <see cref="CancellableEigenSolver"/>), a late result is dropped, and the device is never touched.
    /// </summary>
    private string? StartFit(string text, Core.DeviceFiles.DeviceDocument document)
    {
        if (_snapshot is null) return "wait until the device has been computed once (the quantity names come from it)";
        var request = FitRequestParser.Parse(text, document, _snapshot.Quantities.Named().Keys.ToArray(), out string? error);
        if (request is null) return error;
        var (generation, token) = _fitJobs.Begin();
        _fitting = true;
        UpdateStatus();
        Say($"⟳ fitting {string.Join(", ", request.Parameters.Select(p => p.Path))} to {request.Targets.Count} target(s) (least squares, full solves); Esc cancels");
        RunningFit = Task.Run(() =>
        {
            try
            {
                var solver = new DeviceSolver(new CancellableEigenSolver(EigenSolvers.Active, token));
                var result = ParameterFit.Fit(document.Device, request.Parameters, request.Targets, solver, cancellation: token);
                _scheduler.Post(() =>
                {
                    if (!_fitJobs.IsCurrent(generation)) return;
                    _fitting = false;
                    UpdateStatus();
                    OfferFit(document, request, result);
                });
            }
            // a cancellation passes through and ends the task as cancelled: nothing is posted back
            catch (Exception e) when (e is not (OutOfMemoryException or OperationCanceledException))
            {
                _scheduler.Post(() =>
                {
                    if (!_fitJobs.IsCurrent(generation)) return;
                    _fitting = false;
                    UpdateStatus();
                    Say("✗ fit failed: " + DescribeProblem(e), warning: true);
                });
            }
        }, token);
        return null;
    }

    /// <summary>Significant digits of a fit residual in the offer (the fitted values keep the digits written to the file).</summary>
    private const int ResidualDigits = 3;

    /// <summary>Fitted values in the file's units and each target's residual; 'a' writes all values as one undoable edit.</summary>
    private void OfferFit(Core.DeviceFiles.DeviceDocument fittedOn, FitRequest request, FitResult result)
    {
        Say(ReferenceEquals(fittedOn, _session.Document) ? $"fit done ({result.Iterations} steps); a applies the values, Esc leaves the device as it is"
            : "the device changed while fitting; the values are for the device as it was");
        string values = string.Join(" · ", request.Fields.Select(f => $"{f.DevicePath} = {f.Display(result.Values[f.DevicePath])}"));
        string residuals = string.Join(" · ", result.Residuals.Select(r =>
            $"{r.Target.Quantity} off by {ParameterText.Display(r.Residual, UnitKind.Frequency, ResidualDigits)}"));
        string bounds = result.AtBounds.Count > 0 ? $" · at a bound: {string.Join(", ", result.AtBounds)}" : "";
        string how = result.Converged ? $"fit ({result.Iterations} steps)" : $"fit NOT converged ({result.Message})";
        var edits = request.Fields.Select(f => (f.FieldPath!, f.Format(result.Values[f.DevicePath]))).ToList();
        _prompt.Choose($"{how}: {values}; {residuals}{bounds}.\na applies · Esc leave",
            new Dictionary<char, Action> { ['a'] = () => Report(_session.SetValues(edits, "fit applied: " + string.Join(", ", edits.Select(e => $"{e.Item1} = {e.Item2}")))) },
            onCancel: () => Say("fit result left; the device is unchanged"));
    }

    private void ApplyRoot(string biasOrPath, double value)
    {
        var document = _session.Document;
        if (document is null) return;
        var edit = TargetRequestParser.FieldFor(document, biasOrPath, value);
        if (edit is null) { Say($"✗ {biasOrPath} is not a value written in the file", warning: true); return; }
        Report(_session.SetValue(edit.Value.Field, edit.Value.Text));
    }
}

using LevelDesign.Core.Units;
using LevelDesign.Ui.Compute;
using LevelDesign.Ui.Export;
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
            _prompt.Choose($"{Path.GetFileName(_session.Path)} changed on disk since it was loaded.  o overwrite · Esc keep editing (Ctrl+L reloads)",
                new Dictionary<char, Action> { ['o'] = () => SaveNow(null) });
            return;
        }
        if (asPath is null && _session.Path is null) { AskSaveAs(); return; }
        SaveNow(asPath);
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
    }

    private void RequestQuit()
    {
        if (!_session.IsDirty) { _allowQuit = true; RequestStop(); return; }
        _prompt.Choose("unsaved changes.  s save and quit · d discard and quit · Esc stay", new Dictionary<char, Action>
        {
            ['s'] = () =>
            {
                if (_session.Path is null) { AskSaveAs(); return; }
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
        }
        return base.OnIsRunningChanging(oldIsRunning, newIsRunning);
    }

    private void OfferRecovery()
    {
        if (_session.RecoveryText is null) return;
        _prompt.Choose($"found edits not saved by a session that ended early ({Path.GetFileName(_session.Path)}.autosave).  r recover · d discard · Esc decide later",
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
                    case ".csv" or ".json" when _sweep is not null:
                        TableExport.Sweep(_sweep, path);
                        break;
                    case ".csv" or ".json":
                        TableExport.States(Shown!.Spectrum, Where(), path);
                        break;
                    case ".svg" or ".png":
                        if (_series is null) return "run a sweep first (F5); the plot is the spectrum";
                        if (_plots is null || !_plots.Supports(extension)) return "plot export needs src/LevelDesign.Plots, which is not in this build; use .csv or .json";
                        _plots.Export(_series, $"{_session.Document?.Device.Name}: {_manifold.Describe()}", path);
                        break;
                    default:
                        return "end the name with .csv, .json, .svg or .png";
                }
            }
            catch (Exception e) when (e is IOException or UnauthorizedAccessException or ArgumentException or NotSupportedException)
            {
                return "could not write: " + e.Message;
            }
            Say("exported " + path);
            return null;
        });
    }

    private void AskTarget()
    {
        var document = _session.Document;
        if (document is null) { Say("no device is open", warning: true); return; }
        string bias = document.Biases.FirstOrDefault()?.Name ?? "qa.flux";
        string quantity = _snapshot?.Quantities.Named().Keys.FirstOrDefault() ?? "qa.f01";
        _prompt.Ask("target: QUANTITY = VALUE by BIAS LOW HIGH", $"{quantity} = 5 GHz by {bias} 0 0.5", text =>
        {
            var request = ParseTarget(text, out string? error);
            if (request is null) return error;
            var store = _session.Store;
            var at = document;
            Say($"⟳ solving {request.Quantity} = {Numbers.GHz(request.GoalGHz)} GHz by {request.Bias}…");
            Task.Run(async () =>
            {
                TargetAnswer answer;
                try { answer = await _targets.SolveAsync(v => store.At(at, new Dictionary<string, double> { [request.Bias] = v }), request, CancellationToken.None).ConfigureAwait(false); }
                catch (Exception e) when (e is not OutOfMemoryException) { answer = new TargetAnswer(false, double.NaN, DescribeProblem(e)); }
                _scheduler.Post(() => OfferTarget(request, answer));
            });
            return null;
        });
    }

    private void OfferTarget(TargetRequest request, TargetAnswer answer)
    {
        if (!answer.Found) { Say("✗ target not solved: " + answer.Message, warning: true); return; }
        string field = _session.Document!.Biases.Any(b => b.Name == request.Bias)
            ? $"biases.{request.Bias}.value"
            : "elements." + request.Bias;
        _prompt.Choose($"{request.Bias} = {Numbers.Plain(answer.BiasValue, 6)} gives {request.Quantity} = {Numbers.GHz(request.GoalGHz)} GHz.  a apply · Esc leave",
            new Dictionary<char, Action>
            {
                ['a'] = () => Report(_session.SetValue(field, answer.BiasValue.ToString("R", System.Globalization.CultureInfo.InvariantCulture))),
            });
    }

    private static TargetRequest? ParseTarget(string text, out string? error)
    {
        error = "write QUANTITY = VALUE by BIAS LOW HIGH, e.g. qa.f01 = 5.2 GHz by qa_flux 0 0.5";
        int equals = text.IndexOf('='), by = text.IndexOf(" by ", StringComparison.Ordinal);
        if (equals < 0 || by < equals) return null;
        string quantity = text[..equals].Trim();
        if (!QuantityParser.TryParse(text[(equals + 1)..by].Trim(), UnitKind.Frequency, out double goal, out string unitError)) { error = unitError; return null; }
        var rest = text[(by + 4)..].Split(' ', StringSplitOptions.RemoveEmptyEntries);
        if (rest.Length != 3
            || !double.TryParse(rest[1], System.Globalization.NumberStyles.Float, System.Globalization.CultureInfo.InvariantCulture, out double low)
            || !double.TryParse(rest[2], System.Globalization.NumberStyles.Float, System.Globalization.CultureInfo.InvariantCulture, out double high))
            return null;
        error = null;
        return new TargetRequest(quantity, goal, rest[0], low, high);
    }
}

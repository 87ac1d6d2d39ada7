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
}

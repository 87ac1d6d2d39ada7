using LevelDesign.Ui.Controllers;

namespace LevelDesign.Ui.Views;

/// <summary>Save, save as, reload, quit, recovery and export: the questions and messages of the files controller.</summary>
public sealed partial class MainWindow
{
    private void Save(string? asPath)
    {
        switch (_files.StepFor(asPath))
        {
            case SaveStep.ConfirmOverwrite:
                _prompt.Choose(_files.OverwriteQuestion, new Dictionary<char, Action> { ['o'] = () => SaveNow(null) });
                break;
            case SaveStep.AskPath: AskSaveAs(); break;
            case SaveStep.OfferSaveAs: OfferSaveAsForReadOnly(); break;
            default: SaveNow(asPath); break;
        }
    }

    /// <summary>Ctrl+S on a read-only file is refused (the file is never replaced behind its permissions); save as is offered.</summary>
    private void OfferSaveAsForReadOnly() =>
        _prompt.Choose(_files.ReadOnlyQuestion, new Dictionary<char, Action> { ['w'] = AskSaveAs });

    /// <summary>Said once when a file opens or reloads: a read-only file can be edited but is saved only under another name.</summary>
    private void SayIfReadOnly()
    {
        if (_files.ReadOnlyWarning is string warning) Say(warning, warning: true);
    }

    private bool SaveNow(string? asPath)
    {
        bool ok = Report(_files.Save(asPath));
        UpdateStatus();
        return ok;
    }

    private void AskSaveAs()
    {
        _prompt.Ask("save as (path)", _session.Path ?? "device.toml", text =>
        {
            var outcome = _files.Save(text);
            Report(outcome);
            return outcome.Accepted ? null : outcome.Message;
        });
    }

    private void AskReload()
    {
        if (_files.ReloadRefusal is string refusal) { Say(refusal); return; }
        if (!_files.ReloadDropsEdits) { Reload(); return; }
        _prompt.Choose("reloading drops your unsaved edits.  r reload · Esc stay", new Dictionary<char, Action> { ['r'] = Reload });
    }

    private void Reload()
    {
        Say(_files.Reload());
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
            _sweeps.Stop();
            _point.Stop();
            _targets.Stop();
        }
        return base.OnIsRunningChanging(oldIsRunning, newIsRunning);
    }

    private void OfferRecovery()
    {
        if (_files.RecoveryQuestion is not string question) return;
        _prompt.Choose(question, new Dictionary<char, Action>
        {
            ['r'] = () => Report(_session.AcceptRecovery()),
            ['d'] = () => { _session.DeclineRecovery(); Say("autosave discarded"); },
        });
    }

    private void WatchDisk()
    {
        _scheduler.Delay(FilesController.DiskCheckInterval, () =>
        {
            if (_files.CheckDisk() is string warning) Say(warning, warning: true);
            UpdateStatus();
            WatchDisk();
        });
    }

    private void AskExport()
    {
        if (_files.ExportSuggestion(Shown) is not string suggestion) { Say("nothing to export yet"); return; }
        _prompt.Ask(FilesController.ExportQuestion, suggestion, text =>
        {
            if (_files.Export(text, Shown, out string done) is string error) return error;
            Say(done);
            return null;
        });
    }
}

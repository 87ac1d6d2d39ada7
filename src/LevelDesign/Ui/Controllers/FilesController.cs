using LevelDesign.Core.Files;
using LevelDesign.Core.Presentation;
using LevelDesign.Core.Sweeps;
using LevelDesign.Ui.Compute;
using LevelDesign.Ui.Export;
using LevelDesign.Ui.Session;

namespace LevelDesign.Ui.Controllers;

/// <summary>What Ctrl+S does with the file as it is now.</summary>
public enum SaveStep
{
    /// <summary>Write the file.</summary>
    Save,
    /// <summary>The file changed on disk since it was loaded: ask before overwriting.</summary>
    ConfirmOverwrite,
    /// <summary>The demo has no file yet: ask for a path.</summary>
    AskPath,
    /// <summary>The file is read-only: it is never replaced behind its permissions; offer another name.</summary>
    OfferSaveAs,
}

/// <summary>
/// The device file and the files written from the screen: save, save as, reload, whether the file changed on disk,
/// and what F8 writes for the sweep or point on screen. Every message names the file; the view only shows them.
/// </summary>
public sealed class FilesController
{
    private readonly EditSession _session;
    private readonly SweepController _sweeps;
    private readonly IPlotExporter? _plots;

    public FilesController(EditSession session, SweepController sweeps, IPlotExporter? plots)
    {
        _session = session;
        _sweeps = sweeps;
        _plots = plots;
    }

    /// <summary>How often the file on disk is looked at.</summary>
    public static readonly TimeSpan DiskCheckInterval = TimeSpan.FromSeconds(2);

    /// <summary>The file was changed by someone else since it was loaded or last saved here (as of the last look).</summary>
    public bool DiskChanged { get; private set; }

    private string FileName => Path.GetFileName(_session.Path) ?? "";

    /// <summary>What Ctrl+S (<paramref name="asPath"/> null) or save as does now.</summary>
    public SaveStep StepFor(string? asPath) =>
        asPath is not null ? SaveStep.Save
        : _session.Path is null ? SaveStep.AskPath
        : _session.ChangedOnDisk ? SaveStep.ConfirmOverwrite
        : _session.IsReadOnly ? SaveStep.OfferSaveAs
        : SaveStep.Save;

    public string OverwriteQuestion => $"{FileName} changed on disk since it was loaded.\no overwrite · Esc keep editing (Ctrl+L reloads)";
    public string ReadOnlyQuestion => $"{FileName} is read-only; it is not replaced.\nw save under another name · Esc keep editing";

    /// <summary>Said once when a file opens or reloads: a read-only file can be edited but is saved only under another name.</summary>
    public string? ReadOnlyWarning => _session.IsReadOnly ? $"⚠ {FileName} is read-only: Ctrl+S is refused; Ctrl+W saves under another name" : null;

    /// <summary>Writes the document (to <paramref name="asPath"/>, else its file); a refused save leaves it unsaved.</summary>
    public EditOutcome Save(string? asPath)
    {
        if (asPath is not null && asPath.Trim().Length == 0) return EditOutcome.Refused("type a file path");
        var outcome = _session.Save(asPath?.Trim());
        DiskChanged = _session.ChangedOnDisk;
        return outcome;
    }

    /// <summary>Why Ctrl+L cannot reload, or null.</summary>
    public string? ReloadRefusal => _session.Path is null ? "the demo device has no file to reload" : null;

    /// <summary>Reloading would drop edits not saved, so it is asked first.</summary>
    public bool ReloadDropsEdits => _session.IsDirty;

    /// <summary>Reads the file again (dropping unsaved edits); returns what to say.</summary>
    public string Reload()
    {
        _session.OpenFile(_session.Path!);
        DiskChanged = false;
        return "reloaded " + _session.Path;
    }

    /// <summary>Looks at the file on disk; returns a warning the first time it is seen changed, else null.</summary>
    public string? CheckDisk()
    {
        bool changed = _session.ChangedOnDisk;
        bool fresh = changed && !DiskChanged;
        DiskChanged = changed;
        return fresh ? $"⚠ {FileName} changed on disk since it was loaded (Ctrl+L reloads, Ctrl+S asks before overwriting)" : null;
    }

    /// <summary>The question at start when an autosave of a session that ended early holds other text; null if none.</summary>
    public string? RecoveryQuestion => _session.RecoveryText is null ? null
        : $"found edits not saved by a session that ended early ({FileName}.autosave).\nr recover · d discard · Esc decide later";

    // ---- export -------------------------------------------------------------------------------------------

    public const string ExportQuestion = "export to: .csv/.json = the sweep (or states if no sweep), .svg/.png = the spectrum plot";

    /// <summary>The path F8 offers: sweep.csv (or states.csv without a sweep) beside the device file; null when nothing is computed.</summary>
    public string? ExportSuggestion(PointSnapshot? shown)
    {
        if (shown is null && _sweeps.Result is null) return null;
        string folder = _session.Path is null ? "" : Path.GetDirectoryName(Path.GetFullPath(_session.Path)) ?? "";
        return Path.Combine(folder, _sweeps.Result is null ? "states.csv" : "sweep.csv");
    }

    /// <summary>
    /// F8: the sweep's CSV/JSON (what `leveldesign sweep` writes), or the shown point's states (what `spectrum`
    /// writes) when there is no sweep, or the spectrum plot. Returns why nothing was written, or null with
    /// <paramref name="done"/> to say.
    /// </summary>
    public string? Export(string text, PointSnapshot? shown, out string done)
    {
        done = "";
        string path = text.Trim();
        string extension = Path.GetExtension(path).ToLowerInvariant();
        var sweep = _sweeps.Result;
        try
        {
            switch (extension)
            {
                case ".csv" or ".json" when sweep is not null && _session.Document is { } document:
                    var table = SweepTable.From(sweep, SweepTable.ReportedCount(sweep), document.PurityThreshold);
                    AtomicFile.Write(path, extension == ".csv" ? SweepFiles.Csv(document, sweep, table) : SweepFiles.Json(document, sweep, table));
                    break;
                case ".csv" or ".json":
                    if (shown is null) return "nothing to export yet";
                    var spectrum = shown.Spectrum;
                    double threshold = _session.Document?.PurityThreshold ?? Core.Analysis.Conventions.DefaultPurityThreshold;
                    AtomicFile.Write(path, extension == ".csv" ? SpectrumFormatter.StatesCsv(spectrum, spectrum.Count)
                        : JsonValues.Write(SpectrumFormatter.Report(spectrum.Device.Name, spectrum, spectrum.Count, null, threshold)) + Environment.NewLine);
                    break;
                case ".svg" or ".png":
                    if (sweep is null || sweep.Plan.Axes.Count != 1) return "run a one-axis sweep first (F5); the plot is its spectrum";
                    if (_plots is null || !_plots.Supports(extension)) return "plot export is not available in this build; use .csv or .json";
                    var manifold = _sweeps.Manifold;
                    _plots.Export(sweep, _sweeps.Crossings.Select(c => c.Crossing).ToList(), $"{_session.Document?.Device.Name}: spectrum along {sweep.Plan.Axes[0].Path} ({manifold.Describe()})",
                        path, _session.Document, e => manifold.Admits(e));
                    break;
                default:
                    return "end the name with .csv, .json, .svg or .png";
            }
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException or ArgumentException or NotSupportedException or InvalidOperationException)
        {
            return "could not write: " + e.Message;
        }
        done = "exported " + path + (extension is ".svg" or ".png" && _sweeps.CrossingsPending ? " (crossings were still being searched, so none are marked)" : "");
        return null;
    }
}

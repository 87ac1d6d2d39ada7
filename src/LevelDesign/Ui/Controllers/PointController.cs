using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Eigen;
using LevelDesign.Core.Model;
using LevelDesign.Ui.Compute;
using LevelDesign.Ui.Text;

namespace LevelDesign.Ui.Controllers;

/// <summary>
/// The device at the file's biases: decides when a change of the document needs it computed again (only a change of
/// the model does; a save or an edit of a point, sweep or spread table does not), computes it off the UI thread
/// (a quick pass, then one with convergence checks and coherence), and keeps the latest result. No screen types.
/// </summary>
public sealed class PointController
{
    private readonly IUiScheduler _scheduler;
    private readonly LatestOnly _jobs = new();
    private DeviceDocument? _computed;

    public PointController(IUiScheduler scheduler) => _scheduler = scheduler;

    /// <summary>A result arrived or the computation failed: the view redraws the form, the page and the status.</summary>
    public event Action? Changed;

    /// <summary>An iteration of a large solve finished: the view redraws the status only.</summary>
    public event Action? Progressed;

    /// <summary>A message for the status line (text, warning).</summary>
    public event Action<string, bool>? Said;

    /// <summary>The latest computation at the file's biases (null before the first, or after a failure).</summary>
    public PointSnapshot? Snapshot { get; private set; }
    public bool IsComputing { get; private set; }

    /// <summary>"native" or "managed" once a computation ran.</summary>
    public string EigenPath { get; private set; } = "…";

    /// <summary>The iterations of a large solve, while it runs.</summary>
    public string ProgressText { get; private set; } = "";

    /// <summary>
    /// Follows the document: when its model differs from the one last computed, the device is computed again and true
    /// is returned; otherwise false, with the document the last computation was for in <paramref name="before"/>.
    /// </summary>
    public bool Follow(DeviceDocument document, out DeviceDocument? before)
    {
        before = _computed;
        bool same = ReferenceEquals(document, _computed) || (_computed is not null && document.ModelText() == _computed.ModelText());
        _computed = document;
        if (same) return false;
        Start(document.Device, document.Coherence);
        return true;
    }

    /// <summary>The window closes: nothing more is computed or posted.</summary>
    public void Stop() => _jobs.Cancel();

    private void Start(Device device, Core.Analysis.CoherenceInputs? coherenceInputs)
    {
        var (generation, token) = _jobs.Begin();
        IsComputing = true;
        ProgressText = "";
        // a module's point takes seconds: its iterations are shown, and an edit cancels it between two of them
        var progress = new PostingProgress<SolveProgress>(_scheduler, p =>
        {
            if (!_jobs.IsCurrent(generation) || !IsComputing) return;
            ProgressText = $"iteration {p.Iteration}: {p.Converged}/{p.Wanted} states converged";
            Progressed?.Invoke();
        });
        Task.Run(() =>
        {
            try
            {
                string eigen = NativeEigen() ? "native" : "managed";
                var quick = PointComputer.Compute(device, checkConvergence: false, token, progress: progress);
                _scheduler.Post(() => Apply(generation, quick, eigen, final: false));
                var full = PointComputer.Compute(device, checkConvergence: true, token, coherenceInputs, progress, quick);
                _scheduler.Post(() => Apply(generation, full, eigen, final: true));
            }
            catch (OperationCanceledException) { }
            catch (Exception e) when (e is not OutOfMemoryException)
            {
                _scheduler.Post(() =>
                {
                    if (!_jobs.IsCurrent(generation)) return;
                    IsComputing = false;
                    Snapshot = null;
                    Said?.Invoke("✗ cannot compute: " + ProblemText.Describe(e), true);
                    Changed?.Invoke();
                });
            }
        }, CancellationToken.None);
    }

    private void Apply(int generation, PointSnapshot snapshot, string eigen, bool final)
    {
        if (!_jobs.IsCurrent(generation)) return; // stale: a newer edit superseded it
        Snapshot = snapshot;
        EigenPath = eigen;
        IsComputing = !final;
        if (final && snapshot.Warnings.Count > 0) Said?.Invoke("⚠ " + string.Join("; ", snapshot.Warnings), true);
        Changed?.Invoke();
    }

    private static bool NativeEigen()
    {
        try { return EigenSolvers.Active.IsNative; }
        catch (Exception e) when (e is not OutOfMemoryException) { return false; }
    }
}

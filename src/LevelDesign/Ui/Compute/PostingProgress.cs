using LevelDesign.Core.Sweeps;

namespace LevelDesign.Ui.Compute;

/// <summary>Progress reports from worker threads, forwarded to the UI thread through the scheduler.</summary>
public sealed class PostingProgress(IUiScheduler scheduler, Action<SweepProgress> onUiThread) : IProgress<SweepProgress>
{
    public void Report(SweepProgress value) => scheduler.Post(() => onUiThread(value));
}

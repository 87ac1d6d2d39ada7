namespace LevelDesign.Ui.Compute;

/// <summary>Progress reports from worker threads (sweep points, iterations of a point's solve), forwarded to the UI thread through the scheduler.</summary>
public sealed class PostingProgress<T>(IUiScheduler scheduler, Action<T> onUiThread) : IProgress<T>
{
    public void Report(T value) => scheduler.Post(() => onUiThread(value));
}

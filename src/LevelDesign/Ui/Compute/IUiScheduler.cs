namespace LevelDesign.Ui.Compute;

/// <summary>How background work comes back to the UI thread, and how delayed work (debounce) is scheduled.</summary>
public interface IUiScheduler
{
    /// <summary>Runs <paramref name="action"/> on the UI thread (queued when called from another thread).</summary>
    void Post(Action action);

    /// <summary>Runs <paramref name="action"/> once on the UI thread after <paramref name="delay"/>; returns a handle for <see cref="Cancel"/>.</summary>
    object Delay(TimeSpan delay, Action action);

    void Cancel(object handle);
}

using Terminal.Gui.App;

namespace LevelDesign.Ui.Compute;

/// <summary>The real scheduler: app.Invoke to marshal results back, app.AddTimeout for debounce.</summary>
public sealed class AppScheduler(IApplication app) : IUiScheduler
{
    public void Post(Action action) => app.Invoke(action);

    public object Delay(TimeSpan delay, Action action) => app.AddTimeout(delay, () => { action(); return false; })!;

    public void Cancel(object handle) => app.RemoveTimeout(handle);
}

using System.Collections.Concurrent;
using LevelDesign.Ui.Compute;

namespace LevelDesign.Tests.Ui;

/// <summary>Test scheduler: posted work waits in a queue until the test pumps it; delays run when virtual time passes.</summary>
public sealed class ManualScheduler : IUiScheduler
{
    private readonly ConcurrentQueue<Action> _posted = new();
    private readonly List<(TimeSpan Due, Action Action, object Handle)> _timers = [];
    public TimeSpan Now { get; private set; }

    public void Post(Action action) => _posted.Enqueue(action);

    public object Delay(TimeSpan delay, Action action)
    {
        var handle = new object();
        _timers.Add((Now + delay, action, handle));
        return handle;
    }

    public void Cancel(object handle) => _timers.RemoveAll(t => ReferenceEquals(t.Handle, handle));

    public int PendingTimers => _timers.Count;

    public void Pump()
    {
        while (_posted.TryDequeue(out var action)) action();
    }

    /// <summary>Runs posted work until <paramref name="condition"/> holds (background work posts its result here).</summary>
    public void PumpUntil(Func<bool> condition, string what, int timeoutMs = 60000)
    {
        var clock = System.Diagnostics.Stopwatch.StartNew();
        while (!condition())
        {
            if (clock.ElapsedMilliseconds > timeoutMs) throw new TimeoutException("timed out waiting for " + what);
            Thread.Sleep(10);
            Pump();
        }
    }

    public void Advance(TimeSpan by)
    {
        Now += by;
        foreach (var timer in _timers.Where(t => t.Due <= Now).ToList())
        {
            _timers.Remove(timer);
            timer.Action();
        }
    }
}

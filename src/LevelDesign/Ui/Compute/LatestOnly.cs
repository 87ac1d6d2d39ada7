namespace LevelDesign.Ui.Compute;

/// <summary>
/// Keeps only the newest job of one kind alive: starting a job cancels the previous one, and a result is
/// applied only when its generation is still the current one, so stale results are discarded.
/// </summary>
public sealed class LatestOnly
{
    private readonly object _gate = new();
    private CancellationTokenSource? _current;
    private int _generation;

    public (int Generation, CancellationToken Token) Begin()
    {
        lock (_gate)
        {
            _current?.Cancel();
            _current = new CancellationTokenSource();
            return (++_generation, _current.Token);
        }
    }

    public bool IsCurrent(int generation)
    {
        lock (_gate) return generation == _generation;
    }

    /// <summary>Cancels the running job; its late result will be discarded.</summary>
    public void Cancel()
    {
        lock (_gate)
        {
            _current?.Cancel();
            _generation++;
        }
    }
}

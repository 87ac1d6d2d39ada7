namespace LevelDesign.Core.Sweeps;

/// <summary>
/// Hands out the indices of one contiguous stretch of sweep points to two walkers, one from each end, until they
/// meet. Thread-safe.
/// </summary>
internal sealed class SegmentCursor(int first, int last)
{
    private readonly object _gate = new();
    private int _next = first, _previous = last;

    public bool TryTake(bool forward, out int index)
    {
        lock (_gate)
        {
            if (_next > _previous) { index = -1; return false; }
            index = forward ? _next++ : _previous--;
            return true;
        }
    }
}

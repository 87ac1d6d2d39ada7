using System.Collections.Concurrent;
using LevelDesign.Core.Elements;

namespace LevelDesign.Core.Composite;

/// <summary>
/// Remembers element diagonalisations: along a sweep most elements do not change, and elements are immutable
/// records, so (element, levels, basis size) identifies a result. Thread-safe; bounded.
/// </summary>
public sealed class BareSpectrumCache
{
    private readonly ConcurrentDictionary<(Element, int, int?), BareSpectrum> _entries = new();
    private readonly int _capacity;
    private long _hits, _misses;

    public BareSpectrumCache(int capacity = 4096) => _capacity = capacity;

    public long Hits => Interlocked.Read(ref _hits);
    public long Misses => Interlocked.Read(ref _misses);

    public BareSpectrum Get(Element element, int levels, int? basisSize)
    {
        var key = (element, levels, basisSize);
        if (_entries.TryGetValue(key, out var found)) { Interlocked.Increment(ref _hits); return found; }
        Interlocked.Increment(ref _misses);
        var spectrum = element.Diagonalise(levels, basisSize);
        if (_entries.Count >= _capacity) _entries.Clear();
        _entries[key] = spectrum;
        return spectrum;
    }
}

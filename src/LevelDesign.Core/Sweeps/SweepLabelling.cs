using LevelDesign.Core.Analysis;
using LevelDesign.Core.Composite;

namespace LevelDesign.Core.Sweeps;

/// <summary>
/// Labels sweep points while they are being solved, so a point's D-long vectors are dropped as soon as nothing needs
/// them. A point's label inputs (weights, overlaps with its predecessor) are computed, by the worker that solved the
/// later of the two, as soon as both are solved; labels are then handed over in flat order (sequential, cheap) and the
/// derived quantities computed. A point's vectors are needed until it is labelled and every successor (the point
/// whose labels come from it) has its overlaps; then they go, and the result keeps them only when
/// <c>keepVectors</c>. Thread-safe: workers call <see cref="Add"/> concurrently.
/// </summary>
internal sealed class SweepLabelling
{
    private readonly SweepPlan _plan;
    private readonly SweepOptions _options;
    private readonly double[][] _axisValues;
    private readonly bool _keepVectors;
    private readonly int[] _predecessor;
    private readonly List<int>[] _successors;
    private readonly int[] _waitingSuccessors;   // successors whose overlaps still need this point's vectors
    private readonly SolvedPoint?[] _solved;
    private readonly LabelInputs?[] _inputs;
    private readonly bool[] _inputsClaimed;
    private readonly SweepPoint?[] _points;
    private readonly bool[] _wanted;   // points computed at all (every point unless the options give fixed blocks)
    private readonly object _gate = new();
    private int _frontier;   // every point before it is labelled

    public SweepLabelling(SweepPlan plan, SweepOptions options, double[][] axisValues, bool keepVectors)
    {
        _plan = plan;
        _options = options;
        _axisValues = axisValues;
        _keepVectors = keepVectors;
        int total = axisValues.Length;
        _predecessor = new int[total];
        _successors = new List<int>[total];
        _waitingSuccessors = new int[total];
        for (int i = 0; i < total; i++) _successors[i] = [];
        _wanted = new bool[total];
        if (options.Blocks is { } blocks)
            foreach (var (start, end) in blocks) for (int i = start; i < end; i++) _wanted[i] = true;
        else Array.Fill(_wanted, true);
        for (int i = 0; i < total; i++)
        {
            _predecessor[i] = SweepGrid.Predecessor(plan, i);
            // in fixed blocks a point whose predecessor is not computed starts a fresh chain of labels, as it would in
            // the run that owns the gap
            if (_predecessor[i] >= 0 && !_wanted[_predecessor[i]]) _predecessor[i] = -1;
            if (!_wanted[i]) continue;
            if (_predecessor[i] >= 0)
            {
                _successors[_predecessor[i]].Add(i);
                _waitingSuccessors[_predecessor[i]]++;
            }
        }
        _solved = new SolvedPoint?[total];
        _inputs = new LabelInputs?[total];
        _inputsClaimed = new bool[total];
        _points = new SweepPoint?[total];
    }

    /// <summary>Hands over a solved point: computes the label inputs that became possible and labels what it can.</summary>
    public void Add(int index, SolvedPoint point)
    {
        var ready = new List<(int Point, SolvedPoint Solved, SolvedPoint? Previous)>(3);
        lock (_gate)
        {
            _solved[index] = point;
            Claim(index, ready);
            foreach (int next in _successors[index]) Claim(next, ready);
        }
        // the costly part (weights and overlaps: D × count²) outside the lock; claimed points keep their vectors
        var computed = ready.Select(r => LabelTracker.Inputs(_plan.Labels, r.Solved, r.Previous)).ToArray();
        lock (_gate)
        {
            for (int r = 0; r < ready.Count; r++)
            {
                int i = ready[r].Point;
                _inputs[i] = computed[r];
                if (_predecessor[i] >= 0)
                {
                    _waitingSuccessors[_predecessor[i]]--;
                    ReleaseIfDone(_predecessor[i]);
                }
            }
            LabelReady();
        }
    }

    /// <summary>Waits until point <paramref name="index"/> is at most <paramref name="window"/> points ahead of labelling.</summary>
    public void WaitForRoom(int index, int window, CancellationToken cancellation)
    {
        lock (_gate)
            while (index >= _frontier + window && !cancellation.IsCancellationRequested)
                Monitor.Wait(_gate, 50);
    }

    /// <summary>
    /// After the workers stop: labels what is left (after a cancellation, from the nearest earlier solved point,
    /// or afresh when that point's vectors are gone) and returns the labelled points in flat order.
    /// </summary>
    public List<SweepPoint> Finish()
    {
        lock (_gate)
        {
            LabelReady();
            for (int i = _frontier; i < _solved.Length; i++)
            {
                if (_solved[i] is not SolvedPoint point) continue;
                int previous = _predecessor[i];
                while (previous >= 0 && _points[previous] is null) previous--;
                if (_inputs[i] is null || previous != _predecessor[i])
                    _inputs[i] = LabelTracker.Inputs(_plan.Labels, point, previous >= 0 ? _solved[previous] : null);
                Label(i, _inputs[i]!.Overlaps is null && _plan.Labels == LabelMode.ByCharacter ? -1 : previous);
            }
            return _points.OfType<SweepPoint>().ToList();
        }
    }

    private void Claim(int i, List<(int, SolvedPoint, SolvedPoint?)> ready)
    {
        if (_inputsClaimed[i] || _solved[i] is not SolvedPoint point) return;
        int previous = _predecessor[i];
        if (previous >= 0 && _solved[previous] is null) return;
        _inputsClaimed[i] = true;
        ready.Add((i, point, previous >= 0 ? _solved[previous] : null));
    }

    private void LabelReady()
    {
        int before = _frontier;
        while (_frontier < _solved.Length && (!_wanted[_frontier] || _inputs[_frontier] is LabelInputs))
        {
            if (_wanted[_frontier]) Label(_frontier, _predecessor[_frontier]);
            _frontier++;
        }
        if (_frontier != before) Monitor.PulseAll(_gate);
    }

    /// <param name="previous">The labelled point the labels come from; −1 labels afresh.</param>
    private void Label(int i, int previous)
    {
        var point = _solved[i]!;
        var inputs = _inputs[i]!;
        // a user-chosen level count is judged whole; the default count carries a 4-state margin at the top, where
        // states mix with ones not computed, so ambiguity there is not reported
        int judged = _plan.Levels is not null ? point.Count : Math.Max(1, point.Count - 4);
        var tracker = new LabelTracker(_plan.Labels, _options, judged);
        var (spectrum, ambiguous) = previous < 0 ? tracker.First(point, inputs) : tracker.Next(point, inputs, _points[previous]!.Spectrum);
        var derived = DerivedQuantities.From(spectrum);
        if (!_keepVectors) spectrum = spectrum.WithoutVectors();
        _points[i] = new SweepPoint(i, _axisValues[i], spectrum, derived.Named(), ambiguous)
            { QuantityPurities = derived.NamedPurities(), Derived = derived };
        _inputs[i] = null;
        ReleaseIfDone(i);
    }

    /// <summary>Drops a solved point once it is labelled and every successor has its overlaps.</summary>
    private void ReleaseIfDone(int i)
    {
        if (_points[i] is null || _waitingSuccessors[i] != 0 || _solved[i] is not SolvedPoint point) return;
        _solved[i] = null;
        // Each point of a large module leaves its vectors, weights and matrix copies (about 80 MB at 46k states) on the
        // large-object heap, which is collected only with generation 2; left to its own budget the heap grew with every
        // point (51-point lattice sweep: 2.9 GB peak). Collecting once a point is done bounds it (measured: see
        // docs/performance.md); a full collection of a heap of large arrays takes milliseconds against seconds a point.
        if (!_keepVectors && (long)point.Dimension * point.Count * sizeof(double) >= LargePointBytes)
            GC.Collect(2, GCCollectionMode.Forced, blocking: true);
    }

    /// <summary>Points whose vectors take at least this much are followed by a full collection when dropped.</summary>
    private const long LargePointBytes = 8L << 20;
}

using LevelDesign.Core.Analysis;
using LevelDesign.Core.Composite;
using LevelDesign.Core.Model;

namespace LevelDesign.Core.Sweeps;

/// <summary>
/// Runs a sweep in parallel on all cores, cancellable; points computed before cancellation are kept.
/// Workers walk contiguous stretches (two per stretch, from both ends) so every point is warm-started from its
/// neighbour; one <see cref="DeviceSolver"/> (and bare-spectrum cache) is shared.
/// Labels are then carried point to point (see <see cref="LabelTracker"/>) and derived quantities computed.
/// </summary>
public static class SweepRunner
{
    /// <param name="resolve">Maps axis values to the device at that point (applies biases, links and parameter paths).</param>
    public static Task<SweepResult> RunAsync(Func<IReadOnlyList<double>, Device> resolve, SweepPlan plan,
        IProgress<SweepProgress>? progress = null, CancellationToken cancellation = default) =>
        RunAsync(resolve, plan, new SweepOptions(), progress, cancellation);

    public static async Task<SweepResult> RunAsync(Func<IReadOnlyList<double>, Device> resolve, SweepPlan plan,
        SweepOptions options, IProgress<SweepProgress>? progress = null, CancellationToken cancellation = default)
    {
        var problems = SweepGrid.Validate(plan);
        if (problems.Count > 0) throw new ArgumentException("invalid sweep: " + string.Join("; ", problems));
        var axisValues = SweepGrid.Points(plan);
        int total = axisValues.Length;
        var solver = options.CreateSolver();
        var solved = new SolvedPoint?[total];
        int workers = Math.Clamp(options.Parallelism, 1, total);
        int done = 0;

        if (options.Blocks is { } blocks)
        {
            // fixed stretches, each walked forward from a cold start by whichever worker takes it
            int nextBlock = -1, wanted = blocks.Sum(x => x.End - x.Start);
            var walkers = Enumerable.Range(0, Math.Clamp(options.Parallelism, 1, Math.Max(1, blocks.Count))).Select(_ => Task.Run(() =>
            {
                int b;
                while (!cancellation.IsCancellationRequested && (b = Interlocked.Increment(ref nextBlock)) < blocks.Count)
                {
                    var pointSolver = new PointSolver(solver, options);
                    for (int i = blocks[b].Start; i < blocks[b].End && !cancellation.IsCancellationRequested; i++)
                    {
                        solved[i] = pointSolver.Solve(resolve(axisValues[i]), plan.Levels);
                        progress?.Report(new SweepProgress(Interlocked.Increment(ref done), wanted));
                    }
                }
            })).ToArray();
            await Task.WhenAll(walkers).ConfigureAwait(false);
            var kept = Label(plan, options, axisValues, solved);
            return new SweepResult(plan, kept, kept.Count == wanted && !cancellation.IsCancellationRequested);
        }

        // Workers come in pairs on contiguous segments: one walks forward from the segment's start, the other
        // backward from its end, each warm-started by the point it solved last, and they stop where they meet.
        // Cost varies a lot along a sweep (crossings need more iterations), so fixed halves would leave one core
        // idle; meeting wherever the work balances keeps both busy with only one cold start per worker.
        int segments = (workers + 1) / 2;
        var tasks = new List<Task>();
        for (int g = 0; g < segments; g++)
        {
            int start = (int)((long)g * total / segments), end = (int)((long)(g + 1) * total / segments);
            var segment = new SegmentCursor(start, end - 1);
            bool paired = 2 * g + 1 < workers;
            tasks.Add(Task.Run(() => Walk(segment, forward: true)));
            if (paired) tasks.Add(Task.Run(() => Walk(segment, forward: false)));
        }

        void Walk(SegmentCursor segment, bool forward)
        {
            var pointSolver = new PointSolver(solver, options);
            while (!cancellation.IsCancellationRequested && segment.TryTake(forward, out int i))
            {
                solved[i] = pointSolver.Solve(resolve(axisValues[i]), plan.Levels);
                progress?.Report(new SweepProgress(Interlocked.Increment(ref done), total));
            }
        }
        await Task.WhenAll(tasks).ConfigureAwait(false);

        var points = Label(plan, options, axisValues, solved);
        bool completed = points.Count == total && !cancellation.IsCancellationRequested;
        return new SweepResult(plan, points, completed);
    }

    /// <summary>
    /// Labels every solved point from its neighbour, in flat order, and computes its derived quantities. Only the
    /// label hand-over is sequential: weights, overlaps and derived quantities are computed in parallel.
    /// </summary>
    private static List<SweepPoint> Label(SweepPlan plan, SweepOptions options, double[][] axisValues, SolvedPoint?[] solved)
    {
        int total = solved.Length;
        var neighbour = new int[total];
        for (int i = 0; i < total; i++)
        {
            int previous = SweepGrid.Predecessor(plan, i);
            // in fixed blocks a point after a gap starts a fresh chain of labels, as it would in the run that owns the gap
            if (options.Blocks is not null) { neighbour[i] = previous >= 0 && solved[previous] is not null ? previous : -1; continue; }
            while (previous >= 0 && solved[previous] is null) previous--;
            neighbour[i] = previous;
        }
        var parallel = new ParallelOptions { MaxDegreeOfParallelism = Math.Max(1, options.Parallelism) };
        var inputs = new LabelInputs?[total];
        Parallel.For(0, total, parallel, i =>
        {
            if (solved[i] is SolvedPoint point)
                inputs[i] = LabelTracker.Inputs(plan.Labels, point, neighbour[i] < 0 ? null : solved[neighbour[i]]);
        });

        var spectra = new DressedSpectrum?[total];
        var ambiguous = new bool[total];
        for (int i = 0; i < total; i++)
        {
            if (solved[i] is not SolvedPoint point) continue;
            // a user-chosen level count is judged whole; the default count carries a 4-state margin at the top,
            // where states mix with ones not computed, so ambiguity there is not reported
            int judged = plan.Levels is not null ? point.Count : Math.Max(1, point.Count - 4);
            var tracker = new LabelTracker(plan.Labels, options, judged);
            int previous = neighbour[i];
            (spectra[i], ambiguous[i]) = previous < 0
                ? tracker.First(point, inputs[i]!)
                : tracker.Next(point, inputs[i]!, solved[previous]!, spectra[previous]!);
        }

        var quantities = new DerivedQuantities?[total];
        Parallel.For(0, total, parallel, i =>
        {
            if (spectra[i] is DressedSpectrum spectrum) quantities[i] = DerivedQuantities.From(spectrum);
        });
        var points = new List<SweepPoint>();
        for (int i = 0; i < total; i++)
            if (spectra[i] is DressedSpectrum spectrum)
                points.Add(new SweepPoint(i, axisValues[i], spectrum, quantities[i]!.Named(), ambiguous[i])
                    { QuantityPurities = quantities[i]!.NamedPurities() });
        return points;
    }
}

using LevelDesign.Core.Composite;
using LevelDesign.Core.Model;

namespace LevelDesign.Core.Sweeps;

/// <summary>
/// Runs a sweep in parallel on all cores, cancellable; points computed before cancellation are kept.
/// Workers walk contiguous stretches (two per stretch, from both ends) so every point is warm-started from its
/// neighbour; one <see cref="DeviceSolver"/> (and bare-spectrum cache) is shared.
/// Labels are carried point to point while the points are solved (see <see cref="SweepLabelling"/>), and the whole
/// sweep is sized first (<see cref="SweepMemoryEstimate"/>): one that would not fit is refused before any solve.
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
        int workers = Math.Clamp(options.Parallelism, 1, total);
        int wanted = options.Blocks?.Sum(x => x.End - x.Start) ?? total;
        bool keepVectors = Guard(resolve(axisValues[0]), plan, options, solver, total, wanted, workers);
        var labelling = new SweepLabelling(plan, options, axisValues, keepVectors);
        using var stop = CancellationTokenSource.CreateLinkedTokenSource(cancellation);
        int done = 0, failedIndex = -1;

        var tasks = new List<Task>();
        if (options.Blocks is { } blocks)
        {
            // fixed stretches, each walked forward from a cold start by whichever worker takes it next (in order, so
            // labelling follows close behind and only a few points hold vectors at once)
            int nextBlock = -1;
            for (int w = 0; w < Math.Clamp(workers, 1, Math.Max(1, blocks.Count)); w++)
                tasks.Add(Task.Run(() =>
                {
                    try
                    {
                        int b;
                        var pointSolver = new PointSolver(solver, options);
                        while (!stop.IsCancellationRequested && (b = Interlocked.Increment(ref nextBlock)) < blocks.Count)
                        {
                            pointSolver.StartCold();
                            for (int i = blocks[b].Start; i < blocks[b].End && !stop.IsCancellationRequested; i++)
                            {
                                try { labelling.Add(i, pointSolver.Solve(resolve(axisValues[i]), plan.Levels)); }
                                catch (Exception e) when (e is not OperationCanceledException) { Interlocked.CompareExchange(ref failedIndex, i, -1); throw; }
                                progress?.Report(new SweepProgress(Interlocked.Increment(ref done), wanted));
                            }
                        }
                    }
                    catch
                    {
                        stop.Cancel();
                        throw;
                    }
                }));
        }
        else if (keepVectors)
        {
            // Workers come in pairs on contiguous segments: one walks forward from the segment's start, the other
            // backward from its end, each warm-started by the point it solved last, and they stop where they meet.
            // Cost varies a lot along a sweep (crossings need more iterations), so fixed halves would leave one core
            // idle; meeting wherever the work balances keeps both busy with only one cold start per worker. The
            // backward walker's points wait, vectors and all, until labelling reaches them: hence only when kept.
            int segments = (workers + 1) / 2;
            for (int g = 0; g < segments; g++)
            {
                int start = (int)((long)g * total / segments), end = (int)((long)(g + 1) * total / segments);
                var segment = new SegmentCursor(start, end - 1);
                bool paired = 2 * g + 1 < workers;
                tasks.Add(Task.Run(() => Walk((out int i) => segment.TryTake(forward: true, out i))));
                if (paired) tasks.Add(Task.Run(() => Walk((out int i) => segment.TryTake(forward: false, out i))));
            }
        }
        else
        {
            // Points that keep no vectors: worker w takes points w, w + W, w + 2W… (warm starts extrapolate over the
            // stride, which is still evenly spaced) and waits when it runs more than a few points ahead of labelling,
            // so only that many points hold vectors at once.
            for (int w = 0; w < workers; w++)
            {
                int next = w;
                tasks.Add(Task.Run(() => Walk((out int i) =>
                {
                    i = next;
                    next += workers;
                    if (i >= total) return false;
                    labelling.WaitForRoom(i, SweepMemoryEstimate.InFlightPerWorker * workers, stop.Token);
                    return true;
                })));
            }
        }

        void Walk(TakeNext take)
        {
            var pointSolver = new PointSolver(solver, options);
            try
            {
                while (!stop.IsCancellationRequested && take(out int i) && !stop.IsCancellationRequested)
                {
                    try { labelling.Add(i, pointSolver.Solve(resolve(axisValues[i]), plan.Levels)); }
                    catch (Exception e) when (e is not OperationCanceledException) { Interlocked.CompareExchange(ref failedIndex, i, -1); throw; }
                    progress?.Report(new SweepProgress(Interlocked.Increment(ref done), total));
                }
            }
            catch
            {
                stop.Cancel();   // the other workers stop too (one may be waiting for this one's points)
                throw;
            }
        }
        SweepFailure? failure = null;
        try { await Task.WhenAll(tasks).ConfigureAwait(false); }
        catch (Exception) when (options.KeepPointsOnFailure && failedIndex >= 0)
        {
            // the point's own error, not a worker's "stopped" that Task.WhenAll may put first
            var error = tasks.Where(t => t.IsFaulted).SelectMany(t => t.Exception!.InnerExceptions)
                .FirstOrDefault(e => e is not OperationCanceledException) ?? new InvalidOperationException("a sweep point failed");
            failure = new SweepFailure(axisValues[failedIndex], error);
        }

        var points = labelling.Finish();
        bool completed = failure is null && points.Count == wanted && !cancellation.IsCancellationRequested;
        return new SweepResult(plan, points, completed) { Failure = failure };
    }

    private delegate bool TakeNext(out int index);

    /// <summary>
    /// Sizes the sweep from its first point and refuses it before the sweep starts when it would not fit in memory
    /// or would run longer than <see cref="SweepOptions.TimeLimit"/> (timed by solving the first point once, when a
    /// single point fits); returns whether every point keeps its vectors. Both refusals give both estimates.
    /// </summary>
    private static bool Guard(Device first, SweepPlan plan, SweepOptions options, DeviceSolver solver, int total, int wanted, int workers)
    {
        var problem = solver.Prepare(first);
        int dimension = problem.Basis.Dimension;
        int count = plan.Levels is int k ? Math.Min(k, dimension) : solver.Select(problem).Count;
        bool complex = !problem.Hamiltonian.IsReal;
        int iterativeFrom = options.Iterative ? options.IterativeMinimumDimension : int.MaxValue;
        long entries = problem.Hamiltonian.StoredEntries;
        bool keep = SweepMemoryEstimate.KeepsVectors(options.KeepVectors, total, dimension, count, complex);
        string? memory = options.MemoryLimitBytes is long limit
            ? SweepMemoryEstimate.Refusal(dimension, entries, count, total, workers, keep, complex, iterativeFrom, limit)
            : null;
        bool timed = memory is not null || (options.TimeLimit is TimeSpan limitTime && wanted >= SweepTimeEstimate.MinimumTimedPoints
                                            && !SweepTimeEstimate.SurelyWithin(dimension, wanted, workers, limitTime));
        double onePoint = SweepMemoryEstimate.Bytes(dimension, entries, count, 1, 1, false, complex, iterativeFrom);
        TimeSpan? perPoint = timed && onePoint <= (options.MemoryLimitBytes ?? long.MaxValue) ? FirstPointTime(first, plan, options, solver) : null;
        if (memory is not null)
            throw new SweepTooLargeException(memory + (perPoint is TimeSpan t ? $"; it would also take {SweepTimeEstimate.Describe(t, wanted, workers)}" : ""));
        if (perPoint is TimeSpan p && options.TimeLimit is TimeSpan most && SweepTimeEstimate.Refusal(p, wanted, workers, most) is not null)
        {
            // the first solve in a process also compiles the code: time it once more before refusing
            var again = FirstPointTime(first, plan, options, solver) ?? p;
            if (SweepTimeEstimate.Refusal(again < p ? again : p, wanted, workers, most) is string slow) throw new SweepTooLargeException(slow);
        }
        return keep;
    }

    /// <summary>Time of one cold solve of the first point; null when it fails (the sweep itself then reports the failure at that point).</summary>
    private static TimeSpan? FirstPointTime(Device first, SweepPlan plan, SweepOptions options, DeviceSolver solver)
    {
        var clock = System.Diagnostics.Stopwatch.StartNew();
        try { new PointSolver(solver, options).Solve(first, plan.Levels); }
        catch (Exception e) when (e is not OutOfMemoryException) { return null; }
        return clock.Elapsed;
    }
}

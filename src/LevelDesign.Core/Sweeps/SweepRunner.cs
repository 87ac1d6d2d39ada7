using LevelDesign.Core.Analysis;
using LevelDesign.Core.Composite;
using LevelDesign.Core.Model;

namespace LevelDesign.Core.Sweeps;

/// <summary>
/// Runs a sweep in parallel on all cores, cancellable; points computed before cancellation are kept.
/// The sweep is split into contiguous chunks, one per core, each solved in order so every point is
/// warm-started from its neighbour; one <see cref="DeviceSolver"/> (and bare-spectrum cache) is shared.
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
        int chunks = Math.Clamp(options.Parallelism, 1, total);
        int done = 0;

        var tasks = new Task[chunks];
        for (int c = 0; c < chunks; c++)
        {
            int start = (int)((long)c * total / chunks), end = (int)((long)(c + 1) * total / chunks);
            tasks[c] = Task.Run(() =>
            {
                var pointSolver = new PointSolver(solver, options);
                for (int i = start; i < end; i++)
                {
                    if (cancellation.IsCancellationRequested) return;
                    solved[i] = pointSolver.Solve(resolve(axisValues[i]), plan.Levels);
                    progress?.Report(new SweepProgress(Interlocked.Increment(ref done), total));
                }
            });
        }
        await Task.WhenAll(tasks).ConfigureAwait(false);

        var points = Label(plan, options, axisValues, solved);
        bool completed = points.Count == total && !cancellation.IsCancellationRequested;
        return new SweepResult(plan, points, completed);
    }

    /// <summary>Labels every solved point from its neighbour, in flat order, and computes its derived quantities.</summary>
    private static List<SweepPoint> Label(SweepPlan plan, SweepOptions options, double[][] axisValues, SolvedPoint?[] solved)
    {
        var spectra = new DressedSpectrum?[solved.Length];
        var points = new List<SweepPoint>();
        for (int i = 0; i < solved.Length; i++)
        {
            if (solved[i] is not SolvedPoint point) continue;
            // a user-chosen level count is judged whole; the default count carries a 4-state margin at the top,
            // where states mix with ones not computed, so ambiguity there is not reported
            int judged = plan.Levels is not null ? point.Count : Math.Max(1, point.Count - 4);
            var tracker = new LabelTracker(plan.Labels, options, judged);
            int previous = SweepGrid.Predecessor(plan, i);
            while (previous >= 0 && solved[previous] is null) previous--;
            var (spectrum, ambiguous) = previous < 0
                ? tracker.First(point)
                : tracker.Next(point, solved[previous]!, spectra[previous]!);
            spectra[i] = spectrum;
            points.Add(new SweepPoint(i, axisValues[i], spectrum, DerivedQuantities.From(spectrum).Named(), ambiguous));
        }
        return points;
    }
}

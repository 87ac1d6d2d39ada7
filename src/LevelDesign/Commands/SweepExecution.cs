using LevelDesign.Core.Composite;
using LevelDesign.Core.Sweeps;
using LevelDesign.Output;
using LevelDesign.Core.Presentation;

namespace LevelDesign.Commands;

/// <summary>
/// Runs a sweep with the parallel, warm-started engine, a progress bar on stderr and Ctrl-C handling: the first
/// Ctrl-C stops the sweep and keeps the points already computed (the caller then exits 130).
/// </summary>
public static class SweepExecution
{
    /// <param name="blocks">Fixed stretches to compute (see <see cref="SweepOptions.Blocks"/>); null: every point, shared out as workers go.</param>
    /// <param name="keepVectors">Keep every point's eigenvectors (for matrix elements afterwards); by default a large sweep keeps only energies, labels and quantities.</param>
    public static SweepResult Run(SweepSetup setup, LabelMode labels, int? levels, DeviceSolver? solver = null,
        IReadOnlyList<(int Start, int End)>? blocks = null, bool? keepVectors = null, bool keepPointsOnFailure = false)
    {
        var plan = new SweepPlan(setup.Axes, labels, levels);
        var problems = SweepGrid.Validate(plan);
        if (problems.Count > 0) throw new UsageException(string.Join("; ", problems));
        var options = new SweepOptions { Solver = solver ?? new DeviceSolver(), Blocks = blocks, KeepVectors = keepVectors, KeepPointsOnFailure = keepPointsOnFailure };
        var progress = new ProgressBar(blocks?.Sum(b => b.End - b.Start) ?? SweepGrid.PointCount(plan));
        return WithCancel(token => SweepRunner.RunAsync(setup.Resolve, plan, options, progress, token), progress.Finish);
    }

    /// <summary>Runs an operation that Ctrl-C cancels (Ctrl-C does not end the process; the operation stops).</summary>
    public static T WithCancel<T>(Func<CancellationToken, Task<T>> operation, Action? onEnd = null)
    {
        using var cancel = new CancellationTokenSource();
        ConsoleCancelEventHandler onCancel = (_, e) => { e.Cancel = true; cancel.Cancel(); };
        Console.CancelKeyPress += onCancel;
        try
        {
            return operation(cancel.Token).GetAwaiter().GetResult();
        }
        finally
        {
            Console.CancelKeyPress -= onCancel;
            onEnd?.Invoke();
        }
    }

    /// <summary>The number of dressed states to solve per point so every reported quantity is there, and at least <paramref name="levels"/>.</summary>
    public static (int? PlanLevels, int Shown) Levels(SweepSetup setup, int? levels, DeviceSolver solver)
    {
        if (levels is < 1) throw new UsageException("--levels must be at least 1");
        var problem = solver.Prepare(setup.Resolve(setup.Axes.Select(a => a.Start).ToArray()));
        int needed = solver.DefaultCount(problem);
        // the default count carries 4 states of margin at the top, where states mix with ones not computed
        int judged = Math.Max(1, needed - 4);
        int solved = levels is int l && l > judged ? Math.Min(l, problem.Basis.Dimension) : needed;
        // the whole sweep is sized (and refused when it would not fit) by the engine before its first solve
        if (levels is null) return (null, judged);
        if (levels <= judged) return (null, levels.Value);
        return (solved, solved);
    }
}

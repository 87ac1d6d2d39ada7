using LevelDesign.Core.Analysis;
using LevelDesign.Core.Composite;
using LevelDesign.Core.Model;
using LevelDesign.Core.Sweeps;

namespace LevelDesign.Ui.Compute;

/// <summary>
/// Development fallback for the sweep engine: solves each point of a one- or two-axis plan in turn on a
/// worker thread with <see cref="DeviceSolver"/>; labels come from each point's own bare overlap.
/// Cancellation keeps the points already computed.
/// </summary>
public static class PointwiseSweep
{
    public static Task<SweepResult> RunAsync(Func<IReadOnlyList<double>, Device> resolve, SweepPlan plan,
        IProgress<SweepProgress>? progress, CancellationToken cancellation) =>
        Task.Run(() => Run(resolve, plan, progress, cancellation), CancellationToken.None);

    private static SweepResult Run(Func<IReadOnlyList<double>, Device> resolve, SweepPlan plan,
        IProgress<SweepProgress>? progress, CancellationToken cancellation)
    {
        var grid = Grid(plan);
        var solver = new DeviceSolver();
        var points = new List<SweepPoint>(grid.Count);
        for (int i = 0; i < grid.Count; i++)
        {
            if (cancellation.IsCancellationRequested) return new SweepResult(plan, points, false);
            var spectrum = solver.Solve(resolve(grid[i]), plan.Levels);
            var named = DerivedQuantities.From(spectrum).Named();
            points.Add(new SweepPoint(i, grid[i], spectrum, named, spectrum.Labels.Any(l => l.Ambiguous)));
            progress?.Report(new SweepProgress(i + 1, grid.Count));
        }
        return new SweepResult(plan, points, true);
    }

    private static List<double[]> Grid(SweepPlan plan)
    {
        var axes = plan.Axes.Select(Values).ToArray();
        var grid = new List<double[]>();
        if (axes.Length == 1) foreach (double a in axes[0]) grid.Add([a]);
        else foreach (double a in axes[0]) foreach (double b in axes[1]) grid.Add([a, b]);
        return grid;
    }

    private static double[] Values(Core.DeviceFiles.SweepAxis axis) =>
        axis.Count <= 1 ? [axis.Start] : Enumerable.Range(0, axis.Count).Select(i => axis.Start + (axis.Stop - axis.Start) * i / (axis.Count - 1)).ToArray();
}

using LevelDesign.Core.DeviceFiles;

namespace LevelDesign.Core.Sweeps;

/// <summary>
/// The points of a sweep plan in flat order: for two axes the first axis is the outer (slow) one, so point
/// (i, j) has flat index i·Count₂ + j. Also the neighbour each point's labels are carried from.
/// </summary>
public static class SweepGrid
{
    /// <summary>Checks a plan; returns a list of problems (empty when valid).</summary>
    public static IReadOnlyList<string> Validate(SweepPlan plan)
    {
        var problems = new List<string>();
        if (plan.Axes.Count is < 1 or > 2) problems.Add($"a sweep has one or two axes, not {plan.Axes.Count}");
        foreach (var axis in plan.Axes)
        {
            if (axis.Count < 1) problems.Add($"axis '{axis.Path}': count must be at least 1 (got {axis.Count})");
            if (!double.IsFinite(axis.Start) || !double.IsFinite(axis.Stop)) problems.Add($"axis '{axis.Path}': start and stop must be finite");
            foreach (var link in axis.Links)
                if (!double.IsFinite(link.Scale) || !double.IsFinite(link.Shift))
                    problems.Add($"axis '{axis.Path}': link '{link.Path}' needs a finite scale and shift");
        }
        if (plan.Levels is int k && k < 1) problems.Add($"levels must be at least 1 (got {k})");
        return problems;
    }

    public static double Value(SweepAxis axis, int index) =>
        axis.Count == 1 ? axis.Start : axis.Start + (axis.Stop - axis.Start) * index / (axis.Count - 1);

    public static int PointCount(SweepPlan plan) => plan.Axes.Aggregate(1, (n, a) => n * a.Count);

    /// <summary>Axis values of every point, in flat order.</summary>
    public static double[][] Points(SweepPlan plan)
    {
        var points = new double[PointCount(plan)][];
        if (plan.Axes.Count == 1)
            for (int i = 0; i < points.Length; i++) points[i] = [Value(plan.Axes[0], i)];
        else
        {
            int inner = plan.Axes[1].Count;
            for (int p = 0; p < points.Length; p++)
                points[p] = [Value(plan.Axes[0], p / inner), Value(plan.Axes[1], p % inner)];
        }
        return points;
    }

    /// <summary>
    /// The neighbour whose labels a point inherits: the previous point along the inner axis, or for the first
    /// point of a row the first point of the previous row; −1 for the very first point.
    /// </summary>
    public static int Predecessor(SweepPlan plan, int flatIndex)
    {
        if (flatIndex == 0) return -1;
        if (plan.Axes.Count == 1) return flatIndex - 1;
        int inner = plan.Axes[1].Count;
        return flatIndex % inner == 0 ? flatIndex - inner : flatIndex - 1;
    }
}

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
        problems.AddRange(AxisProblems(plan.Axes));
        if (plan.Levels is int k && k < 1) problems.Add($"levels must be at least 1 (got {k})");
        return problems;
    }

    /// <summary>
    /// Most points of one sweep or scan (a 500×500 grid): each point keeps its dressed states, and beyond this a
    /// sweep takes hours and gigabytes; a count of 1e9 or a 46,341² grid used to overflow or run until killed.
    /// </summary>
    public const int MaxPoints = 250_000;

    /// <summary>Problems of the axes themselves: counts, the total (in long arithmetic, so it cannot wrap), finite ends and links.</summary>
    public static IReadOnlyList<string> AxisProblems(IReadOnlyList<SweepAxis> axes)
    {
        var problems = new List<string>();
        long total = 1;
        foreach (var axis in axes)
        {
            if (axis.Count < 1) problems.Add($"axis '{axis.Path}': count must be at least 1 (got {axis.Count})");
            total *= Math.Max(1, axis.Count);
            if (!Bounded(axis.Start) || !Bounded(axis.Stop) || !double.IsFinite(axis.Stop - axis.Start))
                problems.Add($"axis '{axis.Path}': start and stop must be finite numbers of magnitude at most {Units.QuantityParser.MaxMagnitude:0e0}");
            foreach (var link in axis.Links)
                if (!double.IsFinite(link.Scale) || !double.IsFinite(link.Shift)
                    || !Bounded(link.Scale * axis.Start + link.Shift) || !Bounded(link.Scale * axis.Stop + link.Shift))
                    problems.Add($"axis '{axis.Path}': link '{link.Path}' reaches {link.Scale * axis.Start + link.Shift:G4} … {link.Scale * axis.Stop + link.Shift:G4}; " +
                                 $"linked values must be finite and of magnitude at most {Units.QuantityParser.MaxMagnitude:0e0}");
        }
        if (total > MaxPoints)
            problems.Add((axes.Count > 1 ? $"{string.Join(" × ", axes.Select(a => a.Count.ToString("N0")))} = " : "") +
                         $"{total:N0} points; a sweep or scan has at most {MaxPoints:N0} (fewer points, or split the range)");
        return problems;
    }

    private static bool Bounded(double x) => double.IsFinite(x) && Math.Abs(x) <= Units.QuantityParser.MaxMagnitude;

    public static double Value(SweepAxis axis, int index) =>
        axis.Count == 1 ? axis.Start : axis.Start + (axis.Stop - axis.Start) * index / (axis.Count - 1);

    public static int PointCount(SweepPlan plan) => checked(plan.Axes.Aggregate(1, (n, a) => n * a.Count));

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

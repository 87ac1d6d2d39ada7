namespace LevelDesign.Core.Labels;

/// <summary>Labels dressed states by their bare character with a one-to-one assignment.</summary>
public static class Labeller
{
    /// <summary>Top overlaps closer than this are called ambiguous rather than silently chosen.</summary>
    public const double DefaultAmbiguityMargin = 0.1;

    /// <param name="weights">|⟨bare j|dressed k⟩|², column-major: weights[k*dimension + j].</param>
    public static DressedLabel[] Label(double[] weights, int dimension, int dressedCount, int topComponents = 4,
        double ambiguityMargin = DefaultAmbiguityMargin)
    {
        // Only columns that matter to some dressed state enter the assignment, which keeps it small.
        var candidates = new SortedSet<int>();
        for (int k = 0; k < dressedCount; k++)
        {
            var top = Enumerable.Range(0, dimension).OrderByDescending(j => weights[k * dimension + j]).Take(Math.Min(dimension, dressedCount + 2));
            foreach (int j in top) candidates.Add(j);
        }
        var columns = candidates.ToArray();
        var cost = new double[dressedCount, columns.Length];
        for (int k = 0; k < dressedCount; k++)
            for (int c = 0; c < columns.Length; c++)
                cost[k, c] = -weights[k * dimension + columns[c]];
        var assigned = Assignment.Solve(cost);
        var labels = new DressedLabel[dressedCount];
        for (int k = 0; k < dressedCount; k++)
        {
            int bare = columns[assigned[k]];
            var sorted = Enumerable.Range(0, dimension)
                .Select(j => new Component(j, weights[k * dimension + j]))
                .OrderByDescending(c => c.Weight)
                .Take(topComponents)
                .ToArray();
            double purity = weights[k * dimension + bare];
            double first = sorted[0].Weight, second = sorted.Length > 1 ? sorted[1].Weight : 0;
            bool ambiguous = first - second < ambiguityMargin || sorted[0].BareIndex != bare;
            labels[k] = new DressedLabel(bare, purity, ambiguous, sorted);
        }
        return labels;
    }
}

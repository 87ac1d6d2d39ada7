namespace LevelDesign.Core.Labels;

/// <summary>Labels dressed states by their bare character with a one-to-one assignment.</summary>
public static class Labeller
{
    /// <summary>Top overlaps closer than this are called ambiguous rather than silently chosen.</summary>
    public const double DefaultAmbiguityMargin = 0.1;

    /// <summary>
    /// A dressed state with more than 2/3 of its weight on one bare state takes that label directly: weights of a
    /// unitary's rows and columns sum to at most 1, so any exchange with another pairing loses at least 3w − 2 &gt; 0,
    /// which means the optimal assignment agrees. Only the remaining, mixed states go through the assignment.
    /// </summary>
    private const double ForcedWeight = 2.0 / 3.0;

    /// <param name="weights">|⟨bare j|dressed k⟩|², column-major: weights[k*dimension + j].</param>
    public static DressedLabel[] Label(double[] weights, int dimension, int dressedCount, int topComponents = 4,
        double ambiguityMargin = DefaultAmbiguityMargin)
    {
        var assigned = new int[dressedCount];
        var taken = new bool[dimension];
        var open = new List<int>();
        var tops = new Component[dressedCount][];
        for (int k = 0; k < dressedCount; k++)
        {
            tops[k] = Top(weights.AsSpan(k * dimension, dimension), Math.Max(topComponents, 2));
            if (tops[k][0].Weight > ForcedWeight) { assigned[k] = tops[k][0].BareIndex; taken[assigned[k]] = true; }
            else open.Add(k);
        }
        if (open.Count > 0) AssignMixed(weights, dimension, open, taken, assigned);

        var labels = new DressedLabel[dressedCount];
        for (int k = 0; k < dressedCount; k++)
        {
            int bare = assigned[k];
            var top = tops[k];
            double purity = weights[k * dimension + bare];
            bool ambiguous = top[0].Weight - top[1].Weight < ambiguityMargin || top[0].BareIndex != bare;
            labels[k] = new DressedLabel(bare, purity, ambiguous, top.Where(c => c.BareIndex >= 0).Take(topComponents).ToArray());
        }
        return labels;
    }

    /// <summary>Hungarian assignment of the mixed states over the bare states that matter to them and are still free.</summary>
    private static void AssignMixed(double[] weights, int dimension, List<int> rows, bool[] taken, int[] assigned)
    {
        var candidates = new SortedSet<int>();
        foreach (int k in rows)
            foreach (var c in Top(weights.AsSpan(k * dimension, dimension), rows.Count + 2, taken))
                if (c.BareIndex >= 0) candidates.Add(c.BareIndex);
        var columns = candidates.ToArray();
        if (columns.Length < rows.Count)
            columns = Enumerable.Range(0, dimension).Where(j => !taken[j]).ToArray();
        var cost = new double[rows.Count, columns.Length];
        for (int r = 0; r < rows.Count; r++)
            for (int c = 0; c < columns.Length; c++)
                cost[r, c] = -weights[rows[r] * dimension + columns[c]];
        var choice = Assignment.Solve(cost);
        for (int r = 0; r < rows.Count; r++) assigned[rows[r]] = columns[choice[r]];
    }

    /// <summary>The <paramref name="count"/> largest weights of one dressed state, largest first (ties: lower index).</summary>
    private static Component[] Top(ReadOnlySpan<double> row, int count, bool[]? skip = null)
    {
        count = Math.Min(count, row.Length);
        var best = new List<Component>(count + 1);
        for (int j = 0; j < row.Length; j++)
        {
            if (skip is not null && skip[j]) continue;
            double w = row[j];
            if (best.Count == count && w <= best[^1].Weight) continue;
            int at = best.Count;
            while (at > 0 && best[at - 1].Weight < w) at--;
            best.Insert(at, new Component(j, w));
            if (best.Count > count) best.RemoveAt(best.Count - 1);
        }
        while (best.Count < count) best.Add(new Component(-1, 0));
        return best.ToArray();
    }
}

namespace LevelDesign.Ui.Compute;

/// <summary>
/// Until the sweep engine's crossing finder is merged: for every pair of branches, the sweep point where
/// their gap is smallest; it counts as a crossing only when it lies inside the sweep (a true minimum, not an
/// end point), the two are energy neighbours there, and the gap there is under half the gap at either
/// end of the sweep (our own rule, so that two levels merely running side by side are not called a
/// crossing). Ranked by gap, smallest first.
/// </summary>
public static class NearApproachFinder
{
    public static IReadOnlyList<NearApproach> Find(SpectrumSeries series, int limit = 40)
    {
        int n = series.Axis.Length;
        var found = new List<NearApproach>();
        var branches = series.Branches;
        for (int a = 0; a < branches.Count; a++)
            for (int b = a + 1; b < branches.Count; b++)
            {
                int best = -1;
                double bestGap = double.PositiveInfinity;
                for (int i = 0; i < n; i++)
                {
                    double gap = Math.Abs(branches[a].Frequencies[i] - branches[b].Frequencies[i]);
                    if (gap < bestGap) { bestGap = gap; best = i; }
                }
                if (best <= 0 || best >= n - 1 || !Neighbours(branches, a, b, best)) continue;
                double endGap = Math.Min(Gap(branches[a], branches[b], 0), Gap(branches[a], branches[b], n - 1));
                if (!(bestGap < 0.5 * endGap) && double.IsFinite(endGap)) continue;
                var (low, high) = branches[a].Frequencies[best] <= branches[b].Frequencies[best] ? (branches[a], branches[b]) : (branches[b], branches[a]);
                found.Add(new NearApproach(low.Label, high.Label, bestGap, best, series.Axis[best],
                    (low.Frequencies[best] + high.Frequencies[best]) / 2));
            }
        return found.OrderBy(c => c.GapGHz).Take(limit).ToList();
    }

    private static double Gap(Branch a, Branch b, int i) => Math.Abs(a.Frequencies[i] - b.Frequencies[i]);

    private static bool Neighbours(IReadOnlyList<Branch> branches, int a, int b, int i)
    {
        double fa = branches[a].Frequencies[i], fb = branches[b].Frequencies[i];
        double low = Math.Min(fa, fb), high = Math.Max(fa, fb);
        for (int k = 0; k < branches.Count; k++)
        {
            if (k == a || k == b) continue;
            double f = branches[k].Frequencies[i];
            if (f > low && f < high) return false;
        }
        return true;
    }
}

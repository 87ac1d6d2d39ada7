namespace LevelDesign.Ui.Compute;

/// <summary>
/// Until the sweep engine's crossing finder is merged: for every pair of branches that are energy
/// neighbours somewhere on the sweep, the point where their gap is smallest; only minima inside the sweep
/// (not at its ends) count as crossings. Ranked by gap, smallest first.
/// </summary>
public static class NearApproachFinder
{
    public static IReadOnlyList<NearApproach> Find(SpectrumSeries series, int limit = 40)
    {
        int n = series.Axis.Length;
        var best = new Dictionary<(int, int), NearApproach>();
        for (int i = 0; i < n; i++)
        {
            var present = series.Branches.Where(b => double.IsFinite(b.Frequencies[i])).OrderBy(b => b.Frequencies[i]).ToList();
            for (int k = 0; k + 1 < present.Count; k++)
            {
                var (a, b) = (present[k], present[k + 1]);
                var key = a.BareIndex < b.BareIndex ? (a.BareIndex, b.BareIndex) : (b.BareIndex, a.BareIndex);
                double gap = b.Frequencies[i] - a.Frequencies[i];
                if (!best.TryGetValue(key, out var old) || gap < old.GapGHz)
                    best[key] = new NearApproach(a.Label, b.Label, gap, i, series.Axis[i], (a.Frequencies[i] + b.Frequencies[i]) / 2);
            }
        }
        return best.Values
            .Where(c => c.PointIndex > 0 && c.PointIndex < n - 1)
            .OrderBy(c => c.GapGHz)
            .Take(limit)
            .ToList();
    }
}

namespace LevelDesign.Core.Spread;

/// <summary>
/// How strongly one spread parameter goes with failure: the failure rate of samples drawn below −1σ, within ±1σ and
/// above +1σ, and two correlations with the failure indicator (1 failed, 0 passed): of the signed deviation (a
/// one-sided cause, e.g. a qubit drawn too low) and of its size (a two-sided one, e.g. a window on both sides).
/// <see cref="Score"/>, the larger of |signed| and size correlation, ranks the parameters. A correlation, not a
/// proof: with correlated groups a shared factor shows up in every member.
/// </summary>
public sealed record ParameterResponsibility(string Path, double FailureBelow, double FailureWithin, double FailureAbove,
    long CountBelow, long CountWithin, long CountAbove, double SignedCorrelation, double SizeCorrelation)
{
    public double Score => Math.Max(double.IsNaN(SignedCorrelation) ? 0 : Math.Abs(SignedCorrelation), double.IsNaN(SizeCorrelation) ? 0 : SizeCorrelation);

    public static ParameterResponsibility Of(string path, IReadOnlyList<double> deviations, IReadOnlyList<bool> failed)
    {
        double Rate(Func<double, bool> where, out long count)
        {
            var chosen = deviations.Select((z, i) => (z, i)).Where(x => where(x.z)).ToList();
            count = chosen.Count;
            return count == 0 ? double.NaN : chosen.Count(x => failed[x.i]) / (double)count;
        }
        double below = Rate(z => z < -1, out long nb), within = Rate(z => z >= -1 && z <= 1, out long nw), above = Rate(z => z > 1, out long na);
        var f = failed.Select(x => x ? 1.0 : 0.0).ToArray();
        return new ParameterResponsibility(path, below, within, above, nb, nw, na,
            Correlation(deviations.ToArray(), f), Correlation(deviations.Select(Math.Abs).ToArray(), f));
    }

    /// <summary>Pearson's correlation; NaN when either variable is constant.</summary>
    private static double Correlation(double[] x, double[] y)
    {
        int n = x.Length;
        if (n < 2) return double.NaN;
        double mx = x.Average(), my = y.Average(), sxy = 0, sxx = 0, syy = 0;
        for (int i = 0; i < n; i++)
        {
            sxy += (x[i] - mx) * (y[i] - my);
            sxx += (x[i] - mx) * (x[i] - mx);
            syy += (y[i] - my) * (y[i] - my);
        }
        return sxx > 0 && syy > 0 ? sxy / Math.Sqrt(sxx * syy) : double.NaN;
    }
}

using LevelDesign.Core.Composite;
using LevelDesign.Core.Model;

namespace LevelDesign.Core.Sweeps;

/// <summary>
/// Finds every near-approach between labelled dressed levels along a 1-D sweep, whatever the elements
/// (qubits, resonators, defects, couplers, multi-excitation states). Candidates are sign changes of
/// E_A − E_B between neighbouring points (labels by character swap branches at an avoided crossing) and
/// local minima of |E_A − E_B| below <see cref="CrossingOptions.MaxGapGHz"/> (labels by order). Each is
/// refined by Brent minimisation in the bias of the separation of the two dressed states that share the
/// A/B character, which is the adiabatic gap 2g_eff.
/// </summary>
public static class CrossingFinder
{
    public static IReadOnlyList<Crossing> Find(SweepResult sweep, Func<double, Device> resolve, CrossingOptions? options = null,
        DeviceSolver? solver = null, CancellationToken cancellation = default)
    {
        options ??= new CrossingOptions();
        solver ??= new DeviceSolver();
        if (sweep.Plan.Axes.Count != 1) throw new ArgumentException("crossings are searched along a 1-D sweep; this sweep has two axes");
        var points = sweep.Points;
        if (points.Count < 3) return [];
        var first = points[0].Spectrum;
        int levels = Math.Min(first.Count, options.Levels ?? (sweep.Plan.Levels ?? Math.Max(1, first.Count - 4)));
        var states = Enumerable.Range(0, levels).Select(k => first.LabelLevels(k)).ToArray();
        var x = points.Select(p => p.AxisValues[0]).ToArray();
        var energies = states.Select(s => points.Select(p => p.Spectrum.EnergyOf(s)).ToArray()).ToArray();

        var candidates = new List<(int A, int B, double Lower, double Upper, bool SignChange)>();
        for (int a = 0; a < states.Length; a++)
            for (int b = a + 1; b < states.Length; b++)
            {
                var d = energies[a].Zip(energies[b], (ea, eb) => ea - eb).ToArray();
                for (int i = 0; i + 1 < d.Length; i++)
                    if (double.IsFinite(d[i]) && double.IsFinite(d[i + 1]) && Math.Sign(d[i]) != Math.Sign(d[i + 1]))
                        candidates.Add((a, b, x[Math.Max(i - 1, 0)], x[Math.Min(i + 2, d.Length - 1)], true));
                for (int i = 1; i + 1 < d.Length; i++)
                {
                    double g = Math.Abs(d[i]);
                    if (!(g < options.MaxGapGHz) || !(g <= Math.Abs(d[i - 1])) || !(g <= Math.Abs(d[i + 1]))) continue;
                    if (Math.Sign(d[i - 1]) != Math.Sign(d[i]) || Math.Sign(d[i + 1]) != Math.Sign(d[i])) continue;   // a sign change covers it
                    candidates.Add((a, b, x[i - 1], x[i + 1], false));
                }
            }

        var found = new Crossing?[candidates.Count];
        int count = first.Count;
        // CPU-bound items: without a cap the thread pool keeps adding workers that only contend for the cores
        var parallel = new ParallelOptions { CancellationToken = cancellation, MaxDegreeOfParallelism = Environment.ProcessorCount };
        Parallel.For(0, candidates.Count, parallel, c =>
        {
            var (a, b, lower, upper, signChange) = candidates[c];
            var crossing = Refine(solver, resolve, states[a], states[b], lower, upper, count, options.BiasTolerance);
            // a dip in the separation of two states that stay pure is a level repulsion seen from afar, not a crossing
            found[c] = signChange || crossing is null || crossing.Purity <= options.MaximumPurityOfNearApproach ? crossing : null;
        });

        double step = x.Length > 1 ? Math.Abs(x[1] - x[0]) : 0;
        var distinct = new List<Crossing>();
        var kept = found.OfType<Crossing>()
            .Where(c => (c.Refined || options.IncludeUnrefined) && !(c.PairWeight < options.MinimumPairWeight));
        foreach (var crossing in kept.OrderBy(c => c.GapGHz))
            if (!distinct.Any(d => d.LabelA == crossing.LabelA && d.LabelB == crossing.LabelB && Math.Abs(d.Bias - crossing.Bias) <= 1.5 * step))
                distinct.Add(crossing);
        return Rank(distinct, options.OperatingPoints);
    }

    /// <summary>Orders crossings by distance to the nearest operating point (then by gap); without points, by bias.</summary>
    public static IReadOnlyList<Crossing> Rank(IReadOnlyList<Crossing> crossings, IReadOnlyList<double> operatingPoints)
    {
        if (operatingPoints.Count == 0) return crossings.OrderBy(c => c.Bias).ThenBy(c => c.GapGHz).ToArray();
        return crossings
            .Select(c => c with { DistanceToOperatingPoint = operatingPoints.Min(p => Math.Abs(c.Bias - p)) })
            .OrderBy(c => c.DistanceToOperatingPoint).ThenBy(c => c.GapGHz).ToArray();
    }

    private static Crossing? Refine(DeviceSolver solver, Func<double, Device> resolve, int[] stateA, int[] stateB,
        double lower, double upper, int count, double tolerance)
    {
        (double Gap, double Purity, double PairWeight) Separation(double bias)
        {
            var s = solver.Solve(resolve(bias), count);
            int ia = s.Basis.IndexOf(stateA), ib = s.Basis.IndexOf(stateB);
            if (ia < 0 || ib < 0) return (double.NaN, double.NaN, double.NaN);
            // the two dressed states holding most of the A/B character span the pair's subspace
            double PairShare(int k) => s.Weights[k * s.Dimension + ia] + s.Weights[k * s.Dimension + ib];
            var pair = Enumerable.Range(0, s.Count).OrderByDescending(PairShare).Take(2).ToArray();
            if (pair.Length < 2) return (double.NaN, double.NaN, double.NaN);
            double purity = pair.Min(k => Math.Max(s.Weights[k * s.Dimension + ia], s.Weights[k * s.Dimension + ib]));
            return (Math.Abs(s.Energies[pair[0]] - s.Energies[pair[1]]), purity, pair.Min(PairShare));
        }

        // the squared gap of two coupled levels is a parabola in the bias near its minimum, so Brent's parabolic
        // steps converge in a few solves
        var (bias, squared) = BrentMinimizer.Minimize(b => Separation(b).Gap is double g && double.IsFinite(g) ? g * g : double.MaxValue,
            lower, upper, tolerance);
        if (squared == double.MaxValue) return null;
        double gap = Math.Sqrt(squared);
        var (_, purity, pairWeight) = Separation(bias);
        string label(int[] s) => "|" + string.Join(",", s) + "⟩";
        bool interior = bias > Math.Min(lower, upper) + 10 * tolerance && bias < Math.Max(lower, upper) - 10 * tolerance;
        return new Crossing(label(stateA), label(stateB), stateA, stateB, bias, gap, purity, interior, PairWeight: pairWeight);
    }
}

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
/// <remarks>The refinement shares its solves between candidates: see <see cref="CrossingRefiner"/>.</remarks>
public static class CrossingFinder
{
    public static IReadOnlyList<Crossing> Find(SweepResult sweep, Func<double, Device> resolve, CrossingOptions? options = null,
        DeviceSolver? solver = null, CancellationToken cancellation = default)
    {
        options ??= new CrossingOptions();
        if (sweep.Plan.Axes.Count != 1) throw new ArgumentException("crossings are searched along a 1-D sweep; this sweep has two axes");
        if (sweep.Points.Count < 3) return [];
        var states = SearchedStates(sweep, options);
        var candidates = Candidates(sweep, states, options);
        var refined = CrossingRefiner.RefineAll(sweep, resolve, states, candidates, options.BiasTolerance, solver ?? new DeviceSolver(),
            Eigen.ComputeCores.Limit, cancellation);
        return Keep(candidates, refined, options, Math.Abs(sweep.Points[1].AxisValues[0] - sweep.Points[0].AxisValues[0]));
    }

    /// <summary>
    /// The refined candidates worth reporting, one per label pair and stretch, ranked: near-approaches only where the
    /// states mix, minima inside their bracket (unless <see cref="CrossingOptions.IncludeUnrefined"/>), clean two-level
    /// pairs (<see cref="CrossingOptions.MinimumPairWeight"/>); of the same pair within 1.5 sweep steps, the smallest gap.
    /// </summary>
    internal static IReadOnlyList<Crossing> Keep(IReadOnlyList<CrossingCandidate> candidates, IReadOnlyList<Crossing?> refined,
        CrossingOptions options, double step)
    {
        var found = new List<Crossing>();
        for (int c = 0; c < candidates.Count; c++)
            // a dip in the separation of two states that stay pure is a level repulsion seen from afar, not a crossing
            if (refined[c] is Crossing crossing && (candidates[c].SignChange || crossing.Purity <= options.MaximumPurityOfNearApproach))
                found.Add(crossing);
        var distinct = new List<Crossing>();
        var kept = found.Where(c => (c.Refined || options.IncludeUnrefined) && !(c.PairWeight < options.MinimumPairWeight));
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

    /// <summary>The labels paired: those of the lowest <see cref="CrossingOptions.Levels"/> states at the first point.</summary>
    internal static int[][] SearchedStates(SweepResult sweep, CrossingOptions options)
    {
        var first = sweep.Points[0].Spectrum;
        int levels = Math.Min(first.Count, options.Levels ?? (sweep.Plan.Levels ?? Math.Max(1, first.Count - 4)));
        return Enumerable.Range(0, levels).Select(k => first.LabelLevels(k)).ToArray();
    }

    /// <summary>Every stretch where two searched labels come close, in the order label pairs are enumerated.</summary>
    internal static IReadOnlyList<CrossingCandidate> Candidates(SweepResult sweep, int[][] states, CrossingOptions options)
    {
        var points = sweep.Points;
        var x = points.Select(p => p.AxisValues[0]).ToArray();
        var energies = states.Select(s => points.Select(p => p.Spectrum.EnergyOf(s)).ToArray()).ToArray();
        var candidates = new List<CrossingCandidate>();
        for (int a = 0; a < states.Length; a++)
            for (int b = a + 1; b < states.Length; b++)
            {
                var d = energies[a].Zip(energies[b], (ea, eb) => ea - eb).ToArray();
                for (int i = 0; i + 1 < d.Length; i++)
                    if (double.IsFinite(d[i]) && double.IsFinite(d[i + 1]) && Math.Sign(d[i]) != Math.Sign(d[i + 1]))
                        candidates.Add(new CrossingCandidate(a, b, x[Math.Max(i - 1, 0)], x[Math.Min(i + 2, d.Length - 1)], true));
                for (int i = 1; i + 1 < d.Length; i++)
                {
                    double g = Math.Abs(d[i]);
                    if (!(g < options.MaxGapGHz) || !(g <= Math.Abs(d[i - 1])) || !(g <= Math.Abs(d[i + 1]))) continue;
                    if (Math.Sign(d[i - 1]) != Math.Sign(d[i]) || Math.Sign(d[i + 1]) != Math.Sign(d[i])) continue;   // a sign change covers it
                    candidates.Add(new CrossingCandidate(a, b, x[i - 1], x[i + 1], false));
                }
            }
        return candidates;
    }
}

using System.Numerics;
using System.Runtime.InteropServices;
using LevelDesign.Core.Composite;
using LevelDesign.Core.Eigen;
using LevelDesign.Core.Labels;

namespace LevelDesign.Core.Sweeps;

/// <summary>
/// Gives the states of each sweep point their labels, carried from the neighbouring point.
/// By character: every label goes to the state that carries most of its bare weight, with a bonus
/// (<see cref="SweepOptions.Hysteresis"/>) for the state that continues, by eigenvector overlap, the state
/// that held it at the neighbour; a one-to-one (Hungarian) assignment settles it. A label therefore follows
/// the diabatic identity through a crossing, and does not flicker where several bare states share a state.
/// By order: the k-th state keeps the label the k-th state had at the neighbour.
/// A point is marked ambiguous when a label could as well have gone elsewhere (margin below
/// <see cref="SweepOptions.AmbiguityMargin"/>) or, by order, when two levels are degenerate.
/// </summary>
internal sealed class LabelTracker(LabelMode mode, SweepOptions options, int judgedCount)
{
    private const int TopComponents = 4;
    private const double DegenerateGHz = 1e-9;

    /// <summary>
    /// The parts of labelling that need no neighbour's labels — bare weights and, by character, the overlaps with
    /// the neighbour's vectors — so a sweep can compute them for all points in parallel before the sequential pass.
    /// </summary>
    public static LabelInputs Inputs(LabelMode mode, SolvedPoint point, SolvedPoint? previous)
    {
        var weights = point.Weights();
        int n = point.Dimension;
        var top = new int[point.Count][];
        for (int k = 0; k < top.Length; k++) top[k] = TopIndices(weights.AsSpan(k * n, n), TopComponents);
        return new(weights, top, previous is not null && mode == LabelMode.ByCharacter ? Overlaps(previous, point) : null);
    }

    public (DressedSpectrum Spectrum, bool Ambiguous) First(SolvedPoint point, LabelInputs inputs)
    {
        var weights = inputs.Weights;
        var labels = Labeller.Label(weights, point.Dimension, point.Count, TopComponents, options.AmbiguityMargin);
        bool ambiguous = labels.Take(judgedCount).Any(l => l.Ambiguous);
        return (Build(point, weights, labels), ambiguous);
    }

    /// <param name="previousSpectrum">The labelled neighbour (its labels and basis only: its vectors may be gone).</param>
    public (DressedSpectrum Spectrum, bool Ambiguous) Next(SolvedPoint point, LabelInputs inputs, DressedSpectrum previousSpectrum)
    {
        var weights = inputs.Weights;
        // the neighbour's labels, as indices of this point's basis
        var previousLabels = new int[previousSpectrum.Count];
        for (int i = 0; i < previousLabels.Length; i++)
            previousLabels[i] = point.Problem.Basis.IndexOf(previousSpectrum.Basis.States[previousSpectrum.Labels[i].BareIndex]);

        return mode == LabelMode.ByOrder
            ? ByOrder(point, weights, inputs.Top, previousLabels)
            : ByCharacter(point, weights, inputs.Top, previousLabels, inputs.Overlaps!);
    }

    private (DressedSpectrum, bool) ByOrder(SolvedPoint point, double[] weights, int[][] top, int[] previousLabels)
    {
        int n = point.Dimension, count = point.Count;
        var taken = new HashSet<int>();
        var chosen = new int[count];
        for (int k = 0; k < count; k++)
        {
            int label = k < previousLabels.Length ? previousLabels[k] : -1;
            if (label < 0 || !taken.Add(label))
            {
                // a level new to this point (more levels, or its label pruned): its own largest free component
                label = Enumerable.Range(0, n).Where(j => !taken.Contains(j)).MaxBy(j => weights[k * n + j]);
                taken.Add(label);
            }
            chosen[k] = label;
        }
        bool ambiguous = false;
        for (int k = 0; k + 1 < Math.Min(count, judgedCount + 1); k++)
            if (point.Values[k + 1] - point.Values[k] < DegenerateGHz) ambiguous = true;
        var labels = new DressedLabel[count];
        for (int k = 0; k < count; k++) labels[k] = MakeLabel(weights, top[k], n, k, chosen[k], k < judgedCount && ambiguous && IsDegenerate(point, k));
        return (Build(point, weights, labels), ambiguous);
    }

    private static bool IsDegenerate(SolvedPoint point, int k) =>
        (k > 0 && point.Values[k] - point.Values[k - 1] < DegenerateGHz) ||
        (k + 1 < point.Count && point.Values[k + 1] - point.Values[k] < DegenerateGHz);

    private (DressedSpectrum, bool) ByCharacter(SolvedPoint point, double[] weights, int[][] top, int[] previousLabels, double[,] overlaps)
    {
        int n = point.Dimension, count = point.Count;
        var candidates = new List<int>();
        var column = new Dictionary<int, int>();
        void AddCandidate(int bare)
        {
            if (bare >= 0 && column.TryAdd(bare, candidates.Count)) candidates.Add(bare);
        }
        foreach (int label in previousLabels) AddCandidate(label);
        for (int k = 0; k < count; k++)
            foreach (int j in top[k].AsSpan(0, Math.Min(3, top[k].Length))) AddCandidate(j);

        var owner = new int[candidates.Count];   // neighbour state that held each candidate label, or −1
        Array.Fill(owner, -1);
        for (int i = 0; i < previousLabels.Length; i++)
            if (previousLabels[i] >= 0) owner[column[previousLabels[i]]] = i;

        var score = new double[count, candidates.Count];
        var cost = new double[count, candidates.Count];
        for (int k = 0; k < count; k++)
            for (int c = 0; c < candidates.Count; c++)
            {
                double s = weights[k * n + candidates[c]];
                if (owner[c] >= 0) s += options.Hysteresis * overlaps[owner[c], k];
                score[k, c] = s;
                cost[k, c] = -s;
            }
        var assigned = Assignment.Solve(cost);

        bool ambiguous = false;
        var labels = new DressedLabel[count];
        for (int k = 0; k < count; k++)
        {
            double best = score[k, assigned[k]], runnerUp = double.NegativeInfinity;
            for (int c = 0; c < candidates.Count; c++)
                if (c != assigned[k]) runnerUp = Math.Max(runnerUp, score[k, c]);
            bool close = best - runnerUp < options.AmbiguityMargin && k < judgedCount;
            ambiguous |= close;
            labels[k] = MakeLabel(weights, top[k], n, k, candidates[assigned[k]], close);
        }
        return (Build(point, weights, labels), ambiguous);
    }

    /// <summary>|⟨previous i|current k⟩|², matching product states across the two bases.</summary>
    private static double[,] Overlaps(SolvedPoint previous, SolvedPoint current)
    {
        int n = current.Dimension, oldCount = previous.Count, count = current.Count;
        bool sameBasis = ReferenceEquals(previous.Problem.Basis.Structure, current.Problem.Basis.Structure);
        // the neighbour's vectors in this basis (gathered only when the two bases differ)
        var map = sameBasis ? null : current.IndexMapTo(previous.Problem.Basis);
        var result = new double[oldCount, count];
        if (previous.ComplexVectors is null && current.ComplexVectors is null)
        {
            var dots = Dots(Gathered(previous.RealVectors!, previous.Dimension, oldCount, map, n), current.RealVectors!, n, oldCount, count);
            for (int i = 0; i < oldCount; i++)
                for (int k = 0; k < count; k++) result[i, k] = dots[i * count + k] * dots[i * count + k];
            return result;
        }
        // Complex vectors as interleaved (re, im) pairs, so every ⟨o|v⟩ = Σ (o_re v_re + o_im v_im) + i Σ (o_re v_im −
        // o_im v_re) is two blocked real products of length 2n: one with v itself, one with v turned to (v_im, −v_re).
        var old = Interleaved(previous, map, n);
        var now = Interleaved(current, null, n);
        var turned = new double[now.Length];
        for (int j = 0; j < now.Length; j += 2) { turned[j] = now[j + 1]; turned[j + 1] = -now[j]; }
        var real = Dots(old, now, 2 * n, oldCount, count);
        var imaginary = Dots(old, turned, 2 * n, oldCount, count);
        for (int i = 0; i < oldCount; i++)
            for (int k = 0; k < count; k++)
            {
                int p = i * count + k;
                result[i, k] = real[p] * real[p] + imaginary[p] * imaginary[p];
            }
        return result;
    }

    /// <summary>Real vectors (column-major, <paramref name="own"/> per state) in a basis of n states; map[j] is the vectors' index of state j (−1: absent), null when the bases agree.</summary>
    private static double[] Gathered(double[] vectors, int own, int count, int[]? map, int n)
    {
        if (map is null) return vectors;
        var gathered = new double[n * count];
        for (int k = 0; k < count; k++)
            for (int j = 0; j < n; j++) gathered[k * n + j] = map[j] < 0 ? 0 : vectors[k * own + map[j]];
        return gathered;
    }

    /// <summary>A point's vectors as interleaved (re, im) pairs in a basis of n states (see <see cref="Gathered"/>); complex vectors in their own basis are read in place.</summary>
    private static ReadOnlySpan<double> Interleaved(SolvedPoint point, int[]? map, int n)
    {
        int own = point.Dimension, count = point.Count;
        if (map is null && point.ComplexVectors is Complex[] inPlace) return MemoryMarshal.Cast<Complex, double>(inPlace.AsSpan());
        var pairs = new double[2 * n * count];
        for (int k = 0; k < count; k++)
            for (int j = 0; j < n; j++)
            {
                int source = map is null ? j : map[j];
                if (source < 0) continue;
                var z = point.ComplexVectors?[k * own + source] ?? point.RealVectors![k * own + source];
                pairs[2 * (k * n + j)] = z.Real;
                pairs[2 * (k * n + j) + 1] = z.Imaginary;
            }
        return pairs;
    }

    private static double[] Dots(ReadOnlySpan<double> a, ReadOnlySpan<double> b, int length, int aCount, int bCount)
    {
        var dots = new double[aCount * bCount];
        BlockProducts.Dots(a, length, aCount, b, bCount, dots, bCount);
        return dots;
    }

    private static DressedLabel MakeLabel(double[] weights, int[] top, int n, int k, int bare, bool ambiguous)
    {
        var components = top.Select(j => new Component(j, weights[k * n + j])).ToArray();
        return new DressedLabel(bare, weights[k * n + bare], ambiguous, components);
    }

    /// <summary>Indices of the largest entries, largest first (a partial selection; vectors are long, tops short).</summary>
    private static int[] TopIndices(ReadOnlySpan<double> values, int count)
    {
        count = Math.Min(count, values.Length);
        var top = new int[count];
        var topValues = new double[count];
        int filled = 0;
        for (int j = 0; j < values.Length; j++)
        {
            double v = values[j];
            if (filled == count && v <= topValues[count - 1]) continue;
            int p = filled < count ? filled++ : count - 1;
            while (p > 0 && topValues[p - 1] < v) { top[p] = top[p - 1]; topValues[p] = topValues[p - 1]; p--; }
            top[p] = j;
            topValues[p] = v;
        }
        return top;
    }

    private static DressedSpectrum Build(SolvedPoint point, double[] weights, DressedLabel[] labels) =>
        new(point.Problem.Device, point.Problem.Bare, point.Problem.Couplers, point.Problem.Basis, point.Values, weights,
            point.ComplexVectors, point.RealVectors, labels, point.SolverName, point.IsComplex) { MaxResidual = point.MaxResidual, Selection = point.Selection };
}

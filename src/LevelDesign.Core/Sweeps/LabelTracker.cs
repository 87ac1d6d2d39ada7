using System.Numerics;
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
        // the neighbour's vectors in this basis (gathered only when the two bases differ), split into real and
        // imaginary parts, so that every ⟨old_i|new_k⟩ comes from blocked real products: a real gauge makes most
        // complex points real up to phases, and the parts keep the product vectorised either way
        bool sameBasis = ReferenceEquals(previous.Problem.Basis.Structure, current.Problem.Basis.Structure);
        var map = sameBasis ? null : current.IndexMapTo(previous.Problem.Basis);
        var (oldRe, oldIm) = Parts(previous, map, n);
        var (re, im) = Parts(current, null, n);
        var rr = Dots(oldRe, oldCount, re, count, n);
        var ii = oldIm is not null && im is not null ? Dots(oldIm, oldCount, im, count, n) : null;
        var ri = im is not null ? Dots(oldRe, oldCount, im, count, n) : null;
        var ir = oldIm is not null ? Dots(oldIm, oldCount, re, count, n) : null;
        var result = new double[oldCount, count];
        for (int i = 0; i < oldCount; i++)
            for (int k = 0; k < count; k++)
            {
                int p = i * count + k;
                // ⟨o|v⟩ = Σ (o_re − i o_im)(v_re + i v_im)
                double real = rr[p] + (ii?[p] ?? 0), imaginary = (ri?[p] ?? 0) - (ir?[p] ?? 0);
                result[i, k] = real * real + imaginary * imaginary;
            }
        return result;
    }

    /// <summary>A point's vectors (column-major, n per state) as real and imaginary parts in a basis of n states; map[j] is the point's index of state j (−1: absent), null when the bases agree. Imaginary is null for real vectors.</summary>
    private static (double[] Real, double[]? Imaginary) Parts(SolvedPoint point, int[]? map, int n)
    {
        int own = point.Dimension, count = point.Count;
        if (map is null && point.RealVectors is double[] real) return (real, null);
        var re = new double[n * count];
        var im = point.ComplexVectors is null ? null : new double[n * count];
        for (int k = 0; k < count; k++)
            for (int j = 0; j < n; j++)
            {
                int source = map is null ? j : map[j];
                if (source < 0) continue;
                if (point.ComplexVectors is Complex[] complex)
                {
                    var z = complex[k * own + source];
                    re[k * n + j] = z.Real;
                    im![k * n + j] = z.Imaginary;
                }
                else re[k * n + j] = point.RealVectors![k * own + source];
            }
        return (re, im);
    }

    private static double[] Dots(double[] a, int aCount, double[] b, int bCount, int n)
    {
        var dots = new double[aCount * bCount];
        BlockProducts.Dots(a, n, aCount, b, bCount, dots, bCount);
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

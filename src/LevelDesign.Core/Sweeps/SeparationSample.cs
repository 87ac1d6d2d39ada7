namespace LevelDesign.Core.Sweeps;

/// <summary>
/// What a crossing refinement reads from one solved bias: the lowest dressed energies and, for each searched label,
/// its bare weight in each of those states (NaN when the label's product state is pruned there). <see cref="Exact"/> is
/// false for a sweep point (solved iteratively, used only to start a refinement), true for a dense solve.
/// </summary>
internal sealed class SeparationSample(double bias, double[] energies, double[][] labelWeights, bool exact)
{
    public double Bias { get; } = bias;
    public bool Exact { get; } = exact;
    public int Count => energies.Length;

    /// <summary>
    /// The separation of the two dressed states holding most of the A/B character (they span the pair's subspace),
    /// the lower purity of the two (its larger weight on A or B), and the smaller of their weights on A and B together.
    /// </summary>
    public (double Gap, double Purity, double PairWeight) Separation(int labelA, int labelB)
    {
        double[] wa = labelWeights[labelA], wb = labelWeights[labelB];
        if (energies.Length < 2 || double.IsNaN(wa[0]) || double.IsNaN(wb[0])) return (double.NaN, double.NaN, double.NaN);
        // the two largest shares, the lower index first on ties
        int first = -1, second = -1;
        for (int k = 0; k < energies.Length; k++)
        {
            double share = wa[k] + wb[k];
            if (first < 0 || share > wa[first] + wb[first]) { second = first; first = k; }
            else if (second < 0 || share > wa[second] + wb[second]) second = k;
        }
        double purity = Math.Min(Math.Max(wa[first], wb[first]), Math.Max(wa[second], wb[second]));
        double pairWeight = Math.Min(wa[first] + wb[first], wa[second] + wb[second]);
        return (Math.Abs(energies[first] - energies[second]), purity, pairWeight);
    }

    /// <summary>The squared gap Brent minimises (near its minimum a parabola in the bias); MaxValue where it is undefined.</summary>
    public double SquaredGap(int labelA, int labelB) =>
        Separation(labelA, labelB).Gap is double g && double.IsFinite(g) ? g * g : double.MaxValue;
}

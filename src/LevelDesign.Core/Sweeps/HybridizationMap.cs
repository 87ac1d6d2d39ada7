namespace LevelDesign.Core.Sweeps;

/// <summary>
/// Purity of chosen labelled states along a sweep: Purity[point][state], NaN where the label is absent, and
/// every point where some chosen state falls below the threshold (default 99%).
/// </summary>
public sealed record HybridizationMap(IReadOnlyList<string> Labels, IReadOnlyList<IReadOnlyList<double>> AxisValues,
    IReadOnlyList<double[]> Purity, IReadOnlyList<int> FlaggedPoints, double Threshold)
{
    public static HybridizationMap From(SweepResult sweep, IReadOnlyList<int[]> states, double threshold = Analysis.Conventions.DefaultPurityThreshold)
    {
        var purity = sweep.Points.Select(p => states.Select(s =>
        {
            int k = p.Spectrum.DressedIndexOf(s);
            return k < 0 ? double.NaN : p.Spectrum.Labels[k].Purity;
        }).ToArray()).ToArray();
        var flagged = Enumerable.Range(0, purity.Length).Where(i => purity[i].Any(x => x < threshold)).Select(i => sweep.Points[i].Index).ToArray();
        return new HybridizationMap(states.Select(Presentation.StateNames.Tuple).ToArray(), sweep.Points.Select(p => p.AxisValues).ToArray(),
            purity, flagged, threshold);
    }
}

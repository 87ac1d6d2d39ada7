using LevelDesign.Core.Composite;

namespace LevelDesign.Core.Sweeps;

/// <summary>
/// The sweep results table: one row per point, columns named by axis path, tracked state (levels in the device's
/// element order, <see cref="ElementOrder"/>) and quantity name. Written by Presentation's sweep tables and plots.
/// </summary>
public sealed record SweepTable(IReadOnlyList<string> AxisPaths, IReadOnlyList<string> ElementOrder, IReadOnlyList<IReadOnlyList<int>> States,
    IReadOnlyList<string> QuantityNames, double PurityThreshold, IReadOnlyList<SweepTableRow> Rows)
{
    /// <summary>Level tuples of the tracked states ("|1,0,0⟩"), for machine-readable outputs.</summary>
    public IReadOnlyList<string> Labels => States.Select(Presentation.StateNames.Tuple).ToArray();

    /// <summary>Human names of the tracked states ("qa1 qb1").</summary>
    public IReadOnlyList<string> Names => States.Select(s => Presentation.StateNames.Of(ElementOrder, s)).ToArray();

    /// <param name="levels">Labels of the lowest this many states at the first point are tracked (default: the plan's, or 12).</param>
    public static SweepTable From(SweepResult sweep, int? levels = null, double purityThreshold = Analysis.Conventions.DefaultPurityThreshold)
    {
        if (sweep.Points.Count == 0)
            return new SweepTable(sweep.Plan.Axes.Select(a => a.Path).ToArray(), [], [], [], purityThreshold, []);
        var first = sweep.Points[0].Spectrum;
        int count = Math.Min(first.Count, levels ?? sweep.Plan.Levels ?? 12);
        var states = Enumerable.Range(0, count).Select(first.LabelLevels).ToArray();
        var names = sweep.Points[0].Quantities.Keys.OrderBy(k => k, StringComparer.Ordinal).ToArray();
        var rows = sweep.Points.Select(p =>
        {
            var energies = states.Select(s => p.Spectrum.EnergyOf(s)).ToArray();
            var purities = states.Select(s => Purity(p.Spectrum, s)).ToArray();
            var quantities = names.Select(n => p.Quantities.TryGetValue(n, out double v) ? v : double.NaN).ToArray();
            var quantityPurities = names.Select(n => p.QuantityPurities.TryGetValue(n, out double v) ? v : double.NaN).ToArray();
            bool low = purities.Any(x => x < purityThreshold);
            return new SweepTableRow(p.Index, p.AxisValues, energies, purities, quantities, p.Ambiguous, low) { QuantityPurities = quantityPurities };
        }).ToArray();
        return new SweepTable(sweep.Plan.Axes.Select(a => a.Path).ToArray(), first.Device.Elements.Select(e => e.Id).ToArray(),
            states, names, purityThreshold, rows);
    }

    /// <summary>
    /// The states a sweep's outputs report by default: every state the solver's selection judged (the count solved at
    /// the first point less the margin carried at the top, where states mix with ones not computed), or the plan's.
    /// </summary>
    public static int ReportedCount(SweepResult sweep) =>
        sweep.Plan.Levels ?? (sweep.Points.Count == 0 ? 0 : Math.Max(1, sweep.Points[0].Spectrum.Count - Composite.StateSelection.Margin));

    private static double Purity(DressedSpectrum spectrum, int[] state)
    {
        int k = spectrum.DressedIndexOf(state);
        return k < 0 ? double.NaN : spectrum.Labels[k].Purity;
    }
}

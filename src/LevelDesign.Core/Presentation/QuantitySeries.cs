using LevelDesign.Core.Sweeps;

namespace LevelDesign.Core.Presentation;

/// <summary>
/// One quantity along a sweep, for the page that plots quantities against the swept bias: a derived quantity by its
/// name ("zz:qa:qb", "qa.f01", "chi2:qa:ra", in GHz) or "purity:STATE" — the purity of the dressed state carrying the
/// label STATE ("purity:qa1", "purity:qa1 qb1") — with NaN where the point does not have it.
/// </summary>
public sealed record QuantitySeries(string Name, bool IsPurity, double[] Values, double[] Purities)
{
    public const string PurityPrefix = "purity:";

    public static QuantitySeries From(SweepResult sweep, string name)
    {
        var values = new double[sweep.Points.Count];
        var purities = new double[sweep.Points.Count];
        bool purity = name.StartsWith(PurityPrefix, StringComparison.Ordinal);
        string state = purity ? name[PurityPrefix.Length..].Trim() : "";
        for (int i = 0; i < values.Length; i++)
        {
            var point = sweep.Points[i];
            values[i] = double.NaN;
            purities[i] = 1;
            if (!purity)
            {
                if (point.Quantities.TryGetValue(name, out double v)) values[i] = v;
                if (point.QuantityPurities.TryGetValue(name, out double q)) purities[i] = q;
                continue;
            }
            for (int k = 0; k < point.Spectrum.Count; k++)
                if (StateNames.OfDressed(point.Spectrum, k) == state) { values[i] = point.Spectrum.Labels[k].Purity; break; }
        }
        return new QuantitySeries(name, purity, values, purities);
    }

    /// <summary>Names this sweep can plot: its derived quantities, and the purity of every state labelled at its first point.</summary>
    public static IReadOnlyList<string> Available(SweepResult sweep)
    {
        if (sweep.Points.Count == 0) return [];
        var first = sweep.Points[0];
        var names = first.Quantities.Keys.Order(StringComparer.Ordinal).ToList();
        for (int k = 1; k < first.Spectrum.Count; k++) names.Add(PurityPrefix + StateNames.OfDressed(first.Spectrum, k));
        return names;
    }

    /// <summary>
    /// What a designer checks first along a sweep: every ZZ, and the purity of each single-excitation state (a qubit
    /// hybridizing with a coupler or resonator shows as a dip).
    /// </summary>
    public static IReadOnlyList<string> Default(SweepResult sweep)
    {
        if (sweep.Points.Count == 0) return [];
        var first = sweep.Points[0];
        var chosen = first.Quantities.Keys.Where(k => k.StartsWith("zz:", StringComparison.Ordinal)).Order(StringComparer.Ordinal).ToList();
        for (int k = 0; k < first.Spectrum.Count; k++)
            if (first.Spectrum.LabelLevels(k).Sum() == 1) chosen.Add(PurityPrefix + StateNames.OfDressed(first.Spectrum, k));
        return chosen;
    }

    /// <summary>
    /// The values to read: those from states at or above the purity threshold (where labels hybridize, a quantity
    /// such as ZZ swings by the gap and means little); all values when none qualify.
    /// </summary>
    public double[] Reliable(double purityThreshold)
    {
        var kept = Values.Where((v, i) => double.IsFinite(v) && (IsPurity || Purities[i] >= purityThreshold)).ToArray();
        return kept.Length > 0 ? kept : Values.Where(double.IsFinite).ToArray();
    }

    /// <summary>A tick label: four significant digits.</summary>
    public string Tick(double value) => IsPurity
        ? (double.IsFinite(value) ? value.ToString("0.00", System.Globalization.CultureInfo.InvariantCulture) : "—")
        : FrequencyText.Short(value);

    /// <summary>A value as text: purities to 4 decimals, frequencies by the one frequency rule.</summary>
    public string Text(double value) => IsPurity
        ? (double.IsFinite(value) ? value.ToString("0.0000", System.Globalization.CultureInfo.InvariantCulture) : "—")
        : FrequencyText.Of(Name, value);
}

using LevelDesign.Core.Analysis;
using LevelDesign.Core.Spread;
using ScottPlot;

namespace LevelDesign.Plots;

/// <summary>
/// The distribution of one rule's figure over the samples of a spread study: a histogram with the rule's limits as
/// red lines and the nominal device's figure as a dashed line; frequencies shown in the unit that suits their size.
/// </summary>
public static class SpreadHistogram
{
    public static Plot Build(SpreadRule rule, IReadOnlyList<double> figures, double nominal, string deviceName, int bins = 30)
    {
        var plot = new Plot();
        bool frequency = rule.Kind is SpreadRuleKind.Bound or SpreadRuleKind.NoCrossing;
        var finite = figures.Where(double.IsFinite).ToArray();
        double largest = finite.Length == 0 ? 1 : finite.Max(Math.Abs);
        var (scale, unit) = !frequency ? (1.0, rule.Kind == SpreadRuleKind.Root ? $"{rule.RootBias} (control unit)" : "purity")
            : largest < 1e-3 ? (1e6, "kHz") : largest < 1 ? (1e3, "MHz") : (1.0, "GHz");
        var x = finite.Select(v => v * scale).ToArray();
        if (x.Length > 0)
        {
            double low = x.Min(), high = x.Max();
            if (high == low) { low -= 0.5 * Math.Max(Math.Abs(low), 1e-9); high += 0.5 * Math.Max(Math.Abs(high), 1e-9); }
            double width = (high - low) / bins;
            var counts = new double[bins];
            foreach (double v in x) counts[Math.Min(bins - 1, (int)((v - low) / width))]++;
            var bars = Enumerable.Range(0, bins).Select(i => new Bar { Position = low + (i + 0.5) * width, Value = counts[i], Size = width * 0.95 }).ToList();
            plot.Add.Bars(bars);
        }
        if (frequency || rule.Kind == SpreadRuleKind.Purity)
            foreach (double limit in Limits(rule))
            {
                var line = plot.Add.VerticalLine(limit * scale);
                line.Color = Colors.Red;
                line.LineWidth = 2;
            }
        if (double.IsFinite(nominal))
        {
            var line = plot.Add.VerticalLine(nominal * scale);
            line.Color = Colors.Black;
            line.LinePattern = LinePattern.Dashed;
        }
        int missing = figures.Count - finite.Length;
        plot.Title($"{deviceName}: rule {rule.Name} — {rule.Text}");
        plot.XLabel($"{unit}   (red: limit, dashed: nominal; {finite.Length} samples{(missing > 0 ? $", {missing} without a value" : "")})");
        plot.YLabel("samples");
        var note = plot.Add.Annotation(Conventions.LimitsOfModel.Replace("; ", ";\n").Replace(". ", ".\n"), Alignment.UpperLeft);
        note.LabelFontSize = 8;
        return plot;
    }

    private static IEnumerable<double> Limits(SpreadRule rule)
    {
        if (rule.Kind == SpreadRuleKind.NoCrossing) { yield return rule.MaxGapGHz; yield break; }
        if (rule.Comparison == SpreadComparison.Within) { yield return -rule.High; yield return rule.High; yield break; }
        if (double.IsFinite(rule.Low)) yield return rule.Low;
        if (double.IsFinite(rule.High)) yield return rule.High;
    }
}

using LevelDesign.Core.Analysis;
using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Presentation;
using LevelDesign.Core.Sweeps;
using ScottPlot;

namespace LevelDesign.Plots;

/// <summary>
/// Derived quantities (ZZ, J_eff, 2χ, f01, …, or state purities) against the swept bias, one line each: frequencies in
/// the prefix their size calls for, points read from hybridized states (purity below the threshold) drawn as open
/// circles, the axis in the unit the file uses for the bias, the limits-of-model note as a caption. Purities and
/// frequencies are not mixed on one picture.
/// </summary>
public static class QuantityPlot
{
    public static Plot Build(SweepResult sweep, IReadOnlyList<string> quantities, DeviceDocument? document, double purityThreshold, string? title = null)
    {
        if (sweep.Plan.Axes.Count != 1) throw new ArgumentException("a quantity plot needs a 1-D sweep");
        var series = quantities.Select(q => QuantitySeries.From(sweep, q)).ToList();
        if (series.Select(s => s.IsPurity).Distinct().Count() > 1)
            throw new ArgumentException("plot purities and frequency quantities in separate pictures");
        string axisPath = sweep.Plan.Axes[0].Path;
        var unit = ShownUnit.Of(document, axisPath);
        var x = sweep.Points.Select(p => unit.ToShown(p.AxisValues[0])).ToArray();
        bool purity = series.Count > 0 && series[0].IsPurity;
        // one scale for all lines: the prefix of the largest reliable value
        double largest = series.SelectMany(s => s.Reliable(purityThreshold)).Select(Math.Abs).DefaultIfEmpty(1).Max();
        var (unitName, scale) = purity ? ("", 1.0) : largest >= 1 ? ("GHz", 1.0) : largest >= 1e-3 ? ("MHz", 1e-3) : largest >= 1e-6 ? ("kHz", 1e-6) : ("Hz", 1e-9);
        var plot = new Plot();
        var palette = new ScottPlot.Palettes.Category10();
        for (int q = 0; q < series.Count; q++)
        {
            var s = series[q];
            var colour = palette.GetColor(q);
            var reliable = Enumerable.Range(0, x.Length).Where(i => double.IsFinite(s.Values[i])).ToArray();
            var line = plot.Add.Scatter(reliable.Select(i => x[i]).ToArray(), reliable.Select(i => s.Values[i] / scale).ToArray());
            line.MarkerSize = 0;
            line.LineWidth = 1.8f;
            line.Color = colour;
            line.LegendText = s.Name;
            var hybridized = reliable.Where(i => !s.IsPurity && s.Purities[i] < purityThreshold).ToArray();
            if (hybridized.Length > 0)
            {
                var marks = plot.Add.Scatter(hybridized.Select(i => x[i]).ToArray(), hybridized.Select(i => s.Values[i] / scale).ToArray());
                marks.LineWidth = 0;
                marks.MarkerShape = MarkerShape.OpenCircle;
                marks.MarkerSize = 6;
                marks.Color = colour;
                marks.LegendText = $"{s.Name}: read from states below purity {purityThreshold:0.##}";
            }
        }
        // the range the designer reads: reliable values, so a spike at a hybridized point does not flatten the rest
        var values = series.SelectMany(s => s.Reliable(purityThreshold)).ToArray();
        if (values.Length > 0)
        {
            double low = values.Min() / scale, high = values.Max() / scale, pad = Math.Max(1e-12, 0.08 * (high - low));
            plot.Axes.SetLimitsY(Math.Min(low, purity ? purityThreshold : low) - pad, (purity ? 1 : high) + pad);
        }
        if (purity)
        {
            var limit = plot.Add.HorizontalLine(purityThreshold);
            limit.LinePattern = LinePattern.Dashed;
            limit.Color = Colors.Gray;
        }
        plot.XLabel(AxisCaption.Of(document, axisPath));
        plot.YLabel(purity ? "purity" : $"value ({unitName})");
        plot.Title(title ?? $"{sweep.Points.FirstOrDefault()?.Spectrum.Device.Name}: {string.Join(", ", quantities)} along {axisPath}");
        plot.ShowLegend(Alignment.UpperRight);
        var note = plot.Add.Annotation(Conventions.LimitsOfModel.Replace("; ", ";\n").Replace(". ", ".\n"), Alignment.LowerLeft);
        note.LabelFontSize = 9;
        return plot;
    }
}

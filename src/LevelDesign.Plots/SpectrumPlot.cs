using LevelDesign.Core.Analysis;
using LevelDesign.Core.Files;
using LevelDesign.Core.Sweeps;
using ScottPlot;

namespace LevelDesign.Plots;

/// <summary>
/// Spectrum against the swept bias: one line per tracked label (named by its bare product state), crossings
/// marked at their bias and mid-gap energy, axis captions with units, and the limits-of-model note as a caption.
/// </summary>
public static class SpectrumPlot
{
    public static Plot Build(SweepResult sweep, IReadOnlyList<Crossing>? crossings = null, int? levels = null,
        SpectrumScale scale = SpectrumScale.FromGround, string? title = null)
    {
        if (sweep.Plan.Axes.Count != 1) throw new ArgumentException("a spectrum plot needs a 1-D sweep");
        var table = SweepTable.From(sweep, levels);
        var plot = new Plot();
        var x = table.Rows.Select(r => r.AxisValues[0]).ToArray();
        var ground = sweep.Points.Select(p => scale == SpectrumScale.Energies ? p.Spectrum.GroundEnergy : 0).ToArray();
        var palette = new ScottPlot.Palettes.Category10();
        for (int l = 0; l < table.Labels.Count; l++)
        {
            var xs = new List<double>();
            var ys = new List<double>();
            for (int i = 0; i < table.Rows.Count; i++)
            {
                double e = table.Rows[i].Energies[l];
                if (!double.IsFinite(e)) continue;   // label absent at this point
                xs.Add(x[i]);
                ys.Add(e + ground[i]);
            }
            if (xs.Count == 0) continue;
            // measured from the ground state, the ground's own branch is a flat line at zero: it only stretches the axis
            if (scale == SpectrumScale.FromGround && ys.All(y => y == 0)) continue;
            var line = plot.Add.Scatter(xs.ToArray(), ys.ToArray());
            line.MarkerSize = 0;
            line.LineWidth = 1.6f;
            line.Color = palette.GetColor(l);
            line.LegendText = table.Labels[l];
        }

        if (crossings is not null)
            foreach (var c in crossings)
            {
                int nearest = Enumerable.Range(0, x.Length).MinBy(i => Math.Abs(x[i] - c.Bias));
                int a = IndexOf(table.Labels, c.LabelA), b = IndexOf(table.Labels, c.LabelB);
                if (a < 0 || b < 0) continue;
                double mid = 0.5 * (table.Rows[nearest].Energies[a] + table.Rows[nearest].Energies[b]) + ground[nearest];
                var marker = plot.Add.Marker(c.Bias, mid, MarkerShape.OpenCircle, 9, Colors.Black);
                var text = plot.Add.Text(string.Create(System.Globalization.CultureInfo.InvariantCulture,
                    $"{c.LabelA}↔{c.LabelB} gap {c.GapGHz * 1e3:F2} MHz, purity {c.Purity:F2}"), c.Bias, mid);
                text.LabelFontSize = 10;
                text.LabelAlignment = Alignment.LowerLeft;
            }

        plot.XLabel(AxisUnits.Caption(table.AxisPaths[0]));
        plot.YLabel(scale == SpectrumScale.FromGround ? "E − E(ground) (GHz)" : "E (GHz, bare ground = 0)");
        plot.Title(title ?? $"{sweep.Points.FirstOrDefault()?.Spectrum.Device.Name} — labels {sweep.Plan.Labels}, levels of {string.Join(",", table.ElementOrder)}");
        plot.ShowLegend(Alignment.UpperRight);
        var note = plot.Add.Annotation(Conventions.LimitsOfModel.Replace("; ", ";\n").Replace(". ", ".\n"), Alignment.LowerLeft);
        note.LabelFontSize = 9;
        return plot;
    }

    // rendered in memory and written by the one atomic writer (never through a planted link, previous file as .bak)
    public static void SavePng(Plot plot, string path, int width = 1200, int height = 800) =>
        AtomicFile.Write(path, plot.GetImageBytes(width, height, ImageFormat.Png));

    public static void SaveSvg(Plot plot, string path, int width = 1200, int height = 800) => AtomicFile.Write(path, plot.GetSvgXml(width, height));

    private static int IndexOf(IReadOnlyList<string> labels, string label)
    {
        for (int i = 0; i < labels.Count; i++) if (labels[i] == label) return i;
        return -1;
    }
}

using LevelDesign.Core.Analysis;
using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Files;
using LevelDesign.Core.Presentation;
using LevelDesign.Core.Sweeps;
using ScottPlot;

namespace LevelDesign.Plots;

/// <summary>
/// Spectrum against the swept bias, drawn as a designer reads hybridization: each branch is the k-th dressed level in
/// energy order (so it runs smoothly through every avoided crossing, with no jump where a label hands over), coloured
/// segment by segment by its character — the colour of its dominant bare state, blended towards the second one by
/// their weights where the two mix. The legend names each character's colour; crossings are marked with gap and
/// purity; the axis is in the unit the file uses for the bias; the limits-of-model note is a caption.
/// </summary>
public static class SpectrumPlot
{
    /// <param name="levels">Branches drawn: the lowest this many dressed levels at each point (default 12).</param>
    /// <param name="manifold">Which excitation numbers of a segment's character are drawn (e.g. e == 2, e ≤ 2); null for all.</param>
    public static Plot Build(SweepResult sweep, IReadOnlyList<Crossing>? crossings = null, int? levels = null,
        SpectrumScale scale = SpectrumScale.FromGround, string? title = null, DeviceDocument? document = null, Predicate<int>? manifold = null)
    {
        if (sweep.Plan.Axes.Count != 1) throw new ArgumentException("a spectrum plot needs a 1-D sweep");
        string axisPath = sweep.Plan.Axes[0].Path;
        var unit = ShownUnit.Of(document, axisPath);
        var plot = new Plot();
        var points = sweep.Points;
        var x = points.Select(p => unit.ToShown(p.AxisValues[0])).ToArray();
        var shift = points.Select(p => scale == SpectrumScale.Energies ? p.Spectrum.GroundEnergy : 0).ToArray();
        int branches = points.Count == 0 ? 0 : points.Min(p => p.Spectrum.Count);
        branches = Math.Min(branches, levels ?? 12);
        var colours = new CharacterColours();

        for (int k = 0; k < branches; k++)
        {
            for (int i = 0; i + 1 < points.Count; i++)
            {
                var (a, b) = (points[i].Spectrum, points[i + 1].Spectrum);
                var characterA = Character.Of(a, k);
                var characterB = Character.Of(b, k);
                if (manifold is not null && !manifold(characterA.Excitations) && !manifold(characterB.Excitations)) continue;
                // measured from the ground state, the ground's own branch is a flat line at zero: it only stretches the axis
                if (scale == SpectrumScale.FromGround && characterA.Excitations == 0 && characterB.Excitations == 0) continue;
                var colour = colours.Blend(characterA).MixedWith(colours.Blend(characterB), 0.5);
                var segment = plot.Add.Scatter(new[] { x[i], x[i + 1] }, new[] { a.Energies[k] + shift[i], b.Energies[k] + shift[i + 1] });
                segment.MarkerSize = 0;
                segment.LineWidth = 1.8f;
                segment.Color = colour;
            }
        }
        foreach (var (levelsOf, colour) in colours.Used)
        {
            string name = StateNames.Of(points[0].Spectrum.Device, levelsOf);
            plot.Legend.ManualItems.Add(new LegendItem { LabelText = name, LineColor = colour, LineWidth = 3, MarkerShape = MarkerShape.None });
        }

        if (crossings is not null && points.Count > 0)
        {
            // Each crossing is a numbered ring on its branches, explained in one list: labels written beside the rings
            // overlap one another wherever crossings cluster (several pairs often cross near one bias).
            var lines = new List<string>();
            foreach (var c in crossings.OrderBy(c => c.Bias))
            {
                if (manifold is not null && (!manifold(c.StateA.Sum()) || !manifold(c.StateB.Sum()))) continue;
                double cx = unit.ToShown(c.Bias);
                int nearest = Enumerable.Range(0, x.Length).MinBy(i => Math.Abs(x[i] - cx));
                var s = points[nearest].Spectrum;
                double ea = s.EnergyOf(c.StateA.ToArray()), eb = s.EnergyOf(c.StateB.ToArray());
                if (!double.IsFinite(ea) || !double.IsFinite(eb)) continue;
                double mid = 0.5 * (ea + eb) + shift[nearest];
                int number = lines.Count + 1;
                plot.Add.Marker(cx, mid, MarkerShape.OpenCircle, 9, Colors.Black);
                var tag = plot.Add.Text(number.ToString(System.Globalization.CultureInfo.InvariantCulture), cx, mid);
                tag.LabelFontSize = 10;
                tag.LabelBold = true;
                tag.LabelAlignment = Alignment.LowerLeft;
                lines.Add(string.Create(System.Globalization.CultureInfo.InvariantCulture,
                    $"{number}  {StateNames.Of(s.Device, c.StateA)} ↔ {StateNames.Of(s.Device, c.StateB)}: gap {FrequencyText.Format(c.GapGHz)}, purity {c.Purity:F2}, at {unit.Text(c.Bias)}"));
            }
            if (lines.Count > 0)
            {
                var list = plot.Add.Annotation("avoided crossings\n" + string.Join("\n", lines), Alignment.LowerRight);
                list.LabelFontSize = 9;
            }
        }

        plot.XLabel(AxisCaption.Of(document, axisPath));
        plot.YLabel(scale == SpectrumScale.FromGround ? "E − E(ground) (GHz)" : "E (GHz, bare ground = 0)");
        plot.Title(title ?? $"{points.FirstOrDefault()?.Spectrum.Device.Name}: spectrum along {axisPath}");
        plot.ShowLegend(Alignment.UpperRight);
        var note = plot.Add.Annotation(Conventions.LimitsOfModel.Replace("; ", ";\n").Replace(". ", ".\n"), Alignment.LowerLeft);
        note.LabelFontSize = 9;
        return plot;
    }

    // rendered in memory and written by the one atomic writer (never through a planted link, previous file as .bak)
    public static void SavePng(Plot plot, string path, int width = 1200, int height = 800) =>
        AtomicFile.Write(path, plot.GetImageBytes(width, height, ImageFormat.Png));

    public static void SaveSvg(Plot plot, string path, int width = 1200, int height = 800) => AtomicFile.Write(path, plot.GetSvgXml(width, height));
}

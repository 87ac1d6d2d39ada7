using LevelDesign.Core.Couplers;
using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Elements;
using LevelDesign.Core.Model;
using LevelDesign.Core.Sweeps;
using LevelDesign.Plots;

namespace LevelDesign.Plots.Tests;

public class SpectrumPlotTests
{
    internal static async Task<(SweepResult Sweep, IReadOnlyList<Crossing> Crossings)> TunableQubitAndResonator()
    {
        var device = new Device("demo",
            [new TunableTransmon("q", 0.2, 30, 0.35, 0), new Resonator("r", 5.6)],
            [Coupler.Create("g", CouplerKind.Exchange, "q", "r", new CouplingStrength.Coefficient(0.05))],
            new Truncation { DefaultLevels = 3 });
        var axis = new SweepAxis("q.flux", 0, 0.5, 61, []);
        var resolve = ParameterResolver.ForPaths(device, [axis]);
        var sweep = await SweepRunner.RunAsync(resolve, new SweepPlan([axis], Levels: 5));
        return (sweep, CrossingFinder.Find(sweep, ParameterResolver.OneAxis(resolve), new CrossingOptions { Levels = 4 }));
    }

    [Fact]
    public async Task Png_and_svg_are_written_with_units_labels_and_the_model_note()
    {
        var (sweep, crossings) = await TunableQubitAndResonator();
        Assert.NotEmpty(crossings);   // the qubit passes the resonator between Φ = 0 and Φ0/2
        var plot = SpectrumPlot.Build(sweep, crossings, levels: 4);
        string dir = Path.Combine(Path.GetTempPath(), "leveldesign-plot-test");
        Directory.CreateDirectory(dir);
        string png = Path.Combine(dir, "spectrum.png"), svg = Path.Combine(dir, "spectrum.svg");
        SpectrumPlot.SavePng(plot, png);
        SpectrumPlot.SaveSvg(plot, svg);

        var bytes = File.ReadAllBytes(png);
        Assert.True(bytes.Length > 10_000);
        Assert.Equal(new byte[] { 0x89, 0x50, 0x4E, 0x47 }, bytes[..4]);   // PNG signature
        string text = File.ReadAllText(svg);
        Assert.Contains("q.flux (Φ0)", text);
        Assert.Contains("q1", text);     // legend: state names, not level tuples
        Assert.DoesNotContain("|1,0⟩", text);
        Assert.Contains("Limits of the model", text);
        Assert.Contains("MHz", text);   // a crossing annotation
    }

    /// <summary>
    /// Crossings are numbered rings explained in one list (by bias), so clustered crossings do not print their texts on
    /// top of each other: every crossing drawn has its number beside its ring and one line of the list.
    /// </summary>
    [Fact]
    public async Task Crossings_are_numbered_on_the_plot_and_listed_once_in_bias_order()
    {
        var (sweep, crossings) = await TunableQubitAndResonator();
        var plot = SpectrumPlot.Build(sweep, crossings, levels: 4);
        var list = plot.GetPlottables().OfType<ScottPlot.Plottables.Annotation>().Single(a => a.Text.StartsWith("avoided crossings"));
        var lines = list.Text.Split('\n').Skip(1).ToArray();
        var rings = plot.GetPlottables().OfType<ScottPlot.Plottables.Marker>().ToArray();
        var tags = plot.GetPlottables().OfType<ScottPlot.Plottables.Text>().Select(t => t.LabelText).ToArray();
        Assert.NotEmpty(lines);
        Assert.Equal(lines.Length, rings.Length);
        for (int i = 0; i < lines.Length; i++)
        {
            Assert.StartsWith($"{i + 1}  ", lines[i]);
            Assert.Contains("gap", lines[i]);
            Assert.Contains("Φ0", lines[i]);   // where, in the axis unit
            Assert.Contains($"{i + 1}", tags);
        }
        var order = rings.Select(r => r.X).ToArray();
        Assert.Equal(order.Order().ToArray(), order);
        // no crossing text is written on the canvas beside a ring
        Assert.DoesNotContain(tags, t => t.Contains("gap"));
    }

    [Fact]
    public async Task The_ground_branch_is_left_out_when_energies_are_measured_from_it()
    {
        var (sweep, _) = await TunableQubitAndResonator();
        string Legend(SpectrumScale scale) => string.Join(",", SpectrumPlot.Build(sweep, levels: 4, scale: scale).Legend.ManualItems.Select(i => i.LabelText));
        Assert.DoesNotContain("ground", Legend(SpectrumScale.FromGround));
        Assert.Contains("q1", Legend(SpectrumScale.FromGround));
        Assert.Contains("ground", Legend(SpectrumScale.Energies));   // there the ground's own shift is information
    }

    /// <summary>
    /// Branches follow energy order, so a branch never jumps: through the qubit–resonator avoided crossing the lowest
    /// excited branch is continuous (no step larger than the sweep's own slope allows), where a line drawn by label
    /// would hand over across the gap.
    /// </summary>
    [Fact]
    public async Task Branches_run_smoothly_through_the_avoided_crossing_and_blend_colour_where_states_mix()
    {
        var (sweep, _) = await TunableQubitAndResonator();
        var plot = SpectrumPlot.Build(sweep, levels: 3);
        var segments = plot.GetPlottables().OfType<ScottPlot.Plottables.Scatter>().ToArray();
        Assert.NotEmpty(segments);
        foreach (var s in segments)
        {
            var points = s.Data.GetScatterPoints();
            Assert.Equal(2, points.Count);
            // f01 of this qubit moves by well under 0.25 GHz per step of 0.5/60 Φ0; a hand-over would jump by the gap
            Assert.True(Math.Abs(points[1].Y - points[0].Y) < 0.25, $"segment at {points[0].X} jumps {points[1].Y - points[0].Y}");
        }
        // two pure characters plus blended segments near the crossing: more distinct colours than characters
        int colours = segments.Select(s => s.Color.ToHex()).Distinct().Count();
        Assert.True(colours > plot.Legend.ManualItems.Count, $"{colours} colours for {plot.Legend.ManualItems.Count} characters");
    }

    [Fact]
    public void Axis_captions_carry_the_unit_the_file_writes_the_bias_in()
    {
        var document = Core.DeviceFiles.DeviceDocument.Demo();
        Assert.StartsWith("qc_flux (mA)", Core.Presentation.AxisCaption.Of(document, "qc_flux"));
        Assert.StartsWith("qa_flux (Φ0)", Core.Presentation.AxisCaption.Of(document, "qa_flux"));
        Assert.Equal("ra.frequency (GHz)", Core.Presentation.AxisCaption.Of(document, "ra.frequency"));
    }
}

public class QuantityPlotTests
{
    /// <summary>
    /// A quantity against the bias: the line holds every point's own value, points read from hybridized states (at
    /// the qubit–resonator crossing) are marked and named in the legend, and purities are not mixed with frequencies.
    /// </summary>
    [Fact]
    public async Task Quantities_are_drawn_with_hybridized_points_marked()
    {
        var (sweep, _) = await SpectrumPlotTests.TunableQubitAndResonator();
        var plot = QuantityPlot.Build(sweep, ["chi2:q:r"], null, 0.9);
        var line = plot.GetPlottables().OfType<ScottPlot.Plottables.Scatter>().First(p => p.LegendText == "chi2:q:r");
        var points = line.Data.GetScatterPoints();
        Assert.Equal(sweep.Points.Count(p => double.IsFinite(p.Quantities["chi2:q:r"])), points.Count);
        Assert.Contains(plot.GetPlottables().OfType<ScottPlot.Plottables.Scatter>(), p => p.LegendText.Contains("below purity 0.9"));
        string svg = plot.GetSvgXml(800, 600);
        Assert.Contains("q.flux (Φ0)", svg);
        Assert.Contains("Limits of the model", svg);
        Assert.Throws<ArgumentException>(() => QuantityPlot.Build(sweep, ["chi2:q:r", "purity:q1"], null, 0.9));
    }
}

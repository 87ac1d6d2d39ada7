using LevelDesign.Core.Couplers;
using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Elements;
using LevelDesign.Core.Model;
using LevelDesign.Core.Sweeps;
using LevelDesign.Plots;

namespace LevelDesign.Plots.Tests;

public class SpectrumPlotTests
{
    private static async Task<(SweepResult Sweep, IReadOnlyList<Crossing> Crossings)> TunableQubitAndResonator()
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
        Assert.Contains("|1,0⟩", text);
        Assert.Contains("Limits of the model", text);
        Assert.Contains("MHz", text);   // a crossing annotation
    }

    [Fact]
    public async Task The_ground_branch_is_left_out_when_energies_are_measured_from_it()
    {
        var (sweep, _) = await TunableQubitAndResonator();
        string Legend(SpectrumScale scale) => string.Join(",", SpectrumPlot.Build(sweep, levels: 4, scale: scale)
            .GetPlottables().OfType<ScottPlot.Plottables.Scatter>().Select(p => p.LegendText));
        Assert.DoesNotContain("|0,0⟩", Legend(SpectrumScale.FromGround));
        Assert.Contains("|1,0⟩", Legend(SpectrumScale.FromGround));
        Assert.Contains("|0,0⟩", Legend(SpectrumScale.Energies));   // there the ground's own shift is information
    }

    [Theory]
    [InlineData("qa.flux", "qa.flux (Φ0)")]
    [InlineData("ra.frequency", "ra.frequency (GHz)")]
    [InlineData("qa.ng", "qa.ng (2e)")]
    public void Axis_captions_carry_units(string path, string caption) => Assert.Equal(caption, AxisUnits.Caption(path));
}

using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Sweeps;

namespace LevelDesign.Core.Tests.Sweeps;

public class CrossingFinderTests
{
    /// <summary>
    /// Jaynes–Cummings (Jaynes &amp; Cummings, Proc. IEEE 51, 89 (1963)): the n-excitation doublet |1,n−1⟩, |0,n⟩ of a
    /// two-level system exchange-coupled with strength g to a resonator splits by sqrt(Δ² + 4g²n), so its minimum
    /// gap is 2g√n exactly, at zero detuning. Swept through resonance, the finder must report the n = 1 and
    /// n = 2 doublets with those gaps at ω_r = ω_q, and nothing else among the lowest five labels.
    /// </summary>
    [Fact]
    public async Task Minimum_gaps_are_the_exact_vacuum_Rabi_splittings()
    {
        double qubit = 5.0, g = 0.012;
        var device = SweepDevices.JaynesCummings(qubit, 4.9, g);
        var axis = new SweepAxis("r.frequency", 4.85, 5.15, 31, []);
        var resolve = ParameterResolver.ForPaths(device, [axis]);
        var sweep = await SweepRunner.RunAsync(resolve, new SweepPlan([axis], LabelMode.ByCharacter, Levels: 6));

        var crossings = CrossingFinder.Find(sweep, ParameterResolver.OneAxis(resolve), new CrossingOptions { Levels = 5 });

        Assert.Equal(2, crossings.Count);
        var single = Assert.Single(crossings, c => c.StateA.Sum() == 1);
        var pair = Assert.Single(crossings, c => c.StateA.Sum() == 2);
        Assert.Equal(2 * g, single.GapGHz, 1e-9);
        Assert.Equal(2 * g * Math.Sqrt(2), pair.GapGHz, 1e-9);
        // the gap is quadratic in the detuning at its minimum, so the bias is located to ~sqrt(tolerance)
        Assert.Equal(qubit, single.Bias, 1e-5);
        Assert.Equal(qubit, pair.Bias, 1e-5);
        Assert.InRange(single.Purity, 0.49, 0.51);   // an equal mixture at resonance
        Assert.True(single.Refined && pair.Refined);
    }

    [Fact]
    public async Task Ranking_puts_the_crossing_nearest_an_operating_point_first()
    {
        var device = SweepDevices.JaynesCummings(5.0, 4.9, 0.01);
        var axis = new SweepAxis("r.frequency", 4.8, 5.2, 21, []);
        var resolve = ParameterResolver.ForPaths(device, [axis]);
        var sweep = await SweepRunner.RunAsync(resolve, new SweepPlan([axis], LabelMode.ByCharacter, Levels: 6));
        var crossings = CrossingFinder.Find(sweep, ParameterResolver.OneAxis(resolve),
            new CrossingOptions { Levels = 5, OperatingPoints = [4.9, 5.2] });
        Assert.All(crossings, c => Assert.Equal(0.1, c.DistanceToOperatingPoint!.Value, 1e-4));
    }
}

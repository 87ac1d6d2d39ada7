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

    /// <summary>
    /// A coupler level C swept through two fixed qubit levels A (5.0 GHz) and B (5.4 GHz), each exchange-coupled to C
    /// with g = 0.02 GHz and not to each other. Each crossing with C is a two-level avoided crossing of gap 2g
    /// (Jaynes–Cummings-type 2×2 secular problem; the other qubit, 0.4 GHz away, shifts it by about g²/0.4 GHz, so we
    /// allow 3%); every reported crossing must be such a clean two-level one (pair weight ≥ 0.8).
    /// </summary>
    [Fact]
    public async Task Crossings_through_a_sweeping_coupler_are_clean_two_level_gaps()
    {
        double g = 0.02;
        var device = new LevelDesign.Core.Model.Device("abc",
            [new LevelDesign.Core.Elements.KerrOscillator("a", 5.0, -0.3), new LevelDesign.Core.Elements.KerrOscillator("b", 5.4, -0.3),
             new LevelDesign.Core.Elements.KerrOscillator("c", 4.6, -0.3)],
            [LevelDesign.Core.Couplers.Coupler.Create("ac", LevelDesign.Core.Couplers.CouplerKind.Exchange, "a", "c", new LevelDesign.Core.Couplers.CouplingStrength.Coefficient(g)),
             LevelDesign.Core.Couplers.Coupler.Create("bc", LevelDesign.Core.Couplers.CouplerKind.Exchange, "b", "c", new LevelDesign.Core.Couplers.CouplingStrength.Coefficient(g))],
            new LevelDesign.Core.Model.Truncation { DefaultLevels = 2 });
        var axis = new SweepAxis("c.frequency", 4.6, 5.8, 49, []);
        var resolve = ParameterResolver.ForPaths(device, [axis]);
        var sweep = await SweepRunner.RunAsync(resolve, new SweepPlan([axis], LabelMode.ByCharacter));
        var crossings = CrossingFinder.Find(sweep, ParameterResolver.OneAxis(resolve), new CrossingOptions { Levels = 4 });
        Assert.All(crossings, c => Assert.True(c.PairWeight >= 0.8, $"{c.LabelA}↔{c.LabelB} pair weight {c.PairWeight}"));
        var withA = Assert.Single(crossings, c => c.StateA.Sum() == 1 && c.StateB.Sum() == 1 && (c.StateA[0] == 1 || c.StateB[0] == 1));
        var withB = Assert.Single(crossings, c => c.StateA.Sum() == 1 && c.StateB.Sum() == 1 && (c.StateA[1] == 1 || c.StateB[1] == 1));
        Assert.InRange(withA.GapGHz / (2 * g), 0.97, 1.03);
        Assert.InRange(withB.GapGHz / (2 * g), 0.97, 1.03);
        Assert.InRange(withA.Bias, 4.95, 5.05);
        Assert.InRange(withB.Bias, 5.35, 5.45);
    }
}

using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Sweeps;
using LevelDesign.Ui.Compute;

namespace LevelDesign.Tests.Ui;

public class SpectrumSeriesTests
{
    /// <summary>A tunable qubit swept through a resonator (g = 50 MHz): one avoided crossing in the single manifold.</summary>
    private static async Task<SweepResult> QubitThroughResonator()
    {
        var device = Support.QubitAndResonator.Build();
        var axis = new SweepAxis("q.flux", 0, 0.5, 61, []);
        return await SweepRunner.RunAsync(ParameterResolver.ForPaths(device, [axis]), new SweepPlan([axis], Levels: 6));
    }

    /// <summary>
    /// The braille spectrum follows the plots' rule: branches in energy order never jump across the gap (a label
    /// hand-over would be a vertical step of at least the 100 MHz gap), and each branch is named by its own character
    /// where it ends — the lower branch ends as the qubit (below the resonator at Φ0/2), the upper as the resonator.
    /// </summary>
    [Fact]
    public async Task Branches_are_energy_ordered_smooth_and_named_where_they_end()
    {
        var series = SpectrumSeries.From(await QubitThroughResonator(), Manifold.SingleExcitations);
        Assert.Equal(2, series.Branches.Count);
        var (lower, upper) = (series.Branches[0], series.Branches[1]);
        for (int i = 0; i < series.Axis.Length; i++)
        {
            Assert.True(lower.Frequencies[i] < upper.Frequencies[i]);
            if (i > 0) Assert.True(Math.Abs(lower.Frequencies[i] - lower.Frequencies[i - 1]) < 0.25, $"step at point {i}");
        }
        Assert.Equal("q1", lower.Label);
        Assert.Equal("r1", upper.Label);
    }
}

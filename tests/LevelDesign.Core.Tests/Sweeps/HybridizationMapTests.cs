using System.Text.Json;
using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Sweeps;

namespace LevelDesign.Core.Tests.Sweeps;

public class HybridizationMapTests
{
    private static async Task<SweepResult> KerrSweep()
    {
        var axis = new SweepAxis("b.frequency", 4.8, 5.2, 21, []);
        return await SweepRunner.RunAsync(ParameterResolver.ForPaths(SweepDevices.KerrPair(5.0, 4.8, 0.005), [axis]),
            new SweepPlan([axis], Levels: 3));
    }

    /// <summary>
    /// Purity of |1,0⟩ in a two-level mixing problem is cos²θ with tan 2θ = 2J/Δ (textbook 2×2 rotation): below 99%
    /// computed here from that closed form, so the flags must match it point by point.
    /// </summary>
    [Fact]
    public async Task Hybridization_flags_follow_the_two_level_mixing_angle()
    {
        var sweep = await KerrSweep();
        var map = HybridizationMap.From(sweep, [[1, 0]], threshold: 0.99);
        foreach (var point in sweep.Points)
        {
            double delta = 5.0 - point.AxisValues[0], j = 0.005;
            double purity = 0.5 * (1 + Math.Abs(delta) / Math.Sqrt(delta * delta + 4 * j * j));   // cos²θ, larger of the two
            Assert.Equal(purity < 0.99, map.FlaggedPoints.Contains(point.Index));
            Assert.Equal(purity, map.Purity[point.Index][0], 1e-6);
        }
    }
}

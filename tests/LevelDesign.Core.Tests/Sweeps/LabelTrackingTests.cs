using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Sweeps;

namespace LevelDesign.Core.Tests.Sweeps;

public class LabelTrackingTests
{
    private const double Wa = 5.0, J = 0.005;

    /// <summary>
    /// One-excitation manifold of two exchange-coupled oscillators: exactly the 2×2 problem
    /// [[ω_a, J], [J, ω_b]], E± = (ω_a+ω_b)/2 ± sqrt(((ω_a−ω_b)/2)² + J²) (textbook secular determinant).
    /// </summary>
    private static (double Lower, double Upper) Secular(double wb)
    {
        double mean = (Wa + wb) / 2, half = Math.Sqrt((Wa - wb) * (Wa - wb) / 4 + J * J);
        return (mean - half, mean + half);
    }

    private static Task<SweepResult> Sweep(LabelMode mode)
    {
        var axis = new SweepAxis("b.frequency", 4.8, 5.2, 41, []);   // ω_b passes ω_a at the middle point
        var resolve = ParameterResolver.ForPaths(SweepDevices.KerrPair(Wa, 4.8, J), [axis]);
        return SweepRunner.RunAsync(resolve, new SweepPlan([axis], mode, Levels: 3));
    }

    [Fact]
    public async Task By_character_a_label_keeps_its_diabatic_level_through_the_crossing()
    {
        var sweep = await Sweep(LabelMode.ByCharacter);
        foreach (var point in sweep.Points)
        {
            double wb = point.AxisValues[0];
            var (lower, upper) = Secular(wb);
            if (Math.Abs(wb - Wa) < 1e-9)
            {
                Assert.True(point.Ambiguous, "an equal mixture must be marked, not silently labelled");
                continue;
            }
            // |1,0⟩ stays near ω_a: the root closer to ω_a
            double expectedA = Math.Abs(lower - Wa) < Math.Abs(upper - Wa) ? lower : upper;
            Assert.Equal(expectedA, point.Spectrum.EnergyOf([1, 0]), 1e-9);
            Assert.Equal(lower + upper - expectedA, point.Spectrum.EnergyOf([0, 1]), 1e-9);
            if (Math.Abs(wb - Wa) > 0.02) Assert.False(point.Ambiguous);
        }
    }

    [Fact]
    public async Task By_order_the_kth_level_keeps_its_label_and_changes_character()
    {
        var sweep = await Sweep(LabelMode.ByOrder);
        foreach (var point in sweep.Points)
        {
            var (lower, _) = Secular(point.AxisValues[0]);
            Assert.Equal("0,1", point.Spectrum.LabelText(1));    // ω_b starts below ω_a
            Assert.Equal(lower, point.Spectrum.EnergyOf([0, 1]), 1e-9);
        }
        // past the crossing the lower level is mostly |1,0⟩: its purity with respect to its order label is low
        Assert.True(sweep.Points[^1].Spectrum.Labels[1].Purity < 0.01);
        Assert.True(sweep.Points[0].Spectrum.Labels[1].Purity > 0.99);
    }

    [Fact]
    public async Task Labels_are_one_to_one_at_every_point()
    {
        foreach (var mode in new[] { LabelMode.ByCharacter, LabelMode.ByOrder })
        {
            var sweep = await Sweep(mode);
            Assert.All(sweep.Points, p => Assert.Equal(p.Spectrum.Count, p.Spectrum.Labels.Select(l => l.BareIndex).Distinct().Count()));
        }
    }
}

using LevelDesign.Core.Couplers;
using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Elements;
using LevelDesign.Core.Model;
using LevelDesign.Core.Sweeps;

namespace LevelDesign.Core.Tests.Sweeps;

/// <summary>
/// Roots of a qubit frequency next to its avoided crossing with a resonator. A Kerr qubit (frequency ω_q swept) and a
/// resonator at ω_r = 5 GHz, exchange-coupled with g = 50 MHz: exchange keeps the excitation number, so the one-excitation
/// states |1,0⟩, |0,1⟩ form a closed 2×2 problem whose dressed energies are exactly
/// E± = (ω_q + ω_r)/2 ± sqrt(((ω_q − ω_r)/2)² + g²) (the 2×2 secular determinant; Jaynes &amp; Cummings, Proc. IEEE 51, 89
/// (1963) for the same doublet), and the ground state |0,0⟩ is uncoupled (energy 0). So the dressed q.f01 is E− or E+,
/// whichever branch carries the qubit's label.
/// </summary>
public class TargetNearCrossingTests
{
    private const double Resonator = 5.0, G = 0.05;

    private static Device QubitAndResonator() => new("qr",
        [new KerrOscillator("q", 4.9, -0.25), new Resonator("r", Resonator)],
        [Coupler.Create("g", CouplerKind.Exchange, "q", "r", new CouplingStrength.Coefficient(G))],
        new Truncation { DefaultLevels = 3 });

    private static double Lower(double qubit) => (qubit + Resonator) / 2 - Math.Sqrt(Math.Pow((qubit - Resonator) / 2, 2) + G * G);
    private static double Upper(double qubit) => (qubit + Resonator) / 2 + Math.Sqrt(Math.Pow((qubit - Resonator) / 2, 2) + G * G);

    /// <summary>
    /// The scan's last point, 5 MHz past resonance, still gives the qubit's label to the lower branch (labels carry
    /// their state from point to point and move only when another state's character wins clearly), so the scan sees
    /// q.f01 cross the target on the lower branch between resonance and that point. The root is exactly where E−
    /// equals the target; it must be refined there, not reported as a jump of the label at resonance.
    /// </summary>
    [Fact]
    public async Task Root_on_the_branch_the_scan_follows_past_resonance_is_refined()
    {
        double root = Resonator + 0.0025, target = Lower(root);
        var axis = new SweepAxis("q.frequency", 4.805, 5.005, 5, []);
        var resolve = ParameterResolver.ForPaths(QubitAndResonator(), [axis]);
        var scan = await SweepRunner.RunAsync(resolve, new SweepPlan([axis]));
        Assert.Equal(Lower(5.005), scan.Points[^1].Quantities["q.f01"], 1e-9);   // the scenario: still the lower branch

        var roots = await TargetSolver.FindAllAsync(resolve, axis, "q.f01", target);

        AssertOneRefinedRoot(roots, root, target);
    }

    /// <summary>
    /// A target reached on the upper branch a little past the crossing, with the scan's label moving from the lower to
    /// the upper branch inside the same bracket: the root where E+ equals the target must be found.
    /// </summary>
    [Fact]
    public async Task Root_on_the_far_branch_in_a_bracket_holding_the_crossing_is_refined()
    {
        double root = Resonator + 0.02, target = Upper(root);
        var axis = new SweepAxis("q.frequency", 4.805, 5.055, 6, []);
        var resolve = ParameterResolver.ForPaths(QubitAndResonator(), [axis]);

        var roots = await TargetSolver.FindAllAsync(resolve, axis, "q.f01", target);

        AssertOneRefinedRoot(roots, root, target);
    }

    /// <summary>
    /// A target inside the gap (ω_r − g, ω_r + g) is never reached: q.f01 jumps across it where the label moves from
    /// one branch to the other. The sign change must be reported, as not a root.
    /// </summary>
    [Fact]
    public async Task Target_inside_the_gap_is_a_jump_not_a_root()
    {
        var axis = new SweepAxis("q.frequency", 4.805, 5.205, 9, []);
        var resolve = ParameterResolver.ForPaths(QubitAndResonator(), [axis]);

        var roots = await TargetSolver.FindAllAsync(resolve, axis, "q.f01", Resonator);

        var jump = Assert.Single(roots);
        Assert.False(jump.Refined);
        Assert.InRange(jump.Bias, 4.805, 5.205);
        if (double.IsFinite(jump.Residual)) Assert.True(Math.Abs(jump.Residual) > G / 2, $"residual {jump.Residual}");
    }

    private static void AssertOneRefinedRoot(IReadOnlyList<TargetRoot> roots, double root, double target)
    {
        var found = Assert.Single(roots);
        Assert.True(found.Refined, $"reported as a jump at {found.Bias}, value {found.Value}");
        Assert.Equal(root, found.Bias, 1e-9);
        Assert.Equal(target, found.Value, 1e-9);
    }
}

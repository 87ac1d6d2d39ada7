using LevelDesign.Core.Analysis;
using LevelDesign.Core.Composite;
using LevelDesign.Core.Couplers;
using LevelDesign.Core.Elements;
using LevelDesign.Core.Model;

namespace LevelDesign.Core.Tests.Physics;

public class TruncationWarningTests
{
    /// <summary>
    /// A Cooper-pair box with E_J = 0 at n_g = 0 has levels 4E_C·n²: 0, then the doublets n = ±1, ±2 (exact). Keeping 4
    /// levels keeps one of the n = ±2 pair; 5 or 3 keep the multiplet whole.
    /// </summary>
    [Fact]
    public void Levels_cut_inside_a_charge_doublet_are_warned_with_a_whole_count()
    {
        var device = new Device("box", [new Transmon("q", 0.3, 0)], [], new Truncation { Levels = new Dictionary<string, int> { ["q"] = 4 } });
        var warning = Assert.Single(TruncationWarnings.For(device));
        Assert.Contains("element 'q'", warning);
        Assert.Contains("set levels = 5 (or 3)", warning);
        Assert.Empty(TruncationWarnings.For(device with { Truncation = new Truncation { Levels = new Dictionary<string, int> { ["q"] = 5 } } }));
        Assert.Empty(TruncationWarnings.For(device with { Elements = [new Transmon("q", 0.3, 15)] }));
    }

    [Fact]
    public void Exactly_degenerate_dressed_states_are_marked_ambiguous()
    {
        var device = new Device("twins", [new KerrOscillator("a", 5.0, -0.2), new KerrOscillator("b", 5.0, -0.2), new KerrOscillator("c", 6.0, -0.2)],
            [Coupler.Create("bc", CouplerKind.Exchange, "b", "c", new CouplingStrength.Coefficient(0.0))],
            new Truncation { DefaultLevels = 3 });
        var s = new DeviceSolver().Solve(device, 6);
        Assert.False(s.Labels[0].Ambiguous);
        Assert.True(s.Labels[1].Ambiguous && s.Labels[2].Ambiguous, "a1 and b1 are degenerate");
        Assert.False(s.Labels[3].Ambiguous);   // c1 at 6 GHz stands alone
    }
}

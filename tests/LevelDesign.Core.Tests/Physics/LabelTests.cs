using LevelDesign.Core.Composite;
using LevelDesign.Core.Couplers;
using LevelDesign.Core.Elements;
using LevelDesign.Core.Labels;
using LevelDesign.Core.Model;

namespace LevelDesign.Core.Tests.Physics;

public class LabelTests
{
    private static Device Pair(double w2, double j) => new("pair",
        [new KerrOscillator("a", 5.0, -0.25), new KerrOscillator("b", w2, -0.25)],
        [Coupler.Create("j", CouplerKind.Exchange, "a", "b", new CouplingStrength.Coefficient(j))],
        new Truncation { DefaultLevels = 3 });

    [Theory]
    [InlineData(5.0)]
    [InlineData(5.001)]
    [InlineData(5.3)]
    public void Labels_are_one_to_one(double w2)
    {
        var s = new DeviceSolver().Solve(Pair(w2, 0.02), 9);
        Assert.Equal(s.Count, s.Labels.Select(l => l.BareIndex).Distinct().Count());
    }

    [Fact]
    public void Equal_mixtures_are_marked_ambiguous_and_clear_states_are_not()
    {
        var resonant = new DeviceSolver().Solve(Pair(5.0, 0.02), 3);
        Assert.True(resonant.Labels[1].Ambiguous);
        Assert.True(resonant.Labels[2].Ambiguous);
        Assert.InRange(resonant.Labels[1].Purity, 0.49, 0.51);
        var detuned = new DeviceSolver().Solve(Pair(5.5, 0.02), 3);
        Assert.All(detuned.Labels, l => Assert.False(l.Ambiguous));
        Assert.Equal("0,0", detuned.LabelText(0));
        Assert.Equal("1,0", detuned.LabelText(1));
        Assert.Equal("0,1", detuned.LabelText(2));
    }

    [Fact]
    public void Assignment_finds_the_optimum_where_greedy_fails()
    {
        // greedy by row would give row0→col0 (0.9) then row1→col1 (0.1): total 1.0; optimum is 0.8 + 0.7 = 1.5
        var cost = new[,] { { -0.9, -0.8 }, { -0.7, -0.1 } };
        Assert.Equal(new[] { 1, 0 }, Assignment.Solve(cost));
    }
}

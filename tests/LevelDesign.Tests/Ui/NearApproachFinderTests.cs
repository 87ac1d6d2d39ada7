using LevelDesign.Ui.Compute;

namespace LevelDesign.Tests.Ui;

/// <summary>
/// Two levels with detuning d = s·(x − x0) and coupling g have E± = c ± sqrt((d/2)² + g²) (the 2×2 secular
/// determinant, textbook linear-variation result), so the closest approach is 2g at x = x0.
/// </summary>
public class NearApproachFinderTests
{
    private static SpectrumSeries Anticrossing(double x0, double g, int points)
    {
        var axis = Enumerable.Range(0, points).Select(i => i / (points - 1.0)).ToArray();
        double Half(double x) => Math.Sqrt(Math.Pow(2.0 * (x - x0) / 2, 2) + g * g);
        var lower = new Branch("qa1", 1, axis.Select(x => 5.0 - Half(x)).ToArray());
        var upper = new Branch("ra1", 1, axis.Select(x => 5.0 + Half(x)).ToArray());
        return SpectrumSeries.Of("qa_flux", axis, [lower, upper]);
    }

    [Fact]
    public void Finds_the_gap_2g_at_the_centre_of_an_avoided_crossing()
    {
        var found = NearApproachFinder.Find(Anticrossing(x0: 0.4, g: 0.01, points: 51));
        var crossing = Assert.Single(found);
        Assert.Equal(0.4, crossing.AxisValue, 12);          // 0.4 is grid point 20 of 51
        Assert.Equal(2 * 0.01, crossing.GapGHz, 12);
        Assert.Equal(("qa1", "ra1"), (crossing.LabelA, crossing.LabelB));
    }

    [Fact]
    public void Levels_that_only_run_side_by_side_are_not_a_crossing()
    {
        var axis = Enumerable.Range(0, 21).Select(i => i / 20.0).ToArray();
        var a = new Branch("qa1", 1, axis.Select(x => 5.0 + x).ToArray());
        var b = new Branch("qb1", 1, axis.Select(x => 5.3 + 1.1 * x).ToArray());
        Assert.Empty(NearApproachFinder.Find(SpectrumSeries.Of("qa_flux", axis, [a, b])));
    }

    [Fact]
    public void A_minimum_at_the_end_of_the_sweep_is_not_a_crossing()
    {
        Assert.Empty(NearApproachFinder.Find(Anticrossing(x0: 1.0, g: 0.01, points: 21)));
    }
}

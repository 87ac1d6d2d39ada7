using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Elements;
using LevelDesign.Core.Model;
using LevelDesign.Core.Sweeps;

namespace LevelDesign.Core.Tests.Sweeps;

public class TargetSolverTests
{
    /// <summary>
    /// Koch et al., PRA 76, 042319 (2007): E_01 ≈ sqrt(8E_J E_C) − E_C with the asymmetric-SQUID
    /// E_J(Φ) = E_JΣ sqrt(cos²(πΦ) + d² sin²(πΦ)). Inverting gives cos²(πΦ) = ((E_J/E_JΣ)² − d²)/(1 − d²) with
    /// E_J = (f + E_C)²/(8E_C). The formula neglects terms of size E_C·sqrt(E_C/E_J) (the next order of the
    /// asymptotic expansion), so the flux it gives may differ from the exact root by at most that frequency
    /// error divided by |df/dΦ|; E_J/E_C ≥ 52 over the whole range here. Both roots ±Φ in (−½, ½) must be found.
    /// </summary>
    [Fact]
    public async Task Flux_for_a_target_frequency_matches_the_inverted_squid_formula()
    {
        double ec = 0.2, ejSum = 30, d = 0.35, target = 5.25;
        var device = new Device("one", [new TunableTransmon("q", ec, ejSum, d, 0)], [], new Truncation { DefaultLevels = 3 });
        var axis = new SweepAxis("q.flux", -0.5, 0.5, 41, []);
        var roots = await TargetSolver.FindAllAsync(ParameterResolver.ForPaths(device, [axis]), axis, "q.f01", target);

        Assert.Equal(2, roots.Count);
        double ej = (target + ec) * (target + ec) / (8 * ec);
        double formulaFlux = Math.Acos(Math.Sqrt((ej * ej / (ejSum * ejSum) - d * d) / (1 - d * d))) / Math.PI;
        double slope = Math.Sqrt(8 * ec) / (2 * Math.Sqrt(ej)) * Math.Abs(SquidJosephsonEnergy.Derivative(ejSum, d, formulaFlux));
        double fluxBound = ec * Math.Sqrt(ec / ej) / slope;
        foreach (var root in roots)
        {
            Assert.True(root.Refined);
            Assert.Equal(0, root.Residual, 1e-9);
            Assert.InRange(Math.Abs(root.Bias) - formulaFlux, -fluxBound, fluxBound);
        }
        Assert.Equal(-roots[0].Bias, roots[1].Bias, 1e-8);   // E_J(Φ) is even in Φ
    }

    /// <summary>
    /// A goal above the whole tuning range: no root, and the closest approach is the sweet spot (flux 0), where f01 is
    /// largest — the scan point whose f01 the search reports, equal to a plain solve there.
    /// </summary>
    [Fact]
    public async Task A_missed_target_reports_the_scan_point_nearest_the_goal()
    {
        var device = new Device("one", [new TunableTransmon("q", 0.2, 30, 0.35, 0)], [], new Truncation { DefaultLevels = 3 });
        var axis = new SweepAxis("q.flux", -0.5, 0.5, 21, []);
        var result = await TargetSolver.SearchAsync(ParameterResolver.ForPaths(device, [axis]), axis, "q.f01", 9.0);
        Assert.Empty(result.Roots);
        var closest = Assert.IsType<TargetApproach>(result.Closest);
        Assert.Equal(0, closest.Bias, 12);
        var atSweetSpot = LevelDesign.Core.Analysis.DerivedQuantities.From(new LevelDesign.Core.Composite.DeviceSolver().Solve(device, 3)).Named()["q.f01"];
        Assert.Equal(atSweetSpot, closest.Value, 9);
        Assert.Equal(1.0, closest.Purity, 12);
        // below the range: the closest point is an end, where f01 is lowest
        var below = await TargetSolver.SearchAsync(ParameterResolver.ForPaths(device, [axis]), axis, "q.f01", 0.5);
        Assert.Equal(0.5, Math.Abs(below.Closest!.Bias), 12);
    }

    [Fact]
    public async Task Unknown_quantity_names_the_available_ones()
    {
        var device = new Device("one", [new TunableTransmon("q", 0.2, 30, 0.35, 0)], [], new Truncation { DefaultLevels = 3 });
        var axis = new SweepAxis("q.flux", 0, 0.5, 5, []);
        var e = await Assert.ThrowsAsync<ArgumentException>(() =>
            TargetSolver.FindAllAsync(ParameterResolver.ForPaths(device, [axis]), axis, "q.f99", 5));
        Assert.Contains("q.f01", e.Message);
    }
}

using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Sweeps;

namespace LevelDesign.Core.Tests.Sweeps;

public class TargetRefinementTests
{
    /// <summary>
    /// The demo's zero-ZZ search over the whole coil range with a 41-point scan: a label jump shares the root's scan
    /// step, so the scan alone sees no sign change through the root. Sampling the hybridized steps finer finds the
    /// root of the reference script (tests/reference/zz_zero_pair.py, SciPy 1.10.1: 0.2512200622 Φ0).
    /// </summary>
    [Fact]
    public async Task A_root_beside_a_label_jump_is_found_when_hybridized_steps_are_refined()
    {
        var document = DeviceDocument.Demo();
        var bias = document.Bias("qc_flux")!;
        var axis = new SweepAxis("qc_flux", 0.15e-3, 1.05e-3, 41, []);
        Task<IReadOnlyList<TargetRoot>> Find(double? refine) =>
            TargetSolver.FindAllAsync(values => document.Resolve([axis], values), axis, "zz:qa:qb", 0, refineBelowPurity: refine, tolerance: 1e-15);

        var coarse = await Find(null);
        Assert.DoesNotContain(coarse, r => r.Refined);   // the scan alone: jumps only

        var refined = (await Find(document.PurityThreshold)).Where(r => r.Refined).ToList();
        var root = Assert.Single(refined);
        Assert.Equal(0.2512200622, bias.ToParameter(root.Bias), 8);
        Assert.True(root.IsHybridized(document.PurityThreshold));   // and it says the labels there are mixed
    }
}

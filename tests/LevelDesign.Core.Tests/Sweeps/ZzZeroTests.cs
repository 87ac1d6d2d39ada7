using LevelDesign.Core.Couplers;
using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Elements;
using LevelDesign.Core.Model;
using LevelDesign.Core.Sweeps;
using LevelDesign.Core.Tests.Support;

namespace LevelDesign.Core.Tests.Sweeps;

public class ZzZeroTests
{
    /// <summary>
    /// Coupler flux where ZZ(qa, qb) = 0 against tests/reference/data/zz_zero_selftest.csv, produced by
    /// tests/reference/zz_zero_pair.py --self-test (its own numpy Hamiltonian, scipy.optimize.brentq; SciPy 1.10.1,
    /// NumPy 1.24.2) for the same invented three-element device. Tolerance 1e-8 Φ0: both sides solve to ~1e-12
    /// in energy; the charge bases differ (|n| ≤ 30 there, converged to 1e-9 GHz here).
    /// </summary>
    [Fact]
    public async Task Zz_zero_coupler_flux_matches_the_independent_scipy_script()
    {
        var expected = ReferenceData.Rows("zz_zero_selftest.csv").Select(r => r.Number("flux_phi0")).ToArray();
        var device = new Device("zz",
            [new Transmon("qa", 0.2, 16.0), new TunableTransmon("c", 0.18, 45.0, 0.0, 0.0), new Transmon("qb", 0.21, 15.0)],
            [
                Coupler.Create("g1", CouplerKind.Capacitive, "qa", "c", new CouplingStrength.Coefficient(0.06)),
                Coupler.Create("g2", CouplerKind.Capacitive, "qb", "c", new CouplingStrength.Coefficient(0.06)),
                Coupler.Create("g3", CouplerKind.Capacitive, "qa", "qb", new CouplingStrength.Coefficient(0.004)),
            ],
            new Truncation { DefaultLevels = 4, MaxExcitations = 3 });
        var axis = new SweepAxis("c.flux", 0.0, 0.45, 31, []);
        var roots = await TargetSolver.FindAllAsync(ParameterResolver.ForPaths(device, [axis]), axis, "zz:qa:qb", 0.0);
        var refined = roots.Where(r => r.Refined).Select(r => r.Bias).ToArray();
        Assert.Equal(expected.Length, refined.Length);
        for (int i = 0; i < expected.Length; i++) Assert.Equal(expected[i], refined[i], 1e-8);
    }
}

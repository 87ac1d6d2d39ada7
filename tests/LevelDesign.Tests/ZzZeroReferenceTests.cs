using System.Text.Json.Nodes;
using LevelDesign.Tests.Support;

namespace LevelDesign.Tests;

/// <summary>
/// `solve --target zz:qa:qb=0` on devices/pair.toml against an independent SciPy computation:
/// tests/reference/zz_zero_pair.py rebuilds the Hamiltonian from `describe --json` (tests/reference/data/pair_describe.json)
/// with its own numpy code and finds the ZZ zeros with scipy.optimize.brentq (SciPy 1.10.1, NumPy 1.24.2),
/// written to tests/reference/data/zz_zero_pair.csv. Both sides use the truncation of describe JSON (5,5,5,3,3 levels,
/// at most 6 excitations).
/// </summary>
public sealed class ZzZeroReferenceTests
{
    /// <summary>
    /// Tolerance on the coupler flux: the two sides differ only in the transmons' charge basis (LevelDesign grows it
    /// until the kept levels move by < 1 Hz; the script keeps |n| ≤ 30), so ZZ differs by a few Hz at most; with
    /// dZZ/dΦ ≈ −2.0 GHz/Φ0 at the root (from the script's model, central difference) that moves the root by ~2e-9 Φ0.
    /// 1e-7 Φ0 (0.24 nA of coil current) leaves a factor of 50.
    /// </summary>
    private const double FluxTolerance = 1e-7;

    [Fact]
    public void SolveFindsTheReferenceZzZeroOfTheCouplerFlux()
    {
        var reference = ReferenceCsv.Rows("zz_zero_pair.csv");
        Assert.NotEmpty(reference);
        var run = Executable.Run(["solve", "devices/pair.toml", "--vary", "qc_flux=0.15mA:1.05mA:31", "--target", "zz:qa:qb=0", "--json"], TimeSpan.FromMinutes(5));
        Assert.True(run.ExitCode == 0, run.ToString());
        var roots = JsonNode.Parse(run.Stdout)!["roots"]!.AsArray().Where(r => (bool)r!["root"]!).ToArray();
        foreach (var expected in reference)
        {
            var nearest = roots.MinBy(r => Math.Abs((double)r!["parameter"]!["qc.flux"]! - expected["flux_phi0"]));
            Assert.NotNull(nearest);
            Assert.Equal(expected["flux_phi0"], (double)nearest!["parameter"]!["qc.flux"]!, FluxTolerance);
            // the same root in the bias's control unit as the file writes it (mA): 2.4 mA per Φ0, so the tolerance scales by the period
            Assert.Equal("mA", (string?)nearest["bias_unit"]);
            Assert.Equal(expected["control_a"] * 1e3, (double)nearest["bias"]!, FluxTolerance * 2.4);
            Assert.True(Math.Abs((double)nearest["value_ghz"]!) < 1e-9, "ZZ at the root should vanish");
        }
        // and no root that the reference does not have
        Assert.Equal(reference.Count, roots.Length);
    }
}

using LevelDesign.Core.Composite;
using LevelDesign.Core.Couplers;
using LevelDesign.Core.Elements;
using LevelDesign.Core.Model;
using LevelDesign.Core.Tests.Support;

namespace LevelDesign.Core.Tests.Physics;

/// <summary>
/// A complex Hermitian device: transmon (E_C 0.25, E_J 12, n_g 0.25) coupled by 0.08·n_T⊗n_F to a fluxonium
/// (E_C 1, E_J 4, E_L 1, Φ 0.3 Φ0). Reference: full product basis of the natural bases diagonalised with
/// scipy.linalg.eigh (tests/reference/transmon_fluxonium_product.py, SciPy 1.10.1, NumPy 1.24.2).
/// </summary>
public class CompositeReferenceTests
{
    private static Device Build(int levels, int? maxExcitations = null) => new(
        "t-f",
        [new Transmon("t", 0.25, 12.0, 0.25), new Fluxonium("f", 1.0, 4.0, 1.0, 0.3)],
        [Coupler.Create("c", CouplerKind.Capacitive, "t", "f", new CouplingStrength.Coefficient(0.08))],
        new Truncation { DefaultLevels = levels, MaxExcitations = maxExcitations });

    private static double[] Reference() =>
        ReferenceData.Rows("transmon_fluxonium_product.csv").OrderBy(r => r.Number("level")).Select(r => r.Number("energy_ghz")).ToArray();

    private static double BareGround(string element) =>
        ReferenceData.Rows("transmon_fluxonium_bare.csv").Single(r => r["element"] == element && r.Number("level") == 0).Number("energy_ghz");

    [Fact]
    public void Bare_levels_match_reference()
    {
        foreach (var (element, spectrum) in new[] { ("transmon", new Transmon("t", 0.25, 12.0, 0.25).Diagonalise(8)), ("fluxonium", new Fluxonium("f", 1.0, 4.0, 1.0, 0.3).Diagonalise(8)) })
        {
            var rows = ReferenceData.Rows("transmon_fluxonium_bare.csv").Where(r => r["element"] == element).ToArray();
            foreach (var row in rows) Assert.Equal(row.Number("energy_ghz"), spectrum.Energies[(int)row.Number("level")], 8);
        }
    }

    [Fact]
    public void Composite_is_complex_Hermitian_and_matches_full_product_reference()
    {
        var spectrum = new DeviceSolver().Solve(Build(14), 12);
        Assert.True(spectrum.IsComplex);
        var reference = Reference();
        double offset = BareGround("transmon") + BareGround("fluxonium");
        Assert.Equal(reference[0], spectrum.GroundEnergy + offset, 6);
        for (int k = 1; k < 12; k++) Assert.Equal(reference[k] - reference[0], spectrum.Energies[k], 6);
    }

    /// <summary>Hierarchical truncation converges to the full product-basis result as the cutoffs grow.</summary>
    [Fact]
    public void Hierarchical_truncation_converges_to_full_product()
    {
        var reference = Reference();
        double ErrorWith(int levels)
        {
            var s = new DeviceSolver().Solve(Build(levels), 8);
            return Enumerable.Range(1, 7).Max(k => Math.Abs(s.Energies[k] - (reference[k] - reference[0])));
        }
        double e5 = ErrorWith(5), e8 = ErrorWith(8), e14 = ErrorWith(14);
        Assert.True(e8 < e5, $"error should fall: 5 levels {e5}, 8 levels {e8}");
        Assert.True(e14 < e8, $"error should fall: 8 levels {e8}, 14 levels {e14}");
        Assert.True(e14 < 1e-6, $"14 levels each should be converged, error {e14}");
    }
}

using System.Numerics;
using LevelDesign.Core.Analysis;
using LevelDesign.Core.Composite;
using LevelDesign.Core.Couplers;
using LevelDesign.Core.Elements;
using LevelDesign.Core.Model;

namespace LevelDesign.Core.Tests.Physics;

public class EffectiveHamiltonianTests
{
    private static Coupler Charge(string a, string b, double g) =>
        Coupler.Create($"{a}_{b}", CouplerKind.Capacitive, a, b, new CouplingStrength.TargetG(g));

    /// <summary>
    /// Two Kerr qubits (a, b) and a Kerr coupler (c) between them, charge·charge couplings given as g. The anharmonicities
    /// keep |11⟩ away from |02⟩ and |20⟩ for the frequencies used (ω_a − (ω_b + α_b) ≥ 150 MHz), so |11⟩ stays pure.
    /// </summary>
    private static Device TunableCoupler(double w1, double w2, double wc, double g1, double g2, double g12) =>
        new("tc", [new KerrOscillator("a", w1, -0.22), new KerrOscillator("c", wc, -0.1), new KerrOscillator("b", w2, -0.35)],
            [Charge("a", "c", g1), Charge("b", "c", g2), Charge("a", "b", g12)], new Truncation { DefaultLevels = 4 });

    [Fact]
    public void Eigenvalues_equal_the_labelled_dressed_energies()
    {
        var s = new DeviceSolver().Solve(TunableCoupler(5.0, 5.3, 6.2, 0.08, 0.08, 0.006));
        var h = BlockDiagonalisation.Of(s, "a", "b");
        var m = MathNet.Numerics.LinearAlgebra.Matrix<Complex>.Build.DenseOfArray(h.Matrix);
        Assert.True((m - m.ConjugateTranspose()).FrobeniusNorm() < 1e-12, "H_eff is Hermitian");
        var eig = m.Evd(MathNet.Numerics.LinearAlgebra.Symmetricity.Hermitian).EigenValues.Select(z => z.Real).OrderBy(x => x).ToArray();
        var expected = new[] { s.EnergyOfExcitation(), s.EnergyOfExcitation((2, 1)), s.EnergyOfExcitation((0, 1)), s.EnergyOfExcitation((0, 1), (2, 1)) }
            .OrderBy(x => x).ToArray();
        for (int i = 0; i < 4; i++) Assert.Equal(expected[i], eig[i], 10);
        Assert.False(h.IllConditioned);
        Assert.Equal(h.DressedEnergies.OrderBy(x => x), expected);
    }

    /// <summary>
    /// ZZ read from H_eff (ζ = 4h_ZZ, the diagonal combination H00 − H01 − H10 + H11) equals ζ = E11 − E10 − E01 + E00
    /// of the labelled dressed energies: the traces of the even {00, 11} and odd {01, 10} blocks are kept because the
    /// charge couplings conserve excitation parity, so the equality is exact up to rounding.
    /// </summary>
    [Fact]
    public void ZZ_from_the_effective_hamiltonian_equals_zz_from_labelled_energies()
    {
        var s = new DeviceSolver().Solve(TunableCoupler(5.0, 5.25, 6.0, 0.1, 0.09, 0.007));
        var derived = DerivedQuantities.From(s);
        var h = derived.EffectiveHamiltonians.Single(x => x.QubitA == "a" && x.QubitB == "b");
        double zz = derived.ZZ.Single(p => p.First == "a" && p.Second == "b").Value;
        Assert.True(Math.Abs(h.ZZ - zz) < 1e-9, $"ζ from H_eff {h.ZZ} vs labelled {zz}");
        Assert.True(Math.Abs(zz) > 1e-5, "a non-trivial ζ");
    }

    /// <summary>
    /// Yan et al., Phys. Rev. Applied 10, 054062 (2018): with the coupler eliminated to second order,
    /// g_eff ≈ (g1g2/2)(1/Δ1 + 1/Δ2 − 1/Σ1 − 1/Σ2) + g12, Δj = ωj − ωc, Σj = ωj + ωc. The neglected terms are of fourth
    /// order, of size g_max⁴/|Δ|³ up to a factor of order one (our bound: |J_eff − g_eff| ≤ g_max⁴/min|Δ|³ + 1e-7 GHz; the
    /// differences measured are 2.2e-7, 2.0e-6 and 1.3e-5 GHz at ωc = 7.5, 6.5, 6 GHz against bounds 1.2e-6, 6.0e-6, 2.5e-5).
    /// </summary>
    [Theory]
    [InlineData(6.0)]
    [InlineData(6.5)]
    [InlineData(7.5)]
    public void Dispersive_effective_coupling_matches_the_second_order_formula(double wc)
    {
        double w1 = 5.0, w2 = 5.2, g1 = 0.06, g2 = 0.05, g12 = 0.004;
        var s = new DeviceSolver().Solve(TunableCoupler(w1, w2, wc, g1, g2, g12));
        var h = BlockDiagonalisation.Of(s, "a", "b");
        double d1 = w1 - wc, d2 = w2 - wc, s1 = w1 + wc, s2 = w2 + wc;
        double expected = g1 * g2 / 2 * (1 / d1 + 1 / d2 - 1 / s1 - 1 / s2) + g12;
        double bound = Math.Pow(Math.Max(g1, g2), 4) / Math.Pow(Math.Min(Math.Abs(d1), Math.Abs(d2)), 3) + 1e-7;
        Assert.False(h.IllConditioned);
        Assert.True(Math.Abs(h.JEff - expected) <= bound, $"ωc = {wc}: J_eff {h.JEff} vs g_eff {expected} (bound {bound})");
        Assert.True(h.Residual < 1e-6, $"residual {h.Residual}");
    }

    /// <summary>
    /// A direct charge coupling alone: with n = i·n_zpf(a† − a) on both Kerr elements, g12·n_a n_b/|n01|² =
    /// −g12(a†−a)(b†−b) gives ⟨10|H|01⟩ = +g12 and ⟨00|H|11⟩ = −g12 at first order; second-order corrections are
    /// of size g12²/(f_a + f_b) (here below 2e-6 GHz; we allow 1e-5).
    /// </summary>
    [Fact]
    public void A_direct_coupling_gives_exchange_and_counter_rotating_terms_of_opposite_sign()
    {
        double g12 = 0.004;
        var device = new Device("ab", [new KerrOscillator("a", 5.0, -0.22), new KerrOscillator("b", 5.2, -0.2)], [Charge("a", "b", g12)],
            new Truncation { DefaultLevels = 4 });
        var h = BlockDiagonalisation.Of(new DeviceSolver().Solve(device), "a", "b");
        Assert.True(Math.Abs(h.JEff - g12) < 1e-5, $"J_eff {h.JEff}");
        Assert.True(Math.Abs(h.CounterRotating + g12) < 1e-5, $"K {h.CounterRotating}");
        Assert.True(h.Residual < 1e-9);
    }

    /// <summary>
    /// The counter-rotating term: the second-order sum for ⟨00|H|11⟩ meets the same four denominators as g_eff above, with
    /// the counter-rotating couplings' opposite sign (n = i·n_zpf(a† − a)), so K = −g_eff at second order (derived here and
    /// checked against a direct second-order sum over the assembled Hamiltonian). Its fourth-order terms are enhanced by
    /// |11⟩'s nearness to |02⟩ (150 MHz), so the check uses weak couplings, where they are below 1e-3 of K; we allow 2e-3.
    /// </summary>
    [Theory]
    [InlineData(6.5)]
    [InlineData(7.5)]
    public void Counter_rotating_term_is_minus_g_eff_at_second_order(double wc)
    {
        double w1 = 5.0, w2 = 5.2, g1 = 0.015, g2 = 0.0125, g12 = 0.001;
        var h = BlockDiagonalisation.Of(new DeviceSolver().Solve(TunableCoupler(w1, w2, wc, g1, g2, g12)), "a", "b");
        double expected = g1 * g2 / 2 * (1 / (w1 - wc) + 1 / (w2 - wc) - 1 / (w1 + wc) - 1 / (w2 + wc)) + g12;
        Assert.True(Math.Abs(h.CounterRotating + expected) <= 2e-3 * Math.Abs(expected), $"ωc = {wc}: K {h.CounterRotating} vs −g_eff {-expected}");
    }

    [Fact]
    public void Hybridized_computational_states_are_reported_ill_conditioned()
    {
        // qubit a resonant with the coupler: its dressed |1⟩ is half coupler excitation
        var s = new DeviceSolver().Solve(TunableCoupler(5.0, 5.4, 5.0, 0.08, 0.02, 0.0));
        var h = BlockDiagonalisation.Of(s, "a", "b");
        Assert.True(h.IllConditioned);
        Assert.True(h.MinComputationalWeight < 0.7, $"weight {h.MinComputationalWeight}");
    }

    [Fact]
    public void Default_pairs_are_those_joined_directly_or_through_one_element()
    {
        var device = new Device("chain", [new KerrOscillator("a", 5, -0.2), new KerrOscillator("c", 6, -0.2), new KerrOscillator("b", 5.2, -0.2),
                new KerrOscillator("far", 4.8, -0.2), new Resonator("r", 7)],
            [Charge("a", "c", 0.05), Charge("c", "b", 0.05), Charge("b", "r", 0.05), Charge("r", "far", 0.05)],
            new Truncation { DefaultLevels = 2 });
        var pairs = BlockDiagonalisation.CoupledPairs(device);
        Assert.Equal([("a", "c"), ("a", "b"), ("c", "b"), ("b", "far")], pairs);
    }
}

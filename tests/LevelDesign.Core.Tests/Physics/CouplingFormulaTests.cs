using LevelDesign.Core.Analysis;
using LevelDesign.Core.Composite;
using LevelDesign.Core.Couplers;
using LevelDesign.Core.Elements;
using LevelDesign.Core.Model;

namespace LevelDesign.Core.Tests.Physics;

public class CouplingFormulaTests
{
    private static Coupler Exchange(string a, string b, double g) =>
        Coupler.Create($"g_{a}_{b}", CouplerKind.Exchange, a, b, new CouplingStrength.Coefficient(g));

    /// <summary>
    /// Jaynes–Cummings (Jaynes &amp; Cummings, Proc. IEEE 51, 89 (1963)): at resonance the n-excitation doublet is
    /// nω ± g√n exactly, so the splitting is 2g√n.
    /// </summary>
    [Fact]
    public void Jaynes_Cummings_ladder_is_exact()
    {
        double omega = 5.0, g = 0.05;
        var qubit = new LevelList("q", new[,] { { 0.0, 0.0 }, { 0.0, omega } }, new Dictionary<string, double[,]>());
        var device = new Device("jc", [qubit, new Resonator("r", omega)], [Exchange("q", "r", g)],
            new Truncation { Levels = new Dictionary<string, int> { ["q"] = 2, ["r"] = 6 } });
        var s = new DeviceSolver().Solve(device, 12);
        Assert.Equal(0, s.GroundEnergy, 12);
        for (int n = 1; n <= 4; n++)
        {
            var doublet = s.Energies.Where(e => Math.Abs(e - n * omega) < omega / 2).OrderBy(e => e).ToArray();
            Assert.Equal(2, doublet.Length);
            Assert.Equal(n * omega - g * Math.Sqrt(n), doublet[0], 10);
            Assert.Equal(n * omega + g * Math.Sqrt(n), doublet[1], 10);
        }
    }

    /// <summary>
    /// Dispersive shift of a Kerr qubit on a resonator, rotating-wave coupling: 2χ = 2g²α/(Δ(Δ+α)), Δ = ω_q − ω_r
    /// (Koch et al. 2007; Blais et al., RMP 93, 025005 (2021); Krantz et al., APR 6, 021318 (2019)). Corrections are
    /// of relative order (g/Δ)²; we allow 2%.
    /// </summary>
    [Theory]
    [InlineData(5.0, -0.25, 7.0, 0.05)]
    [InlineData(6.0, -0.3, 4.8, 0.04)]
    public void Dispersive_shift_matches_formula(double wq, double alpha, double wr, double g)
    {
        var device = new Device("qr", [new KerrOscillator("q", wq, alpha), new Resonator("r", wr)], [Exchange("q", "r", g)],
            new Truncation { DefaultLevels = 6 });
        var chi = DerivedQuantities.From(new DeviceSolver().Solve(device)).DispersiveShifts.Single();
        double delta = wq - wr;
        double expected = 2 * g * g * alpha / (delta * (delta + alpha));
        Assert.Equal("q", chi.First);
        Assert.True(Math.Abs(chi.Value / expected - 1) < 0.02, $"2χ {chi.Value} vs formula {expected}");
    }

    /// <summary>
    /// ZZ of two exchange-coupled Kerr oscillators in the dispersive limit: ζ ≈ 2J²(α1+α2)/((Δ+α1)(Δ−α2)),
    /// Δ = ω1 − ω2 (from memory, checked numerically here). Corrections of relative order (J/Δ)²; we allow 3%.
    /// </summary>
    [Theory]
    [InlineData(5.0, -0.3, 5.4, -0.25, 0.01)]
    [InlineData(4.6, -0.2, 5.3, -0.32, 0.015)]
    public void ZZ_of_Kerr_pair_matches_formula(double w1, double a1, double w2, double a2, double j)
    {
        var device = new Device("kk", [new KerrOscillator("a", w1, a1), new KerrOscillator("b", w2, a2)], [Exchange("a", "b", j)],
            new Truncation { DefaultLevels = 5 });
        double zz = DerivedQuantities.From(new DeviceSolver().Solve(device)).ZZ.Single().Value;
        double delta = w1 - w2;
        double expected = 2 * j * j * (a1 + a2) / ((delta + a1) * (delta - a2));
        Assert.True(Math.Abs(zz / expected - 1) < 0.03, $"ζ {zz} vs formula {expected}");
    }

    /// <summary>Purcell estimate against κ(g/Δ)² (Houck et al., PRL 101, 080502 (2008)); we allow 2%.</summary>
    [Fact]
    public void Purcell_rate_matches_dispersive_estimate()
    {
        double wq = 5.2, wr = 7.1, g = 0.06, kappa = 0.002;
        var device = new Device("p", [new KerrOscillator("q", wq, -0.22), new Resonator("r", wr, Kappa: kappa)], [Exchange("q", "r", g)],
            new Truncation { DefaultLevels = 5 });
        var p = DerivedQuantities.From(new DeviceSolver().Solve(device)).Purcell.Single();
        double expected = kappa * Math.Pow(g / (wq - wr), 2);
        Assert.True(Math.Abs(p.RateGHz / expected - 1) < 0.02, $"γ {p.RateGHz} vs κ(g/Δ)² {expected}");
    }

    /// <summary>A coupling given as a target g reproduces the JC splitting 2g at resonance.</summary>
    [Fact]
    public void Target_g_is_converted_through_bare_matrix_elements()
    {
        double g = 0.03;
        var device = new Device("tg", [new Transmon("q", 0.2, 20 * 0.2), new Resonator("r", 1)],
            [Coupler.Create("c", CouplerKind.Capacitive, "q", "r", new CouplingStrength.TargetG(g))], new Truncation { DefaultLevels = 5 });
        var solver = new DeviceSolver();
        double f01 = new Transmon("q", 0.2, 4).Diagonalise(2).Excitation(1);
        var tuned = device.WithParameter("r.frequency", f01);
        var s = solver.Solve(tuned);
        var singles = s.Energies.Where(e => Math.Abs(e - f01) < 0.5).OrderBy(e => e).ToArray();
        Assert.Equal(2, singles.Length);
        // counter-rotating terms shift the pair slightly (Bloch–Siegert, order g²/(2ω)); the splitting stays 2g to 1%
        Assert.True(Math.Abs((singles[1] - singles[0]) / (2 * g) - 1) < 0.01, $"splitting {singles[1] - singles[0]} vs 2g {2 * g}");
    }
}

using System.Numerics;
using LevelDesign.Core.Analysis;
using LevelDesign.Core.Composite;
using LevelDesign.Core.Couplers;
using LevelDesign.Core.Elements;
using LevelDesign.Core.Linear;
using LevelDesign.Core.Model;

namespace LevelDesign.Core.Tests.Physics;

/// <summary>Every anharmonic element's bare states follow one phase rule: ⟨k−1|n|k⟩ = −i·|⟨k−1|n|k⟩|.</summary>
public class PhaseConventionTests
{
    [Theory]
    [InlineData(0.0)]
    [InlineData(0.3)]
    public void Transmon_charge_steps_are_minus_i_times_positive(double ng)
    {
        var n = new Transmon("q", 0.22, 14, ng).Diagonalise(6).Operator("n");
        for (int k = 1; k < 6; k++)
        {
            Assert.True(n[k - 1, k].Imaginary < 0, $"⟨{k - 1}|n|{k}⟩ = {n[k - 1, k]}");
            Assert.Equal(0, n[k - 1, k].Real, 12);
        }
    }

    [Fact]
    public void Fluxonium_charge_steps_are_minus_i_times_positive()
    {
        var n = new Fluxonium("f", 1.0, 4.0, 1.0, 0.37).Diagonalise(5).Operator("n");
        for (int k = 1; k < 5; k++)
        {
            Assert.True(n[k - 1, k].Imaginary < 0, $"⟨{k - 1}|n|{k}⟩ = {n[k - 1, k]}");
            Assert.Equal(0, n[k - 1, k].Real, 10);
        }
    }

    /// <summary>
    /// Flipping the raw eigenvector signs (or any phases) of an element's states is a diagonal unitary on all of its
    /// operators; after the rule every operator must come out the same.
    /// </summary>
    [Fact]
    public void Random_raw_phases_give_the_same_operators()
    {
        var spectrum = new TunableTransmon("q", 0.2, 20, 0.3, 0.27, 0.1).Diagonalise(6);
        var random = new Random(7);
        for (int trial = 0; trial < 20; trial++)
        {
            var u = Enumerable.Range(0, 6).Select(_ => trial % 2 == 0
                ? new Complex(random.Next(2) * 2 - 1, 0)
                : Complex.FromPolarCoordinates(1, random.NextDouble() * 2 * Math.PI)).ToArray();
            var scrambled = new BareSpectrum("q", spectrum.Energies,
                spectrum.Operators.ToDictionary(o => o.Key, o => Conjugated(o.Value, u)), spectrum.Basis);
            var fixedAgain = PhaseConvention.Apply(scrambled);
            foreach (var (name, op) in spectrum.Operators)
                for (int j = 0; j < 6; j++)
                    for (int k = 0; k < 6; k++)
                        Assert.True(Complex.Abs(fixedAgain.Operator(name)[j, k] - op[j, k]) < 1e-12, $"{name}[{j},{k}] trial {trial}");
        }
    }

    /// <summary>
    /// End to end: a level list carrying the transmon's energies and its charge matrix with random real signs (as any
    /// eigensolver may return them) behaves exactly like the transmon, in a device that couples it through n and
    /// through its ladder a at once (where the relative phase of n and a matters).
    /// </summary>
    [Fact]
    public void A_level_list_with_scrambled_signs_matches_the_transmon_through_n_and_a()
    {
        var transmon = new Transmon("q", 0.22, 14);
        var bare = transmon.Diagonalise(5);
        var n = bare.Operator("n");
        var random = new Random(11);
        var signs = Enumerable.Range(0, 5).Select(_ => random.Next(2) * 2 - 1.0).ToArray();
        var h = new double[5, 5];
        var real = new double[5, 5];
        for (int j = 0; j < 5; j++)
        {
            h[j, j] = bare.Energies[j];
            for (int k = 0; k < 5; k++)
            {
                // back to a real gauge (multiply state k by i^k), then scramble the signs
                Complex r = Complex.Pow(Complex.ImaginaryOne, j - k) * n[j, k];
                Assert.Equal(0, r.Imaginary, 12);
                real[j, k] = signs[j] * signs[k] * r.Real;
            }
        }
        var list = new LevelList("q", h, new Dictionary<string, double[,]> { ["n"] = real });
        Device With(Element q) => new("nd", [q, new Resonator("r1", 7.0), new Resonator("r2", 6.4)],
            [
                Coupler.Create("c1", CouplerKind.Capacitive, "q", "r1", new CouplingStrength.Coefficient(0.08)),
                Coupler.Create("c2", CouplerKind.Exchange, "q", "r2", new CouplingStrength.Coefficient(0.05)),
            ],
            new Truncation { Levels = new Dictionary<string, int> { ["q"] = 5, ["r1"] = 3, ["r2"] = 3 } });
        var a = new DeviceSolver().Solve(With(transmon), 20);
        var b = new DeviceSolver().Solve(With(list), 20);
        for (int i = 0; i < 20; i++) Assert.Equal(a.Energies[i], b.Energies[i], 10);
    }

    /// <summary>
    /// The charge coupling n_q·n_r and the exchange form a_q·a_r describe the same coupling in the dispersive regime:
    /// with the rule, n ≈ i·n_zpf(a† − a) for both, so n_q·n_r carries +n_zpf,q·n_zpf,r(a†b + ab†) plus counter-rotating
    /// terms. A transmon coupled to one resonator through both at once (g1 by charge, g2 by exchange) must then act as
    /// exchange with g1 + g2; the difference is the counter-rotating (Bloch–Siegert) correction, of order
    /// g²/(ω_q + ω_r) (Bloch &amp; Siegert, Phys. Rev. 57, 522 (1940); Blais et al., RMP 93, 025005 (2021), Sec. III).
    /// We allow 2g²/(ω_q + ω_r). A wrong relative phase would give |g1 − g2| or sqrt(g1² + g2²) instead: a Lamb shift
    /// off by several times that.
    /// </summary>
    [Fact]
    public void Charge_and_exchange_couplings_add_like_one_exchange()
    {
        var transmon = new Transmon("q", 0.22, 14);
        double g1 = 0.03, g2 = 0.03, wr = 7.0;
        var resonator = new Resonator("r", wr);
        var truncation = new Truncation { Levels = new Dictionary<string, int> { ["q"] = 6, ["r"] = 5 } };
        var both = new Device("both", [transmon, resonator],
            [
                Coupler.Create("byCharge", CouplerKind.Capacitive, "q", "r", new CouplingStrength.TargetG(g1)),
                Coupler.Create("byExchange", CouplerKind.Exchange, "q", "r", new CouplingStrength.Coefficient(g2)),
            ], truncation);
        var exchange = new Device("exchange", [transmon, resonator],
            [Coupler.Create("x", CouplerKind.Exchange, "q", "r", new CouplingStrength.Coefficient(g1 + g2))], truncation);
        var f01Both = DerivedQuantities.From(new DeviceSolver().Solve(both)).Transitions.Single(t => t.ElementId == "q").DressedF01;
        var f01Exchange = DerivedQuantities.From(new DeviceSolver().Solve(exchange)).Transitions.Single(t => t.ElementId == "q").DressedF01;
        double wq = transmon.Diagonalise(2).Excitation(1);
        double g = g1 + g2;
        double allowed = 2 * g * g / (wq + wr);
        double lamb = g * g / (wq - wr);
        Assert.True(Math.Abs(f01Both - f01Exchange) < allowed,
            $"f01 {f01Both} with n·n + a·a vs {f01Exchange} with one exchange: differ by {f01Both - f01Exchange}, allowed {allowed} (Lamb shift {lamb})");
        Assert.True(allowed < Math.Abs(lamb) / 2, "the check must be able to tell g1 + g2 from a wrong relative phase");
    }

    private static OperatorMatrix Conjugated(OperatorMatrix op, Complex[] u)
    {
        var m = new OperatorMatrix(op.Size);
        for (int j = 0; j < op.Size; j++)
            for (int k = 0; k < op.Size; k++) m[j, k] = Complex.Conjugate(u[j]) * op[j, k] * u[k];
        return m;
    }
}

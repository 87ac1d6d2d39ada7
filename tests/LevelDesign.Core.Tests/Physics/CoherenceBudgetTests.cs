using System.Numerics;
using LevelDesign.Core.Analysis;
using LevelDesign.Core.Composite;
using LevelDesign.Core.Couplers;
using LevelDesign.Core.Elements;
using LevelDesign.Core.Model;

namespace LevelDesign.Core.Tests.Physics;

/// <summary>The coherence budget of a composite model, each channel against its formula fed by independent inputs.</summary>
public class CoherenceBudgetTests
{
    private static readonly CoherenceInputs Inputs = new();

    private static (DressedSpectrum, IReadOnlyList<CoherenceBudget>) Budget(Device device)
    {
        var solver = new DeviceSolver();
        var s = solver.Solve(device);
        return (s, CoherenceEstimator.Estimate(solver, s, Inputs));
    }

    private static CoherenceChannel Channel(CoherenceBudget b, string name) => b.Channels.Single(c => c.Name == name);

    private static void Close(double expected, double actual, double relative, string what) =>
        Assert.True(Math.Abs(actual / expected - 1) < relative, $"{what}: {actual} vs {expected}");

    /// <summary>
    /// Koch et al., PRA 76, 042319 (2007), Eq. 3.4: in the transmon limit |⟨0|n|1⟩|² → (E_J/8E_C)^{1/2}/2. The first
    /// correction is relative −E_C/sqrt(8E_JE_C) (from memory, as f01 ≈ sqrt(8E_JE_C) − E_C; measured here 3.7% at
    /// E_J/E_C = 100 and 1.1% at 1000); we allow 1.5 times it, so the limit is approached as it should.
    /// </summary>
    [Theory]
    [InlineData(100)]
    [InlineData(1000)]
    public void Transmon_charge_matrix_element_tends_to_the_harmonic_limit(double ratio)
    {
        double tolerance = 1.5 / Math.Sqrt(8 * ratio);
        double ec = 0.2;
        var device = new Device("t", [new Transmon("q", ec, ratio * ec)], [], new Truncation { DefaultLevels = 4 });
        var s = new DeviceSolver().Solve(device);
        double n01 = Complex.Abs(DressedMatrixElements.Between(s, "q", "n", 0, 1));
        Close(Math.Sqrt(ratio / 8) / 2, n01 * n01, tolerance, $"|n01|² at E_J/E_C = {ratio}");
    }

    /// <summary>
    /// Limiting case of the dielectric formula: with Koch et al.'s transmon matrix element (Eq. 3.4) and f01 ≈ sqrt(8E_JE_C),
    /// ħω|φ01|²/(4E_C) → 1, so at T → 0 (1 + coth → 2) Γ → 2ω01/Q_cap (derived here from the two published formulas).
    /// The transmon corrections are of relative order sqrt(E_C/8E_J) (1.1% at E_J/E_C = 1000); we allow 3%.
    /// </summary>
    [Fact]
    public void Dielectric_loss_of_a_deep_transmon_tends_to_two_omega_over_q()
    {
        var device = new Device("t", [new Transmon("q", 0.2, 200)], [], new Truncation { DefaultLevels = 4 });
        var solver = new DeviceSolver();
        var s = solver.Solve(device);
        var cold = new CoherenceInputs { QubitTemperature = 0, QCapacitive = 2e6 };
        var b = CoherenceEstimator.Estimate(solver, s, cold).Single();
        double f01 = s.EnergyOfExcitation((0, 1));
        Close(2 * 2 * Math.PI * f01 * 1e9 / 2e6, Channel(b, "dielectric loss").RatePerSecond, 0.03, "dielectric T → 0");
    }

    /// <summary>A single transmon: dressed = bare, so dielectric loss and charge dispersion follow from the element alone.</summary>
    [Fact]
    public void Single_transmon_dielectric_and_charge_channels_match_their_formulas()
    {
        double ec = 0.25, ej = 10;   // E_J/E_C = 40, so the charge dispersion is large enough to see
        var transmon = new Transmon("q", ec, ej);
        var (_, budgets) = Budget(new Device("t", [transmon], [], new Truncation { DefaultLevels = 4 }));
        var b = budgets.Single();

        var bare = transmon.Diagonalise(2);
        double f01 = bare.Excitation(1);
        double n01 = Complex.Abs(bare.Operator("n")[0, 1]);
        double phi2 = Math.Pow(8 * ec * n01 / f01, 2);
        double expectedDielectric = CoherenceFormulas.DielectricRate(f01, ec, Inputs.QCapacitive, phi2, Inputs.QubitTemperature);
        Close(expectedDielectric, Channel(b, "dielectric loss").RatePerSecond, 1e-6, "dielectric");

        // ε01 from the element alone (ChargeDispersion), then Koch et al. Sec. V: Γ = π²·A·|ε01|
        double eps = ChargeDispersion.OfLevel(transmon, 1) - ChargeDispersion.OfLevel(transmon, 0);
        Close(Math.PI * Math.PI * Inputs.ChargeNoise * Math.Abs(eps) * 1e9, Channel(b, "charge noise").RatePerSecond, 1e-6, "charge");
        Assert.Equal(1 / Channel(b, "dielectric loss").RatePerSecond, b.T1Seconds, 6);
        Assert.Equal(1 / (1 / (2 * b.T1Seconds) + 1 / b.TPhiSeconds), b.T2Seconds, 12);
    }

    /// <summary>
    /// First-order flux noise at Φ = 0.2 against the slope of f01 ≈ sqrt(8E_CE_J(Φ)) − E_C (Koch et al. 2007, asymmetric
    /// SQUID), relative error of order sqrt(E_C/E_J): 3%; at the sweet spot the first order vanishes and the second
    /// order follows the curvature E_J'' = −E_JΣ(1 − d²)π² of the same formula, f'' = sqrt(8E_C)·E_J''/(2 sqrt(E_J)).
    /// </summary>
    [Fact]
    public void Tunable_transmon_flux_channels_follow_the_asymptotic_derivatives()
    {
        double ec = 0.2, ejSum = 60, d = 0.2;
        double flux = 0.2;
        var (_, off) = Budget(new Device("q", [new TunableTransmon("q", ec, ejSum, d, flux)], [], new Truncation { DefaultLevels = 3 }));
        double ej = ejSum * Math.Sqrt(Math.Pow(Math.Cos(Math.PI * flux), 2) + d * d * Math.Pow(Math.Sin(Math.PI * flux), 2));
        double ejPrime = -Math.PI * ejSum * ejSum * (1 - d * d) * Math.Sin(2 * Math.PI * flux) / (2 * ej);
        double slope = Math.Sqrt(8 * ec) * ejPrime / (2 * Math.Sqrt(ej));
        var first = Channel(off.Single(), "flux noise, 1st order (q.flux)");
        Close(CoherenceFormulas.FluxFirstOrderRate(slope, Inputs.FluxNoise, Inputs.InfraredCutoffHz, Inputs.MeasurementSeconds),
            first.RatePerSecond, 0.03, "first order");
        Assert.Contains("agree", first.Detail);

        var (_, sweet) = Budget(new Device("q", [new TunableTransmon("q", ec, ejSum, d, 0)], [], new Truncation { DefaultLevels = 3 }));
        var b = sweet.Single();
        double curvature = Math.Sqrt(8 * ec) * (-ejSum * (1 - d * d) * Math.PI * Math.PI) / (2 * Math.Sqrt(ejSum));
        Close(CoherenceFormulas.FluxSecondOrderRate(curvature, Inputs.FluxNoise, Inputs.InfraredCutoffHz, Inputs.MeasurementSeconds),
            Channel(b, "flux noise, 2nd order (q.flux)").RatePerSecond, 0.03, "second order");
        Assert.True(Channel(b, "flux noise, 1st order (q.flux)").RatePerSecond < 1e-3 * Channel(b, "flux noise, 2nd order (q.flux)").RatePerSecond);
    }

    /// <summary>Fluxonium: inductive loss with the element's own ⟨0|φ|1⟩ (single element, dressed = bare), Nguyen et al. 2019.</summary>
    [Fact]
    public void Fluxonium_inductive_loss_matches_its_formula()
    {
        var f = new Fluxonium("f", 1.0, 4.0, 0.9, 0.5);
        var (_, budgets) = Budget(new Device("f", [f], [], new Truncation { DefaultLevels = 4 }));
        var bare = f.Diagonalise(2);
        double phi2 = Math.Pow(Complex.Abs(bare.Operator("phi")[0, 1]), 2);
        double expected = CoherenceFormulas.InductiveRate(bare.Excitation(1), 0.9, Inputs.QInductive, phi2, Inputs.QubitTemperature);
        Close(expected, Channel(budgets.Single(), "inductive loss").RatePerSecond, 1e-6, "inductive");
    }

    /// <summary>
    /// Qubit on a resonator: the thermal-photon channel uses χ = (2χ)/2 with 2χ ≈ 2g²α/(Δ(Δ+α)) (Koch et al. 2007;
    /// Blais et al., RMP 93, 025005 (2021)), accurate to relative order (g/Δ)², checked at 3%; Purcell against κ(g/Δ)²
    /// (Houck et al., PRL 101, 080502 (2008)) at 3%.
    /// </summary>
    [Fact]
    public void Qubit_on_a_resonator_has_purcell_and_thermal_photon_channels()
    {
        double wq = 5.0, alpha = -0.25, wr = 7.0, g = 0.05, kappa = 0.002;
        var device = new Device("qr", [new KerrOscillator("q", wq, alpha), new Resonator("r", wr, Kappa: kappa)],
            [Coupler.Create("c", CouplerKind.Exchange, "q", "r", new CouplingStrength.Coefficient(g))], new Truncation { DefaultLevels = 6 });
        var (_, budgets) = Budget(device);
        var b = budgets.Single();
        double delta = wq - wr;
        double chi = g * g * alpha / (delta * (delta + alpha));
        double nth = 1 / (Math.Exp(wr * 6.62607015e-34 * 1e9 / (1.380649e-23 * Inputs.ResonatorTemperature)) - 1);
        double expected = 2 * Math.PI * 1e9 * kappa / 2 * (Complex.Sqrt(Complex.Pow(new Complex(1, 2 * chi / kappa), 2) + new Complex(0, 8 * chi * nth / kappa)).Real - 1);
        Close(expected, Channel(b, "thermal photons (r)").RatePerSecond, 0.03, "thermal photons");
        Close(2 * Math.PI * 1e9 * kappa * g * g / (delta * delta), Channel(b, "Purcell (r)").RatePerSecond, 0.03, "Purcell");
        Assert.Equal("Purcell (r)", b.DominantT1!.Name);
    }

    [Fact]
    public void Bad_inputs_are_refused_with_their_name()
    {
        var device = new Device("t", [new Transmon("q", 0.2, 10)], [], new Truncation { DefaultLevels = 3 });
        var solver = new DeviceSolver();
        var e = Assert.Throws<ArgumentException>(() => CoherenceEstimator.Estimate(solver, solver.Solve(device), new CoherenceInputs { QCapacitive = -1 }));
        Assert.Contains("q_cap", e.Message);
    }
}

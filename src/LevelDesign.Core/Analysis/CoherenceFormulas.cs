using System.Numerics;
using LevelDesign.Core.Units;

namespace LevelDesign.Core.Analysis;

/// <summary>
/// The published loss and dephasing formulas of the coherence budget, as pure functions. Frequencies and energies
/// are E/h in GHz, temperatures in kelvin; every rate returned is in 1/s (an inverse time, not divided by 2π).
/// </summary>
public static class CoherenceFormulas
{
    private const double TwoPi = 2 * Math.PI;

    /// <summary>1 + coth(hf/2k_BT): emission plus absorption by a bath at temperature T (2 at T = 0).</summary>
    public static double ThermalFactor(double frequencyGHz, double kelvin)
    {
        if (kelvin <= 0) return 2;
        double x = Math.Abs(frequencyGHz) / (2 * kelvin * PhysicalConstants.GigahertzPerKelvin);
        return 1 + 1 / Math.Tanh(x);
    }

    /// <summary>Bose–Einstein occupation n_th = 1/(exp(hf/k_BT) − 1).</summary>
    public static double ThermalOccupation(double frequencyGHz, double kelvin) =>
        kelvin <= 0 ? 0 : 1 / (Math.Exp(frequencyGHz / (kelvin * PhysicalConstants.GigahertzPerKelvin)) - 1);

    /// <summary>
    /// Dielectric (capacitive) loss Γ = (ħω²/(4E_C Q_cap))·|⟨0|φ|1⟩|²·(1 + coth(ħω/2k_BT)) (Nguyen et al., PRX 9, 041041 (2019)).
    /// With E_C and ω as E/h: ħω²/(4E_C) = 2π f²/(4 E_C).
    /// </summary>
    public static double DielectricRate(double f01GHz, double ecGHz, double qCap, double phi01Squared, double kelvin) =>
        TwoPi * f01GHz * f01GHz / (4 * ecGHz * qCap) * phi01Squared * ThermalFactor(f01GHz, kelvin) * 1e9;

    /// <summary>Inductive loss Γ = (2E_L/(ħQ_ind))·|⟨0|φ|1⟩|²·(1 + coth(ħω/2k_BT)) (Nguyen et al., PRX 9, 041041 (2019)).</summary>
    public static double InductiveRate(double f01GHz, double elGHz, double qInd, double phi01Squared, double kelvin) =>
        2 * TwoPi * elGHz / qInd * phi01Squared * ThermalFactor(f01GHz, kelvin) * 1e9;

    /// <summary>
    /// |⟨0|φ|1⟩|² from |⟨0|n|1⟩|² for H = 4E_C n² + V(φ): [H, φ] = −8iE_C n gives |φ01| = 8E_C|n01|/f01 (exact for the
    /// element alone; used for charge-basis elements, which carry no φ operator).
    /// </summary>
    public static double PhiSquaredFromCharge(double n01Squared, double ecGHz, double f01GHz) =>
        64 * ecGHz * ecGHz * n01Squared / (f01GHz * f01GHz);

    /// <summary>
    /// The flux variance of 1/f noise seen over a measurement: σ² = 2A²|ln(ω_ir t)| (A in Φ0), the factor in
    /// Ithier et al., PRB 72, 134519 (2005), for free-induction decay.
    /// </summary>
    public static double FluxVariance(double amplitude, double infraredCutoffHz, double measurementSeconds) =>
        2 * amplitude * amplitude * Math.Abs(Math.Log(TwoPi * infraredCutoffHz * measurementSeconds));

    /// <summary>First-order 1/f dephasing Γ_φ = √(2|ln ω_ir t|)·A·|∂ω01/∂Φ| (Ithier et al. 2005); slope in GHz/Φ0.</summary>
    public static double FluxFirstOrderRate(double slopeGHzPerFlux, double amplitude, double infraredCutoffHz, double measurementSeconds) =>
        Math.Sqrt(FluxVariance(amplitude, infraredCutoffHz, measurementSeconds)) * TwoPi * Math.Abs(slopeGHzPerFlux) * 1e9;

    /// <summary>
    /// Second-order 1/f dephasing at a sweet spot. With δω = ½ω''δΦ² and δΦ Gaussian of the variance σ² above
    /// (the quasi-static limit of Ithier et al. 2005), the coherence decays as (1 + (σ²ω''t)²)^(−1/4); the rate
    /// given is the inverse of its 1/e time, Γ = σ²|ω''|/√(e⁴ − 1) (derived here, not a quoted formula).
    /// </summary>
    public static double FluxSecondOrderRate(double curvatureGHzPerFlux2, double amplitude, double infraredCutoffHz, double measurementSeconds) =>
        FluxVariance(amplitude, infraredCutoffHz, measurementSeconds) * TwoPi * Math.Abs(curvatureGHzPerFlux2) * 1e9
        / Math.Sqrt(Math.Exp(4) - 1);

    /// <summary>
    /// 1/f charge-noise dephasing, worst case over offset charge: with E01(n_g) = const − (ε01/2)cos(2πn_g),
    /// max|∂E01/∂n_g| = π|ε01| and T2 = 2ħ/(A π |ε01|) with A in units of e (Koch et al., PRA 76, 042319 (2007),
    /// Sec. V), i.e. Γ = π²·A·|ε01| with ε01 as E/h.
    /// </summary>
    public static double ChargeRate(double dispersion01GHz, double amplitudeInE) =>
        Math.PI * Math.PI * amplitudeInE * Math.Abs(dispersion01GHz) * 1e9;

    /// <summary>
    /// Dephasing by thermal photons in a resonator, Γ_φ = (κ/2)·Re[√((1 + 2iχ/κ)² + 8iχn_th/κ) − 1]
    /// (Clerk &amp; Utami, PRA 75, 042302 (2007)); κ and χ as rate/2π in GHz (χ is half the dispersive shift 2χ).
    /// For χ ≪ κ it tends to 4χ²n_th(n_th + 1)/κ.
    /// </summary>
    public static double ThermalPhotonRate(double kappaGHz, double chiGHz, double nThermal)
    {
        if (kappaGHz <= 0) return 0;
        double ratio = chiGHz / kappaGHz;
        var root = Complex.Sqrt(new Complex(1, 2 * ratio) * new Complex(1, 2 * ratio) + new Complex(0, 8 * ratio * nThermal));
        return TwoPi * kappaGHz / 2 * (root.Real - 1) * 1e9;
    }
}

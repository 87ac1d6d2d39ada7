using LevelDesign.Core.Analysis;

namespace LevelDesign.Core.Tests.Physics;

/// <summary>
/// Each coherence formula at one hand-checked point. The expected numbers were evaluated separately with Python 3's
/// math/cmath (k_B and h typed in from SI 2019), written out in each comment, not by this code.
/// </summary>
public class CoherenceFormulaTests
{
    private static void Close(double expected, double actual, double relative = 1e-9) =>
        Assert.True(Math.Abs(actual / expected - 1) < relative, $"{actual} vs {expected}");

    /// <summary>Nguyen et al., PRX 9, 041041 (2019): 2π·5²/(4·0.2·1e6)·0.5·(1 + coth(h·5GHz/2k_B·20mK))·1e9 = 196350.7 /s.</summary>
    [Fact]
    public void Dielectric_loss_at_a_hand_checked_point() =>
        Close(196350.74955515435, CoherenceFormulas.DielectricRate(5.0, 0.2, 1e6, 0.5, 0.020));

    /// <summary>Nguyen et al. 2019: 2·2π·1/5e8·4·(1 + coth(h·0.5GHz/2k_B·20mK))·1e9 = 287.75 /s (thermal factor 2.862).</summary>
    [Fact]
    public void Inductive_loss_at_a_hand_checked_point() =>
        Close(287.7456583949837, CoherenceFormulas.InductiveRate(0.5, 1.0, 5e8, 4.0, 0.020));

    /// <summary>Ithier et al., PRB 72, 134519 (2005): √(2|ln(2π·1Hz·10µs)|)·2e-6·2π·2GHz = 110555.8 /s.</summary>
    [Fact]
    public void First_order_flux_noise_at_a_hand_checked_point() =>
        Close(110555.77430719843, CoherenceFormulas.FluxFirstOrderRate(2.0, 2e-6, 1, 10e-6));

    /// <summary>Quasi-static second order: 2·(2e-6)²·|ln(2π·1e-5)|·2π·30GHz/√(e⁴−1) = 1.99283 /s (derived, see the formula's comment).</summary>
    [Fact]
    public void Second_order_flux_noise_at_a_hand_checked_point() =>
        Close(1.9928258877459044, CoherenceFormulas.FluxSecondOrderRate(30.0, 2e-6, 1, 10e-6));

    /// <summary>Koch et al., PRA 76, 042319 (2007), Sec. V: π²·1e-4·1 kHz = 0.98696 /s.</summary>
    [Fact]
    public void Charge_noise_at_a_hand_checked_point() =>
        Close(0.9869604401089359, CoherenceFormulas.ChargeRate(1e-6, 1e-4));

    /// <summary>Clerk &amp; Utami, PRA 75, 042302 (2007): κ/2π = 1 MHz, χ/2π = 0.5 MHz, n_th = 0.01 → 31260.4 /s.</summary>
    [Fact]
    public void Thermal_photon_dephasing_at_a_hand_checked_point() =>
        Close(31260.39833542104, CoherenceFormulas.ThermalPhotonRate(0.001, 0.0005, 0.01));

    /// <summary>Bose–Einstein occupation of 7 GHz at 50 mK: 1/(exp(hf/k_BT) − 1) = 1.20928e-3.</summary>
    [Fact]
    public void Thermal_occupation_at_a_hand_checked_point() =>
        Close(0.0012092780440476848, CoherenceFormulas.ThermalOccupation(7.0, 0.050));

    /// <summary>
    /// Clerk &amp; Utami (2007): for χ ≪ κ the rate tends to 4χ²n_th(n_th + 1)/κ (expanding the root to second order in
    /// χ/κ), and for n_th ≪ 1 to 4χ²n_th/κ. The next terms are of relative order (χ/κ)² (here ≤ 1e-6; we allow 1e-4);
    /// dropping n_th² costs a relative n_th.
    /// </summary>
    [Theory]
    [InlineData(0.002, 2e-6, 1e-3)]
    [InlineData(0.0005, 1e-7, 1e-2)]
    public void Thermal_photon_dephasing_tends_to_the_weak_dispersive_limit(double kappa, double chi, double nth)
    {
        double rate = CoherenceFormulas.ThermalPhotonRate(kappa, chi, nth) / (2 * Math.PI * 1e9);
        double full = 4 * chi * chi * nth * (nth + 1) / kappa;
        Assert.True(Math.Abs(rate / full - 1) < 1e-4, $"{rate} vs 4χ²n(n+1)/κ {full}");
        Assert.True(Math.Abs(rate / (4 * chi * chi * nth / kappa) - 1) < 1.1 * nth, "4χ²n/κ for small n_th");
    }

    [Fact]
    public void Thermal_factor_is_two_at_zero_temperature_and_grows_with_it()
    {
        Assert.Equal(2, CoherenceFormulas.ThermalFactor(5, 0));
        Assert.True(CoherenceFormulas.ThermalFactor(0.2, 0.05) > CoherenceFormulas.ThermalFactor(0.2, 0.02));
    }
}

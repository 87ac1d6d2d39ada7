using LevelDesign.Core.Units;

namespace LevelDesign.Core.Tests.Units;

public class PhysicalConstantsTests
{
    [Fact]
    public void DefiningConstantsAreTheSi2019ExactValues()
    {
        // SI 2019 exact (defining constants of the revised SI).
        Assert.Equal(1.602176634e-19, PhysicalConstants.ElementaryCharge);
        Assert.Equal(6.62607015e-34, PhysicalConstants.Planck);
        Assert.Equal(1.380649e-23, PhysicalConstants.Boltzmann);
    }

    // Expected values: CODATA 2018 recommended values (digits from memory), which follow from the exact
    // SI 2019 e, h, k_B. CODATA prints such exact-derived values truncated ("2.067 833 848..."), so the
    // tolerance is one unit in the last quoted digit.
    [Theory]
    [InlineData("FluxQuantum", 2.067833848e-15, 1e-24)]           // Φ0 = h/(2e), CODATA 2018, from memory
    [InlineData("ReducedPlanck", 1.054571817e-34, 1e-43)]          // ħ, CODATA 2018, from memory
    [InlineData("VonKlitzing", 25812.80745, 1e-5)]                 // R_K = h/e² = 4·R_Q, CODATA 2018, from memory
    [InlineData("GigahertzPerElectronVolt", 241798.9242, 1e-4)]    // e/h = 2.417989242e14 Hz/eV, CODATA 2018, from memory
    [InlineData("GigahertzPerKelvin", 20.83661912, 1e-8)]          // k_B/h = 2.083661912e10 Hz/K, CODATA 2018, from memory
    public void DerivedConstantsMatchCodata2018(string name, double expected, double tolerance)
    {
        double actual = name switch
        {
            "FluxQuantum" => PhysicalConstants.FluxQuantum,
            "ReducedPlanck" => PhysicalConstants.ReducedPlanck,
            "VonKlitzing" => 4 * PhysicalConstants.ResistanceQuantum,
            "GigahertzPerElectronVolt" => PhysicalConstants.GigahertzPerElectronVolt,
            "GigahertzPerKelvin" => PhysicalConstants.GigahertzPerKelvin,
            _ => throw new ArgumentException(name),
        };
        Assert.Equal(expected, actual, tolerance);
    }

    [Fact]
    public void ReducedFluxQuantumIsFluxQuantumOverTwoPi()
    {
        // Identity Φ0/(2π) = ħ/(2e) (definitions), checked to double precision.
        double viaHbar = PhysicalConstants.ReducedPlanck / (2 * PhysicalConstants.ElementaryCharge);
        Assert.Equal(PhysicalConstants.ReducedFluxQuantum, viaHbar, viaHbar * 1e-15);
    }
}

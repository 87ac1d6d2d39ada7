using LevelDesign.Core.Analysis;
using LevelDesign.Core.Composite;
using LevelDesign.Core.Elements;
using LevelDesign.Core.Model;

namespace LevelDesign.Core.Tests.Physics;

public class FluxSensitivityTests
{
    /// <summary>
    /// dω/dΦ of a tunable transmon against the derivative of f01 ≈ sqrt(8E_CE_J(Φ)) − E_C with the asymmetric-SQUID
    /// E_J(Φ) (Koch et al., PRA 76, 042319 (2007)): df/dΦ ≈ sqrt(8E_C)·E_J'(Φ)/(2·sqrt(E_J(Φ))), where
    /// E_J'(Φ) = −π·E_JΣ²(1 − d²)·sin(2πΦ)/(2E_J(Φ)) is differentiated by hand here. The asymptotic form's relative
    /// error is of order sqrt(E_C/E_J) (our bound: 3% at E_J/E_C ≥ 100); at the sweet spot the slope vanishes.
    /// </summary>
    [Theory]
    [InlineData(0.1)]
    [InlineData(0.2)]
    [InlineData(0.3)]
    public void Slope_matches_derivative_of_asymptotic_frequency(double flux)
    {
        double ec = 0.2, ejSum = 60, d = 0.2;
        var device = new Device("q", [new TunableTransmon("q", ec, ejSum, d, flux)], [], new Truncation { DefaultLevels = 3 });
        double slope = FluxSensitivity.Slope(new DeviceSolver(), device, "q.flux", "q");
        double ej = ejSum * Math.Sqrt(Math.Pow(Math.Cos(Math.PI * flux), 2) + d * d * Math.Pow(Math.Sin(Math.PI * flux), 2));
        double ejPrime = -Math.PI * ejSum * ejSum * (1 - d * d) * Math.Sin(2 * Math.PI * flux) / (2 * ej);
        double expected = Math.Sqrt(8 * ec) * ejPrime / (2 * Math.Sqrt(ej));
        Assert.True(Math.Abs(slope / expected - 1) < 0.03, $"Φ={flux}: dω/dΦ {slope} vs asymptotic {expected} GHz/Φ0");
    }

    [Fact]
    public void Slope_vanishes_at_the_sweet_spot()
    {
        var device = new Device("q", [new TunableTransmon("q", 0.2, 60, 0.2, 0)], [], new Truncation { DefaultLevels = 3 });
        Assert.True(Math.Abs(FluxSensitivity.Slope(new DeviceSolver(), device, "q.flux", "q")) < 1e-6);
    }
}

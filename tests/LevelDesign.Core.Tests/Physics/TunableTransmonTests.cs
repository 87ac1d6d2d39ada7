using LevelDesign.Core.Elements;

namespace LevelDesign.Core.Tests.Physics;

public class TunableTransmonTests
{
    /// <summary>
    /// Two junctions in a loop: E_J(Φ) = sqrt(E_J1² + E_J2² + 2E_J1E_J2 cos(2πΦ/Φ0)) (textbook SQUID phasor sum),
    /// which must equal the E_JΣ·sqrt(cos² + d² sin²) form of Koch et al. 2007.
    /// </summary>
    [Theory]
    [InlineData(10.0, 10.0)]
    [InlineData(8.0, 14.0)]
    [InlineData(20.0, 3.0)]
    public void Squid_energy_matches_phasor_sum(double ej1, double ej2)
    {
        var (sum, d) = SquidJosephsonEnergy.FromJunctions(ej1, ej2);
        for (double flux = -0.6; flux <= 1.2; flux += 0.05)
        {
            double phasor = Math.Sqrt(ej1 * ej1 + ej2 * ej2 + 2 * ej1 * ej2 * Math.Cos(2 * Math.PI * flux));
            Assert.Equal(phasor, SquidJosephsonEnergy.At(sum, d, flux), 10);
        }
    }

    [Fact]
    public void Derivative_matches_finite_difference()
    {
        for (double flux = 0.05; flux < 0.5; flux += 0.07)
        {
            double h = 1e-6;
            double numeric = (SquidJosephsonEnergy.At(30, 0.3, flux + h) - SquidJosephsonEnergy.At(30, 0.3, flux - h)) / (2 * h);
            Assert.Equal(numeric, SquidJosephsonEnergy.Derivative(30, 0.3, flux), 5);
        }
    }

    /// <summary>
    /// f01(Φ) ≈ sqrt(8E_J(Φ)E_C) − E_C (Koch et al. 2007) where E_J(Φ)/E_C ≥ 20; bound E_C·sqrt(E_C/E_J) as for the fixed transmon.
    /// </summary>
    [Fact]
    public void Frequency_follows_asymptotic_formula_along_flux()
    {
        double ec = 0.22, ejSum = 40, d = 0.4;
        for (double flux = 0; flux <= 0.5; flux += 0.05)
        {
            double ej = SquidJosephsonEnergy.At(ejSum, d, flux);
            var e = new TunableTransmon("q", ec, ejSum, d, flux).Diagonalise(2).Energies;
            double bound = ec * Math.Sqrt(ec / ej);
            Assert.InRange(e[1] - e[0] - (Math.Sqrt(8 * ej * ec) - ec), -bound, bound);
        }
    }
}

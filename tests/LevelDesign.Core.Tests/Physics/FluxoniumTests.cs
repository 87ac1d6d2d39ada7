using LevelDesign.Core.Elements;
using LevelDesign.Core.Tests.Support;

namespace LevelDesign.Core.Tests.Physics;

public class FluxoniumTests
{
    /// <summary>
    /// Against an independent phase-grid (sinc DVR) solution: tests/reference/data/fluxonium_levels.csv,
    /// from tests/reference/fluxonium_grid.py (SciPy 1.10.1, NumPy 1.24.2), converged to 1e-8 GHz there.
    /// </summary>
    [Fact]
    public void Levels_match_phase_grid_reference()
    {
        var rows = ReferenceData.Rows("fluxonium_levels.csv");
        Assert.True(rows.Count >= 40);
        foreach (var group in rows.GroupBy(r => (r.Number("ec_ghz"), r.Number("ej_ghz"), r.Number("el_ghz"), r.Number("flux_phi0"))))
        {
            var (ec, ej, el, flux) = group.Key;
            int levels = group.Max(r => (int)r.Number("m")) + 1;
            var energies = new Fluxonium("f", ec, ej, el, flux).Diagonalise(levels).Energies;
            foreach (var row in group)
                Assert.True(Math.Abs(energies[(int)row.Number("m")] - row.Number("energy_ghz")) < 2e-8,
                    $"({ec},{ej},{el}) Φ={flux} m={row["m"]}: {energies[(int)row.Number("m")]} vs grid {row["energy_ghz"]}");
        }
    }

    /// <summary>With E_J = 0 the fluxonium is an LC oscillator of frequency sqrt(8E_LE_C) (textbook).</summary>
    [Theory]
    [InlineData(1.0, 1.0)]
    [InlineData(0.8, 0.4)]
    public void Without_junction_it_is_a_harmonic_oscillator(double ec, double el)
    {
        var e = new Fluxonium("f", ec, 0, el, 0.37).Diagonalise(6).Energies;
        double omega = Math.Sqrt(8 * el * ec);
        for (int k = 0; k < 6; k++) Assert.Equal(omega * (k + 0.5), e[k], 10);
    }

    /// <summary>The spectrum is periodic in Φ with period Φ0 and symmetric about Φ0/2 (symmetry of the Hamiltonian).</summary>
    [Theory]
    [InlineData(0.1)]
    [InlineData(0.23)]
    [InlineData(0.41)]
    public void Spectrum_is_periodic_and_symmetric_in_flux(double flux)
    {
        Fluxonium At(double f) => new("f", 1.0, 4.0, 1.0, f);
        var e = At(flux).Diagonalise(6).Energies;
        var shifted = At(flux + 1).Diagonalise(6).Energies;
        var mirrored = At(1 - flux).Diagonalise(6).Energies;
        for (int k = 0; k < 6; k++)
        {
            Assert.Equal(e[k], shifted[k], 9);
            Assert.Equal(e[k], mirrored[k], 9);
        }
    }
}

namespace LevelDesign.Core.Units;

/// <summary>
/// SI constants used by the circuit conversions. e, h and k_B are exact by definition
/// since the 2019 SI redefinition; the rest are derived here so they stay consistent with them.
/// </summary>
public static class PhysicalConstants
{
    /// <summary>Elementary charge e in coulombs (SI 2019, exact).</summary>
    public const double ElementaryCharge = 1.602176634e-19;

    /// <summary>Planck constant h in J·s (SI 2019, exact).</summary>
    public const double Planck = 6.62607015e-34;

    /// <summary>Boltzmann constant k_B in J/K (SI 2019, exact); kept for thermal estimates.</summary>
    public const double Boltzmann = 1.380649e-23;

    /// <summary>Reduced Planck constant ħ = h/(2π) in J·s.</summary>
    public const double ReducedPlanck = Planck / (2.0 * Math.PI);

    /// <summary>Superconducting flux quantum Φ0 = h/(2e) in webers.</summary>
    public const double FluxQuantum = Planck / (2.0 * ElementaryCharge);

    /// <summary>Reduced flux quantum Φ0/(2π) = ħ/(2e) in webers; the natural unit of phase·flux.</summary>
    public const double ReducedFluxQuantum = FluxQuantum / (2.0 * Math.PI);

    /// <summary>Superconducting resistance quantum R_Q = h/(4e²) in ohms (Cooper pairs carry 2e).</summary>
    public const double ResistanceQuantum = Planck / (4.0 * ElementaryCharge * ElementaryCharge);

    /// <summary>E/h for an energy of 1 eV, in GHz (= e/h / 1e9). Converts energies written in eV to our GHz scale.</summary>
    public const double GigahertzPerElectronVolt = ElementaryCharge / Planck / 1e9;

    /// <summary>E/h for an energy of 1 K·k_B, in GHz; lets temperatures be compared with level spacings.</summary>
    public const double GigahertzPerKelvin = Boltzmann / Planck / 1e9;
}

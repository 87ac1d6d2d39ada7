namespace LevelDesign.Core.Units;

/// <summary>
/// Converts circuit quantities (SI units) to energies E/h in GHz and back.
/// Every energy here is E/h in GHz, the scale used throughout LevelDesign.
/// </summary>
public static class CircuitConversions
{
    private const double HertzPerGigahertz = 1e9;

    /// <summary>e²/(2h) in Hz·F: E_C/h for a unit capacitance. Shared by the forward and inverse charging conversions.</summary>
    private const double ChargingHertzFarad =
        PhysicalConstants.ElementaryCharge * PhysicalConstants.ElementaryCharge / (2.0 * PhysicalConstants.Planck);

    /// <summary>(Φ0/2π)²/h in Hz·H: E_L/h for a unit inductance.</summary>
    private const double InductiveHertzHenry =
        PhysicalConstants.ReducedFluxQuantum * PhysicalConstants.ReducedFluxQuantum / PhysicalConstants.Planck;

    /// <summary>Charging energy E_C/h = e²/(2hC) in GHz for a total capacitance in farads.</summary>
    public static double ChargingEnergyGHz(double capacitanceFarad)
    {
        RequirePositive(capacitanceFarad, nameof(capacitanceFarad), "capacitance");
        return ChargingHertzFarad / capacitanceFarad / HertzPerGigahertz;
    }

    /// <summary>Total capacitance in farads whose charging energy E_C/h = e²/(2hC) is <paramref name="ecGHz"/>.</summary>
    public static double CapacitanceFromChargingEnergy(double ecGHz)
    {
        RequirePositive(ecGHz, nameof(ecGHz), "charging energy");
        return ChargingHertzFarad / (ecGHz * HertzPerGigahertz);
    }

    /// <summary>Josephson energy E_J/h = I_c Φ0/(2π h) = I_c/(4πe) in GHz for a critical current in amperes.</summary>
    public static double JosephsonEnergyFromCriticalCurrent(double icAmp)
    {
        RequireNonNegative(icAmp, nameof(icAmp), "critical current");
        return icAmp * PhysicalConstants.ReducedFluxQuantum / PhysicalConstants.Planck / HertzPerGigahertz;
    }

    /// <summary>Inductive energy E_L/h = (Φ0/2π)²/(hL) in GHz for an inductance in henries.</summary>
    public static double InductiveEnergyGHz(double inductanceHenry)
    {
        RequirePositive(inductanceHenry, nameof(inductanceHenry), "inductance");
        return InductiveHertzHenry / inductanceHenry / HertzPerGigahertz;
    }

    /// <summary>
    /// Josephson energy in GHz from the normal-state resistance, through the Ambegaokar–Baratoff
    /// relation I_c R_n = πΔ/(2e) at zero temperature. The default gap Δ = 180 µeV is the usual
    /// assumption for aluminium junctions (common practice, not a measured value for any device).
    /// </summary>
    public static double JosephsonEnergyFromNormalResistance(double rnOhm, double gapElectronVolt = 180e-6)
    {
        RequirePositive(rnOhm, nameof(rnOhm), "normal-state resistance");
        RequirePositive(gapElectronVolt, nameof(gapElectronVolt), "superconducting gap");
        // Δ in joules is gap[eV]·e, so πΔ/(2e R_n) = π·gap[eV]/(2 R_n): the charge cancels.
        double criticalCurrent = Math.PI * gapElectronVolt / (2.0 * rnOhm);
        return JosephsonEnergyFromCriticalCurrent(criticalCurrent);
    }

    /// <summary>
    /// Coefficient in GHz of n_i n_j (i ≠ j, each pair counted once) in H = 2e² nᵀC⁻¹n / h,
    /// i.e. 4e²(C⁻¹)_ij / h, for one off-diagonal entry of the inverse Maxwell matrix in 1/F.
    /// Its sign follows the entry; use <see cref="MaxwellCharging"/> to get entries from a full matrix.
    /// </summary>
    public static double CapacitiveCouplingGHz(double inverseCapacitanceEntryPerFarad)
    {
        if (!double.IsFinite(inverseCapacitanceEntryPerFarad))
            throw new ArgumentOutOfRangeException(nameof(inverseCapacitanceEntryPerFarad), "inverse-capacitance entry must be finite");
        // 4e²/h = 8 · e²/(2h).
        return 8.0 * ChargingHertzFarad * inverseCapacitanceEntryPerFarad / HertzPerGigahertz;
    }

    private static void RequirePositive(double value, string parameter, string what)
    {
        if (!double.IsFinite(value) || value <= 0)
            throw new ArgumentOutOfRangeException(parameter, value, $"{what} must be a positive finite number");
    }

    private static void RequireNonNegative(double value, string parameter, string what)
    {
        if (!double.IsFinite(value) || value < 0)
            throw new ArgumentOutOfRangeException(parameter, value, $"{what} must be a non-negative finite number");
    }
}

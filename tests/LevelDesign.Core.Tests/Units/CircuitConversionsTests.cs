using LevelDesign.Core.Units;

namespace LevelDesign.Core.Tests.Units;

public class CircuitConversionsTests
{
    // Reference numbers: docs BRIEF.md, derived from SI 2019 exact e and h; each is checked to half a unit
    // in its last quoted digit. (For comparison, exact rational arithmetic on SI 2019 e, h (π in double precision), done here with
    // Python's fractions module, gives 19.37022932 GHz·fF,
    // 0.4966835108 GHz/nA, 163.4615128 GHz·nH, 140.4339542 GHz·kΩ at Δ = 180 µeV.)

    [Fact]
    public void ChargingEnergyOf1fFIs19Point3702GHz()
    {
        // E_C/h = e²/(2hC) = 19.3702 GHz·fF / C (SI 2019 exact e, h)
        Assert.Equal(19.3702, CircuitConversions.ChargingEnergyGHz(1e-15), 0.5e-4);
        Assert.Equal(19.3702 / 80, CircuitConversions.ChargingEnergyGHz(80e-15), 0.5e-4 / 80);
    }

    [Fact]
    public void JosephsonEnergyOf1nAIs0Point496684GHz()
    {
        // E_J/h = I_c/(4πe) = 0.496684 GHz/nA × I_c (SI 2019 exact e)
        Assert.Equal(0.496684, CircuitConversions.JosephsonEnergyFromCriticalCurrent(1e-9), 0.5e-6);
        Assert.Equal(30 * 0.496684, CircuitConversions.JosephsonEnergyFromCriticalCurrent(30e-9), 30 * 0.5e-6);
    }

    [Fact]
    public void InductiveEnergyOf1nHIs163Point4615GHz()
    {
        // E_L/h = (Φ0/2π)²/(hL) = 163.4615 GHz·nH / L (SI 2019 exact e, h)
        Assert.Equal(163.4615, CircuitConversions.InductiveEnergyGHz(1e-9), 0.5e-4);
        Assert.Equal(163.4615 / 12, CircuitConversions.InductiveEnergyGHz(12e-9), 0.5e-4 / 12);
    }

    [Fact]
    public void AmbegaokarBaratoffWithAluminiumGapGives140Point4GHzPerKiloOhm()
    {
        // I_c R_n = πΔ/(2e) (Ambegaokar–Baratoff), Δ = 180 µeV (common practice for Al, no single source):
        // E_J/h ≈ 140.4 GHz·kΩ / R_n (BRIEF.md, from SI 2019 exact e).
        Assert.Equal(140.4, CircuitConversions.JosephsonEnergyFromNormalResistance(1000), 0.05);
        Assert.Equal(140.4 / 8.5, CircuitConversions.JosephsonEnergyFromNormalResistance(8500), 0.05 / 8.5);
    }

    [Fact]
    public void AmbegaokarBaratoffAgreesWithCriticalCurrentRoute()
    {
        // Same relation written out: I_c = πΔ/(2e R_n) with Δ = 200 µeV·e, then E_J from I_c.
        double rn = 7300;
        double gapEv = 200e-6;
        double ic = Math.PI * gapEv * PhysicalConstants.ElementaryCharge / (2 * PhysicalConstants.ElementaryCharge * rn);
        double expected = CircuitConversions.JosephsonEnergyFromCriticalCurrent(ic);
        Assert.Equal(expected, CircuitConversions.JosephsonEnergyFromNormalResistance(rn, gapEv), expected * 1e-14);
    }

    [Theory]
    [InlineData(0.2)]
    [InlineData(0.33)]
    [InlineData(1.5)]
    public void CapacitanceFromChargingEnergyInvertsChargingEnergy(double ecGHz)
    {
        double c = CircuitConversions.CapacitanceFromChargingEnergy(ecGHz);
        Assert.Equal(ecGHz, CircuitConversions.ChargingEnergyGHz(c), ecGHz * 1e-14);
    }

    [Fact]
    public void CapacitanceFromChargingEnergyMatchesReferenceNumber()
    {
        // 19.3702 GHz·fF / 0.25 GHz = 77.4809 fF (BRIEF.md number, SI 2019 exact e, h)
        Assert.Equal(77.4809e-15, CircuitConversions.CapacitanceFromChargingEnergy(0.25), 0.5e-19);
    }

    [Fact]
    public void CapacitiveCouplingIsEightTimesUnitChargingEnergyTimesEntry()
    {
        // 4e²/h per (1/F) = 8 × 19.3702 GHz·fF (BRIEF.md number): for (C⁻¹)_ij = 1/(1000 fF),
        // G = 8 × 19.3702 / 1000 GHz = 0.1549616 GHz.
        Assert.Equal(0.1549616, CircuitConversions.CapacitiveCouplingGHz(1.0 / 1000e-15), 8 * 0.5e-4 / 1000);
    }

    [Theory]
    [InlineData(0.0)]
    [InlineData(-1e-15)]
    [InlineData(double.NaN)]
    [InlineData(double.PositiveInfinity)]
    public void NonPositiveOrNonFiniteInputsAreRejected(double bad)
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => CircuitConversions.ChargingEnergyGHz(bad));
        Assert.Throws<ArgumentOutOfRangeException>(() => CircuitConversions.CapacitanceFromChargingEnergy(bad));
        Assert.Throws<ArgumentOutOfRangeException>(() => CircuitConversions.InductiveEnergyGHz(bad));
        Assert.Throws<ArgumentOutOfRangeException>(() => CircuitConversions.JosephsonEnergyFromNormalResistance(bad));
        Assert.Throws<ArgumentOutOfRangeException>(() => CircuitConversions.JosephsonEnergyFromNormalResistance(1000, bad));
    }

    [Fact]
    public void ZeroCriticalCurrentGivesZeroButNegativeIsRejected()
    {
        Assert.Equal(0.0, CircuitConversions.JosephsonEnergyFromCriticalCurrent(0));
        Assert.Throws<ArgumentOutOfRangeException>(() => CircuitConversions.JosephsonEnergyFromCriticalCurrent(-1e-9));
    }
}

using LevelDesign.Core.Units;

namespace LevelDesign.Core.Tests.Units;

public class MaxwellChargingTests
{
    private const double FemtoFarad = 1e-15;

    // e²/(2h·1 fF) in GHz from SI 2019 exact e and h (19.3702 in BRIEF.md; the full digits were computed
    // here with exact rational arithmetic in Python's fractions module).
    private const double ChargingGHzFemtoFarad = 19.370229324659128;

    [Fact]
    public void TwoNodesWithCouplingCapacitorWorkedByHand()
    {
        // Two islands, C1 = 80 fF and C2 = 90 fF to ground, Cg = 2 fF between them.
        // Maxwell matrix (diagonal = total, off-diagonal = −mutual):
        //   C = [[82, −2], [−2, 92]] fF,  det = 82·92 − (−2)(−2) = 7544 − 4 = 7540 fF².
        // 2×2 inverse = (1/det)·[[92, 2], [2, 82]]  →  (C⁻¹)_11 = 92/7540, (C⁻¹)_22 = 82/7540, (C⁻¹)_12 = 2/7540 per fF.
        // E_C,1 = 19.3702 · 92/7540 = 0.236348 GHz   (effective C = 7540/92 = 81.9565 fF)
        // E_C,2 = 19.3702 · 82/7540 = 0.210658 GHz   (effective C = 7540/82 = 91.9512 fF)
        // G_12  = 4e²(C⁻¹)_12/h = 8 · 19.3702 · 2/7540 = 0.0411039 GHz  (coefficient of n1·n2)
        var matrix = new double[,] { { 82 * FemtoFarad, -2 * FemtoFarad }, { -2 * FemtoFarad, 92 * FemtoFarad } };
        var charging = MaxwellCharging.FromCapacitanceMatrix(matrix);

        Assert.Equal(2, charging.NodeCount);
        // Hand numbers above, half a unit in the last written digit.
        Assert.Equal(0.236348, charging.ChargingEnergyGHz(0), 0.5e-6);
        Assert.Equal(0.210658, charging.ChargingEnergyGHz(1), 0.5e-6);
        Assert.Equal(0.0411039, charging.CouplingGHz(0, 1), 0.5e-7);
        Assert.Equal(charging.CouplingGHz(0, 1), charging.CouplingGHz(1, 0));

        // The same hand formula with the full-precision prefactor, to double precision.
        Assert.Equal(ChargingGHzFemtoFarad * 92 / 7540, charging.ChargingEnergiesGHz[0], 1e-14);
        Assert.Equal(ChargingGHzFemtoFarad * 82 / 7540, charging.ChargingEnergiesGHz[1], 1e-14);
        Assert.Equal(8 * ChargingGHzFemtoFarad * 2 / 7540, charging.CouplingGHz(0, 1), 1e-14);
        Assert.Equal(2 / 7540.0 / FemtoFarad, charging.InverseCapacitance(0, 1), 1e-12 / FemtoFarad);
    }

    [Fact]
    public void SingleNodeReducesToChargingEnergy()
    {
        var charging = MaxwellCharging.FromCapacitanceMatrix(new double[,] { { 85 * FemtoFarad } });
        double expected = CircuitConversions.ChargingEnergyGHz(85 * FemtoFarad);
        Assert.Equal(expected, charging.ChargingEnergyGHz(0), expected * 1e-14);
    }

    [Fact]
    public void ThreeNodeInverseTimesMatrixIsIdentity()
    {
        // Invented three-island matrix (demo numbers, used only for the identity C·C⁻¹ = I).
        var c = new double[,]
        {
            { 95, -3, -0.5 },
            { -3, 110, -4 },
            { -0.5, -4, 70 },
        };
        for (int i = 0; i < 3; i++)
            for (int j = 0; j < 3; j++)
                c[i, j] *= FemtoFarad;
        var charging = MaxwellCharging.FromCapacitanceMatrix(c);
        for (int i = 0; i < 3; i++)
            for (int j = 0; j < 3; j++)
            {
                double sum = 0;
                for (int k = 0; k < 3; k++)
                    sum += c[i, k] * charging.InverseCapacitance(k, j);
                Assert.Equal(i == j ? 1.0 : 0.0, sum, 1e-13);
            }
        // Mutual capacitances with a minus sign give positive inverse entries, hence positive couplings.
        Assert.True(charging.CouplingGHz(0, 2) > 0);
    }

    [Fact]
    public void NotPositiveDefiniteIsRejectedWithClearMessage()
    {
        // Eigenvalues of [[1, 2], [2, 1]] are 3 and −1.
        var matrix = new double[,] { { 1 * FemtoFarad, 2 * FemtoFarad }, { 2 * FemtoFarad, 1 * FemtoFarad } };
        var ex = Assert.Throws<ArgumentException>(() => MaxwellCharging.FromCapacitanceMatrix(matrix));
        Assert.Contains("not positive definite", ex.Message);
    }

    [Fact]
    public void NegativeDiagonalIsRejected()
    {
        var matrix = new double[,] { { -80 * FemtoFarad } };
        var ex = Assert.Throws<ArgumentException>(() => MaxwellCharging.FromCapacitanceMatrix(matrix));
        Assert.Contains("not positive definite", ex.Message);
    }

    [Fact]
    public void AsymmetricMatrixIsRejected()
    {
        var matrix = new double[,] { { 82 * FemtoFarad, -2 * FemtoFarad }, { -3 * FemtoFarad, 92 * FemtoFarad } };
        var ex = Assert.Throws<ArgumentException>(() => MaxwellCharging.FromCapacitanceMatrix(matrix));
        Assert.Contains("symmetric", ex.Message);
    }

    [Fact]
    public void NonSquareOrNonFiniteMatrixIsRejected()
    {
        Assert.Throws<ArgumentException>(() => MaxwellCharging.FromCapacitanceMatrix(new double[2, 3]));
        Assert.Throws<ArgumentException>(() => MaxwellCharging.FromCapacitanceMatrix(new double[0, 0]));
        Assert.Throws<ArgumentException>(() => MaxwellCharging.FromCapacitanceMatrix(new double[,] { { double.NaN } }));
    }

    [Fact]
    public void CouplingOfANodeWithItselfIsRejected()
    {
        var charging = MaxwellCharging.FromCapacitanceMatrix(new double[,] { { 80e-15, 0 }, { 0, 90e-15 } });
        Assert.Throws<ArgumentException>(() => charging.CouplingGHz(1, 1));
        Assert.Equal(0.0, charging.CouplingGHz(0, 1));
    }
}

using MathNet.Numerics.LinearAlgebra;

namespace LevelDesign.Core.Units;

/// <summary>
/// Charging energies and charge–charge couplings from a Maxwell capacitance matrix C (farads):
/// diagonal = total capacitance of each node to everything, off-diagonal = minus the mutual capacitance.
/// With node charges counted in Cooper pairs n, H/h = 2e² nᵀC⁻¹n / h
///   = Σ_i 4 E_C,i n_i² + Σ_{i&lt;j} G_ij n_i n_j,
/// where E_C,i = e²(C⁻¹)_ii/(2h) and G_ij = 4e²(C⁻¹)_ij/h, all in GHz.
/// </summary>
public sealed class MaxwellCharging
{
    // Relative asymmetry tolerated before we call the matrix non-symmetric: field solvers
    // print a few digits and rounding breaks symmetry slightly; anything beyond this is a typo.
    private const double SymmetryTolerance = 1e-9;

    private readonly double[] _chargingGHz;
    private readonly double[,] _inverse;

    private MaxwellCharging(double[,] inverse)
    {
        _inverse = inverse;
        int n = inverse.GetLength(0);
        _chargingGHz = new double[n];
        for (int i = 0; i < n; i++)
            _chargingGHz[i] = CircuitConversions.ChargingEnergyGHz(1.0 / inverse[i, i]);
    }

    /// <summary>Number of nodes (rows of the matrix).</summary>
    public int NodeCount => _chargingGHz.Length;

    /// <summary>E_C,i/h = e²(C⁻¹)_ii/(2h) in GHz for each node (the coefficient of n_i² is 4 E_C,i).</summary>
    public IReadOnlyList<double> ChargingEnergiesGHz => _chargingGHz;

    /// <summary>E_C/h of one node in GHz.</summary>
    public double ChargingEnergyGHz(int node) => _chargingGHz[node];

    /// <summary>Coefficient in GHz of n_i n_j (pair counted once) in H/h: 4e²(C⁻¹)_ij/h. Symmetric in i, j.</summary>
    public double CouplingGHz(int i, int j)
    {
        if (i == j)
            throw new ArgumentException($"coupling needs two different nodes, got {i} twice; use ChargingEnergyGHz for a node's own term");
        return CircuitConversions.CapacitiveCouplingGHz(_inverse[i, j]);
    }

    /// <summary>Entry (C⁻¹)_ij of the inverse capacitance matrix in 1/F.</summary>
    public double InverseCapacitance(int i, int j) => _inverse[i, j];

    /// <summary>
    /// Inverts a symmetric positive-definite Maxwell matrix (farads, n×n).
    /// Throws <see cref="ArgumentException"/> if it is not square, not finite, not symmetric or not positive definite.
    /// </summary>
    public static MaxwellCharging FromCapacitanceMatrix(double[,] capacitanceFarad)
    {
        ArgumentNullException.ThrowIfNull(capacitanceFarad);
        int n = capacitanceFarad.GetLength(0);
        if (n == 0 || capacitanceFarad.GetLength(1) != n)
            throw new ArgumentException(
                $"capacitance matrix must be square and non-empty, got {n}×{capacitanceFarad.GetLength(1)}",
                nameof(capacitanceFarad));

        double largest = 0;
        foreach (double c in capacitanceFarad)
        {
            if (!double.IsFinite(c))
                throw new ArgumentException("capacitance matrix contains a non-finite entry", nameof(capacitanceFarad));
            largest = Math.Max(largest, Math.Abs(c));
        }

        for (int i = 0; i < n; i++)
            for (int j = i + 1; j < n; j++)
                if (Math.Abs(capacitanceFarad[i, j] - capacitanceFarad[j, i]) > SymmetryTolerance * largest)
                    throw new ArgumentException(
                        $"capacitance matrix must be symmetric, but C[{i},{j}] = {capacitanceFarad[i, j]:G6} F and C[{j},{i}] = {capacitanceFarad[j, i]:G6} F",
                        nameof(capacitanceFarad));

        // Cholesky both proves positive definiteness and gives a well-conditioned inverse.
        var matrix = Matrix<double>.Build.DenseOfArray(capacitanceFarad);
        MathNet.Numerics.LinearAlgebra.Factorization.Cholesky<double> cholesky;
        try
        {
            cholesky = matrix.Cholesky();
        }
        catch (ArgumentException)
        {
            throw new ArgumentException(
                "capacitance matrix is not positive definite: some combination of node charges would have zero or negative energy. " +
                "Check that each diagonal entry is the node's total capacitance and that mutual capacitances enter off the diagonal with a minus sign.",
                nameof(capacitanceFarad));
        }

        var inverse = cholesky.Solve(Matrix<double>.Build.DenseIdentity(n)).ToArray();
        // Symmetrize: the exact inverse is symmetric, so (C⁻¹)_ij and (C⁻¹)_ji must give the same coupling.
        for (int i = 0; i < n; i++)
            for (int j = i + 1; j < n; j++)
            {
                double mean = 0.5 * (inverse[i, j] + inverse[j, i]);
                inverse[i, j] = mean;
                inverse[j, i] = mean;
            }
        return new MaxwellCharging(inverse);
    }
}

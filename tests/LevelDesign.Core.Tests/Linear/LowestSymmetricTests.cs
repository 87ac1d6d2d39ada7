using LevelDesign.Core.Linear;
using MathNet.Numerics.LinearAlgebra;

namespace LevelDesign.Core.Tests.Linear;

/// <summary>
/// Householder reduction + tridiagonal eigenpairs against MathNet.Numerics 5.0.0's dense symmetric EVD (not written
/// here), and against matrices built with a known spectrum (Q diag(λ) Qᵀ, exact up to rounding).
/// </summary>
public sealed class LowestSymmetricTests
{
    private static double[] RandomSymmetric(int n, int seed, double diagonalStep)
    {
        var random = new Random(seed);
        var m = new double[n * n];
        for (int i = 0; i < n; i++)
            for (int j = 0; j <= i; j++)
            {
                double v = i == j ? diagonalStep * i + random.NextDouble() : 0.3 * (random.NextDouble() - 0.5);
                m[i * n + j] = m[j * n + i] = v;
            }
        return m;
    }

    private static void AssertEigenpairs(double[] m, int n, int count, double[] expectedValues)
    {
        var (values, vectors) = LowestSymmetric.Solve(m, n, count);
        var a = Matrix<double>.Build.DenseOfColumnMajor(n, n, m);
        for (int k = 0; k < count; k++)
        {
            Assert.True(Math.Abs(values[k] - expectedValues[k]) < 1e-12 * Math.Max(1, Math.Abs(expectedValues[^1])),
                $"value {k}: {values[k]:R} vs {expectedValues[k]:R}");
            var x = Vector<double>.Build.DenseOfArray(vectors.AsSpan(k * n, n).ToArray());
            Assert.True((a * x - values[k] * x).L2Norm() < 1e-11 * a.L2Norm(), $"residual of {k}");
            for (int l = 0; l <= k; l++)
                Assert.Equal(k == l ? 1.0 : 0.0, x.DotProduct(Vector<double>.Build.DenseOfArray(vectors.AsSpan(l * n, n).ToArray())), 1e-11);
        }
    }

    [Theory]
    [InlineData(1, 1)]
    [InlineData(2, 2)]
    [InlineData(3, 2)]
    [InlineData(31, 31)]
    [InlineData(56, 31)]
    [InlineData(93, 31)]
    public void Matches_a_dense_solver(int n, int count)
    {
        var m = RandomSymmetric(n, seed: n, diagonalStep: 0.3);
        var reference = Matrix<double>.Build.DenseOfColumnMajor(n, n, m).Evd(Symmetricity.Symmetric).EigenValues
            .Select(z => z.Real).Order().ToArray();
        AssertEigenpairs(m, n, count, reference);
    }

    [Fact]
    public void Known_spectrum_with_repeated_and_close_eigenvalues()
    {
        // λ = {−1, −1, −1, 0.5, 0.5 + 1e-9, 2, 3, …}: an exact triple and a nearly degenerate pair, rotated by a random orthogonal Q
        const int n = 40;
        var lambda = new double[n];
        double[] head = [-1, -1, -1, 0.5, 0.5 + 1e-9];
        for (int i = 0; i < n; i++) lambda[i] = i < head.Length ? head[i] : i - 3;
        var random = new Random(11);
        var q = Matrix<double>.Build.Dense(n, n, (_, _) => random.NextDouble() - 0.5).QR().Q;
        var a = q * Matrix<double>.Build.DenseOfDiagonalArray(lambda) * q.Transpose();
        a = 0.5 * (a + a.Transpose());
        AssertEigenpairs(a.ToColumnMajorArray(), n, 12, lambda);
    }
}

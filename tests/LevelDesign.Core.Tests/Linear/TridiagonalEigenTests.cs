using LevelDesign.Core.Linear;
using MathNet.Numerics.LinearAlgebra;

namespace LevelDesign.Core.Tests.Linear;

/// <summary>
/// The tridiagonal solver against MathNet.Numerics 5.0.0's dense symmetric EVD (a library not written here) on
/// charge-basis transmon matrices across regimes, and against exact spectra (diagonal matrices; the free
/// particle-in-a-chain tridiagonal with eigenvalues 2cos(kπ/(n+1)), a textbook closed form).
/// </summary>
public sealed class TridiagonalEigenTests
{
    private static (double[] D, double[] E) Transmon(double ec, double ej, double ng, int nMax)
    {
        int n = 2 * nMax + 1;
        var d = Enumerable.Range(0, n).Select(i => 4 * ec * Math.Pow(i - nMax - ng, 2)).ToArray();
        var e = Enumerable.Repeat(-ej / 2, n - 1).ToArray();
        return (d, e);
    }

    private static Matrix<double> Dense(double[] d, double[] e)
    {
        var m = Matrix<double>.Build.Dense(d.Length, d.Length);
        for (int i = 0; i < d.Length; i++) m[i, i] = d[i];
        for (int i = 0; i < e.Length; i++) m[i, i + 1] = m[i + 1, i] = e[i];
        return m;
    }

    [Theory]
    [InlineData(0.2, 10.0, 0.0)]
    [InlineData(0.2, 50.0, 0.25)]
    [InlineData(0.18, 45.0, 0.5)]
    [InlineData(1.0, 1.0, 0.5)]     // charge regime at the degeneracy point
    [InlineData(1.0, 0.01, 0.0)]    // nearly diagonal: ±n pairs split by ~E_J^(2n)
    public void Transmon_charge_matrices_match_a_dense_solver(double ec, double ej, double ng)
    {
        var (d, e) = Transmon(ec, ej, ng, 20);
        const int count = 8;
        var (values, vectors) = TridiagonalEigen.Lowest(d, e, count);
        var dense = Dense(d, e);
        var reference = dense.Evd(Symmetricity.Symmetric).EigenValues
            .Select(z => z.Real).Order().Take(count).ToArray();
        double scale = d.Max();
        for (int k = 0; k < count; k++)
        {
            Assert.True(Math.Abs(values[k] - reference[k]) < 1e-12 * scale, $"value {k}: {values[k]:R} vs {reference[k]:R}");
            var x = Vector<double>.Build.Dense(vectors.AsSpan(k * d.Length, d.Length).ToArray());
            Assert.True((dense * x - values[k] * x).L2Norm() < 1e-10 * scale, $"residual of {k}");
            for (int l = 0; l <= k; l++)
            {
                var y = Vector<double>.Build.Dense(vectors.AsSpan(l * d.Length, d.Length).ToArray());
                Assert.Equal(k == l ? 1.0 : 0.0, x.DotProduct(y), 1e-10);
            }
        }
    }

    [Fact]
    public void Exact_spectra_diagonal_with_repeats_and_the_uniform_chain()
    {
        // diagonal with repeated entries: values sorted, vectors orthonormal unit vectors
        var (values, vectors) = TridiagonalEigen.Lowest([3.0, 1.0, 1.0, 2.0], [0.0, 0.0, 0.0], 3);
        double[] expected = [1.0, 1.0, 2.0];
        for (int k = 0; k < 3; k++) Assert.Equal(expected[k], values[k], 1e-15);
        double overlap = 0;
        for (int i = 0; i < 4; i++) overlap += vectors[i] * vectors[4 + i];
        Assert.Equal(0.0, overlap, 1e-12);

        // d = 0, e = 1: eigenvalues 2cos(kπ/(n+1)), k = 1..n
        const int n = 30;
        var (chain, _) = TridiagonalEigen.Lowest(new double[n], Enumerable.Repeat(1.0, n - 1).ToArray(), 5);
        var exact = Enumerable.Range(1, n).Select(k => 2 * Math.Cos(k * Math.PI / (n + 1))).Order().Take(5).ToArray();
        for (int k = 0; k < 5; k++) Assert.Equal(exact[k], chain[k], 1e-13);
    }

    /// <summary>The bisection fallback (used only if the QL iteration fails) against the same dense solver.</summary>
    [Theory]
    [InlineData(0.2, 50.0, 0.25)]
    [InlineData(1.0, 0.01, 0.0)]
    public void Bisection_fallback_matches_a_dense_solver(double ec, double ej, double ng)
    {
        var (d, e) = Transmon(ec, ej, ng, 20);
        var values = TridiagonalEigen.LowestByBisection(d, e, 8);
        var reference = Dense(d, e).Evd(Symmetricity.Symmetric).EigenValues.Select(z => z.Real).Order().Take(8).ToArray();
        for (int k = 0; k < 8; k++) Assert.True(Math.Abs(values[k] - reference[k]) < 1e-12 * d.Max(), $"value {k}: {values[k]:R} vs {reference[k]:R}");
    }
}

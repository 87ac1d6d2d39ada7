using System.Numerics;
using LevelDesign.Core.Eigen;
using Xunit.Abstractions;

namespace LevelDesign.Core.Tests.Eigen;

public sealed class ComplexHermitianTests(ITestOutputHelper output)
{
    private const double Eps = 2.220446049250313e-16;

    private IEigenSolver Solver(string key)
    {
        IEigenSolver solver = Backends.Get(key);
        output.WriteLine($"backend: {solver.Name}");
        return solver;
    }

    /// <summary>Hermitian circulant C_ij = c_((j−i) mod n) from a first row with c_(n−j) = conj(c_j).</summary>
    private static (Complex[] Matrix, Complex[] Row) HermitianCirculant(int n)
    {
        var random = new Random(21);
        var row = new Complex[n];
        row[0] = 2 * random.NextDouble() - 1;
        for (int j = 1; j <= n / 2; j++)
        {
            row[j] = new Complex(2 * random.NextDouble() - 1, 2 * random.NextDouble() - 1);
            row[n - j] = Complex.Conjugate(row[j]);
        }
        if (n % 2 == 0) row[n / 2] = row[n / 2].Real;

        var c = new Complex[n * n];
        for (int j = 0; j < n; j++)
            for (int i = 0; i < n; i++) c[j * n + i] = row[((j - i) % n + n) % n];
        return (c, row);
    }

    [Theory]
    [MemberData(nameof(Backends.Available), MemberType = typeof(Backends))]
    public void HermitianCirculantHasTheDftOfItsRowAsSpectrum(string backend)
    {
        // Textbook exact result: a circulant matrix is diagonalised by the Fourier vectors f_k(j) = ω^(jk),
        // ω = e^(2πi/n), with eigenvalue λ_k = Σ_j c_j ω^(jk); Hermitian symmetry of the row makes λ_k real.
        IEigenSolver solver = Solver(backend);
        const int n = 9;
        (Complex[] c, Complex[] row) = HermitianCirculant(n);

        var exact = new (double Value, int K)[n];
        for (int k = 0; k < n; k++)
        {
            Complex sum = 0;
            for (int j = 0; j < n; j++) sum += row[j] * Complex.FromPolarCoordinates(1, 2 * Math.PI * j * k / n);
            Assert.True(Math.Abs(sum.Imaginary) < 1e-13, "row is Hermitian, so the DFT must be real");
            exact[k] = (sum.Real, k);
        }
        Array.Sort(exact);
        double minGap = Enumerable.Range(1, n - 1).Min(k => exact[k].Value - exact[k - 1].Value);
        Assert.True(minGap > 1e-3, $"fixture must have a non-degenerate spectrum to compare vectors (gap {minGap})");

        ComplexEigenResult r = solver.LowestComplex(c, n, n);
        EigenAssert.Ascending(r.Values);
        for (int k = 0; k < n; k++)
        {
            Assert.True(Math.Abs(r.Values[k] - exact[k].Value) <= 1e-12, $"k={k}: {r.Values[k]:R} vs DFT {exact[k].Value:R}");
            Complex overlap = 0;
            for (int j = 0; j < n; j++)
                overlap += Complex.Conjugate(Complex.FromPolarCoordinates(1 / Math.Sqrt(n), 2 * Math.PI * j * exact[k].K / n)) * r.Component(j, k);
            Assert.True(Math.Abs(overlap.Magnitude - 1) <= 1e-10, $"k={k}: |overlap with Fourier vector| = {overlap.Magnitude:R}");
        }
        EigenAssert.PhaseConvention(r);
    }

    [Theory]
    [MemberData(nameof(Backends.Available), MemberType = typeof(Backends))]
    public void RandomHermitianSatisfiesEigenIdentities(string backend)
    {
        IEigenSolver solver = Solver(backend);
        const int n = 50;
        Complex[] h = MatrixFixtures.RandomHermitian(n, seed: 13);
        double normBound = n * MatrixFixtures.MaxAbs(h);

        foreach (int count in new[] { 10, n })
        {
            ComplexEigenResult r = solver.LowestComplex(h, n, count);
            EigenAssert.Ascending(r.Values);
            EigenAssert.Residual(h, r, tolerance: 10 * n * Eps * normBound);
            EigenAssert.Orthonormal(r, tolerance: 100 * n * Eps);
            EigenAssert.PhaseConvention(r);
        }
    }

    [Theory]
    [MemberData(nameof(Backends.Available), MemberType = typeof(Backends))]
    public void RealMatrixGivesTheSameAnswerThroughEitherEntryPoint(string backend)
    {
        IEigenSolver solver = Solver(backend);
        const int n = 30;
        double[] h = MatrixFixtures.RandomSymmetric(n, seed: 17);
        RealEigenResult real = solver.LowestReal(h, n, 6);
        ComplexEigenResult complex = solver.LowestComplex(h.Select(x => new Complex(x, 0)).ToArray(), n, 6);
        for (int k = 0; k < 6; k++)
        {
            Assert.Equal(real.Values[k], complex.Values[k], 1e-12);
            // Same phase convention, so a real eigenvector must come back as itself with zero imaginary part.
            for (int i = 0; i < n; i++)
                Assert.True((complex.Component(i, k) - real.Component(i, k)).Magnitude <= 1e-10, $"vector {k}, component {i}");
        }
    }

    [Theory]
    [MemberData(nameof(Backends.Available), MemberType = typeof(Backends))]
    public void InputIsNotModifiedAndOnlyTheLowerTriangleIsRead(string backend)
    {
        IEigenSolver solver = Solver(backend);
        const int n = 12;
        Complex[] h = MatrixFixtures.RandomHermitian(n, seed: 4);
        Complex[] lowerOnly = (Complex[])h.Clone();
        for (int j = 0; j < n; j++)
            for (int i = 0; i < j; i++) lowerOnly[j * n + i] = new Complex(500, -700);
        Complex[] snapshot = (Complex[])lowerOnly.Clone();

        ComplexEigenResult expected = solver.LowestComplex(h, n, 4);
        ComplexEigenResult actual = solver.LowestComplex(lowerOnly, n, 4);
        Assert.Equal(snapshot, lowerOnly);
        for (int k = 0; k < 4; k++) Assert.Equal(expected.Values[k], actual.Values[k], 1e-13);
        for (int i = 0; i < n * 4; i++) Assert.True((expected.Vectors[i] - actual.Vectors[i]).Magnitude <= 1e-12);
    }
}

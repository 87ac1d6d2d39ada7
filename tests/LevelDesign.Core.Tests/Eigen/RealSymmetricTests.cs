using LevelDesign.Core.Eigen;
using Xunit.Abstractions;

namespace LevelDesign.Core.Tests.Eigen;

public sealed class RealSymmetricTests(ITestOutputHelper output)
{
    private const double Eps = 2.220446049250313e-16;

    private IEigenSolver Solver(string key)
    {
        IEigenSolver solver = Backends.Get(key);
        output.WriteLine($"backend: {solver.Name}");
        return solver;
    }

    [Theory]
    [MemberData(nameof(Backends.Available), MemberType = typeof(Backends))]
    public void SecondDifferenceMatrixHasTheExactSpectrum(string backend)
    {
        // Textbook exact result: tridiag(−1, 2, −1) of order n has eigenvalues 2 − 2cos(kπ/(n+1))
        // and eigenvectors with components sin(jkπ/(n+1)), j, k = 1..n.
        IEigenSolver solver = Solver(backend);
        const int n = 50;
        double[] h = MatrixFixtures.SecondDifference(n);

        foreach (int count in new[] { 1, 10, n })
        {
            RealEigenResult r = solver.LowestReal(h, n, count);
            Assert.Equal(count, r.Count);
            Assert.Equal(n * count, r.Vectors.Length);
            for (int k = 1; k <= count; k++)
            {
                double exact = 2 - 2 * Math.Cos(k * Math.PI / (n + 1));
                // ‖H‖ ≤ 4, so a backward-stable solver is within a small multiple of n·ε·4 of it.
                Assert.True(Math.Abs(r.Values[k - 1] - exact) <= 1e-12, $"k={k}: {r.Values[k - 1]:R} vs exact {exact:R}");

                double norm = Math.Sqrt((n + 1) / 2.0);
                double overlap = 0;
                for (int j = 1; j <= n; j++) overlap += Math.Sin(j * k * Math.PI / (n + 1)) / norm * r.Component(j - 1, k - 1);
                // Lowest gaps are ~π²/(n+1)² ≈ 4e-3, so vector error ε‖H‖/gap stays far below 1e-10.
                Assert.True(Math.Abs(Math.Abs(overlap) - 1) <= 1e-10, $"k={k}: |overlap with exact vector| = {Math.Abs(overlap):R}");
            }
            EigenAssert.Ascending(r.Values);
            // These vectors are symmetric or antisymmetric about the centre, so the largest magnitude is always
            // tied; the convention must pick the first of the pair.
            EigenAssert.PhaseConvention(r);
        }
    }

    [Theory]
    [MemberData(nameof(Backends.Available), MemberType = typeof(Backends))]
    public void RandomMatrixSatisfiesEigenIdentities(string backend)
    {
        IEigenSolver solver = Solver(backend);
        const int n = 60;
        double[] h = MatrixFixtures.RandomSymmetric(n, seed: 11);
        double normBound = n * MatrixFixtures.MaxAbs(h);

        foreach (int count in new[] { 12, n })
        {
            RealEigenResult r = solver.LowestReal(h, n, count);
            EigenAssert.Ascending(r.Values);
            EigenAssert.Residual(h, null, r, tolerance: 10 * n * Eps * normBound);
            EigenAssert.Orthonormal(null, r, tolerance: 100 * n * Eps);
            EigenAssert.PhaseConvention(r);
        }
    }

    [Theory]
    [MemberData(nameof(Backends.Available), MemberType = typeof(Backends))]
    public void LowestSubsetEqualsHeadOfFullSpectrum(string backend)
    {
        IEigenSolver solver = Solver(backend);
        const int n = 40;
        double[] h = MatrixFixtures.RandomSymmetric(n, seed: 5);
        RealEigenResult full = solver.LowestReal(h, n, n);
        RealEigenResult lowest = solver.LowestReal(h, n, 7);
        double scale = MatrixFixtures.MaxAbs(h) * n;
        for (int k = 0; k < 7; k++)
        {
            Assert.True(Math.Abs(full.Values[k] - lowest.Values[k]) <= 100 * n * Eps * scale, $"eigenvalue {k}");
            for (int i = 0; i < n; i++)
                // The phase convention makes the two vectors comparable component by component.
                Assert.True(Math.Abs(full.Component(i, k) - lowest.Component(i, k)) <= 1e-9, $"vector {k}, component {i}");
        }
    }

    [Theory]
    [MemberData(nameof(Backends.Available), MemberType = typeof(Backends))]
    public void OnlyTheLowerTriangleIsRead(string backend)
    {
        IEigenSolver solver = Solver(backend);
        const int n = 20;
        double[] h = MatrixFixtures.RandomSymmetric(n, seed: 3);
        double[] lowerOnly = (double[])h.Clone();
        var junk = new Random(99);
        for (int j = 0; j < n; j++)
            for (int i = 0; i < j; i++) lowerOnly[j * n + i] = 1e3 * junk.NextDouble();

        RealEigenResult expected = solver.LowestReal(h, n, 5);
        RealEigenResult actual = solver.LowestReal(lowerOnly, n, 5);
        for (int k = 0; k < 5; k++) Assert.Equal(expected.Values[k], actual.Values[k], 1e-13);
        for (int i = 0; i < n * 5; i++) Assert.Equal(expected.Vectors[i], actual.Vectors[i], 1e-12);
    }

    [Theory]
    [MemberData(nameof(Backends.Available), MemberType = typeof(Backends))]
    public void InputIsNotModified(string backend)
    {
        IEigenSolver solver = Solver(backend);
        const int n = 15;
        double[] h = MatrixFixtures.RandomSymmetric(n, seed: 8);
        double[] copy = (double[])h.Clone();
        solver.LowestReal(h, n, 4);
        Assert.Equal(copy, h);
    }

    [Theory]
    [MemberData(nameof(Backends.Available), MemberType = typeof(Backends))]
    public void RejectsBadArguments(string backend)
    {
        IEigenSolver solver = Solver(backend);
        double[] h = MatrixFixtures.SecondDifference(4);
        Assert.Throws<ArgumentOutOfRangeException>(() => solver.LowestReal(h, 4, 5));
        Assert.Throws<ArgumentOutOfRangeException>(() => solver.LowestReal(h, 4, -1));
        Assert.Throws<ArgumentException>(() => solver.LowestReal(h, 3, 1));
        double[] withNaN = (double[])h.Clone();
        withNaN[1] = double.NaN;
        Assert.Throws<ArgumentException>(() => solver.LowestReal(withNaN, 4, 1));

        RealEigenResult none = solver.LowestReal(h, 4, 0);
        Assert.Empty(none.Values);
        Assert.Empty(none.Vectors);
    }
}

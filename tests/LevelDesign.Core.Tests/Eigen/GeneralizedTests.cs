using LevelDesign.Core.Eigen;
using Xunit.Abstractions;

namespace LevelDesign.Core.Tests.Eigen;

public sealed class GeneralizedTests(ITestOutputHelper output)
{
    private const double Eps = 2.220446049250313e-16;

    private IEigenSolver Solver(string key)
    {
        IEigenSolver solver = Backends.Get(key);
        output.WriteLine($"backend: {solver.Name}");
        return solver;
    }

    public static TheoryData<string, double, double, double, double, double, double> TwoByTwoCases()
    {
        var data = new TheoryData<string, double, double, double, double, double, double>();
        foreach (string backend in Backends.Available)
        {
            // (h11, h12, h22, s11, s12, s22): a strongly non-orthogonal pair, a weakly coupled one, one with negative energies.
            data.Add(backend, 1.0, 0.3, 2.5, 1.0, 0.4, 1.0);
            data.Add(backend, 5.0, -0.01, 5.2, 2.0, 0.05, 0.7);
            data.Add(backend, -3.0, 1.2, -1.0, 1.5, -0.6, 2.0);
        }
        return data;
    }

    [Theory]
    [MemberData(nameof(TwoByTwoCases))]
    public void TwoByTwoMatchesTheSecularDeterminant(string backend, double h11, double h12, double h22, double s11, double s12, double s22)
    {
        IEigenSolver solver = Solver(backend);
        double[] h = [h11, h12, h12, h22];
        double[] s = [s11, s12, s12, s22];

        // det(H − E S) = a E² + b E + c = 0 (textbook linear-variation result).
        double a = s11 * s22 - s12 * s12;
        double b = -(h11 * s22 + h22 * s11 - 2 * h12 * s12);
        double c = h11 * h22 - h12 * h12;
        double root = Math.Sqrt(b * b - 4 * a * c);
        // Cancellation-free pair of roots: q = −(b + sign(b)·√disc)/2, E = q/a and c/q.
        double q = -0.5 * (b + Math.CopySign(root, b));
        double e1 = q / a, e2 = c / q;
        double lower = Math.Min(e1, e2), upper = Math.Max(e1, e2);

        RealEigenResult r = solver.LowestGeneralizedReal(h, s, 2, 2);
        double scale = Math.Max(Math.Abs(lower), Math.Abs(upper));
        Assert.True(Math.Abs(r.Values[0] - lower) <= 1e-12 * scale, $"lower {r.Values[0]:R} vs closed form {lower:R}");
        Assert.True(Math.Abs(r.Values[1] - upper) <= 1e-12 * scale, $"upper {r.Values[1]:R} vs closed form {upper:R}");
        EigenAssert.Residual(h, s, r, tolerance: 1e-12 * scale);
        EigenAssert.Orthonormal(s, r, tolerance: 1e-13);
        EigenAssert.PhaseConvention(r);

        RealEigenResult lowestOnly = solver.LowestGeneralizedReal(h, s, 2, 1);
        Assert.Equal(r.Values[0], lowestOnly.Values[0], 1e-13);
    }

    [Theory]
    [MemberData(nameof(Backends.Available), MemberType = typeof(Backends))]
    public void RandomProblemSatisfiesGeneralizedIdentities(string backend)
    {
        IEigenSolver solver = Solver(backend);
        const int n = 40;
        double[] h = MatrixFixtures.RandomSymmetric(n, seed: 23);
        double[] s = MatrixFixtures.RandomPositiveDefinite(n, seed: 29);
        // S ≥ I keeps ‖C‖ ≤ 1 and |E| ≤ ‖H‖, so the residual H C − S C Λ is bounded by ~n·ε·‖H‖(1 + ‖S‖),
        // with each norm bounded by n·max|entry|.
        double normBound = n * MatrixFixtures.MaxAbs(h) + n * MatrixFixtures.MaxAbs(s) * n * MatrixFixtures.MaxAbs(h);

        foreach (int count in new[] { 8, n })
        {
            RealEigenResult r = solver.LowestGeneralizedReal(h, s, n, count);
            EigenAssert.Ascending(r.Values);
            EigenAssert.Residual(h, s, r, tolerance: 10 * n * Eps * normBound);
            EigenAssert.Orthonormal(s, r, tolerance: 1000 * n * Eps);
            EigenAssert.PhaseConvention(r);
        }
    }

    [Theory]
    [MemberData(nameof(Backends.Available), MemberType = typeof(Backends))]
    public void IdentityOverlapReducesToTheStandardProblem(string backend)
    {
        IEigenSolver solver = Solver(backend);
        const int n = 25;
        double[] h = MatrixFixtures.RandomSymmetric(n, seed: 31);
        var identity = new double[n * n];
        for (int i = 0; i < n; i++) identity[i * n + i] = 1;

        RealEigenResult standard = solver.LowestReal(h, n, 5);
        RealEigenResult generalized = solver.LowestGeneralizedReal(h, identity, n, 5);
        for (int k = 0; k < 5; k++) Assert.Equal(standard.Values[k], generalized.Values[k], 1e-12);
        for (int i = 0; i < n * 5; i++) Assert.Equal(standard.Vectors[i], generalized.Vectors[i], 1e-10);
    }

    public static TheoryData<string, int> NotPositiveDefiniteCases()
    {
        var data = new TheoryData<string, int>();
        foreach (string backend in Backends.Available)
            for (int c = 0; c < 4; c++) data.Add(backend, c);
        return data;
    }

    private static double[] BadOverlap(int which) => which switch
    {
        0 => [1, 2, 2, 1],                              // indefinite: eigenvalues 3 and −1
        1 => [1, 0, 0, 0],                              // singular
        2 => [-1, 0, 0, 2],                             // negative first pivot
        _ => [2, 1, 1, 1, 2, 1, 1, 1, -4],              // leading 2×2 fine, full 3×3 indefinite
    };

    [Theory]
    [MemberData(nameof(NotPositiveDefiniteCases))]
    public void NonPositiveDefiniteOverlapThrows(string backend, int which)
    {
        IEigenSolver solver = Solver(backend);
        double[] s = BadOverlap(which);
        int n = (int)Math.Sqrt(s.Length);
        double[] h = MatrixFixtures.SecondDifference(n);
        var e = Assert.Throws<NotPositiveDefiniteException>(() => solver.LowestGeneralizedReal(h, s, n, 1));
        Assert.Contains("not positive definite", e.Message);
        // Even when no eigenpairs are asked for, a bad overlap is an error rather than an empty answer.
        Assert.Throws<NotPositiveDefiniteException>(() => solver.LowestGeneralizedReal(h, s, n, 0));
    }

    [Theory]
    [MemberData(nameof(Backends.Available), MemberType = typeof(Backends))]
    public void InputsAreNotModified(string backend)
    {
        IEigenSolver solver = Solver(backend);
        const int n = 10;
        double[] h = MatrixFixtures.RandomSymmetric(n, seed: 2);
        double[] s = MatrixFixtures.RandomPositiveDefinite(n, seed: 6);
        double[] hCopy = (double[])h.Clone(), sCopy = (double[])s.Clone();
        solver.LowestGeneralizedReal(h, s, n, 3);
        Assert.Equal(hCopy, h);
        Assert.Equal(sCopy, s);
    }
}

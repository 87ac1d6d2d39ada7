using System.Numerics;
using LevelDesign.Core.Eigen;
using Xunit.Abstractions;

namespace LevelDesign.Core.Tests.Eigen;

/// <summary>Native and managed must agree; these are skipped, with the reason shown, when native is unavailable.</summary>
public sealed class BackendAgreementTests(ITestOutputHelper output)
{
    private (IEigenSolver Native, IEigenSolver Managed) Pair()
    {
        IEigenSolver native = EigenSolvers.Native!;
        output.WriteLine($"comparing {native.Name} with {EigenSolvers.Managed.Name}");
        return (native, EigenSolvers.Managed);
    }

    private static void AssertSeparated(double[] values)
    {
        // Vectors are only comparable for a non-degenerate spectrum; the fixtures must provide one.
        for (int k = 1; k < values.Length; k++)
            Assert.True(values[k] - values[k - 1] > 1e-4, $"fixture spectrum nearly degenerate at {k}");
    }

    private static void AssertValuesAgree(double[] a, double[] b)
    {
        Assert.Equal(a.Length, b.Length);
        double scale = Math.Max(a.Max(Math.Abs), 1.0);
        for (int k = 0; k < a.Length; k++)
            Assert.True(Math.Abs(a[k] - b[k]) <= 1e-10 * scale, $"eigenvalue {k}: {a[k]:R} vs {b[k]:R}");
    }

    [NativeFact]
    public void RealSymmetricResultsAgree()
    {
        (IEigenSolver native, IEigenSolver managed) = Pair();
        const int n = 80;
        double[] h = MatrixFixtures.RandomSymmetric(n, seed: 41);
        RealEigenResult a = native.LowestReal(h, n, 15), b = managed.LowestReal(h, n, 15);
        AssertSeparated(a.Values);
        AssertValuesAgree(a.Values, b.Values);
        // Same phase convention on both sides; the spectrum gaps (> 1e-4) bound the vector difference near ε‖H‖/gap.
        for (int i = 0; i < a.Vectors.Length; i++)
            Assert.True(Math.Abs(a.Vectors[i] - b.Vectors[i]) <= 1e-9, $"vector entry {i}: {a.Vectors[i]:R} vs {b.Vectors[i]:R}");
    }

    [NativeFact]
    public void ComplexHermitianResultsAgree()
    {
        (IEigenSolver native, IEigenSolver managed) = Pair();
        const int n = 60;
        Complex[] h = MatrixFixtures.RandomHermitian(n, seed: 43);
        ComplexEigenResult a = native.LowestComplex(h, n, 12), b = managed.LowestComplex(h, n, 12);
        AssertSeparated(a.Values);
        AssertValuesAgree(a.Values, b.Values);
        for (int i = 0; i < a.Vectors.Length; i++)
            Assert.True((a.Vectors[i] - b.Vectors[i]).Magnitude <= 1e-9, $"vector entry {i}: {a.Vectors[i]} vs {b.Vectors[i]}");
    }

    [NativeFact]
    public void GeneralizedResultsAgree()
    {
        (IEigenSolver native, IEigenSolver managed) = Pair();
        const int n = 50;
        double[] h = MatrixFixtures.RandomSymmetric(n, seed: 47);
        double[] s = MatrixFixtures.RandomPositiveDefinite(n, seed: 53);
        RealEigenResult a = native.LowestGeneralizedReal(h, s, n, 10), b = managed.LowestGeneralizedReal(h, s, n, 10);
        AssertSeparated(a.Values);
        AssertValuesAgree(a.Values, b.Values);
        for (int i = 0; i < a.Vectors.Length; i++)
            Assert.True(Math.Abs(a.Vectors[i] - b.Vectors[i]) <= 1e-9, $"vector entry {i}: {a.Vectors[i]:R} vs {b.Vectors[i]:R}");
    }

    [NativeFact]
    public void NativeNameShowsTheResolvedLibrary()
    {
        IEigenSolver native = Pair().Native;
        Assert.True(native.IsNative);
        Assert.StartsWith("native LAPACK (liblapack.so.3", native.Name);
        var solver = Assert.IsType<NativeLapackSolver>(native);
        if (solver.LibraryPath is not null)
        {
            Assert.True(File.Exists(solver.LibraryPath), $"resolved path {solver.LibraryPath} does not exist");
            Assert.Contains(" → " + solver.LibraryPath, native.Name);
        }
    }
}

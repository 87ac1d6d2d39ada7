using System.Numerics;

namespace LevelDesign.Core.Tests.Eigen;

/// <summary>Seeded random matrices, so every run and every backend sees the same inputs.</summary>
public static class MatrixFixtures
{
    public static double[] RandomSymmetric(int n, int seed)
    {
        var random = new Random(seed);
        var a = new double[n * n];
        for (int j = 0; j < n; j++)
            for (int i = j; i < n; i++)
            {
                double x = 2 * random.NextDouble() - 1;
                a[j * n + i] = x;
                a[i * n + j] = x;
            }
        return a;
    }

    public static Complex[] RandomHermitian(int n, int seed)
    {
        var random = new Random(seed);
        var a = new Complex[n * n];
        for (int j = 0; j < n; j++)
        {
            a[j * n + j] = 2 * random.NextDouble() - 1;
            for (int i = j + 1; i < n; i++)
            {
                var z = new Complex(2 * random.NextDouble() - 1, 2 * random.NextDouble() - 1);
                a[j * n + i] = z;
                a[i * n + j] = Complex.Conjugate(z);
            }
        }
        return a;
    }

    /// <summary>S = I + BᵀB / n: symmetric positive definite with eigenvalues ≥ 1, yet far from diagonal.</summary>
    public static double[] RandomPositiveDefinite(int n, int seed)
    {
        var random = new Random(seed);
        var b = new double[n * n];
        for (int i = 0; i < b.Length; i++) b[i] = 2 * random.NextDouble() - 1;
        var s = new double[n * n];
        for (int j = 0; j < n; j++)
            for (int i = 0; i < n; i++)
            {
                double sum = i == j ? 1 : 0;
                for (int k = 0; k < n; k++) sum += b[i * n + k] * b[j * n + k] / n;
                s[j * n + i] = sum;
            }
        return s;
    }

    /// <summary>Tridiagonal matrix with 2 on the diagonal and −1 beside it.</summary>
    public static double[] SecondDifference(int n)
    {
        var a = new double[n * n];
        for (int i = 0; i < n; i++)
        {
            a[i * n + i] = 2;
            if (i + 1 < n)
            {
                a[i * n + i + 1] = -1;
                a[(i + 1) * n + i] = -1;
            }
        }
        return a;
    }

    /// <summary>Largest absolute entry, the norm used to scale residual tolerances.</summary>
    public static double MaxAbs(double[] a) => a.Max(Math.Abs);

    public static double MaxAbs(Complex[] a) => a.Max(z => z.Magnitude);
}

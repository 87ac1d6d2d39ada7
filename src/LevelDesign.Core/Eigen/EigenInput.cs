using System.Numerics;

namespace LevelDesign.Core.Eigen;

/// <summary>Argument checks and copies shared by all backends, so they reject the same inputs.</summary>
internal static class EigenInput
{
    public static void Check(int arrayLength, int n, int count, string name)
    {
        if (n < 1) throw new ArgumentOutOfRangeException(nameof(n), n, "Dimension must be at least 1.");
        if ((long)n * n != arrayLength)
            throw new ArgumentException($"Matrix '{name}' has {arrayLength} entries; a {n}×{n} matrix needs {(long)n * n}.", name);
        if (count < 0 || count > n)
            throw new ArgumentOutOfRangeException(nameof(count), count, $"Requested eigenpair count must lie in 0..{n}.");
    }

    /// <summary>Only the lower triangle is part of the contract, so only it is checked.</summary>
    public static void CheckFiniteLower(double[] m, int n, string name)
    {
        for (int j = 0; j < n; j++)
            for (int i = j; i < n; i++)
                if (!double.IsFinite(m[j * n + i]))
                    throw new ArgumentException($"Matrix '{name}' has a non-finite entry at ({i}, {j}).", name);
    }

    public static void CheckFiniteLower(Complex[] m, int n, string name)
    {
        for (int j = 0; j < n; j++)
            for (int i = j; i < n; i++)
            {
                Complex z = m[j * n + i];
                if (!double.IsFinite(z.Real) || !double.IsFinite(z.Imaginary))
                    throw new ArgumentException($"Matrix '{name}' has a non-finite entry at ({i}, {j}).", name);
            }
    }

    /// <summary>The argument checks of a generalized problem H c = E S c, shared by every backend.</summary>
    public static void CheckGeneralized(double[] h, double[] s, int n, int count)
    {
        ArgumentNullException.ThrowIfNull(h);
        ArgumentNullException.ThrowIfNull(s);
        Check(h.Length, n, count, nameof(h));
        Check(s.Length, n, count, nameof(s));
        CheckFiniteLower(h, n, nameof(h));
        CheckFiniteLower(s, n, nameof(s));
    }

    /// <summary>Full symmetric copy built from the lower triangle.</summary>
    public static double[] SymmetricFromLower(double[] m, int n)
    {
        var full = new double[n * n];
        for (int j = 0; j < n; j++)
            for (int i = j; i < n; i++)
            {
                double x = m[j * n + i];
                full[j * n + i] = x;
                full[i * n + j] = x;
            }
        return full;
    }

    /// <summary>Full Hermitian copy built from the lower triangle; the diagonal's imaginary part is dropped.</summary>
    public static Complex[] HermitianFromLower(Complex[] m, int n)
    {
        var full = new Complex[n * n];
        for (int j = 0; j < n; j++)
        {
            full[j * n + j] = new Complex(m[j * n + j].Real, 0);
            for (int i = j + 1; i < n; i++)
            {
                Complex z = m[j * n + i];
                full[j * n + i] = z;
                full[i * n + j] = Complex.Conjugate(z);
            }
        }
        return full;
    }
}

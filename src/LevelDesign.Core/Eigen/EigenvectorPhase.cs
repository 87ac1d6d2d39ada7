using System.Numerics;

namespace LevelDesign.Core.Eigen;

/// <summary>
/// The one phase convention every backend applies to its eigenvectors: the component of largest
/// magnitude (the first one when several agree to a relative 1e-12) is made real and positive.
/// A fixed convention lets later steps compare vectors from different bias points or backends.
/// </summary>
public static class EigenvectorPhase
{
    /// <summary>Relative tolerance under which two magnitudes count as tied.</summary>
    public const double TieTolerance = 1e-12;

    /// <summary>Index of the component the convention pins for one column.</summary>
    public static int PinnedIndex(ReadOnlySpan<double> column)
    {
        double max = 0;
        foreach (double x in column) max = Math.Max(max, Math.Abs(x));
        int n = column.Length;
        for (int i = 0; i < n; i++)
            if (Math.Abs(column[i]) >= max - TieTolerance * max) return i;
        return 0;
    }

    /// <inheritdoc cref="PinnedIndex(ReadOnlySpan{double})"/>
    public static int PinnedIndex(ReadOnlySpan<Complex> column)
    {
        double max = 0;
        foreach (Complex z in column) max = Math.Max(max, z.Magnitude);
        int n = column.Length;
        for (int i = 0; i < n; i++)
            if (column[i].Magnitude >= max - TieTolerance * max) return i;
        return 0;
    }

    /// <summary>Applies the convention in place to every column of an n×count column-major block.</summary>
    public static void Normalize(double[] vectors, int n, int count)
    {
        for (int k = 0; k < count; k++)
        {
            Span<double> column = vectors.AsSpan(k * n, n);
            int p = PinnedIndex(column);
            if (column[p] < 0)
                for (int i = 0; i < n; i++) column[i] = -column[i];
        }
    }

    /// <inheritdoc cref="Normalize(double[], int, int)"/>
    public static void Normalize(Complex[] vectors, int n, int count)
    {
        for (int k = 0; k < count; k++)
        {
            Span<Complex> column = vectors.AsSpan(k * n, n);
            int p = PinnedIndex(column);
            double magnitude = column[p].Magnitude;
            if (magnitude == 0) continue;
            Complex rotate = Complex.Conjugate(column[p]) / magnitude;
            for (int i = 0; i < n; i++) column[i] *= rotate;
            // Rounding in the rotation leaves ~1e-17 imaginary residue; the convention promises exactly real.
            column[p] = new Complex(magnitude, 0);
        }
    }
}

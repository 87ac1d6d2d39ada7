using System.Numerics;

namespace LevelDesign.Core.Eigen;

/// <summary>
/// Many complex Hermitian composite matrices are real in disguise: a resonator's charge operator i(a† − a)
/// is imaginary only by its phase convention. This finds phases d_j (|d_j| = 1) with D†HD real, by walking the
/// sparsity graph; then H's eigenvectors are D times those of the real matrix, and the fast real path applies.
/// Returns null when no such phases exist (e.g. offset charge with flux-biased couplings).
/// </summary>
public static class RealGauge
{
    /// <summary>
    /// The phases, and the real values of D†HD, for a Hermitian matrix in full compressed rows (both triangles:
    /// <paramref name="values"/>[p] is H[r, columns[p]] for rowStart[r] ≤ p &lt; rowStart[r + 1]); null when H is not
    /// real in any gauge. Works on the matrix's own layout, so a sweep point allocates only the phases and the values.
    /// </summary>
    public static (Complex[] Phases, double[] Real)? TryFind(int dimension, int[] rowStart, int[] columns, Complex[] values)
    {
        double scale = 0;
        foreach (var v in values) scale = Math.Max(scale, Complex.Abs(v));
        double negligible = 1e-14 * Math.Max(scale, 1e-300);
        var phases = new Complex[dimension];
        var known = new bool[dimension];
        var queue = new int[dimension];
        for (int root = 0; root < dimension; root++)
        {
            if (known[root]) continue;
            phases[root] = Complex.One;
            known[root] = true;
            int head = 0, tail = 0;
            queue[tail++] = root;
            while (head < tail)
            {
                int i = queue[head++];
                for (int p = rowStart[i]; p < rowStart[i + 1]; p++)
                {
                    int j = columns[p];
                    if (known[j] || Complex.Abs(values[p]) <= negligible) continue;
                    // choose d_j so that conj(d_i)·H[i, j]·d_j is real and positive
                    var rotated = Complex.Conjugate(phases[i]) * values[p];
                    phases[j] = Complex.Conjugate(rotated) / Complex.Abs(rotated);
                    known[j] = true;
                    queue[tail++] = j;
                }
            }
        }
        var real = new double[values.Length];
        double imaginaryLimit = 1e-12 * Math.Max(scale, 1e-300);
        for (int r = 0; r < dimension; r++)
            for (int p = rowStart[r]; p < rowStart[r + 1]; p++)
            {
                int c = columns[p];
                var t = r == c ? new Complex(values[p].Real, 0) : Complex.Conjugate(phases[r]) * values[p] * phases[c];
                if (Math.Abs(t.Imaginary) > imaginaryLimit) return null;
                real[p] = t.Real;
            }
        return (phases, real);
    }

    /// <summary>Eigenvectors of the gauged real matrix (column-major n×count) rotated back to the original basis, phase-normalised.</summary>
    public static Complex[] RotateBack(Complex[] phases, double[] realVectors, int n, int count)
    {
        var vectors = new Complex[n * count];
        for (int c = 0; c < count; c++)
            for (int j = 0; j < n; j++) vectors[c * n + j] = phases[j] * realVectors[c * n + j];
        EigenvectorPhase.Normalize(vectors, n, count);
        return vectors;
    }
}

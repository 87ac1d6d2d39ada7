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
    /// <param name="lower">Lower-triangle entries (row ≥ column) of a Hermitian matrix.</param>
    /// <returns>The phases and the real lower-triangle entries of D†HD, or null.</returns>
    public static (Complex[] Phases, List<(int Row, int Column, double Value)> Real)? TryFind(int dimension,
        IEnumerable<(int Row, int Column, Complex Value)> lower)
    {
        var entries = lower.ToList();
        double scale = entries.Count == 0 ? 0 : entries.Max(e => Complex.Abs(e.Value));
        double negligible = 1e-14 * Math.Max(scale, 1e-300);
        var neighbours = new List<(int Other, Complex Value)>[dimension];
        for (int i = 0; i < dimension; i++) neighbours[i] = [];
        foreach (var (r, c, v) in entries)
        {
            if (r == c || Complex.Abs(v) <= negligible) continue;
            neighbours[r].Add((c, v));                       // H[r, c]
            neighbours[c].Add((r, Complex.Conjugate(v)));    // H[c, r]
        }
        var phases = new Complex[dimension];
        var known = new bool[dimension];
        var queue = new Queue<int>();
        for (int root = 0; root < dimension; root++)
        {
            if (known[root]) continue;
            phases[root] = Complex.One;
            known[root] = true;
            queue.Enqueue(root);
            while (queue.Count > 0)
            {
                int i = queue.Dequeue();
                foreach (var (j, h) in neighbours[i])
                {
                    if (known[j]) continue;
                    // choose d_j so that conj(d_i)·H[i, j]·d_j is real and positive
                    var rotated = Complex.Conjugate(phases[i]) * h;
                    phases[j] = Complex.Conjugate(rotated) / Complex.Abs(rotated);
                    known[j] = true;
                    queue.Enqueue(j);
                }
            }
        }
        var real = new List<(int, int, double)>(entries.Count);
        foreach (var (r, c, v) in entries)
        {
            var t = r == c ? new Complex(v.Real, 0) : Complex.Conjugate(phases[r]) * v * phases[c];
            if (Math.Abs(t.Imaginary) > 1e-12 * Math.Max(scale, 1e-300)) return null;
            real.Add((r, c, t.Real));
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

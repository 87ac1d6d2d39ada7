using System.Numerics;
using LevelDesign.Core.Eigen;

namespace LevelDesign.Core.Composite;

/// <summary>
/// A Hermitian matrix stored as its lower triangle (row ≥ column) in coordinate form, summed on build.
/// The composite Hamiltonian is mostly zeros, so it is assembled here and only densified for dense solvers.
/// </summary>
public sealed class SparseHermitian
{
    private readonly Dictionary<long, Complex> _lower = new();

    public SparseHermitian(int dimension) => Dimension = dimension;

    public int Dimension { get; }

    public int StoredEntries => _lower.Count;

    /// <summary>Adds v at (row, column) and, implicitly, v* at (column, row).</summary>
    public void AddHermitianPair(int row, int column, Complex value)
    {
        if (row < column) { (row, column) = (column, row); value = Complex.Conjugate(value); }
        long key = (long)row * Dimension + column;
        _lower[key] = _lower.TryGetValue(key, out var old) ? old + value : value;
    }

    /// <summary>Adds to a diagonal entry (real for a Hermitian matrix).</summary>
    public void AddDiagonal(int index, double value) => AddHermitianPair(index, index, value);

    public IEnumerable<(int Row, int Column, Complex Value)> LowerEntries()
    {
        foreach (var (key, v) in _lower) yield return ((int)(key / Dimension), (int)(key % Dimension), v);
    }

    public bool IsReal
    {
        get
        {
            double scale = 0;
            foreach (var v in _lower.Values) scale = Math.Max(scale, Complex.Abs(v));
            foreach (var v in _lower.Values) if (Math.Abs(v.Imaginary) > 1e-14 * Math.Max(scale, 1)) return false;
            return true;
        }
    }

    /// <summary>Dense column-major real matrix (full, both triangles).</summary>
    public double[] ToDenseReal()
    {
        int n = Dimension;
        var m = new double[(long)n * n];
        foreach (var (row, col, v) in LowerEntries())
        {
            m[(long)col * n + row] = v.Real;
            m[(long)row * n + col] = v.Real;
        }
        return m;
    }

    /// <summary>Dense column-major complex Hermitian matrix (full, both triangles).</summary>
    public Complex[] ToDenseComplex()
    {
        int n = Dimension;
        var m = new Complex[(long)n * n];
        foreach (var (row, col, v) in LowerEntries())
        {
            m[(long)col * n + row] = v;
            m[(long)row * n + col] = Complex.Conjugate(v);
        }
        return m;
    }

    /// <summary>Compressed-row real copy (both triangles) for the iterative eigensolver; only valid when <see cref="IsReal"/>.</summary>
    public CsrMatrix ToCsrReal() =>
        CsrMatrix.FromLowerTriangle(Dimension, LowerEntries().Select(e => (e.Row, e.Column, e.Value.Real)));
}

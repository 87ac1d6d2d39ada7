using System.Numerics;
using LevelDesign.Core.Eigen;

namespace LevelDesign.Core.Composite;

/// <summary>
/// A Hermitian matrix stored as values on the lower-triangle positions of a <see cref="HermitianPattern"/>.
/// The composite Hamiltonian is mostly zeros, so it is assembled here and only densified for dense solvers.
/// </summary>
public sealed class SparseHermitian
{
    private readonly HermitianPattern _pattern;
    private readonly Complex[] _lower;

    internal SparseHermitian(HermitianPattern pattern, Complex[] lower)
    {
        _pattern = pattern;
        _lower = lower;
    }

    public int Dimension => _pattern.Dimension;

    public int StoredEntries => _lower.Length;

    public IEnumerable<(int Row, int Column, Complex Value)> LowerEntries()
    {
        for (int slot = 0; slot < _lower.Length; slot++)
            yield return (_pattern.SlotRow[slot], _pattern.SlotColumn[slot], _lower[slot]);
    }

    public bool IsReal
    {
        get
        {
            double scale = 0;
            foreach (var v in _lower) scale = Math.Max(scale, Math.Abs(v.Real) + Math.Abs(v.Imaginary));
            double negligible = 1e-14 * Math.Max(scale, 1);
            foreach (var v in _lower) if (Math.Abs(v.Imaginary) > negligible) return false;
            return true;
        }
    }

    /// <summary>Dense column-major real matrix (full, both triangles).</summary>
    public double[] ToDenseReal()
    {
        int n = Dimension;
        var m = new double[(long)n * n];
        for (int slot = 0; slot < _lower.Length; slot++)
        {
            int row = _pattern.SlotRow[slot], col = _pattern.SlotColumn[slot];
            m[(long)col * n + row] = _lower[slot].Real;
            m[(long)row * n + col] = _lower[slot].Real;
        }
        return m;
    }

    /// <summary>Dense column-major complex Hermitian matrix (full, both triangles).</summary>
    public Complex[] ToDenseComplex()
    {
        int n = Dimension;
        var m = new Complex[(long)n * n];
        for (int slot = 0; slot < _lower.Length; slot++)
        {
            int row = _pattern.SlotRow[slot], col = _pattern.SlotColumn[slot];
            m[(long)col * n + row] = _lower[slot];
            m[(long)row * n + col] = Complex.Conjugate(_lower[slot]);
        }
        return m;
    }

    /// <summary>The real part as a full compressed-row matrix for the iterative solver (layout shared along a sweep).</summary>
    public CsrMatrix ToCsrReal()
    {
        var values = new double[_pattern.SourceSlot.Length];
        for (int p = 0; p < values.Length; p++) values[p] = _lower[_pattern.SourceSlot[p]].Real;
        return new CsrMatrix(Dimension, _pattern.RowStart, _pattern.Columns, values);
    }

    /// <summary>
    /// The matrix in a real gauge (see <see cref="RealGauge"/>): the phases and D†HD as a full compressed-row matrix on
    /// the shared layout; null when no gauge makes it real.
    /// </summary>
    public (Complex[] Phases, CsrMatrix Real)? ToCsrRealGauged()
    {
        var full = new Complex[_pattern.SourceSlot.Length];
        for (int r = 0; r < Dimension; r++)
            for (int p = _pattern.RowStart[r]; p < _pattern.RowStart[r + 1]; p++)
            {
                int slot = _pattern.SourceSlot[p];
                // the slot holds H[row, column] with row ≥ column; the upper triangle is its conjugate
                full[p] = _pattern.SlotRow[slot] == r ? _lower[slot] : Complex.Conjugate(_lower[slot]);
            }
        return RealGauge.TryFind(Dimension, _pattern.RowStart, _pattern.Columns, full) is var (phases, real)
            ? (phases, new CsrMatrix(Dimension, _pattern.RowStart, _pattern.Columns, real))
            : null;
    }

    /// <summary>
    /// The largest ‖H x_k − E_k x_k‖ (GHz) over the given eigenpairs (vectors column-major n×count, real or complex), on
    /// this matrix itself: an independent check of whatever solver (and gauge) produced them. Columns run in parallel
    /// when the work is large.
    /// </summary>
    public double MaxResidual(double[] values, double[]? realVectors, Complex[]? complexVectors)
    {
        int n = Dimension, count = values.Length;
        var worst = new double[count];
        var options = new ParallelOptions { MaxDegreeOfParallelism = (long)_lower.Length * count > 4_000_000 ? Eigen.ComputeCores.Limit : 1 };
        var rows = _pattern.SlotRow;
        var columns = _pattern.SlotColumn;
        Parallel.For(0, count, options, () => (new Complex[n], new Complex[n]), (k, _, work) =>
        {
            var (y, x) = work;
            // the column as complex numbers once, so the product below is one plain pass over the stored entries
            if (realVectors is not null) for (int j = 0; j < n; j++) x[j] = realVectors[k * n + j];
            else Array.Copy(complexVectors!, k * n, x, 0, n);
            Array.Clear(y);
            for (int slot = 0; slot < _lower.Length; slot++)
            {
                int row = rows[slot], col = columns[slot];
                var v = _lower[slot];
                y[row] += v * x[col];
                if (row != col) y[col] += Complex.Conjugate(v) * x[row];
            }
            double sum = 0;
            for (int j = 0; j < n; j++)
            {
                var r = y[j] - values[k] * x[j];
                sum += r.Real * r.Real + r.Imaginary * r.Imaginary;
            }
            worst[k] = Math.Sqrt(sum);
            return work;
        }, _ => { });
        return count == 0 ? 0 : worst.Max();
    }
}

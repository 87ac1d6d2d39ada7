using System.Numerics.Tensors;

namespace LevelDesign.Core.Eigen;

/// <summary>
/// The orthonormal search space of <see cref="BlockDavidson"/>: basis V (n×size, column-major), the products A·V, and
/// the projected matrix VᵀAV. New columns are written after the current ones and then orthonormalised as a block.
/// </summary>
internal sealed class SearchSpace
{
    // a new column keeping less than this fraction of its norm adds nothing the space does not already hold
    private const double DependentFraction = 1e-8;

    private readonly int _n, _capacity;
    private readonly double[] _projected, _scratch, _coefficients, _gram, _triangle, _norms;
    private readonly int[] _kept;
    private int _multiplied, _limit;

    public SearchSpace(int n, int capacity)
    {
        _n = n;
        _capacity = _limit = capacity;
        Basis = new double[n * capacity];
        Product = new double[n * capacity];
        _projected = new double[capacity * capacity];
        _scratch = new double[n * capacity];
        _coefficients = new double[capacity * capacity];
        _gram = new double[capacity * capacity];
        _triangle = new double[capacity * capacity];
        _kept = new int[capacity];
        _norms = new double[capacity];
    }

    public bool Fits(int n, int capacity) => n == _n && capacity <= _capacity;

    /// <summary>Empties the space for a new problem of the same dimension, holding at most <paramref name="limit"/> columns (the arrays are reused).</summary>
    public void Clear(int limit)
    {
        Size = _multiplied = 0;
        _limit = Math.Min(limit, _capacity);
    }

    public int Dimension => _n;
    public double[] Basis { get; }
    public double[] Product { get; }
    public int Size { get; private set; }

    /// <summary>Products and projected entries for the columns added since the last call.</summary>
    public void MultiplyNew(CsrMatrix a)
    {
        int first = _multiplied, added = Size - first;
        if (added == 0) return;
        for (int j = first; j < Size; j++) a.Multiply(Basis.AsSpan(j * _n, _n), Product.AsSpan(j * _n, _n));
        // g[c·Size + i] = (A v_first+c) · v_i
        BlockProducts.Dots(Product.AsSpan(first * _n), _n, added, Basis, Size, _coefficients, Size);
        for (int c = 0; c < added; c++)
            for (int i = 0; i < Size; i++)
            {
                int j = first + c;
                double value = _coefficients[c * Size + i];
                if (i >= first && i < j) value = 0.5 * (value + _coefficients[(i - first) * Size + j]);   // both computed: keep it symmetric
                if (i >= first && i > j) continue;
                _projected[j * _capacity + i] = value;
                _projected[i * _capacity + j] = value;
            }
        _multiplied = Size;
    }

    /// <summary>The projected matrix VᵀAV as a dense size×size array.</summary>
    public double[] ProjectedCopy()
    {
        var small = new double[Size * Size];
        for (int j = 0; j < Size; j++) Array.Copy(_projected, j * _capacity, small, j * Size, Size);
        return small;
    }

    /// <summary>Replaces the space by Ritz vectors (orthonormal, with their products): the projected matrix is then diag(θ).</summary>
    public void RestartOn(double[] ritz, double[] ritzProduct, ReadOnlySpan<double> theta)
    {
        int count = theta.Length;
        ritz.AsSpan(0, _n * count).CopyTo(Basis);
        ritzProduct.AsSpan(0, _n * count).CopyTo(Product);
        Array.Clear(_projected);
        for (int c = 0; c < count; c++) _projected[c * _capacity + c] = theta[c];
        Size = _multiplied = count;
    }

    /// <summary>
    /// Adds unit vectors e_i in ascending order of the diagonal (<paramref name="ascendingDiagonal"/>), skipping
    /// those the space already holds (half their weight or more inside it): every uncovered one among the first
    /// <paramref name="target"/>, then more until the space holds <paramref name="target"/> columns. A state falling
    /// fast from above is thereby in the space from the start, not missed by start vectors from a neighbouring point.
    /// </summary>
    public void AddUncoveredUnitVectors(int[] ascendingDiagonal, int target)
    {
        int position = 0;
        while (position < _n && (position < target || Size < target) && Size < _limit)
        {
            int candidates = 0;
            for (; position < _n && (position < target || Size + candidates < target) && Size + candidates < _limit; position++)
            {
                int i = ascendingDiagonal[position];
                double covered = 0;
                for (int j = 0; j < Size; j++) covered += Basis[j * _n + i] * Basis[j * _n + i];
                if (covered >= 0.5) continue;
                var column = Basis.AsSpan((Size + candidates) * _n, _n);
                column.Clear();
                column[i] = 1;
                candidates++;
            }
            OrthonormalizeNew(candidates);
        }
    }

    /// <summary>
    /// Orthonormalises the <paramref name="count"/> columns written after the current ones against the space and
    /// each other (projection then Cholesky QR, twice), drops those that add nothing, and returns how many were kept.
    /// </summary>
    public int OrthonormalizeNew(int count)
    {
        count = Math.Min(count, _limit - Size);
        if (count <= 0) return 0;
        var norms = _norms;
        for (int c = 0; c < count; c++)
        {
            var column = Basis.AsSpan((Size + c) * _n, _n);
            double norm = Math.Sqrt(TensorPrimitives.Dot(column, column));
            norms[c] = double.IsFinite(norm) ? norm : 0;
            if (norms[c] == 0) column.Clear();
        }
        for (int pass = 0; pass < 2 && count > 0; pass++)
        {
            ProjectOutSpace(count);
            count = CholeskyOrthonormalize(count, norms, pass == 0 ? DependentFraction : 0.5);
            if (pass == 0) Array.Fill(norms, 1.0, 0, count);
        }
        Size += count;
        return count;
    }

    /// <summary>W ← W − V(VᵀW) for the new columns W.</summary>
    private void ProjectOutSpace(int count)
    {
        if (Size == 0) return;
        var w = Basis.AsSpan(Size * _n, count * _n);
        BlockProducts.Dots(w, _n, count, Basis, Size, _coefficients, Size);
        BlockProducts.Combine(Basis, _n, Size, _coefficients, Size, count, _scratch);
        TensorPrimitives.Subtract(w, _scratch.AsSpan(0, count * _n), w);
    }

    /// <summary>
    /// Cholesky QR of the new columns: G = WᵀW = RᵀR, W ← W R⁻¹. A column whose remaining norm falls below
    /// <paramref name="keepFraction"/> of <paramref name="norms"/> (or is dependent on earlier new ones) is dropped.
    /// </summary>
    private int CholeskyOrthonormalize(int count, double[] norms, double keepFraction)
    {
        var w = Basis.AsSpan(Size * _n, count * _n);
        var gram = _gram.AsSpan(0, count * count);
        BlockProducts.Dots(w, _n, count, w, count, gram, count);
        // R over the kept columns in kept order: r[a·count + b] = R[a, b] for a ≤ b
        var r = _triangle.AsSpan(0, count * count);
        int m = 0;
        for (int j = 0; j < count; j++)
        {
            double diagonal = gram[j * count + j];
            if (Math.Sqrt(diagonal) < keepFraction * norms[j]) continue;
            for (int a = 0; a < m; a++)
            {
                double rij = gram[_kept[a] * count + j];
                for (int b = 0; b < a; b++) rij -= r[b * count + a] * r[b * count + m];
                rij /= r[a * count + a];
                r[a * count + m] = rij;
                diagonal -= rij * rij;
            }
            // dependent on the new columns already kept (to about 1e-5 of its norm): nothing new
            if (diagonal <= 1e-10 * gram[j * count + j]) continue;
            r[m * count + m] = Math.Sqrt(diagonal);
            _kept[m++] = j;
        }
        // W_kept R⁻¹: invert the triangle into coefficients (column c holds the weights of the kept columns)
        var inverse = _coefficients.AsSpan(0, m * m);
        inverse.Clear();
        for (int c = 0; c < m; c++)
        {
            inverse[c * m + c] = 1 / r[c * count + c];
            for (int i = c - 1; i >= 0; i--)
            {
                double sum = 0;
                for (int l = i + 1; l <= c; l++) sum += r[i * count + l] * inverse[c * m + l];
                inverse[c * m + i] = -sum / r[i * count + i];
            }
        }
        var source = _scratch.AsSpan(0, m * _n);
        for (int c = 0; c < m; c++) w.Slice(_kept[c] * _n, _n).CopyTo(source.Slice(c * _n, _n));
        BlockProducts.Combine(source, _n, m, inverse, m, m, w);
        return m;
    }
}

namespace LevelDesign.Core.Eigen;

/// <summary>
/// A real symmetric sparse matrix in compressed-row form with both triangles stored, so a product is one pass
/// over the rows. Made from the composite Hamiltonian for the iterative eigensolver.
/// </summary>
public sealed class CsrMatrix
{
    public CsrMatrix(int dimension, int[] rowStart, int[] columns, double[] values)
    {
        if (rowStart.Length != dimension + 1) throw new ArgumentException("rowStart needs dimension + 1 entries");
        if (columns.Length != values.Length) throw new ArgumentException("columns and values differ in length");
        Dimension = dimension;
        RowStart = rowStart;
        Columns = columns;
        Values = values;
        Diagonal = new double[dimension];
        for (int r = 0; r < dimension; r++)
            for (int p = rowStart[r]; p < rowStart[r + 1]; p++)
                if (columns[p] == r) Diagonal[r] += values[p];
    }

    public int Dimension { get; }
    public int[] RowStart { get; }
    public int[] Columns { get; }
    public double[] Values { get; }
    public double[] Diagonal { get; }
    public int NonZeros => Values.Length;

    /// <summary>Builds the full matrix from lower-triangle entries (row ≥ column); duplicates are summed.</summary>
    public static CsrMatrix FromLowerTriangle(int dimension, IEnumerable<(int Row, int Column, double Value)> lower)
    {
        var rows = new List<(int Column, double Value)>[dimension];
        for (int i = 0; i < dimension; i++) rows[i] = [];
        foreach (var (r, c, v) in lower)
        {
            if (v == 0) continue;
            rows[r].Add((c, v));
            if (r != c) rows[c].Add((r, v));
        }
        var rowStart = new int[dimension + 1];
        var columns = new List<int>();
        var values = new List<double>();
        for (int r = 0; r < dimension; r++)
        {
            rows[r].Sort((a, b) => a.Column.CompareTo(b.Column));
            int last = -1;
            foreach (var (c, v) in rows[r])
            {
                if (c == last) values[^1] += v;
                else { columns.Add(c); values.Add(v); last = c; }
            }
            rowStart[r + 1] = columns.Count;
        }
        return new CsrMatrix(dimension, rowStart, columns.ToArray(), values.ToArray());
    }

    /// <summary>y = A·x.</summary>
    public void Multiply(ReadOnlySpan<double> x, Span<double> y)
    {
        for (int r = 0; r < Dimension; r++)
        {
            double sum = 0;
            for (int p = RowStart[r]; p < RowStart[r + 1]; p++) sum += Values[p] * x[Columns[p]];
            y[r] = sum;
        }
    }

    /// <summary>Dense column-major copy, for checks and the dense fallback.</summary>
    public double[] ToDense()
    {
        var m = new double[(long)Dimension * Dimension];
        for (int r = 0; r < Dimension; r++)
            for (int p = RowStart[r]; p < RowStart[r + 1]; p++) m[(long)Columns[p] * Dimension + r] = Values[p];
        return m;
    }
}

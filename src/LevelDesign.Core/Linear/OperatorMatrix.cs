using System.Numerics;

namespace LevelDesign.Core.Linear;

/// <summary>
/// A small dense square operator matrix (row-major). Elements' operators live in their
/// own bare eigenbasis as these; they are tiny (a few to a few dozen levels).
/// </summary>
public sealed class OperatorMatrix
{
    private readonly Complex[] _data;

    public OperatorMatrix(int size) : this(size, new Complex[size * size]) { }

    public OperatorMatrix(int size, Complex[] rowMajor)
    {
        if (rowMajor.Length != size * size) throw new ArgumentException("data length must be size²");
        Size = size;
        _data = rowMajor;
    }

    public int Size { get; }

    public Complex this[int row, int column]
    {
        get => _data[row * Size + column];
        set => _data[row * Size + column] = value;
    }

    /// <summary>True when every element has a negligible imaginary part.</summary>
    public bool IsReal
    {
        get
        {
            double scale = MaxAbs();
            foreach (var z in _data)
                if (Math.Abs(z.Imaginary) > 1e-13 * Math.Max(scale, 1e-300)) return false;
            return true;
        }
    }

    public bool IsHermitian(double tolerance = 1e-10)
    {
        double scale = Math.Max(MaxAbs(), 1e-300);
        for (int i = 0; i < Size; i++)
            for (int j = 0; j <= i; j++)
                if (Complex.Abs(this[i, j] - Complex.Conjugate(this[j, i])) > tolerance * scale) return false;
        return true;
    }

    public double MaxAbs()
    {
        double m = 0;
        foreach (var z in _data) m = Math.Max(m, Complex.Abs(z));
        return m;
    }

    public OperatorMatrix Adjoint()
    {
        var result = new OperatorMatrix(Size);
        for (int i = 0; i < Size; i++)
            for (int j = 0; j < Size; j++)
                result[j, i] = Complex.Conjugate(this[i, j]);
        return result;
    }

    public static OperatorMatrix FromReal(double[,] values)
    {
        int n = values.GetLength(0);
        if (values.GetLength(1) != n) throw new ArgumentException("operator matrix must be square");
        var result = new OperatorMatrix(n);
        for (int i = 0; i < n; i++)
            for (int j = 0; j < n; j++)
                result[i, j] = values[i, j];
        return result;
    }

    /// <summary>
    /// Vᴴ·O·V for a real orthonormal (or S-orthonormal) column matrix V (n×k, column-major)
    /// — the operator expressed in the bare eigenbasis.
    /// </summary>
    public OperatorMatrix InBasis(double[] vectors, int n, int k)
    {
        if (n != Size) throw new ArgumentException("basis dimension mismatch");
        var temp = new Complex[n * k]; // O·V, column-major
        for (int col = 0; col < k; col++)
            for (int i = 0; i < n; i++)
            {
                Complex sum = Complex.Zero;
                for (int j = 0; j < n; j++)
                {
                    var o = _data[i * n + j];
                    if (o != Complex.Zero) sum += o * vectors[col * n + j];
                }
                temp[col * n + i] = sum;
            }
        var result = new OperatorMatrix(k);
        for (int a = 0; a < k; a++)
            for (int b = 0; b < k; b++)
            {
                Complex sum = Complex.Zero;
                for (int i = 0; i < n; i++) sum += vectors[a * n + i] * temp[b * n + i];
                result[a, b] = sum;
            }
        return result;
    }
}

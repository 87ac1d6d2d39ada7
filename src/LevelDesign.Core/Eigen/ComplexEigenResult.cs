using System.Numerics;

namespace LevelDesign.Core.Eigen;

/// <summary>Eigenvalues ascending; vectors column-major n×count (column k belongs to Values[k]).</summary>
public sealed record ComplexEigenResult(double[] Values, Complex[] Vectors, int Dimension)
{
    public int Count => Values.Length;
    public Complex Component(int row, int column) => Vectors[column * Dimension + row];
}

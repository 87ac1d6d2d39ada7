namespace LevelDesign.Core.Eigen;

/// <summary>Eigenvalues ascending; vectors column-major n×count (column k belongs to Values[k]).</summary>
public sealed record RealEigenResult(double[] Values, double[] Vectors, int Dimension)
{
    public int Count => Values.Length;
    public double Component(int row, int column) => Vectors[column * Dimension + row];
}

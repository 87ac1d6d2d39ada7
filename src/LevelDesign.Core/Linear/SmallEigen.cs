using LevelDesign.Core.Eigen;
using MathNet.Numerics.LinearAlgebra;

namespace LevelDesign.Core.Linear;

/// <summary>Dense symmetric eigenproblems of single elements (tens to ~200 states), managed.</summary>
public static class SmallEigen
{
    /// <summary>
    /// Lowest <paramref name="count"/> eigenpairs of a real symmetric matrix; vectors column-major n×count,
    /// each with the shared phase convention (<see cref="EigenvectorPhase"/>) so repeated solves keep one sign.
    /// </summary>
    public static (double[] Values, double[] Vectors) LowestSymmetric(double[,] matrix, int count)
    {
        int n = matrix.GetLength(0);
        if (count > n) throw new ArgumentException($"asked for {count} levels of a {n}-state basis");
        // MathNet's managed solver indexes out of its arrays on NaN/∞ input; say what is wrong instead
        foreach (double x in matrix)
            if (!double.IsFinite(x))
                throw new ArgumentException($"a {n}-state Hamiltonian has entries that are not finite numbers (parameters too large for the basis, or a basis too large for this element)");
        if (IsTridiagonal(matrix))
        {
            var d = new double[n];
            var e = new double[Math.Max(0, n - 1)];
            for (int i = 0; i < n; i++) d[i] = matrix[i, i];
            for (int i = 0; i + 1 < n; i++) e[i] = matrix[i + 1, i];
            var (tridiagonalValues, tridiagonalVectors) = TridiagonalEigen.Lowest(d, e, count);
            EigenvectorPhase.Normalize(tridiagonalVectors, n, count);
            return (tridiagonalValues, tridiagonalVectors);
        }
        MathNet.Numerics.LinearAlgebra.Factorization.Evd<double> evd;
        try { evd = Matrix<double>.Build.DenseOfArray(matrix).Evd(Symmetricity.Symmetric); }
        catch (IndexOutOfRangeException e)
        {
            // a backstop: seen only on non-finite input, which is refused above
            throw new ArgumentException($"the {n}-state eigenproblem could not be solved ({e.Message})", e);
        }
        var allValues = evd.EigenValues.Select(z => z.Real).ToArray();
        var order = Enumerable.Range(0, n).OrderBy(i => allValues[i]).Take(count).ToArray();
        var values = new double[count];
        var vectors = new double[n * count];
        for (int c = 0; c < count; c++)
        {
            values[c] = allValues[order[c]];
            var column = evd.EigenVectors.Column(order[c]);
            for (int i = 0; i < n; i++) vectors[c * n + i] = column[i];
        }
        EigenvectorPhase.Normalize(vectors, n, count);
        return (values, vectors);
    }

    private static bool IsTridiagonal(double[,] matrix)
    {
        int n = matrix.GetLength(0);
        for (int r = 0; r < n; r++)
            for (int c = 0; c < n; c++)
                if (Math.Abs(r - c) > 1 && matrix[r, c] != 0) return false;
        for (int r = 0; r + 1 < n; r++)
            if (matrix[r, r + 1] != matrix[r + 1, r]) return false;
        return true;
    }
}

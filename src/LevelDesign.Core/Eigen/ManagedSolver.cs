using System.Numerics;
using MathNet.Numerics.LinearAlgebra;
using MathNet.Numerics.LinearAlgebra.Factorization;

namespace LevelDesign.Core.Eigen;

/// <summary>
/// Fully managed backend on MathNet.Numerics. Always available; computes the full
/// decomposition and keeps the lowest eigenpairs.
/// </summary>
public sealed class ManagedSolver : IEigenSolver
{
    public ManagedSolver()
    {
        Version? v = typeof(Matrix<double>).Assembly.GetName().Version;
        Name = v is null ? "managed (MathNet.Numerics)" : $"managed (MathNet.Numerics {v.Major}.{v.Minor}.{v.Build})";
    }

    public string Name { get; }

    public bool IsNative => false;

    public RealEigenResult LowestReal(double[] matrix, int n, int count)
    {
        ArgumentNullException.ThrowIfNull(matrix);
        EigenInput.Check(matrix.Length, n, count, nameof(matrix));
        EigenInput.CheckFiniteLower(matrix, n, nameof(matrix));
        return SolveSymmetric(EigenInput.SymmetricFromLower(matrix, n), n, count);
    }

    public ComplexEigenResult LowestComplex(Complex[] matrix, int n, int count)
    {
        ArgumentNullException.ThrowIfNull(matrix);
        EigenInput.Check(matrix.Length, n, count, nameof(matrix));
        EigenInput.CheckFiniteLower(matrix, n, nameof(matrix));

        var a = Matrix<Complex>.Build.DenseOfColumnMajor(n, n, EigenInput.HermitianFromLower(matrix, n));
        Evd<Complex> evd = a.Evd(Symmetricity.Hermitian);
        int[] order = AscendingOrder(evd.EigenValues.Select(z => z.Real).ToArray());

        var values = new double[count];
        var vectors = new Complex[n * count];
        for (int k = 0; k < count; k++)
        {
            values[k] = evd.EigenValues[order[k]].Real;
            for (int i = 0; i < n; i++) vectors[k * n + i] = evd.EigenVectors[i, order[k]];
        }
        EigenvectorPhase.Normalize(vectors, n, count);
        return new ComplexEigenResult(values, vectors, n);
    }

    public RealEigenResult LowestGeneralizedReal(double[] h, double[] s, int n, int count)
    {
        EigenInput.CheckGeneralized(h, s, n, count);

        // Built from the lower triangle, so S is symmetric by construction (same contract as the native path).
        var sMatrix = Matrix<double>.Build.DenseOfColumnMajor(n, n, EigenInput.SymmetricFromLower(s, n));
        double[] l;
        try
        {
            l = sMatrix.Cholesky().Factor.ToColumnMajorArray();
        }
        catch (ArgumentException e)
        {
            throw new NotPositiveDefiniteException(
                $"Overlap matrix S ({n}×{n}) is not positive definite: its Cholesky factorisation failed ({e.Message}).");
        }

        // S = L Lᵀ turns H c = E S c into (L⁻¹ H L⁻ᵀ) y = E y with c = L⁻ᵀ y.
        double[] x = EigenInput.SymmetricFromLower(h, n);
        ForwardSolveColumns(l, x, n, n);       // X = L⁻¹ H
        Transpose(x, n);                       // Xᵀ = H L⁻ᵀ
        ForwardSolveColumns(l, x, n, n);       // L⁻¹ H L⁻ᵀ
        double[] reduced = EigenInput.SymmetricFromLower(x, n);

        RealEigenResult y = SolveSymmetric(reduced, n, count);
        double[] c = (double[])y.Vectors.Clone();
        BackSolveTransposedColumns(l, c, n, count);
        // Positive rescaling keeps cᵀSc = 1, so the convention can be reapplied after the back-transform.
        EigenvectorPhase.Normalize(c, n, count);
        return new RealEigenResult(y.Values, c, n);
    }

    private static RealEigenResult SolveSymmetric(double[] full, int n, int count)
    {
        Evd<double> evd = Matrix<double>.Build.DenseOfColumnMajor(n, n, full).Evd(Symmetricity.Hermitian);
        int[] order = AscendingOrder(evd.EigenValues.Select(z => z.Real).ToArray());

        var values = new double[count];
        var vectors = new double[n * count];
        for (int k = 0; k < count; k++)
        {
            values[k] = evd.EigenValues[order[k]].Real;
            for (int i = 0; i < n; i++) vectors[k * n + i] = evd.EigenVectors[i, order[k]];
        }
        EigenvectorPhase.Normalize(vectors, n, count);
        return new RealEigenResult(values, vectors, n);
    }

    private static int[] AscendingOrder(double[] values)
    {
        int[] order = Enumerable.Range(0, values.Length).ToArray();
        // Stable, so equal values keep the decomposition's own order.
        return order.OrderBy(i => values[i]).ToArray();
    }

    /// <summary>Overwrites each of the m columns of b (n rows) with L⁻¹ b for lower-triangular L.</summary>
    private static void ForwardSolveColumns(double[] l, double[] b, int n, int m)
    {
        for (int c = 0; c < m; c++)
        {
            int o = c * n;
            // Column-oriented elimination walks L down its columns, which are contiguous.
            for (int k = 0; k < n; k++)
            {
                double bk = b[o + k] / l[k * n + k];
                b[o + k] = bk;
                for (int i = k + 1; i < n; i++) b[o + i] -= l[k * n + i] * bk;
            }
        }
    }

    /// <summary>Overwrites each of the m columns of b (n rows) with L⁻ᵀ b for lower-triangular L.</summary>
    private static void BackSolveTransposedColumns(double[] l, double[] b, int n, int m)
    {
        for (int c = 0; c < m; c++)
        {
            int o = c * n;
            for (int i = n - 1; i >= 0; i--)
            {
                double sum = b[o + i];
                // (Lᵀ)[i, k] = L[k, i], stored at column i, row k: contiguous in memory.
                for (int k = i + 1; k < n; k++) sum -= l[i * n + k] * b[o + k];
                b[o + i] = sum / l[i * n + i];
            }
        }
    }

    private static void Transpose(double[] a, int n)
    {
        for (int j = 0; j < n; j++)
            for (int i = j + 1; i < n; i++)
                (a[j * n + i], a[i * n + j]) = (a[i * n + j], a[j * n + i]);
    }
}

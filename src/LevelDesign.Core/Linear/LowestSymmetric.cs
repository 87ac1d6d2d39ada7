using System.Numerics.Tensors;

namespace LevelDesign.Core.Linear;

/// <summary>
/// Lowest eigenpairs of a small dense real symmetric matrix: Householder reduction to tridiagonal form, the
/// wanted eigenpairs of the tridiagonal matrix (<see cref="TridiagonalEigen"/>), and back-transformation of just
/// those vectors. A full decomposition spends most of its work on vectors nobody asked for; the Rayleigh–Ritz
/// problems of the iterative eigensolver want about half of them, so this is the cheaper route there.
/// </summary>
public static class LowestSymmetric
{
    public static long[] T = new long[3];
    /// <param name="matrix">Column-major n×n; only the lower triangle is read. Not modified.</param>
    /// <returns>Ascending values and column-major n×count unit vectors (signs not fixed).</returns>
    public static (double[] Values, double[] Vectors) Solve(ReadOnlySpan<double> matrix, int n, int count)
    {
        if (matrix.Length < n * n) throw new ArgumentException("matrix needs n² entries");
        return SolveInPlace(matrix[..(n * n)].ToArray(), n, count);
    }

    /// <summary>As <see cref="Solve"/>, using <paramref name="a"/> (n×n, column-major) as work space: it is overwritten.</summary>
    public static (double[] Values, double[] Vectors) SolveInPlace(double[] a, int n, int count)
    {
        if (a.Length < n * n) throw new ArgumentException("matrix needs n² entries");
        if (count < 1 || count > n) throw new ArgumentException($"asked for {count} eigenpairs of a {n}×{n} matrix");
        var diagonal = new double[n];
        var offDiagonal = new double[Math.Max(0, n - 1)];
        var tau = new double[Math.Max(0, n - 1)];
        long t0 = System.Diagnostics.Stopwatch.GetTimestamp();
        Reduce(a, n, diagonal, offDiagonal, tau);
        long t1 = System.Diagnostics.Stopwatch.GetTimestamp();
        var (values, vectors) = TridiagonalEigen.Lowest(diagonal, offDiagonal, count);
        long t2 = System.Diagnostics.Stopwatch.GetTimestamp();
        BackTransform(a, n, tau, vectors, count);
        long t3 = System.Diagnostics.Stopwatch.GetTimestamp();
        T[0] += t1 - t0; T[1] += t2 - t1; T[2] += t3 - t2;
        return (values, vectors);
    }

    /// <summary>
    /// A = Q T Qᵀ with Q = H_0 H_1 ⋯ H_{n−3}, H_k = I − τ_k v_k v_kᵀ; v_k (with an implicit leading 1 at row k+1)
    /// is left below the sub-diagonal of column k.
    /// </summary>
    private static void Reduce(double[] a, int n, double[] d, double[] e, double[] tau)
    {
        var p = new double[n];
        for (int k = 0; k + 2 < n; k++)
        {
            int m = n - k - 1;                       // length of the column below the diagonal
            var x = a.AsSpan(k * n + k + 1, m);
            double alpha = x[0];
            double tail = m > 1 ? TensorPrimitives.Dot(x[1..], x[1..]) : 0;
            if (tail == 0)
            {
                tau[k] = 0;
                e[k] = alpha;
                d[k] = a[k * n + k];
                continue;
            }
            double beta = -Math.CopySign(Math.Sqrt(alpha * alpha + tail), alpha);
            tau[k] = (beta - alpha) / beta;
            TensorPrimitives.Multiply(x[1..], 1 / (alpha - beta), x[1..]);
            x[0] = 1;
            e[k] = beta;
            d[k] = a[k * n + k];

            // p = τ A₂₂ v from the lower triangle of the trailing block (rows and columns k+1..n−1)
            var v = x;
            var pk = p.AsSpan(0, m);
            pk.Clear();
            for (int j = 0; j < m; j++)
            {
                var column = a.AsSpan((k + 1 + j) * n + k + 1 + j, m - j);   // A₂₂[j.., j]
                pk[j] += TensorPrimitives.Dot(column, v[j..]);
                if (m - j > 1) TensorPrimitives.MultiplyAdd(column[1..], v[j], pk[(j + 1)..], pk[(j + 1)..]);
            }
            TensorPrimitives.Multiply(pk, tau[k], pk);
            // w = p − (τ/2)(pᵀv) v; A₂₂ ← A₂₂ − v wᵀ − w vᵀ (lower triangle)
            double half = -0.5 * tau[k] * TensorPrimitives.Dot(pk, v);
            TensorPrimitives.MultiplyAdd(v, half, pk, pk);
            for (int j = 0; j < m; j++)
            {
                var column = a.AsSpan((k + 1 + j) * n + k + 1 + j, m - j);
                TensorPrimitives.MultiplyAdd(v[j..], -pk[j], column, column);
                TensorPrimitives.MultiplyAdd(pk[j..], -v[j], column, column);
            }
            x[0] = beta;   // keep the reflector's tail below it; the leading 1 is implicit from here on
        }
        if (n >= 2)
        {
            d[n - 2] = a[(n - 2) * n + n - 2];
            e[n - 2] = a[(n - 2) * n + n - 1];
            tau[n - 2] = 0;
        }
        d[n - 1] = a[(n - 1) * n + n - 1];
    }

    /// <summary>z ← Q z for each tridiagonal eigenvector z.</summary>
    private static void BackTransform(double[] a, int n, double[] tau, double[] vectors, int count)
    {
        for (int k = n - 3; k >= 0; k--)
        {
            if (tau[k] == 0) continue;
            int m = n - k - 1;
            var tailOfV = a.AsSpan(k * n + k + 2, m - 1);   // v below its implicit leading 1
            for (int c = 0; c < count; c++)
            {
                var z = vectors.AsSpan(c * n + k + 1, m);
                double s = tau[k] * (z[0] + TensorPrimitives.Dot(tailOfV, z[1..]));
                z[0] -= s;
                TensorPrimitives.MultiplyAdd(tailOfV, -s, z[1..], z[1..]);
            }
        }
    }
}

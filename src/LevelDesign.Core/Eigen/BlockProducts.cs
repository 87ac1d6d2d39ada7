using System.Runtime.CompilerServices;
using System.Runtime.Intrinsics;

namespace LevelDesign.Core.Eigen;

/// <summary>
/// The two dense products the block eigensolver spends its time in, on tall column-major blocks (n rows, tens of
/// columns): Y = V·C and G = Vᵀ·W. Each loaded row segment of V is used for several columns at once, which
/// makes them several times faster than one vector operation per column pair.
/// </summary>
public static class BlockProducts
{
    /// <summary>
    /// Rows per block: a block of a 150-column space is 150·512·8 B = 600 KB, about what stays in a core's L2 while every
    /// group of output columns reuses it. Without blocks each group streamed all of V from memory (a 46k-state module:
    /// 55 MB per pass, about twenty passes per product). A multiple of 4 (the vector width).
    /// </summary>
    private const int RowBlock = 512;

    /// <summary>Multiply-adds above which a product is shared out over cores (single large points; sweeps of small devices stay serial).</summary>
    private const long ParallelWork = 50_000_000;

    /// <summary>y[:, c] = Σ_j v[:, j]·coefficients[c·stride + j] for c &lt; columns (n×size times size×columns).</summary>
    public static void Combine(ReadOnlySpan<double> v, int n, int size, ReadOnlySpan<double> coefficients, int stride,
        int columns, Span<double> y)
    {
        if (v.Length < n * size || y.Length < n * columns || coefficients.Length < (columns - 1) * stride + size)
            throw new ArgumentException("block shapes do not match");
        int groups = columns / 4;
        if (groups > 0)
        {
            // row blocks small enough that the block of V stays in cache while every group of four columns reuses it;
            // fixed blocks, so the result does not depend on how they are shared out
            int blocks = (n + RowBlock - 1) / RowBlock;
            if (blocks > 1 && (long)n * size * columns >= ParallelWork)
            {
                // spans cannot enter a lambda, so the workers get pointers to the pinned memory for the call's duration
                unsafe
                {
                    fixed (double* vp = v, kp = coefficients, yp = y)
                    {
                        var (vq, kq, yq, vl, kl, yl) = ((nint)vp, (nint)kp, (nint)yp, v.Length, coefficients.Length, y.Length);
                        Parallel.For(0, blocks, ComputeCores.Options(), b =>
                        {
                            var vs = new ReadOnlySpan<double>((double*)vq, vl);
                            var ks = new ReadOnlySpan<double>((double*)kq, kl);
                            var ys = new Span<double>((double*)yq, yl);
                            for (int c = 0; c < groups; c++)
                                Combine4(vs, n, size, ks, stride, 4 * c, ys, b * RowBlock, Math.Min(n, (b + 1) * RowBlock));
                        });
                    }
                }
            }
            else
                for (int b = 0; b < blocks; b++)
                    for (int c = 0; c < groups; c++)
                        Combine4(v, n, size, coefficients, stride, 4 * c, y, b * RowBlock, Math.Min(n, (b + 1) * RowBlock));
        }
        for (int c = 4 * groups; c < columns; c++)
        {
            var target = y.Slice(c * n, n);
            target.Clear();
            for (int j = 0; j < size; j++)
            {
                double w = coefficients[c * stride + j];
                if (w != 0) System.Numerics.Tensors.TensorPrimitives.MultiplyAdd(v.Slice(j * n, n), w, target, target);
            }
        }
    }

    private static void Combine4(ReadOnlySpan<double> v, int n, int size, ReadOnlySpan<double> k, int stride, int c,
        Span<double> y, int first, int end)
    {
        ref double vr = ref Unsafe.AsRef(in v[0]);
        ref double yr = ref y[0];
        int k0 = c * stride, k1 = k0 + stride, k2 = k1 + stride, k3 = k2 + stride;
        int i = first;
        if (Vector256.IsHardwareAccelerated)
            for (; i + 4 <= end; i += 4)
            {
                Vector256<double> a0 = default, a1 = default, a2 = default, a3 = default;
                for (int j = 0; j < size; j++)
                {
                    var x = Vector256.LoadUnsafe(ref vr, (nuint)(j * n + i));
                    a0 = Vector256.FusedMultiplyAdd(x, Vector256.Create(k[k0 + j]), a0);
                    a1 = Vector256.FusedMultiplyAdd(x, Vector256.Create(k[k1 + j]), a1);
                    a2 = Vector256.FusedMultiplyAdd(x, Vector256.Create(k[k2 + j]), a2);
                    a3 = Vector256.FusedMultiplyAdd(x, Vector256.Create(k[k3 + j]), a3);
                }
                a0.StoreUnsafe(ref yr, (nuint)(c * n + i));
                a1.StoreUnsafe(ref yr, (nuint)((c + 1) * n + i));
                a2.StoreUnsafe(ref yr, (nuint)((c + 2) * n + i));
                a3.StoreUnsafe(ref yr, (nuint)((c + 3) * n + i));
            }
        for (; i < end; i++)
        {
            double s0 = 0, s1 = 0, s2 = 0, s3 = 0;
            for (int j = 0; j < size; j++)
            {
                double x = v[j * n + i];
                s0 += x * k[k0 + j];
                s1 += x * k[k1 + j];
                s2 += x * k[k2 + j];
                s3 += x * k[k3 + j];
            }
            y[c * n + i] = s0;
            y[(c + 1) * n + i] = s1;
            y[(c + 2) * n + i] = s2;
            y[(c + 3) * n + i] = s3;
        }
    }

    /// <summary>g[i·ldg + j] = v[:, i]·w[:, j] for i &lt; vColumns, j &lt; wColumns (Vᵀ·W, stored by rows of g).</summary>
    public static void Dots(ReadOnlySpan<double> v, int n, int vColumns, ReadOnlySpan<double> w, int wColumns,
        Span<double> g, int ldg)
    {
        if (v.Length < n * vColumns || w.Length < n * wColumns || (vColumns > 0 && g.Length < (vColumns - 1) * ldg + wColumns))
            throw new ArgumentException("block shapes do not match");
        int groups = vColumns / 4, blocks = (n + RowBlock - 1) / RowBlock;
        if (groups > 0)
        {
            for (int i = 0; i < 4 * groups; i++) g.Slice(i * ldg, wColumns).Clear();
            if (blocks > 1 && (long)n * vColumns * wColumns >= ParallelWork)
            {
                // one partial product per row block, summed in block order: the same result however blocks are shared out
                var partial = new double[blocks][];
                unsafe
                {
                    fixed (double* vp = v, wp = w)
                    {
                        var (vq, wq, vl, wl) = ((nint)vp, (nint)wp, v.Length, w.Length);
                        Parallel.For(0, blocks, ComputeCores.Options(), b =>
                        {
                            var part = partial[b] = new double[4 * groups * wColumns];
                            DotsBlock(new ReadOnlySpan<double>((double*)vq, vl), n, groups, new ReadOnlySpan<double>((double*)wq, wl), wColumns,
                                part, wColumns, b * RowBlock, Math.Min(n, (b + 1) * RowBlock));
                        });
                    }
                }
                for (int b = 0; b < blocks; b++)
                    for (int i = 0; i < 4 * groups; i++)
                        for (int j = 0; j < wColumns; j++) g[i * ldg + j] += partial[b][i * wColumns + j];
            }
            else
                for (int b = 0; b < blocks; b++)
                    DotsBlock(v, n, groups, w, wColumns, g, ldg, b * RowBlock, Math.Min(n, (b + 1) * RowBlock));
        }
        for (int i = 4 * groups; i < vColumns; i++)
            for (int j = 0; j < wColumns; j++)
                g[i * ldg + j] = System.Numerics.Tensors.TensorPrimitives.Dot(v.Slice(i * n, n), w.Slice(j * n, n));
    }

    /// <summary>Adds rows [first, end) of the first 4·groups columns of Vᵀ·W into g.</summary>
    private static void DotsBlock(ReadOnlySpan<double> v, int n, int groups, ReadOnlySpan<double> w, int wColumns, Span<double> g, int ldg,
        int first, int end)
    {
        for (int i = 0; i < 4 * groups; i += 4)
            for (int j = 0; j < wColumns; j++)
            {
                var (d0, d1, d2, d3) = Dot4(v, n, i, w.Slice(j * n, n), first, end);
                g[i * ldg + j] += d0;
                g[(i + 1) * ldg + j] += d1;
                g[(i + 2) * ldg + j] += d2;
                g[(i + 3) * ldg + j] += d3;
            }
    }

    private static (double, double, double, double) Dot4(ReadOnlySpan<double> v, int n, int i, ReadOnlySpan<double> w, int first, int end)
    {
        ref double vr = ref Unsafe.AsRef(in v[i * n]);
        ref double wr = ref Unsafe.AsRef(in w[0]);
        int r = first;
        double s0 = 0, s1 = 0, s2 = 0, s3 = 0;
        if (Vector256.IsHardwareAccelerated)
        {
            Vector256<double> a0 = default, a1 = default, a2 = default, a3 = default;
            for (; r + 4 <= end; r += 4)
            {
                var x = Vector256.LoadUnsafe(ref wr, (nuint)r);
                a0 = Vector256.FusedMultiplyAdd(Vector256.LoadUnsafe(ref vr, (nuint)r), x, a0);
                a1 = Vector256.FusedMultiplyAdd(Vector256.LoadUnsafe(ref vr, (nuint)(n + r)), x, a1);
                a2 = Vector256.FusedMultiplyAdd(Vector256.LoadUnsafe(ref vr, (nuint)(2 * n + r)), x, a2);
                a3 = Vector256.FusedMultiplyAdd(Vector256.LoadUnsafe(ref vr, (nuint)(3 * n + r)), x, a3);
            }
            s0 = Vector256.Sum(a0); s1 = Vector256.Sum(a1); s2 = Vector256.Sum(a2); s3 = Vector256.Sum(a3);
        }
        for (; r < end; r++)
        {
            double x = w[r];
            s0 += v[i * n + r] * x;
            s1 += v[(i + 1) * n + r] * x;
            s2 += v[(i + 2) * n + r] * x;
            s3 += v[(i + 3) * n + r] * x;
        }
        return (s0, s1, s2, s3);
    }
}

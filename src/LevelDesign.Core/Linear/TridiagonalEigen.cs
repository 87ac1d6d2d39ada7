namespace LevelDesign.Core.Linear;

/// <summary>
/// Lowest eigenpairs of a real symmetric tridiagonal matrix (the charge-basis transmon is one): eigenvalues by the
/// implicit QL iteration (Sturm-sequence bisection if that fails), eigenvectors by inverse iteration,
/// re-orthogonalised within clusters of close eigenvalues. O(n·count) work instead of the O(n³) of a dense solve, which matters because
/// a swept tunable element is re-solved at every sweep point.
/// </summary>
internal static class TridiagonalEigen
{
    /// <param name="diagonal">d[0..n).</param>
    /// <param name="offDiagonal">e[0..n−1): T[i, i+1] = T[i+1, i] = e[i].</param>
    /// <returns>Ascending values and column-major n×count vectors (unit norm, sign not yet fixed).</returns>
    public static (double[] Values, double[] Vectors) Lowest(double[] diagonal, double[] offDiagonal, int count)
    {
        int n = diagonal.Length;
        if (offDiagonal.Length != Math.Max(0, n - 1)) throw new ArgumentException("off-diagonal needs n − 1 entries");
        if (count < 1 || count > n) throw new ArgumentException($"asked for {count} eigenpairs of a {n}×{n} matrix");

        var (low, high, norm) = Gershgorin(diagonal, offDiagonal);
        var values = AllByImplicitQl(diagonal, offDiagonal) is double[] all
            ? all.AsSpan(0, count).ToArray()
            : ByBisection(diagonal, offDiagonal, count, low, high, norm);

        var vectors = new double[n * count];
        var work = new Workspace(n);
        int clusterStart = 0;
        for (int k = 0; k < count; k++)
        {
            if (k > 0 && values[k] - values[k - 1] > 1e-3 * norm) clusterStart = k;
            InverseIteration(diagonal, offDiagonal, values[k], norm, vectors, n, k, clusterStart, work);
        }
        return (values, vectors);
    }

    /// <summary>
    /// Every eigenvalue, ascending, by the implicit QL iteration with Wilkinson-type shifts (no vectors): O(n²)
    /// with few divisions, several times faster than bisecting each eigenvalue. Null if it fails to converge.
    /// </summary>
    private static double[]? AllByImplicitQl(double[] diagonal, double[] offDiagonal)
    {
        int n = diagonal.Length;
        var d = (double[])diagonal.Clone();
        var e = new double[n];   // e[i] couples i and i+1; e[n−1] = 0
        offDiagonal.CopyTo(e, 0);
        for (int l = 0; l < n; l++)
        {
            int iterations = 0, m;
            do
            {
                for (m = l; m < n - 1; m++)
                {
                    double scale = Math.Abs(d[m]) + Math.Abs(d[m + 1]);
                    if (Math.Abs(e[m]) <= 1e-16 * scale) break;
                }
                if (m == l) break;
                if (++iterations > 60) return null;
                double g = (d[l + 1] - d[l]) / (2 * e[l]);
                double r = Math.Sqrt(g * g + 1);
                g = d[m] - d[l] + e[l] / (g + Math.CopySign(r, g));
                double sine = 1, cosine = 1, p = 0;
                int i;
                for (i = m - 1; i >= l; i--)
                {
                    double f = sine * e[i], b = cosine * e[i];
                    r = Math.Sqrt(f * f + g * g);
                    e[i + 1] = r;
                    if (r == 0)
                    {
                        d[i + 1] -= p;
                        e[m] = 0;
                        break;
                    }
                    sine = f / r;
                    cosine = g / r;
                    g = d[i + 1] - p;
                    r = (d[i] - g) * sine + 2 * cosine * b;
                    p = sine * r;
                    d[i + 1] = g + p;
                    g = cosine * r - b;
                }
                if (r == 0 && i >= l) continue;
                d[l] -= p;
                e[l] = g;
                e[m] = 0;
            } while (m != l);
        }
        Array.Sort(d);
        return d;
    }

    /// <summary>An interval holding the whole spectrum, and the largest absolute row sum (a norm).</summary>
    private static (double Low, double High, double Norm) Gershgorin(double[] diagonal, double[] offDiagonal)
    {
        int n = diagonal.Length;
        double low = double.PositiveInfinity, high = double.NegativeInfinity, norm = 0;
        for (int i = 0; i < n; i++)
        {
            double radius = (i > 0 ? Math.Abs(offDiagonal[i - 1]) : 0) + (i + 1 < n ? Math.Abs(offDiagonal[i]) : 0);
            low = Math.Min(low, diagonal[i] - radius);
            high = Math.Max(high, diagonal[i] + radius);
            norm = Math.Max(norm, Math.Abs(diagonal[i]) + radius);
        }
        return (low, high, Math.Max(norm, 1e-300));
    }

    /// <summary>The lowest eigenvalues by Sturm-sequence bisection: the fallback when the QL iteration does not converge.</summary>
    internal static double[] LowestByBisection(double[] diagonal, double[] offDiagonal, int count)
    {
        var (low, high, norm) = Gershgorin(diagonal, offDiagonal);
        return ByBisection(diagonal, offDiagonal, count, low, high, norm);
    }

    private static double[] ByBisection(double[] diagonal, double[] offDiagonal, int count, double low, double high, double norm)
    {
        // pivots of T − xI smaller than this are nudged off zero (the usual guard of the Sturm count)
        double pivotMinimum = 1e-300 + 1e-30 * norm;
        var values = new double[count];
        for (int k = 0; k < count; k++)
        {
            double a = k > 0 ? values[k - 1] : low, b = high;
            // to rounding level: a few ulps of the endpoints, and never below ~1e-16 of the matrix norm (an
            // eigenvalue at zero would otherwise be bisected down to denormals)
            while (b - a > 4e-16 * Math.Max(Math.Abs(a), Math.Abs(b)) + 1e-16 * norm)
            {
                double middle = 0.5 * (a + b);
                if (middle <= a || middle >= b) break;
                if (CountBelow(diagonal, offDiagonal, middle, pivotMinimum) > k) b = middle; else a = middle;
            }
            values[k] = 0.5 * (a + b);
        }
        return values;
    }

    /// <summary>Number of eigenvalues below x: negative pivots of the LDLᵀ factorisation of T − xI.</summary>
    private static int CountBelow(double[] d, double[] e, double x, double pivotMinimum)
    {
        int below = 0;
        double q = d[0] - x;
        for (int i = 0; ; i++)
        {
            if (Math.Abs(q) < pivotMinimum) q = -pivotMinimum;
            if (q < 0) below++;
            if (i + 1 == d.Length) return below;
            q = d[i + 1] - x - e[i] * e[i] / q;
        }
    }

    private sealed class Workspace(int n)
    {
        // LU of T − λI with partial pivoting: upper band (u0, u1, u2), multipliers, and row swaps
        public readonly double[] U0 = new double[n], U1 = new double[n], U2 = new double[n], Multiplier = new double[n];
        public readonly bool[] Swapped = new bool[n];
    }

    private static void InverseIteration(double[] d, double[] e, double lambda, double norm, double[] vectors, int n,
        int k, int clusterStart, Workspace w)
    {
        Factor(d, e, lambda, norm, w);
        var x = vectors.AsSpan(k * n, n);
        // a fixed, non-special start vector: deterministic results, and never orthogonal to a smooth eigenvector
        for (int i = 0; i < n; i++) x[i] = 1 + 0.1 * Math.Sin(1.7 * i + 0.3 * k);
        // from a unit vector, growth g of the solution bounds the residual of the normalised result by 1/g: once it
        // is at rounding level one more step is taken (as LAPACK's inverse iteration does), at most five in all
        int extra = -1;
        for (int iteration = 0; iteration < 5 && extra != 0; iteration++)
        {
            Normalize(x);
            Solve(w, x);
            for (int j = clusterStart; j < k; j++)
            {
                var other = vectors.AsSpan(j * n, n);
                double dot = 0;
                for (int i = 0; i < n; i++) dot += other[i] * x[i];
                for (int i = 0; i < n; i++) x[i] -= dot * other[i];
            }
            if (extra > 0) extra--;
            else if (extra < 0 && Normalize(x) * norm >= 1e14) extra = 1;
        }
        Normalize(x);
    }

    /// <summary>Gaussian elimination with partial pivoting of the tridiagonal T − λI (a tiny pivot is replaced, as inverse iteration expects).</summary>
    private static void Factor(double[] d, double[] e, double lambda, double norm, Workspace w)
    {
        int n = d.Length;
        double tiny = 1e-15 * norm + 1e-300;
        // current row being eliminated: (diagonal, super-diagonal, second super-diagonal)
        double a = d[0] - lambda, b = n > 1 ? e[0] : 0, c = 0;
        for (int i = 0; i < n; i++)
        {
            if (i + 1 == n)
            {
                w.U0[i] = Math.Abs(a) < tiny ? tiny : a;
                w.U1[i] = w.U2[i] = 0;
                w.Swapped[i] = false;
                break;
            }
            double below = e[i], nextDiagonal = d[i + 1] - lambda, nextSuper = i + 2 < n ? e[i + 1] : 0;
            if (Math.Abs(a) >= Math.Abs(below))
            {
                if (Math.Abs(a) < tiny) a = tiny;
                double m = below / a;
                w.U0[i] = a; w.U1[i] = b; w.U2[i] = c; w.Multiplier[i] = m; w.Swapped[i] = false;
                a = nextDiagonal - m * b;
                b = nextSuper - m * c;
                c = 0;
            }
            else
            {
                // swap rows i and i+1
                double m = a / below;
                w.U0[i] = below; w.U1[i] = nextDiagonal; w.U2[i] = nextSuper; w.Multiplier[i] = m; w.Swapped[i] = true;
                a = b - m * nextDiagonal;
                b = c - m * nextSuper;
                c = 0;
            }
            // after the elimination, the new current row (row i+1) has entries at columns i+1, i+2 (a, b)
            c = 0;
        }
    }

    private static void Solve(Workspace w, Span<double> x)
    {
        int n = x.Length;
        for (int i = 0; i + 1 < n; i++)
        {
            if (w.Swapped[i]) (x[i], x[i + 1]) = (x[i + 1], x[i]);
            x[i + 1] -= w.Multiplier[i] * x[i];
        }
        for (int i = n - 1; i >= 0; i--)
        {
            double sum = x[i];
            if (i + 1 < n) sum -= w.U1[i] * x[i + 1];
            if (i + 2 < n) sum -= w.U2[i] * x[i + 2];
            x[i] = sum / w.U0[i];
            if (!double.IsFinite(x[i])) x[i] = 0;
        }
    }

    /// <returns>The norm before scaling.</returns>
    private static double Normalize(Span<double> x)
    {
        double sum = 0;
        for (int i = 0; i < x.Length; i++) sum += x[i] * x[i];
        double norm = Math.Sqrt(sum);
        double scale = sum > 0 ? 1 / norm : 1;
        for (int i = 0; i < x.Length; i++) x[i] *= scale;
        return norm;
    }
}

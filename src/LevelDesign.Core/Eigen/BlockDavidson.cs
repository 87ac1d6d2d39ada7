using System.Numerics.Tensors;

namespace LevelDesign.Core.Eigen;

/// <summary>
/// Lowest eigenpairs of a sparse real symmetric matrix by block Davidson with the diagonal (Jacobi)
/// preconditioner. Composite Hamiltonians are bare energies on the diagonal plus weak couplings, which is
/// where this preconditioner works best; warm-started from a neighbouring sweep point it needs a few
/// iterations. Returns null when it does not converge, so the caller can fall back to a dense solve.
/// </summary>
public sealed class BlockDavidson
{
    /// <param name="projected">Dense solver for the small projected (Rayleigh–Ritz) problems.</param>
    /// <param name="residualTolerance">Converged when every wanted ‖A x − θ x‖ is below this (GHz); the Ritz
    /// value error is then below residual²/gap, far under it for any resolved gap.</param>
    /// <param name="guard">Extra vectors carried beyond those wanted: they keep a state entering from above from being missed.</param>
    /// <param name="olsenCorrection">Project corrections with Olsen's formula (measured: ~25% less Davidson time on the
    /// benchmark sweep, fewest iterations where states mix); off only to compare.</param>
    public BlockDavidson(IEigenSolver projected, double residualTolerance = 1e-6, int maxIterations = 40, int guard = 6,
        bool olsenCorrection = true)
    {
        OlsenCorrection = olsenCorrection;
        Projected = projected;
        ResidualTolerance = residualTolerance;
        MaxIterations = maxIterations;
        Guard = guard;
    }

    public IEigenSolver Projected { get; }
    public double ResidualTolerance { get; }
    public int MaxIterations { get; }
    public int Guard { get; }
    public bool OlsenCorrection { get; }

    /// <summary>Iterations used by the last successful call on this thread (for benchmarks).</summary>
    [ThreadStatic] public static int LastIterations;

    /// <param name="guess">Optional start vectors, column-major n×<paramref name="guessColumns"/> (need not be orthonormal).</param>
    public RealEigenResult? TryLowest(CsrMatrix a, int count, double[]? guess = null, int guessColumns = 0)
    {
        int n = a.Dimension;
        int block = Math.Min(n, count + Guard);
        int maxSubspace = Math.Min(n, Math.Max(3 * block, block + 24));
        if (count < 1 || maxSubspace <= block) return null;   // too small to be worth iterating

        var basis = new double[n * maxSubspace];
        var product = new double[n * maxSubspace];
        var projectedFull = new double[maxSubspace * maxSubspace];
        int size = 0, multiplied = 0;

        bool Append(ReadOnlySpan<double> vector)
        {
            var target = basis.AsSpan(size * n, n);
            vector.CopyTo(target);
            double original = Math.Sqrt(TensorPrimitives.Dot(target, target));
            if (original == 0 || !double.IsFinite(original)) return false;
            for (int pass = 0; pass < 2; pass++)   // classical Gram–Schmidt twice is as stable as modified
                for (int j = 0; j < size; j++)
                {
                    var column = basis.AsSpan(j * n, n);
                    double overlap = TensorPrimitives.Dot(column, target);
                    TensorPrimitives.MultiplyAdd(column, -overlap, target, target);
                }
            double norm = Math.Sqrt(TensorPrimitives.Dot(target, target));
            if (norm < 1e-8 * original) return false;
            TensorPrimitives.Multiply(target, 1 / norm, target);
            size++;
            return true;
        }

        if (guess is not null)
            for (int c = 0; c < guessColumns && size < block; c++) Append(guess.AsSpan(c * n, n));
        if (size < block)
        {
            var unit = new double[n];
            foreach (int i in Enumerable.Range(0, n).OrderBy(i => a.Diagonal[i]))
            {
                if (size >= block) break;
                unit[i] = 1;
                Append(unit);
                unit[i] = 0;
            }
        }

        var ritz = new double[n * block];
        var ritzProduct = new double[n * block];
        var residual = new double[n];
        for (int iteration = 1; iteration <= MaxIterations; iteration++)
        {
            for (int j = multiplied; j < size; j++)
            {
                a.Multiply(basis.AsSpan(j * n, n), product.AsSpan(j * n, n));
                for (int i = 0; i <= j; i++)
                {
                    double t = TensorPrimitives.Dot(basis.AsSpan(i * n, n), product.AsSpan(j * n, n));
                    projectedFull[j * maxSubspace + i] = t;
                    projectedFull[i * maxSubspace + j] = t;
                }
            }
            multiplied = size;

            var small = new double[size * size];
            for (int j = 0; j < size; j++)
                Array.Copy(projectedFull, j * maxSubspace, small, j * size, size);
            int wanted = Math.Min(block, size);
            var eig = Projected.LowestReal(small, size, wanted);

            Array.Clear(ritz);
            Array.Clear(ritzProduct);
            for (int c = 0; c < wanted; c++)
            {
                var x = ritz.AsSpan(c * n, n);
                var ax = ritzProduct.AsSpan(c * n, n);
                for (int j = 0; j < size; j++)
                {
                    double y = eig.Vectors[c * size + j];
                    TensorPrimitives.MultiplyAdd(basis.AsSpan(j * n, n), y, x, x);
                    TensorPrimitives.MultiplyAdd(product.AsSpan(j * n, n), y, ax, ax);
                }
            }

            var corrections = new List<double[]>();
            bool converged = wanted >= count;
            for (int c = 0; c < wanted; c++)
            {
                double theta = eig.Values[c];
                TensorPrimitives.MultiplyAdd(ritz.AsSpan(c * n, n), -theta, ritzProduct.AsSpan(c * n, n), residual);
                double norm = Math.Sqrt(TensorPrimitives.Dot(residual, residual));
                if (norm <= ResidualTolerance) continue;
                if (c >= count) continue;   // guard vectors ride along uncorrected
                converged = false;
                var t = new double[n];
                var x = ritz.AsSpan(c * n, n);
                double xr = 0, xx = 0;
                for (int i = 0; i < n; i++)
                {
                    double denominator = theta - a.Diagonal[i];
                    // near-zero denominators would blow up one component; a floor keeps the step bounded
                    if (Math.Abs(denominator) < 1e-3) denominator = denominator < 0 ? -1e-3 : 1e-3;
                    t[i] = residual[i] / denominator;
                    xr += x[i] * t[i];
                    xx += x[i] * x[i] / denominator;
                }
                // Olsen's correction: remove the part of M⁻¹r along M⁻¹x, which otherwise mostly re-adds the Ritz
                // vector itself when a diagonal entry sits near θ (strongly mixed, near-degenerate states)
                if (OlsenCorrection && Math.Abs(xx) > 1e-300)
                {
                    double epsilon = xr / xx;
                    for (int i = 0; i < n; i++)
                    {
                        double denominator = theta - a.Diagonal[i];
                        if (Math.Abs(denominator) < 1e-3) denominator = denominator < 0 ? -1e-3 : 1e-3;
                        t[i] -= epsilon * x[i] / denominator;
                    }
                }
                corrections.Add(t);
            }

            if (converged)
            {
                var values = eig.Values.AsSpan(0, count).ToArray();
                var vectors = ritz.AsSpan(0, n * count).ToArray();
                EigenvectorPhase.Normalize(vectors, n, count);
                LastIterations = iteration;
                return new RealEigenResult(values, vectors, n);
            }

            if (size + corrections.Count > maxSubspace)
            {
                // restart on the current Ritz vectors: their projected matrix is diagonal
                Array.Copy(ritz, basis, n * wanted);
                Array.Copy(ritzProduct, product, n * wanted);
                Array.Clear(projectedFull);
                for (int c = 0; c < wanted; c++) projectedFull[c * maxSubspace + c] = eig.Values[c];
                size = multiplied = wanted;
            }
            int before = size;
            foreach (var t in corrections)
                if (size < maxSubspace) Append(t);
            if (size == before) return null;   // stagnated: nothing new to add
        }
        return null;
    }
}

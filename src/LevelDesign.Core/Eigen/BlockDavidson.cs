using System.Numerics.Tensors;
using LevelDesign.Core.Linear;

namespace LevelDesign.Core.Eigen;

/// <summary>
/// Lowest eigenpairs of a sparse real symmetric matrix by block Davidson with the diagonal (Jacobi)
/// preconditioner and Olsen's correction. Composite Hamiltonians are bare energies on the diagonal plus weak
/// couplings, which is where this preconditioner works best; warm-started from a neighbouring sweep point it
/// needs about three iterations. Returns null when it does not converge, so the caller can fall back to a
/// dense solve. Not thread-safe: an instance reuses its work arrays from call to call (one per worker).
/// </summary>
public sealed class BlockDavidson
{
    // smallest |θ − A_ii| used by the preconditioner: a near-zero denominator would blow up one component
    private const double DenominatorFloor = 1e-3;

    private SearchSpace? _space;
    private double[] _ritz = [], _ritzProduct = [], _corrections = [], _directions = [], _residual = [];

    /// <param name="residualTolerance">Converged when every wanted ‖A x − θ x‖ is below this (GHz); the Ritz
    /// value error is then below residual²/gap, far under it for any resolved gap.</param>
    /// <param name="guard">Extra vectors carried beyond those wanted: they keep a state entering from above from being missed.</param>
    public BlockDavidson(double residualTolerance = 1e-6, int maxIterations = 40, int guard = 6)
    {
        ResidualTolerance = residualTolerance;
        MaxIterations = maxIterations;
        Guard = guard;
    }

    /// <summary>What solves the projected problems, for reports.</summary>
    public const string ProjectedName = "managed Householder + tridiagonal QL";

    /// <summary>
    /// The projected (Rayleigh–Ritz) problems want about half their eigenpairs, which <see cref="LowestSymmetric"/>
    /// computes without a full decomposition. Measured on the benchmark sweep (sampled profile): as fast as native
    /// dsyevr there, so the iterative path is the same with or without native LAPACK.
    /// </summary>
    private static RealEigenResult SolveProjected(double[] matrix, int size, int wanted)
    {
        var (values, vectors) = LowestSymmetric.SolveInPlace(matrix, size, wanted);   // the copy is ours to overwrite
        return new RealEigenResult(values, vectors, size);
    }
    public double ResidualTolerance { get; }
    public int MaxIterations { get; }
    public int Guard { get; }

    /// <summary>Checked before every iteration: a cancelled solve stops with an OperationCanceledException (a large point
    /// takes 0.1–0.5 s an iteration, so a superseded one stops within that).</summary>
    public CancellationToken Cancellation { get; init; }

    /// <summary>Told after every iteration how many of the wanted states have converged.</summary>
    public IProgress<SolveProgress>? Progress { get; init; }

    /// <summary>Iterations used by the last successful call (for benchmarks).</summary>
    public int LastIterations { get; private set; }

    /// <summary>The largest ‖A x − θ x‖ of the states returned by the last successful call.</summary>
    public double LastMaxResidual { get; private set; }


    /// <param name="guess">Optional start vectors, column-major n×<paramref name="guessColumns"/> (need not be orthonormal).</param>
    public RealEigenResult? TryLowest(CsrMatrix a, int count, double[]? guess = null, int guessColumns = 0)
    {
        int n = a.Dimension;
        int block = Math.Min(n, count + Guard);
        // the Ritz block plus one set of corrections. Measured on the benchmark sweep (iterations, Σ size³ of the
        // projected problems per point): block + count 4.05, 510k; + 1.5 count 3.91, 704k; + 2 count 3.74, 853k.
        // The projected problems are the largest cost, so the smallest space wins.
        int capacity = Math.Min(n, block + count);
        if (count < 1 || capacity <= block) return null;   // too small to be worth iterating

        var space = Workspace(n, block, count, capacity);
        var ascendingDiagonal = AscendingOrder(a.Diagonal);
        if (guess is not null && guessColumns > 0)
        {
            int columns = Math.Min(guessColumns, block);
            guess.AsSpan(0, n * columns).CopyTo(space.Basis);
            space.OrthonormalizeNew(columns);
        }
        space.AddUncoveredUnitVectors(ascendingDiagonal, block);

        var unconverged = new List<int>(count);
        int ritzColumns = space.Size;   // leading columns whose contribution is not "new" (see the restart below)
        for (int iteration = 1; iteration <= MaxIterations; iteration++)
        {
            Cancellation.ThrowIfCancellationRequested();
            space.MultiplyNew(a);
            int size = space.Size, wanted = Math.Min(block, size), judged = Math.Min(wanted, count);
            var eig = SolveProjected(space.ProjectedCopy(), size, wanted);
            // Ritz vectors of the wanted states now; the guard's only when the space is restarted on them
            FormRitzVectors(space, eig, 0, judged);

            unconverged.Clear();
            double worst = 0;
            for (int c = 0; c < judged; c++)
            {
                double theta = eig.Values[c];
                TensorPrimitives.MultiplyAdd(_ritz.AsSpan(c * n, n), -theta, _ritzProduct.AsSpan(c * n, n), _residual);
                double norm = Math.Sqrt(TensorPrimitives.Dot(_residual, _residual));
                worst = Math.Max(worst, norm);
                if (norm <= ResidualTolerance) continue;
                Precondition(a.Diagonal, theta, _residual, _ritz.AsSpan(c * n, n), _corrections.AsSpan(unconverged.Count * n, n));
                unconverged.Add(c);
            }
            int added = unconverged.Count;
            Progress?.Report(new SolveProgress(iteration, judged - added, count));

            if (added == 0 && wanted >= count)
            {
                var vectors = _ritz.AsSpan(0, n * count).ToArray();
                EigenvectorPhase.Normalize(vectors, n, count);
                LastIterations = iteration;
                LastMaxResidual = worst;
                return new RealEigenResult(eig.Values.AsSpan(0, count).ToArray(), vectors, n);
            }

            int kept = 0;
            if (space.Size + added > capacity)
            {
                // thick restart on the Ritz vectors, keeping (as LOBPCG does) the part of each unconverged one that
                // came from the columns added since the last restart: without it single slow vectors stagnate
                if (ritzColumns < size)
                    foreach (int c in unconverged)
                        BlockProducts.Combine(space.Basis.AsSpan(ritzColumns * n), n, size - ritzColumns,
                            eig.Vectors.AsSpan(c * size + ritzColumns), size, 1, _directions.AsSpan(kept++ * n, n));
                FormRitzVectors(space, eig, judged, wanted);
                space.RestartOn(_ritz, _ritzProduct, eig.Values.AsSpan(0, wanted));
                ritzColumns = space.Size;
            }
            // corrections first: they are the progress; the remembered directions only accelerate (measured: giving
            // the directions the room first left cold starts with no room for corrections, and they stalled)
            int corrections = Math.Min(added, capacity - space.Size);
            int directions = Math.Min(kept, capacity - space.Size - corrections);
            _corrections.AsSpan(0, n * corrections).CopyTo(space.Basis.AsSpan(space.Size * n));
            _directions.AsSpan(0, n * directions).CopyTo(space.Basis.AsSpan((space.Size + corrections) * n));
            if (space.OrthonormalizeNew(directions + corrections) == 0) return null;   // stagnated: nothing new to add
        }
        return null;
    }

    /// <summary>Ritz vectors x_c = V y_c and their products A x_c for columns first ≤ c &lt; end.</summary>
    private void FormRitzVectors(SearchSpace space, RealEigenResult eig, int first, int end)
    {
        if (end <= first) return;
        int n = space.Dimension, size = space.Size;
        BlockProducts.Combine(space.Basis, n, size, eig.Vectors.AsSpan(first * size), size, end - first, _ritz.AsSpan(first * n));
        BlockProducts.Combine(space.Product, n, size, eig.Vectors.AsSpan(first * size), size, end - first, _ritzProduct.AsSpan(first * n));
    }

    private static int[] AscendingOrder(double[] diagonal)
    {
        var keys = (double[])diagonal.Clone();
        var order = new int[keys.Length];
        for (int i = 0; i < order.Length; i++) order[i] = i;
        Array.Sort(keys, order);
        return order;
    }

    private SearchSpace Workspace(int n, int block, int count, int capacity)
    {
        if (_space is null || !_space.Fits(n, capacity)) _space = new SearchSpace(n, capacity);
        _space.Clear(capacity);
        if (_ritz.Length < n * block) { _ritz = new double[n * block]; _ritzProduct = new double[n * block]; }
        if (_corrections.Length < n * count) { _corrections = new double[n * count]; _directions = new double[n * count]; }
        if (_residual.Length != n) _residual = new double[n];
        return _space;
    }

    /// <summary>
    /// t = M⁻¹r − ε M⁻¹x with M = θ − diag(A) (Olsen): removing the part along M⁻¹x, which otherwise mostly re-adds
    /// the Ritz vector itself when a diagonal entry sits near θ (strongly mixed, near-degenerate states). Measured:
    /// about a quarter less Davidson time on the benchmark sweep than the plain diagonal step.
    /// </summary>
    private static void Precondition(double[] diagonal, double theta, ReadOnlySpan<double> residual, ReadOnlySpan<double> x,
        Span<double> t)
    {
        double xr = 0, xx = 0;
        for (int i = 0; i < t.Length; i++)
        {
            double d = Denominator(theta - diagonal[i]);
            t[i] = residual[i] / d;
            xr += x[i] * t[i];
            xx += x[i] * x[i] / d;
        }
        if (Math.Abs(xx) <= 1e-300) return;
        double epsilon = xr / xx;
        for (int i = 0; i < t.Length; i++) t[i] -= epsilon * x[i] / Denominator(theta - diagonal[i]);
    }

    private static double Denominator(double d) =>
        Math.Abs(d) >= DenominatorFloor ? d : d < 0 ? -DenominatorFloor : DenominatorFloor;
}

using LevelDesign.Core.Eigen;

namespace LevelDesign.Core.Tests.Eigen;

/// <summary>
/// The sparse iterative solver against the dense managed solver (itself checked against exact results in
/// RealSymmetricTests), and its two dense block kernels against plain loops.
/// </summary>
public sealed class BlockDavidsonTests
{
    /// <summary>Diagonally dominant like a composite Hamiltonian: spread diagonal, sparse weak couplings.</summary>
    private static CsrMatrix CompositeLike(int n, int seed, out double[] dense, bool degenerate = false)
    {
        var random = new Random(seed);
        var entries = new List<(int, int, double)>();
        for (int i = 0; i < n; i++)
        {
            // with "degenerate" the diagonal comes in equal pairs and couplings respect a pair symmetry
            double d = degenerate ? 0.35 * (i / 2) : 0.17 * i + 0.5 * random.NextDouble();
            entries.Add((i, i, d));
        }
        for (int e = 0; e < 4 * n; e++)
        {
            int r = random.Next(n), c = random.Next(n);
            if (r == c) continue;
            if (r < c) (r, c) = (c, r);
            double v = 0.08 * (random.NextDouble() - 0.5);
            if (degenerate)
            {
                // the same coupling between even partners and between odd partners: every level stays doubled
                r -= r % 2; c -= c % 2;
                if (r == c) continue;
                entries.Add((r, c, v));
                entries.Add((r + 1, c + 1, v));
            }
            else entries.Add((r, c, v));
        }
        var csr = CsrMatrix.FromLowerTriangle(n, entries);
        dense = csr.ToDense();
        return csr;
    }

    private static void AssertMatchesDense(CsrMatrix a, double[] dense, RealEigenResult? result, int count)
    {
        Assert.NotNull(result);
        var reference = EigenSolvers.Managed.LowestReal(dense, a.Dimension, count);
        for (int k = 0; k < count; k++)
            Assert.True(Math.Abs(reference.Values[k] - result.Values[k]) < 1e-9, $"level {k}: {result.Values[k]:R} vs {reference.Values[k]:R}");
        // orthonormal vectors with small residuals
        int n = a.Dimension;
        var product = new double[n];
        for (int k = 0; k < count; k++)
        {
            var x = result.Vectors.AsSpan(k * n, n);
            a.Multiply(x, product);
            double residual = 0;
            for (int i = 0; i < n; i++) residual += Math.Pow(product[i] - result.Values[k] * x[i], 2);
            Assert.True(Math.Sqrt(residual) < 1e-5, $"residual of {k}: {Math.Sqrt(residual):E2}");
            for (int l = 0; l <= k; l++)
            {
                double dot = 0;
                for (int i = 0; i < n; i++) dot += x[i] * result.Vectors[l * n + i];
                Assert.Equal(k == l ? 1.0 : 0.0, dot, 1e-10);
            }
        }
    }

    [Fact]
    public void Cold_start_finds_the_lowest_levels()
    {
        var a = CompositeLike(300, seed: 3, out var dense);
        var result = new BlockDavidson().TryLowest(a, 25);
        AssertMatchesDense(a, dense, result, 25);
    }

    [Fact]
    public void Exactly_degenerate_pairs_are_all_found()
    {
        var a = CompositeLike(240, seed: 5, out var dense, degenerate: true);
        var reference = EigenSolvers.Managed.LowestReal(dense, 240, 20);
        Assert.True(reference.Values[1] - reference.Values[0] < 1e-12, "the fixture should have doubled levels");
        AssertMatchesDense(a, dense, new BlockDavidson().TryLowest(a, 20), 20);
    }

    [Fact]
    public void Warm_start_from_a_neighbouring_matrix_converges_in_few_iterations_and_one_instance_is_reusable()
    {
        var solver = new BlockDavidson();
        var first = CompositeLike(300, seed: 7, out var firstDense);
        var start = solver.TryLowest(first, 20)!;
        int coldIterations = solver.LastIterations;
        // the same matrix with its couplings scaled by 1.02: a small step along a sweep
        var next = new CsrMatrix(first.Dimension, first.RowStart, first.Columns,
            first.Values.Select((v, p) => first.Columns[p] == RowOf(first, p) ? v : 1.02 * v).ToArray());
        var warm = solver.TryLowest(next, 20, start.Vectors, start.Count);
        AssertMatchesDense(next, next.ToDense(), warm, 20);
        Assert.True(solver.LastIterations < coldIterations, $"warm {solver.LastIterations} vs cold {coldIterations} iterations");
        AssertMatchesDense(first, firstDense, solver.TryLowest(first, 20), 20);
    }

    private static int RowOf(CsrMatrix a, int position)
    {
        int r = 0;
        while (a.RowStart[r + 1] <= position) r++;
        return r;
    }

    [Theory]
    [InlineData(13, 7, 5)]
    [InlineData(16, 4, 8)]
    [InlineData(462, 31, 25)]
    [InlineData(1030, 9, 6)]         // several row blocks, last one partial, serial
    [InlineData(40_001, 41, 38)]     // row blocks shared out over cores (above the parallel threshold), odd sizes
    public void Block_kernels_match_plain_loops(int n, int size, int columns)
    {
        var random = new Random(n + size);
        var v = Enumerable.Range(0, n * size).Select(_ => random.NextDouble() - 0.5).ToArray();
        var w = Enumerable.Range(0, n * columns).Select(_ => random.NextDouble() - 0.5).ToArray();
        int stride = size + 2;
        var coefficients = Enumerable.Range(0, stride * columns).Select(_ => random.NextDouble() - 0.5).ToArray();

        var y = new double[n * columns];
        BlockProducts.Combine(v, n, size, coefficients, stride, columns, y);
        for (int c = 0; c < columns; c++)
            for (int i = 0; i < n; i++)
            {
                double expected = 0;
                for (int j = 0; j < size; j++) expected += v[j * n + i] * coefficients[c * stride + j];
                Assert.Equal(expected, y[c * n + i], 1e-12);
            }

        var g = new double[size * (columns + 1)];
        BlockProducts.Dots(v, n, size, w, columns, g, columns + 1);
        for (int i = 0; i < size; i++)
            for (int j = 0; j < columns; j++)
            {
                double expected = 0;
                for (int r = 0; r < n; r++) expected += v[i * n + r] * w[j * n + r];
                Assert.Equal(expected, g[i * (columns + 1) + j], 1e-10);
            }
    }

    [Fact]
    public void Reports_every_iteration_and_stops_when_cancelled_between_iterations()
    {
        var a = CompositeLike(300, seed: 3, out _);
        var reports = new List<SolveProgress>();
        var result = new BlockDavidson { Progress = new Inline(reports.Add) }.TryLowest(a, 25);
        Assert.NotNull(result);
        Assert.Equal(Enumerable.Range(1, reports.Count), reports.Select(r => r.Iteration));
        Assert.All(reports, r => Assert.Equal(25, r.Wanted));
        Assert.Equal(25, reports[^1].Converged);
        Assert.True(reports[0].Converged < 25);

        // cancelled after the second iteration: the third never starts
        using var cancel = new CancellationTokenSource();
        int seen = 0;
        var stopped = new BlockDavidson { Cancellation = cancel.Token, Progress = new Inline(r => { seen = r.Iteration; if (r.Iteration == 2) cancel.Cancel(); }) };
        Assert.Throws<OperationCanceledException>(() => stopped.TryLowest(a, 25));
        Assert.Equal(2, seen);
    }

    /// <summary>Reports on the calling thread (Progress&lt;T&gt; would post them elsewhere).</summary>
    private sealed class Inline(Action<SolveProgress> report) : IProgress<SolveProgress>
    {
        public void Report(SolveProgress value) => report(value);
    }
}

using LevelDesign.Core.Composite;
using LevelDesign.Core.Eigen;
using LevelDesign.Core.Model;

namespace LevelDesign.Core.Sweeps;

/// <summary>
/// Solves consecutive points of one contiguous stretch of a sweep. Real matrices go to the sparse iterative
/// solver warm-started from the previous point's vectors (mapped by product state, since the basis order
/// follows bare energies and can change); when it does not converge, or the matrix is complex, the dense
/// solver of the shared <see cref="DeviceSolver"/> is used. Not thread-safe: one per chunk.
/// </summary>
internal sealed class PointSolver
{
    private readonly DeviceSolver _solver;
    private readonly SweepOptions _options;
    private readonly BlockDavidson? _iterative;
    private SolvedPoint? _previous;

    public PointSolver(DeviceSolver solver, SweepOptions options)
    {
        _solver = solver;
        _options = options;
        _iterative = options.Iterative ? new BlockDavidson(solver.EigenSolver) : null;
    }

    public int IterativeSolves { get; private set; }
    public int DenseSolves { get; private set; }

    public SolvedPoint Solve(Device device, int? levels)
    {
        var problem = _solver.Prepare(device);
        int n = problem.Basis.Dimension;
        int count = Math.Min(n, levels ?? DeviceSolver.DefaultDressedCount(problem.Basis));
        var h = problem.Hamiltonian;
        SolvedPoint point;
        if (h.IsReal)
        {
            RealEigenResult? result = null;
            string name = _solver.EigenSolver.Name;
            if (_iterative is not null && n >= _options.IterativeMinimumDimension)
            {
                var (guess, columns) = WarmStart(problem.Basis);
                result = _iterative.TryLowest(h.ToCsrReal(), count, guess, columns);
                if (result is not null) { name = $"block Davidson (sparse; projected: {_solver.EigenSolver.Name})"; IterativeSolves++; }
            }
            if (result is null) { result = _solver.EigenSolver.LowestReal(h.ToDenseReal(), n, count); DenseSolves++; }
            point = new SolvedPoint(problem, result.Values, result.Vectors, null, name);
        }
        else
        {
            var complex = _solver.EigenSolver.LowestComplex(h.ToDenseComplex(), n, count);
            DenseSolves++;
            point = new SolvedPoint(problem, complex.Values, null, complex.Vectors, _solver.EigenSolver.Name);
        }
        _previous = point;
        return point;
    }

    /// <summary>The previous point's vectors re-indexed into this basis.</summary>
    private (double[]? Guess, int Columns) WarmStart(CompositeBasis basis)
    {
        if (_previous?.RealVectors is not double[] old) return (null, 0);
        int n = basis.Dimension, oldN = _previous.Dimension, columns = _previous.Count;
        var guess = new double[n * columns];
        for (int j = 0; j < n; j++)
        {
            int o = ReferenceEquals(basis, _previous.Problem.Basis) ? j : _previous.Problem.Basis.IndexOf(basis.States[j]);
            if (o < 0) continue;
            for (int c = 0; c < columns; c++) guess[c * n + j] = old[c * oldN + o];
        }
        return (guess, columns);
    }
}

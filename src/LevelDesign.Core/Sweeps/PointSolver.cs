using System.Numerics;
using LevelDesign.Core.Composite;
using LevelDesign.Core.Eigen;
using LevelDesign.Core.Model;

namespace LevelDesign.Core.Sweeps;

/// <summary>
/// Solves consecutive points of one contiguous stretch of a sweep. Real matrices go to the sparse iterative
/// solver warm-started from the previous points' vectors (mapped by product state when the basis structure
/// differs, e.g. under an energy cutoff); when it does not converge, or the matrix is complex, the dense
/// solver of the shared <see cref="DeviceSolver"/> is used. Not thread-safe: one per chunk.
/// </summary>
internal sealed class PointSolver
{
    private readonly DeviceSolver _solver;
    private readonly SweepOptions _options;
    private readonly BlockDavidson? _iterative;
    private SolvedPoint? _previous, _beforePrevious;

    public PointSolver(DeviceSolver solver, SweepOptions options)
    {
        _solver = solver;
        _options = options;
        // the projected problems are small (tens of states): measured in one benchmark run, the whole sweep was
        // about 25% faster with managed projected solves than with native ones (call overhead dominates there)
        _iterative = options.Iterative ? new BlockDavidson(EigenSolvers.Managed) : null;
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
                var (guess, columns) = WarmStart(problem.Basis, null);
                result = _iterative.TryLowest(h.ToCsrReal(), count, guess, columns);
                if (result is not null) { name = $"block Davidson (sparse; projected: {_iterative.Projected.Name})"; IterativeSolves++; }
            }
            if (result is null) { result = _solver.EigenSolver.LowestReal(h.ToDenseReal(), n, count); DenseSolves++; }
            point = new SolvedPoint(problem, result.Values, result.Vectors, null, name);
        }
        else
        {
            ComplexEigenResult? complex = null;
            string name = _solver.EigenSolver.Name;
            if (_iterative is not null && n >= _options.IterativeMinimumDimension
                && RealGauge.TryFind(n, h.LowerEntries()) is var (phases, realEntries))
            {
                var (guess, columns) = WarmStart(problem.Basis, phases);
                var real = _iterative.TryLowest(CsrMatrix.FromLowerTriangle(n, realEntries), count, guess, columns);
                if (real is not null)
                {
                    var vectors = new Complex[n * count];
                    for (int c = 0; c < count; c++)
                        for (int j = 0; j < n; j++) vectors[c * n + j] = phases[j] * real.Vectors[c * n + j];
                    EigenvectorPhase.Normalize(vectors, n, count);
                    complex = new ComplexEigenResult(real.Values, vectors, n);
                    name = $"block Davidson (sparse, real gauge; projected: {_iterative.Projected.Name})";
                    IterativeSolves++;
                }
            }
            if (complex is null) { complex = _solver.EigenSolver.LowestComplex(h.ToDenseComplex(), n, count); DenseSolves++; }
            point = new SolvedPoint(problem, complex.Values, null, complex.Vectors, name);
        }
        _beforePrevious = _previous;
        _previous = point;
        return point;
    }

    /// <summary>
    /// Start vectors for this point: the previous point's vectors re-indexed into this basis (for a gauged complex
    /// problem, rotated back by the phases: D†v is real up to one global phase per vector, removed before taking
    /// the real part), linearly extrapolated with the point before when there is one — along a smooth sweep that
    /// saves about one Davidson iteration per point.
    /// </summary>
    private (double[]? Guess, int Columns) WarmStart(CompositeBasis basis, Complex[]? phases)
    {
        if (_previous is null) return (null, 0);
        int n = basis.Dimension, columns = _previous.Count;
        var guess = new double[n * columns];
        bool extrapolate = _beforePrevious is not null && _beforePrevious.Count == columns;
        var older = new double[n];
        for (int c = 0; c < columns; c++)
        {
            var target = guess.AsSpan(c * n, n);
            GaugedColumn(_previous, basis, phases, c, target);
            if (!extrapolate) continue;
            GaugedColumn(_beforePrevious!, basis, phases, c, older);
            double dot = 0;
            for (int j = 0; j < n; j++) dot += target[j] * older[j];
            double sign = dot < 0 ? -1 : 1;   // the two points may have pinned opposite signs
            for (int j = 0; j < n; j++) target[j] = 2 * target[j] - sign * older[j];
        }
        return (guess, columns);
    }

    private static void GaugedColumn(SolvedPoint point, CompositeBasis basis, Complex[]? phases, int c, Span<double> target)
    {
        int n = basis.Dimension, oldN = point.Dimension;
        bool same = ReferenceEquals(basis.Structure, point.Problem.Basis.Structure);
        var column = new Complex[n];
        for (int j = 0; j < n; j++)
        {
            int o = same ? j : point.Problem.Basis.IndexOf(basis.States[j]);
            column[j] = o < 0 ? Complex.Zero
                : point.RealVectors is double[] real ? real[c * oldN + o]
                : point.ComplexVectors![c * oldN + o];
            if (phases is not null) column[j] = Complex.Conjugate(phases[j]) * column[j];
        }
        int pinned = EigenvectorPhase.PinnedIndex(column);
        var rotate = column[pinned] == Complex.Zero ? Complex.One : Complex.Conjugate(column[pinned]) / column[pinned].Magnitude;
        for (int j = 0; j < n; j++) target[j] = (rotate * column[j]).Real;
    }
}

using System.Numerics;
using LevelDesign.Core.Eigen;

namespace LevelDesign.Core.Composite;

/// <summary>
/// The lowest eigenpairs of one prepared point by the path that suits its size. Large real matrices, and complex ones
/// that are real up to a phase per product state (a resonator's charge operator i(a† − a)), go to the sparse block
/// Davidson solver and never become dense; small ones, truly complex ones and any the iterative solver does not
/// converge on go to the dense solver, which is refused (with the numbers) when its matrix would not fit. Every result
/// carries the largest residual ‖Hx − Ex‖ of its states: measured on the original sparse matrix for dense results and,
/// with <c>independentCheck</c> (single points), for iterative ones too; otherwise (sweep points) the residual the
/// iterative solver converged on, on the real-gauged matrix (the same norm: the gauge is a diagonal unitary). An
/// iterative result above <see cref="ResidualLimitGHz"/> is replaced by a dense solve.
/// </summary>
internal static class PointEigenSolve
{
    /// <summary>
    /// An iterative result whose worst residual is above this (GHz) is not trusted. Block Davidson stops at 1e-6 GHz;
    /// the rotate-back and the independent product on the complex matrix add only rounding.
    /// </summary>
    public const double ResidualLimitGHz = 1e-5;

    /// <summary>Start vectors for the iterative solver: given the basis and the gauge phases (null for a real matrix).</summary>
    public delegate (double[]? Guess, int Columns) WarmStart(CompositeBasis basis, Complex[]? phases);

    /// <param name="iterative">The caller's Davidson solver (its work arrays are reused); null forces the dense path.</param>
    /// <param name="iterativeMinimumDimension">Below this dimension the dense path is used.</param>
    /// <param name="independentCheck">Measure an iterative result's residuals again on the original complex matrix (about
    /// one more sparse product per state: worth it for a single point, not for every point of a sweep).</param>
    public static SolvedPoint Solve(IEigenSolver dense, CompositeProblem problem, int count, BlockDavidson? iterative,
        int iterativeMinimumDimension, WarmStart? warmStart = null, bool independentCheck = true)
    {
        int n = problem.Basis.Dimension;
        count = Math.Min(n, count);
        if (iterative is not null && n >= iterativeMinimumDimension && TryIterative(iterative, problem, count, warmStart) is SolvedPoint found)
        {
            var point = independentCheck ? Checked(found) : found with { MaxResidual = iterative.LastMaxResidual };
            if (point.MaxResidual <= ResidualLimitGHz) return point;
            if (!DenseFits(n))
                throw new InvalidOperationException(
                    $"the iterative eigensolver left a residual of {point.MaxResidual:G3} GHz on {n:N0} states, and a dense check would need {DenseGiB(n):N1} GiB; " +
                    "lower max_excitations or the number of states asked for");
        }
        else if (!DenseFits(n))
            throw new InvalidOperationException(
                $"the iterative eigensolver did not converge (or the matrix is complex in a way no gauge removes), and a dense solve of {n:N0} states would need {DenseGiB(n):N1} GiB; " +
                "lower max_excitations or the number of states asked for");
        return Dense(dense, problem, count);
    }

    /// <summary>Largest dimension the dense fallback takes on (a complex matrix of 16·n² bytes ≤ 1 GiB).</summary>
    public const int DenseMaximumDimension = 8192;

    private static bool DenseFits(int n) => n <= DenseMaximumDimension;

    private static double DenseGiB(long n) => 16.0 * n * n / (1L << 30);

    private static SolvedPoint? TryIterative(BlockDavidson iterative, CompositeProblem problem, int count, WarmStart? warmStart)
    {
        int n = problem.Basis.Dimension;
        var h = problem.Hamiltonian;
        if (h.IsReal)
        {
            var (guess, columns) = warmStart?.Invoke(problem.Basis, null) ?? (null, 0);
            var result = iterative.TryLowest(h.ToCsrReal(), count, guess, columns);
            return result is null ? null : new SolvedPoint(problem, result.Values, result.Vectors, null,
                $"block Davidson (sparse; projected: {BlockDavidson.ProjectedName})");
        }
        if (h.ToCsrRealGauged() is not var (phases, gauged)) return null;
        var (gaugedGuess, gaugedColumns) = warmStart?.Invoke(problem.Basis, phases) ?? (null, 0);
        var real = iterative.TryLowest(gauged, count, gaugedGuess, gaugedColumns);
        return real is null ? null : new SolvedPoint(problem, real.Values, null, RealGauge.RotateBack(phases, real.Vectors, n, count),
            $"block Davidson (sparse, real gauge; projected: {BlockDavidson.ProjectedName})");
    }

    /// <summary>
    /// Dense solve, for small points and as the fallback. A gaugeable complex matrix is solved in its real gauge and its
    /// vectors rotated back: same energies and vectors as the complex solver, at about a third of its cost (dsyevr
    /// against zheevr on 447 states: 13–18 against 39–48 ms).
    /// </summary>
    public static SolvedPoint Dense(IEigenSolver eigen, CompositeProblem problem, int count)
    {
        int n = problem.Basis.Dimension;
        count = Math.Min(n, count);
        var h = problem.Hamiltonian;
        if (h.IsReal)
        {
            var real = eigen.LowestReal(h.ToDenseReal(), n, count);
            return Checked(new SolvedPoint(problem, real.Values, real.Vectors, null, eigen.Name));
        }
        if (h.ToCsrRealGauged() is var (phases, gauged))
        {
            var real = eigen.LowestReal(gauged.ToDense(), n, count);
            return Checked(new SolvedPoint(problem, real.Values, null, RealGauge.RotateBack(phases, real.Vectors, n, count), $"{eigen.Name} (real gauge)"));
        }
        var complex = eigen.LowestComplex(h.ToDenseComplex(), n, count);
        return Checked(new SolvedPoint(problem, complex.Values, null, complex.Vectors, eigen.Name));
    }

    private static SolvedPoint Checked(SolvedPoint point) =>
        point with { MaxResidual = point.Problem.Hamiltonian.MaxResidual(point.Values, point.RealVectors, point.ComplexVectors) };
}

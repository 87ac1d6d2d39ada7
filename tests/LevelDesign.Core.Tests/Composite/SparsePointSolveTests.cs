using LevelDesign.Core.Composite;
using LevelDesign.Core.Eigen;
using LevelDesign.Core.Tests.Sweeps;

namespace LevelDesign.Core.Tests.Composite;

/// <summary>
/// A single point solved by the sparse iterative path must give the dense solver's states (the dense solvers are checked
/// against exact results in the Eigen tests): every computed level within 1e-9 GHz, the same bare weights, and a
/// residual ‖Hx − Ex‖ measured on the original complex matrix below the solver's tolerance.
/// </summary>
public class SparsePointSolveTests
{
    // 5 elements, 9 levels, at most 8 excitations: 1,287 product states, above the iterative threshold
    private static readonly Model.Device Module = SweepDevices.FiveElements(levels: 9, maxExcitations: 8, couplerFlux: 0.3);

    [Fact]
    public void Iterative_single_point_agrees_with_dense_on_every_level()
    {
        var iterative = new DeviceSolver { IterativeMinimumDimension = 1 };
        var dense = new DeviceSolver { IterativeMinimumDimension = int.MaxValue };
        var problem = iterative.Prepare(Module);
        Assert.True(problem.Basis.Dimension >= DeviceSolver.DefaultIterativeMinimumDimension);
        Assert.False(problem.Hamiltonian.IsReal);   // resonator charge i(a† − a): the real-gauge iterative path

        var a = iterative.Solve(problem);
        var b = dense.Solve(problem);
        Assert.Contains("Davidson", a.SolverName);
        Assert.DoesNotContain("Davidson", b.SolverName);
        Assert.Equal(b.Count, a.Count);
        Assert.True(a.Count > 20);
        for (int k = 0; k < a.Count; k++)
        {
            Assert.Equal(b.Energies[k], a.Energies[k], 1e-9);
            Assert.Equal(b.Labels[k].BareIndex, a.Labels[k].BareIndex);
            Assert.Equal(b.Labels[k].Purity, a.Labels[k].Purity, 1e-6);
        }
        Assert.InRange(a.MaxResidual, 0, PointEigenSolve.ResidualLimitGHz);
        Assert.InRange(b.MaxResidual, 0, 1e-9);
    }

    [Fact]
    public void A_sparse_point_reports_its_iterations_and_a_cancelled_one_stops()
    {
        var reports = new List<SolveProgress>();
        var solver = new DeviceSolver { IterativeMinimumDimension = 1, Progress = new Inline(reports.Add) };
        var problem = solver.Prepare(Module);
        var spectrum = solver.Solve(problem);
        Assert.Contains("Davidson", spectrum.SolverName);
        Assert.NotEmpty(reports);
        Assert.Equal(spectrum.Count, reports[^1].Wanted);
        Assert.Equal(reports[^1].Wanted, reports[^1].Converged);

        // the UI's token: a superseded point stops with OperationCanceledException, never falls back to a dense solve
        using var cancel = new CancellationTokenSource();
        cancel.Cancel();
        var cancelled = new DeviceSolver { IterativeMinimumDimension = 1, Cancellation = cancel.Token };
        Assert.Throws<OperationCanceledException>(() => cancelled.Solve(problem));
    }

    private sealed class Inline(Action<SolveProgress> report) : IProgress<SolveProgress>
    {
        public void Report(SolveProgress value) => report(value);
    }

    [Fact]
    public void Residual_is_measured_on_the_matrix_and_catches_a_wrong_pair()
    {
        var solver = new DeviceSolver { IterativeMinimumDimension = int.MaxValue };
        var problem = solver.Prepare(SweepDevices.FiveElements(levels: 4, maxExcitations: 3));
        int n = problem.Basis.Dimension;
        var dense = solver.EigenSolver.LowestComplex(problem.Hamiltonian.ToDenseComplex(), n, 3);
        Assert.InRange(problem.Hamiltonian.MaxResidual(dense.Values, null, dense.Vectors), 0, 1e-9);
        // an eigenvalue moved by 1 MHz leaves a residual of exactly 1 MHz (the vector has unit norm)
        var shifted = (double[])dense.Values.Clone();
        shifted[1] += 1e-3;
        Assert.Equal(1e-3, problem.Hamiltonian.MaxResidual(shifted, null, dense.Vectors), 1e-9);
    }

    [Fact]
    public void Unconverged_iterative_solve_falls_back_to_dense_when_small_and_is_refused_when_large()
    {
        // A Davidson solver allowed no iterations cannot converge.
        var stalled = new BlockDavidson(maxIterations: 0);
        var small = new DeviceSolver().Prepare(Module);
        var point = PointEigenSolve.Solve(EigenSolvers.Active, small, 5, stalled, 1);
        Assert.DoesNotContain("Davidson", point.SolverName);   // D = 1,287: the checked dense fallback
        Assert.InRange(point.MaxResidual, 0, 1e-9);

        // 8,568 states: a dense matrix of 1.1 GiB is not attempted; the message says what to lower
        var large = new DeviceSolver().Prepare(SweepDevices.FiveElements(levels: 14, maxExcitations: 13));
        Assert.True(large.Basis.Dimension > PointEigenSolve.DenseMaximumDimension);
        var e = Assert.Throws<InvalidOperationException>(() => PointEigenSolve.Solve(EigenSolvers.Active, large, 5, stalled, 1));
        Assert.Contains("GiB", e.Message);
        Assert.Contains("max_excitations", e.Message);
    }
}

using System.Numerics;
using LevelDesign.Core.Composite;
using LevelDesign.Core.Sweeps;

namespace LevelDesign.Core.Tests.Sweeps;

/// <summary>
/// The gauged dense solve must give what the complex Hermitian solver gives (zheevr or MathNet, checked against exact
/// results in the Eigen tests): the same energies, and the same states, i.e. |⟨gauged k|complex k⟩|² = 1 (eigenvectors
/// are fixed only up to a phase) and equal bare weights |⟨bare j|dressed k⟩|².
/// </summary>
public class PointEigenSolveTests
{
    [Fact]
    public void Gauged_solve_of_a_complex_matrix_matches_the_complex_solver()
    {
        var solver = new DeviceSolver();
        var problem = solver.Prepare(SweepDevices.FiveElements(levels: 4, maxExcitations: 3, couplerFlux: 0.3));
        Assert.False(problem.Hamiltonian.IsReal);   // qubit charge (imaginary by the phase convention) on resonator phi
        int n = problem.Basis.Dimension, count = 20;

        var gauged = PointEigenSolve.Dense(solver.EigenSolver, problem, count);
        var complex = solver.EigenSolver.LowestComplex(problem.Hamiltonian.ToDenseComplex(), n, count);

        Assert.Contains("real gauge", gauged.SolverName);
        var weights = gauged.Weights();
        for (int k = 0; k < count; k++)
        {
            Assert.Equal(complex.Values[k], gauged.Values[k], 1e-10);
            Complex overlap = 0;
            for (int j = 0; j < n; j++)
            {
                var z = complex.Vectors[k * n + j];
                overlap += Complex.Conjugate(gauged.ComplexVectors![k * n + j]) * z;
                Assert.Equal(z.Real * z.Real + z.Imaginary * z.Imaginary, weights[k * n + j], 1e-10);
            }
            Assert.Equal(1, overlap.Magnitude * overlap.Magnitude, 1e-10);
        }
    }
}

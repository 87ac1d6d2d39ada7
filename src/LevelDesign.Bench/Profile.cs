using System.Diagnostics;
using LevelDesign.Core.Composite;
using LevelDesign.Core.Eigen;
using LevelDesign.Core.Sweeps;

namespace LevelDesign.Bench;

/// <summary>Time per stage of a sequential sweep (prepare, sparse copy, iterative solve), to see where time goes.</summary>
internal static class Profile
{
    public static void Run(Func<IReadOnlyList<double>, LevelDesign.Core.Model.Device> resolve, double[] biases)
    {
        var solver = new DeviceSolver();
        var davidson = new BlockDavidson();
        double prepare = 0, sparse = 0, eigen = 0;
        int iterations = 0;
        RealEigenResult? previous = null;
        CompositeBasis? previousBasis = null;
        var sw = new Stopwatch();
        foreach (double bias in biases)
        {
            sw.Restart();
            var problem = solver.Prepare(resolve([bias]));
            prepare += sw.Elapsed.TotalSeconds;
            sw.Restart();
            var csr = problem.Hamiltonian.ToCsrReal();
            sparse += sw.Elapsed.TotalSeconds;
            int n = problem.Basis.Dimension, k = solver.DefaultCount(problem);
            double[]? guess = null;
            if (previous is not null)
            {
                guess = new double[n * previous.Count];
                for (int j = 0; j < n; j++)
                {
                    int o = previousBasis!.IndexOf(problem.Basis.States[j]);
                    if (o >= 0) for (int c = 0; c < previous.Count; c++) guess[c * n + j] = previous.Vectors[c * n + o];
                }
            }
            sw.Restart();
            previous = davidson.TryLowest(csr, k, guess, previous?.Count ?? 0) ?? throw new InvalidOperationException("no convergence");
            eigen += sw.Elapsed.TotalSeconds;
            iterations += davidson.LastIterations;
            previousBasis = problem.Basis;
        }
        int m = biases.Length;

        Console.WriteLine($"profile (no extrapolated warm start): prepare {prepare / m * 1e3:F2} ms, csr {sparse / m * 1e3:F2} ms, iterative {eigen / m * 1e3:F2} ms ({(double)iterations / m:F1} iterations) per point");
    }
}

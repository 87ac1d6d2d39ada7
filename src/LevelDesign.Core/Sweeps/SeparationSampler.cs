using System.Collections.Concurrent;
using LevelDesign.Core.Composite;
using LevelDesign.Core.Eigen;
using LevelDesign.Core.Model;

namespace LevelDesign.Core.Sweeps;

/// <summary>
/// Dense solves for the crossing refinement, kept by bias so every label pair refined in the same stretch of the
/// sweep reuses them: one solve gives the separation of every pair. A complex Hamiltonian that is real up to a phase
/// per product state (a resonator's charge operator i(a† − a)) is solved in its real gauge; the phases have unit
/// modulus, so the weights |⟨bare|dressed⟩|² and the energies are those of the complex problem, at about a third of
/// the cost of the complex solver. Thread-safe: concurrent requests for one bias share one solve.
/// </summary>
internal sealed class SeparationSampler
{
    private readonly DeviceSolver _solver;
    private readonly Func<double, Device> _resolve;
    private readonly IReadOnlyList<int[]> _labels;
    private readonly int _count;
    private readonly ConcurrentDictionary<double, Lazy<SeparationSample>> _solved = new();
    private int _solves;

    /// <param name="labels">The searched product states; samples keep only their weights.</param>
    /// <param name="count">Dressed states per solve: enough to hold every searched label with a margin.</param>
    public SeparationSampler(DeviceSolver solver, Func<double, Device> resolve, IReadOnlyList<int[]> labels, int count)
    {
        _solver = solver;
        _resolve = resolve;
        _labels = labels;
        _count = count;
    }

    /// <summary>Dense solves done so far.</summary>
    public int Solves => _solves;

    /// <summary>A solved sweep point as a sample: its iterative solve is accurate enough to start a refinement from, not to report.</summary>
    public SeparationSample FromSweepPoint(double bias, DressedSpectrum spectrum) =>
        Reduce(bias, spectrum.Energies, spectrum.Weights, spectrum.Basis, exact: false);

    /// <summary>The dense solve at this bias (cached).</summary>
    public SeparationSample At(double bias) => _solved.GetOrAdd(bias, b => new Lazy<SeparationSample>(() => Solve(b))).Value;

    private SeparationSample Solve(double bias)
    {
        var problem = _solver.Prepare(_resolve(bias));
        int n = problem.Basis.Dimension, count = Math.Min(n, _count);
        var h = problem.Hamiltonian;
        var eigen = _solver.EigenSolver;
        double[] values, weights;
        double[]? real = h.IsReal ? h.ToDenseReal() : RealGaugeDense(problem);
        if (real is not null)
        {
            var result = eigen.LowestReal(real, n, count);
            values = result.Values;
            weights = new double[n * count];
            for (int i = 0; i < weights.Length; i++) weights[i] = result.Vectors[i] * result.Vectors[i];
        }
        else
        {
            var result = eigen.LowestComplex(h.ToDenseComplex(), n, count);
            values = result.Values;
            weights = new double[n * count];
            for (int i = 0; i < weights.Length; i++)
            {
                var z = result.Vectors[i];
                weights[i] = z.Real * z.Real + z.Imaginary * z.Imaginary;
            }
        }
        Interlocked.Increment(ref _solves);
        return Reduce(bias, values, weights, problem.Basis, exact: true);
    }

    /// <summary>D†HD as a dense real matrix when phases D making it real exist; null otherwise.</summary>
    private static double[]? RealGaugeDense(CompositeProblem problem)
    {
        int n = problem.Basis.Dimension;
        if (RealGauge.TryFind(n, problem.Hamiltonian.LowerEntries()) is not var (_, entries)) return null;
        var dense = new double[n * n];
        foreach (var (row, column, value) in entries)
        {
            dense[column * n + row] = value;
            dense[row * n + column] = value;
        }
        return dense;
    }

    /// <summary>Keeps the energies and, per searched label, its weight in each state (weights column-major n×count).</summary>
    private SeparationSample Reduce(double bias, double[] energies, double[] weights, CompositeBasis basis, bool exact)
    {
        int n = basis.Dimension, count = energies.Length;
        var labelWeights = new double[_labels.Count][];
        for (int s = 0; s < _labels.Count; s++)
        {
            int j = basis.IndexOf(_labels[s]);
            var w = labelWeights[s] = new double[count];
            for (int k = 0; k < count; k++) w[k] = j < 0 ? double.NaN : weights[k * n + j];
        }
        return new SeparationSample(bias, energies, labelWeights, exact);
    }
}

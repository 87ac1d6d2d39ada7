using System.Collections.Concurrent;
using LevelDesign.Core.Composite;
using LevelDesign.Core.Model;

namespace LevelDesign.Core.Sweeps;

/// <summary>
/// Dense solves for the crossing refinement (<see cref="GaugedDenseSolve"/>: in the real gauge when the matrix is
/// real up to phases), kept by bias so every label pair refined in the same stretch of the sweep reuses them: one
/// solve gives the separation of every pair. Thread-safe: concurrent requests for one bias share one solve.
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

    /// <summary>
    /// A solved sweep point as a sample: its iterative solve is accurate enough to start a refinement from, not to
    /// report. Null when the sweep did not keep the point's weights (a large module): the refinement then starts from
    /// its own solves.
    /// </summary>
    public SeparationSample? FromSweepPoint(double bias, DressedSpectrum spectrum) =>
        spectrum.Weights is double[] weights ? Reduce(bias, spectrum.Energies, weights, spectrum.Basis, exact: false) : null;

    /// <summary>The standalone solve at this bias (cached): dense, or cold iterative for a large module.</summary>
    public SeparationSample At(double bias) => _solved.GetOrAdd(bias, b => new Lazy<SeparationSample>(() => Solve(b))).Value;

    private SeparationSample Solve(double bias)
    {
        var problem = _solver.Prepare(_resolve(bias));
        var point = _solver.SolvePoint(problem, _count);
        Interlocked.Increment(ref _solves);
        return Reduce(bias, point.Values, point.Weights(), problem.Basis, exact: true);
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

using System.Collections.Concurrent;
using System.Numerics;
using LevelDesign.Core.Couplers;
using LevelDesign.Core.Eigen;
using LevelDesign.Core.Elements;
using LevelDesign.Core.Labels;
using LevelDesign.Core.Model;

namespace LevelDesign.Core.Composite;

/// <summary>
/// The whole pipeline for one bias point: diagonalise each element alone (cached), resolve couplers, build the
/// pruned product basis, assemble the Hamiltonian sparse, find its lowest eigenpairs (real solver when the
/// matrix is real symmetric, complex otherwise), and label the dressed states.
/// </summary>
public sealed class DeviceSolver
{
    public DeviceSolver(IEigenSolver? eigenSolver = null, BareSpectrumCache? cache = null)
    {
        EigenSolver = eigenSolver ?? EigenSolvers.Active;
        Cache = cache ?? new BareSpectrumCache();
    }

    private readonly ConcurrentDictionary<string, BasisStructure> _structures = new();
    private readonly AssemblyPlanCache _plans = new();

    public IEigenSolver EigenSolver { get; }
    public BareSpectrumCache Cache { get; }

    /// <summary>Everything up to (not including) the eigen solve, for reuse by benchmarks and iterative solvers.</summary>
    public CompositeProblem Prepare(Device device)
    {
        var problems = device.Validate();
        if (problems.Count > 0) throw new InvalidDeviceException(problems);
        var t = device.Truncation;
        var bare = device.Elements.Select(e => Cache.Get(e, t.LevelsOf(e.Id), t.BasisSizeOf(e.Id))).ToArray();
        var couplers = device.Couplers.Select(c => CouplerResolver.Resolve(c, device.Elements, bare,
            (i, e) => Cache.Get(e, t.LevelsOf(device.Elements[i].Id), t.BasisSizeOf(device.Elements[i].Id)))).ToArray();
        var energies = bare.Select(b => b.Energies).ToArray();
        var basis = new CompositeBasis(StructureFor(energies, t), energies);
        var hamiltonian = HamiltonianAssembler.Assemble(basis, couplers, _plans);
        return new CompositeProblem(device, bare, couplers, basis, hamiltonian);
    }

    /// <summary>
    /// The kept product states; without an energy cutoff they depend only on level counts and the excitation cap,
    /// so one structure (and its assembly plans) is shared by every point of a sweep.
    /// </summary>
    private BasisStructure StructureFor(double[][] energies, Truncation t)
    {
        if (t.MaxBareEnergyGHz is not null) return new BasisStructure(energies, t.MaxExcitations, t.MaxBareEnergyGHz);
        string key = string.Join(",", energies.Select(e => e.Length)) + "/" + t.MaxExcitations;
        if (_structures.TryGetValue(key, out var structure)) return structure;
        if (_structures.Count >= 64) _structures.Clear();
        return _structures[key] = new BasisStructure(energies, t.MaxExcitations, null);
    }

    /// <summary>What <see cref="Solve(CompositeProblem, int?)"/> computes when no count is given.</summary>
    public StateSelection Selection { get; init; } = StateSelection.Auto;

    /// <summary>
    /// From this dimension on, a single point is solved by the sparse iterative path (cold start) instead of densely.
    /// Measured (docs/performance.md): on 447–492 states the dense solve is as fast; from about a thousand states on
    /// the iterative one wins and the gap grows as D² (4,364 states: dense 26 s, iterative well under a second).
    /// </summary>
    public int IterativeMinimumDimension { get; init; } = DefaultIterativeMinimumDimension;

    public const int DefaultIterativeMinimumDimension = 800;

    /// <summary>Stops this solver's iterative solves between iterations (the UI cancels a point an edit superseded).</summary>
    public CancellationToken Cancellation { get; init; }

    /// <summary>Told after every iteration of this solver's iterative single-point solves (the UI shows it).</summary>
    public IProgress<SolveProgress>? Progress { get; init; }

    /// <summary>The states <see cref="Selection"/> asks for at this point.</summary>
    public SelectedStates Select(CompositeProblem problem) => Selection.Resolve(problem);

    /// <summary>How many eigenpairs <see cref="Selection"/> needs at this point.</summary>
    public int DefaultCount(CompositeProblem problem) => Select(problem).Count;

    public DressedSpectrum Solve(Device device, int? dressedCount = null) => Solve(Prepare(device), dressedCount);

    /// <summary>The lowest <paramref name="dressedCount"/> states, or those <see cref="Selection"/> asks for.</summary>
    public DressedSpectrum Solve(CompositeProblem problem, int? dressedCount = null) =>
        Solve(problem, dressedCount is int k ? SelectedStates.Lowest(Math.Min(k, problem.Basis.Dimension)) : Select(problem));

    public DressedSpectrum Solve(CompositeProblem problem, SelectedStates selected)
    {
        var point = SolvePoint(problem, selected.Count);
        return Finish(point, selected);
    }

    /// <summary>One standalone point's eigenpairs (no warm start, so it does not depend on any other point).</summary>
    internal SolvedPoint SolvePoint(CompositeProblem problem, int count) =>
        PointEigenSolve.Solve(EigenSolver, problem, count, new BlockDavidson { Cancellation = Cancellation, Progress = Progress }, IterativeMinimumDimension);

    private static DressedSpectrum Finish(SolvedPoint point, SelectedStates selected)
    {
        var problem = point.Problem;
        var weights = point.Weights();
        var labels = Labeller.Label(weights, point.Dimension, point.Count);
        return new DressedSpectrum(problem.Device, problem.Bare, problem.Couplers, problem.Basis, point.Values, weights,
            point.ComplexVectors, point.RealVectors, labels, point.SolverName, point.IsComplex) { MaxResidual = point.MaxResidual, Selection = selected };
    }
}

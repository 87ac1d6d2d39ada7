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

    public DressedSpectrum Solve(Device device, int? dressedCount = null) => Solve(Prepare(device), dressedCount);

    public DressedSpectrum Solve(CompositeProblem problem, int? dressedCount = null)
    {
        int n = problem.Basis.Dimension;
        int k = Math.Min(n, dressedCount ?? DefaultDressedCount(problem.Basis));
        var h = problem.Hamiltonian;
        if (h.IsReal)
        {
            var result = EigenSolver.LowestReal(h.ToDenseReal(), n, k);
            return Finish(problem, result.Values, result.Vectors, null, false);
        }
        var complex = EigenSolver.LowestComplex(h.ToDenseComplex(), n, k);
        return Finish(problem, complex.Values, null, complex.Vectors, true);
    }

    internal DressedSpectrum Finish(CompositeProblem problem, double[] values, double[]? realVectors, Complex[]? complexVectors, bool isComplex)
    {
        int n = problem.Basis.Dimension, k = values.Length;
        var weights = new double[n * k];
        if (realVectors is not null)
            for (int i = 0; i < weights.Length; i++) weights[i] = realVectors[i] * realVectors[i];
        else
            for (int i = 0; i < weights.Length; i++) weights[i] = complexVectors![i].Real * complexVectors[i].Real + complexVectors[i].Imaginary * complexVectors[i].Imaginary;
        var labels = Labeller.Label(weights, n, k);
        return new DressedSpectrum(problem.Device, problem.Bare, problem.Couplers, problem.Basis, values, weights,
            complexVectors, realVectors, labels, EigenSolver.Name, isComplex);
    }

    /// <summary>
    /// Enough dressed states to contain every product state with up to two excitations (needed for 2χ, ZZ and
    /// anharmonicity), plus those lying below the highest of them, plus a small margin.
    /// </summary>
    public static int DefaultDressedCount(CompositeBasis basis)
    {
        double highest = 0;
        for (int i = 0; i < basis.Dimension; i++)
            if (basis.States[i].Sum() <= 2) highest = Math.Max(highest, basis.BareEnergies[i]);
        int count = 0;
        for (int i = 0; i < basis.Dimension; i++) if (basis.BareEnergies[i] <= highest + 1e-9) count++;
        return Math.Min(basis.Dimension, count + 4);
    }
}

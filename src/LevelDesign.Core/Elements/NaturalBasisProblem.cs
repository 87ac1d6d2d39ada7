using LevelDesign.Core.Linear;

namespace LevelDesign.Core.Elements;

/// <summary>An element's Hamiltonian and operators written in its natural (untruncated) basis.</summary>
/// <remarks>Operators may be built on first use: while a basis grows only the energies are compared, so the larger
/// trial bases never need them.</remarks>
internal sealed record NaturalBasisProblem(double[,] Hamiltonian, Lazy<IReadOnlyDictionary<string, OperatorMatrix>> LazyOperators, BasisInfo Basis)
{
    public NaturalBasisProblem(double[,] hamiltonian, IReadOnlyDictionary<string, OperatorMatrix> operators, BasisInfo basis)
        : this(hamiltonian, new Lazy<IReadOnlyDictionary<string, OperatorMatrix>>(operators), basis) { }

    public IReadOnlyDictionary<string, OperatorMatrix> Operators => LazyOperators.Value;

    public int Size => Hamiltonian.GetLength(0);

    /// <summary>Diagonalises and re-expresses every operator in the lowest <paramref name="levels"/> eigenstates.</summary>
    public BareSpectrum Solve(string elementId, int levels) => Express(elementId, Diagonalise(levels));

    /// <summary>The lowest <paramref name="levels"/> eigenpairs (vectors column-major Size×levels).</summary>
    public (double[] Values, double[] Vectors) Diagonalise(int levels) => SmallEigen.LowestSymmetric(Hamiltonian, levels);

    /// <summary>The bare spectrum from eigenpairs of <see cref="Diagonalise"/>: every operator in those eigenstates.</summary>
    public BareSpectrum Express(string elementId, (double[] Values, double[] Vectors) eigen)
    {
        int levels = eigen.Values.Length;
        var ops = new Dictionary<string, OperatorMatrix>();
        foreach (var (name, op) in Operators) ops[name] = op.InBasis(eigen.Vectors, Size, levels);
        return new BareSpectrum(elementId, eigen.Values, ops, Basis);
    }
}

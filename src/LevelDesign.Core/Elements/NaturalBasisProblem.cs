using LevelDesign.Core.Linear;

namespace LevelDesign.Core.Elements;

/// <summary>An element's Hamiltonian and operators written in its natural (untruncated) basis.</summary>
internal sealed record NaturalBasisProblem(double[,] Hamiltonian, IReadOnlyDictionary<string, OperatorMatrix> Operators, BasisInfo Basis)
{
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

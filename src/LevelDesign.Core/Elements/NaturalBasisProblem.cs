using LevelDesign.Core.Linear;

namespace LevelDesign.Core.Elements;

/// <summary>An element's Hamiltonian and operators written in its natural (untruncated) basis.</summary>
internal sealed record NaturalBasisProblem(double[,] Hamiltonian, IReadOnlyDictionary<string, OperatorMatrix> Operators, BasisInfo Basis)
{
    public int Size => Hamiltonian.GetLength(0);

    /// <summary>Diagonalises and re-expresses every operator in the lowest <paramref name="levels"/> eigenstates.</summary>
    public BareSpectrum Solve(string elementId, int levels)
    {
        var (values, vectors) = SmallEigen.LowestSymmetric(Hamiltonian, levels);
        var ops = new Dictionary<string, OperatorMatrix>();
        foreach (var (name, op) in Operators) ops[name] = op.InBasis(vectors, Size, levels);
        return new BareSpectrum(elementId, values, ops, Basis);
    }
}

using System.Numerics;
namespace LevelDesign.Core.Composite;

/// <summary>
/// One point's eigenpairs before labelling: absolute eigenvalues and the vectors in the product basis, and the
/// largest residual ‖Hx − Ex‖ (GHz) of any of them, measured on the original (ungauged) sparse matrix.
/// </summary>
internal sealed record SolvedPoint(CompositeProblem Problem, double[] Values, double[]? RealVectors, Complex[]? ComplexVectors, string SolverName)
{
    public double MaxResidual { get; init; } = double.NaN;

    /// <summary>What the point was asked to compute (null: a count chosen by the caller).</summary>
    public SelectedStates? Selection { get; init; }

    public int Count => Values.Length;
    public int Dimension => Problem.Basis.Dimension;
    public bool IsComplex => ComplexVectors is not null;

    /// <summary>|⟨bare j|dressed k⟩|², column-major.</summary>
    public double[] Weights()
    {
        var w = new double[Dimension * Count];
        if (RealVectors is not null)
            for (int i = 0; i < w.Length; i++) w[i] = RealVectors[i] * RealVectors[i];
        else
            for (int i = 0; i < w.Length; i++)
            {
                var z = ComplexVectors![i];
                w[i] = z.Real * z.Real + z.Imaginary * z.Imaginary;
            }
        return w;
    }

    /// <summary>For each state of this basis, its index in <paramref name="other"/> (−1 when pruned there).</summary>
    public int[] IndexMapTo(CompositeBasis other) => IndexMap(Problem.Basis, other);

    /// <summary>For each state of <paramref name="from"/>, its index in <paramref name="to"/> (−1 when pruned there).</summary>
    public static int[] IndexMap(CompositeBasis from, CompositeBasis to)
    {
        var map = new int[from.Dimension];
        bool same = ReferenceEquals(from.Structure, to.Structure);
        for (int j = 0; j < map.Length; j++) map[j] = same ? j : to.IndexOf(from.States[j]);
        return map;
    }
}

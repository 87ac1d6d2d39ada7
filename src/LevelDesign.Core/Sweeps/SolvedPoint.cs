using System.Numerics;
using LevelDesign.Core.Composite;

namespace LevelDesign.Core.Sweeps;

/// <summary>One point's eigenpairs before labelling: absolute eigenvalues and the vectors in the product basis.</summary>
internal sealed record SolvedPoint(CompositeProblem Problem, double[] Values, double[]? RealVectors, Complex[]? ComplexVectors, string SolverName)
{
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

using System.Numerics;
using LevelDesign.Core.Composite;

namespace LevelDesign.Core.Analysis;

/// <summary>
/// ⟨i|op|j⟩ between dressed states of one element operator (acting on that element, identity on the others),
/// taken from the dressed eigenvectors in the product basis. These set drive strengths and loss rates.
/// </summary>
public static class DressedMatrixElements
{
    /// <summary>The matrix ⟨i|op|j⟩ for the given dressed indices (rows and columns in that order).</summary>
    public static Complex[,] Matrix(DressedSpectrum s, string elementId, string operatorName, IReadOnlyList<int> states)
    {
        int element = s.Device.IndexOf(elementId);
        if (element < 0) throw new ArgumentException($"no element '{elementId}' (elements: {string.Join(", ", s.Device.Elements.Select(e => e.Id))})");
        var op = s.Bare[element].Operator(operatorName);
        foreach (int k in states)
            if (k < 0 || k >= s.Count) throw new ArgumentException($"dressed state {k} is not among the {s.Count} computed");
        int n = s.Dimension;
        // op·|ψ_j⟩ in the product basis: op moves element's level l' → l, keeping every other element's level
        var applied = new Complex[states.Count][];
        var target = new int[s.Basis.ElementCount];
        for (int c = 0; c < states.Count; c++)
        {
            var result = new Complex[n];
            for (int from = 0; from < n; from++)
            {
                Complex amplitude = Component(s, from, states[c]);
                if (amplitude == Complex.Zero) continue;
                var levels = s.Basis.States[from];
                levels.CopyTo(target, 0);
                for (int l = 0; l < op.Size; l++)
                {
                    var o = op[l, levels[element]];
                    if (o == Complex.Zero) continue;
                    target[element] = l;
                    int to = s.Basis.IndexOf(target);
                    if (to >= 0) result[to] += o * amplitude;
                }
            }
            applied[c] = result;
        }
        var m = new Complex[states.Count, states.Count];
        for (int r = 0; r < states.Count; r++)
            for (int c = 0; c < states.Count; c++)
            {
                Complex sum = Complex.Zero;
                for (int j = 0; j < n; j++) sum += Complex.Conjugate(Component(s, j, states[r])) * applied[c][j];
                m[r, c] = sum;
            }
        return m;
    }

    /// <summary>One element ⟨i|op|j⟩ between dressed indices i and j.</summary>
    public static Complex Between(DressedSpectrum s, string elementId, string operatorName, int i, int j) =>
        Matrix(s, elementId, operatorName, [i, j])[0, 1];

    /// <summary>⟨bare j|dressed k⟩.</summary>
    public static Complex Component(DressedSpectrum s, int bare, int dressed) =>
        s.RealVectors is double[] real ? real[dressed * s.Dimension + bare]
        : s.ComplexVectors is Complex[] complex ? complex[dressed * s.Dimension + bare] : throw DressedSpectrum.VectorsNotKept();
}

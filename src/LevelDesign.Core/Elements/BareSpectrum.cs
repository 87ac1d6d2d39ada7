using LevelDesign.Core.Linear;

namespace LevelDesign.Core.Elements;

/// <summary>
/// An element diagonalised alone: its lowest kept energies (absolute, GHz, ascending) and its
/// coupling operators expressed in that bare eigenbasis (kept × kept).
/// </summary>
public sealed class BareSpectrum
{
    public BareSpectrum(string elementId, double[] energies, IReadOnlyDictionary<string, OperatorMatrix> operators, BasisInfo basis)
    {
        ElementId = elementId;
        Energies = energies;
        Operators = operators;
        Basis = basis;
    }

    public string ElementId { get; }
    public double[] Energies { get; }
    public IReadOnlyDictionary<string, OperatorMatrix> Operators { get; }
    public BasisInfo Basis { get; }
    public int Levels => Energies.Length;

    /// <summary>Bare transition energy from level 0 to <paramref name="level"/>.</summary>
    public double Excitation(int level) => Energies[level] - Energies[0];

    public OperatorMatrix Operator(string name) =>
        Operators.TryGetValue(name, out var op)
            ? op
            : throw new KeyNotFoundException($"element '{ElementId}' has no operator '{name}' (it offers: {string.Join(", ", Operators.Keys)})");
}

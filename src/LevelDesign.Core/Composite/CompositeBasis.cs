namespace LevelDesign.Core.Composite;

/// <summary>
/// The product basis at one point: the kept states (<see cref="BasisStructure"/>, possibly shared along a sweep)
/// and their bare energies above the bare ground at this point.
/// </summary>
public sealed class CompositeBasis
{
    public CompositeBasis(IReadOnlyList<double[]> elementEnergies, int? maxExcitations, double? maxBareEnergy)
        : this(new BasisStructure(elementEnergies, maxExcitations, maxBareEnergy), elementEnergies) { }

    public CompositeBasis(BasisStructure structure, IReadOnlyList<double[]> elementEnergies)
    {
        Structure = structure;
        BareEnergies = structure.Energies(elementEnergies);
    }

    public BasisStructure Structure { get; }

    public IReadOnlyList<int[]> States => Structure.States;

    /// <summary>Bare energy of each product state above the bare ground, GHz.</summary>
    public double[] BareEnergies { get; }

    public int[] Levels => Structure.Levels;

    public int Dimension => Structure.Dimension;

    public int ElementCount => Structure.ElementCount;

    /// <summary>Index of a product state, or −1 when it was pruned away.</summary>
    public int IndexOf(ReadOnlySpan<int> state) => Structure.IndexOf(state);

    /// <summary>Index of the state with level <paramref name="levels"/> on the given elements and 0 elsewhere.</summary>
    public int IndexOfExcitation(params (int Element, int Level)[] levels)
    {
        var state = new int[ElementCount];
        foreach (var (e, l) in levels) state[e] = l;
        return IndexOf(state);
    }
}

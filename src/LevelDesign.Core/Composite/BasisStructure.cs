namespace LevelDesign.Core.Composite;

/// <summary>
/// The product states kept in a composite space, in a fixed (lexicographic) order, with an index. When the
/// space is pruned by level counts and total excitations only, it does not depend on any energy, so one
/// structure serves every point of a sweep and the assembly plan built on it can be reused.
/// </summary>
public sealed class BasisStructure
{
    private readonly Dictionary<long, int> _index = new();
    private readonly long[] _radix;

    public BasisStructure(IReadOnlyList<double[]> elementEnergies, int? maxExcitations, double? maxBareEnergy)
    {
        int count = elementEnergies.Count;
        Levels = elementEnergies.Select(e => e.Length).ToArray();
        _radix = new long[count];
        long r = 1;
        for (int i = count - 1; i >= 0; i--) { _radix[i] = r; r *= Levels[i]; }
        var states = new List<int[]>();
        var current = new int[count];
        Enumerate(0, 0, 0.0);
        void Enumerate(int element, int excitations, double energy)
        {
            if (element == count)
            {
                states.Add((int[])current.Clone());
                return;
            }
            for (int l = 0; l < Levels[element]; l++)
            {
                int ex = excitations + l;
                double en = energy + elementEnergies[element][l] - elementEnergies[element][0];
                if (maxExcitations is int m && ex > m) break;
                if (maxBareEnergy is double emax && en > emax + 1e-12) break;
                current[element] = l;
                Enumerate(element + 1, ex, en);
            }
            current[element] = 0;
        }
        States = states;
        for (int i = 0; i < States.Count; i++) _index[Key(States[i])] = i;
    }

    public IReadOnlyList<int[]> States { get; }
    public int[] Levels { get; }
    public int Dimension => States.Count;
    public int ElementCount => Levels.Length;

    /// <summary>Index of a product state, or −1 when it was pruned away.</summary>
    public int IndexOf(ReadOnlySpan<int> state)
    {
        for (int i = 0; i < state.Length; i++) if (state[i] < 0 || state[i] >= Levels[i]) return -1;
        return _index.TryGetValue(Key(state), out int k) ? k : -1;
    }

    /// <summary>Bare energy of every state above the bare ground, for one point's element energies.</summary>
    public double[] Energies(IReadOnlyList<double[]> elementEnergies)
    {
        var result = new double[Dimension];
        for (int s = 0; s < Dimension; s++)
        {
            var state = States[s];
            double e = 0;
            for (int i = 0; i < state.Length; i++) e += elementEnergies[i][state[i]] - elementEnergies[i][0];
            result[s] = e;
        }
        return result;
    }

    private long Key(ReadOnlySpan<int> state)
    {
        long key = 0;
        for (int i = 0; i < state.Length; i++) key += state[i] * _radix[i];
        return key;
    }
}

namespace LevelDesign.Core.Composite;

/// <summary>
/// Product states |l_0, l_1, ...⟩ of the elements' kept bare levels, pruned by total excitations and/or
/// bare energy, sorted by bare energy (ties by excitation number, then lexicographically).
/// </summary>
public sealed class CompositeBasis
{
    private readonly Dictionary<long, int> _index = new();
    private readonly long[] _radix;

    public CompositeBasis(IReadOnlyList<double[]> elementEnergies, int? maxExcitations, double? maxBareEnergy)
    {
        int count = elementEnergies.Count;
        Levels = elementEnergies.Select(e => e.Length).ToArray();
        _radix = new long[count];
        long r = 1;
        for (int i = count - 1; i >= 0; i--) { _radix[i] = r; r *= Levels[i]; }
        var states = new List<(int[] State, double Energy, int Excitations)>();
        var current = new int[count];
        Enumerate(0, 0, 0.0);
        void Enumerate(int element, int excitations, double energy)
        {
            if (element == count)
            {
                states.Add(((int[])current.Clone(), energy, excitations));
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
        var ordered = states
            .OrderBy(s => Math.Round(s.Energy, 9))
            .ThenBy(s => s.Excitations)
            .ThenBy(s => Key(s.State))
            .ToArray();
        States = ordered.Select(s => s.State).ToArray();
        BareEnergies = ordered.Select(s => s.Energy).ToArray();
        for (int i = 0; i < States.Count; i++) _index[Key(States[i])] = i;
    }

    public IReadOnlyList<int[]> States { get; }

    /// <summary>Bare energy of each product state above the bare ground, GHz.</summary>
    public double[] BareEnergies { get; }

    public int[] Levels { get; }

    public int Dimension => States.Count;

    public int ElementCount => Levels.Length;

    /// <summary>Index of a product state, or −1 when it was pruned away.</summary>
    public int IndexOf(ReadOnlySpan<int> state)
    {
        for (int i = 0; i < state.Length; i++) if (state[i] < 0 || state[i] >= Levels[i]) return -1;
        return _index.TryGetValue(Key(state), out int k) ? k : -1;
    }

    /// <summary>Index of the state with level <paramref name="levels"/> on the given elements and 0 elsewhere.</summary>
    public int IndexOfExcitation(params (int Element, int Level)[] levels)
    {
        var state = new int[ElementCount];
        foreach (var (e, l) in levels) state[e] = l;
        return IndexOf(state);
    }

    private long Key(ReadOnlySpan<int> state)
    {
        long key = 0;
        for (int i = 0; i < state.Length; i++) key += state[i] * _radix[i];
        return key;
    }
}
